import { z } from "zod";
import { emailSchema, newPasswordSchema } from "./account";
import { requiredText, versionSchema } from "./common";

/** Optional text: blank becomes absent, so "" and nothing are stored alike (null). */
const optionalText = (label: string, max: number) =>
  z.string().trim().max(max, `Keep ${label} to ${max} characters.`).optional().transform((v) => v || undefined);

/** Short codes the lab writes on paperwork: capital letters, digits and single dashes. */
const codeSchema = (what: string, max: number) =>
  z
    .string({ message: `Enter the ${what} code.` })
    .trim()
    .toUpperCase()
    .min(2, `Enter the ${what} code (at least 2 characters).`)
    .max(max, `Keep the ${what} code to ${max} characters.`)
    .regex(/^[A-Z0-9]+(-[A-Z0-9]+)*$/, "Use capital letters, digits and single dashes, e.g. MWA or MWA-C4.")
    // "new" is the address of the form that creates one.
    .refine((code) => code !== "NEW", "NEW is reserved; choose another code.");

/** A client organisation: who the lab works for. */
export const clientOrganizationSchema = z.object({
  code: codeSchema("client", 12),
  name: requiredText("the organisation's name", 200),
  address: optionalText("the address", 500),
});
export type ClientOrganizationInput = z.input<typeof clientOrganizationSchema>;

/** Changing an organisation's details (its code stays: it is on issued paperwork), or deactivating it. */
export const updateClientOrganizationSchema = clientOrganizationSchema.omit({ code: true }).extend({
  clientOrganizationId: z.string().min(1),
  version: versionSchema,
  active: z.boolean(),
});
export type UpdateClientOrganizationInput = z.input<typeof updateClientOrganizationSchema>;

/** The e-mail a contact must have: the lab writes to its contacts, and a portal user signs in with it. */
const contactEmailSchema = z.preprocess((v) => (v === undefined || v === null ? "" : v), z.string().trim().min(1, "A contact needs an e-mail address: the lab writes to its contacts.").pipe(emailSchema));

/**
 * A contact person at a client. With `portalAccess` the contact also becomes the client user who signs in
 * to the portal with this e-mail and the first password given here.
 */
export const clientContactSchema = z
  .object({
    clientOrganizationId: z.string().min(1, "Choose the client."),
    name: requiredText("the contact's name", 120),
    email: contactEmailSchema,
    phone: optionalText("the phone number", 40),
    jobTitle: optionalText("the job title", 120),
    portalAccess: z.boolean().default(false),
    password: z.string().optional(),
  })
  .superRefine((v, ctx) => {
    if (!v.portalAccess) return;
    const checked = newPasswordSchema.safeParse(v.password ?? "");
    if (!checked.success) ctx.addIssue({ code: "custom", path: ["password"], message: `A portal account needs a first password. ${checked.error.issues[0]?.message ?? ""}`.trim() });
  });
export type ClientContactInput = z.input<typeof clientContactSchema>;

/** Changing a contact's details, or deactivating the contact (and with it their portal account). */
export const updateClientContactSchema = z.object({
  contactId: z.string().min(1),
  version: versionSchema,
  name: requiredText("the contact's name", 120),
  email: contactEmailSchema,
  phone: optionalText("the phone number", 40),
  jobTitle: optionalText("the job title", 120),
  active: z.boolean(),
});
export type UpdateClientContactInput = z.input<typeof updateClientContactSchema>;

/** A project (and its site) of a client, optionally starting from a specification template. */
export const projectSchema = z.object({
  clientOrganizationId: z.string({ message: "A project needs a client: choose the client organisation." }).trim().min(1, "A project needs a client: choose the client organisation."),
  code: codeSchema("project", 20),
  name: requiredText("the project's name", 200),
  siteName: requiredText("the site's name", 200),
  siteLocation: optionalText("the site's location", 300),
  specificationTemplateId: z.string().trim().optional().transform((v) => v || undefined),
});
export type ProjectInput = z.input<typeof projectSchema>;

/** Changing a project's name or site (its code and client stay: they are on issued paperwork), or deactivating it. */
export const updateProjectSchema = projectSchema.omit({ clientOrganizationId: true, code: true, specificationTemplateId: true }).extend({
  projectId: z.string().min(1),
  version: versionSchema,
  active: z.boolean(),
});
export type UpdateProjectInput = z.input<typeof updateProjectSchema>;
