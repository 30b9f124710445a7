/**
 * What a technician enters for an index test, per method, checked with the lab's settings of that method
 * (cylinder capacity, fewest specimens): impossible values are refused with a message on the field that is
 * wrong (a dry mass above the wet mass, a tare above the dry mass, a swell volume above the cylinder, too
 * few specimens, a negative force). Shared by the form and the server. Pure.
 */
import { z } from "zod";
import { INDEX_METHODS, type IndexMethodCode } from "../index-tests/index-test-methods";
import { measured, reasonSchema, versionSchema } from "./common";
import { pastDateTime } from "./record-dates";

const blankRow = (row: unknown) => row !== null && typeof row === "object" && Object.values(row as Record<string, unknown>).every((v) => v === undefined || v === null || String(v).trim() === "");

/** Specimen rows as the form sends them: blank rows are dropped; at least `min` must remain. */
function specimenRows<T extends z.ZodRawShape>(shape: T, min: number, method: string) {
  return z.preprocess(
    (v) => (Array.isArray(v) ? v.filter((row) => !blankRow(row)) : v),
    z.array(z.object(shape)).refine((rows) => rows.length >= min, { message: `ASTM ${method} as the lab runs it needs at least ${min} specimen${min === 1 ? "" : "s"}; enter ${min === 1 ? "one" : `${min} or more`}.` }),
  );
}

const mass = (label: string) => measured(label, { min: 0, max: 100_000 });

/** The wet, dry and tare masses of an oven-dried specimen, with the two impossible orders refused on their fields. */
const moistureShape = {
  wetWithTareG: mass("the wet mass with its container (g)"),
  dryWithTareG: mass("the dry mass with its container (g)"),
  tareG: mass("the container's mass (g)"),
};
function refineMoisture(v: { wetWithTareG: number; dryWithTareG: number; tareG: number }, ctx: z.RefinementCtx) {
  if (v.dryWithTareG > v.wetWithTareG)
    ctx.addIssue({ code: "custom", path: ["observations", "dryWithTareG"], message: `The dry mass (${v.dryWithTareG} g) is above the wet mass (${v.wetWithTareG} g): a specimen cannot gain water in the oven. Check both weighings.` });
  else if (v.tareG >= v.dryWithTareG)
    ctx.addIssue({ code: "custom", path: ["observations", "tareG"], message: `The container's mass (${v.tareG} g) is not below the dry mass with the container (${v.dryWithTareG} g): there would be no dry clay. Check the tare.` });
}

type Settings = Record<string, unknown>;

function observationsSchema(code: IndexMethodCode, s: Settings) {
  const min = Number(s.minSpecimens ?? 1);
  switch (code) {
    case "D5890": {
      const capacity = Number(s.cylinderCapacityMl);
      return z.object({
        methodCode: z.literal("D5890"),
        dryClayMassG: measured("the dry clay mass (g)", { positive: true, max: 100 }),
        settledVolumeMl: measured("the settled swollen volume (mL)", { min: 0 }).refine((v) => v <= capacity, `The settled volume cannot be above the cylinder's capacity of ${capacity} mL; check the reading.`),
        hydrationHours: measured("the hydration time (h)", { min: 0, max: 1000 }),
        waterTemperatureC: measured("the water temperature (°C)", { min: 0, max: 60 }),
      });
    }
    case "D5891":
      return z.object({
        methodCode: z.literal("D5891"),
        clayMassG: measured("the clay mass of the slurry (g)", { positive: true, max: 1000 }),
        waterVolumeMl: measured("the water volume of the slurry (mL)", { positive: true, max: 10_000 }),
        pressureKPa: measured("the filter-press pressure (kPa)", { positive: true, max: 5000 }),
        filtrationMinutes: measured("the filtration time (min)", { positive: true, max: 600 }),
        filtrateVolumeMl: measured("the filtrate volume (mL)", { min: 0, max: 1000 }),
      });
    case "D5993": {
      const minAreaCm2 = Number(s.minSpecimenAreaCm2 ?? 0);
      return z.object({
        methodCode: z.literal("D5993"),
        ...moistureShape,
        specimens: specimenRows({
          lengthMm: measured("the length (mm)", { positive: true, max: 5000 }),
          widthMm: measured("the width (mm)", { positive: true, max: 5000 }),
          totalMassG: measured("the total mass (g)", { positive: true, max: 100_000 }),
          geotextileMassG: measured("the geotextile mass (g)", { min: 0, max: 100_000 }),
        }, min, "D5993"),
      }).superRefine((v, ctx) => {
        v.specimens.forEach((sp, i) => {
          if (sp.geotextileMassG > sp.totalMassG) ctx.addIssue({ code: "custom", path: ["specimens", i, "geotextileMassG"], message: `Specimen ${i + 1}: the geotextile mass is above the total mass.` });
          if ((sp.lengthMm * sp.widthMm) / 100 < minAreaCm2) ctx.addIssue({ code: "custom", path: ["specimens", i, "widthMm"], message: `Specimen ${i + 1} is smaller than the ${minAreaCm2} cm² the lab's settings ask.` });
        });
      });
    }
    case "D2216":
      return z.object({
        methodCode: z.literal("D2216"),
        ...moistureShape,
        dryingHours: measured("the drying time (h)", { min: 0, max: 1000 }),
        ovenTemperatureC: measured("the oven temperature (°C)", { min: 20, max: 300 }),
      });
    case "D6768":
      return z.object({
        methodCode: z.literal("D6768"),
        direction: z.enum(["MD", "XD"], { message: "Choose the direction: machine (MD) or cross-machine (XD)." }),
        specimens: specimenRows({
          widthMm: measured("the strip width (mm)", { positive: true, max: 1000 }),
          peakForceN: measured("the peak force (N)", { max: 1_000_000 }).refine((v) => v >= 0, "A force cannot be negative; enter the peak force the load cell read."),
        }, min, "D6768"),
      });
    case "D6496":
      return z.object({
        methodCode: z.literal("D6496"),
        specimens: specimenRows({
          widthMm: measured("the specimen width (mm)", { positive: true, max: 1000 }),
          peelForceN: measured("the average peel force (N)", { max: 100_000 }).refine((v) => v >= 0, "A force cannot be negative; enter the average peel force."),
        }, min, "D6496"),
      });
  }
}

/** The whole entry of one index test of a method, judged by the settings in force. */
export function recordIndexTestSchema(code: IndexMethodCode, settings: Settings) {
  const method = INDEX_METHODS[code];
  const instrumentShape = Object.fromEntries(method.instruments.map((i) => [i.key, z.string({ message: `Choose the ${i.label.toLowerCase()}.` }).min(1, `Choose the ${i.label.toLowerCase()}.`)]));
  const observations = observationsSchema(code, settings) as z.ZodType<Record<string, unknown> & { methodCode: IndexMethodCode }>;
  return z
    .object({
      rollId: z.string().min(1),
      methodCode: z.literal(code),
      couponId: method.needsCoupon
        ? z.string({ message: `Choose the coupon of ${method.couponWhat}.` }).min(1, `Choose the coupon of ${method.couponWhat}; cut one first if there is none.`)
        : z.preprocess((v) => (v === "" || v === null ? undefined : v), z.string().min(1).optional()),
      testedAt: pastDateTime("when the test was done"),
      instruments: z.object(instrumentShape),
      observations,
      // A redo after QA returned a test points at the returned one.
      correctsId: z.preprocess((v) => (v === "" || v === null ? undefined : v), z.string().min(1).optional()),
    })
    .superRefine((v, ctx) => {
      const o = v.observations as Record<string, unknown>;
      if (code === "D5993" || code === "D2216") refineMoisture(o as never, ctx);
    });
}
export type RecordIndexTestValues = z.output<ReturnType<typeof recordIndexTestSchema>>;

/** Before the method is known: its code, to find its settings. */
export const indexTestEnvelope = z.object({ methodCode: z.enum(["D5890", "D5891", "D5993", "D2216", "D6768", "D6496"], { message: "Choose the index test." }) }).passthrough();

/** A QA manager's decision on an index test. */
export const reviewIndexTestSchema = z.discriminatedUnion("decision", [
  z.object({ indexTestId: z.string().min(1), version: versionSchema, decision: z.literal("APPROVED"), comments: z.string().trim().max(2000).default("") }),
  z.object({ indexTestId: z.string().min(1), version: versionSchema, decision: z.literal("RETURNED"), comments: reasonSchema }),
]);
export type ReviewIndexTestInput = z.input<typeof reviewIndexTestSchema>;
