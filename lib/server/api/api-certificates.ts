import "server-only";
import { AppError } from "@/lib/errors/app-error";
import type { ApiCertificate, ApiPage } from "@/lib/validation/api";
import { getDb } from "../db/client";
import { decodeCursor, encodeCursor, pageLimit } from "./api-cursor";
import { apiOrganizationScope, isClientCaller, pageOf } from "./api-scope";
import type { ApiCaller } from "./authenticate-api-request";

const select = (client: boolean) =>
  ({
    number: true,
    project: { select: { code: true, name: true } },
    revisions: {
      where: client ? { status: { not: "DRAFT" as const } } : {},
      orderBy: { revision: "desc" as const },
      select: { revision: true, status: true, issuedAt: true, verificationCode: true, pdfSha256: true },
    },
  }) as const;

type Row = { number: string; project: { code: string; name: string }; revisions: Array<{ revision: number; status: string; issuedAt: Date | null; verificationCode: string; pdfSha256: string | null }> };

const toApi = (c: Row): ApiCertificate => ({
  number: c.number,
  project: c.project,
  revisions: c.revisions.map((r) => ({
    revision: r.revision, status: r.status, issuedAt: r.issuedAt?.toISOString() ?? null,
    verificationCode: r.status === "DRAFT" ? null : r.verificationCode,
    pdf: r.status !== "DRAFT" && r.pdfSha256 ? `/api/v1/certificates/${encodeURIComponent(c.number)}/pdf?revision=${r.revision}` : null,
  })),
});

/** Certificates by number; a client token sees its organisation's, without drafts. `project` narrows. */
export async function listApiCertificates(caller: ApiCaller, query: URLSearchParams): Promise<ApiPage<ApiCertificate>> {
  const take = pageLimit(query.get("limit"));
  const after = decodeCursor("certificates", query.get("cursor"));
  const client = isClientCaller(caller);
  const projectCode = query.get("project");
  const rows = await getDb().certificate.findMany({
    where: {
      ...apiOrganizationScope(caller),
      ...(projectCode ? { project: { code: projectCode } } : {}),
      ...(client ? { revisions: { some: { status: { not: "DRAFT" } } } } : {}),
      ...(after ? { number: { gt: after } } : {}),
    },
    orderBy: { number: "asc" },
    take: take + 1,
    select: select(client),
  });
  const paged = pageOf(rows, take, (r) => r.number, (k) => encodeCursor("certificates", k));
  return { data: paged.rows.map(toApi), nextCursor: paged.nextCursor };
}

export async function getApiCertificate(caller: ApiCaller, number: string): Promise<ApiCertificate> {
  const client = isClientCaller(caller);
  const row = await getDb().certificate.findFirst({
    where: { number, ...apiOrganizationScope(caller), ...(client ? { revisions: { some: { status: { not: "DRAFT" } } } } : {}) },
    select: select(client),
  });
  if (!row) throw new AppError("NOT_FOUND", `No certificate ${number} that this token may read.`);
  return toApi(row);
}
