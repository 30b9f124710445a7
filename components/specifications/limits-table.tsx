import { formatUnit } from "@/lib/results/format-result";
import { describeTestingFrequency } from "@/lib/conformance/sampling-coverage";
import { TEST_PROPERTY_LABELS, type SpecificationLimitRow } from "@/lib/results/property-units";
import { CONFORMANCE_METHOD_LABELS, LIMIT_DIRECTION_LABELS } from "@/lib/validation/specifications";
import styles from "./specifications.module.css";
import { ScrollArea } from "@/components/ui/scroll-area";

export type { SpecificationLimitRow as LimitRow } from "@/lib/results/property-units";
type LimitRow = SpecificationLimitRow;

/** A specification's limits: the limit as written, its unit, direction, digits and how conformance is judged. */
export function LimitsTable({ limits, testId }: { limits: LimitRow[]; testId?: string }) {
  if (limits.length === 0) return <p className="empty">No limits yet.</p>;
  return (
    <ScrollArea>
      <table className="list" data-testid={testId}>
        <thead>
          <tr><th>Property</th><th>Limit</th><th>Unit</th><th>Direction</th><th>Sig. digits</th><th>Conformance</th><th>Test method</th><th>Testing frequency</th></tr>
        </thead>
        <tbody>
          {limits.map((l) => (
            <tr key={l.id} data-property={l.property}>
              <td>{TEST_PROPERTY_LABELS[l.property]}</td>
              <td className={styles.limitValue}>{l.direction === "MAXIMUM" ? "≤" : "≥"} {l.limitText}</td>
              <td>{formatUnit(l.unit)}</td>
              <td>{LIMIT_DIRECTION_LABELS[l.direction]}</td>
              <td>{l.significantDigits}</td>
              <td>{CONFORMANCE_METHOD_LABELS[l.conformanceMethod]}</td>
              <td>{formatTestMethod(l.testMethodCode)}</td>
              <td>{describeTestingFrequency(l.testingFrequencyAreaM2 ?? null, l.testingFrequencyPerLot ?? false)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollArea>
  );
}

/** "D5887" reads "ASTM D5887"; a code that names its own body ("GRI-GCL3", "ASTM D5887") is shown as entered. */
export function formatTestMethod(code: string | null): string {
  if (!code) return "—";
  return /^D\d/i.test(code) ? `ASTM ${code}` : code;
}
