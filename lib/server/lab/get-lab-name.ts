import "server-only";
import { cache } from "react";
import { getDb } from "../db/client";

/** The laboratory's name for page frames; a sensible word when the lab row is not set up yet. */
export const getLabName = cache(async (): Promise<string> => {
  const lab = await getDb().laboratory.findUnique({ where: { id: "lab" }, select: { name: true } });
  return lab?.name ?? "Laboratory";
});
