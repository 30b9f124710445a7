/**
 * Text PostgreSQL cannot store or JSON cannot carry: a NUL character, or half of a UTF-16 surrogate pair
 * (a "lone surrogate", which no real character produces). Found anywhere in a submitted value, keys too.
 */
const NUL = /\u0000/;
const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

export const UNSTORABLE_TEXT_MESSAGE = "This contains a character that cannot be stored (a NUL or a broken character, often from a copy and paste); retype it.";

/** Whether one piece of text holds a character that cannot be stored. */
export function isUnstorableText(text: string): boolean {
  return NUL.test(text) || LONE_SURROGATE.test(text);
}

/**
 * The path (dot-separated, as form field names) of the first unstorable text in `value`, or null.
 * Stops at a depth of 32 and after 100,000 values; what lies beyond is left to the schema, which refuses
 * shapes that deep or that large anyway.
 */
export function findUnstorableText(value: unknown): string | null {
  let budget = 100_000;
  const walk = (item: unknown, path: string[], depth: number): string | null => {
    if (--budget < 0 || depth > 32) return null;
    if (typeof item === "string") return isUnstorableText(item) ? path.join(".") || "form" : null;
    if (Array.isArray(item)) {
      for (let i = 0; i < item.length; i++) {
        const found = walk(item[i], [...path, String(i)], depth + 1);
        if (found !== null) return found;
      }
      return null;
    }
    if (item && typeof item === "object") {
      for (const [key, child] of Object.entries(item)) {
        if (isUnstorableText(key)) return [...path].join(".") || "form";
        const found = walk(child, [...path, key], depth + 1);
        if (found !== null) return found;
      }
    }
    return null;
  };
  return walk(value, [], 0);
}
