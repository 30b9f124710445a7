/**
 * Pressure checks that know the stage (common practice, see shared/DOMAIN.md). Saturation, back-pressure
 * steps and the equilibration hold: the cell above both lines by the method's confining margin.
 * Permeation: the method's prescribed cell, influent and effluent pressures within a tolerance, and the
 * cell above the influent line by a minimum (in D5887 permeation the cell is only about 20 kPa above
 * the influent line, and that is the method, not a departure); an equilibration hold shorter than the
 * method's minimum is a departure too. A pressure above an instrument's rating is refused, never
 * acknowledged. All pressures in pascals. Pure.
 */
import type { StagePressureRules } from "../methods/hydraulic/hydraulic-settings-use";
import { checkStagePressures, type RatedInstrument, type StagePressuresPa } from "./pressure-checks";

export type StageKind = "SATURATION" | "BACK_PRESSURE" | "EQUILIBRATION" | "PERMEATION";
export type StageDepartureRule = "confining-margin" | "permeation-pressure" | "cell-above-influent" | "equilibration-time";
export type StageDeparture = { rule: StageDepartureRule; message: string };

export type StageCheck = {
  /** Departures from the method: saved only when the technician acknowledges them; each is a deviation. */
  departures: StageDeparture[];
  /** Refusals: a pressure above an instrument's rated maximum. */
  overRated: Array<{ assetTag: string; ratedMaxPressurePa: number; pressurePa: number }>;
  refusals: string[];
};

const kPa = (pa: number) => `${+(pa / 1000).toFixed(1)} kPa`;

export function checkStage(input: {
  kind: StageKind;
  pressures: StagePressuresPa;
  rules: StagePressureRules;
  instruments: RatedInstrument[];
  /** For permeation: how long the equilibration hold lasted before it, s (null when there was none). */
  equilibrationS?: number | null;
}): StageCheck {
  const { pressures: p, rules } = input;
  // The rating check is the same for every stage; the margin part is used for the stages it applies to.
  const base = checkStagePressures(p, rules.confiningMarginPa, input.instruments);
  const refusals = base.warnings.filter((w) => w.includes("rated"));
  const departures: StageDeparture[] = [];
  if (input.kind !== "PERMEATION") {
    if (!base.marginKept) departures.push({ rule: "confining-margin", message: base.warnings[0]! });
    return { departures, overRated: base.overRated, refusals };
  }
  if (rules.permeation) {
    const off = (["cell", "influent", "effluent"] as const)
      .map((line) => ({ line, given: p[`${line}Pa`], prescribed: rules.permeation![`${line}Pa`] }))
      .filter((x) => Math.abs(x.given - x.prescribed) > rules.permeationTolerancePa + 1e-6);
    if (off.length)
      departures.push({
        rule: "permeation-pressure",
        message: `The method prescribes permeation at ${off.map((x) => `${x.line} ${kPa(x.prescribed)}`).join(", ")} (± ${kPa(rules.permeationTolerancePa)}); ${off.map((x) => `${x.line} ${kPa(x.given)}`).join(", ")} ${off.length === 1 ? "is" : "are"} outside it.`,
      });
  }
  const aboveInfluent = p.cellPa - p.influentPa;
  if (aboveInfluent < rules.minCellAboveInfluentPa - 1e-6) {
    const required = kPa(rules.minCellAboveInfluentPa);
    // A cell level with or below the influent line is not "above" it by a negative amount.
    const where =
      kPa(aboveInfluent) === "0 kPa" ? `The cell pressure is level with the influent line; the method requires it ${required} above in permeation`
      : aboveInfluent < 0 ? `The cell pressure is ${kPa(-aboveInfluent)} below the influent line; the method requires it ${required} above in permeation`
      : `The cell pressure is ${kPa(aboveInfluent)} above the influent line, less than the ${required} the method requires in permeation`;
    departures.push({ rule: "cell-above-influent", message: `${where}: the membrane can lift off the specimen or burst. Raise the cell pressure first.` });
  }
  if (input.equilibrationS !== undefined && rules.minEquilibrationS > 0 && (input.equilibrationS === null || input.equilibrationS < rules.minEquilibrationS))
    departures.push({
      rule: "equilibration-time",
      message:
        input.equilibrationS === null
          ? `No equilibration hold was recorded before permeation; the method asks for at least ${+(rules.minEquilibrationS / 3600).toFixed(1)} h.`
          : `The equilibration hold lasted ${+(input.equilibrationS / 3600).toFixed(1)} h, less than the ${+(rules.minEquilibrationS / 3600).toFixed(1)} h the method asks for.`,
    });
  return { departures, overRated: base.overRated, refusals };
}
