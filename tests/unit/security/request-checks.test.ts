import { describe, expect, it } from "vitest";
import { actionBodyProblem } from "@/lib/security/action-body";
import { isCrossOriginWrite } from "@/lib/security/cross-origin-write";
import { baselineSecurityHeaders, newNonce, pageContentSecurityPolicy } from "@/lib/security/security-headers";
import { CLIENT_ADDRESS_HEADER } from "@/lib/server/auth/client-address";
import { MAX_READINGS_FILE_BYTES } from "@/lib/validation/readings";
import { READINGS_UPLOAD_LIMIT_BYTES, bodyProblem, clientAddress, CLIENT_ADDRESS_HEADER as FRONT_DOOR_HEADER, targetProblem } from "../../../scripts/app-server.mjs";

describe("the front door's checks (scripts/app-server.mjs)", () => {
  it("refuses malformed addresses: broken escapes, NUL and control characters, broken UTF-8, lone surrogates", () => {
    for (const target of ["/runs/%ZZ", "/runs/%", "/runs/a%00b", "/runs/%0A", "/runs/%C0%AF", "/runs/%ED%A0%80", "/search?q=%00", "/search?q=%E2%82", "/x\u0001y"]) expect(targetProblem(target), target).toMatch(/not well formed/);
    expect(targetProblem(`/${"x".repeat(9_000)}`)).toMatch(/too long/);
  });

  it("passes what the app's own links look like", () => {
    for (const target of ["/", "/runs/T26-00001", "/samples?state=STORED&page=2", "/search?q=R26-00001+x", `/verify/${encodeURIComponent("7Q4K-2M9X-HT3B")}`, `/x/${encodeURIComponent("💧 ü")}`]) expect(targetProblem(target), target).toBeNull();
  });

  it("answers a body over the limit 413, one of unknown length 411, and lets reads through", () => {
    const req = (method: string, headers: Record<string, string>) => ({ method, headers });
    expect(bodyProblem(req("POST", { "content-length": String(2 * 1024 * 1024) }))).toMatchObject({ status: 413, message: expect.stringMatching(/larger than 1 MB/) });
    expect(bodyProblem(req("POST", { "content-length": "10" }))).toBeNull();
    expect(bodyProblem(req("POST", { "transfer-encoding": "chunked" }))).toMatchObject({ status: 411 });
    expect(bodyProblem(req("POST", { "content-length": "-5" }))).toMatchObject({ status: 400 });
    expect(bodyProblem(req("GET", { "content-length": String(5 * 1024 * 1024) }))).toBeNull();
  });

  it("lets a data-logger upload hold as much as an import takes (32 MB), and refuses a 2 GB file with what to do", () => {
    const upload = (bytes: number, url = "/api/runs/T26-00004/readings/import?mode=preview&fileName=a.csv") => ({ method: "POST", url, headers: { "content-length": String(bytes) } });
    expect(READINGS_UPLOAD_LIMIT_BYTES).toBe(MAX_READINGS_FILE_BYTES);
    expect(bodyProblem(upload(10 * 1024 * 1024))).toBeNull();
    expect(bodyProblem(upload(2 * 1024 ** 3))).toMatchObject({ status: 413, message: "The data-logger file is larger than 32 MB, the most one import takes; split it by date and import each part in order. Nothing was saved." });
    // Only that route: the same size elsewhere is still refused at 1 MB.
    expect(bodyProblem(upload(10 * 1024 * 1024, "/api/runs/T26-00004/readings/importx"))).toMatchObject({ status: 413, message: expect.stringMatching(/larger than 1 MB/) });
  });

  it("takes the client's address from the socket unless a reverse proxy is trusted, and then from that proxy's entry", () => {
    const req = (peer: string, xff?: string) => ({ socket: { remoteAddress: peer }, headers: xff ? { "x-forwarded-for": xff } : {} });
    expect(clientAddress(req("::ffff:10.0.0.5", "1.2.3.4"), 0)).toBe("10.0.0.5");
    expect(clientAddress(req("10.0.0.1", "6.6.6.6, 203.0.113.7"), 1)).toBe("203.0.113.7");
    expect(clientAddress(req("10.0.0.1", "6.6.6.6, 203.0.113.7, 10.0.0.2"), 2)).toBe("203.0.113.7");
    expect(clientAddress(req("10.0.0.1"), 1)).toBe("10.0.0.1");
    expect(clientAddress(req("10.0.0.1", "<script>"), 1)).toBe("unknown");
  });

  it("passes the client address in the header the app reads", () => {
    expect(FRONT_DOOR_HEADER).toBe(CLIENT_ADDRESS_HEADER);
  });

  it("sends HSTS only when the public address is HTTPS", () => {
    expect(baselineSecurityHeaders(true)["Strict-Transport-Security"]).toMatch(/max-age=\d+/);
    expect(baselineSecurityHeaders(false)).not.toHaveProperty("Strict-Transport-Security");
  });
});

describe("the request proxy's checks (lib/security)", () => {
  it("gives pages a policy with no inline script but the request's own nonce, and no framing", () => {
    const nonce = newNonce();
    expect(nonce).toMatch(/^[A-Za-z0-9+/]{22}==$/);
    expect(newNonce()).not.toBe(nonce);
    const csp = pageContentSecurityPolicy(nonce, false);
    expect(csp).toContain(`script-src 'self' 'nonce-${nonce}' 'strict-dynamic'`);
    expect(csp).not.toMatch(/script-src[^;]*unsafe-inline/);
    expect(csp).toContain("frame-ancestors 'none'");
    expect(csp).toContain("object-src 'none'");
    expect(csp).not.toContain("upgrade-insecure-requests");
    expect(pageContentSecurityPolicy(nonce, true)).toContain("upgrade-insecure-requests");
  });

  it("refuses a change sent from another site's page, and lets same-site and non-browser requests through", () => {
    const hosts = ["lab.example:3000", null, "lab.example"];
    expect(isCrossOriginWrite({ method: "POST", origin: "http://evil.example", hosts })).toBe(true);
    expect(isCrossOriginWrite({ method: "POST", origin: "null", hosts })).toBe(true);
    expect(isCrossOriginWrite({ method: "POST", origin: "http://lab.example:3000", hosts })).toBe(false);
    expect(isCrossOriginWrite({ method: "POST", origin: "https://lab.example", hosts })).toBe(false);
    expect(isCrossOriginWrite({ method: "POST", origin: null, hosts })).toBe(false);
    expect(isCrossOriginWrite({ method: "GET", origin: "http://evil.example", hosts })).toBe(false);
  });

  it("reads a server action's body as React would, refusing what would make it fail", () => {
    expect(actionBodyProblem('[{"name":"Shelf 2"}]')).toBeNull();
    expect(actionBodyProblem('[{"at":"$D2026-03-14T09:30:00.000Z","price":"$$5","n":"$n12","u":"$undefined"}]')).toBeNull();
    for (const body of ["null", '"text"', "{", "[{", '[{"a":"$1"}]', '["$Q0"]', '["$"]', '["$n1x"]', `${"[".repeat(100)}${"]".repeat(100)}`]) expect(actionBodyProblem(body), body).not.toBeNull();
  });
});
