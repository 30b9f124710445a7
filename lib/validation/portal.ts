import { z } from "zod";

/** A certificate PDF asked for by number and, optionally, revision (`?revision=2`); none means the latest. */
export const certificatePdfRequestSchema = z.object({
  number: z.string().trim().min(1, "Give the certificate number.").max(40).transform((n) => n.toUpperCase()),
  revision: z.preprocess(
    (v) => (v === "" || v === null ? undefined : v),
    z.coerce.number({ message: "The revision is a whole number such as 1 or 2." }).int("The revision is a whole number such as 1 or 2.").positive("The revision is a whole number such as 1 or 2.").optional(),
  ),
});
