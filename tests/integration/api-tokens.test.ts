import { createHash } from "node:crypto";
import { describe, expect, it } from "vitest";
import { createApiToken } from "@/lib/server/api-tokens/create-api-token";
import { listAllApiTokens, listOwnApiTokens } from "@/lib/server/api-tokens/list-api-tokens";
import { revokeApiToken } from "@/lib/server/api-tokens/revoke-api-token";
import { db, makeUser, unique } from "../support/factories";
import { failure } from "../support/refusals";
import { makeRun } from "../support/make-permeating-run";

describe("API tokens on My account", () => {
  it("shows the token once and keeps only its SHA-256; a data-logger token names existing cells; it expires", async () => {
    const { technician, run } = await makeRun();
    const cell = await db().equipment.findUniqueOrThrow({ where: { id: run.cellId } });
    const now = new Date("2026-12-02T10:00:00Z");
    const made = await createApiToken({ actor: technician, input: { name: "Cell logger", scope: "READINGS_POST", cells: cell.assetTag.toLowerCase(), expiresInDays: "30" }, now });
    expect(made.token).toMatch(/^slp_[A-Za-z0-9_-]{43}$/);
    expect(made).toMatchObject({ cells: [cell.assetTag], expiresAt: new Date("2027-01-01T10:00:00Z") });
    const row = await db().apiToken.findUniqueOrThrow({ where: { id: made.id }, omit: { tokenHash: false } });
    expect(row.tokenHash).toBe(createHash("sha256").update(made.token).digest("hex"));
    expect(JSON.stringify(row)).not.toContain(made.token);
    expect(row.cellIds).toEqual([cell.id]);
    // The audit trail keeps the row without its hash.
    const audited = await db().auditLog.findFirstOrThrow({ where: { tableName: "ApiToken", rowId: made.id } });
    expect(JSON.stringify(audited.after)).not.toContain(row.tokenHash);

    const unknownCell = await failure(createApiToken({ actor: technician, input: { name: "x logger", scope: "READINGS_POST", cells: "CELL-NOPE-1" } }));
    expect(unknownCell.fieldErrors.cells).toMatch(/No permeameter cell has the asset tag CELL-NOPE-1/);
    expect((await failure(createApiToken({ actor: technician, input: { name: "x logger", scope: "READINGS_POST" } }))).fieldErrors.cells).toMatch(/Name the cells/);
    expect((await failure(createApiToken({ actor: technician, input: { name: "long", scope: "LAB_READ", expiresInDays: 400 } }))).fieldErrors.expiresInDays).toMatch(/at most 366 days/);
  });

  it("lets each role hold only its scopes", async () => {
    const [client, qa] = await Promise.all([makeUser("CLIENT_USER"), makeUser("QA_MANAGER")]);
    expect((await failure(createApiToken({ actor: client, input: { name: "register", scope: "LAB_READ" } }))).code).toBe("FORBIDDEN");
    expect((await failure(createApiToken({ actor: qa, input: { name: "logger", scope: "READINGS_POST", cells: "CELL-01" } }))).code).toBe("FORBIDDEN");
    expect((await failure(createApiToken({ actor: qa, input: { name: "register", scope: "CLIENT_READ" } }))).code).toBe("FORBIDDEN");
    await expect(createApiToken({ actor: client, input: { name: "register", scope: "CLIENT_READ" } })).resolves.toMatchObject({ scope: "CLIENT_READ" });
  });

  it("lists one's own tokens, the administrator's list has everyone's; another person's token is not found to revoke except by the administrator", async () => {
    const [a, b, admin] = await Promise.all([makeUser("QA_MANAGER"), makeUser("INTAKE_CLERK"), makeUser("LAB_ADMIN")]);
    const mine = await createApiToken({ actor: a, input: { name: unique("mine"), scope: "LAB_READ" } });
    const theirs = await createApiToken({ actor: b, input: { name: unique("theirs"), scope: "LAB_READ" } });
    expect((await listOwnApiTokens({ actor: a })).map((t) => t.id)).toEqual([mine.id]);
    const all = (await listAllApiTokens({ actor: admin })).map((t) => t.id);
    expect(all).toEqual(expect.arrayContaining([mine.id, theirs.id]));
    expect((await failure(listAllApiTokens({ actor: a }))).code).toBe("FORBIDDEN");
    expect((await failure(revokeApiToken({ actor: a, input: { tokenId: theirs.id } }))).code).toBe("NOT_FOUND");
    await revokeApiToken({ actor: a, input: { tokenId: mine.id } });
    await revokeApiToken({ actor: admin, input: { tokenId: theirs.id } });
    const rows = await db().apiToken.findMany({ where: { id: { in: [mine.id, theirs.id] } }, orderBy: { createdAt: "asc" } });
    expect(rows.map((r) => [r.revokedById, r.revokedAt !== null])).toEqual([[a.id, true], [admin.id, true]]);
  });
});
