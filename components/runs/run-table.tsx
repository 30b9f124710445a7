import Link from "next/link";
import { formatDate } from "@/lib/format/dates";
import { StateTag } from "@/components/ui/state-tag";

type RunRow = {
  id: string; labNumber: string; methodCode: string; state: string; assignedAt: Date; submittedAt: Date | null;
  cell: { assetTag: string }; specimen: { labNumber: string }; performedBy: { name: string };
};

export function RunTable({ runs, linkTo = "run", zone = "UTC" }: { runs: RunRow[]; linkTo?: "run" | "review"; zone?: string }) {
  return (
    <table className="list">
      <thead><tr><th>Run</th><th>Method</th><th>Specimen</th><th>Cell</th><th>Assigned</th><th>Technician</th><th>State</th></tr></thead>
      <tbody>
        {runs.map((r) => (
          <tr key={r.id}>
            <td><Link className="mono" href={`/${linkTo === "review" ? "review" : "runs"}/${r.labNumber}`}>{r.labNumber}</Link></td><td>ASTM {r.methodCode}</td><td className="mono">{r.specimen.labNumber}</td>
            <td className="mono">{r.cell.assetTag}</td><td>{formatDate(r.assignedAt, zone)}</td>
            <td>{r.performedBy.name}</td><td><StateTag state={r.state} kind="run" /></td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
