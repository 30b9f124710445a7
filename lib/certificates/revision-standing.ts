/**
 * What a certificate revision's status means to someone holding it, worded once for the public
 * verification page and the client portal so both say the same: valid; superseded (by which revision,
 * since when: still downloadable, named as superseded); or revoked (withdrawn: the client is not offered
 * the file any more, the laboratory keeps it). Pure.
 */
import { formatDate } from "../format/dates";

export type IssuedStatus = "ISSUED" | "SUPERSEDED" | "REVOKED";
export type RevisionStandingInput = {
  status: IssuedStatus;
  supersededByRevision: number | null;
  /** When a superseded or revoked revision stopped standing. */
  since: Date | null;
};
export type RevisionStanding = {
  tone: "ok" | "warn" | "bad";
  /** A tag: "Issued, valid", "Superseded by revision 2", "Revoked". */
  label: string;
  /** The first sentence, e.g. "Revoked on 2026-12-01." */
  headline: string;
  detail: string;
  /** Whether a client may still download the file; the laboratory's staff always may. */
  clientMayDownload: boolean;
};

const on = (date: Date | null) => (date ? ` on ${formatDate(date)}` : "");

export function revisionStanding(revision: RevisionStandingInput): RevisionStanding {
  if (revision.status === "REVOKED")
    return {
      tone: "bad", label: "Revoked", headline: `Revoked${on(revision.since)}.`,
      detail: "The laboratory has withdrawn this certificate; its results must not be relied on.",
      clientMayDownload: false,
    };
  if (revision.status === "SUPERSEDED") {
    const by = revision.supersededByRevision;
    return {
      tone: "warn", label: by ? `Superseded by revision ${by}` : "Superseded", headline: `Superseded${by ? ` by revision ${by}` : ""}${on(revision.since)}.`,
      detail: `This revision has been replaced and no longer stands; ask the issuer for the ${by ? `revision ${by} certificate` : "current revision"}.`,
      clientMayDownload: true,
    };
  }
  return { tone: "ok", label: "Issued, valid", headline: "Valid.", detail: "This is the current revision of the certificate.", clientMayDownload: true };
}

/** The download's file name, which says when the revision no longer stands: Q26-00001-rev1-superseded.pdf. */
export function certificatePdfFileName(number: string, revision: number, status: IssuedStatus): string {
  return `${number}-rev${revision}${status === "SUPERSEDED" ? "-superseded" : status === "REVOKED" ? "-REVOKED" : ""}.pdf`;
}
