import { z } from "zod";
import { API_TOKEN_DEFAULT_DAYS, API_TOKEN_MAX_DAYS, API_TOKEN_SCOPES } from "../policy/api-tokens";
import { requiredText } from "./common";

/** A new API token: a name its owner will recognise, a scope, the cells of a data-logger token, a lifetime. */
export const createApiTokenSchema = z
  .object({
    name: requiredText("a name for the token", 80),
    scope: z.enum(API_TOKEN_SCOPES, { message: "Choose what the token may do." }),
    // Asset tags of permeameter cells, for a data-logger token; a comma- or space-separated list from the form.
    cells: z
      .preprocess((v) => (typeof v === "string" ? v.split(/[\s,;]+/).filter(Boolean) : v ?? []), z.array(z.string().trim().min(1).max(40)).max(50, "Name at most 50 cells."))
      .default([]),
    expiresInDays: z.coerce
      .number({ message: "Enter the number of days the token lasts." })
      .int("Enter a whole number of days.")
      .min(1, "A token lasts at least 1 day.")
      .max(API_TOKEN_MAX_DAYS, `A token lasts at most ${API_TOKEN_MAX_DAYS} days; create a new one when it expires.`)
      .default(API_TOKEN_DEFAULT_DAYS),
  })
  .superRefine((v, ctx) => {
    if (v.scope === "READINGS_POST" && v.cells.length === 0)
      ctx.addIssue({ code: "custom", path: ["cells"], message: "Name the cells whose runs this data-logger token may post readings to (asset tags, e.g. CELL-03)." });
  });
export type CreateApiTokenInput = z.input<typeof createApiTokenSchema>;

export const revokeApiTokenSchema = z.object({ tokenId: z.string().min(1, "Choose a token.") });
