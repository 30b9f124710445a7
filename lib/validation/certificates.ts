import { z } from "zod";
import { reasonSchema } from "./common";
import { UNIT_SYSTEMS } from "../format/result-numbers";

export const draftCertificateSchema = z.object({
  projectId: z.string().min(1, "Choose the project."),
  resultIds: z.array(z.string().min(1)).max(200).default([]),
  /** Approved index-test results (swell index, fluid loss, mass per area, tensile, peel...). */
  indexResultIds: z.array(z.string().min(1)).max(400).default([]),
}).refine((v) => v.resultIds.length + v.indexResultIds.length > 0, { message: "Choose at least one approved result.", path: ["resultIds"] });

export const issueCertificateSchema = z.object({
  revisionId: z.string().min(1),
  password: z.string().min(1, "Enter your password to sign."),
  meaning: z.string().trim().min(3).max(200).default("Reviewed and approved for issue"),
});

export const reviseCertificateSchema = z.object({
  certificateId: z.string().min(1),
  reason: reasonSchema,
});

/**
 * A draft's editable content, saved as a new version on top of `baseVersion` (the version the editor
 * started from, so two people editing at once do not overwrite each other unseen).
 */
export const editCertificateDraftSchema = z.object({
  revisionId: z.string().min(1),
  baseVersion: z.coerce.number().int().min(0),
  resultIds: z.array(z.string().min(1)).max(200),
  indexResultIds: z.array(z.string().min(1)).max(400).default([]),
  specificationId: z.string().trim().max(100).default(""),
  remarks: z.string().trim().max(2000, "Keep the remarks under 2,000 characters.").default(""),
  signatoryId: z.string().trim().max(100).default(""),
  unitSystem: z.enum(UNIT_SYSTEMS, { message: "Choose SI or centimetre units." }),
});
export type EditCertificateDraftInput = z.input<typeof editCertificateDraftSchema>;
