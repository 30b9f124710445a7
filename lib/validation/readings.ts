import { z } from "zod";
import { READING_CSV_TARGETS } from "../readings/readings-csv";
import { TEMPERATURE_RANGE_C } from "../readings/reading-draft";
import { PRESSURE_UNITS } from "../units/pressure-entry";
import { measured, optionalMeasured, pastDateTime, reasonSchema } from "./common";

const pressureUnitSchema = z.enum(PRESSURE_UNITS, { message: "Choose kPa or psi." });
const pressure = (label: string) => measured(label, { min: 0, max: 10_000 });

/**
 * One reading as typed into the grid (or the correction form): strings from inputs become numbers,
 * "12,5" is read as 12.5. Pressures are in the unit named beside the batch; the server converts them.
 */
export const readingEntrySchema = z
  .object({
    takenAt: pastDateTime("the time of the reading"),
    inflowLevelMm: measured("the inflow burette level (mm)", { min: 0, max: 5000 }),
    outflowLevelMm: measured("the outflow burette level (mm)", { min: 0, max: 5000 }),
    influentPressure: pressure("the influent pressure"),
    effluentPressure: pressure("the effluent pressure"),
    cellPressure: optionalMeasured("the cell pressure", { min: 0, max: 10_000 }),
    temperatureC: measured("the temperature (°C)", TEMPERATURE_RANGE_C),
    influentEcMsPerM: optionalMeasured("the influent EC (mS/m)", { min: 0, max: 100_000 }),
    effluentEcMsPerM: optionalMeasured("the effluent EC (mS/m)", { min: 0, max: 100_000 }),
    influentPh: optionalMeasured("the influent pH", { min: 0, max: 14 }),
    effluentPh: optionalMeasured("the effluent pH", { min: 0, max: 14 }),
    // A checkbox ("on"), a JSON boolean, or absent.
    afterRefill: z.preprocess((v) => v === true || v === "true" || v === "on", z.boolean()).default(false),
  })
  .superRefine((v, ctx) => {
    if (typeof v.influentPressure === "number" && typeof v.effluentPressure === "number" && !(v.influentPressure > v.effluentPressure))
      ctx.addIssue({ code: "custom", path: ["effluentPressure"], message: "The effluent pressure must be below the influent pressure, so that the head is positive." });
  });
export type ReadingEntryInput = z.input<typeof readingEntrySchema>;
export type ReadingEntry = z.output<typeof readingEntrySchema>;

/** A batch from the entry grid: all saved or none. */
export const recordReadingsSchema = z.object({
  runId: z.string().min(1),
  pressureUnit: pressureUnitSchema,
  readings: z.array(readingEntrySchema).min(1, "Add at least one reading.").max(200, "Save at most 200 readings at once; import a file for more."),
});
export type RecordReadingsInput = z.input<typeof recordReadingsSchema>;

/** Which column of a data-logger file holds what, as the person chose it in the preview. */
export const readingsCsvMappingSchema = z.object({
  columns: z.array(z.enum([...READING_CSV_TARGETS, "ignore"])).max(100, "The file has more than 100 columns."),
  elapsedUnit: z.enum(["s", "min", "h"], { message: "Choose the unit of the elapsed time." }),
  pressureUnit: pressureUnitSchema,
});

/** 400 000 characters is about 5 000 logger rows, and stays under the 1 MB server-action limit. */
export const MAX_READINGS_CSV_CHARS = 400_000;

/** A data-logger file: "preview" judges every row and saves nothing; "save" saves all rows or none. */
export const importReadingsCsvSchema = z.object({
  runId: z.string().min(1),
  fileName: z
    .string({ message: "Name the file." })
    .trim()
    .transform((name) => name.split(/[\\/]/).pop() ?? name)
    .pipe(z.string().min(1, "Name the file.").max(200, "The file name is longer than 200 characters.")),
  text: z.string().min(1, "Choose a file or paste the readings.").max(MAX_READINGS_CSV_CHARS, `The file is larger than ${MAX_READINGS_CSV_CHARS.toLocaleString("en")} characters; split it into parts.`),
  mapping: readingsCsvMappingSchema.optional(),
  mode: z.enum(["preview", "save"]),
});
export type ImportReadingsCsvInput = z.input<typeof importReadingsCsvSchema>;

/** A correction: a new reading that replaces `readingId`, with the reason; the original stays. */
export const correctReadingSchema = z.object({
  readingId: z.string().min(1),
  pressureUnit: pressureUnitSchema,
  values: readingEntrySchema,
  reason: reasonSchema,
});
export type CorrectReadingInput = z.input<typeof correctReadingSchema>;
