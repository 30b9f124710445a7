import Link from "next/link";
import { Fragment } from "react";
import { labNumberAddress } from "@/lib/numbering/lab-number-address";

const LAB_NUMBER = /\b([SRCPTQ]\d{2}-\d{5,})\b/g;

/** Text in which every lab number becomes a link to its item, e.g. in "already logged as R26-00012". */
export function LabNumberLinks({ text }: { text: string }) {
  const parts = text.split(LAB_NUMBER);
  return (
    <>
      {parts.map((part, i) =>
        i % 2 === 1 ? <Link key={i} href={labNumberAddress(part)!} className="mono">{part}</Link> : <Fragment key={i}>{part}</Fragment>,
      )}
    </>
  );
}
