import { z } from "zod";
import { reasonSchema, versionSchema } from "./common";

export const approveRunSchema = z.object({
  runId: z.string().min(1),
  version: versionSchema,
  comments: z.string().trim().max(2000).default(""),
  /** The QA manager has read that the cell's apparatus leakage is at or above the method's limit. */
  acknowledgeLeakage: z.preprocess((v) => v === true || v === "true" || v === "on", z.boolean()).default(false),
});

/** A QA manager judges a run by another version of its method's settings than the one in force when it started. */
export const chooseRunSettingsSchema = z.object({
  runId: z.string().min(1),
  version: versionSchema,
  settingsVersionId: z.string().min(1, "Choose the settings version."),
  reason: reasonSchema,
});

export const returnRunSchema = z.object({
  runId: z.string().min(1),
  version: versionSchema,
  comments: z.string().trim().min(5, "Say what the technician should change (at least 5 characters).").max(2000),
});
