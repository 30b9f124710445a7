import "server-only";
import { inSentence } from "@/lib/format/sentence-case";
import { formatPropertyValue } from "@/lib/format/result-numbers";
import { TEST_PROPERTY_LABELS, type TestProperty } from "@/lib/results/property-units";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";
import { refuseResultsOnLiveCertificates } from "./certificate-collision";
import { readDraftContent } from "./draft-content";
import { draftProblems, missingLimitMessage } from "./draft-problems";
import { listFreeIndexResults } from "./list-free-index-results";

/**
 * What the draft editor offers: the draft's content, the results it may include (those on it and the
 * project's approved results no other live certificate includes), the project's specifications, the QA
 * managers who may sign, and what still stops it from being issued (and, per result, the specifications that
 * set no limit for it, with the words signing would refuse it with).
 */
export async function getDraftEditor(options: { actor: CurrentUser; revisionId: string }) {
  requirePermission(options.actor, "certificate.issue");
  const db = getDb();
  const revision = await db.certificateRevision.findUniqueOrThrow({ where: { id: options.revisionId }, select: { id: true, certificate: { select: { id: true, projectId: true } } } });
  const { projectId, id: certificateId } = revision.certificate;
  const content = await readDraftContent(db, revision.id);
  const [results, indexResults, specifications, signatories, problems] = await Promise.all([
    db.result.findMany({
      where: { approvedAt: { not: null }, run: { specimen: { coupon: { roll: { projectId } } } } },
      orderBy: [{ run: { labNumber: "asc" } }, { property: "asc" }],
      select: { id: true, property: true, value: true, unit: true, run: { select: { labNumber: true, specimen: { select: { labNumber: true } } } } },
    }),
    listFreeIndexResults(db, { projectId, exceptCertificateId: certificateId, keep: content.indexResultIds }),
    db.specification.findMany({ where: { projectId, isTemplate: false }, orderBy: { createdAt: "desc" }, select: { id: true, name: true, revision: true, limits: { select: { property: true } } } }),
    db.user.findMany({ where: { role: "QA_MANAGER", active: true }, orderBy: { name: "asc" }, select: { id: true, name: true } }),
    draftProblems(db, { projectId, content }),
  ]);
  // A result another live certificate includes is not offered (it would be refused).
  const offered: typeof results = [];
  for (const r of results) {
    const free = await refuseResultsOnLiveCertificates(db, [r.id], certificateId).then(() => true, () => false);
    if (free || content.resultIds.includes(r.id)) offered.push(r);
  }
  // Per specification that sets no limit for a result's property, the words signing would refuse it with.
  const noLimit = (line: { property: TestProperty; of: string }) =>
    Object.fromEntries(specifications.filter((s) => !s.limits.some((l) => l.property === line.property)).map((s) => [s.id, missingLimitMessage(s.name, line)]));
  return {
    content,
    problems,
    results: offered.map((r) => ({
      id: r.id,
      label: `${r.run.labNumber} · specimen ${r.run.specimen.labNumber} · ${inSentence(TEST_PROPERTY_LABELS[r.property as TestProperty])} ${formatPropertyValue(r.property, r.value, r.unit, content.unitSystem).text}`,
      noLimit: noLimit({ property: r.property as TestProperty, of: r.run.labNumber }),
    })),
    indexResults: indexResults.map((r) => ({ id: r.id, label: `${r.label} ${formatPropertyValue(r.property, r.value, r.unit, content.unitSystem).text}`, noLimit: noLimit(r) })),
    specifications: specifications.map((s) => ({ id: s.id, label: s.revision ? `${s.name} (${s.revision})` : s.name })),
    signatories,
  };
}
