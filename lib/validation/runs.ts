import { z } from "zod";
import { measured, optionalMeasured, pastDateTime, reasonSchema, versionSchema } from "./common";

export const pressureUnitSchema = z.enum(["KPA", "PSI"]);

/** A pressure typed in the person's unit; the server turns it into pascals. */
const pressure = (label: string) => measured(label, { min: 0, max: 5000 });

export const assignSpecimenSchema = z
  .object({
    specimenId: z.string().min(1, "Choose a specimen."),
    cellId: z.string().min(1, "Choose a free cell."),
    burettePanelId: z.string().min(1, "Choose the burette panel."),
    transducerId: z.string().min(1, "Choose the pressure transducer."),
    thermometerId: z.string().optional().transform((v) => v || undefined),
    thicknessGaugeId: z.string().optional().transform((v) => v || undefined),
    timerId: z.string().optional().transform((v) => v || undefined),
    methodCode: z.enum(["D5887", "D5084", "D6766"], { message: "Choose the test method." }),
    // When the specimen actually went into the cell, not when the form was sent.
    mountedAt: pastDateTime("when the specimen was mounted"),
    pressureUnit: pressureUnitSchema,
    effectiveStress: optionalMeasured("the effective stress", { min: 0, max: 5000 }),
    permeantName: z.string().trim().max(200).optional(),
    permeantSalt: z.string().trim().max(100).optional(),
    permeantMolarityMolPerL: optionalMeasured("the molarity (mol/L)", { min: 0, max: 10 }),
    permeantEcMsPerM: optionalMeasured("the permeant EC (mS/m)", { min: 0, max: 100_000 }),
    permeantPh: optionalMeasured("the permeant pH", { min: 0, max: 14 }),
  })
  .superRefine((v, ctx) => {
    if (v.methodCode === "D6766" && !v.permeantName)
      ctx.addIssue({ code: "custom", path: ["permeantName"], message: "ASTM D6766 needs the permeant: name the solution or leachate." });
  });
export type AssignSpecimenInput = z.input<typeof assignSpecimenSchema>;

export const recordStageSchema = z.object({
  runId: z.string().min(1),
  version: versionSchema,
  kind: z.enum(["SATURATION", "BACK_PRESSURE", "EQUILIBRATION", "PERMEATION"], { message: "Choose the stage." }),
  pressureUnit: pressureUnitSchema,
  cellPressure: pressure("the cell pressure"),
  influentPressure: pressure("the influent pressure"),
  effluentPressure: pressure("the effluent pressure"),
  startedAt: pastDateTime("when the stage started"),
  acknowledgeMargin: z.preprocess((v) => v === true || v === "true" || v === "on", z.boolean()).default(false),
});
export type RecordStageInput = z.input<typeof recordStageSchema>;

export const terminateRunSchema = z
  .object({
    runId: z.string().min(1),
    version: versionSchema,
    kind: z.enum(["CRITERIA_MET", "EARLY_END"]),
    reason: z.string().trim().max(500).optional(),
    // When permeation actually stopped (the certificate's end of testing), not when the form was sent;
    // absent, the moment it is sent.
    endedAt: z.preprocess((v) => (v === "" || v === null ? undefined : v), pastDateTime("when permeation ended").optional()),
  })
  .superRefine((v, ctx) => {
    if (v.kind === "EARLY_END" && (!v.reason || v.reason.length < 5))
      ctx.addIssue({ code: "custom", path: ["reason"], message: "An early end needs its reason (at least 5 characters)." });
  });

export const postTestSchema = z.object({
  runId: z.string().min(1),
  version: versionSchema,
  thicknessMm: measured("the bentonite layer thickness (mm)", { positive: true, max: 50 }),
  finalMassG: measured("the final mass (g)", { positive: true, max: 10_000 }),
  observations: z.string().trim().max(2000).default(""),
});

export const submitRunSchema = z.object({ runId: z.string().min(1), version: versionSchema });

export const grantOverrideSchema = z.object({
  equipmentId: z.string().min(1),
  reason: reasonSchema,
  validDays: z.coerce.number().int().min(1, "At least one day.").max(30, "At most 30 days; calibrate it instead."),
});
