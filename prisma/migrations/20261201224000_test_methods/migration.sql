-- The three methods every installation needs, with lab-adjustable defaults (shared/DOMAIN.md):
-- a confining margin of about 35 kPa and the 0.75-1.25 outflow/inflow band are common practice;
-- the D6766 chemistry tolerance and pore-volume minimum are from memory and meant to be adjusted by the lab.
INSERT INTO "TestMethod" ("code", "title", "defaults", "updatedAt") VALUES
  ('D5887', 'ASTM D5887 index flux of a saturated GCL specimen (flexible-wall permeameter)',
   '{"confiningMarginPa": 35000, "ratioBand": [0.75, 1.25], "trendIntervals": 4}', now()),
  ('D5084', 'ASTM D5084 hydraulic conductivity of saturated porous materials (flexible-wall permeameter)',
   '{"confiningMarginPa": 35000, "ratioBand": [0.75, 1.25], "trendIntervals": 4, "kBandConsecutive": 4}', now()),
  ('D6766', 'ASTM D6766 hydraulic properties of a GCL permeated with a potentially incompatible liquid',
   '{"confiningMarginPa": 35000, "ratioBand": [0.75, 1.25], "trendIntervals": 4, "ecWithinFraction": 0.1, "minPoreVolumes": 2}', now())
ON CONFLICT ("code") DO NOTHING;
