import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { INDEX_METHODS, isIndexMethodCode } from "@/lib/index-tests/index-test-methods";
import { reviewIndexTestSchema } from "@/lib/validation/index-tests";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { withActor } from "../db/transaction";
import { parseOrThrow } from "../validation/parse";

/**
 * A QA manager approves an index test awaiting review, or returns it with what to change (the technician
 * then records it again, pointing at this one). Nobody approves a test they performed; the database
 * refuses it too.
 */
export async function reviewIndexTest(options: { actor: CurrentUser; input: unknown; now?: Date }) {
  requirePermission(options.actor, "run.review");
  const input = parseOrThrow(reviewIndexTestSchema, options.input);
  const now = options.now ?? new Date();
  return withActor(options.actor, async (tx) => {
    const test = await tx.indexTest.findUnique({ where: { id: input.indexTestId }, select: { id: true, state: true, version: true, performedById: true, methodCode: true, roll: { select: { labNumber: true } } } });
    if (!test) throw new AppError("NOT_FOUND");
    const what = `${isIndexMethodCode(test.methodCode) ? INDEX_METHODS[test.methodCode].title : test.methodCode} on roll ${test.roll.labNumber}`;
    if (input.decision === "APPROVED" && test.performedById === options.actor.id)
      throw new AppError("FORBIDDEN", `You performed the ${what}, so another QA manager must review it.`);
    if (test.version !== input.version) throw new AppError("CONFLICT", `The ${what} was changed since you opened it; reload and review again.`);
    if (test.state !== "SUBMITTED") throw new AppError("ILLEGAL_TRANSITION", `The ${what} is not awaiting review (it is ${test.state === "APPROVED" ? "approved" : "returned"}).`);
    await tx.indexTestReview.create({ data: { indexTestId: test.id, reviewerId: options.actor.id, decision: input.decision, comments: input.comments, createdAt: now } });
    await tx.indexTest.update({
      where: { id: test.id },
      data: input.decision === "APPROVED"
        ? { state: "APPROVED", approvedById: options.actor.id, approvedAt: now, version: { increment: 1 } }
        : { state: "RETURNED", version: { increment: 1 } },
    });
    return { id: test.id, rollLabNumber: test.roll.labNumber, decision: input.decision };
  });
}
