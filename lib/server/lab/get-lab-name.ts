import "server-only";
import { getLabFrame } from "./get-lab-frame";

/** The laboratory's name for page frames; a sensible word when the lab row is not set up yet. */
export const getLabName = async (): Promise<string> => (await getLabFrame()).name;
