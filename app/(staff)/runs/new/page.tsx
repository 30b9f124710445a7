import { AssignForm } from "@/components/runs/assign-form";
import { PressureCaution } from "@/components/runs/pressure-caution";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { getAssignmentOptions } from "@/lib/server/runs/get-assignment-options";
import { getLabTimeZone } from "@/lib/server/lab/read-lab-time-zone";

export const metadata = { title: "Start a run" };

export default async function NewRunPage({ searchParams }: { searchParams: Promise<{ specimen?: string }> }) {
  const actor = await requirePageUser("run.operate");
  const [{ specimens, instruments }, { specimen }, zone] = await Promise.all([getAssignmentOptions({ actor }), searchParams, getLabTimeZone()]);
  return (
    <>
      <h1>Start a run</h1>
      <p className="muted">Mount a prepared specimen in a free cell. Equipment past its calibration date is refused unless a QA manager has allowed it with a reason.</p>
      <PressureCaution />
      <section className="card" style={{ maxWidth: "40rem" }}>
        {specimens.length === 0 ? <p className="empty">No prepared specimen is waiting for a cell.</p> : <AssignForm specimens={specimens} instruments={instruments} pressureUnit={actor.pressureUnit} preselectedSpecimenId={specimen} zone={zone} />}
      </section>
    </>
  );
}
