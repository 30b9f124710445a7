import { describe, expect, it } from "vitest";
import { verifyCredentials } from "@/lib/server/auth/verify-credentials";
import { addClientContact } from "@/lib/server/clients/add-client-contact";
import { createClientOrganization } from "@/lib/server/clients/create-client-organization";
import { createProject } from "@/lib/server/clients/create-project";
import { getClientOrganization } from "@/lib/server/clients/get-client-organization";
import { updateClientContact } from "@/lib/server/clients/update-client-contact";
import { updateClientOrganization } from "@/lib/server/clients/update-client-organization";
import { updateProject } from "@/lib/server/clients/update-project";
import { getIntakeOptions } from "@/lib/server/intake/get-intake-options";
import { getPortalProject } from "@/lib/server/portal/get-portal-project";
import { createProjectSpecification } from "@/lib/server/specifications/create-project-specification";
import { failure } from "../support/refusals";
import { db, makeUser, unique } from "../support/factories";

const code = () => unique("C").toUpperCase().replace(/[^A-Z0-9]/g, "").slice(0, 10);

describe("client organisations, contacts, portal users and projects", () => {
  it("creates a client with a project (its specification copied from a template) and a contact who signs in to an empty portal", async () => {
    const admin = await makeUser("LAB_ADMIN");
    const qa = await makeUser("QA_MANAGER");
    const clientCode = code();
    const org = await createClientOrganization({ actor: admin, input: { code: clientCode.toLowerCase(), name: "Harrowgate Drainage Board (invented)", address: "1 Sluice Road" } });
    expect(org.code).toBe(clientCode);
    expect((await failure(createClientOrganization({ actor: admin, input: { code: clientCode, name: "Someone else" } }))).fieldErrors.code).toMatch(/never reused/);
    expect((await failure(createClientOrganization({ actor: qa, input: { code: code(), name: "Not allowed" } }))).code).toBe("FORBIDDEN");

    const template = await db().specification.create({ data: { name: unique("Template"), isTemplate: true, limits: { create: [{ property: "INDEX_FLUX", limitText: "1e-8", unit: "m3/m2/s", direction: "MAXIMUM", significantDigits: 1 }] } } });
    const projectCode = `${clientCode}-P1`;
    const project = await createProject({ actor: admin, input: { clientOrganizationId: org.id, code: projectCode, name: "Outfall lagoon lining", siteName: "Harrowgate outfall", specificationTemplateId: template.id } });
    const spec = await db().specification.findFirstOrThrow({ where: { projectId: project.id }, include: { limits: true } });
    expect(spec.limits.map((l) => [l.property, l.limitText])).toEqual([["INDEX_FLUX", "1e-8"]]);

    const email = `${unique("portal")}@example.test`;
    const contact = await addClientContact({ actor: admin, input: { clientOrganizationId: org.id, name: "Ines Wrackham", email, jobTitle: "Drainage engineer", portalAccess: true, password: "a first portal password" } });
    const user = await verifyCredentials({ email, password: "a first portal password" });
    expect(user).toMatchObject({ role: "CLIENT_USER", id: contact.userId });
    expect((await db().user.findUniqueOrThrow({ where: { id: contact.userId! } })).clientOrganizationId).toBe(org.id);
    const portalUser = { id: user!.id, name: user!.name, email, role: "CLIENT_USER" as const, clientOrganizationId: org.id, pressureUnit: "KPA" as const };
    const seen = await getPortalProject({ actor: portalUser, projectCode });
    expect(seen).toMatchObject({ code: projectCode, rolls: [], shipments: [] });

    const page = await getClientOrganization({ actor: admin, code: clientCode });
    expect(page.contacts.map((c) => [c.email, !!c.user])).toEqual([[email, true]]);
    expect(page.projects.map((p) => [p.code, p.specifications[0]?._count.limits])).toEqual([[projectCode, 1]]);
  });

  it("refuses a contact without an e-mail address and a project without a client, saving nothing", async () => {
    const admin = await makeUser("LAB_ADMIN");
    const org = await createClientOrganization({ actor: admin, input: { code: code(), name: "Pellow Sands Quarry (invented)" } });
    const noEmail = await failure(addClientContact({ actor: admin, input: { clientOrganizationId: org.id, name: "Nobody Reachable", email: "" } }));
    expect(noEmail.code).toBe("INVALID_INPUT");
    expect(noEmail.fieldErrors.email).toBe("A contact needs an e-mail address: the lab writes to its contacts.");
    const missing = await failure(addClientContact({ actor: admin, input: { clientOrganizationId: org.id, name: "Nobody Reachable" } }));
    expect(missing.fieldErrors.email).toBe("A contact needs an e-mail address: the lab writes to its contacts.");
    expect(await db().clientContact.count({ where: { clientOrganizationId: org.id } })).toBe(0);
    await expect(db().clientContact.create({ data: { clientOrganizationId: org.id, name: "Bypass", email: " " } })).rejects.toThrow(/client_contact_has_email/);

    const projectCode = `${code()}-X`;
    const noClient = await failure(createProject({ actor: admin, input: { code: projectCode, name: "Orphan works", siteName: "Nowhere" } }));
    expect(noClient.fieldErrors.clientOrganizationId).toBe("A project needs a client: choose the client organisation.");
    const unknownClient = await failure(createProject({ actor: admin, input: { clientOrganizationId: "no-such-client", code: projectCode, name: "Orphan works", siteName: "Nowhere" } }));
    expect(unknownClient.message).toBe("A project needs a client: choose the client organisation.");
    expect(await db().project.count({ where: { code: projectCode } })).toBe(0);
    const noPassword = await failure(addClientContact({ actor: admin, input: { clientOrganizationId: org.id, name: "Will Signin", email: `${unique("w")}@example.test`, portalAccess: true } }));
    expect(noPassword.fieldErrors.password).toMatch(/^A portal account needs a first password/);
  });

  it("deactivates instead of deleting: a project leaves intake, a contact's portal account and a client's accounts stop signing in", async () => {
    const admin = await makeUser("LAB_ADMIN");
    const clerk = await makeUser("INTAKE_CLERK");
    const org = await createClientOrganization({ actor: admin, input: { code: code(), name: "Tollmere Water (invented)" } });
    const project = await createProject({ actor: admin, input: { clientOrganizationId: org.id, code: `${code()}-A`, name: "Reservoir apron", siteName: "Tollmere" } });
    const offered = () => getIntakeOptions({ actor: clerk }).then((o) => o.clients.find((c) => c.id === org.id)?.projects.map((p) => p.id) ?? null);
    expect(await offered()).toEqual([project.id]);
    await updateProject({ actor: admin, input: { projectId: project.id, version: 1, name: "Reservoir apron", siteName: "Tollmere", active: false } });
    expect(await offered()).toEqual([]);
    expect(await db().project.count({ where: { id: project.id } })).toBe(1);

    const emailA = `${unique("a")}@example.test`;
    const emailB = `${unique("b")}@example.test`;
    const a = await addClientContact({ actor: admin, input: { clientOrganizationId: org.id, name: "Ada Portal", email: emailA, portalAccess: true, password: "portal password one" } });
    await addClientContact({ actor: admin, input: { clientOrganizationId: org.id, name: "Bea Portal", email: emailB, portalAccess: true, password: "portal password two" } });
    const newEmail = `${unique("a2")}@example.test`;
    await updateClientContact({ actor: admin, input: { contactId: a.id, version: 1, name: "Ada Portal-Smith", email: newEmail, active: true } });
    expect(await verifyCredentials({ email: newEmail, password: "portal password one" })).toMatchObject({ name: "Ada Portal-Smith" });
    await updateClientContact({ actor: admin, input: { contactId: a.id, version: 2, name: "Ada Portal-Smith", email: newEmail, active: false } });
    expect(await verifyCredentials({ email: newEmail, password: "portal password one" })).toBeNull();

    await updateClientOrganization({ actor: admin, input: { clientOrganizationId: org.id, version: 1, name: "Tollmere Water (invented)", active: false } });
    expect(await verifyCredentials({ email: emailB, password: "portal password two" })).toBeNull();
    expect(await offered()).toBeNull();
    expect((await failure(createProject({ actor: admin, input: { clientOrganizationId: org.id, code: `${code()}-B`, name: "Late", siteName: "Tollmere" } }))).fieldErrors.clientOrganizationId).toBe("This client is deactivated.");
    // A specification for the deactivated project stays possible: it is the project's record, not new work.
    expect(await createProjectSpecification({ actor: admin, input: { projectId: project.id, name: "Revised limits" } })).toMatchObject({ projectId: project.id });
  });
});
