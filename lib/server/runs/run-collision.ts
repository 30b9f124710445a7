import "server-only";
import { holdsCell, RUN_STATES, type RunStateName } from "@/lib/runs/run-state-machine";
import { AppError } from "@/lib/errors/app-error";
import { getDb } from "../db/client";
import { isUniqueViolation } from "../db/database-fault";

/** Run states in which a run holds its cell and its specimen (the partial unique indexes list the same). */
export const ACTIVE_RUN_STATES = RUN_STATES.filter((s) => holdsCell(s as RunStateName));

/**
 * When the database refused a second active run on one cell or one specimen (someone else started a run
 * at the same moment), the sentence that names the run that won; null for any other error.
 */
export async function explainRunCollision(error: unknown, target: { cellId: string; specimenId: string }): Promise<AppError | null> {
  const onCell = isUniqueViolation(error, "run_one_active_per_cell");
  const onSpecimen = !onCell && isUniqueViolation(error, "run_one_active_per_specimen");
  if (!onCell && !onSpecimen) return null;
  const winner = await getDb().run.findFirst({
    where: { ...(onCell ? { cellId: target.cellId } : { specimenId: target.specimenId }), state: { in: ACTIVE_RUN_STATES } },
    select: { labNumber: true, cell: { select: { assetTag: true } }, specimen: { select: { labNumber: true } } },
  });
  const run = winner ? `run ${winner.labNumber}` : "another run";
  if (onCell)
    return new AppError("CONFLICT", `${winner?.cell.assetTag ?? "That cell"} was taken a moment ago by ${run}; choose a free cell.`, { fieldErrors: { cellId: "Not free." }, details: { collidedWith: winner?.labNumber } });
  return new AppError("CONFLICT", `${winner?.specimen.labNumber ?? "That specimen"} was mounted a moment ago in ${run}; choose another specimen.`, { fieldErrors: { specimenId: "Already in a run." }, details: { collidedWith: winner?.labNumber } });
}
