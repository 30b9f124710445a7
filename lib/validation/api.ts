import { z } from "zod";
import { readingEntrySchema } from "./readings";
import { PRESSURE_UNITS } from "../units/pressure-entry";

/**
 * The shapes of the API under /api/v1: what it accepts (the readings a data-logger posts, checked by the same
 * reading schema as the grid) and what it answers. The OpenAPI document is generated from these
 * (lib/server/api/openapi-document.ts); nothing about the API is written twice.
 */

export const apiErrorSchema = z
  .object({
    error: z.object({
      code: z.string().describe("UNAUTHENTICATED, FORBIDDEN, NOT_FOUND, INVALID_INPUT, CONFLICT, ILLEGAL_TRANSITION, GONE, TOO_LARGE, RATE_LIMITED, INTERNAL"),
      message: z.string().describe("A sentence saying what went wrong and what to do."),
      fieldErrors: z.record(z.string(), z.string()).optional().describe("Per field, keyed by its path in the body (readings.0.takenAt)."),
    }),
  })
  .describe("Every refusal: a code and a sentence.");

/** A key a data-logger chooses per reading: a retry with the same key and the same reading saves nothing new. */
export const idempotencyKeySchema = z
  .string({ message: "Give each reading an idempotencyKey." })
  .trim()
  .min(8, "An idempotencyKey has at least 8 characters.")
  .max(200, "An idempotencyKey has at most 200 characters.")
  .regex(/^[A-Za-z0-9._:\-]+$/, "An idempotencyKey uses letters, digits and . _ : - only.");

export const apiReadingSchema = readingEntrySchema.safeExtend({
  // The grid's own rule for the time, described for the API's readers.
  takenAt: readingEntrySchema.shape.takenAt.describe("When the reading was taken: ISO 8601 with its zone, e.g. 2026-12-02T09:30:00Z. Not in the future, not before permeation began."),
  idempotencyKey: idempotencyKeySchema,
});

export const postReadingsSchema = z
  .object({
    pressureUnit: z.enum(PRESSURE_UNITS, { message: "Choose KPA or PSI." }).describe("The unit of the pressures in these readings."),
    readings: z.array(apiReadingSchema).min(1, "Send at least one reading.").max(200, "Send at most 200 readings per request."),
  })
  .superRefine((v, ctx) => {
    const seen = new Map<string, number>();
    v.readings.forEach((r, i) => {
      const first = seen.get(r.idempotencyKey);
      if (first !== undefined) ctx.addIssue({ code: "custom", path: ["readings", i, "idempotencyKey"], message: `The key ${r.idempotencyKey} is also on reading ${first + 1} of this request; each reading needs its own.` });
      else seen.set(r.idempotencyKey, i);
    });
  });
export type PostReadingsInput = z.input<typeof postReadingsSchema>;

export const postReadingsAnswerSchema = z.object({
  run: z.string().describe("The run's lab number."),
  saved: z.number().int().describe("Readings saved by this request."),
  replayed: z.number().int().describe("Readings whose key was already saved with the same values: nothing new was saved for them."),
  readings: z.array(z.object({ idempotencyKey: z.string(), sequence: z.number().int(), replayed: z.boolean() })),
});

const page = <T extends z.ZodType>(item: T) =>
  z.object({ data: z.array(item), nextCursor: z.string().nullable().describe("Pass as ?cursor= for the next page; null on the last page.") });

const project = z.object({ code: z.string(), name: z.string() });

export const apiRollSchema = z.object({
  labNumber: z.string(),
  rollNumber: z.string(),
  lotNumber: z.string(),
  product: z.string(),
  manufacturer: z.string(),
  state: z.string(),
  project,
  receivedAt: z.string().describe("ISO 8601, UTC."),
});

export const apiSpecimenSchema = z.object({
  labNumber: z.string(),
  coupon: z.string(),
  roll: z.string(),
  dieDiameterMm: z.number(),
  initialThicknessMm: z.number(),
  initialMassG: z.number(),
  intendedMethod: z.string(),
  state: z.string(),
  preparedAt: z.string(),
});

const criterion = z.object({ key: z.string(), name: z.string(), met: z.boolean(), value: z.number().nullable(), limit: z.string(), message: z.string() });

export const apiRunSchema = z.object({
  labNumber: z.string(),
  specimen: z.string(),
  cell: z.string().describe("The permeameter cell's asset tag."),
  method: z.string(),
  state: z.string(),
  assignedAt: z.string(),
  terminatedAt: z.string().nullable(),
  readings: z.number().int().describe("Readings in force (corrections replace what they correct)."),
});

export const apiRunDetailSchema = apiRunSchema.extend({
  criteria: z.array(criterion).nullable().describe("The termination criteria on the readings so far (lab tokens only; null for client tokens or too few readings)."),
  criteriaMet: z.boolean().nullable(),
  reported: z
    .object({ fluxM3PerM2PerS: z.number().nullable(), k20MPerS: z.number().nullable() })
    .nullable()
    .describe("The values the run reports so far: index flux (m³/m²/s) and hydraulic conductivity at 20 °C (m/s)."),
});

export const apiResultSchema = z.object({
  id: z.string(),
  run: z.string(),
  property: z.string(),
  value: z.number(),
  unit: z.string(),
  expandedUncertainty: z.number().nullable().describe("k = 2, in the result's unit."),
  temperatureC: z.number().nullable(),
  approvedAt: z.string().nullable(),
});

export const apiCertificateSchema = z.object({
  number: z.string(),
  project,
  revisions: z.array(
    z.object({
      revision: z.number().int(),
      status: z.string().describe("ISSUED, SUPERSEDED or REVOKED (and DRAFT for lab tokens)."),
      issuedAt: z.string().nullable(),
      verificationCode: z.string().nullable(),
      pdf: z.string().nullable().describe("Path of the revision's PDF under /api/v1."),
    }),
  ),
});

export const apiRollPageSchema = page(apiRollSchema);
export const apiSpecimenPageSchema = page(apiSpecimenSchema);
export const apiRunPageSchema = page(apiRunSchema);
export const apiResultPageSchema = page(apiResultSchema);
export const apiCertificatePageSchema = page(apiCertificateSchema);

export type ApiRoll = z.infer<typeof apiRollSchema>;
export type ApiSpecimen = z.infer<typeof apiSpecimenSchema>;
export type ApiRun = z.infer<typeof apiRunSchema>;
export type ApiRunDetail = z.infer<typeof apiRunDetailSchema>;
export type ApiResult = z.infer<typeof apiResultSchema>;
export type ApiCertificate = z.infer<typeof apiCertificateSchema>;
export type ApiPage<T> = { data: T[]; nextCursor: string | null };
