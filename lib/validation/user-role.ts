import { z } from "zod";
import { ROLES } from "../policy/permissions";
import { refineClientOrganization } from "./client-organization-rule";
import { versionSchema } from "./common";

/** A new role for a user; a client user belongs to exactly one organisation, staff to none. */
export const changeUserRoleSchema = z
  .object({
    userId: z.string().min(1),
    version: versionSchema,
    role: z.enum(ROLES, { message: "Choose a role." }),
    clientOrganizationId: z.string().trim().optional().transform((v) => v || undefined),
  })
  .superRefine(refineClientOrganization);
export type ChangeUserRoleInput = z.input<typeof changeUserRoleSchema>;
