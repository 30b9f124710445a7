/**
 * The tables the database audits (triggers in prisma/migrations), named in words for the audit trail.
 * The slug is what the table filter puts in the page address. A table added later without an entry here
 * is still shown, under its name split into words; it only cannot be chosen in the filter until it has one.
 */
type AuditTable = { slug: string; label: string; plural: string };

export const AUDIT_TABLES = {
  User: { slug: "person", label: "Person", plural: "People" },
  ApiToken: { slug: "api-token", label: "API token", plural: "API tokens" },
  ApiRequest: { slug: "api-request", label: "Request with an API token", plural: "Requests with API tokens" },
  NoticeDelivery: { slug: "notice", label: "Notice by e-mail", plural: "Notices by e-mail" },
  ApiReadingKey: { slug: "api-reading-key", label: "Reading key (API)", plural: "Reading keys (API)" },
  Laboratory: { slug: "laboratory", label: "Laboratory details", plural: "Laboratory details" },
  NumberSequence: { slug: "lab-number-counter", label: "Lab number counter", plural: "Lab number counters" },
  ClientOrganization: { slug: "client", label: "Client", plural: "Clients" },
  ClientContact: { slug: "client-contact", label: "Client contact", plural: "Client contacts" },
  Project: { slug: "project", label: "Project", plural: "Projects" },
  Specification: { slug: "specification", label: "Specification", plural: "Specifications" },
  SpecificationLimit: { slug: "specification-limit", label: "Specification limit", plural: "Specification limits" },
  TestMethod: { slug: "test-method", label: "Test method", plural: "Test methods" },
  MethodSettingsVersion: { slug: "method-settings", label: "Method settings version", plural: "Method settings versions" },
  StorageLocation: { slug: "storage-location", label: "Storage location", plural: "Storage locations" },
  Shipment: { slug: "shipment", label: "Shipment", plural: "Shipments" },
  ShipmentPhoto: { slug: "shipment-photo", label: "Shipment photo", plural: "Shipment photos" },
  Roll: { slug: "roll", label: "Roll", plural: "Rolls" },
  Coupon: { slug: "coupon", label: "Coupon", plural: "Coupons" },
  Specimen: { slug: "specimen", label: "Specimen", plural: "Specimens" },
  SpecimenChecklistItem: { slug: "preparation-check", label: "Preparation check", plural: "Preparation checks" },
  CustodyEvent: { slug: "custody-event", label: "Custody event", plural: "Custody events" },
  Correction: { slug: "correction", label: "Change with a reason", plural: "Changes with a reason (receipts, equipment)" },
  IndexTest: { slug: "index-test", label: "Index test", plural: "Index tests" },
  IndexTestResult: { slug: "index-test-result", label: "Index test result", plural: "Index test results" },
  IndexTestReview: { slug: "index-test-review", label: "Index test review", plural: "Index test reviews" },
  IndexTestEquipment: { slug: "index-test-instrument", label: "Instrument used in an index test", plural: "Instruments used in index tests" },
  Equipment: { slug: "equipment", label: "Equipment", plural: "Equipment" },
  Calibration: { slug: "calibration", label: "Calibration", plural: "Calibrations" },
  CalibrationOverride: { slug: "calibration-override", label: "Calibration override", plural: "Calibration overrides" },
  Run: { slug: "run", label: "Run", plural: "Runs" },
  RunEquipment: { slug: "run-instrument", label: "Instrument used in a run", plural: "Instruments used in runs" },
  RunStage: { slug: "run-stage", label: "Run stage", plural: "Run stages" },
  Reading: { slug: "reading", label: "Reading", plural: "Readings" },
  Review: { slug: "review", label: "Review decision", plural: "Review decisions" },
  Result: { slug: "result", label: "Result", plural: "Results" },
  Certificate: { slug: "certificate", label: "Certificate", plural: "Certificates" },
  CertificateRevision: { slug: "certificate-revision", label: "Certificate revision", plural: "Certificate revisions" },
  CertificateResult: { slug: "certificate-result", label: "Result on a certificate", plural: "Results on certificates" },
  CertificateIndexResult: { slug: "certificate-index-result", label: "Index-test result on a certificate", plural: "Index-test results on certificates" },
  Signature: { slug: "signature", label: "Signature", plural: "Signatures" },
  CertificateDraftContent: { slug: "certificate-draft-content", label: "Certificate draft content", plural: "Certificate draft contents" },
} as const satisfies Record<string, AuditTable>;

export type AuditTableName = keyof typeof AUDIT_TABLES;
export type AuditTableSlug = (typeof AUDIT_TABLES)[AuditTableName]["slug"];

const NAMES = Object.keys(AUDIT_TABLES) as AuditTableName[];

/** Every slug, for the filter's schema. */
export const AUDIT_TABLE_SLUGS = NAMES.map((name) => AUDIT_TABLES[name].slug) as [AuditTableSlug, ...AuditTableSlug[]];

/** The filter's choices in words, alphabetically. */
export const AUDIT_TABLE_CHOICES: { slug: AuditTableSlug; plural: string }[] = NAMES.map((name) => ({ slug: AUDIT_TABLES[name].slug, plural: AUDIT_TABLES[name].plural })).sort((a, b) =>
  a.plural.localeCompare(b.plural, "en"),
);

/** The table a slug names. */
export function auditTableForSlug(slug: AuditTableSlug): AuditTableName {
  return NAMES.find((name) => AUDIT_TABLES[name].slug === slug)!;
}

/** A table's name in words: "Reading", "Run stage"; an unlisted table's name split into words. */
export function auditTableLabel(tableName: string): string {
  return tableName in AUDIT_TABLES ? AUDIT_TABLES[tableName as AuditTableName].label : wordsOf(tableName);
}

/** "calibrationOverrideReason" -> "Calibration override reason"; "UNDER_TEST" -> "Under test". */
export function wordsOf(name: string): string {
  const words = name.includes("_") ? name.toLowerCase().split("_") : name.split(/(?<=[a-z0-9])(?=[A-Z])/).map((w) => w.toLowerCase());
  const text = words.filter(Boolean).join(" ");
  return text.charAt(0).toUpperCase() + text.slice(1);
}
