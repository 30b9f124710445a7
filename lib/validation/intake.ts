import { z } from "zod";
import { readYesNo, YES_NO_HINT } from "../custody/yes-no";
import { optionalMeasured, pastDateTime, reasonSchema, requiredText, versionSchema } from "./common";

/** One roll as logged on arrival; the same schema judges a form row and a pasted spreadsheet row. */
export const rollEntrySchema = z.object({
  rollNumber: requiredText("the roll number", 60),
  lotNumber: requiredText("the lot number", 60),
  product: requiredText("the product", 200),
  manufacturer: requiredText("the manufacturer", 200),
  sampleLengthMm: optionalMeasured("the sample length (mm)", { positive: true, max: 100_000 }),
  sampleWidthMm: optionalMeasured("the sample width (mm)", { positive: true, max: 10_000 }),
  // Only the words readYesNo knows; anything else is refused, never read as "marked".
  machineDirectionMarked: z.preprocess((v) => readYesNo(v) ?? v, z.boolean({ message: `Write whether the machine direction is marked as ${YES_NO_HINT}.` })),
  conditionNotes: z.string().trim().max(500, "Keep the roll's condition to 500 characters.").default(""),
  // The delivered roll's size, for sampling coverage (one test per so many m² delivered).
  deliveredLengthM: optionalMeasured("the delivered roll length (m)", { positive: true, max: 10_000 }),
  deliveredWidthM: optionalMeasured("the delivered roll width (m)", { positive: true, max: 100 }),
});
export type RollEntry = z.output<typeof rollEntrySchema>;

/** Columns of the paste grid, with the header words a spreadsheet might use for each. */
export const ROLL_PASTE_COLUMNS = [
  { key: "rollNumber", labels: ["roll", "roll number", "roll no", "roll #"] },
  { key: "lotNumber", labels: ["lot", "lot number", "lot no", "lot #"] },
  { key: "product", labels: ["product"] },
  { key: "manufacturer", labels: ["manufacturer", "maker"] },
  { key: "sampleLengthMm", labels: ["length", "length mm", "sample length", "sample length mm"] },
  { key: "sampleWidthMm", labels: ["width", "width mm", "sample width", "sample width mm"] },
  { key: "machineDirectionMarked", labels: ["md", "md marked", "machine direction", "machine direction marked"] },
  { key: "conditionNotes", labels: ["condition", "condition on arrival", "roll condition", "remarks"] },
  { key: "deliveredLengthM", labels: ["roll length", "roll length m", "delivered length", "delivered length m"] },
  { key: "deliveredWidthM", labels: ["roll width", "roll width m", "delivered width", "delivered width m"] },
] as const;

export const shipmentDetailsSchema = z.object({
  clientOrganizationId: z.string().min(1, "Choose the client."),
  projectId: z.string().min(1, "Choose the project."),
  deliveredBy: requiredText("who delivered it", 200),
  receivedAt: pastDateTime("when it arrived"),
  conditionNotes: z.string().trim().max(2000).default(""),
  storageLocationId: z.string().min(1, "Choose where the rolls are stored."),
});

export const logShipmentSchema = shipmentDetailsSchema.extend({
  rolls: z.array(rollEntrySchema).min(1, "Add at least one roll.").max(500, "Log at most 500 rolls at once."),
});
export type LogShipmentInput = z.input<typeof logShipmentSchema>;

export const acknowledgeShipmentSchema = z.object({ shipmentId: z.string().min(1), version: versionSchema });

/** A change to an acknowledged receipt: one field, its new value and why. */
export const SHIPMENT_CORRECTABLE_FIELDS = ["deliveredBy", "receivedAt", "conditionNotes"] as const;
export const ROLL_CORRECTABLE_FIELDS = ["rollNumber", "lotNumber", "product", "manufacturer", "sampleLengthMm", "sampleWidthMm", "machineDirectionMarked", "conditionNotes", "deliveredLengthM", "deliveredWidthM"] as const;

export const correctReceiptSchema = z.object({
  target: z.enum(["shipment", "roll"]),
  id: z.string().min(1),
  field: z.string().min(1),
  value: z.string().max(2000),
  reason: reasonSchema,
  version: versionSchema,
});
export type CorrectReceiptInput = z.input<typeof correctReceiptSchema>;
