import { one } from "./probe-database";

/*
 * Concrete addresses for the app's dynamic routes, from records of the seeded demo, so that a role that
 * may open a page sees it render. A route this table does not know yet gets a made-up value: a role that
 * may open it then sees a 404, which still counts as passing the permission check (pages check the role
 * before they look anything up).
 */
const SAMPLE_SQL: Array<[prefix: string, sql: string]> = [
  ["/review/", `SELECT "labNumber" AS v FROM "Run" WHERE state = 'SUBMITTED' ORDER BY "labNumber" LIMIT 1`],
  ["/runs/", `SELECT "labNumber" AS v FROM "Run" ORDER BY "labNumber" LIMIT 1`],
  ["/samples/rolls/", `SELECT "labNumber" AS v FROM "Roll" ORDER BY "labNumber" LIMIT 1`],
  ["/samples/coupons/", `SELECT "labNumber" AS v FROM "Coupon" ORDER BY "labNumber" LIMIT 1`],
  ["/samples/specimens/", `SELECT "labNumber" AS v FROM "Specimen" ORDER BY "labNumber" LIMIT 1`],
  ["/intake/shipments/", `SELECT "labNumber" AS v FROM "Shipment" ORDER BY "labNumber" LIMIT 1`],
  ["/api/shipments/", `SELECT s."labNumber" AS v FROM "Shipment" s JOIN "ClientOrganization" o ON o.id = s."clientOrganizationId" WHERE o.code = 'MWA' ORDER BY 1 LIMIT 1`],
  ["/certificates/", `SELECT number AS v FROM "Certificate" ORDER BY number LIMIT 1`],
  ["/api/certificates/", `SELECT c.number AS v FROM "Certificate" c JOIN "ClientOrganization" o ON o.id = c."clientOrganizationId" WHERE o.code = 'MWA' ORDER BY 1 LIMIT 1`],
  ["/equipment/", `SELECT "assetTag" AS v FROM "Equipment" ORDER BY "assetTag" LIMIT 1`],
  ["/specifications/", `SELECT id AS v FROM "Specification" ORDER BY "createdAt" LIMIT 1`],
  ["/portal/projects/", `SELECT p.code AS v FROM "Project" p JOIN "ClientOrganization" o ON o.id = p."clientOrganizationId" WHERE o.code = 'MWA' ORDER BY 1 LIMIT 1`],
  ["/verify/", `SELECT "verificationCode" AS v FROM "CertificateRevision" WHERE status = 'ISSUED' LIMIT 1`],
  ["/index-tests/new/", `SELECT "labNumber" AS v FROM "Roll" ORDER BY "labNumber" LIMIT 1`],
  ["/index-tests/", `SELECT id AS v FROM "IndexTest" ORDER BY "testedAt" LIMIT 1`],
  ["/projects/", `SELECT code AS v FROM "Project" ORDER BY code LIMIT 1`],
];

/** The route with each [param] replaced by a real value (or a made-up one); catch-alls get "session". */
export async function samplePath(pattern: string): Promise<string> {
  let path = pattern.replace(/\[\.\.\.[^\]]+\]/g, "session");
  if (!/\[[^\]]+\]/.test(path)) return path;
  const entry = SAMPLE_SQL.find(([prefix]) => pattern.startsWith(prefix));
  const value = entry ? await one(entry[1], "X26-99999") : "X26-99999";
  path = path.replace(/\[[^\]]+\]/, encodeURIComponent(value));
  return path.replace(/\[[^\]]+\]/g, "X26-99999");
}
