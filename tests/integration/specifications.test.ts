import { describe, expect, it } from "vitest";
import type { CurrentUser } from "@/lib/server/auth/current-user";
import { withActor } from "@/lib/server/db/transaction";
import { createProjectSpecification } from "@/lib/server/specifications/create-project-specification";
import { findProjectLimits } from "@/lib/server/specifications/find-project-limits";
import { getSpecification } from "@/lib/server/specifications/get-specification";
import { listSpecifications } from "@/lib/server/specifications/list-specifications";
import { setSpecificationLimit } from "@/lib/server/specifications/set-specification-limit";
import { codeOf, failure } from "../support/refusals";
import { db, makeProject, makeUser, unique } from "../support/factories";

// GRI-GCL3 limits as cited in shared/DOMAIN.md.
const GCL3 = [
  { property: "INDEX_FLUX", limitText: "1e-8", unit: "m3/m2/s", direction: "MAXIMUM", significantDigits: 1, conformanceMethod: "ROUNDING", testMethodCode: "D5887" },
  { property: "HYDRAULIC_CONDUCTIVITY", limitText: "5e-11", unit: "m/s", direction: "MAXIMUM", significantDigits: 1, conformanceMethod: "ROUNDING", testMethodCode: "D5084" },
  { property: "SWELL_INDEX", limitText: "24", unit: "mL/2 g", direction: "MINIMUM", significantDigits: 2, conformanceMethod: "ROUNDING", testMethodCode: null },
] as const;

async function makeTemplate(actor: CurrentUser) {
  return withActor(actor, (tx) => tx.specification.create({ data: { name: unique("Template"), isTemplate: true, limits: { create: GCL3.map((l) => ({ ...l })) } } }));
}

const kLimit = (specificationId: string, extra: Record<string, unknown> = {}) => ({
  specificationId, property: "HYDRAULIC_CONDUCTIVITY", limitText: "5e-11", unit: "m/s", direction: "MAXIMUM", conformanceMethod: "ROUNDING", testMethodCode: "D5084", ...extra,
});

describe("specification library", () => {
  it("creates a project specification from a template, copying its limits", async () => {
    const qa = await makeUser("QA_MANAGER");
    const template = await makeTemplate(qa);
    const project = await makeProject();
    const created = await createProjectSpecification({ actor: qa, input: { projectId: project.id, name: "Cell 3 liner", templateId: template.id } });
    expect(created._count.limits).toBe(3);
    const spec = await getSpecification({ actor: qa, id: created.id });
    expect(spec).toMatchObject({ name: "Cell 3 liner", isTemplate: false, inUse: true, project: { id: project.id } });
    expect(spec.limits.map(({ id: _id, ...l }) => l)).toEqual(GCL3.map((l) => ({ ...l, testingFrequencyAreaM2: null, testingFrequencyPerLot: false })));
    // A copy: the template's own rows are untouched and separate.
    const templateLimitIds = (await db().specificationLimit.findMany({ where: { specificationId: template.id } })).map((l) => l.id);
    expect(spec.limits.some((l) => templateLimitIds.includes(l.id))).toBe(false);
  });

  it("creates an empty one with a name, and refuses a template that is not one", async () => {
    const admin = await makeUser("LAB_ADMIN");
    const project = await makeProject();
    const empty = await createProjectSpecification({ actor: admin, input: { projectId: project.id, name: "Empty", templateId: "" } });
    expect(empty._count.limits).toBe(0);
    const refused = await failure(createProjectSpecification({ actor: admin, input: { projectId: project.id, name: "From a project spec", templateId: empty.id } }));
    expect(refused.code).toBe("INVALID_INPUT");
    expect(refused.fieldErrors.templateId).toMatch(/templates/);
    expect(await codeOf(createProjectSpecification({ actor: admin, input: { projectId: "no-such-project", name: "X" } }))).toBe("NOT_FOUND");
  });

  it("refuses a second limit for the same property in one specification", async () => {
    const qa = await makeUser("QA_MANAGER");
    const project = await makeProject();
    const spec = await createProjectSpecification({ actor: qa, input: { projectId: project.id, name: "Spec" } });
    await setSpecificationLimit({ actor: qa, input: kLimit(spec.id) });
    const refused = await failure(setSpecificationLimit({ actor: qa, input: kLimit(spec.id, { limitText: "1e-10" }) }));
    expect(refused.code).toBe("CONFLICT");
    expect(refused.fieldErrors.property).toMatch(/Already limited here/);
    // Changing another limit's property to one already limited is refused the same way.
    const swell = await setSpecificationLimit({ actor: qa, input: { specificationId: spec.id, property: "SWELL_INDEX", limitText: "24", unit: "mL/2 g", direction: "MINIMUM" } });
    expect(await codeOf(setSpecificationLimit({ actor: qa, input: kLimit(spec.id, { limitId: swell.id }) }))).toBe("CONFLICT");
    expect(await db().specificationLimit.count({ where: { specificationId: spec.id } })).toBe(2);
  });

  it("refuses a technician (FORBIDDEN) and a limit that fails validation (INVALID_INPUT), writing nothing", async () => {
    const qa = await makeUser("QA_MANAGER");
    const technician = await makeUser("TECHNICIAN");
    const project = await makeProject();
    const spec = await createProjectSpecification({ actor: qa, input: { projectId: project.id, name: "Spec" } });
    expect(await codeOf(setSpecificationLimit({ actor: technician, input: kLimit(spec.id) }))).toBe("FORBIDDEN");
    expect(await codeOf(createProjectSpecification({ actor: technician, input: { projectId: project.id, name: "Mine" } }))).toBe("FORBIDDEN");
    const invalid = await failure(setSpecificationLimit({ actor: qa, input: kLimit(spec.id, { limitText: "5 x 10^-11", unit: "mL" }) }));
    expect(invalid.code).toBe("INVALID_INPUT");
    expect(Object.keys(invalid.fieldErrors).sort()).toEqual(["limitText", "unit"]); // both at once, so the form shows every problem
    expect(await db().specificationLimit.count({ where: { specificationId: spec.id } })).toBe(0);
    // Everyone on the staff may look.
    expect((await getSpecification({ actor: technician, id: spec.id })).id).toBe(spec.id);
    expect(await codeOf(listSpecifications({ actor: await makeUser("CLIENT_USER") }))).toBe("FORBIDDEN");
  });

  it("updates a limit in place, and the audit trail names the person with before and after", async () => {
    const qa = await makeUser("QA_MANAGER");
    const other = await makeUser("LAB_ADMIN");
    const project = await makeProject();
    const spec = await createProjectSpecification({ actor: qa, input: { projectId: project.id, name: "Spec" } });
    const added = await setSpecificationLimit({ actor: qa, input: kLimit(spec.id) });
    const changed = await setSpecificationLimit({ actor: other, input: kLimit(spec.id, { limitId: added.id, limitText: "5.0e-11", conformanceMethod: "ABSOLUTE" }) });
    expect(changed).toMatchObject({ id: added.id, limitText: "5.0e-11", significantDigits: 2, conformanceMethod: "ABSOLUTE" });
    const rows = await db().auditLog.findMany({ where: { tableName: "SpecificationLimit", rowId: added.id }, orderBy: { id: "asc" } });
    expect(rows.map((r) => [r.operation, r.actorId])).toEqual([["INSERT", qa.id], ["UPDATE", other.id]]);
    expect(rows[1]!.before).toMatchObject({ limitText: "5e-11", significantDigits: 1, conformanceMethod: "ROUNDING" });
    expect(rows[1]!.after).toMatchObject({ limitText: "5.0e-11", significantDigits: 2, conformanceMethod: "ABSOLUTE" });
    // A limit of another specification cannot be changed through this one.
    const elsewhere = await createProjectSpecification({ actor: qa, input: { projectId: project.id, name: "Other" } });
    expect(await codeOf(setSpecificationLimit({ actor: qa, input: kLimit(elsewhere.id, { limitId: added.id }) }))).toBe("NOT_FOUND");
  });

  it("findProjectLimits gives the newest specification's limits by property, or null", async () => {
    const qa = await makeUser("QA_MANAGER");
    const template = await makeTemplate(qa);
    const project = await makeProject();
    expect(await findProjectLimits({ projectId: project.id })).toBeNull();
    await createProjectSpecification({ actor: qa, input: { projectId: project.id, name: "Older", templateId: template.id } });
    const newer = await createProjectSpecification({ actor: qa, input: { projectId: project.id, name: "Newer" } });
    await setSpecificationLimit({ actor: qa, input: kLimit(newer.id, { limitText: "1e-10" }) });

    const limits = await findProjectLimits({ projectId: project.id });
    expect(limits).toMatchObject({ specificationId: newer.id, specificationName: "Newer" });
    expect(limits!.limits).toHaveLength(1);
    expect(limits!.get("HYDRAULIC_CONDUCTIVITY")).toMatchObject({ limitText: "1e-10", unit: "m/s", direction: "MAXIMUM", significantDigits: 1 });
    expect(limits!.get("INDEX_FLUX")).toBeNull();
    // Inside a transaction, as certificate issuing reads it.
    const inTx = await withActor(qa, (tx) => findProjectLimits({ projectId: project.id, tx }));
    expect(inTx?.specificationId).toBe(newer.id);
    // The list shows the project with both, newest first.
    const list = await listSpecifications({ actor: qa });
    expect(list.projects.find((p) => p.id === project.id)?.specifications.map((s) => s.name)).toEqual(["Newer", "Older"]);
    expect(list.templates.some((t) => t.id === template.id)).toBe(true);
  });
});
