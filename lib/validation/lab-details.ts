import { z } from "zod";
import { isTimeZone } from "../format/time-zone";
import { requiredText } from "./common";

/** The lab's own details as printed on its documents, and the time zone every time is shown in. */
export const labDetailsSchema = z.object({
  name: requiredText("the laboratory's name", 200),
  address: requiredText("the laboratory's address", 500),
  accreditation: z.string().trim().max(200, "Keep the accreditation to 200 characters.").optional().transform((v) => v || undefined),
  timeZone: z.string().trim().refine(isTimeZone, "Choose a time zone from the list (an IANA name such as Europe/Dublin)."),
});
export type LabDetailsInput = z.input<typeof labDetailsSchema>;
