import "server-only";
import { extendZodWithOpenApi, OpenAPIRegistry, OpenApiGeneratorV31 } from "@asteasolutions/zod-to-openapi";
import { z } from "zod";
import {
  apiCertificatePageSchema, apiCertificateSchema, apiErrorSchema, apiResultPageSchema, apiRollPageSchema, apiRollSchema, apiRunDetailSchema,
  apiRunPageSchema, apiSpecimenPageSchema, apiSpecimenSchema, postReadingsAnswerSchema, postReadingsSchema,
} from "@/lib/validation/api";

// The registry names components through zod's prototype (`.openapi(name)`), which this adds once per process.
extendZodWithOpenApi(z);

const json = <T extends z.ZodType>(schema: T, description: string) => ({ description, content: { "application/json": { schema } } });
const listQuery = (extra: Record<string, z.ZodType> = {}) =>
  z.object({ cursor: z.string().optional().describe("From nextCursor of the previous page."), limit: z.string().optional().describe("1 to 200; 50 unless given."), ...extra });
const labNumber = (example: string) => z.object({ labNumber: z.string().describe(`Lab number, e.g. ${example}.`) });

let cached: ReturnType<OpenApiGeneratorV31["generateDocument"]> | null = null;

/**
 * The OpenAPI 3.1 document of /api/v1, generated from the same zod schemas the API parses and answers with
 * (lib/validation/api.ts); built once per process.
 */
export function getOpenApiDocument() {
  if (cached) return cached;
  const registry = new OpenAPIRegistry();
  registry.registerComponent("securitySchemes", "token", { type: "http", scheme: "bearer", description: "An API token from My account." });
  // zod 4 gives `.openapi` only to schemas made after the extension: register a clone of each (same definition).
  const named = <T extends z.ZodType>(name: string, schema: T) => registry.register(name, schema.clone());
  const schemas = {
    Error: named("Error", apiErrorSchema),
    Roll: named("Roll", apiRollSchema),
    Specimen: named("Specimen", apiSpecimenSchema),
    Run: named("Run", apiRunDetailSchema),
    Certificate: named("Certificate", apiCertificateSchema),
    PostReadings: named("PostReadings", postReadingsSchema),
    PostReadingsAnswer: named("PostReadingsAnswer", postReadingsAnswerSchema),
    RollPage: named("RollPage", apiRollPageSchema),
    SpecimenPage: named("SpecimenPage", apiSpecimenPageSchema),
    RunPage: named("RunPage", apiRunPageSchema),
    ResultPage: named("ResultPage", apiResultPageSchema),
    CertificatePage: named("CertificatePage", apiCertificatePageSchema),
  };
  const refusals = {
    401: json(schemas.Error, "No token, or an unknown, revoked or expired one."),
    403: json(schemas.Error, "The token's scope does not allow this."),
    429: json(schemas.Error, "Too many requests with this token this minute (Retry-After says when to try again)."),
  };
  const get = (path: string, summary: string, responses: Record<number, ReturnType<typeof json>>, request: { params?: z.ZodObject; query?: z.ZodObject } = {}) =>
    registry.registerPath({ method: "get", path, summary, security: [{ token: [] }], request, responses: { ...responses, ...refusals } });

  get("/rolls", "Rolls, by lab number", { 200: json(schemas.RollPage, "A page of rolls.") }, { query: listQuery({ project: z.string().optional().describe("A project code.") }) });
  get("/rolls/{labNumber}", "One roll", { 200: json(schemas.Roll, "The roll."), 404: json(schemas.Error, "No such roll, or another organisation's.") }, { params: labNumber("R26-00001") });
  get("/specimens", "Specimens, by lab number", { 200: json(schemas.SpecimenPage, "A page of specimens.") }, { query: listQuery({ roll: z.string().optional().describe("A roll's lab number.") }) });
  get("/specimens/{labNumber}", "One specimen", { 200: json(schemas.Specimen, "The specimen."), 404: json(schemas.Error, "Not found.") }, { params: labNumber("S26-00001") });
  get("/runs", "Runs, by lab number", { 200: json(schemas.RunPage, "A page of runs.") }, { query: listQuery({ state: z.string().optional().describe("PERMEATING, TERMINATED, ...") }) });
  get("/runs/{labNumber}", "One run, with its criteria and reported values so far", { 200: json(schemas.Run, "The run."), 404: json(schemas.Error, "Not found.") }, { params: labNumber("T26-00004") });
  get("/results", "Results", { 200: json(schemas.ResultPage, "A page of results.") }, { query: listQuery({ project: z.string().optional(), run: z.string().optional() }) });
  get("/certificates", "Certificates and their revisions", { 200: json(schemas.CertificatePage, "A page of certificates.") }, { query: listQuery({ project: z.string().optional() }) });
  get("/certificates/{number}", "One certificate", { 200: json(schemas.Certificate, "The certificate."), 404: json(schemas.Error, "Not found.") }, { params: z.object({ number: z.string().describe("e.g. Q26-00001") }) });
  registry.registerPath({
    method: "get", path: "/certificates/{number}/pdf", summary: "A certificate revision's PDF", security: [{ token: [] }],
    request: { params: z.object({ number: z.string() }), query: z.object({ revision: z.string().optional().describe("The latest issued unless given.") }) },
    responses: { 200: { description: "The PDF.", content: { "application/pdf": { schema: z.string().describe("binary") } } }, 404: json(schemas.Error, "Not found."), 410: json(schemas.Error, "Revoked (client tokens)."), ...refusals },
  });
  registry.registerPath({
    method: "post", path: "/runs/{labNumber}/readings", summary: "Post readings to a run (data-logger token)", security: [{ token: [] }],
    description: "All saved or none, with the checks of the entry grid. Each reading carries an idempotencyKey: a retry with the same key and values saves nothing again; the same key with other values is 409.",
    request: { params: labNumber("T26-00004"), body: { description: "Readings in time order.", content: { "application/json": { schema: schemas.PostReadings } } } },
    responses: {
      201: json(schemas.PostReadingsAnswer, "Saved (some readings may have been retries)."),
      200: json(schemas.PostReadingsAnswer, "Every reading was a retry; nothing new saved."),
      400: json(schemas.Error, "A reading failed a check; nothing saved."),
      404: json(schemas.Error, "No such run."),
      409: json(schemas.Error, "A key was used before with other values, or the run does not take readings now; nothing saved."),
      413: json(schemas.Error, "The body is larger than 1 MB."),
      ...refusals,
    },
  });

  cached = new OpenApiGeneratorV31(registry.definitions).generateDocument({
    openapi: "3.1.0",
    info: { title: "Seepline API", version: "1", description: "Read a lab's records and post data-logger readings. Errors are JSON: { error: { code, message } }. Lists page with cursors." },
    servers: [{ url: "/api/v1" }],
  });
  return cached;
}
