/**
 * How the audit trail names and shows each column of an audited row. Most columns need no entry: the
 * unit in the column's name (…Mm, …Pa, …C, …At) says how to show the value, and the name split into
 * words is the label, so a column added later is still shown sensibly. Secrets are never shown. Pure.
 */
import { EQUIPMENT_KIND_LABELS, ITEM_STATE_LABELS, RUN_STATE_LABELS } from "../format/states";
import { ROLE_LABELS } from "../policy/permissions";
import { TEST_PROPERTY_LABELS } from "../results/property-units";
import { wordsOf } from "./audit-tables";

/** Records a column can point at; the server turns their ids into lab numbers and names. */
export const AUDIT_REF_KINDS = [
  "user", "shipment", "roll", "coupon", "specimen", "run", "certificate", "revision", "equipment", "calibration",
  "specification", "project", "client", "location", "reading", "result",
] as const;
export type AuditRefKind = (typeof AUDIT_REF_KINDS)[number];

export type AuditFieldSpec = { label: string } & (
  | { kind: "hidden" } // bookkeeping (ids, timestamps of the row itself, optimistic-lock versions)
  | { kind: "secret" } // never shown, whatever the trigger kept
  | { kind: "plain" } // text, numbers without a unit, yes/no
  | { kind: "number"; unit: string }
  | { kind: "pressure" } // pascals, shown in the person's unit
  | { kind: "elapsed" } // seconds since permeation began, shown in hours
  | { kind: "datetime" }
  | { kind: "enum"; words: Record<string, string> }
  | { kind: "ref"; ref: AuditRefKind }
  | { kind: "row-unit" } // a number in the unit named by the row's own `unit` column
  | { kind: "summary" } // large frozen content (a certificate's snapshot): only whether it is there
);

const HIDDEN = new Set(["id", "createdAt", "updatedAt", "version"]);
const SECRET = new Set(["passwordHash", "tokenHash", "data", "pdf"]);
// A column added later whose name says it holds a secret is hidden too.
const SECRET_NAME = /password(?!ChangedAt)|secret|salt|hash$|apiKey|privateKey/i;

const CUSTODY_ACTION_WORDS: Record<string, string> = {
  RECEIVED: "Received", STORED: "Stored", MOVED: "Moved", CUT: "Cut", PREPARED: "Prepared", ASSIGNED: "Assigned to a cell",
  TEST_STARTED: "Test started", TESTED: "Tested", RETAINED: "Retained", DISPOSED: "Disposed of", CORRECTED: "Corrected",
  WITHDRAWN: "Withdrawn from the cell",
};
const KIND_WORDS: Record<string, string> = { ...EQUIPMENT_KIND_LABELS, BACK_PRESSURE: "Back-pressure" };
const UNIT_WORDS: Record<string, string> = { KPA: "kPa", PSI: "psi" };

const REF_COLUMNS: Record<string, AuditRefKind> = {
  actorId: "user", reviewerId: "user", signerId: "user", userId: "user", signatoryId: "user", createdById: "user",
  shipmentId: "shipment", rollId: "roll", couponId: "coupon", specimenId: "specimen", runId: "run",
  certificateId: "certificate", revisionId: "revision", supersedesId: "revision", equipmentId: "equipment", cellId: "equipment",
  calibrationId: "calibration", specificationId: "specification", projectId: "project", clientOrganizationId: "client",
  storageLocationId: "location", fromLocationId: "location", toLocationId: "location", correctsId: "reading", resultId: "result",
};

const LABELS: Record<string, string> = {
  inflowLevelMm: "Inflow burette level", outflowLevelMm: "Outflow burette level",
  inflowCumulativeMl: "Inflow volume, cumulative", outflowCumulativeMl: "Outflow volume, cumulative",
  headPa: "Line-pressure difference", elapsedS: "Elapsed time", correctsId: "Corrects", correctionReason: "Reason for the correction",
  influentEcMsPerM: "Influent EC", effluentEcMsPerM: "Effluent EC", influentPh: "Influent pH", effluentPh: "Effluent pH",
  permeantEcMsPerM: "Permeant EC", permeantPh: "Permeant pH", permeantMolarityMolPerL: "Permeant molarity",
  ratedMaxPressurePa: "Rated maximum pressure", clientOrganizationId: "Client", storageLocationId: "Storage location",
  fromLocationId: "From location", toLocationId: "To location", cellId: "Cell", actorId: "Person", pdfSha256: "PDF digest (SHA-256)",
  expandedUncertainty: "Expanded uncertainty (k = 2)", limitText: "Limit", lastValue: "Last number given", key: "Counter",
  conditionNotes: "Condition on arrival", machineDirectionMarked: "Machine direction marked", sessionVersion: "Sign-in version",
  resultIds: "Results included", indexResultIds: "Index-test results included", indexTestResultId: "Index-test result", signatoryId: "Signatory", unitSystem: "Units of results", resultUnits: "Units of results", createdById: "Written by",
  timeZone: "Time zone", abandonmentReason: "Reason for abandoning", abandonedById: "Abandoned by", jobTitle: "Job title",
};

// Units read from the end of a column's name, longest first.
const SUFFIX_UNITS: ReadonlyArray<readonly [RegExp, string]> = [
  [/MolPerL$/, "mol/L"], [/MsPerM$/, "mS/m"], [/(?<=[a-z])Pa$/, "Pa"], [/Mm$/, "mm"], [/Ml$/, "mL"], [/M2$/, "m²"], [/Pct$/, "%"], [/Ph$/, ""],
  [/(?<=[a-z])G$/, "g"], [/(?<=[a-z])C$/, "°C"], [/(?<=[a-z])S$/, "s"], [/Days$/, "days"],
];

function enumWords(tableName: string, field: string): Record<string, string> | null {
  if (field === "state") return tableName === "Run" ? RUN_STATE_LABELS : ITEM_STATE_LABELS;
  if (field === "fromState" || field === "toState") return ITEM_STATE_LABELS;
  if (field === "role" || field === "signerRole") return ROLE_LABELS;
  if (field === "property") return TEST_PROPERTY_LABELS;
  if (field === "action" && tableName === "CustodyEvent") return CUSTODY_ACTION_WORDS;
  if (field === "kind") return KIND_WORDS;
  if (field === "pressureUnit") return UNIT_WORDS;
  if (["status", "decision", "direction", "conformanceMethod", "terminationKind", "operation"].includes(field)) return {};
  return null;
}

/** How to name and show `field` of a row of `tableName`. */
export function auditFieldSpec(tableName: string, field: string): AuditFieldSpec {
  const suffix = SUFFIX_UNITS.find(([pattern]) => pattern.test(field));
  const bare = field.endsWith("Id") && field.length > 2 ? field.slice(0, -2) : suffix ? field.replace(suffix[0], "") : field;
  const label = LABELS[field] ?? wordsOf(bare);
  if (SECRET.has(field) || SECRET_NAME.test(field)) return { label, kind: "secret" };
  // A settings version's number is the record's own, not an edit counter.
  if (field === "version" && tableName === "MethodSettingsVersion") return { label: "Version", kind: "plain" };
  if (HIDDEN.has(field)) return { label, kind: "hidden" };
  // A custody event's sequence only keeps events of the same moment in the order they were recorded.
  if (field === "sequence" && tableName === "CustodyEvent") return { label, kind: "hidden" };
  if (field === "snapshot") return { label: "Certificate content", kind: "summary" };
  // API records: the key a logger chose or a notice's own key, the token by its name (the id says nothing), the
  // cells of a data-logger token as ids (their asset tags are on the token's page), scopes and transports in words.
  if (field === "key" && (tableName === "ApiReadingKey" || tableName === "NoticeDelivery")) return { label: tableName === "ApiReadingKey" ? "Idempotency key" : "Notice key", kind: "plain" };
  if (field === "tokenId" && tableName !== "ApiToken") return { label: "Token", kind: "hidden" };
  if (field === "bodySha256") return { label: "Fingerprint of the reading's values (SHA-256)", kind: "plain" };
  if (field === "cellIds") return { label: "Cells (equipment ids)", kind: "plain" };
  if (field === "evaluation") return { label: "Evaluation record", kind: "summary" };
  if ((field === "value" || field === "expandedUncertainty") && (tableName === "Result" || tableName === "IndexTest")) return { label, kind: "row-unit" };
  const words = enumWords(tableName, field);
  if (words) return { label, kind: "enum", words };
  const ref = REF_COLUMNS[field] ?? (field.endsWith("ById") ? "user" : undefined);
  if (ref) return { label, kind: "ref", ref };
  if (field.endsWith("At")) return { label, kind: "datetime" };
  if (field === "elapsedS") return { label, kind: "elapsed" };
  if (field.endsWith("Pa")) return { label, kind: "pressure" };
  if (suffix) return { label, kind: "number", unit: suffix[1] };
  return { label, kind: "plain" };
}
