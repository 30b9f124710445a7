import { describe, expect, it } from "vitest";
import { stagePressureRules } from "@/lib/methods/hydraulic/hydraulic-settings-use";
import { METHOD_SETTINGS } from "@/lib/methods/registry";
import { checkStage } from "@/lib/runs/stage-pressure-check";

// Stage pressures of common practice (shared/DOMAIN.md): saturation and back-pressure with the cell about
// 35 kPa above both lines; D5887 permeation at about 550 / 530 / 515 kPa, the cell only 20 kPa above the
// influent line, which is the method and no departure.
const rules = stagePressureRules(METHOD_SETTINGS.D5887!.defaults as never);
const kPa = (cell: number, influent: number, effluent: number) => ({ cellPa: cell * 1000, influentPa: influent * 1000, effluentPa: effluent * 1000 });
const rated = [{ assetTag: "PT-9", ratedMaxPressurePa: 700_000 }];

describe("pressure checks that know the stage", () => {
  it("D5887 permeation at the method's pressures after a two-day hold: nothing to acknowledge", () => {
    expect(checkStage({ kind: "PERMEATION", pressures: kPa(550, 530, 515), rules, instruments: rated, equilibrationS: 48 * 3600 })).toEqual({ departures: [], overRated: [], refusals: [] });
  });

  it("the same pressures in back-pressure would break the confining margin (the saturation rule applies only before permeation)", () => {
    const check = checkStage({ kind: "BACK_PRESSURE", pressures: kPa(550, 530, 515), rules, instruments: rated });
    expect(check.departures.map((d) => d.rule)).toEqual(["confining-margin"]);
    expect(check.departures[0]!.message).toMatch(/by 20\.0 kPa, less than the 35 kPa confining margin/);
    expect(checkStage({ kind: "SATURATION", pressures: kPa(345, 310, 310), rules, instruments: rated }).departures).toEqual([]);
  });

  it("a cell level with or below a line is said to be so, never to exceed it by a negative amount", () => {
    const below = checkStage({ kind: "SATURATION", pressures: kPa(120, 130, 110), rules, instruments: rated });
    expect(below.departures[0]!.message).toMatch(/^The cell pressure is 10\.0 kPa below the higher line pressure; it must exceed it by the 35 kPa confining margin: /);
    const level = checkStage({ kind: "BACK_PRESSURE", pressures: kPa(130, 130, 130), rules, instruments: rated });
    expect(level.departures[0]!.message).toMatch(/^The cell pressure is level with the higher line pressure; it must exceed it by the 35 kPa confining margin: /);
    const underInfluent = checkStage({ kind: "PERMEATION", pressures: kPa(525, 530, 515), rules: { ...rules, permeation: null }, instruments: rated, equilibrationS: 48 * 3600 });
    expect(underInfluent.departures.map((d) => d.message)).toEqual([
      "The cell pressure is 5 kPa below the influent line; the method requires it 10 kPa above in permeation: the membrane can lift off the specimen or burst. Raise the cell pressure first.",
    ]);
    for (const d of [...below.departures, ...level.departures, ...underInfluent.departures]) expect(d.message).not.toMatch(/-\d|by -|exceeds the higher line pressure by 0/);
  });

  it("permeation off the method: each line outside the tolerance is named; the cell too close to the influent; a short hold", () => {
    const off = checkStage({ kind: "PERMEATION", pressures: kPa(575, 530, 500), rules, instruments: rated, equilibrationS: 50 * 3600 });
    expect(off.departures).toEqual([{ rule: "permeation-pressure", message: "The method prescribes permeation at cell 550 kPa, effluent 515 kPa (± 10 kPa); cell 575 kPa, effluent 500 kPa are outside it." }]);
    const close = checkStage({ kind: "PERMEATION", pressures: kPa(541, 535, 515), rules, instruments: rated, equilibrationS: 50 * 3600 });
    expect(close.departures.map((d) => d.rule)).toEqual(["cell-above-influent"]);
    const noHold = checkStage({ kind: "PERMEATION", pressures: kPa(550, 530, 515), rules, instruments: rated, equilibrationS: null });
    expect(noHold.departures[0]!.message).toBe("No equilibration hold was recorded before permeation; the method asks for at least 48 h.");
  });

  it("a method without prescribed permeation pressures (D5084) checks only the cell above the influent line", () => {
    const d5084 = stagePressureRules(METHOD_SETTINGS.D5084!.defaults as never);
    expect(checkStage({ kind: "PERMEATION", pressures: kPa(300, 280, 266), rules: d5084, instruments: rated, equilibrationS: 48 * 3600 }).departures).toEqual([]);
    expect(checkStage({ kind: "PERMEATION", pressures: kPa(285, 280, 266), rules: d5084, instruments: rated, equilibrationS: 48 * 3600 }).departures.map((d) => d.rule)).toEqual(["cell-above-influent"]);
  });

  it("a pressure above a rating is a refusal, in every stage", () => {
    for (const kind of ["SATURATION", "PERMEATION"] as const) {
      const check = checkStage({ kind, pressures: kPa(720, 700, 690), rules, instruments: rated, equilibrationS: 48 * 3600 });
      expect(check.refusals).toEqual(["PT-9 is rated to 700 kPa; 720 kPa would exceed it."]);
    }
  });
});
