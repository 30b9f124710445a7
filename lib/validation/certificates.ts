import { z } from "zod";
import { reasonSchema } from "./common";

export const draftCertificateSchema = z.object({
  projectId: z.string().min(1, "Choose the project."),
  resultIds: z.array(z.string().min(1)).min(1, "Choose at least one approved result."),
});

export const issueCertificateSchema = z.object({
  revisionId: z.string().min(1),
  password: z.string().min(1, "Enter your password to sign."),
  meaning: z.string().trim().min(3).max(200).default("Reviewed and approved for issue"),
});

export const reviseCertificateSchema = z.object({
  certificateId: z.string().min(1),
  reason: reasonSchema,
});
