import { describeTestingFrequency, type PropertyCoverage } from "@/lib/conformance/sampling-coverage";
import { formatNumber } from "@/lib/results/format-result";
import { TEST_PROPERTY_LABELS } from "@/lib/results/property-units";
import type { MatrixLimit } from "@/lib/conformance/conformance-matrix";
import { ScrollArea } from "@/components/ui/scroll-area";

/** Per property: the specification's testing frequency, the tests the delivered area asks for, those done, and what lacks one. */
export function SamplingCoverageTable({ coverage, limits }: { coverage: PropertyCoverage[]; limits: MatrixLimit[] }) {
  if (coverage.length === 0) return <p className="empty">No testing frequencies: the project has no specification with limits.</p>;
  const area = coverage[0]!.deliveredAreaM2;
  const unsized = coverage[0]!.rollsWithoutSize;
  return (
    <ScrollArea>
      <p>Delivered: <strong>{formatNumber(area, { significantDigits: 4 })} m²</strong>{unsized.length > 0 && <span className="muted"> (not counted: {unsized.join(", ")}, whose size was not recorded)</span>}</p>
      <table className="list" data-testid="sampling-coverage">
        <thead><tr><th>Property</th><th>Frequency</th><th>Tests asked for</th><th>Approved</th><th>Under way</th><th>Covered</th><th>Still lacking a test</th></tr></thead>
        <tbody>
          {coverage.map((c) => {
            const limit = limits.find((l) => l.property === c.property);
            return (
              <tr key={c.property} data-property={c.property} data-covered={c.covered ? "yes" : "no"}>
                <td>{TEST_PROPERTY_LABELS[c.property]}</td>
                <td>{describeTestingFrequency(limit?.testingFrequencyAreaM2 ?? null, limit?.testingFrequencyPerLot ?? false)}</td>
                <td>{c.testsRequired}</td><td>{c.testsApproved}</td><td>{c.testsOpen}</td>
                <td><span className={`state ${c.covered ? "state-ok" : "state-bad"}`}>{c.covered ? "yes" : "short"}</span></td>
                <td>{[c.lotsLacking.length ? `lots ${c.lotsLacking.join(", ")}` : null, c.rollsLacking.length ? `rolls ${c.rollsLacking.join(", ")}` : null].filter(Boolean).join("; ") || "—"}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </ScrollArea>
  );
}
