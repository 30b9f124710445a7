import Link from "next/link";
import { OverrideForm } from "@/components/runs/override-form";
import { StateTag } from "@/components/ui/state-tag";
import { formatAge, formatDateTime } from "@/lib/format/dates";
import { can } from "@/lib/policy/permissions";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { getCellBoard } from "@/lib/server/runs/get-cell-board";
import { cellBoardHeadline, summariseCellBoard } from "@/lib/runs/cell-board-summary";
import styles from "./cell-board.module.css";
import { getLabTimeZone } from "@/lib/server/lab/read-lab-time-zone";

export const metadata = { title: "Cell board" };

export default async function CellBoardPage() {
  const actor = await requirePageUser("run.view");
  const zone = await getLabTimeZone();
  const cells = await getCellBoard({ actor });
  const now = new Date();
  return (
    <>
      <div className="page-head">
        <div>
          <h1>Cell board</h1>
          <p className="muted">{cellBoardHeadline(summariseCellBoard(cells))}. Projected ends come from the readings so far, only where they support one.</p>
        </div>
        {can(actor.role, "run.operate") && <div className="links"><Link className="button" href="/runs/new">Start a run</Link></div>}
      </div>
      <div className={styles.board} data-testid="cell-board">
        {cells.map((cell) => (
          <section key={cell.id} className={`card ${styles.cell} ${cell.run ? styles.busy : cell.calibration.usable ? styles.free : styles.blocked}`} data-cell={cell.assetTag}>
            <h2><span className="mono">{cell.assetTag}</span>{cell.run ? <StateTag state={cell.run.state} kind="run" /> : cell.calibration.usable ? <span className="state state-ok">free</span> : <span className="state state-bad">not usable</span>}</h2>
            {cell.run ? (
              <>
                <p><Link className="mono" href={`/runs/${cell.run.labNumber}`}>{cell.run.labNumber}</Link> · specimen <span className="mono">{cell.run.specimen.labNumber}</span></p>
                <p className="muted">{cell.run.performedBy.name} · ASTM {cell.run.methodCode} · since {formatDateTime(cell.run.assignedAt, zone)} ({formatAge(cell.run.assignedAt, now)})</p>
                <p data-testid="projected-end">{cell.run.criteriaMet ? <strong>Criteria met: ready to terminate.</strong> : cell.run.projectedEnd ? <>Projected end: <strong>{formatDateTime(cell.run.projectedEnd, zone)}</strong></> : <span className="muted">{cell.run.projectionReason}</span>}</p>
              </>
            ) : (
              <>
                <p className="muted">{cell.calibration.message}</p>
                {!cell.calibration.usable && can(actor.role, "calibration.override") && cell.calibration.state !== "out-of-service" && <OverrideForm equipmentId={cell.id} assetTag={cell.assetTag} />}
              </>
            )}
          </section>
        ))}
      </div>
    </>
  );
}
