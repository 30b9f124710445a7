// The invented scenario: an invented laboratory, its staff and three invented client organisations.
// Every name here is made up for the demo.
import type { Role } from "@/lib/generated/prisma/client";

export const DEMO_PASSWORD = "seepline-demo";

export const DEMO_LAB = {
  name: "Quillfen Liner Laboratory",
  address: "Unit 7, Tarnwick Science Yard, Tarnwick",
  accreditation: "Demo accreditation no. 0000 (invented)",
};

export type DemoUser = { key: string; name: string; email: string; role: Role; org?: string };

export const DEMO_STAFF: DemoUser[] = [
  { key: "clerk", name: "Odile Farrant", email: "clerk@quillfen.test", role: "INTAKE_CLERK" },
  { key: "technician", name: "Bram Oyelaran", email: "technician@quillfen.test", role: "TECHNICIAN" },
  { key: "technician2", name: "Signe Pellow", email: "technician2@quillfen.test", role: "TECHNICIAN" },
  { key: "qa", name: "Marit Calloway-Dunn", email: "qa@quillfen.test", role: "QA_MANAGER" },
  { key: "admin", name: "Teodor Wrenfield", email: "admin@quillfen.test", role: "LAB_ADMIN" },
];

export const DEMO_CLIENTS = [
  {
    code: "MWA",
    name: "Marrowdale Waste Authority",
    contactEmail: "liners@marrowdale.test",
    user: { key: "clientA", name: "Hollis Reddaway", email: "portal@marrowdale.test" },
    projects: [
      { code: "MWA-C4", name: "Cell 4 landfill expansion", siteName: "Marrowdale Tip, Cell 4" },
      { code: "MWA-LL", name: "Leachate lagoon relining", siteName: "Marrowdale Tip, lagoon 2" },
    ],
  },
  {
    code: "OMC",
    name: "Ostrel Mining Cooperative",
    contactEmail: "qa@ostrel.test",
    user: { key: "clientB", name: "Junia Castellar", email: "portal@ostrel.test" },
    projects: [{ code: "OMC-TPB", name: "Tailings pond B lining", siteName: "Ostrel Pit, pond B" }],
  },
  {
    code: "FVE",
    name: "Fennick & Vane Earthworks",
    contactEmail: "cqa@fennickvane.test",
    user: { key: "clientC", name: "Piers Ambleford", email: "portal@fennickvane.test" },
    projects: [{ code: "FVE-SP", name: "Stormwater pond cap", siteName: "Quarnby Flats pond" }],
  },
] as const;
