/**
 * What a revision changes from the one it supersedes, in lines a client reads on its first page
 * (ISO/IEC 17025 7.8.8: an amended report says what changed and why). Pure: compares two snapshots.
 */
import type { CertificateSnapshot } from "./certificate-snapshot";
import { inSentence } from "../format/sentence-case";

type Comparable = Pick<CertificateSnapshot, "tests" | "specification" | "remarks" | "unitSystem" | "signatory"> & Partial<Pick<CertificateSnapshot, "indexTests">>;

const resultKeys = (s: Comparable) =>
  new Map<string, { label: string; display: string }>([
    ...s.tests.flatMap((t) => t.results.map((r) => [`${t.runLabNumber} ${r.property}`, { label: `${inSentence(r.label)} of ${t.runLabNumber} (specimen ${t.specimenLabNumber})`, display: r.display }] as const)),
    ...(s.indexTests ?? []).flatMap((t) => t.results.map((r) => [`${t.rollLabNumber} ${t.method.code} ${r.property}`, { label: `${inSentence(r.label)} of roll ${t.rollLabNumber} (${t.method.code.startsWith("ASTM") ? t.method.code : `ASTM ${t.method.code}`})`, display: r.display }] as const)),
  ]);

const specText = (s: Comparable) => (s.specification ? `${s.specification.name}${s.specification.revision ? `, ${s.specification.revision}` : ""}` : "no specification");

/** One line per change: results taken in or left out, values restated, specification, remarks, units, signatory. */
export function revisionChanges(previous: Comparable, next: Comparable): string[] {
  const lines: string[] = [];
  const before = resultKeys(previous);
  const after = resultKeys(next);
  for (const [key, r] of after) if (!before.has(key)) lines.push(`Added: ${r.label}.`);
  for (const [key, r] of before) if (!after.has(key)) lines.push(`Removed: ${r.label}.`);
  for (const [key, r] of after) {
    const old = before.get(key);
    if (old && old.display !== r.display) lines.push(`Restated: ${r.label}, now ${r.display} (was ${old.display}).`);
  }
  if (specText(previous) !== specText(next)) lines.push(`Specification: now ${specText(next)} (was ${specText(previous)}).`);
  if ((previous.remarks ?? "") !== (next.remarks ?? "")) lines.push(next.remarks ? `Remarks changed; they now read: "${next.remarks}"` : "Remarks removed.");
  if ((previous.unitSystem ?? "SI") !== (next.unitSystem ?? "SI")) lines.push(`Results now printed in ${next.unitSystem === "CENTIMETRE" ? "centimetre units (cm/s)" : "SI units (m/s)"}.`);
  if (previous.signatory.name !== next.signatory.name) lines.push(`Signed by ${next.signatory.name} (the previous revision by ${previous.signatory.name}).`);
  return lines;
}
