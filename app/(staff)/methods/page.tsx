import Link from "next/link";
import { formatDateTime } from "@/lib/format/dates";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { listMethodSettings } from "@/lib/server/methods/list-method-settings";

export const metadata = { title: "Methods" };

export default async function MethodsPage() {
  const actor = await requirePageUser("run.view");
  const methods = await listMethodSettings({ actor });
  return (
    <>
      <div className="page-head">
        <div>
          <h1>Test methods</h1>
          <p className="muted">Each method&apos;s lab-adjustable settings: termination criteria, stage pressures, the apparatus leakage limit and uncertainty values. Every change is a new version with its reason; a run is judged by the version in force when it started.</p>
        </div>
      </div>
      <section className="card">
        <table className="list" data-testid="methods">
          <thead><tr><th>Method</th><th>Settings in force</th><th>Since</th><th>Reason</th></tr></thead>
          <tbody>
            {methods.map((m) => {
              const latest = m.versions[0];
              return (
                <tr key={m.code}>
                  <td><Link href={`/methods/${m.code}`}>ASTM {m.code}</Link><div className="muted">{m.title}</div></td>
                  <td>{latest ? `version ${latest.version}` : "defaults"}</td>
                  <td>{latest ? formatDateTime(latest.createdAt) : "—"}</td>
                  <td>{latest?.reason ?? "—"}</td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </section>
    </>
  );
}
