/** ASTM D5887 index flux: steadiness judged on flux; the permeation pressures of common practice. */
import { hydraulicMethodSettings } from "../hydraulic/hydraulic-method";

export const D5887_SETTINGS = hydraulicMethodSettings("D5887", { trendQuantity: "flux" });
