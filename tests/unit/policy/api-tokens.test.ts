import { describe, expect, it } from "vitest";
import { mayHoldScope, mayRevokeToken, scopesForRole, tokenMay, tokenUsable } from "@/lib/policy/api-tokens";

describe("API token policy", () => {
  it("offers each role the scopes of its work: clients read their own, staff read the lab, technicians and administrators install loggers", () => {
    expect(scopesForRole("CLIENT_USER")).toEqual(["CLIENT_READ"]);
    expect(scopesForRole("TECHNICIAN")).toEqual(["LAB_READ", "READINGS_POST"]);
    expect(scopesForRole("LAB_ADMIN")).toEqual(["LAB_READ", "READINGS_POST"]);
    expect(scopesForRole("QA_MANAGER")).toEqual(["LAB_READ"]);
    expect(scopesForRole("INTAKE_CLERK")).toEqual(["LAB_READ"]);
  });

  it("lets a token do only what its scope says, and nothing once its owner's role no longer allows the scope", () => {
    expect(tokenMay({ scope: "READINGS_POST", ownerRole: "TECHNICIAN" }, "post-readings")).toBe(true);
    expect(tokenMay({ scope: "READINGS_POST", ownerRole: "TECHNICIAN" }, "read")).toBe(false);
    expect(tokenMay({ scope: "LAB_READ", ownerRole: "QA_MANAGER" }, "post-readings")).toBe(false);
    expect(tokenMay({ scope: "CLIENT_READ", ownerRole: "CLIENT_USER" }, "read")).toBe(true);
    // A technician moved to QA keeps no data-logger rights; a client's token never reads the lab.
    expect(tokenMay({ scope: "READINGS_POST", ownerRole: "QA_MANAGER" }, "post-readings")).toBe(false);
    expect(mayHoldScope("CLIENT_USER", "LAB_READ")).toBe(false);
  });

  it("refuses revoked and expired tokens, and lets the owner or the administrator revoke", () => {
    const now = new Date("2026-12-02T12:00:00Z");
    expect(tokenUsable({ revokedAt: null, expiresAt: new Date("2026-12-03T00:00:00Z") }, now)).toEqual({ ok: true });
    expect(tokenUsable({ revokedAt: null, expiresAt: now }, now).ok).toBe(false);
    expect(tokenUsable({ revokedAt: null, expiresAt: null }, now).ok).toBe(false);
    expect(tokenUsable({ revokedAt: now, expiresAt: new Date("2027-01-01T00:00:00Z") }, now)).toMatchObject({ ok: false, reason: expect.stringMatching(/revoked/) });
    expect(mayRevokeToken({ id: "a", role: "TECHNICIAN" }, "a")).toBe(true);
    expect(mayRevokeToken({ id: "a", role: "TECHNICIAN" }, "b")).toBe(false);
    expect(mayRevokeToken({ id: "a", role: "LAB_ADMIN" }, "b")).toBe(true);
  });
});
