import { timeZoneStatement } from "@/lib/format/time-zone";

type LetterheadData = { name: string; address: string; accreditation: string | null; timeZone?: string };

/**
 * The lab's name and address at the top of every printed document, and the time zone its times are in
 * (`at` is the document's own date, for the zone's offset on that day). `zoneStated` is set where the
 * document says it elsewhere (the certificate, in its closing statements).
 */
export function Letterhead({ lab, at, zoneStated = false }: { lab: LetterheadData; at?: Date; zoneStated?: boolean }) {
  return (
    <header className="doc-letterhead">
      <div>
        <div className="doc-lab-name">{lab.name}</div>
        {lab.address ? <div className="doc-lab-address">{lab.address}</div> : null}
      </div>
      <div className="doc-lab-accreditation">
        {lab.accreditation ? <div>{lab.accreditation}</div> : null}
        {zoneStated ? null : <div className="doc-small" data-testid="document-time-zone">{timeZoneStatement(lab.timeZone ?? "UTC", at)}</div>}
      </div>
    </header>
  );
}
