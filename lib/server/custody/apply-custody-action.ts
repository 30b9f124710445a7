import "server-only";
import { transition, type CustodyActionName, type ItemKind, type ItemStateName } from "@/lib/custody/state-machine";
import { AppError } from "@/lib/errors/app-error";
import type { Actor, Tx } from "../db/transaction";
import { CUSTODY_ITEM_FIELD } from "./item-fields";

type ItemRow = { id: string; labNumber: string; state: ItemStateName; version: number; storageLocationId: string | null };

async function findItem(tx: Tx, kind: ItemKind, id: string): Promise<ItemRow | null> {
  const select = { id: true, labNumber: true, state: true, version: true, storageLocationId: true } as const;
  if (kind === "roll") return tx.roll.findUnique({ where: { id }, select });
  if (kind === "coupon") return tx.coupon.findUnique({ where: { id }, select });
  return tx.specimen.findUnique({ where: { id }, select });
}

async function updateItem(tx: Tx, kind: ItemKind, id: string, version: number, data: { state: ItemStateName; storageLocationId?: string | null; retainUntil?: Date | null }) {
  const args = { where: { id, version }, data: { ...data, version: { increment: 1 } } };
  if (kind === "roll") return tx.roll.updateMany(args);
  if (kind === "coupon") return tx.coupon.updateMany(args);
  return tx.specimen.updateMany(args);
}

/**
 * Applies one custody action to a roll, coupon or specimen inside the caller's transaction: asks the
 * state machine, refuses an illegal step with what is allowed, checks the version the person saw (when
 * given), updates state and location, and records the custody event with who, when, where and from/to.
 */
export async function applyCustodyAction(
  tx: Tx,
  options: {
    actor: Actor;
    kind: ItemKind;
    id: string;
    action: CustodyActionName;
    expectedVersion?: number;
    toLocationId?: string | null;
    retainUntil?: Date | null;
    note?: string;
    at?: Date;
  },
): Promise<{ labNumber: string; fromState: ItemStateName; toState: ItemStateName }> {
  const item = await findItem(tx, options.kind, options.id);
  if (!item) throw new AppError("NOT_FOUND", `That ${options.kind} does not exist.`);
  if (options.expectedVersion !== undefined && options.expectedVersion !== item.version)
    throw new AppError("CONFLICT", `${item.labNumber} was changed by someone else since you opened it; reload the page and try again.`);
  const step = transition(options.kind, item.state, options.action);
  if (!step.ok) throw new AppError("ILLEGAL_TRANSITION", `${item.labNumber}: ${step.message}`, { details: { allowed: step.allowed } });

  const toLocationId = options.toLocationId === undefined ? item.storageLocationId : options.toLocationId;
  const updated = await updateItem(tx, options.kind, item.id, item.version, {
    state: step.toState,
    storageLocationId: toLocationId,
    ...(options.retainUntil !== undefined ? { retainUntil: options.retainUntil } : {}),
  });
  if (updated.count !== 1) throw new AppError("CONFLICT", `${item.labNumber} was changed by someone else at the same moment; reload and try again.`);

  await tx.custodyEvent.create({
    data: {
      action: options.action,
      [CUSTODY_ITEM_FIELD[options.kind]]: item.id,
      fromState: item.state,
      toState: step.toState,
      fromLocationId: item.storageLocationId,
      toLocationId,
      actorId: options.actor.id,
      occurredAt: options.at ?? new Date(),
      note: options.note ?? "",
    },
  });
  return { labNumber: item.labNumber, fromState: item.state, toState: step.toState };
}
