import "server-only";
import { cache } from "react";
import { isTimeZone } from "@/lib/format/time-zone";
import { getDb } from "../db/client";

/**
 * The laboratory's name and time zone, read in one query once per request: every page frame shows the
 * name and most pages show times, so the two are asked for together.
 */
export const getLabFrame = cache(async (): Promise<{ name: string; timeZone: string }> => {
  const lab = await getDb().laboratory.findUnique({ where: { id: "lab" }, select: { name: true, timeZone: true } });
  return { name: lab?.name ?? "Laboratory", timeZone: lab && isTimeZone(lab.timeZone) ? lab.timeZone : "UTC" };
});
