import "server-only";
import { cache } from "react";
import { getDb } from "../db/client";

export type Letterhead = { name: string; address: string; accreditation: string | null };

/** The laboratory's name, address and accreditation for the top of printed documents. */
export const getLetterhead = cache(async (): Promise<Letterhead> => {
  const lab = await getDb().laboratory.findUnique({ where: { id: "lab" }, select: { name: true, address: true, accreditation: true } });
  return lab ?? { name: "Laboratory", address: "", accreditation: null };
});
