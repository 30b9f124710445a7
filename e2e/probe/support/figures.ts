import { mkdirSync, writeFileSync } from "node:fs";
import path from "node:path";

/** Where each part of the probe leaves its figures; `npm test` and `npm run probe` print them as one table. */
export const FIGURES_DIR = path.resolve(import.meta.dirname, "../../../tmp/probe");

export type Figure = { label: string; values: Record<string, number | string> };

/** Records one line of the probe's table (and prints it, so a single file's run shows it too). */
export function recordFigure(key: string, figure: Figure): void {
  mkdirSync(FIGURES_DIR, { recursive: true });
  writeFileSync(path.join(FIGURES_DIR, `${key}.json`), JSON.stringify({ ...figure, at: new Date().toISOString() }));
  console.log(`probe | ${figure.label}: ${Object.entries(figure.values).map(([k, v]) => `${k} ${v}`).join(", ")}`);
}
