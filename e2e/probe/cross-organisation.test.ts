import { beforeAll, describe, expect, it } from "vitest";
import { DEMO_CLIENTS } from "../../prisma/seed/demo-people";
import { browserAvailable } from "../support/session";
import { recordFigure } from "./support/figures";
import { isServerFault, request, signIn, type Session } from "./support/probe-client";
import { query } from "./support/probe-database";

type OrgRecords = { code: string; name: string; projects: string[]; shipments: string[]; rolls: string[]; coupons: string[]; specimens: string[]; runs: string[]; certificates: string[] };

async function recordsOf(code: string): Promise<OrgRecords> {
  const col = async (sql: string) => (await query<{ v: string }>(sql, [code])).map((r) => r.v);
  const org = await query<{ name: string }>(`SELECT name FROM "ClientOrganization" WHERE code = $1`, [code]);
  return {
    code,
    name: org[0]!.name,
    projects: await col(`SELECT p.code AS v FROM "Project" p JOIN "ClientOrganization" o ON o.id = p."clientOrganizationId" WHERE o.code = $1`),
    shipments: await col(`SELECT s."labNumber" AS v FROM "Shipment" s JOIN "ClientOrganization" o ON o.id = s."clientOrganizationId" WHERE o.code = $1`),
    rolls: await col(`SELECT r."labNumber" AS v FROM "Roll" r JOIN "Project" p ON p.id = r."projectId" JOIN "ClientOrganization" o ON o.id = p."clientOrganizationId" WHERE o.code = $1`),
    coupons: await col(`SELECT c."labNumber" AS v FROM "Coupon" c JOIN "Roll" r ON r.id = c."rollId" JOIN "Project" p ON p.id = r."projectId" JOIN "ClientOrganization" o ON o.id = p."clientOrganizationId" WHERE o.code = $1`),
    specimens: await col(`SELECT s."labNumber" AS v FROM "Specimen" s JOIN "Coupon" c ON c.id = s."couponId" JOIN "Roll" r ON r.id = c."rollId" JOIN "Project" p ON p.id = r."projectId" JOIN "ClientOrganization" o ON o.id = p."clientOrganizationId" WHERE o.code = $1`),
    runs: await col(`SELECT t."labNumber" AS v FROM "Run" t JOIN "Specimen" s ON s.id = t."specimenId" JOIN "Coupon" c ON c.id = s."couponId" JOIN "Roll" r ON r.id = c."rollId" JOIN "Project" p ON p.id = r."projectId" JOIN "ClientOrganization" o ON o.id = p."clientOrganizationId" WHERE o.code = $1`),
    certificates: await col(`SELECT c.number AS v FROM "Certificate" c JOIN "ClientOrganization" o ON o.id = c."clientOrganizationId" WHERE o.code = $1`),
  };
}

/** Every address at which a client could try to see another organisation's record. */
function addressesOf(other: OrgRecords): string[] {
  return [
    ...other.projects.flatMap((p) => [`/portal/projects/${p}`, `/portal/projects/${p.toLowerCase()}`, `/search?q=${p}`]),
    ...other.shipments.flatMap((s) => [`/api/shipments/${s}/receipt`, `/intake/shipments/${s}`, `/intake/shipments/${s}/receipt`, `/search?q=${s}`]),
    ...other.rolls.flatMap((r) => [`/samples/rolls/${r}`, `/labels?numbers=${r}`, `/api/labels?numbers=${r}`, `/search?q=${r}`]),
    ...other.coupons.flatMap((c) => [`/samples/coupons/${c}`, `/api/labels?numbers=${c}`]),
    ...other.specimens.flatMap((s) => [`/samples/specimens/${s}`, `/api/labels?numbers=${s}`]),
    ...other.runs.flatMap((t) => [`/runs/${t}`, `/review/${t}`]),
    ...other.certificates.flatMap((q) => [`/api/certificates/${q}/pdf`, `/api/certificates/${q}/pdf?revision=1`, `/api/certificates/${q}/pdf?revision=2`, `/certificates/${q}`]),
  ];
}

describe.skipIf(!browserAvailable())("probe: a client user never sees another organisation's records", () => {
  const orgs = new Map<string, OrgRecords>();
  const sessions = new Map<string, Session>();
  beforeAll(async () => {
    for (const client of DEMO_CLIENTS) {
      orgs.set(client.code, await recordsOf(client.code));
      sessions.set(client.code, await signIn(client.user.email));
    }
  });

  it("answers every other organisation's address with 403 or 404 and names nothing of theirs on the client's own pages", async () => {
    let requests = 0;
    const leaks: string[] = [];
    const faults: string[] = [];
    for (const client of DEMO_CLIENTS) {
      const session = sessions.get(client.code)!;
      const others = [...orgs.values()].filter((o) => o.code !== client.code);
      const foreignWords = others.flatMap((o) => [o.name, ...o.projects, ...o.shipments, ...o.rolls, ...o.certificates]);
      // Each address as a page, and as the data a client-side navigation asks for (React Server Components).
      const attempts = others.flatMap((other) => addressesOf(other)).flatMap((address): Array<{ address: string; headers: Record<string, string> }> => [{ address, headers: {} }, { address, headers: { rsc: "1" } }]);
      for (const { address, headers } of attempts) {
        requests += 1;
        const answer = await request(address, { session, headers });
        if (isServerFault(answer)) faults.push(`${client.code} ${address}: ${answer.status}`);
        const shown = answer.status === 200 && !answer.text.includes("403 · not allowed");
        // The refusal may repeat the address asked for; anything else of theirs would be a leak.
        const named = foreignWords.find((w) => !decodeURIComponent(address).includes(w) && answer.text.includes(w));
        if (shown || named) leaks.push(`${client.code} ${address} ${JSON.stringify(headers)}: ${answer.status}${named ? ` names ${named}` : ""}`);
      }
      // The client's own pages: they must show, and show nothing of anyone else's.
      const own = orgs.get(client.code)!;
      for (const address of ["/portal", "/portal/certificates", ...own.projects.map((p) => `/portal/projects/${p}`)]) {
        requests += 1;
        const answer = await request(address, { session });
        expect(answer.status, `${client.code} ${address}`).toBe(200);
        const named = foreignWords.find((w) => answer.text.includes(w));
        if (named) leaks.push(`${client.code} ${address} names ${named}`);
      }
    }
    recordFigure("05-cross-organisation", { label: "cross-organisation requests", values: { requests, leaks: leaks.length, "server errors": faults.length } });
    expect(leaks).toEqual([]);
    expect(faults).toEqual([]);
  });
});
