// The invented scenario: an invented laboratory, its staff and three invented client organisations.
// Every name here is made up for the demo.
import type { Role } from "@/lib/generated/prisma/client";

export const DEMO_PASSWORD = "seepline-demo";

export const DEMO_LAB = {
  name: "Quillfen Liner Laboratory",
  address: "Unit 7, Tarnwick Science Yard, Tarnwick",
  accreditation: "Demo accreditation no. 0000 (invented)",
  // A zone an hour off UTC in winter, so that the demo shows times as the lab's clock reads them.
  timeZone: "Europe/Berlin",
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
    address: "Marrowdale Civic Offices, 2 Fenwater Row, Marrowdale",
    user: { key: "clientA", name: "Hollis Reddaway", email: "portal@marrowdale.test", jobTitle: "Landfill engineer" },
    otherContact: { name: "Ottilie Brackwood", email: "liners@marrowdale.test", jobTitle: "Contracts officer" },
    projects: [
      { code: "MWA-C4", name: "Cell 4 landfill expansion", siteName: "Marrowdale Tip, Cell 4" },
      { code: "MWA-LL", name: "Leachate lagoon relining", siteName: "Marrowdale Tip, lagoon 2" },
    ],
  },
  {
    code: "OMC",
    name: "Ostrel Mining Cooperative",
    contactEmail: "qa@ostrel.test",
    address: "Ostrel Pit site office, Quarry Lane, Ostrel",
    user: { key: "clientB", name: "Junia Castellar", email: "portal@ostrel.test", jobTitle: "Quality lead" },
    otherContact: { name: "Dervla Ashcombe", email: "qa@ostrel.test", jobTitle: "Site manager" },
    projects: [{ code: "OMC-TPB", name: "Tailings pond B lining", siteName: "Ostrel Pit, pond B" }],
  },
  {
    code: "FVE",
    name: "Fennick & Vane Earthworks",
    contactEmail: "cqa@fennickvane.test",
    address: "14 Millrace Yard, Quarnby",
    user: { key: "clientC", name: "Piers Ambleford", email: "portal@fennickvane.test", jobTitle: "CQA inspector" },
    otherContact: { name: "Rufus Tenterden", email: "cqa@fennickvane.test", jobTitle: "Project director" },
    projects: [{ code: "FVE-SP", name: "Stormwater pond cap", siteName: "Quarnby Flats pond" }],
  },
] as const;
