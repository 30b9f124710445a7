import { describe, expect, it } from "vitest";
import { FILTER_CHOICES_SHOWN, findFilterChoices, readFilterSelection } from "@/lib/server/lists/list-filter-options";
import { makeOrganization, makeProject, makeUser } from "../support/factories";

describe("the lists' searchable client and project fields", () => {
  it("finds clients and projects by part of the name or the start of the code, a client's projects only when asked, at most a screenful", async () => {
    const tech = await makeUser("TECHNICIAN");
    const org = await makeOrganization();
    const [a, b] = [await makeProject(org.id), await makeProject(org.id)];
    const other = await makeProject();

    const byCode = await findFilterChoices({ actor: tech, kind: "projects", q: a.code.toLowerCase() });
    expect(byCode).toEqual([{ id: a.id, label: `${a.code} · ${a.name}` }]);
    const ofClient = await findFilterChoices({ actor: tech, kind: "projects", q: "project", clientOrganizationId: org.id });
    expect(ofClient.map((p) => p.id).sort()).toEqual([a.id, b.id].sort());
    expect(ofClient.map((p) => p.id)).not.toContain(other.id);
    expect(await findFilterChoices({ actor: tech, kind: "clients", q: org.name.slice(-6) })).toEqual([{ id: org.id, label: org.name }]);
    expect((await findFilterChoices({ actor: tech, kind: "projects", q: "" })).length).toBeLessThanOrEqual(FILTER_CHOICES_SHOWN);

    expect(await readFilterSelection({ actor: tech, clientOrganizationId: org.id, projectId: b.id })).toEqual({ client: { id: org.id, label: org.name }, project: { id: b.id, label: `${b.code} · ${b.name}` } });
    expect(await readFilterSelection({ actor: tech })).toEqual({ client: null, project: null });
  });

  it("is refused to a client user, who has no staff lists", async () => {
    const client = await makeUser("CLIENT_USER");
    await expect(findFilterChoices({ actor: client, kind: "clients", q: "" })).rejects.toMatchObject({ code: "FORBIDDEN" });
  });
});
