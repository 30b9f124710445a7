"use client";

import { useEffect, useState } from "react";
import { isUnreachable, SERVER_UNREACHABLE } from "@/components/ui/server-unreachable";

/**
 * A safety net for every form: a request that never reached the server and that no form caught itself
 * would otherwise end in silence. Shown as an alert until dismissed or until the next page.
 */
export function ConnectionNotice() {
  const [shown, setShown] = useState(false);
  useEffect(() => {
    const onRejection = (event: PromiseRejectionEvent) => {
      if (isUnreachable(event.reason)) setShown(true);
    };
    window.addEventListener("unhandledrejection", onRejection);
    return () => window.removeEventListener("unhandledrejection", onRejection);
  }, []);
  if (!shown) return null;
  return (
    <div className="notice notice-error" role="alert" data-testid="connection-notice">
      {SERVER_UNREACHABLE}{" "}
      <button type="button" className="button button-quiet" onClick={() => setShown(false)}>Dismiss</button>
    </div>
  );
}
