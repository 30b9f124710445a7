import { afterEach, describe, expect, it } from "vitest";
import { getAuthOptions } from "@/lib/server/auth/auth-options";

describe("settings that follow the public address", () => {
  const saved = process.env.NEXTAUTH_URL;
  afterEach(() => {
    if (saved === undefined) delete process.env.NEXTAUTH_URL;
    else process.env.NEXTAUTH_URL = saved;
  });

  it("uses Secure session cookies when people reach the app over HTTPS, and plain ones otherwise", () => {
    process.env.NEXTAUTH_URL = "https://lab.example";
    expect(getAuthOptions().useSecureCookies).toBe(true);
    process.env.NEXTAUTH_URL = "http://localhost:3000";
    expect(getAuthOptions().useSecureCookies).toBe(false);
  });

  it("sends people only to addresses on the app itself after signing in or out", async () => {
    const redirect = getAuthOptions().callbacks!.redirect!;
    const baseUrl = "https://lab.example";
    expect(await redirect({ url: "https://lab.example/runs", baseUrl })).toBe("https://lab.example/runs");
    expect(await redirect({ url: "/\\evil.example/", baseUrl })).toBe("https://lab.example/");
    expect(await redirect({ url: "https://evil.example/", baseUrl })).toBe("https://lab.example/");
  });
});
