import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it, vi } from "vitest";

vi.mock("next/navigation", () => ({ useRouter: () => ({ push: () => {}, refresh: () => {} }) }));
vi.mock("@/app/(staff)/certificates/actions", () => ({ editCertificateDraftAction: async () => ({ ok: true }), createCertificateDraftAction: async () => ({ ok: true }) }));

const { EditDraftForm } = await import("@/components/certificates/edit-draft-form");
const { DraftCertificateForm } = await import("@/components/certificates/draft-certificate-form");

// The words signing refuses a result with, shown beside it beforehand (the loaders are checked with the database).
const WORDS = "Flux only sets no limit for hydraulic conductivity (20 °C) (the result of H26-00017): choose a specification that does, or leave the result out.";
const notes = (markup: string) => [...markup.matchAll(/data-testid="no-limit">([^<]*(?:<!-- -->)?[^<]*)</g)].map((m) => m[1]!.replace("<!-- -->", ""));

function editor(specificationId: string | null) {
  return renderToStaticMarkup(createElement(EditDraftForm, {
    revisionId: "rev1",
    content: { version: 1, resultIds: ["k", "flux"], indexResultIds: [], specificationId, remarks: "", signatoryId: null, unitSystem: "SI" },
    results: [{ id: "k", label: "H26-00017 · k20", noLimit: { spec2: WORDS } }, { id: "flux", label: "H26-00017 · flux", noLimit: {} }],
    indexResults: [],
    specifications: [{ id: "spec1", label: "Both limits" }, { id: "spec2", label: "Flux only" }],
    signatories: [],
  }));
}

describe("a result the chosen specification sets no limit for", () => {
  it("is marked in the draft editor for the specification chosen, and only then", () => {
    expect(notes(editor("spec2"))).toEqual([`Signing will refuse it: ${WORDS}`]);
    expect(notes(editor("spec1"))).toEqual([]);
    expect(notes(editor(null))).toEqual([]);
  });

  it("is marked on the new-certificate screen", () => {
    const markup = renderToStaticMarkup(createElement(DraftCertificateForm, { groups: [{
      project: { id: "p1", name: "Cell 4", code: "MWA-C4", client: "Marrowdale" },
      results: [{ id: "k", label: "H26-00017 · k20", limited: false, noLimit: WORDS, shipment: "S1" }, { id: "flux", label: "H26-00017 · flux", limited: true, noLimit: null, shipment: "S1" }],
      indexResults: [],
    }] }));
    expect(notes(markup)).toEqual([`Signing will refuse it: ${WORDS}`]);
  });
});
