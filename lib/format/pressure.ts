/** A pressure stored in pascals, shown in the unit a person chose (kPa or psi). */
const PA_PER_PSI = 6894.757293168361; // NIST SP 811: lbf/in^2 = 4.4482216152605 N / (0.0254 m)^2

export function formatPressure(pa: number | null | undefined, unit: "KPA" | "PSI" = "KPA"): string {
  if (pa === null || pa === undefined) return "—";
  return unit === "PSI" ? `${(pa / PA_PER_PSI).toFixed(1)} psi` : `${(pa / 1000).toFixed(0)} kPa`;
}
