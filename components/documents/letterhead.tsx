import type { Letterhead as LetterheadData } from "@/lib/server/lab/get-letterhead";

/** The lab's name and address at the top of every printed document. */
export function Letterhead({ lab }: { lab: LetterheadData }) {
  return (
    <header className="doc-letterhead">
      <div>
        <div className="doc-lab-name">{lab.name}</div>
        {lab.address ? <div className="doc-lab-address">{lab.address}</div> : null}
      </div>
      {lab.accreditation ? <div className="doc-lab-accreditation">{lab.accreditation}</div> : null}
    </header>
  );
}
