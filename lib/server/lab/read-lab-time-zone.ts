import "server-only";
import { isTimeZone } from "@/lib/format/time-zone";
import type { Db } from "../db/client";
import type { Tx } from "../db/transaction";
import { getLabFrame } from "./get-lab-frame";

/** The lab's time zone (IANA name) as stored, read with the caller's client or transaction; UTC before set-up. */
export async function readLabTimeZone(db: Db | Tx): Promise<string> {
  const lab = await db.laboratory.findUnique({ where: { id: "lab" }, select: { timeZone: true } });
  return lab && isTimeZone(lab.timeZone) ? lab.timeZone : "UTC";
}

/** The same, once per request, for pages that show times. */
export const getLabTimeZone = async (): Promise<string> => (await getLabFrame()).timeZone;
