import "server-only";
import type { ApiNeed } from "@/lib/policy/api-tokens";
import { apiErrorResponse, apiJson } from "./api-response";
import { authenticateApiRequest, type ApiCaller } from "./authenticate-api-request";

type Work<P> = (context: { caller: ApiCaller; request: Request; params: P; query: URLSearchParams }) => Promise<unknown>;

/**
 * A route handler of /api/v1: authenticates the token for `need` (401, 403, 429), runs `work`, and answers its
 * value as JSON (a Response is passed through), or the error as `{ error: { code, message } }`.
 */
export function apiHandler<P extends Record<string, string> = Record<string, never>>(need: ApiNeed, work: Work<P>) {
  return async (request: Request, context: { params: Promise<P> }): Promise<Response> => {
    try {
      const caller = await authenticateApiRequest(request, need);
      const result = await work({ caller, request, params: await context.params, query: new URL(request.url).searchParams });
      return result instanceof Response ? result : apiJson(result);
    } catch (error) {
      return apiErrorResponse(error);
    }
  };
}
