import { z } from "zod";
import { enteredPressureToPa } from "../units/pressure-entry";
import { optionalMeasured, reasonSchema, requiredText, versionSchema } from "./common";
import { MAX_RATED_PRESSURE_PA } from "./equipment";

/**
 * Changing an instrument's register entry after registration: name, serial number, rated maximum. Its
 * asset tag and kind stay (they are on labels and run records). Every change carries its reason.
 */
export const editEquipmentSchema = z
  .object({
    equipmentId: z.string().min(1),
    version: versionSchema,
    name: requiredText("a name", 120),
    serialNumber: z.string().trim().max(80, "Keep the serial number to 80 characters.").optional().transform((v) => v || undefined),
    ratedMaxPressure: optionalMeasured("the rated maximum pressure", { positive: true }),
    pressureUnit: z.enum(["KPA", "PSI"], { message: "Choose kPa or psi." }),
    reason: reasonSchema,
  })
  .superRefine((v, ctx) => {
    if (v.ratedMaxPressure !== undefined && enteredPressureToPa(v.ratedMaxPressure, v.pressureUnit) > MAX_RATED_PRESSURE_PA)
      ctx.addIssue({ code: "custom", path: ["ratedMaxPressure"], message: `The rated maximum must be at most ${v.pressureUnit === "PSI" ? "1450 psi" : "10 000 kPa"}; check the unit.` });
  });
export type EditEquipmentInput = z.input<typeof editEquipmentSchema>;
