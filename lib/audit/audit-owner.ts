/**
 * Which record an audited row belongs to, as a person names it: a roll or run by its lab number, a reading
 * as "reading 4" of its run, a calibration as part of its instrument. Rows with a lab number (or asset
 * tag, or name) of their own name themselves; parts point at their owner by id, which the server looks
 * up. `keys` are the columns that point at the owner, left out of the change list since the record
 * column already says it. Pure.
 */
import { labNumberAddress } from "../numbering/lab-number-address";
import { TEST_PROPERTY_LABELS } from "../results/property-units";
import { auditFieldSpec, type AuditRefKind } from "./audit-fields";
import { wordsOf } from "./audit-tables";

export type AuditRecordName = { text: string; href: string | null };
export type AuditOwner = {
  record: AuditRecordName | { ref: AuditRefKind; id: string } | null;
  /** Which part of the record the row is, e.g. "reading 4" or "stage 2, permeation"; null for the record itself. */
  part: string | null;
  keys: string[];
};

type Row = Record<string, unknown>;
const text = (value: unknown): string => (value === null || value === undefined ? "" : String(value));
const words = (value: unknown) => wordsOf(text(value)).toLowerCase();
const property = (value: unknown) => (TEST_PROPERTY_LABELS[text(value) as keyof typeof TEST_PROPERTY_LABELS] ?? words(value)).toLowerCase();

const self = (name: string, href: string | null = null): AuditOwner => ({ record: name ? { text: name, href } : null, part: null, keys: [] });
const labNumbered = (row: Row) => self(text(row.labNumber ?? row.number), labNumberAddress(text(row.labNumber ?? row.number)));

function partOf(ref: AuditRefKind, key: string, row: Row, part: string): AuditOwner {
  const id = text(row[key]);
  return { record: id ? { ref, id } : null, part, keys: [key] };
}

const OWNERS: Record<string, (row: Row) => AuditOwner> = {
  Shipment: labNumbered, Roll: labNumbered, Coupon: labNumbered, Specimen: labNumbered, Run: labNumbered, Certificate: labNumbered,
  User: (row) => self(text(row.name)),
  ClientOrganization: (row) => self(text(row.name)),
  ClientContact: (row) => partOf("client", "clientOrganizationId", row, `contact ${text(row.name)}`.trim()),
  Project: (row) => self(`${text(row.code)} ${text(row.name)}`.trim()),
  Laboratory: (row) => self(text(row.name)),
  NumberSequence: (row) => self(`lab number counter ${text(row.key)}`),
  TestMethod: (row) => self(text(row.code)),
  MethodSettingsVersion: (row) => self(`${text(row.methodCode)} settings, version ${text(row.version)}`),
  StorageLocation: (row) => self(text(row.code)),
  Equipment: (row) => self(text(row.assetTag), `/equipment/${encodeURIComponent(text(row.assetTag))}`),
  Specification: (row) => self(text(row.name), `/specifications/${encodeURIComponent(text(row.id))}`),
  ApiToken: (row) => partOf("user", "userId", row, `API token “${text(row.name)}”`),
  ApiRequest: (row) => partOf("user", "userId", row, `${text(row.method)} ${text(row.path)} with API token “${text(row.tokenName)}”`),
  NoticeDelivery: (row) => self(`notice “${text(row.subject)}”`),
  ApiReadingKey: (row) => partOf("run", "runId", row, `reading ${text(row.sequence)} posted under key “${text(row.key)}”`),
  SpecificationLimit: (row) => partOf("specification", "specificationId", row, `limit on ${property(row.property)}`),
  ShipmentPhoto: (row) => partOf("shipment", "shipmentId", row, `photo ${text(row.fileName)}`),
  IndexTest: (row) => partOf("roll", "rollId", row, `index test: ${property(row.property)}`),
  // Parts of an index test: the roll is found through the test (no lab number of its own).
  IndexTestResult: (row) => ({ record: null, part: `index test result: ${property(row.property)}`, keys: [] }),
  IndexTestReview: (row) => ({ record: null, part: `index test review: ${words(row.decision)}`, keys: [] }),
  IndexTestEquipment: (row) => ({ record: null, part: `instrument used in an index test (${text(row.role)})`, keys: [] }),
  SpecimenChecklistItem: (row) => partOf("specimen", "specimenId", row, `preparation check “${text(row.question || row.itemKey)}”`),
  Calibration: (row) => partOf("equipment", "equipmentId", row, `calibration ${text(row.reference)}`.trim()),
  CalibrationOverride: (row) => partOf("equipment", "equipmentId", row, "calibration override"),
  RunStage: (row) => partOf("run", "runId", row, `stage ${text(row.sequence)}, ${words(row.kind)}`),
  Reading: (row) => partOf("run", "runId", row, `reading ${text(row.sequence)}`),
  RunEquipment: (row) => partOf("run", "runId", row, `instrument used (${text(row.role)})`),
  Review: (row) => partOf("run", "runId", row, `review: ${words(row.decision)}`),
  Result: (row) => partOf("run", "runId", row, `result: ${property(row.property)}`),
  CertificateRevision: (row) => partOf("certificate", "certificateId", row, `revision ${text(row.revision)}`),
  CertificateResult: (row) => partOf("revision", "revisionId", row, "result on the certificate"),
  CertificateIndexResult: (row) => partOf("revision", "revisionId", row, "index-test result on the certificate"),
  Signature: (row) => partOf("revision", "revisionId", row, "signature"),
  CertificateDraftContent: (row) => partOf("revision", "revisionId", row, "draft content"),
  CustodyEvent: (row) => {
    const key = ["rollId", "couponId", "specimenId"].find((k) => row[k]) ?? "rollId";
    return partOf(key.slice(0, -2) as AuditRefKind, key, row, `custody: ${words(row.action)}`);
  },
  Correction: (row) => {
    const ref = ({ Shipment: "shipment", Roll: "roll", Coupon: "coupon", Specimen: "specimen", Run: "run", Equipment: "equipment" } as const)[text(row.entity) as "Roll"];
    const owner = ref ? partOf(ref, "entityId", row, `correction of ${auditFieldSpec(text(row.entity), text(row.field)).label.toLowerCase()}`) : self(`${text(row.entity)} ${text(row.entityId)}`);
    return { ...owner, keys: ["entity", "entityId"] };
  },
};

/** The record `row` (an audit row's after, or before for a delete) of `tableName` belongs to. */
export function auditOwner(tableName: string, row: Row): AuditOwner {
  const known = OWNERS[tableName];
  if (known) return known(row);
  // A table added later: its own lab number, else the first column that points at a numbered record.
  if (row.labNumber) return labNumbered(row);
  const key = ["runId", "specimenId", "couponId", "rollId", "shipmentId", "certificateId"].find((k) => typeof row[k] === "string");
  return key ? partOf(key.slice(0, -2) as AuditRefKind, key, row, wordsOf(tableName).toLowerCase()) : { record: null, part: null, keys: [] };
}
