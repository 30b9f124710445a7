import { getOpenApiDocument } from "@/lib/server/api/openapi-document";

export const dynamic = "force-dynamic";

/** GET /api/v1/openapi.json: the API described (OpenAPI 3.1, generated from its zod schemas). Public. */
export function GET() {
  return Response.json(getOpenApiDocument(), { headers: { "Cache-Control": "public, max-age=300" } });
}
