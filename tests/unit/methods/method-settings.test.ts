import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { TERMINATION_DEFAULTS } from "@/lib/hydraulics";
import { stagePressureRules, terminationOverrides } from "@/lib/methods/hydraulic/hydraulic-settings-use";
import { METHOD_SETTINGS, methodSettingsDefinition } from "@/lib/methods/registry";
import { readStoredSettings } from "@/lib/methods/settings-definition";
import { methodSettingsChangeSchema } from "@/lib/validation/methods";

const ROOT = path.resolve(import.meta.dirname, "../../..");

describe("the registry of method settings", () => {
  it("lists the three hydraulic methods and the six index methods; every schema key has a field with a source and a note, and every field a key", () => {
    expect(Object.keys(METHOD_SETTINGS).sort()).toEqual(["D2216", "D5084", "D5887", "D5890", "D5891", "D5993", "D6496", "D6766", "D6768"]);
    for (const definition of Object.values(METHOD_SETTINGS)) {
      const keys = Object.keys(definition.defaults).sort();
      expect(definition.fields.map((f) => f.key).sort()).toEqual(keys);
      for (const f of definition.fields) {
        expect(["standard", "common practice", "from memory", "lab's own"]).toContain(f.source);
        expect(f.note.length).toBeGreaterThan(10);
      }
      // The defaults pass their own schema.
      expect(definition.schema.parse(definition.defaults)).toEqual(definition.defaults);
    }
    expect(methodSettingsDefinition("D4632")).toBeNull();
  });

  it("ships the library's termination defaults (lib/hydraulics TERMINATION_DEFAULTS), the D5887 permeation pressures of common practice and the 10 % leakage limit of D5887", () => {
    for (const code of ["D5887", "D5084", "D6766"] as const) {
      const overrides = terminationOverrides(METHOD_SETTINGS[code]!.defaults as never);
      const { criteria: _criteria, ...library } = TERMINATION_DEFAULTS[code];
      // Everything the library has a default for is the same number, percentages as fractions.
      expect({ ...library, ...overrides }).toEqual({ ...library, trendMinRelativeChange: 0.1 });
    }
    // shared/DOMAIN.md (common practice): cell about 550 kPa, influent about 530 kPa, effluent about 515 kPa.
    expect(stagePressureRules(METHOD_SETTINGS.D5887!.defaults as never)).toEqual({
      confiningMarginPa: 35_000, permeation: { cellPa: 550_000, influentPa: 530_000, effluentPa: 515_000 }, permeationTolerancePa: 10_000, minCellAboveInfluentPa: 10_000, minEquilibrationS: 48 * 3600,
    });
    expect(stagePressureRules(METHOD_SETTINGS.D5084!.defaults as never).permeation).toBeNull();
    expect(METHOD_SETTINGS.D5887!.defaults.maxLeakagePct).toBe(10);
    // No uncertainty is shipped: each lab states its own.
    expect(METHOD_SETTINGS.D5887!.defaults).toMatchObject({ uDieDiameterMm: null, uThicknessMm: null, uTimeS: null });
  });

  it("the migration that installs version 1 of each method carries exactly these defaults", () => {
    const dirs = readdirSync(path.join(ROOT, "prisma/migrations")).filter((d) => d.endsWith("_method_settings_and_apparatus") || d.endsWith("_index_tests_and_conformance"));
    const sql = dirs.map((dir) => readFileSync(path.join(ROOT, "prisma/migrations", dir, "migration.sql"), "utf8")).join("\n");
    for (const [code, definition] of Object.entries(METHOD_SETTINGS)) {
      const row = new RegExp(`\\('method-settings-${code}-v1', '${code}', 1, '([^']+)'`).exec(sql);
      expect(row, code).not.toBeNull();
      expect(JSON.parse(row![1]!)).toEqual(definition.defaults);
    }
  });

  it("reads an older stored version with the keys added since taking their defaults", () => {
    const d = METHOD_SETTINGS.D5887!;
    const { uTimeS: _dropped, ...older } = d.defaults as Record<string, unknown>;
    expect(readStoredSettings(d, { ...older, ratioMin: 0.8 })).toEqual({ ...d.defaults, ratioMin: 0.8 });
  });
});

describe("index methods' defaults and their sources", () => {
  it("ships the numbers of the standards and of common practice, each with its source", () => {
    // ASTM D5890: 2 g of clay, a 100 mL cylinder, at least 16 h; ASTM D5891: 22.5 g in 350 mL at about 690 kPa for 30 min;
    // ASTM D6768 and D6496: 100 mm wide specimens; the specimen counts are from memory (five strips is common).
    expect(METHOD_SETTINGS.D5890!.defaults).toMatchObject({ nominalClayMassG: 2, cylinderCapacityMl: 100, minHydrationHours: 16, reportingUnit: "mL/2 g" });
    expect(METHOD_SETTINGS.D5891!.defaults).toMatchObject({ clayMassG: 22.5, waterVolumeMl: 350, pressureKPa: 690, filtrationMinutes: 30 });
    expect(METHOD_SETTINGS.D6768!.defaults).toMatchObject({ minSpecimens: 5, stripWidthMm: 100, reportingUnit: "kN/m" });
    expect(METHOD_SETTINGS.D6496!.defaults).toMatchObject({ minSpecimens: 5, specimenWidthMm: 100, reportingUnit: "N/m" });
    const source = (code: string, key: string) => METHOD_SETTINGS[code]!.fields.find((f) => f.key === key)!.source;
    expect(source("D6768", "minSpecimens")).toBe("from memory");
    expect(source("D5890", "nominalClayMassG")).toBe("standard");
    expect(source("D5993", "expandedUncertainty")).toBe("lab's own");
    for (const code of ["D5890", "D5891", "D5993", "D2216", "D6768", "D6496"]) expect(METHOD_SETTINGS[code]!.family).toBe("index");
  });

  it("refuses a reporting unit the method does not give and a fractional specimen count", () => {
    const d = METHOD_SETTINGS.D6768!;
    expect(d.schema.safeParse({ ...d.defaults, reportingUnit: "mL" }).success).toBe(false);
    const r = d.schema.safeParse({ ...d.defaults, minSpecimens: "2.5" });
    expect(r.error!.issues[0]!.message).toBe("The smallest number of specimens must be a whole number.");
  });
});

describe("bad settings are refused with a message naming the field", () => {
  const d = METHOD_SETTINGS.D5887!;
  const change = (values: Record<string, unknown>) =>
    methodSettingsChangeSchema(d).safeParse({ methodCode: "D5887", basedOnVersion: 1, reason: "Lab procedure LP-7 revised", values: { ...Object.fromEntries(Object.entries(d.defaults).map(([k, v]) => [k, v === null ? "" : String(v)])), ...values } });
  const errors = (values: Record<string, unknown>) => {
    const r = change(values);
    return r.success ? {} : Object.fromEntries(r.error.issues.map((i) => [i.path.join("."), i.message]));
  };

  it("accepts the defaults as the form sends them (text), blanks as not set", () => {
    const r = change({});
    expect(r.success).toBe(true);
    expect(r.data!.values).toEqual(d.defaults);
  });

  it("an empty ratio band, a significance outside (0, 1), a negative uncertainty, half the permeation pressures, a cell below the influent", () => {
    expect(errors({ ratioMin: "1.3" })["values.ratioMax"]).toBe("The outflow/inflow band is empty: its upper end (1.25) must be above its lower end (1.3).");
    expect(errors({ trendAlpha: "1" })["values.trendAlpha"]).toBe("The trend significance level must be between 0 and 1 (exclusive), e.g. 0.05.");
    expect(errors({ trendAlpha: "0" })["values.trendAlpha"]).toMatch(/between 0 and 1/);
    expect(errors({ uDieDiameterMm: "-0.05" })["values.uDieDiameterMm"]).toBe("The standard uncertainty of the die diameter (mm) must be at least 0.");
    expect(errors({ permeationEffluentKPa: "" })["values.permeationCellKPa"]).toMatch(/^Give all three permeation pressures/);
    expect(errors({ permeationCellKPa: "520" })["values.permeationCellKPa"]).toMatch(/must be above the influent pressure/);
    expect(errors({ consecutiveIntervals: "2" })["values.consecutiveIntervals"]).toBe("The number of consecutive intervals must be at least 3.");
    expect(change({ trendAlpha: "0.01", ratioMin: "0.8" }).success).toBe(true);
  });

  it("a change needs its reason", () => {
    const r = methodSettingsChangeSchema(d).safeParse({ methodCode: "D5887", basedOnVersion: 1, reason: "", values: d.defaults });
    expect(r.success).toBe(false);
    expect(r.error!.issues[0]!.path).toEqual(["reason"]);
  });
});
