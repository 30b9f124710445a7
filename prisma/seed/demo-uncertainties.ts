import type { DeclaredUncertainties } from "@/lib/hydraulics";

/**
 * The declared standard uncertainties (k = 1) of the instruments of the invented demo laboratory, in the
 * units named. Demo data only: the seed writes them into the demo instruments' calibration records and the
 * demo lab's method settings, which is where the app reads uncertainties from. Each lab sets its own from
 * its calibration certificates (an expanded uncertainty U stated with k = 2 is
 * U / 2; a resolution or tolerance ±a is a / √3 — see lib/hydraulics/uncertainty.ts).
 */
export const DEMO_LAB_DECLARED_UNCERTAINTIES: Readonly<DeclaredUncertainties> = Object.freeze({
  /** Die-cut 100 mm specimen measured with a calliper: ±0.1 mm read as a rectangular half-width, ≈ 0.058 mm. */
  diameterMm: 0.058,
  /** Post-test bentonite layer on a cut section: ±0.1 mm, ≈ 0.058 mm. */
  thicknessMm: 0.058,
  /** One burette reading on 0.1 mL graduations, read to half a division: ±0.05 mL, ≈ 0.029 mL. */
  volumeMl: 0.029,
  /** One time stamp of the data logger or the technician's clock: ±1 s, ≈ 0.58 s. */
  timeS: 0.58,
  /** Differential pressure transducer, calibration certificate U = 0.2 kPa (k = 2). */
  pressureKPa: 0.1,
  /** Permeant thermometer, calibration certificate U = 0.2 °C (k = 2). */
  temperatureC: 0.1,
});
