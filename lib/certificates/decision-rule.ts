/**
 * The decision rule a certificate states (ISO/IEC 17025:2017 7.1.3 and 7.8.6.1): how each limit was
 * applied (ASTM E29 rounding or absolute method) and that the measurement uncertainty is reported beside
 * the result but not used to widen or narrow the limit (simple acceptance, the usual reading of a
 * specification that states none; common practice, ILAC-G8:09/2019 calls it a binary rule without guard
 * band; from memory). Pure.
 */
import { inSentence } from "../format/sentence-case";

export type LimitRule = { label: string; method: "ABSOLUTE" | "ROUNDING" };

/** The decision rule in words, or null when no result was compared with a limit. */
export function decisionRuleText(limits: LimitRule[]): string | null {
  if (limits.length === 0) return null;
  const rounding = limits.filter((l) => l.method === "ROUNDING").map((l) => inSentence(l.label));
  const absolute = limits.filter((l) => l.method === "ABSOLUTE").map((l) => inSentence(l.label));
  const parts = [
    rounding.length ? `${joinWords(rounding)}: ASTM E29 rounding method (the result is rounded once, halves to even, to the last place the limit is written to, then compared)` : null,
    absolute.length ? `${joinWords(absolute)}: ASTM E29 absolute method (the result as measured is compared; any excursion fails)` : null,
  ].filter(Boolean);
  return `${parts.join("; ")}. The expanded uncertainty is stated beside each result but is not taken into account in the decision: the result conforms when it meets the limit as the rule above applies it, with no guard band (simple acceptance).`;
}

function joinWords(words: string[]): string {
  const unique = [...new Set(words)];
  const cap = (w: string) => w.charAt(0).toUpperCase() + w.slice(1);
  if (unique.length === 1) return cap(unique[0]!);
  return cap(`${unique.slice(0, -1).join(", ")} and ${unique[unique.length - 1]}`);
}
