import { z } from "zod";
import { UNIT_SYSTEMS } from "../format/result-numbers";
import { ROLES } from "../policy/permissions";
import { refineClientOrganization } from "./client-organization-rule";

// Shared by the forms (react-hook-form + zodResolver) and the server operations.

export const emailSchema = z.string().trim().toLowerCase().email("Enter an e-mail address such as name@example.org.");

/** Lab rule: long rather than complex. */
export const newPasswordSchema = z
  .string()
  .min(12, "Use at least 12 characters.")
  .max(200, "Use at most 200 characters.");

export const signInSchema = z.object({
  email: emailSchema,
  password: z.string().min(1, "Enter your password.").max(200),
});
export type SignInInput = z.infer<typeof signInSchema>;

export const createUserSchema = z
  .object({
    name: z.string().trim().min(2, "Enter the person's full name.").max(120),
    email: emailSchema,
    role: z.enum(ROLES, { message: "Choose a role." }),
    clientOrganizationId: z.string().trim().optional().transform((v) => (v ? v : undefined)),
    password: newPasswordSchema,
  })
  .superRefine(refineClientOrganization);
export type CreateUserInput = z.input<typeof createUserSchema>;

export const resetPasswordSchema = z.object({
  userId: z.string().min(1),
  password: newPasswordSchema,
});
export type ResetPasswordInput = z.infer<typeof resetPasswordSchema>;

export const setUserActiveSchema = z.object({
  userId: z.string().min(1),
  active: z.boolean(),
  version: z.number().int().positive(),
});

export const changeOwnPasswordSchema = z
  .object({
    currentPassword: z.string().min(1, "Enter your present password."),
    newPassword: newPasswordSchema,
    confirmPassword: z.string(),
  })
  .refine((v) => v.newPassword === v.confirmPassword, { path: ["confirmPassword"], message: "The two new passwords differ." })
  .refine((v) => v.newPassword !== v.currentPassword, { path: ["newPassword"], message: "Choose a password you have not been using." });
export type ChangeOwnPasswordInput = z.infer<typeof changeOwnPasswordSchema>;

/** The units a person's screens show results in (My account). */
export const resultUnitsSchema = z.object({
  resultUnits: z.enum(UNIT_SYSTEMS, { message: "Choose SI or centimetre units." }),
});
export type ResultUnitsInput = z.infer<typeof resultUnitsSchema>;
