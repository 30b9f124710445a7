import { StaffQueues } from "@/components/home/staff-queues";
import { ROLE_LABELS } from "@/lib/policy/permissions";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { getHomeQueues } from "@/lib/server/queues/get-home-queues";
import { getLabTimeZone } from "@/lib/server/lab/read-lab-time-zone";

export const metadata = { title: "Today" };

export default async function StaffHomePage() {
  const user = await requirePageUser("workspace.view");
  const zone = await getLabTimeZone();
  const queues = await getHomeQueues(user);
  return (
    <>
      <h1>Today</h1>
      <p className="muted">Work waiting for you ({ROLE_LABELS[user.role]}), oldest first.</p>
      <StaffQueues zone={zone} queues={queues} now={new Date()} />
    </>
  );
}
