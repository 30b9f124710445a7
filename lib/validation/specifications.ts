import { z } from "zod";
import { PROPERTY_UNITS, TEST_PROPERTIES, TEST_PROPERTY_LABELS } from "../results/property-units";
import { requiredText } from "./common";

// Mirror the LimitDirection and ConformanceMethod enums of prisma/schema.prisma (lib/ may not import Prisma).
export const LIMIT_DIRECTIONS = ["MAXIMUM", "MINIMUM"] as const;
export type LimitDirection = (typeof LIMIT_DIRECTIONS)[number];
export const LIMIT_DIRECTION_LABELS: Record<LimitDirection, string> = { MAXIMUM: "Maximum (at most)", MINIMUM: "Minimum (at least)" };
export const CONFORMANCE_METHODS = ["ROUNDING", "ABSOLUTE"] as const;
export type ConformanceMethodName = (typeof CONFORMANCE_METHODS)[number];
export const CONFORMANCE_METHOD_LABELS: Record<ConformanceMethodName, string> = { ROUNDING: "Rounding (ASTM E29)", ABSOLUTE: "Absolute" };

/** A form's empty text or select as "not given". */
const blankToUndefined = (v: unknown) => (v === "" || v === null ? undefined : v);
const optionalId = z.preprocess(blankToUndefined, z.string().min(1).optional());

// The grammar lib/hydraulics/conformance.ts reads a limit with: digits, an optional fraction, an optional exponent.
const LIMIT_TEXT_RE = /^(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;

/**
 * How many significant digits a limit is written to: from the first non-zero digit to the last digit
 * written ("1e-8" 1, "24" 2, "3.66" 3, "5.0e-11" 2, "0.050" 2). Trailing zeros of a whole number count
 * ("100" 3), since ASTM E29 rounding then goes to the units place; write "1e2" for one digit.
 */
export function significantDigitsOf(limitText: string): number {
  const mantissa = limitText.trim().split(/[eE]/)[0] ?? "";
  return mantissa.replace(".", "").replace(/^0+/, "").length;
}

/** The limit as the specification writes it: kept as text, because its last place decides E29 rounding. */
export const limitTextSchema = z
  .string({ message: "Enter the limit." })
  .trim()
  .min(1, "Enter the limit.")
  .max(30, "Keep the limit to 30 characters.")
  .regex(LIMIT_TEXT_RE, "Write the limit as a plain number, e.g. 5e-11, 1e-8, 24 or 3.66 (no units, no spaces).")
  .refine((t) => Number(t) > 0 && Number.isFinite(Number(t)), "The limit must be a number above 0.");

/** A new project specification: empty with a name, or a copy of a lab template's limits. */
export const createProjectSpecificationSchema = z.object({
  projectId: z.string({ message: "Choose the project." }).min(1, "Choose the project."),
  name: requiredText("a name for the specification", 120),
  /** The specification's own revision or issue as its document states it; printed on certificates. */
  revision: z.string().trim().max(60, "Keep the revision to 60 characters.").default(""),
  templateId: optionalId,
});
export type CreateProjectSpecificationInput = z.input<typeof createProjectSpecificationSchema>;

/**
 * Adding a limit (no limitId) or changing one (limitId). The unit must be one of the property's units;
 * significant digits default to those of the limit as written, and a different number is refused so the
 * record never says one thing while the rounding does another.
 */
export const setSpecificationLimitSchema = z
  .object({
    specificationId: z.string().min(1),
    limitId: optionalId,
    property: z.enum(TEST_PROPERTIES, { message: "Choose the property." }),
    limitText: limitTextSchema,
    unit: z.string({ message: "Choose the unit." }).trim().min(1, "Choose the unit."),
    direction: z.enum(LIMIT_DIRECTIONS, { message: "Choose maximum or minimum." }),
    significantDigits: z.preprocess(
      blankToUndefined,
      z.coerce.number({ message: "Enter the significant digits as a whole number from 1 to 6." }).int("Enter a whole number from 1 to 6.").min(1, "At least 1 significant digit.").max(6, "At most 6 significant digits.").optional(),
    ),
    conformanceMethod: z.enum(CONFORMANCE_METHODS, { message: "Choose rounding or absolute." }).default("ROUNDING"),
    testMethodCode: z.preprocess(
      blankToUndefined,
      z.string().trim().max(40, "Keep the method code to 40 characters.").regex(/^[A-Za-z0-9 .\-/]+$/, "Use letters, digits, spaces, dots, dashes or slashes, e.g. D5887.").optional(),
    ),
    // Sampling frequency: one test per so many m² delivered (blank: no area rule), and/or one per lot.
    testingFrequencyAreaM2: z.preprocess(
      (v) => (typeof v === "string" ? (v.trim() === "" ? undefined : v.trim().replace(",", ".")) : v === null ? undefined : v),
      z.coerce.number({ message: "Enter the testing frequency as square metres per test, e.g. 4000." })
        .refine(Number.isFinite, "Enter the testing frequency as square metres per test, e.g. 4000.")
        .refine((v) => v > 0, "The testing frequency must be more than 0 m² per test; leave it blank when the specification sets none.")
        .refine((v) => v <= 10_000_000, "The testing frequency must be at most 10,000,000 m² per test.")
        .optional(),
    ),
    testingFrequencyPerLot: z.preprocess((v) => v === true || v === "true" || v === "on", z.boolean()).default(false),
  })
  .superRefine((v, ctx) => {
    if (!PROPERTY_UNITS[v.property].includes(v.unit))
      ctx.addIssue({ code: "custom", path: ["unit"], message: `${TEST_PROPERTY_LABELS[v.property]} is stated in ${PROPERTY_UNITS[v.property].join(" or ")}.` });
    const written = significantDigitsOf(v.limitText);
    if (v.significantDigits !== undefined && v.significantDigits >= 1 && v.significantDigits <= 6 && v.significantDigits !== written)
      ctx.addIssue({ code: "custom", path: ["significantDigits"], message: `${v.limitText} is written to ${written} significant digit${written === 1 ? "" : "s"}; write the limit with the digits the specification states (e.g. 5.0e-11 for 2).` });
  })
  .transform((v) => ({ ...v, significantDigits: significantDigitsOf(v.limitText) }));
export type SetSpecificationLimitInput = z.input<typeof setSpecificationLimitSchema>;
export type SetSpecificationLimitValues = z.output<typeof setSpecificationLimitSchema>;
