import type { z } from "zod";

/** A client user belongs to exactly one organisation, staff to none: the rule of every form that sets a role. */
export function refineClientOrganization(value: { role: string; clientOrganizationId?: string }, ctx: z.RefinementCtx): void {
  if (value.role === "CLIENT_USER" && !value.clientOrganizationId)
    ctx.addIssue({ code: "custom", path: ["clientOrganizationId"], message: "A client user needs their organisation." });
  if (value.role !== "CLIENT_USER" && value.clientOrganizationId)
    ctx.addIssue({ code: "custom", path: ["clientOrganizationId"], message: "Only client users belong to an organisation." });
}
