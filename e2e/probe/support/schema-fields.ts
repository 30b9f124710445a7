import { readdirSync } from "node:fs";
import path from "node:path";

type Def = { type?: string; shape?: Record<string, unknown>; in?: unknown; out?: unknown; innerType?: unknown; element?: unknown; options?: unknown[]; schema?: unknown; left?: unknown; right?: unknown };
const defOf = (value: unknown): Def | null => ((value as { _zod?: { def?: Def } })?._zod?.def ?? null);

/**
 * Every field name the app's shared schemas know (lib/validation/*.ts, found by listing the folder), so the
 * fuzzer can put hostile values in the fields each server action actually reads.
 */
export async function knownFieldNames(): Promise<string[]> {
  const dir = path.resolve(import.meta.dirname, "../../../lib/validation");
  const names = new Set<string>();
  const seen = new Set<unknown>();
  const walk = (schema: unknown, depth: number) => {
    const def = defOf(schema);
    if (!def || depth > 8 || seen.has(schema)) return;
    seen.add(schema);
    if (def.shape) for (const [key, child] of Object.entries(def.shape)) {
      names.add(key);
      walk(child, depth + 1);
    }
    for (const child of [def.in, def.out, def.innerType, def.element, def.schema, def.left, def.right, ...(def.options ?? [])]) walk(child, depth + 1);
  };
  for (const file of readdirSync(dir).filter((f) => f.endsWith(".ts"))) {
    const mod = (await import(path.join(dir, file))) as Record<string, unknown>;
    for (const value of Object.values(mod)) walk(value, 0);
  }
  return [...names].sort();
}
