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

/** The largest data-logger file one import takes (32 MiB, about 300,000 logger rows); the form says so. */
export const MAX_READINGS_FILE_BYTES = 32 * 1024 * 1024;
/** The most readings one import saves; a longer file is imported in parts. */
export const MAX_READINGS_FILE_ROWS = 300_000;
export const READINGS_FILE_LIMIT_TEXT = `Files up to 32 MB and ${MAX_READINGS_FILE_ROWS.toLocaleString("en-GB")} rows; split a longer logger file by date and import each part in order.`;

/** An uploaded data-logger file's settings (the file itself is the request body): all rows saved or none. */
export const importReadingsFileSchema = z.object({
  labNumber: z.string().trim().min(1).max(40),
  fileName: z
    .string({ message: "Name the file." })
    .trim()
    .transform((name) => name.split(/[\\/]/).pop() ?? name)
    .pipe(z.string().min(1, "Name the file.").max(200, "The file name is longer than 200 characters.")),
  mapping: readingsCsvMappingSchema.optional(),
  mode: z.enum(["preview", "save"], { message: "Say whether to preview or save." }),
});
export type ImportReadingsFileInput = z.input<typeof importReadingsFileSchema>;

/** A correction: a new reading that replaces `readingId`, with the reason; the original stays. */
export const correctReadingSchema = z.object({
  readingId: z.string().min(1),
  pressureUnit: pressureUnitSchema,
  values: readingEntrySchema,
  reason: reasonSchema,
});
export type CorrectReadingInput = z.input<typeof correctReadingSchema>;
