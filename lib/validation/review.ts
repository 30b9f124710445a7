import { z } from "zod";
import { versionSchema } from "./common";

export const approveRunSchema = z.object({ runId: z.string().min(1), version: versionSchema, comments: z.string().trim().max(2000).default("") });

export const returnRunSchema = z.object({
  runId: z.string().min(1),
  version: versionSchema,
  comments: z.string().trim().min(5, "Say what the technician should change (at least 5 characters).").max(2000),
});
