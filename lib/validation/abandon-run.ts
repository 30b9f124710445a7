import { z } from "zod";
import { reasonSchema, versionSchema } from "./common";

/** What becomes of the specimen of an abandoned run: kept in storage, or disposed of. */
export const ABANDONED_SPECIMEN_FATES = ["storage", "disposal"] as const;

/** Abandoning a run before approval: why, and where the specimen goes. */
export const abandonRunSchema = z
  .object({
    runId: z.string().min(1),
    version: versionSchema,
    reason: reasonSchema,
    specimenFate: z.enum(ABANDONED_SPECIMEN_FATES, { message: "Say whether the specimen goes back to storage or is disposed of." }),
    storageLocationId: z.string().trim().optional().transform((v) => v || undefined),
  })
  .superRefine((v, ctx) => {
    if (v.specimenFate === "storage" && !v.storageLocationId)
      ctx.addIssue({ code: "custom", path: ["storageLocationId"], message: "Choose where the specimen is kept." });
  });
export type AbandonRunInput = z.input<typeof abandonRunSchema>;
