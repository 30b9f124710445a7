/** ASTM D5084 method C: falling head in the inflow burette, rising tail in the outflow burette. */

/**
 * Hydraulic conductivity, m/s, by falling head with rising tail:
 * k = a_in a_out L / ((a_in + a_out) A dt) × ln(h1 / h2).
 * Areas in m^2, thickness L in m, dt in s, heads in m of water (same datum at both times).
 * The form assumes inflow and outflow volumes are equal over the interval, as D5084 does.
 */
export function fallingHeadRisingTailKMPerS(args: {
  inflowBuretteAreaM2: number;
  outflowBuretteAreaM2: number;
  specimenAreaM2: number;
  thicknessM: number;
  durationS: number;
  head1M: number;
  head2M: number;
}): number {
  const aIn = args.inflowBuretteAreaM2;
  const aOut = args.outflowBuretteAreaM2;
  return (
    ((aIn * aOut * args.thicknessM) / ((aIn + aOut) * args.specimenAreaM2 * args.durationS)) *
    Math.log(args.head1M / args.head2M)
  );
}
