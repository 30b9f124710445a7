/**
 * The one permission matrix of Seepline: which role may take which action. Every page, server action and
 * route handler asks `can` (through lib/server/auth) before doing anything. Pure: no framework imports.
 */
export const ROLES = ["INTAKE_CLERK", "TECHNICIAN", "QA_MANAGER", "LAB_ADMIN", "CLIENT_USER"] as const;
export type RoleName = (typeof ROLES)[number];

export const ROLE_LABELS: Record<RoleName, string> = {
  INTAKE_CLERK: "Intake clerk",
  TECHNICIAN: "Technician",
  QA_MANAGER: "QA manager",
  LAB_ADMIN: "Lab administrator",
  CLIENT_USER: "Client user",
};

export const ACTIONS = [
  "workspace.view", // the staff side of the app at all
  "shipment.view",
  "shipment.create", // log a shipment and its rolls on arrival
  "shipment.acknowledge", // send the client the receipt acknowledgement
  "shipment.correct", // change a receipt after acknowledgement, with a reason
  "sample.view", // rolls, coupons, specimens and their ledger
  "sample.cut", // coupons from rolls, specimens from coupons
  "sample.move", // storage moves, retention and disposal
  "location.manage", // the list of storage places
  "equipment.view",
  "equipment.manage", // register equipment and record calibrations
  "calibration.override", // let a run use equipment that is due, with a recorded reason
  "run.view",
  "run.operate", // assign cells, record stages and readings, terminate, submit; record index tests
  "run.review", // approve a run or return it to the technician; the same for index tests
  "certificate.view",
  "certificate.issue", // sign and issue, or revise, a certificate
  "specification.manage",
  "method.manage", // change a test method's settings (criteria, pressures, uncertainty defaults) by a new version
  "user.manage", // create, deactivate, reset passwords, change roles
  "client.manage", // client organisations, their contacts and portal users, projects and sites
  "lab.configure", // the lab's own name, address, accreditation number and time zone
  "audit.view",
  "portal.view", // the client portal: own organisation only
  "account.self", // change one's own password and unit preference
] as const;
export type Action = (typeof ACTIONS)[number];

const STAFF_READ: Action[] = ["workspace.view", "shipment.view", "sample.view", "run.view", "equipment.view", "certificate.view"];

const MATRIX: Record<RoleName, readonly Action[]> = {
  // The clerk owns the door: receipts and storage, never test data.
  INTAKE_CLERK: [...STAFF_READ, "shipment.create", "shipment.acknowledge", "shipment.correct", "sample.move", "location.manage", "account.self"],
  // The technician turns rolls into test data; receipts are not theirs to change.
  TECHNICIAN: [...STAFF_READ, "sample.cut", "sample.move", "run.operate", "account.self"],
  // QA judges and signs; the rule that they never approve their own work is enforced per record, not here.
  QA_MANAGER: [...STAFF_READ, "run.review", "certificate.issue", "calibration.override", "specification.manage", "audit.view", "account.self"],
  // The administrator keeps people, equipment and reference data, and produces no test results.
  LAB_ADMIN: [...STAFF_READ, "user.manage", "client.manage", "lab.configure", "equipment.manage", "specification.manage", "method.manage", "location.manage", "audit.view", "account.self"],
  // A client sees only the portal; record-level scoping to their organisation happens in each query.
  CLIENT_USER: ["portal.view", "account.self"],
};

/** Whether a role may take an action. */
export function can(role: RoleName, action: Action): boolean {
  return MATRIX[role].includes(action);
}

/** The roles that may take an action, for "this needs ..." messages. */
export function rolesAllowedTo(action: Action): RoleName[] {
  return ROLES.filter((role) => can(role, action));
}

/** A sentence naming the roles an action needs, e.g. "Lab administrator". */
export function describeRolesAllowedTo(action: Action): string {
  const labels = rolesAllowedTo(action).map((role) => ROLE_LABELS[role]);
  if (labels.length <= 1) return labels[0] ?? "no role";
  return `${labels.slice(0, -1).join(", ")} or ${labels[labels.length - 1]}`;
}

export function isAction(value: string): value is Action {
  return (ACTIONS as readonly string[]).includes(value);
}

export function isStaffRole(role: RoleName): boolean {
  return role !== "CLIENT_USER";
}

/**
 * Whether this person may approve this run: a QA manager, and not the one who performed it (ISO/IEC 17025
 * independence of review; the database refuses it too).
 */
export function canApproveRun(actor: { id: string; role: RoleName }, run: { performedById: string }): { ok: true } | { ok: false; reason: string } {
  if (!can(actor.role, "run.review")) return { ok: false, reason: `Approving needs the role ${describeRolesAllowedTo("run.review")}.` };
  if (actor.id === run.performedById) return { ok: false, reason: "You performed this run, so another QA manager must review it." };
  return { ok: true };
}
