import { formatDateTime } from "@/lib/format/dates";
import { formatPressure } from "@/lib/units/pressure-entry";
import { ScrollArea } from "@/components/ui/scroll-area";

type Stage = { id: string; sequence: number; kind: string; cellPressurePa: number; influentPressurePa: number; effluentPressurePa: number; startedAt: Date; endedAt: Date | null; marginAcknowledged: boolean; departureNote?: string | null; recordedBy: { name: string } };
const KIND: Record<string, string> = { SATURATION: "Saturation", BACK_PRESSURE: "Back-pressure", EQUILIBRATION: "Equilibration", PERMEATION: "Permeation" };

export function RunStagesTable({ stages, pressureUnit, zone = "UTC" }: { stages: Stage[]; pressureUnit: "KPA" | "PSI"; zone?: string }) {
  if (stages.length === 0) return <p className="empty">No stage recorded yet: start with saturation.</p>;
  return (
    <ScrollArea>
      <table className="list" data-testid="stages">
        <thead><tr><th>#</th><th>Stage</th><th>Cell</th><th>Influent</th><th>Effluent</th><th>From</th><th>To</th><th>By</th></tr></thead>
        <tbody>
          {stages.map((s) => (
            <tr key={s.id}>
              <td>{s.sequence}</td>
              <td>{KIND[s.kind] ?? s.kind}{s.marginAcknowledged && <div className="state state-warn" title={s.departureNote ?? undefined}>departure acknowledged</div>}</td>
              <td>{formatPressure(s.cellPressurePa, pressureUnit)}</td><td>{formatPressure(s.influentPressurePa, pressureUnit)}</td><td>{formatPressure(s.effluentPressurePa, pressureUnit)}</td>
              <td>{formatDateTime(s.startedAt, zone)}</td><td>{s.endedAt ? formatDateTime(s.endedAt, zone) : "running"}</td><td>{s.recordedBy.name}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollArea>
  );
}
