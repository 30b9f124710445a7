/**
 * Whether the body of a server action call is one the app's own pages could have sent: a JSON array of
 * plain values (React encodes the arguments of an action called with plain objects that way). React gives
 * text that starts with "$" a meaning (a reference to another part of the request, a Date, a Map...);
 * the ones a plain-JSON body cannot fulfil make React fail with a server error, so they are refused here
 * with a sentence, as are bodies that are not JSON, are not an argument list, or nest absurdly deep.
 */
const MAX_DEPTH = 64;
// "$$x" is an escaped "$"; the rest are values React rebuilds on its own: Date, BigInt, undefined, numbers.
const STANDALONE_REFERENCE = /^\$(\$|D|n-?\d+$|undefined$|NaN$|Infinity$|-Infinity$|-0$)/;

export function actionBodyProblem(text: string): string | null {
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch {
    return "The request is not well formed (its body is not JSON); reload the page and try again.";
  }
  if (!Array.isArray(value)) return "The request is not well formed (no list of values); reload the page and try again.";
  const stack: Array<[unknown, number]> = [[value, 0]];
  while (stack.length > 0) {
    const [item, depth] = stack.pop()!;
    if (depth > MAX_DEPTH) return "The request nests its values too deeply; reload the page and try again.";
    if (typeof item === "string") {
      if (item.startsWith("$") && !STANDALONE_REFERENCE.test(item)) return "The request holds a value the app cannot read (text starting with \"$\" that is not escaped); reload the page and try again.";
    } else if (item && typeof item === "object") {
      for (const child of Object.values(item)) stack.push([child, depth + 1]);
    }
  }
  return null;
}
