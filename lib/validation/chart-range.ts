import { z } from "zod";
import { AppError } from "../errors/app-error";

const hours = z.coerce.number({ message: "Give hours as a number." }).refine(Number.isFinite, "Give hours as a number.").min(0, "Hours count from the start of permeation, so they are 0 or more.").max(1e6, "That is more hours than any run lasts.");

/** A zoom range of the run charts: hours since permeation began, from before to. */
export const chartRangeSchema = z
  .object({ fromHours: hours, toHours: hours })
  .refine((r) => r.fromHours < r.toHours, { message: "The range must end after it starts.", path: ["toHours"] });

/** The range in an address (?fromHours=&toHours=), none when both are absent; a bad one is refused with its sentence. */
export function readHoursRange(params: URLSearchParams): { fromHours: number; toHours: number } | undefined {
  const from = params.get("fromHours");
  const to = params.get("toHours");
  if (from === null && to === null) return undefined;
  const parsed = chartRangeSchema.safeParse({ fromHours: from ?? undefined, toHours: to ?? undefined });
  if (parsed.success) return parsed.data;
  const fieldErrors = Object.fromEntries(parsed.error.issues.map((i) => [String(i.path[0] ?? "range"), i.message]));
  throw new AppError("INVALID_INPUT", parsed.error.issues[0]?.message ?? "That is not a range of hours.", { fieldErrors });
}
