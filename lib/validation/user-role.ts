import { z } from "zod";
import { ROLES } from "../policy/permissions";
import { versionSchema } from "./common";

/** A new role for a user; a client user belongs to exactly one organisation, staff to none. */
export const changeUserRoleSchema = z
  .object({
    userId: z.string().min(1),
    version: versionSchema,
    role: z.enum(ROLES, { message: "Choose a role." }),
    clientOrganizationId: z.string().trim().optional().transform((v) => v || undefined),
  })
  .superRefine((v, ctx) => {
    if (v.role === "CLIENT_USER" && !v.clientOrganizationId)
      ctx.addIssue({ code: "custom", path: ["clientOrganizationId"], message: "A client user needs their organisation." });
    if (v.role !== "CLIENT_USER" && v.clientOrganizationId)
      ctx.addIssue({ code: "custom", path: ["clientOrganizationId"], message: "Only client users belong to an organisation." });
  });
export type ChangeUserRoleInput = z.input<typeof changeUserRoleSchema>;
