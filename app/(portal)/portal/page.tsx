import Link from "next/link";
import { QueueCard } from "@/components/ui/queue-card";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { getHomeQueues } from "@/lib/server/queues/get-home-queues";

export const metadata = { title: "Our projects" };

export default async function PortalHomePage() {
  const user = await requirePageUser("portal.view");
  const { projects } = await getHomeQueues(user);
  const list = projects ?? [];
  return (
    <>
      <h1>Our projects</h1>
      <p className="muted">Samples your organisation sent to the laboratory and how far testing has come.</p>
      <QueueCard title="Projects" count={list.length} empty="The laboratory holds no samples for your organisation yet." testId="portal-projects">
        <table className="list">
          <thead><tr><th>Project</th><th>Site</th><th>Rolls received</th><th>In testing</th><th>Tested</th></tr></thead>
          <tbody>
            {list.map((p) => (
              <tr key={p.id}><td><Link href={`/portal/projects/${encodeURIComponent(p.code)}`}>{p.name}</Link><div className="muted mono">{p.code}</div></td><td>{p.siteName}</td><td>{p.rollCount}</td><td>{p.rollsUnderTest}</td><td>{p.rollsTested}</td></tr>
            ))}
          </tbody>
        </table>
      </QueueCard>
    </>
  );
}
