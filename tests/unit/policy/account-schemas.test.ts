import { describe, expect, it } from "vitest";
import { changeOwnPasswordSchema, createUserSchema } from "@/lib/validation/account";

describe("account schemas shared by forms and server", () => {
  const base = { name: "Ida Test", email: " IDA@Example.org ", role: "TECHNICIAN", password: "long enough password" };

  it("normalises the e-mail and accepts a staff member without an organisation", () => {
    const parsed = createUserSchema.parse(base);
    expect(parsed.email).toBe("ida@example.org");
    expect(parsed.clientOrganizationId).toBeUndefined();
  });

  it("requires an organisation for a client user and refuses one for staff", () => {
    const client = createUserSchema.safeParse({ ...base, role: "CLIENT_USER" });
    expect(client.success).toBe(false);
    expect(client.error?.issues[0]?.path).toEqual(["clientOrganizationId"]);
    const staff = createUserSchema.safeParse({ ...base, clientOrganizationId: "org-1" });
    expect(staff.success).toBe(false);
  });

  it("refuses short passwords and unknown roles with a message per field", () => {
    const result = createUserSchema.safeParse({ ...base, password: "short", role: "BOSS" });
    expect(result.success).toBe(false);
    const paths = result.error?.issues.map((i) => i.path.join("."));
    expect(paths).toContain("password");
    expect(paths).toContain("role");
  });

  it("requires the new password twice, different from the present one", () => {
    expect(changeOwnPasswordSchema.safeParse({ currentPassword: "a", newPassword: "abcdefghijkl", confirmPassword: "abcdefghijkX" }).success).toBe(false);
    expect(changeOwnPasswordSchema.safeParse({ currentPassword: "abcdefghijkl", newPassword: "abcdefghijkl", confirmPassword: "abcdefghijkl" }).success).toBe(false);
    expect(changeOwnPasswordSchema.safeParse({ currentPassword: "old one", newPassword: "abcdefghijkl", confirmPassword: "abcdefghijkl" }).success).toBe(true);
  });
});
