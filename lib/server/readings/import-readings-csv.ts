import "server-only";
import { AppError } from "@/lib/errors/app-error";
import type { SequenceField } from "@/lib/readings/check-reading-sequence";
import { prepareReadings, type PreparedReading } from "@/lib/readings/prepare-readings";
import { applyReadingsMapping, checkReadingsMapping, parseReadingsCsv, suggestReadingsMapping, type ReadingCsvTarget, type ReadingsCsvMapping } from "@/lib/readings/readings-csv";
import { importReadingsCsvSchema } from "@/lib/validation/readings";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { withActor } from "../db/transaction";
import { parseOrThrow } from "../validation/parse";
import { asNeighbour, loadReadingContext, nothingSavedMessage, readingRows } from "./reading-context";

export type CsvPreviewRow = {
  /** Spreadsheet row number, header = row 1. */
  row: number;
  cells: string[];
  /** The reading as it would be saved, when the row has no error of its own. */
  reading: PreparedReading | null;
  errors: Array<{ field: ReadingCsvTarget | "row"; message: string }>;
};

export type CsvPreview = {
  fileName: string;
  header: string[];
  mapping: ReadingsCsvMapping;
  mappingErrors: string[];
  rows: CsvPreviewRow[];
  errorCount: number;
  /** True when every row is good and the mapping is complete: "save" would save them all. */
  canSave: boolean;
};

function sequenceTarget(field: SequenceField, mapping: ReadingsCsvMapping): ReadingCsvTarget {
  if (field === "time") return mapping.columns.includes("elapsed") ? "elapsed" : "takenAt";
  return field === "head" ? "effluentPressure" : field;
}

/**
 * A data-logger CSV for a run. "preview" reads the file with the chosen mapping (or a suggested one)
 * and judges every row against the others and the run's saved readings, saving nothing. "save" does the
 * same and then saves every row, or, if any row or the mapping has a problem, nothing at all. Each saved
 * reading's source is the file name.
 */
export async function importReadingsCsv(options: { actor: CurrentUser; input: unknown; now?: Date }): Promise<CsvPreview & { saved: number; labNumber: string }> {
  requirePermission(options.actor, "run.operate");
  const input = parseOrThrow(importReadingsCsvSchema, options.input);
  const parsed = parseReadingsCsv(input.text);
  const mapping = input.mapping ?? suggestReadingsMapping(parsed, options.actor.pressureUnit);
  const mappingErrors = checkReadingsMapping(parsed.header, mapping);
  if (parsed.header.length > 0 && parsed.rows.length === 0) mappingErrors.push("The file has a header row but no readings under it.");

  return withActor(options.actor, async (tx) => {
    const ctx = await loadReadingContext(tx, { actor: options.actor, runId: input.runId });
    const mapped = mappingErrors.length ? [] : applyReadingsMapping(parsed, mapping);
    const good = mapped.filter((m) => m.values);
    const { rows: prepared, problems } = prepareReadings({
      drafts: good.map((m) => ({ label: `Row ${m.row}`, draft: m.values! })),
      permeationStartedAt: ctx.permeationStartedAt,
      now: options.now ?? new Date(),
      areasMm2: ctx.areasMm2,
      scaleRangeMm: ctx.scaleRangeMm,
      reference: ctx.referenceAt(ctx.current.length - 1),
      previous: asNeighbour(ctx.current[ctx.current.length - 1]),
      pressureUnit: mapping.pressureUnit,
    });
    const preparedByRow = new Map(good.map((m, i) => [m.row, { reading: prepared[i]!, index: i }]));
    const rows: CsvPreviewRow[] = (mapped.length ? mapped : parsed.rows.map((r) => ({ row: r.row, values: null, errors: [] }))).map((m) => {
      const cells = parsed.rows.find((r) => r.row === m.row)?.cells ?? [];
      const placed = preparedByRow.get(m.row);
      const errors = [
        ...m.errors.map((e) => ({ field: e.field, message: e.message })),
        ...(placed ? problems.filter((p) => p.index === placed.index).map((p) => ({ field: sequenceTarget(p.field, mapping), message: p.message })) : []),
      ];
      return { row: m.row, cells, reading: placed?.reading ?? null, errors };
    });
    const errorCount = rows.reduce((n, r) => n + r.errors.length, 0);
    const preview: CsvPreview = { fileName: input.fileName, header: parsed.header, mapping, mappingErrors, rows, errorCount, canSave: mappingErrors.length === 0 && errorCount === 0 && rows.length > 0 };
    if (input.mode === "preview") return { ...preview, saved: 0, labNumber: ctx.run.labNumber };

    if (!preview.canSave) {
      const messages = [...mappingErrors, ...rows.flatMap((r) => r.errors.map((e) => e.message))];
      throw new AppError("INVALID_INPUT", nothingSavedMessage(messages, `Nothing was saved from ${input.fileName}.`), {
        fieldErrors: Object.fromEntries(rows.flatMap((r) => r.errors.map((e) => [`rows.${r.row}.${e.field}`, e.message] as const)).slice(0, 100)),
        details: { preview },
      });
    }
    await tx.reading.createMany({ data: readingRows(prepared, { runId: ctx.run.id, firstSequence: ctx.nextSequence, source: input.fileName, recordedById: options.actor.id }) });
    return { ...preview, saved: prepared.length, labNumber: ctx.run.labNumber };
  });
}
