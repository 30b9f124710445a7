// Builds the invented demo scenario: rolls at every stage of the chain so that every screen shows something.
// Every record keeps one order of events (received <= cut <= prepared <= mounted <= stages <= readings <=
// terminated <= reviewed), and every item's custody ledger leads step by step to the state it is in.
import type { CustodyAction, ItemState, Prisma } from "@/lib/generated/prisma/client";
import type { Tx } from "@/lib/server/db/transaction";
import { allocateLabNumber } from "@/lib/server/db/allocate-lab-number";
import { hashPassword } from "@/lib/server/auth/password";
import { DEMO_CLIENTS, DEMO_LAB, DEMO_PASSWORD, DEMO_STAFF } from "./demo-people";
import { DEMO_SPEC_LIMITS, demoSpecLimits } from "./demo-method-defaults";
import { createIndexEquipment, DEMO_OBSERVATIONS as OBS, demoIndexTester } from "./demo-index-tests";
import { makeDemoReadings } from "./demo-readings";
import { DEMO_LAB_DECLARED_UNCERTAINTIES as U } from "./demo-uncertainties";
import { seedDemoMethodSettings } from "./demo-method-settings";
import { recordDemoResults } from "./demo-results";

const DAY = 86_400_000;
const HOUR = 3_600_000;
const SPECIMEN_AREA_M2 = (Math.PI * 0.1 ** 2) / 4; // 100 mm die, common practice
/** Burette cross-sections of the demo panels, mm² (a bore of about 6.3 mm). */
const DEMO_BURETTE_AREAS_MM2 = { inflow: 31.4, outflow: 31.2 };

type Ids = Record<string, string>;
type Item = { kind: "roll" | "coupon" | "specimen"; id: string };

export async function buildDemoScenario(tx: Tx, now = new Date()): Promise<void> {
  const ago = (days: number) => new Date(now.getTime() - days * DAY);
  await tx.laboratory.upsert({ where: { id: "lab" }, create: { id: "lab", ...DEMO_LAB }, update: DEMO_LAB });

  // People. One hash per distinct password is enough for the demo; each user still gets their own row.
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  const users: Ids = {};
  for (const u of DEMO_STAFF) users[u.key] = (await tx.user.create({ data: { name: u.name, email: u.email, role: u.role, passwordHash } })).id;

  const orgs: Ids = {};
  const projects: Ids = {};
  for (const c of DEMO_CLIENTS) {
    const org = await tx.clientOrganization.create({ data: { code: c.code, name: c.name, address: c.address, contactEmail: c.contactEmail } });
    orgs[c.code] = org.id;
    users[c.user.key] = (await tx.user.create({
      data: { name: c.user.name, email: c.user.email, role: "CLIENT_USER", clientOrganizationId: org.id, passwordHash },
    })).id;
    await tx.clientContact.create({ data: { clientOrganizationId: org.id, name: c.user.name, email: c.user.email, jobTitle: c.user.jobTitle, userId: users[c.user.key]! } });
    await tx.clientContact.create({ data: { clientOrganizationId: org.id, name: c.otherContact.name, email: c.otherContact.email, jobTitle: c.otherContact.jobTitle } });
    for (const p of c.projects) {
      const project = await tx.project.create({ data: { ...p, clientOrganizationId: org.id } });
      projects[p.code] = project.id;
      await tx.specification.create({
        data: { name: `${p.code} liner specification`, revision: "Rev. 1, 2026-03", projectId: project.id, limits: { create: demoSpecLimits(p.code) } },
      });
    }
  }
  await tx.specification.create({ data: { name: "Lab template: commonly cited GCL limits", isTemplate: true, limits: { create: DEMO_SPEC_LIMITS.map((l) => ({ ...l })) } } });

  const locations: Ids = {};
  for (const [code, name] of [["RACK-A1", "Sample store, rack A shelf 1"], ["RACK-A2", "Sample store, rack A shelf 2"], ["HUMID-1", "Humid room bench 1"], ["RETAIN-1", "Retention shelf"]] as const)
    locations[code] = (await tx.storageLocation.create({ data: { code, name } })).id;

  const equipment = await createEquipment(tx, users.admin!, now);
  // The lab's own settings version of each method, set before the demo's first shipment arrived, so every
  // demo run (and a run dated back to any moment of the scenario) is judged by it.
  const settingsVersions = await seedDemoMethodSettings(tx, users.admin!, ago(25));

  // One custody event: what happened to which item, from which state to which, who, when and where.
  const custody = async (item: Item, action: CustodyAction, fromState: ItemState | null, toState: ItemState, actorId: string, at: Date, extra: { toLocationId?: string | null; note?: string } = {}) =>
    tx.custodyEvent.create({ data: { action, [`${item.kind}Id`]: item.id, fromState, toState, actorId, occurredAt: at, toLocationId: extra.toLocationId ?? null, note: extra.note ?? "" } });

  // Shipments and rolls.
  const ship = async (projectCode: string, orgCode: string, daysAgo: number, acknowledged: boolean, deliveredBy: string, notes: string) => {
    const receivedAt = ago(daysAgo);
    return tx.shipment.create({
      data: {
        labNumber: await allocateLabNumber(tx, "shipment", receivedAt),
        clientOrganizationId: orgs[orgCode]!, projectId: projects[projectCode]!, deliveredBy, receivedAt,
        receivedById: users.clerk!, conditionNotes: notes,
        ...(acknowledged ? { acknowledgedAt: new Date(receivedAt.getTime() + HOUR), acknowledgedById: users.clerk! } : {}),
      },
    });
  };
  // Logged as received, then stored a few minutes later; `condition` is the roll's own remark, if any.
  // `size`: the delivered roll the sample stands for, length × width in m (sampling coverage counts its area).
  const roll = async (shipment: { id: string; labNumber: string; projectId: string; receivedAt: Date }, n: number, location: string, condition = "", size: [number, number] = [45, 5.2]) => {
    const created = await tx.roll.create({
      data: {
        labNumber: await allocateLabNumber(tx, "roll", shipment.receivedAt),
        shipmentId: shipment.id, projectId: shipment.projectId, rollNumber: `R-${4100 + n}`, lotNumber: `L${2260 + Math.floor(n / 3)}`,
        product: "Needle-punched GCL, powdered sodium bentonite, nominal 4.8 kg/m²", manufacturer: "Orrin Textile Works (invented)",
        sampleLengthMm: 1000, sampleWidthMm: 1200, deliveredLengthM: size[0], deliveredWidthM: size[1], machineDirectionMarked: n % 2 === 0, conditionNotes: condition, state: "STORED", storageLocationId: locations[location]!,
      },
    });
    const item: Item = { kind: "roll", id: created.id };
    await custody(item, "RECEIVED", null, "RECEIVED", users.clerk!, shipment.receivedAt, { note: `Shipment ${shipment.labNumber}` });
    await custody(item, "STORED", "RECEIVED", "STORED", users.clerk!, new Date(shipment.receivedAt.getTime() + 10 * 60_000), { toLocationId: locations[location]! });
    return { ...created, item, state: "STORED" as ItemState };
  };
  // A roll's state as the seed moves it on, and the event that moves it.
  const moveRoll = async (r: { item: Item; state: ItemState }, action: CustodyAction, toState: ItemState, actorId: string, at: Date, note: string) => {
    await custody(r.item, action, r.state, toState, actorId, at, { note });
    r.state = toState;
    await tx.roll.update({ where: { id: r.item.id }, data: { state: toState } });
  };

  const s1 = await ship("MWA-C4", "MWA", 21, true, "Carrier: Quernbeck Haulage (invented), driver signed", "Three rolls, wrapped, one corner of the outer film torn; liner undamaged.");
  const certifiedRoll = await roll(s1, 1, "RETAIN-1", "Outer film torn at one corner; liner undamaged.");
  const reviewRoll = await roll(s1, 2, "HUMID-1");
  const testingRoll = await roll(s1, 3, "HUMID-1");
  const s2 = await ship("MWA-LL", "MWA", 1, false, "Client's site engineer, by van", "Two rolls, dry, wrapping intact.");
  await roll(s2, 4, "RACK-A1");
  await roll(s2, 5, "RACK-A1");
  const s3 = await ship("OMC-TPB", "OMC", 9, true, "Courier parcel 58-221 (invented)", "Samples cut on site, rolled on cores, labelled.");
  const cutRoll = await roll(s3, 6, "RACK-A2", "", [60, 5.3]);
  const preparedRoll = await roll(s3, 7, "RACK-A2", "", [60, 5.3]);
  await roll(s3, 8, "RACK-A2", "", [60, 5.3]);
  const s4 = await ship("FVE-SP", "FVE", 0.1, false, "Fennick & Vane site crew", "One roll sample, damp on one edge; noted to client.");
  await roll(s4, 9, "RACK-A1", "Damp along one long edge.");

  // Coupons and specimens along the chain: each cut is a step of its roll, each specimen a step of its coupon.
  // `forMethod`: an index test done on the coupon itself (tensile strips, mass-per-area squares).
  const cutCoupon = async (r: Awaited<ReturnType<typeof roll>>, daysAgo: number, tech: string, forMethod?: { code: string; position: string; lengthMm: number; widthMm: number }) => {
    const cutAt = ago(daysAgo);
    const coupon = await tx.coupon.create({
      data: {
        labNumber: await allocateLabNumber(tx, "coupon", cutAt), rollId: r.id, positionInSample: forMethod?.position ?? "Centre, 300 mm from leading edge",
        lengthMm: forMethod?.lengthMm ?? 300, widthMm: forMethod?.widthMm ?? 300, intendedMethodCode: forMethod?.code ?? null, cutById: tech, cutAt, storageLocationId: locations["HUMID-1"]!,
      },
    });
    await moveRoll(r, "CUT", r.state === "STORED" ? "CUT" : r.state, tech, cutAt, forMethod ? `Coupon ${coupon.labNumber} for ASTM ${forMethod.code}` : `Coupon ${coupon.labNumber}`);
    await custody({ kind: "coupon", id: coupon.id }, "CUT", null, "CUT", tech, cutAt, { toLocationId: locations["HUMID-1"]!, note: `From roll ${r.labNumber}` });
    return coupon;
  };
  const prepare = async (coupon: { id: string; labNumber: string }, daysAgo: number, tech: string) => {
    const preparedAt = ago(daysAgo);
    const specimen = await tx.specimen.create({
      data: {
        labNumber: await allocateLabNumber(tx, "specimen", preparedAt), couponId: coupon.id, dieDiameterMm: 100, initialThicknessMm: 6.8, initialMassG: 46.2,
        moistureContentPct: 11.4, intendedMethodCode: "D5887", preparedById: tech, preparedAt, state: "PREPARED", storageLocationId: locations["HUMID-1"]!,
        checklist: { create: [
          { itemKey: "edges-sealed", question: "Specimen edges sealed with bentonite paste against side-wall leakage", answer: true },
          { itemKey: "no-bridging-fibres", question: "No fibres bridging the two geotextiles at the cut edge", answer: true },
          { itemKey: "surfaces-saturated", question: "Specimen surfaces wetted before mounting", answer: true },
        ] },
      },
    });
    await custody({ kind: "coupon", id: coupon.id }, "PREPARED", "CUT", "CUT", tech, preparedAt, { note: `Specimen ${specimen.labNumber}` });
    await custody({ kind: "specimen", id: specimen.id }, "PREPARED", null, "PREPARED", tech, preparedAt, { toLocationId: locations["HUMID-1"]!, note: `From coupon ${coupon.labNumber}` });
    return specimen;
  };

  await cutCoupon(cutRoll, 5, users.technician!);
  // The specimen that waits for a cell was prepared a week ago, so a run started on it may be dated back.
  const waitingCoupon = await cutCoupon(preparedRoll, 8, users.technician2!);
  await prepare(waitingCoupon, 7, users.technician2!);

  const certifiedSpecimen = await prepare(await cutCoupon(certifiedRoll, 20, users.technician!), 19.5, users.technician!);
  const reviewCoupon = await cutCoupon(reviewRoll, 12.5, users.technician2!);
  const reviewSpecimen = await prepare(reviewCoupon, 12.2, users.technician2!);
  const secondReviewSpecimen = await prepare(reviewCoupon, 12.1, users.technician!);
  const testingSpecimen = await prepare(await cutCoupon(testingRoll, 6.5, users.technician!), 6.2, users.technician!);
  // Coupons for index tests done on the coupon itself, cut while each roll was still being cut (its ledger
  // keeps one order of events).
  const strips = { code: "D6768", position: "Across the width, machine direction, five 100 mm strips", lengthMm: 300, widthMm: 600 };
  const peelStrips = { code: "D6496", position: "Across the width, five 100 mm strips", lengthMm: 200, widthMm: 600 };
  const squares = { code: "D5993", position: "Three 200 mm squares across the width", lengthMm: 200, widthMm: 600 };
  const indexCoupons = {
    certifiedSquares: await cutCoupon(certifiedRoll, 19.8, users.technician2!, squares),
    certifiedStrips: await cutCoupon(certifiedRoll, 19.8, users.technician!, strips),
    certifiedPeel: await cutCoupon(certifiedRoll, 19.8, users.technician!, peelStrips),
    reviewSquares: await cutCoupon(reviewRoll, 12.4, users.technician!, squares),
    reviewStrips: await cutCoupon(reviewRoll, 12.4, users.technician2!, strips),
    preparedSquares: await cutCoupon(preparedRoll, 7.9, users.technician2!, squares),
  };

  // Runs: mounted, saturated, held, permeated (readings every 6 h, at the method's permeation pressures);
  // with `refillAfter`, the burettes are refilled and drained once after that reading; `ended` terminates them.
  const makeRun = async (specimen: { id: string; labNumber: string }, r: Awaited<ReturnType<typeof roll>>, cell: string, tech: string, daysAgo: number, state: Prisma.RunCreateInput["state"], readingCount: number, refillAfter?: number) => {
    const mountedAt = ago(daysAgo);
    const uses = (tag: string, role: string) => ({ equipmentId: equipment[tag]!, calibrationId: equipment[`${tag}:cal`]!, role });
    const run = await tx.run.create({
      data: {
        labNumber: await allocateLabNumber(tx, "run", mountedAt), specimenId: specimen.id, cellId: equipment[cell]!, methodCode: "D5887", state,
        performedById: tech, assignedAt: mountedAt, effectiveStressPa: 34_500, methodSettingsVersionId: settingsVersions.D5887,
        equipment: { create: [
          uses(cell, "permeameter cell"), uses("BP-01", "burette panel"), uses("PT-01", "pressure transducer"), uses("TH-01", "thermometer"),
          uses("TG-01", "thickness gauge"), uses("CLK-01", "timer"),
        ] },
      },
    });
    const specimenItem: Item = { kind: "specimen", id: specimen.id };
    await custody(specimenItem, "ASSIGNED", "PREPARED", "ASSIGNED", tech, mountedAt, { note: `Run ${run.labNumber} in ${cell}` });
    // Saturation from the mount, the equilibration hold a day later, permeation two days after that.
    const stages = [
      { kind: "SATURATION" as const, cell: 345_000, inf: 310_000, eff: 310_000, start: 0, end: 1 },
      { kind: "EQUILIBRATION" as const, cell: 552_000, inf: 517_000, eff: 517_000, start: 1, end: 3 },
      { kind: "PERMEATION" as const, cell: 552_000, inf: 531_000, eff: 517_000, start: 3, end: null },
    ];
    for (const [i, st] of stages.entries())
      await tx.runStage.create({ data: { runId: run.id, sequence: i + 1, kind: st.kind, cellPressurePa: st.cell, influentPressurePa: st.inf, effluentPressurePa: st.eff, startedAt: ago(daysAgo - st.start), endedAt: st.end === null ? null : ago(daysAgo - st.end), recordedById: tech } });
    const start = ago(daysAgo - 3);
    await custody(specimenItem, "TEST_STARTED", "ASSIGNED", "UNDER_TEST", tech, start, { note: `Permeation of ${run.labNumber}` });
    if (r.state !== "UNDER_TEST") await moveRoll(r, "TEST_STARTED", "UNDER_TEST", tech, start, `Specimen ${specimen.labNumber}`);
    const readings = makeDemoReadings({
      fluxM3PerM2PerS: 2.4e-9, areaM2: SPECIMEN_AREA_M2, count: readingCount, stepH: 6, pressuresPa: { cell: 552_000, influent: 531_000, effluent: 517_000 },
      buretteAreasMm2: DEMO_BURETTE_AREAS_MM2, ...(refillAfter !== undefined && { refillAfter }),
    });
    await tx.reading.createMany({
      data: readings.map((r, i) => ({ runId: run.id, sequence: i + 1, takenAt: new Date(start.getTime() + r.elapsedS * 1000), ...r, recordedById: tech })),
    });
    const ended = async (terminatedDaysAgo: number, submittedDaysAgo: number, post: { thicknessMm: number; massG: number; observations: string }) => {
      const terminatedAt = ago(terminatedDaysAgo);
      await tx.run.update({ where: { id: run.id }, data: { terminatedAt, terminationKind: "CRITERIA_MET", postTestThicknessMm: post.thicknessMm, postTestMassG: post.massG, postTestObservations: post.observations, postTestRecordedAt: terminatedAt, submittedAt: ago(submittedDaysAgo) } });
      await tx.runStage.updateMany({ where: { runId: run.id, kind: "PERMEATION" }, data: { endedAt: terminatedAt } });
      await custody(specimenItem, "TESTED", "UNDER_TEST", "TESTED", tech, terminatedAt, { note: "Termination criteria met" });
      await tx.specimen.update({ where: { id: specimen.id }, data: { state: "TESTED" } });
      return terminatedAt;
    };
    await tx.specimen.update({ where: { id: specimen.id }, data: { state: "UNDER_TEST" } });
    return { run, ended };
  };

  // One run approved and certified (its specimen then retained), two awaiting review, one permeating now.
  // The approved run's burettes were refilled and drained once, after its seventh reading.
  const approved = await makeRun(certifiedSpecimen, certifiedRoll, "CELL-01", users.technician!, 18, "APPROVED", 12, 6);
  await approved.ended(12, 12, { thicknessMm: 5.9, massG: 71.3, observations: "Uniform hydration; no channels seen on the cut section." });
  await tx.review.create({ data: { runId: approved.run.id, reviewerId: users.qa!, decision: "APPROVED", comments: "Criteria met; checklist complete.", createdAt: ago(11) } });
  // As the app does: the approval of its run, with no other specimen in a cell, leaves the roll tested.
  await moveRoll(certifiedRoll, "TESTED", "TESTED", users.qa!, ago(11), `Run ${approved.run.labNumber} approved`);
  // Computed as the app computes at approval; only the index flux goes on the demo's issued certificate.
  const [result] = await recordDemoResults(tx, approved.run.id, { approvedById: users.qa!, approvedAt: ago(11) });
  const certificate = await tx.certificate.create({ data: { number: await allocateLabNumber(tx, "certificate", ago(10)), projectId: projects["MWA-C4"]!, clientOrganizationId: orgs.MWA! } });
  // Drafted with its results, signed, then issued: the database keeps an issued revision's parts fixed.
  const revision = await tx.certificateRevision.create({ data: { certificateId: certificate.id, revision: 1, status: "DRAFT", verificationCode: "DEMO-7Q4K-2M9X", results: { create: [{ resultId: result!.id }] } } });
  await tx.signature.create({ data: { revisionId: revision.id, signerId: users.qa!, signerRole: "QA_MANAGER", meaning: "Reviewed and approved for issue", signedAt: ago(10) } });
  await tx.certificateRevision.update({ where: { id: revision.id }, data: { status: "ISSUED", issuedAt: ago(10) } });
  const retainedAt = ago(9.9);
  await custody({ kind: "specimen", id: certifiedSpecimen.id }, "RETAINED", "TESTED", "RETAINED", users.technician!, retainedAt, { toLocationId: locations["RETAIN-1"]!, note: "Retained after certificate issue" });
  await tx.specimen.update({ where: { id: certifiedSpecimen.id }, data: { state: "RETAINED", storageLocationId: locations["RETAIN-1"]!, retainUntil: new Date(retainedAt.getTime() + 90 * DAY) } });

  const submitted = await makeRun(reviewSpecimen, reviewRoll, "CELL-02", users.technician2!, 11, "SUBMITTED", 12);
  await submitted.ended(5, 4, { thicknessMm: 6.1, massG: 70.8, observations: "Even swelling." });
  // A second run of the same roll waits for review too, so QA has one to return and one to approve.
  const secondSubmitted = await makeRun(secondReviewSpecimen, reviewRoll, "CELL-05", users.technician!, 11, "SUBMITTED", 12);
  await secondSubmitted.ended(5, 4, { thicknessMm: 6.0, massG: 71.0, observations: "Even swelling; no channels." });

  await makeRun(testingSpecimen, testingRoll, "CELL-03", users.technician!, 5, "PERMEATING", 7);

  // Index tests beside the hydraulic ones (Cell 4 and the tailings pond): approved, awaiting review and not
  // yet done; roll R-4102's swell index is below its limit. Coupons for strips and squares are cut first.
  const indexTest = demoIndexTester({ tx, ago, equipment, qaId: users.qa!, custody: (item, action, from, to, actorId, at, extra) => custody(item, action, from, to, actorId, at, extra) });
  await indexTest(certifiedRoll, OBS.swellGood, users.technician2!, 19, { approvedDaysAgo: 17 });
  await indexTest(certifiedRoll, OBS.fluid, users.technician2!, 19, { approvedDaysAgo: 17 });
  await indexTest(certifiedRoll, OBS.mass, users.technician2!, 18.5, { coupon: indexCoupons.certifiedSquares, approvedDaysAgo: 17 });
  await indexTest(certifiedRoll, OBS.tensile, users.technician!, 18.5, { coupon: indexCoupons.certifiedStrips, approvedDaysAgo: 17 });
  await indexTest(certifiedRoll, OBS.peel, users.technician!, 18.4, { coupon: indexCoupons.certifiedPeel, approvedDaysAgo: 17 });
  await indexTest(reviewRoll, OBS.swellLow, users.technician!, 11, { approvedDaysAgo: 9 });
  await indexTest(reviewRoll, OBS.fluidSecond, users.technician!, 10.5);
  await indexTest(reviewRoll, OBS.massSecond, users.technician!, 10.5, { coupon: indexCoupons.reviewSquares, approvedDaysAgo: 9 });
  await indexTest(reviewRoll, OBS.tensileSecond, users.technician2!, 10, { coupon: indexCoupons.reviewStrips });
  await indexTest(testingRoll, OBS.swellThird, users.technician!, 4);
  await indexTest(preparedRoll, OBS.massThird, users.technician2!, 7.5, { coupon: indexCoupons.preparedSquares, approvedDaysAgo: 6 });
  await indexTest(preparedRoll, OBS.swellGood, users.technician2!, 7.5, { approvedDaysAgo: 6 });
}

async function createEquipment(tx: Tx, adminId: string, now: Date): Promise<Ids> {
  const ids: Ids = {};
  const add = async (assetTag: string, kind: Prisma.EquipmentCreateInput["kind"], name: string, ratedMaxPressurePa: number | null, calibratedDaysAgo: number, values: Record<string, number | string> = {}) => {
    const eq = await tx.equipment.create({ data: { assetTag, kind, name, serialNumber: `SN-${assetTag}`, ratedMaxPressurePa } });
    const calibratedAt = new Date(now.getTime() - calibratedDaysAgo * DAY);
    const cal = await tx.calibration.create({
      data: { equipmentId: eq.id, calibratedAt, dueAt: new Date(calibratedAt.getTime() + 365 * DAY), reference: `CAL-${assetTag}-${calibratedAt.getUTCFullYear()}`, performedBy: "Haldrow Metrology (invented)", values, recordedById: adminId },
    });
    ids[assetTag] = eq.id;
    ids[`${assetTag}:cal`] = cal.id;
  };
  for (let n = 1; n <= 6; n++) {
    const calibratedDaysAgo = n === 6 ? 400 : 60 + n * 20;
    // Each cell's leakage check with a dummy specimen (ASTM D5887): far below 10 % of the demo flows.
    const leakage = { leakageCheckedAt: new Date(now.getTime() - calibratedDaysAgo * DAY).toISOString(), leakageMethod: "impermeable dummy specimen at the permeation pressures for 24 h", leakageRateM3PerS: 2e-13 + n * 1e-14 };
    await add(`CELL-0${n}`, "PERMEAMETER_CELL", `Flexible-wall permeameter cell ${n}`, 1_000_000, calibratedDaysAgo, leakage);
  }
  // The outflow burette's zero sits 40 mm higher than the inflow burette's, above the panel's common datum.
  for (let n = 1; n <= 3; n++)
    await add(`BP-0${n}`, "BURETTE_PANEL", `Burette panel ${n}`, 1_000_000, 90, {
      inflowBuretteAreaM2: DEMO_BURETTE_AREAS_MM2.inflow * 1e-6, outflowBuretteAreaM2: DEMO_BURETTE_AREAS_MM2.outflow * 1e-6,
      inflowZeroAboveDatumMm: 0, outflowZeroAboveDatumMm: 40, scaleMinMm: 0, scaleMaxMm: 500, standardUncertainty: U.volumeMl,
    });
  await add("PT-01", "PRESSURE_TRANSDUCER", "Differential pressure transducer 0-100 kPa", 700_000, 120, { standardUncertainty: U.pressureKPa });
  await add("PT-02", "PRESSURE_TRANSDUCER", "Cell pressure transducer 0-1000 kPa", 1_000_000, 350, { standardUncertainty: 0.5 });
  await add("TH-01", "THERMOMETER", "Laboratory thermometer", null, 200, { standardUncertainty: U.temperatureC });
  await add("TG-01", "THICKNESS_GAUGE", "Dial thickness gauge, 0.01 mm", null, 150, { standardUncertainty: U.thicknessMm });
  await add("CLK-01", "TIMER", "Data-logger clock", null, 100, { standardUncertainty: U.timeS });
  await createIndexEquipment((tag, kind, name, days, values) => add(tag, kind, name, null, days, values));
  return ids;
}
