import "server-only";
import { cache } from "react";
import { isTimeZone } from "@/lib/format/time-zone";
import { getDb } from "../db/client";

export type Letterhead = { name: string; address: string; accreditation: string | null; timeZone: string };

/** The laboratory's name, address, accreditation and time zone for printed documents. */
export const getLetterhead = cache(async (): Promise<Letterhead> => {
  const lab = await getDb().laboratory.findUnique({ where: { id: "lab" }, select: { name: true, address: true, accreditation: true, timeZone: true } });
  if (!lab) return { name: "Laboratory", address: "", accreditation: null, timeZone: "UTC" };
  return { ...lab, timeZone: isTimeZone(lab.timeZone) ? lab.timeZone : "UTC" };
});
