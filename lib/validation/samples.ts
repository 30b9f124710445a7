import { z } from "zod";
import { TEST_METHOD_CODES } from "../custody/preparation-checklists";
import { measured, optionalMeasured, pastDateTime, reasonSchema, requiredText, versionSchema } from "./common";

export const cutCouponSchema = z.object({
  rollId: z.string().min(1),
  rollVersion: versionSchema,
  positionInSample: requiredText("where in the roll sample the coupon was cut", 200),
  lengthMm: measured("the coupon length (mm)", { positive: true, max: 10_000 }),
  widthMm: measured("the coupon width (mm)", { positive: true, max: 10_000 }),
  cutAt: pastDateTime("when it was cut"),
  storageLocationId: z.string().min(1, "Choose where the coupon is kept."),
  // The index test the coupon is cut for (tensile strips, mass-per-area squares); blank: specimens for a hydraulic test.
  intendedMethodCode: z.preprocess((v) => (v === "" || v === null ? undefined : v), z.enum(["D5890", "D5891", "D5993", "D2216", "D6768", "D6496"], { message: "Choose an index test, or none." }).optional()),
});
export type CutCouponInput = z.input<typeof cutCouponSchema>;

export const prepareSpecimenSchema = z
  .object({
    couponId: z.string().min(1),
    dieDiameterMm: measured("the die diameter (mm)", { positive: true, max: 500 }),
    initialThicknessMm: measured("the initial thickness (mm)", { positive: true, max: 100 }),
    initialMassG: measured("the initial mass (g)", { positive: true, max: 10_000 }),
    moistureContentPct: optionalMeasured("the moisture content (%)", { min: 0, max: 500 }),
    // What the D6766 pore-volume count needs: the dry bentonite mass, or the mass per unit area at the moisture content.
    bentoniteDryMassG: optionalMeasured("the dry bentonite mass (g)", { positive: true, max: 10_000 }),
    bentoniteMassPerAreaKgPerM2: optionalMeasured("the bentonite mass per unit area (kg/m²)", { positive: true, max: 50 }),
    specificGravity: optionalMeasured("the specific gravity of the bentonite solids", { min: 1, max: 5 }),
    intendedMethodCode: z.enum(TEST_METHOD_CODES as [string, ...string[]], { message: "Choose the test method." }),
    preparedAt: pastDateTime("when it was prepared"),
    storageLocationId: z.string().min(1, "Choose where the specimen is kept."),
    checklist: z.record(z.string(), z.boolean()),
  })
  .superRefine((v, ctx) => {
    if (v.bentoniteMassPerAreaKgPerM2 !== undefined && v.moistureContentPct === undefined)
      ctx.addIssue({ code: "custom", path: ["moistureContentPct"], message: "Give the moisture content too: the mass per unit area is turned into dry mass with it." });
    if (v.intendedMethodCode === "D6766" && v.bentoniteDryMassG === undefined && v.bentoniteMassPerAreaKgPerM2 === undefined)
      ctx.addIssue({ code: "custom", path: ["bentoniteDryMassG"], message: "ASTM D6766 counts pore volumes of flow: give the dry bentonite mass, or the mass per unit area with the moisture content." });
  });
export type PrepareSpecimenInput = z.input<typeof prepareSpecimenSchema>;

export const itemRefSchema = z.object({ kind: z.enum(["roll", "coupon", "specimen"]), id: z.string().min(1), version: versionSchema });

export const moveItemSchema = itemRefSchema.extend({ toLocationId: z.string().min(1, "Choose where it goes."), note: z.string().trim().max(500).default("") });

export const retainItemSchema = itemRefSchema.extend({ retainDays: z.coerce.number().int().min(1).max(3650).optional(), note: z.string().trim().max(500).default("") });

export const disposeRetainedSchema = z.object({
  items: z.array(z.object({ kind: z.enum(["roll", "coupon", "specimen"]), id: z.string().min(1) })).min(1, "Choose at least one item.").max(1000),
  note: reasonSchema,
});

export const storageLocationSchema = z.object({
  code: z.string().trim().toUpperCase().regex(/^[A-Z0-9-]{2,20}$/, "Use 2 to 20 letters, digits or dashes."),
  name: requiredText("the location's name", 120),
  description: z.string().trim().max(500).optional(),
});
