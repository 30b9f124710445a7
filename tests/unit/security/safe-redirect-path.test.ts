import { describe, expect, it } from "vitest";
import { safeRedirectPath, safeRedirectUrl } from "@/lib/security/safe-redirect-path";

describe("where to go after signing in", () => {
  it("keeps paths on the site, with their query and fragment", () => {
    expect(safeRedirectPath("/runs/T26-00001")).toBe("/runs/T26-00001");
    expect(safeRedirectPath("/samples?state=STORED#list")).toBe("/samples?state=STORED#list");
    expect(safeRedirectPath("runs")).toBe("/runs");
  });

  // The tricks below are the usual open-redirect forms (common practice in web security testing): a browser
  // resolves each of them to another host, so each must come back as "/".
  it("refuses every address a browser would resolve to another host", () => {
    for (const target of ["//evil.example/", "/\\evil.example/", "\\\\evil.example", "/\t/evil.example", "/\n/evil.example", "https://evil.example/x", "javascript:alert(1)", "//user@evil.example", "/%5Cevil.example/".replace("%5C", "\\")])
      expect(safeRedirectPath(target), target).toBe("/");
  });

  it("reads a same-scheme address without slashes as a path, as browsers do", () => {
    expect(safeRedirectPath("http:evil.example")).toBe("/evil.example");
  });

  it("refuses what is not a string, and takes the first of several", () => {
    expect(safeRedirectPath(undefined)).toBe("/");
    expect(safeRedirectPath(42)).toBe("/");
    expect(safeRedirectPath(["/runs", "//evil.example"])).toBe("/runs");
    expect(safeRedirectPath("/".padEnd(3000, "a"))).toBe("/");
  });

  it("keeps next-auth's full addresses on the app's own origin", () => {
    expect(safeRedirectUrl("http://localhost:3000/runs", "http://localhost:3000")).toBe("http://localhost:3000/runs");
    expect(safeRedirectUrl("/intake", "http://localhost:3000")).toBe("http://localhost:3000/intake");
    expect(safeRedirectUrl("https://evil.example/", "http://localhost:3000")).toBe("http://localhost:3000/");
    expect(safeRedirectUrl("http://localhost:3000.evil.example/", "http://localhost:3000")).toBe("http://localhost:3000/");
  });
});
