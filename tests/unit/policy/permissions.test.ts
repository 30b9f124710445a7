import { describe, expect, it } from "vitest";
import { ACTIONS, can, describeRolesAllowedTo, ROLES, rolesAllowedTo } from "@/lib/policy/permissions";
import { navigationFor } from "@/lib/policy/navigation";
import { actionForPath, isPublicPath } from "@/lib/policy/routes";

describe("permission matrix", () => {
  it("keeps receipts and test data apart (DOMAIN.md: clerks cannot change test data, technicians cannot change receipts)", () => {
    expect(can("INTAKE_CLERK", "shipment.create")).toBe(true);
    expect(can("INTAKE_CLERK", "run.operate")).toBe(false);
    expect(can("TECHNICIAN", "run.operate")).toBe(true);
    expect(can("TECHNICIAN", "shipment.correct")).toBe(false);
    expect(can("TECHNICIAN", "shipment.create")).toBe(false);
  });

  it("lets only QA review and issue, and only the administrator manage people", () => {
    expect(rolesAllowedTo("run.review")).toEqual(["QA_MANAGER"]);
    expect(rolesAllowedTo("certificate.issue")).toEqual(["QA_MANAGER"]);
    expect(rolesAllowedTo("user.manage")).toEqual(["LAB_ADMIN"]);
  });

  it("gives a client user the portal and their own account, nothing of the lab's side", () => {
    const clientActions = ACTIONS.filter((a) => can("CLIENT_USER", a));
    expect(clientActions.sort()).toEqual(["account.self", "portal.view"]);
    for (const role of ROLES.filter((r) => r !== "CLIENT_USER")) expect(can(role, "portal.view")).toBe(false);
  });

  it("lets everyone change their own password", () => {
    for (const role of ROLES) expect(can(role, "account.self")).toBe(true);
  });

  it("names the roles an action needs in a sentence", () => {
    expect(describeRolesAllowedTo("user.manage")).toBe("Lab administrator");
    expect(describeRolesAllowedTo("specification.manage")).toBe("QA manager or Lab administrator");
    expect(describeRolesAllowedTo("sample.move")).toBe("Intake clerk or Technician");
  });
});

describe("navigation and page addresses", () => {
  it("shows each role only the places it may open", () => {
    for (const role of ROLES) for (const item of navigationFor(role)) expect(can(role, item.action)).toBe(true);
    expect(navigationFor("CLIENT_USER").map((i) => i.href)).toEqual(["/portal", "/portal/certificates", "/account"]);
    expect(navigationFor("TECHNICIAN").map((i) => i.href)).not.toContain("/admin/users");
  });

  it("leaves the lab's master data (clients, their portal users, the lab's own details) to the administrator", () => {
    expect(rolesAllowedTo("client.manage")).toEqual(["LAB_ADMIN"]);
    expect(rolesAllowedTo("lab.configure")).toEqual(["LAB_ADMIN"]);
    expect(navigationFor("LAB_ADMIN").map((i) => i.href)).toEqual(expect.arrayContaining(["/admin/clients", "/admin/lab"]));
    expect(navigationFor("QA_MANAGER").map((i) => i.href)).not.toContain("/admin/clients");
  });

  it("maps a page address to the action it needs, longest prefix first", () => {
    expect(actionForPath("/admin/users")).toBe("user.manage");
    expect(actionForPath("/admin/users/123")).toBe("user.manage");
    expect(actionForPath("/admin/audit")).toBe("audit.view");
    expect(actionForPath("/admin/clients/MWA")).toBe("client.manage");
    expect(actionForPath("/admin/lab")).toBe("lab.configure");
    expect(actionForPath("/runs/T26-00001")).toBe("run.view");
    expect(actionForPath("/runsheet")).toBeNull();
    // The staff start page needs the workspace; "/" names no other address.
    expect(actionForPath("/")).toBe("workspace.view");
    expect(actionForPath("/unknown-page")).toBeNull();
  });

  it("treats sign-in, health and verification as public, and nothing else", () => {
    expect(isPublicPath("/sign-in")).toBe(true);
    expect(isPublicPath("/api/health")).toBe(true);
    expect(isPublicPath("/verify/ABC")).toBe(true);
    expect(isPublicPath("/")).toBe(false);
    expect(isPublicPath("/sign-in-as-admin")).toBe(false);
  });
});
