/**
 * Specimen preparation checklists per test method. The items are common practice for flexible-wall
 * permeameter specimens of GCL (no source beyond that); each is answered yes or no and kept with the
 * specimen. A "no" is recorded, not refused: the QA review decides whether it is a deviation.
 */
export type ChecklistItem = { key: string; question: string };

const COMMON: ChecklistItem[] = [
  { key: "die-cut", question: "Specimen cut with the die, edges clean and square" },
  { key: "edges-sealed", question: "Specimen edges sealed (e.g. with bentonite paste) against side-wall leakage" },
  { key: "no-bridging-fibres", question: "No loose fibres bridging the two geotextiles at the cut edge" },
  { key: "surfaces-saturated", question: "Specimen surfaces and porous stones wetted before mounting" },
];

export const PREPARATION_CHECKLISTS: Record<string, ChecklistItem[]> = {
  D5887: [...COMMON, { key: "deaired-water", question: "De-aired water ready for saturation and permeation" }],
  D5084: [...COMMON, { key: "deaired-water", question: "De-aired water ready for saturation and permeation" }],
  D6766: [
    ...COMMON,
    { key: "permeant-prepared", question: "Permeant prepared and its EC and pH measured before the test" },
    { key: "compatible-lines", question: "Lines and burettes suitable for the permeant (no corrosion or reaction)" },
  ],
};

export const TEST_METHOD_CODES = Object.keys(PREPARATION_CHECKLISTS) as Array<keyof typeof PREPARATION_CHECKLISTS>;

export function checklistFor(methodCode: string): ChecklistItem[] {
  const list = PREPARATION_CHECKLISTS[methodCode];
  if (!list) throw new RangeError(`no preparation checklist for method ${methodCode}`);
  return list;
}
