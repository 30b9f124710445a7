"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { acknowledgeShipmentAction } from "@/app/(staff)/intake/actions";

export function AcknowledgeButton({ shipmentId, version }: { shipmentId: string; version: number }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [message, setMessage] = useState<string | null>(null);
  return (
    <span className="inline-form">
      <button
        type="button"
        className="button"
        disabled={pending}
        onClick={() =>
          startTransition(async () => {
            const result = await acknowledgeShipmentAction({ shipmentId, version });
            if (result.ok) router.refresh();
            else setMessage(result.message);
          })
        }
      >
        Acknowledge receipt
      </button>
      {message && <span className="field-error" role="alert">{message}</span>}
    </span>
  );
}
