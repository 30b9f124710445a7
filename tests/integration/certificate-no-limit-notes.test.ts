import { describe, expect, it } from "vitest";
import { withActor } from "@/lib/server/db/transaction";
import { createCertificateDraft } from "@/lib/server/certificates/create-certificate-draft";
import { getDraftEditor } from "@/lib/server/certificates/get-draft-editor";
import { issueCertificate } from "@/lib/server/certificates/issue-certificate";
import { listCertifiableResults } from "@/lib/server/certificates/list-certifiable-results";
import { db, makeUser, TEST_PASSWORD } from "../support/factories";
import { approvedRun } from "../support/approved-run";
import { failure } from "../support/refusals";

const SYSTEM = { id: "system:test" };


/** A project specification limiting only the properties given (invented values). */
function makeSpecification(projectId: string, name: string, limits: Array<"INDEX_FLUX" | "HYDRAULIC_CONDUCTIVITY">) {
  const rows = { INDEX_FLUX: { property: "INDEX_FLUX" as const, limitText: "1e-8", unit: "m3/m2/s", direction: "MAXIMUM" as const, significantDigits: 1 }, HYDRAULIC_CONDUCTIVITY: { property: "HYDRAULIC_CONDUCTIVITY" as const, limitText: "5e-11", unit: "m/s", direction: "MAXIMUM" as const, significantDigits: 1 } };
  return withActor(SYSTEM, (tx) => tx.specification.create({ data: { name, projectId, limits: { create: limits.map((l) => rows[l]) } } }));
}

describe("a result the chosen specification sets no limit for", () => {
  it("is marked beforehand, on the new-certificate screen and in the draft editor, with the words signing then refuses it with", async () => {
    const [technician, qa] = await Promise.all([makeUser("TECHNICIAN"), makeUser("QA_MANAGER")]);
    const { run, project, flux, k } = await approvedRun(technician.id, qa);
    const both = await makeSpecification(project.id, "Both limits", ["INDEX_FLUX", "HYDRAULIC_CONDUCTIVITY"]);
    const fluxOnly = await makeSpecification(project.id, "Flux only", ["INDEX_FLUX"]);
    const expected = `Flux only sets no limit for hydraulic conductivity (20 °C) (the result of ${run.labNumber}): choose a specification that does, or leave the result out.`;

    // The new-certificate screen judges by the newest specification, as a new draft does.
    const group = (await listCertifiableResults({ actor: qa })).find((g) => g.project.id === project.id)!;
    expect(group.noLimit).toEqual({ [k]: expected });

    const certificate = await createCertificateDraft({ actor: qa, input: { projectId: project.id, resultIds: [flux, k] } });
    const draft = await db().certificateRevision.findFirstOrThrow({ where: { certificateId: certificate.id } });
    const editor = await getDraftEditor({ actor: qa, revisionId: draft.id });
    expect(editor.content.specificationId).toBe(fluxOnly.id);
    const byId = new Map(editor.results.map((r) => [r.id, r.noLimit]));
    expect(byId.get(k)).toEqual({ [fluxOnly.id]: expected });
    expect(byId.get(flux)).toEqual({});
    expect(byId.get(k)).not.toHaveProperty(both.id);

    const refused = await failure(issueCertificate({ actor: qa, input: { revisionId: draft.id, password: TEST_PASSWORD } }));
    expect(refused.message).toBe(`Nothing was signed. ${expected}`);
  });
});
