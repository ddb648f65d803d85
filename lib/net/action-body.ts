// What the client library sends as a server action's arguments when they are plain values: a JSON
// array in a text/plain body, where a string beginning with "$" has a meaning of its own. "$$…" is
// a string that began with "$"; "$undefined", "$NaN", "$Infinity", "$-Infinity", "$-0" and "$D<date>"
// stand for values JSON lacks. Every other "$" form points at parts of a multipart reply (files,
// maps, streams, server references), which no Ohmstead action takes, and an invented one makes the
// framework fail before the action runs.

const PLAIN_ESCAPES = /^\$(?:\$|undefined$|NaN$|Infinity$|-Infinity$|-0$|D\d{4}-\d{2}-\d{2})/;

/** Why a text/plain action body cannot be plain arguments, or null when it can. */
export function actionBodyProblem(text: string): string | null {
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch {
    return "The request body is not JSON.";
  }
  if (!Array.isArray(value)) return "The request body is not a list of arguments.";
  const stack: unknown[] = [value];
  let depth = 0;
  while (stack.length) {
    const item = stack.pop();
    if (typeof item === "string") {
      if (item.startsWith("$") && !PLAIN_ESCAPES.test(item)) return "The request refers to parts it does not have.";
    } else if (item && typeof item === "object") {
      if (++depth > 100_000) return "The request body is too complex.";
      stack.push(...Object.values(item));
    }
  }
  return null;
}
