import { z } from "zod";
import { PRESSURE_UNITS, enteredPressureToPa, type PressureUnit } from "../units/pressure-entry";
import { optionalMeasured, pastDateTime, reasonSchema, requiredText, versionSchema } from "./common";
import { futureDate } from "./record-dates";

// Mirrors the EquipmentKind and EquipmentStatus enums of prisma/schema.prisma (lib/ may not import Prisma).
export const EQUIPMENT_KINDS = ["PERMEAMETER_CELL", "BURETTE_PANEL", "PRESSURE_TRANSDUCER", "THERMOMETER", "THICKNESS_GAUGE", "TIMER",
  "BALANCE", "OVEN", "GRADUATED_CYLINDER", "FILTER_PRESS", "TENSILE_FRAME", "LOAD_CELL"] as const;
export type EquipmentKind = (typeof EQUIPMENT_KINDS)[number];
export const EQUIPMENT_STATUSES = ["IN_SERVICE", "OUT_OF_SERVICE", "RETIRED"] as const;
export type EquipmentStatus = (typeof EQUIPMENT_STATUSES)[number];
export const EQUIPMENT_STATUS_LABELS: Record<EquipmentStatus, string> = { IN_SERVICE: "In service", OUT_OF_SERVICE: "Out of service", RETIRED: "Retired" };

/** The highest rating the register accepts: 10 MPa, far above any GCL permeameter, so a slip of units is caught. */
export const MAX_RATED_PRESSURE_PA = 10_000_000;
/** Burette cross-sections are entered in mm² (a 10 mm bore is about 79 mm²); outside these bounds is a typing error. */
export const BURETTE_AREA_MM2 = { min: 1, max: 5000 } as const;
/** mm² -> m² (exact). */
export const mm2ToM2 = (mm2: number): number => mm2 * 1e-6;
/** m² -> mm². */
export const m2ToMm2 = (m2: number): number => m2 * 1e6;

export const assetTagSchema = z
  .string({ message: "Enter the asset tag." })
  .trim()
  .toUpperCase()
  .min(1, "Enter the asset tag.")
  .regex(/^[A-Z0-9]+(-[A-Z0-9]+)*$/, "Use capital letters, digits and single dashes, e.g. CELL-07.")
  .max(32, "Keep the asset tag to 32 characters.")
  // /equipment/new is the register form's address, so no item may be called NEW.
  .refine((tag) => tag !== "NEW", "NEW is reserved; choose another asset tag.");

/** For a cross-field rule: run it once the fields it reads parsed, whatever else is wrong. */
function validFields(...fields: string[]) {
  // An issue with no path is the value itself being of the wrong kind (null, a list): then no field is valid.
  return (payload: { issues: ReadonlyArray<{ path?: PropertyKey[] }> }) => !payload.issues.some((issue) => !issue.path?.length || fields.includes(String(issue.path[0])));
}

const pressureUnitSchema = z.enum(PRESSURE_UNITS, { message: "Choose kPa or psi." });

/** Registering one instrument; the rated maximum is typed in `pressureUnit` and stored in Pa by the server. */
export const registerEquipmentSchema = z
  .object({
    assetTag: assetTagSchema,
    kind: z.enum(EQUIPMENT_KINDS, { message: "Choose what kind of equipment it is." }),
    name: requiredText("a name", 120),
    serialNumber: z.string().trim().max(80, "Keep the serial number to 80 characters.").optional(),
    ratedMaxPressure: optionalMeasured("the rated maximum pressure", { positive: true }),
    pressureUnit: pressureUnitSchema,
    status: z.enum(EQUIPMENT_STATUSES).default("IN_SERVICE"),
  })
  .superRefine(
    (v, ctx) => {
      if (v.ratedMaxPressure !== undefined && enteredPressureToPa(v.ratedMaxPressure, v.pressureUnit) > MAX_RATED_PRESSURE_PA)
        ctx.addIssue({ code: "custom", path: ["ratedMaxPressure"], message: `The rated maximum must be at most ${v.pressureUnit === "PSI" ? "1450 psi" : "10 000 kPa"}; check the unit.` });
      if ((v.kind === "PERMEAMETER_CELL" || v.kind === "PRESSURE_TRANSDUCER") && v.ratedMaxPressure === undefined)
        ctx.addIssue({ code: "custom", path: ["ratedMaxPressure"], message: "Enter the rated maximum pressure from the maker's plate or certificate." });
    },
    { when: validFields("kind", "ratedMaxPressure", "pressureUnit") },
  );
export type RegisterEquipmentInput = z.input<typeof registerEquipmentSchema>;

/** A checkbox or a JSON boolean; "false" stays false (z.coerce.boolean would make it true). */
const checkbox = (message: string) => z.preprocess((v) => (v === "on" || v === "true" ? true : v === "false" ? false : v), z.boolean({ message }));

/** Which fields a calibration of this kind of equipment must carry: a burette panel needs both burette areas. */
export function calibrationValueErrors(kind: EquipmentKind, v: { inflowBuretteAreaMm2?: number; outflowBuretteAreaMm2?: number }): Record<string, string> {
  const errors: Record<string, string> = {};
  if (kind !== "BURETTE_PANEL") return errors;
  if (v.inflowBuretteAreaMm2 === undefined) errors.inflowBuretteAreaMm2 = "Enter the calibrated inflow burette area (mm²).";
  if (v.outflowBuretteAreaMm2 === undefined) errors.outflowBuretteAreaMm2 = "Enter the calibrated outflow burette area (mm²).";
  return errors;
}

const buretteArea = (label: string) => optionalMeasured(label, { min: BURETTE_AREA_MM2.min, max: BURETTE_AREA_MM2.max });
const datumOffset = (label: string) => optionalMeasured(label, { min: -5000, max: 5000 });
const scaleEnd = (label: string) => optionalMeasured(label, { min: 0, max: 5000 });

export const LEAKAGE_UNITS = ["M3_PER_S", "M3_PER_M2_PER_S"] as const;
export const LEAKAGE_UNIT_LABELS: Record<(typeof LEAKAGE_UNITS)[number], string> = { M3_PER_S: "m³/s (a flow)", M3_PER_M2_PER_S: "m³/m²/s (a flux)" };

/** Cross-field rules of the optional parts: a scale range needs both ends in order; a leakage check needs date, method and rate. */
function optionalPartErrors(v: { scaleMinMm?: number; scaleMaxMm?: number; leakageCheckedAt?: Date; leakageMethod?: string; leakageRate?: number }): Record<string, string> {
  const errors: Record<string, string> = {};
  if ((v.scaleMinMm === undefined) !== (v.scaleMaxMm === undefined)) errors[v.scaleMinMm === undefined ? "scaleMinMm" : "scaleMaxMm"] = "Give both ends of the calibrated scale range, or neither.";
  else if (v.scaleMinMm !== undefined && v.scaleMaxMm !== undefined && !(v.scaleMinMm < v.scaleMaxMm)) errors.scaleMaxMm = "The top of the calibrated range must be above its bottom.";
  const leakage = [v.leakageCheckedAt, v.leakageMethod, v.leakageRate];
  if (leakage.some((x) => x !== undefined) && leakage.some((x) => x === undefined)) {
    if (v.leakageCheckedAt === undefined) errors.leakageCheckedAt = "Enter the date of the leakage check.";
    if (v.leakageMethod === undefined) errors.leakageMethod = "Say how the leakage was checked (e.g. a dummy impermeable specimen for 24 h).";
    if (v.leakageRate === undefined) errors.leakageRate = "Enter the leakage rate measured.";
  }
  return errors;
}

/**
 * Recording a calibration. `equipmentKind` lets the form apply the burette-panel rule before sending; the
 * server applies the same rule with the kind it has on record, whatever the form sent.
 */
export const recordCalibrationSchema = z
  .object({
    equipmentId: z.string().min(1),
    equipmentKind: z.enum(EQUIPMENT_KINDS).optional(),
    calibratedAt: pastDateTime("the calibration date"),
    dueAt: futureDate("the date the next calibration is due"),
    reference: requiredText("the certificate or report reference", 120),
    performedBy: requiredText("who performed the calibration", 120),
    passed: checkbox("Say whether the calibration passed."),
    inflowBuretteAreaMm2: buretteArea("the inflow burette area (mm²)"),
    outflowBuretteAreaMm2: buretteArea("the outflow burette area (mm²)"),
    inflowZeroAboveDatumMm: datumOffset("the height of the inflow burette's zero above the datum (mm)"),
    outflowZeroAboveDatumMm: datumOffset("the height of the outflow burette's zero above the datum (mm)"),
    scaleMinMm: scaleEnd("the bottom of the calibrated scale range (mm)"),
    scaleMaxMm: scaleEnd("the top of the calibrated scale range (mm)"),
    standardUncertainty: optionalMeasured("the standard uncertainty", { min: 0, max: 1e6 }),
    leakageCheckedAt: z.preprocess((v) => (v === "" || v === null ? undefined : v), pastDateTime("the date of the leakage check").optional()),
    leakageMethod: z.preprocess((v) => (typeof v === "string" && v.trim() === "" ? undefined : v), z.string().trim().max(300, "Keep the leakage method to 300 characters.").optional()),
    leakageRate: optionalMeasured("the leakage rate", { min: 0, max: 1 }),
    leakageUnit: z.enum(LEAKAGE_UNITS).default("M3_PER_S"),
  })
  .superRefine(
    (v, ctx) => {
      if (v.dueAt.getTime() < v.calibratedAt.getTime())
        ctx.addIssue({ code: "custom", path: ["dueAt"], message: "The due date cannot be before the calibration date." });
      else if (v.dueAt.getTime() - v.calibratedAt.getTime() > 10 * 366 * 86_400_000)
        ctx.addIssue({ code: "custom", path: ["dueAt"], message: "The due date is more than 10 years after the calibration; check the year." });
    },
    { when: validFields("calibratedAt", "dueAt") },
  )
  .superRefine(
    (v, ctx) => {
      if (!v.equipmentKind) return;
      for (const [path, message] of Object.entries(calibrationValueErrors(v.equipmentKind, v))) ctx.addIssue({ code: "custom", path: [path], message });
    },
    // Runs even while other fields are wrong, so the form shows every missing value at once.
    { when: validFields("equipmentKind", "inflowBuretteAreaMm2", "outflowBuretteAreaMm2") },
  )
  .superRefine(
    (v, ctx) => {
      for (const [path, message] of Object.entries(optionalPartErrors(v))) ctx.addIssue({ code: "custom", path: [path], message });
    },
    { when: validFields("scaleMinMm", "scaleMaxMm", "leakageCheckedAt", "leakageMethod", "leakageRate") },
  );
export type RecordCalibrationInput = z.input<typeof recordCalibrationSchema>;

/** Putting equipment in or out of service, or retiring it, with the reason; `version` refuses a change made on a stale screen. */
export const setEquipmentStatusSchema = z.object({
  equipmentId: z.string().min(1),
  version: versionSchema,
  status: z.enum(EQUIPMENT_STATUSES, { message: "Choose a status." }),
  reason: reasonSchema,
});
export type SetEquipmentStatusInput = z.input<typeof setEquipmentStatusSchema>;

/** The calibrated values stored for a burette panel (Calibration.values), in m². */
export const buretteAreasM2Schema = z.object({ inflowBuretteAreaM2: z.number().positive(), outflowBuretteAreaM2: z.number().positive() });
export type BuretteAreasM2 = z.infer<typeof buretteAreasM2Schema>;

/** The burette areas in a calibration's stored values, or null when it has none (not a burette panel). */
export function readBuretteAreasM2(values: unknown): BuretteAreasM2 | null {
  const parsed = buretteAreasM2Schema.safeParse(values);
  return parsed.success ? parsed.data : null;
}

export type { PressureUnit };
