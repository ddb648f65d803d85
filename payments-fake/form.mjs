// Reads the bracket-notation form encoding the payments API speaks
// (`line_items[0][price_data][unit_amount]=500`, `expand[]=x`) into nested
// objects and arrays. Values stay strings: each route decides what a number is,
// so it can name the offending parameter when one is not.

export class FormError extends Error {
  constructor(message, param) {
    super(message);
    this.param = param;
  }
}

// Keys that would reach Object.prototype if used as property names.
const FORBIDDEN_KEYS = new Set(["__proto__", "constructor", "prototype"]);
const APPEND = Symbol("append");

/** `a[b][0][]` → ["a", "b", "0", APPEND]; returns null when the brackets do not close. */
function splitKey(key) {
  const open = key.indexOf("[");
  if (open === -1) return [key];
  const parts = [key.slice(0, open)];
  let rest = key.slice(open);
  while (rest.length > 0) {
    const match = rest.match(/^\[([^\[\]]*)\]/);
    if (!match) return null;
    parts.push(match[1] === "" ? APPEND : match[1]);
    rest = rest.slice(match[0].length);
  }
  return parts;
}

function printable(parts) {
  return parts.map((p, i) => (i === 0 ? p : `[${p === APPEND ? "" : p}]`)).join("");
}

/**
 * Turns containers addressed with index brackets into arrays when their keys
 * are exactly 0..n-1; anything else (e.g. `metadata[7]=x`) stays an object,
 * so a numbered metadata key is not mistaken for a list.
 */
function densify(value) {
  if (value === null || typeof value !== "object") return value;
  const keys = Object.keys(value);
  for (const key of keys) value[key] = densify(value[key]);
  if (!value[APPEND_MARK]) return value;
  const dense = keys.length > 0 && keys.every((k, i) => k === String(i));
  return dense ? keys.map((k) => value[k]) : value;
}

// Marks containers that were addressed with numeric or empty brackets, so
// `metadata[0]=x` only becomes an array if every key under it is an index.
const APPEND_MARK = Symbol("array-like");

/** Parses `application/x-www-form-urlencoded` text (or URLSearchParams) into nested values. */
export function parseForm(input) {
  const params = input instanceof URLSearchParams ? input : new URLSearchParams(input);
  const root = {};
  for (const [rawKey, value] of params) {
    const parts = splitKey(rawKey);
    if (!parts || parts[0] === "" || parts[0] === APPEND) {
      throw new FormError(`Invalid parameter name: ${rawKey}`, rawKey);
    }
    let node = root;
    for (let i = 0; i < parts.length; i += 1) {
      let part = parts[i];
      const isLast = i === parts.length - 1;
      if (part === APPEND) {
        node[APPEND_MARK] = true;
        part = String(Object.keys(node).length);
      } else if (i > 0 && /^\d+$/.test(part)) {
        node[APPEND_MARK] = true;
      }
      if (FORBIDDEN_KEYS.has(part)) throw new FormError(`Invalid parameter name: ${rawKey}`, rawKey);
      if (isLast) {
        if (Object.hasOwn(node, part)) {
          throw new FormError(`Parameter ${printable(parts)} was given more than once.`, printable(parts));
        }
        node[part] = value;
      } else {
        if (!Object.hasOwn(node, part)) node[part] = {};
        if (typeof node[part] !== "object") {
          throw new FormError(
            `Parameter ${printable(parts.slice(0, i + 1))} cannot be both a value and a group.`,
            printable(parts.slice(0, i + 1)),
          );
        }
        node = node[part];
      }
    }
  }
  return densify(root);
}
