import "server-only";
import { can, type Action } from "@/lib/policy/permissions";
import type { CurrentUser } from "../auth/current-user";
import { getDb } from "../db/client";
import { loadProjectConformance } from "../conformance/load-project-conformance";

const LIMIT = 15;
const ACTIVE_RUN_STATES = ["SET_UP", "SATURATING", "EQUILIBRATING", "PERMEATING", "TERMINATED", "POST_TEST_RECORDED", "RETURNED"] as const;

/** Shipments received but not yet acknowledged to the client, oldest first. */
async function findShipmentsToAcknowledge() {
  return getDb().shipment.findMany({
    where: { acknowledgedAt: null },
    orderBy: { receivedAt: "asc" },
    take: LIMIT,
    select: {
      id: true, labNumber: true, receivedAt: true, deliveredBy: true,
      clientOrganization: { select: { name: true } }, project: { select: { name: true } },
      _count: { select: { rolls: true } },
    },
  });
}

/** Rolls that have arrived and wait to be cut into coupons. */
async function findRollsToCut() {
  return getDb().roll.findMany({
    where: { state: { in: ["RECEIVED", "STORED"] } },
    orderBy: { createdAt: "asc" },
    take: LIMIT,
    select: { id: true, labNumber: true, rollNumber: true, product: true, state: true, project: { select: { name: true } } },
  });
}

/** Specimens prepared and waiting for a free cell. */
async function findSpecimensWaiting() {
  return getDb().specimen.findMany({
    where: { state: "PREPARED" },
    orderBy: { preparedAt: "asc" },
    take: LIMIT,
    select: {
      id: true, labNumber: true, intendedMethodCode: true, preparedAt: true,
      coupon: { select: { roll: { select: { labNumber: true, project: { select: { name: true } } } } } },
    },
  });
}

/** Runs not yet submitted; those who operate runs see their own (as on the runs page), everyone else sees all. */
async function findRunsInProgress(actor: CurrentUser) {
  return getDb().run.findMany({
    where: { state: { in: [...ACTIVE_RUN_STATES] }, ...(can(actor.role, "run.operate") ? { performedById: actor.id } : {}) },
    orderBy: { assignedAt: "asc" },
    take: LIMIT,
    select: {
      id: true, labNumber: true, state: true, methodCode: true, assignedAt: true,
      cell: { select: { assetTag: true } }, specimen: { select: { labNumber: true } }, performedBy: { select: { name: true } },
    },
  });
}

/** Runs submitted for review, oldest first. */
async function findRunsToReview() {
  return getDb().run.findMany({
    where: { state: "SUBMITTED" },
    orderBy: { submittedAt: "asc" },
    take: LIMIT,
    select: {
      id: true, labNumber: true, methodCode: true, submittedAt: true,
      performedBy: { select: { name: true } }, specimen: { select: { labNumber: true } },
    },
  });
}

/**
 * Rolls with index tests their project's specification asks for and that have none yet (or one QA
 * returned), per roll. Looks at the projects with rolls still in the lab's hands, the most recent first.
 */
async function findIndexTestsWaiting() {
  const projects = await getDb().project.findMany({
    where: { active: true, rolls: { some: { state: { in: ["RECEIVED", "STORED", "CUT", "UNDER_TEST", "TESTED"] } } }, specifications: { some: { isTemplate: false } } },
    orderBy: { updatedAt: "desc" },
    take: 20,
    select: { id: true, name: true },
  });
  const out: Array<{ rollLabNumber: string; rollNumber: string; projectName: string; methods: Array<{ code: string; title: string }> }> = [];
  for (const project of projects) {
    const conformance = await loadProjectConformance({ projectId: project.id });
    for (const row of conformance.rows) {
      const waiting = conformance.waiting.get(row.roll.id);
      if (!waiting) continue;
      const methods = [...new Map(waiting.map((w) => [w.methodCode, { code: w.methodCode, title: w.methodTitle }])).values()];
      out.push({ rollLabNumber: row.roll.labNumber, rollNumber: row.roll.rollNumber, projectName: project.name, methods });
    }
    if (out.length >= LIMIT) break;
  }
  return out.slice(0, LIMIT);
}

/**
 * Index tests recorded and awaiting QA review, longest waiting first. They wait from when they were recorded
 * (a redo after a return is a new record), as runs wait from submission, not from the day of testing.
 */
async function findIndexTestsToReview() {
  return getDb().indexTest.findMany({
    where: { state: "SUBMITTED" },
    orderBy: { createdAt: "asc" },
    take: LIMIT,
    select: { id: true, methodCode: true, testedAt: true, createdAt: true, performedBy: { select: { name: true } }, roll: { select: { labNumber: true } } },
  });
}

/** Equipment whose calibration falls due within `days`, or is already overdue. */
async function findCalibrationsDue(days = 30, now = new Date()) {
  const horizon = new Date(now.getTime() + days * 86_400_000);
  const equipment = await getDb().equipment.findMany({
    where: { status: "IN_SERVICE" },
    select: { id: true, assetTag: true, name: true, kind: true, calibrations: { orderBy: { dueAt: "desc" }, take: 1, select: { dueAt: true } } },
    orderBy: { assetTag: "asc" },
  });
  return equipment
    .map((e) => ({ id: e.id, assetTag: e.assetTag, name: e.name, kind: e.kind, dueAt: e.calibrations[0]?.dueAt ?? null }))
    .filter((e) => e.dueAt === null || e.dueAt <= horizon)
    .sort((a, b) => (a.dueAt?.getTime() ?? 0) - (b.dueAt?.getTime() ?? 0));
}

/** A client's projects with how many rolls are at each stage; only the client's own organisation. */
async function findClientProjects(actor: CurrentUser) {
  if (!actor.clientOrganizationId) return [];
  const projects = await getDb().project.findMany({
    where: { clientOrganizationId: actor.clientOrganizationId },
    orderBy: { name: "asc" },
    select: { id: true, code: true, name: true, siteName: true, rolls: { select: { state: true } } },
  });
  return projects.map((p) => ({
    id: p.id, code: p.code, name: p.name, siteName: p.siteName,
    rollCount: p.rolls.length,
    rollsUnderTest: p.rolls.filter((r) => ["CUT", "PREPARED", "ASSIGNED", "UNDER_TEST"].includes(r.state)).length,
    rollsTested: p.rolls.filter((r) => ["TESTED", "RETAINED", "DISPOSED"].includes(r.state)).length,
  }));
}

/** The work queues a role sees on its home page; each queue is included only where the policy allows. */
export async function getHomeQueues(actor: CurrentUser) {
  const allowed = (action: Action) => can(actor.role, action);
  const [shipments, rollsToCut, specimens, runs, reviews, calibrations, projects, indexTestsWaiting, indexTestsToReview] = await Promise.all([
    allowed("shipment.create") ? findShipmentsToAcknowledge() : null,
    allowed("sample.cut") ? findRollsToCut() : null,
    allowed("run.operate") ? findSpecimensWaiting() : null,
    allowed("run.operate") || allowed("run.review") ? findRunsInProgress(actor) : null,
    allowed("run.review") ? findRunsToReview() : null,
    allowed("equipment.manage") ? findCalibrationsDue() : null,
    allowed("portal.view") ? findClientProjects(actor) : null,
    allowed("run.operate") ? findIndexTestsWaiting() : null,
    allowed("run.review") ? findIndexTestsToReview() : null,
  ]);
  return { shipments, rollsToCut, specimens, runs, reviews, calibrations, projects, indexTestsWaiting, indexTestsToReview };
}
export type HomeQueues = Awaited<ReturnType<typeof getHomeQueues>>;
