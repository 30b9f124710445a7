import "server-only";
import type { CertificateSample, CertificateSnapshot, CertificateTest } from "@/lib/certificates/certificate-snapshot";
import { verificationUrl } from "@/lib/certificates/verification-code";
import { ROLE_LABELS } from "@/lib/policy/permissions";
import { conformanceSummary } from "@/lib/results/conformance-summary";
import { COVERAGE_STATEMENT, formatPropertyUncertainty, formatPropertyValue } from "@/lib/format/result-numbers";
import { decisionRuleText } from "@/lib/certificates/decision-rule";
import { revisionChanges } from "@/lib/certificates/revision-changes";
import type { CertificateSpecimen } from "@/lib/certificates/certificate-snapshot";
import { runDeviations } from "@/lib/runs/deviations";
import { contributorText, readResultRecord, type ResultRecord } from "@/lib/results/result-record";
import { AppError } from "@/lib/errors/app-error";
import type { CurrentUser } from "../auth/current-user";
import type { Tx } from "../db/transaction";
import { evaluateRunRecords } from "../runs/evaluate-run-records";
import { findProjectLimits } from "../specifications/find-project-limits";
import { readDraftContent } from "./draft-content";
import { buildIndexTestEntries } from "./build-index-test-entries";
import { loadProjectConformance } from "../conformance/load-project-conformance";
import { certificateCoverage } from "@/lib/certificates/property-coverage";
import { TEST_PROPERTY_LABELS, type TestProperty } from "@/lib/results/property-units";

const PROPERTY_LABELS: Record<string, string> = { INDEX_FLUX: "Index flux", HYDRAULIC_CONDUCTIVITY: "Hydraulic conductivity at 20 °C" };
const ACTION_WORDS: Record<string, string> = { RECEIVED: "received", STORED: "stored", CUT: "cut", PREPARED: "prepared", ASSIGNED: "mounted in a cell", TEST_STARTED: "permeation started", TESTED: "tested" };
const iso = (d: Date | null | undefined) => (d ? d.toISOString() : null);

/** What a result's record adds to its test on the certificate: calculation, criteria and settings version, leakage check, refills. */
function recordLines(record: ResultRecord): Pick<CertificateTest, "calculation" | "criteria" | "leakage" | "refills"> {
  return {
    calculation: record.calculation.text,
    criteria: {
      settings: record.settings.label,
      chosen: record.settings.chosen ? `chosen by ${record.settings.chosen.by}: ${record.settings.chosen.reason}` : null,
      lines: record.criteria.map((c) => ({ name: c.name, limit: c.limit, met: c.met })),
    },
    leakage: "statement" in record.leakage ? record.leakage.statement : record.leakage.notRecorded,
    refills: record.refills,
  };
}

const hoursBetween = (from: Date | null | undefined, to: Date | null | undefined) => (from && to ? (to.getTime() - from.getTime()) / 3_600_000 : null);

/**
 * Everything a certificate revision will say, from its newest draft content (results included,
 * specification, remarks, signatory, units): read inside the issuing transaction and frozen with it, or
 * read for a preview of the draft. `signer` signs unless the draft names its signatory.
 */
export async function buildCertificateSnapshot(tx: Tx, options: { revisionId: string; signer: CurrentUser; meaning: string; now: Date; baseUrl: string }): Promise<CertificateSnapshot> {
  const revision = await tx.certificateRevision.findUnique({
    where: { id: options.revisionId },
    include: {
      supersedes: { select: { revision: true, snapshot: true } },
      certificate: { include: { project: true, clientOrganization: { include: { contacts: { where: { active: true }, orderBy: { createdAt: "asc" }, take: 1 } } } } },
      results: { include: { result: { include: { approvedBy: { select: { name: true } } } } } },
    },
  });
  if (!revision) throw new AppError("NOT_FOUND");
  const content = await readDraftContent(tx, revision.id);
  const included = new Set(content.resultIds);
  revision.results = revision.results.filter((r) => included.has(r.resultId));
  const lab = await tx.laboratory.findUnique({ where: { id: "lab" } });
  const { certificate } = revision;
  const limits = content.specificationId ? await findProjectLimits({ projectId: certificate.projectId, specificationId: content.specificationId, tx }) : null;
  const signatory = content.signatoryId ? await tx.user.findUnique({ where: { id: content.signatoryId }, select: { name: true, role: true } }) : null;

  const runIds = [...new Set(revision.results.map((r) => r.result.runId))];
  const runs = await tx.run.findMany({
    where: { id: { in: runIds } },
    orderBy: { labNumber: "asc" },
    include: {
      method: { select: { code: true, title: true, edition: true } },
      cell: { select: { assetTag: true } },
      performedBy: { select: { name: true } },
      stages: { orderBy: { sequence: "asc" } },
      reviews: { where: { decision: "APPROVED" }, orderBy: { createdAt: "desc" }, take: 1, include: { reviewer: { select: { name: true } } } },
      _count: { select: { readings: { where: { correctsId: { not: null } } } } },
      specimen: { include: { checklist: true, coupon: { include: { roll: { include: { shipment: true } } } } } },
    },
  });

  const tests: CertificateTest[] = [];
  const samples = new Map<string, CertificateSample>();
  for (const run of runs) {
    const { evaluation, inputReadings, refillsAtS } = await evaluateRunRecords(tx, run.id);
    const reportedWindow = evaluation ? evaluation.intervals.slice(-evaluation.settings.consecutiveIntervals) : [];
    const saturation = run.stages.find((s) => s.kind === "SATURATION") ?? run.stages.find((s) => s.kind === "BACK_PRESSURE");
    const equilibration = run.stages.find((s) => s.kind === "EQUILIBRATION");
    const runResults = revision.results.filter((r) => r.result.runId === run.id);
    // Every result of a run is approved at once and carries the same record of how it was obtained.
    const record = runResults.map((r) => readResultRecord(r.result.evaluation)).find((r) => r !== null) ?? null;
    const permeation = run.stages.find((s) => s.kind === "PERMEATION");
    // The temperature flux was measured at: the mean over the reported intervals (all readings before any interval exists).
    const temperatures = reportedWindow.length ? reportedWindow.map((iv) => iv.temperatureC) : inputReadings.map((r) => r.temperatureC);
    const permeant = run.permeantName ? [run.permeantName, run.permeantSalt, run.permeantMolarityMolPerL ? `${run.permeantMolarityMolPerL} mol/L` : null].filter(Boolean).join(", ") : "de-aired water";
    const specimen: CertificateSpecimen = {
      dieDiameterMm: run.specimen.dieDiameterMm,
      areaMm2: (Math.PI * run.specimen.dieDiameterMm ** 2) / 4,
      initialThicknessMm: run.specimen.initialThicknessMm,
      initialMassG: run.specimen.initialMassG,
      postTestThicknessMm: run.postTestThicknessMm,
      postTestMassG: run.postTestMassG,
      moistureContentPct: run.specimen.moistureContentPct,
      hydrationHours: hoursBetween(saturation?.startedAt, permeation?.startedAt),
      equilibrationHours: hoursBetween(equilibration?.startedAt, equilibration?.endedAt ?? permeation?.startedAt),
      effectiveStressKPa: run.effectiveStressPa === null ? null : run.effectiveStressPa / 1000,
      gradient: reportedWindow.length ? reportedWindow.reduce((a, iv) => a + iv.gradient, 0) / reportedWindow.length : null,
      permeant,
    };
    const roll = run.specimen.coupon.roll;
    tests.push({
      runLabNumber: run.labNumber,
      specimenLabNumber: run.specimen.labNumber,
      rollLabNumber: roll.labNumber,
      method: run.method,
      dates: { mountedAt: run.assignedAt.toISOString(), permeationStartedAt: iso(permeation?.startedAt), permeationEndedAt: iso(run.terminatedAt ?? permeation?.endedAt) },
      specimen,
      conditions: {
        effectiveStressKPa: run.effectiveStressPa === null ? null : run.effectiveStressPa / 1000,
        headKPa: permeation ? (permeation.influentPressurePa - permeation.effluentPressurePa) / 1000 : null,
        meanHeadM: reportedWindow.length ? reportedWindow.reduce((a, iv) => a + iv.headM, 0) / reportedWindow.length : null,
        permeant,
        meanTemperatureC: temperatures.length ? temperatures.reduce((a, t) => a + t, 0) / temperatures.length : null,
        cell: run.cell.assetTag,
        thicknessMm: run.postTestThicknessMm,
      },
      terminatedAt: iso(run.terminatedAt),
      termination: run.terminationKind === "EARLY_END" ? `ended early: ${run.terminationReason}` : "termination criteria met",
      deviations: runDeviations({ ...run, checklist: run.specimen.checklist, correctedReadings: run._count.readings, leakage: record && "flagged" in record.leakage && record.leakage.flagged ? record.leakage : null }),
      ...(record && recordLines(record)),
      results: runResults
        .map(({ result }) => {
          const limit = limits?.get(result.property) ?? null;
          const uncertainty = readResultRecord(result.evaluation)?.uncertainty;
          return {
            property: result.property,
            label: PROPERTY_LABELS[result.property] ?? result.property,
            value: result.value,
            unit: result.unit,
            display: formatPropertyValue(result.property, result.value, result.unit, content.unitSystem).text,
            expandedUncertainty: result.expandedUncertainty,
            uncertaintyDisplay: formatPropertyUncertainty(result.property, result.expandedUncertainty, result.value, result.unit, content.unitSystem),
            coverage: COVERAGE_STATEMENT,
            conformance: limit ? conformanceSummary({ value: result.value, unit: result.unit }, limit) : null,
            ...(uncertainty?.stated && { uncertaintyContributors: uncertainty.contributors.slice(0, 3).map(contributorText) }),
            ...(uncertainty && !uncertainty.stated && { uncertaintyNote: uncertainty.reason }),
          };
        }),
      chart: (evaluation?.intervals ?? []).map((iv) => ({ hours: iv.toS / 3600, flux: iv.flux, k20: iv.k20 })),
      refillHours: refillsAtS.map((s) => s / 3600),
      performedBy: run.performedBy.name,
      approvedBy: run.reviews[0]?.reviewer.name ?? revision.results.find((r) => r.result.runId === run.id)?.result.approvedBy?.name ?? "—",
      approvedAt: iso(run.reviews[0]?.createdAt) ?? "",
    });

    if (!samples.has(roll.id)) samples.set(roll.id, await rollSample(tx, roll, [{ couponId: run.specimen.couponId }, { specimenId: run.specimen.id }]));
  }

  // Index tests the draft includes, and the rolls (and coupons) they were done on.
  const index = await buildIndexTestEntries(tx, { indexResultIds: content.indexResultIds, limits, unitSystem: content.unitSystem });
  for (const { rollId, couponId } of index.rolls) {
    if (samples.has(rollId)) continue;
    const roll = await tx.roll.findUniqueOrThrow({ where: { id: rollId }, include: { shipment: true } });
    samples.set(rollId, await rollSample(tx, roll, couponId ? [{ couponId }] : []));
  }
  const sortedSamples = [...samples.values()].sort((a, b) => a.rollLabNumber.localeCompare(b.rollLabNumber));

  // Every property of the specification for every roll reported on: reported here, or why not.
  const reported = new Set([...tests.flatMap((t) => t.results.map((r) => `${t.rollLabNumber} ${r.property}`)), ...index.entries.flatMap((t) => t.results.map((r) => `${t.rollLabNumber} ${r.property}`))]);
  const conformance = limits ? await loadProjectConformance({ projectId: certificate.projectId, specificationId: limits.specificationId, tx }) : null;
  const propertyCoverage = conformance
    ? certificateCoverage(
        conformance.limits.map((l) => ({ property: l.property, label: TEST_PROPERTY_LABELS[l.property as TestProperty] ?? l.property, testingFrequencyAreaM2: l.testingFrequencyAreaM2, testingFrequencyPerLot: l.testingFrequencyPerLot })),
        conformance.rows.map((r) => ({ rollLabNumber: r.roll.labNumber, cells: r.cells })),
        reported,
      )
    : undefined;

  const judged = [...tests, ...index.entries].flatMap((t) => t.results.filter((r) => r.conformance).map((r) => ({ label: r.label, method: r.conformance!.method })));
  const signedBy = signatory ?? { name: options.signer.name, role: options.signer.role };
  const snapshot: CertificateSnapshot = {
    number: certificate.number,
    revision: revision.revision,
    reason: revision.reason,
    verificationCode: revision.verificationCode,
    verificationUrl: verificationUrl(options.baseUrl, revision.verificationCode),
    issuedAt: options.now.toISOString(),
    lab: { name: lab?.name ?? "Laboratory", address: lab?.address ?? "", accreditation: lab?.accreditation ?? null, timeZone: lab?.timeZone ?? "UTC" },
    client: {
      name: certificate.clientOrganization.name,
      address: certificate.clientOrganization.address,
      contact: contactText(certificate.clientOrganization.contacts[0], certificate.clientOrganization.contactEmail),
    },
    project: { code: certificate.project.code, name: certificate.project.name, siteName: certificate.project.siteName, siteLocation: certificate.project.siteLocation },
    specification: limits ? { name: limits.specificationName, revision: limits.specificationRevision } : null,
    decisionRule: decisionRuleText(judged) ?? undefined,
    remarks: content.remarks,
    unitSystem: content.unitSystem,
    samples: sortedSamples,
    tests,
    indexTests: index.entries,
    ...(propertyCoverage && { propertyCoverage }),
    signatory: { name: signedBy.name, role: ROLE_LABELS[signedBy.role], meaning: options.meaning, signedAt: options.now.toISOString() },
    supersedes: revision.supersedes ? { revision: revision.supersedes.revision, reason: revision.reason } : null,
  };
  const previous = revision.supersedes?.snapshot as CertificateSnapshot | null | undefined;
  if (previous && typeof previous === "object" && Array.isArray(previous.tests)) snapshot.changes = revisionChanges(previous, snapshot);
  return snapshot;
}

/** A roll as received, with its custody from receipt to test (its own events and those of `parts`: the coupons and specimens tested). */
async function rollSample(
  tx: Tx,
  roll: { id: string; labNumber: string; rollNumber: string; lotNumber: string; product: string; manufacturer: string; conditionNotes: string | null; shipment: { labNumber: string; receivedAt: Date; conditionNotes: string | null } },
  parts: Array<{ couponId: string } | { specimenId: string }>,
): Promise<CertificateSample> {
  const events = await tx.custodyEvent.findMany({
    where: { OR: [{ rollId: roll.id }, ...parts], action: { in: Object.keys(ACTION_WORDS) as never } },
    orderBy: [{ occurredAt: "asc" }, { sequence: "asc" }],
    include: { actor: { select: { name: true } }, roll: { select: { labNumber: true } }, coupon: { select: { labNumber: true } }, specimen: { select: { labNumber: true } } },
  });
  return {
    rollLabNumber: roll.labNumber, rollNumber: roll.rollNumber, lotNumber: roll.lotNumber, product: roll.product, manufacturer: roll.manufacturer,
    shipmentLabNumber: roll.shipment.labNumber, receivedAt: roll.shipment.receivedAt.toISOString(),
    condition: roll.conditionNotes || roll.shipment.conditionNotes || undefined,
    custody: events.map((e) => ({ at: e.occurredAt.toISOString(), action: ACTION_WORDS[e.action] ?? e.action.toLowerCase(), item: e.roll?.labNumber ?? e.coupon?.labNumber ?? e.specimen?.labNumber ?? "", by: e.actor.name })),
  };
}

/** The client's contact for the certificate: the first active contact (name, e-mail, telephone), else the organisation's e-mail. */
function contactText(contact: { name: string; email: string; phone: string | null } | undefined, email: string | null): string | null {
  if (contact) return [contact.name, contact.email, contact.phone].filter(Boolean).join(", ");
  return email;
}
