/**
 * The bulk data of the list and scale benchmarks, as one SQL script for the migration owner: 100,000 rolls in
 * 5,000 shipments for 300 projects of 30 clients, about 40,000 coupons and 76,000 specimens, all invented.
 */
export const ROLLS = 100_000;
export const SHIPMENTS = 5_000;
export const PROJECTS = 300;
export const CLIENTS = 30;

// Deterministic pseudo-random spreads come from hashing the row number, so every run builds the same data.
export function bulkSeedSql(options: { firstDay?: string } = {}): string {
  const firstDay = options.firstDay ?? "2024-01-01";
  return `
SELECT set_config('seepline.actor_id', 'system:bench', false);
INSERT INTO "User" (id, email, name, "passwordHash", role, "updatedAt")
  SELECT 'bench-user-' || g, 'bench' || g || '@example.test', 'Bench technician ' || g, 'x', 'TECHNICIAN', now() FROM generate_series(1, 6) g;
INSERT INTO "StorageLocation" (id, code, name)
  SELECT 'bench-loc-' || g, 'RACK-' || lpad(g::text, 2, '0'), 'Rack ' || g FROM generate_series(1, 20) g;
INSERT INTO "ClientOrganization" (id, code, name, "updatedAt")
  SELECT 'bench-org-' || g, 'ORG' || lpad(g::text, 3, '0'), 'Client ' || lpad(g::text, 2, '0'), now() FROM generate_series(1, ${CLIENTS}) g;
INSERT INTO "Project" (id, code, name, "siteName", "clientOrganizationId", "updatedAt")
  SELECT 'bench-prj-' || g, 'PRJ' || lpad(g::text, 4, '0'), 'Project ' || lpad(g::text, 3, '0'), 'Site ' || g,
         'bench-org-' || (1 + (g - 1) % ${CLIENTS}), now() FROM generate_series(1, ${PROJECTS}) g;
-- One shipment every 5 hours from ${firstDay}, lab numbers counted per year as allocateLabNumber does.
INSERT INTO "Shipment" (id, "labNumber", "clientOrganizationId", "projectId", "deliveredBy", "receivedAt", "receivedById", "acknowledgedAt", "updatedAt")
  SELECT 'bench-shp-' || g,
         'S' || to_char(ts, 'YY') || '-' || lpad((row_number() OVER (PARTITION BY date_part('year', ts) ORDER BY g))::text, 5, '0'),
         'bench-org-' || (1 + ((g - 1) % ${PROJECTS}) % ${CLIENTS}), 'bench-prj-' || (1 + (g - 1) % ${PROJECTS}),
         'Carrier ' || (g % 7), ts, 'bench-user-1', CASE WHEN g % 5 <> 0 THEN ts + interval '1 day' END, now()
  FROM (SELECT g, timestamp '${firstDay}' + g * interval '5 hours' AS ts FROM generate_series(1, ${SHIPMENTS}) g) s;
-- ${ROLLS / SHIPMENTS} rolls per shipment, logged a few minutes after receipt, in a spread of states.
INSERT INTO "Roll" (id, "labNumber", "shipmentId", "projectId", "rollNumber", "lotNumber", product, manufacturer, state, "storageLocationId", "createdAt", "updatedAt")
  SELECT 'bench-roll-' || r,
         'R' || to_char(ts, 'YY') || '-' || lpad((row_number() OVER (PARTITION BY date_part('year', ts) ORDER BY r))::text, 5, '0'),
         'bench-shp-' || shp, 'bench-prj-' || (1 + (shp - 1) % ${PROJECTS}), 'RN-' || lpad(r::text, 6, '0'), 'LOT-' || (r / 40),
         (ARRAY['Quillmat 300', 'Fenlock NS', 'Liner 4000', 'Marrowclay 200'])[1 + r % 4], 'Maker ' || (r % 3),
         (CASE WHEN h < 5 THEN 'RECEIVED' WHEN h < 50 THEN 'STORED' WHEN h < 65 THEN 'CUT' WHEN h < 70 THEN 'TESTED'
               WHEN h < 90 THEN 'RETAINED' ELSE 'DISPOSED' END)::"ItemState",
         CASE WHEN h >= 90 THEN NULL ELSE 'bench-loc-' || (1 + r % 20) END, ts + (r % 20) * interval '1 minute', now()
  FROM (SELECT r, shp, s."receivedAt" AS ts, abs(hashint4(r)) % 100 AS h
        FROM (SELECT r, 1 + (r - 1) / ${ROLLS / SHIPMENTS} AS shp FROM generate_series(1, ${ROLLS}) r) x
        JOIN "Shipment" s ON s.id = 'bench-shp-' || x.shp) y;
-- A coupon from two rolls in five, cut a week after receipt.
INSERT INTO "Coupon" (id, "labNumber", "rollId", "positionInSample", "lengthMm", "widthMm", "cutById", "cutAt", state, "storageLocationId", "updatedAt")
  SELECT 'bench-cpn-' || r,
         'C' || to_char(ts, 'YY') || '-' || lpad((row_number() OVER (PARTITION BY date_part('year', ts) ORDER BY r))::text, 5, '0'),
         'bench-roll-' || r, 'Centre', 300, 300, 'bench-user-' || (1 + r % 6), ts,
         (CASE WHEN r % 10 < 6 THEN 'PREPARED' WHEN r % 10 < 8 THEN 'RETAINED' ELSE 'CUT' END)::"ItemState", 'bench-loc-' || (1 + r % 20), now()
  FROM (SELECT r, "createdAt" + interval '7 days' AS ts FROM "Roll" JOIN generate_series(1, ${ROLLS}) r ON "Roll".id = 'bench-roll-' || r WHERE r % 5 < 2) c;
-- Two specimens from most coupons, prepared the day after cutting.
INSERT INTO "Specimen" (id, "labNumber", "couponId", "dieDiameterMm", "initialThicknessMm", "initialMassG", "intendedMethodCode", "preparedById", "preparedAt", state, "storageLocationId", "updatedAt")
  SELECT 'bench-spc-' || c.id || '-' || k,
         'P' || to_char(ts, 'YY') || '-' || lpad((row_number() OVER (PARTITION BY date_part('year', ts) ORDER BY c.id, k))::text, 5, '0'),
         c.id, 100, 6.5, 95, (ARRAY['D5887', 'D5084', 'D6766'])[1 + k], c."cutById", ts,
         (CASE WHEN k = 1 THEN 'TESTED' ELSE 'PREPARED' END)::"ItemState", c."storageLocationId", now()
  FROM (SELECT id, "cutById", "storageLocationId", "cutAt" + interval '1 day' AS ts FROM "Coupon" WHERE id LIKE 'bench-%') c
  CROSS JOIN generate_series(1, 2) k
  WHERE c.id NOT LIKE '%0' OR k = 1;
ANALYZE;
`;
}
