import fc from "fast-check";

/*
 * Hostile input for the fuzzer: values no form would send, chosen for what has broken web apps before
 * (common practice): characters a database cannot store, broken Unicode, impossible and ancient dates,
 * numbers at the edges, injection-looking text, React's own reference syntax, shapes of the wrong kind.
 */
export const HOSTILE_VALUES: unknown[] = [
  "", " ", "\u0000", "a\u0000b", "\ud800", "x\udc00y", "\ud83d", "💧", "\u202eevil", "x".repeat(5_000), "y".repeat(200_000),
  "'; DROP TABLE \"Reading\"; --", "' OR '1'='1", "<script>alert(1)</script>", "<img src=x onerror=alert(1)>", "../../etc/passwd", "%00", "%ZZ", "${7*7}", "{{7*7}}",
  "0001-01-01", "0001-01-01T00:00", "-000001-01-01T00:00:00Z", "2026-02-30", "2026-02-30T10:00", "2026-13-01T00:00", "275760-09-13T00:00:00Z", "9999-12-31T23:59", "1899-12-31",
  "1e309", "-1e309", "NaN", "Infinity", "-0", "0x1F", "1,5", "١٢٣",
  0, -0, -1, 1e308, -1e308, 5e-324, 2 ** 53 + 2, 2 ** 31, -(2 ** 31) - 1, 0.1,
  true, false, null, [], {}, [null], [[[]]], { a: { b: { c: {} } } },
  "$D2026-01-01", "$D-000001-01-01", "$@1", "$1", "$Q0", "$W0", "$undefined", "$NaN", "$Infinity", "$-Infinity", "$n99999999999999999999999", "$K0",
  "00000000-0000-0000-0000-000000000000", "R26-00001", "T26-00001", "Q26-00001",
];

/** Whole argument lists and raw bodies of the wrong shape. */
export const HOSTILE_BODIES: string[] = [
  "[]", "[null]", "null", "{}", '"text"', "[1]", '["x"]', "[[]]", "[true]", "[{}, {}, {}]",
  "{", "[{", '[{"a":', "\u0000", "[\"\\ud800\"]", '[{"__proto__":{"polluted":1}}]', '[{"constructor":{"prototype":{"polluted":1}}}]',
  `${"[".repeat(5_000)}${"]".repeat(5_000)}`, JSON.stringify([Array.from({ length: 2_000 }, () => ({}))]), "[1e999]", '["$D"]', '["$@"]', '["$"]',
];

/** Objects with hostile values in the given fields, reproducible (a fixed seed). */
export function generatedObjects(fields: string[], count: number, seed: number): Array<Record<string, unknown>> {
  const value = fc.oneof(fc.constantFrom(...HOSTILE_VALUES), fc.jsonValue({ maxDepth: 3 }), fc.string({ unit: "binary", maxLength: 40 }), fc.double());
  const object = fc.dictionary(fc.constantFrom(...fields), value, { minKeys: 1, maxKeys: Math.min(12, fields.length) });
  return fc.sample(object, { seed, numRuns: count });
}
