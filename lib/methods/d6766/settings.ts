/**
 * ASTM D6766 (a permeant that may harm the clay): the D5887 set-up with chemical equilibrium and pore
 * volumes added; weeks to months of permeation.
 */
import { hydraulicMethodSettings } from "../hydraulic/hydraulic-method";

const AS_D5887 = "from memory" as const;
export const D6766_SETTINGS = hydraulicMethodSettings(
  "D6766",
  { trendQuantity: "flux" },
  {
    permeationCellKPa: { source: AS_D5887, note: "Index conditions as ASTM D5887 (about 550 kPa); set the project's own when it asks for others." },
    permeationInfluentKPa: { source: AS_D5887, note: "Index conditions as ASTM D5887 (about 530 kPa)." },
    permeationEffluentKPa: { source: AS_D5887, note: "Index conditions as ASTM D5887 (about 515 kPa)." },
  },
);
