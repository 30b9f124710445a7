import { apiHandler } from "@/lib/server/api/api-handler";
import { postApiReadings } from "@/lib/server/api/post-api-readings";
import { apiJson } from "@/lib/server/api/api-response";
import { readApiJson } from "@/lib/server/api/read-api-body";

export const dynamic = "force-dynamic";

/**
 * POST /api/v1/runs/T26-00004/readings: one or many readings from a data-logger token, each with its
 * idempotencyKey; all saved or none. 201 when something new was saved, 200 for a pure retry.
 */
export const POST = apiHandler<{ labNumber: string }>("post-readings", async ({ caller, request, params }) => {
  const answer = await postApiReadings({ caller, labNumber: params.labNumber, body: await readApiJson(request) });
  return apiJson(answer, answer.saved > 0 ? 201 : 200);
});
