import "server-only";
import type { SpecificationLimitRow, TestProperty } from "@/lib/results/property-units";
import { getDb, type Db } from "../db/client";
import type { Tx } from "../db/transaction";
import { limitOrder, limitSelect } from "./limit-select";

export type ProjectLimit = SpecificationLimitRow;

export type ProjectLimits = {
  specificationId: string;
  specificationName: string;
  /** The specification's own revision as its document states it ("" when not given). */
  specificationRevision: string;
  /** In the order of the TestProperty enum. */
  limits: ProjectLimit[];
  /** The limit for one property, or null when the specification does not limit it. */
  get(property: TestProperty): ProjectLimit | null;
};

/**
 * The limits a project's results are judged against, by property: those of the project's newest
 * specification (by creation), or null when it has none. No permission check: a building block for
 * operations that have made their own (certificate issuing). Pass `tx` to read inside a transaction.
 */
export async function findProjectLimits(options: { projectId: string; specificationId?: string; tx?: Tx | Pick<Db, "specification"> }): Promise<ProjectLimits | null> {
  const db = options.tx ?? getDb();
  const specification = await db.specification.findFirst({
    // A certificate draft may name one of the project's specifications; otherwise the newest applies.
    where: { projectId: options.projectId, isTemplate: false, ...(options.specificationId ? { id: options.specificationId } : {}) },
    orderBy: [{ createdAt: "desc" }, { id: "desc" }],
    select: { id: true, name: true, revision: true, limits: { orderBy: limitOrder, select: limitSelect } },
  });
  if (!specification) return null;
  const byProperty = new Map<TestProperty, ProjectLimit>(specification.limits.map((limit) => [limit.property, limit]));
  return {
    specificationId: specification.id,
    specificationName: specification.name,
    specificationRevision: specification.revision,
    limits: specification.limits,
    get: (property) => byProperty.get(property) ?? null,
  };
}
