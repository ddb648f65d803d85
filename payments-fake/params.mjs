// Checks for form parameters. Every failure names the parameter in the
// bracket notation the client sent, so a wrong field in the app is found fast.
import { invalid } from "./errors.mjs";

export const isObject = (value) => value !== null && typeof value === "object" && !Array.isArray(value);

/** Rejects parameters this fake does not know, instead of silently ignoring a typo. */
export function onlyKnown(params, allowed, prefix = "") {
  for (const key of Object.keys(params)) {
    if (!allowed.includes(key)) {
      const name = prefix ? `${prefix}[${key}]` : key;
      throw invalid(
        `Unknown parameter: ${name}. The payments fake accepts ${allowed.map((a) => (prefix ? `${prefix}[${a}]` : a)).join(", ")} here.`,
        name,
      );
    }
  }
}

/** An empty string means "not given": the SDK sends `null` that way. */
const given = (value) => value !== undefined && value !== "";

export function text(value, param, { required = false, max = 5000 } = {}) {
  if (!given(value)) {
    if (required) throw invalid(`Missing required parameter: ${param}.`, param);
    return null;
  }
  if (typeof value !== "string") throw invalid(`Invalid ${param}: expected a string.`, param);
  if (value.length > max) throw invalid(`Invalid ${param}: must be at most ${max} characters.`, param);
  return value;
}

export function integer(value, param, { required = false, min = -Infinity, max = Infinity } = {}) {
  if (!given(value)) {
    if (required) throw invalid(`Missing required parameter: ${param}.`, param);
    return null;
  }
  if (typeof value !== "string" || !/^-?\d+$/.test(value)) {
    throw invalid(`Invalid ${param}: expected a whole number, got '${String(value)}'.`, param);
  }
  const number = Number(value);
  if (number < min) throw invalid(`Invalid ${param}: must be at least ${min}.`, param);
  if (number > max) throw invalid(`Invalid ${param}: must be at most ${max}.`, param);
  return number;
}

export function oneOf(value, param, choices, { required = false } = {}) {
  const chosen = text(value, param, { required });
  if (chosen !== null && !choices.includes(chosen)) {
    throw invalid(`Invalid ${param}: must be one of ${choices.join(", ")}.`, param);
  }
  return chosen;
}

export function absoluteUrl(value, param, { required = false } = {}) {
  const raw = text(value, param, { required, max: 5000 });
  if (raw === null) return null;
  // `{CHECKOUT_SESSION_ID}` is a placeholder the fake fills in; braces are not URL-safe as typed.
  const probe = raw.replaceAll("{CHECKOUT_SESSION_ID}", "placeholder");
  let url;
  try {
    url = new URL(probe);
  } catch {
    throw invalid(`Invalid ${param}: not an absolute URL.`, param);
  }
  if (url.protocol !== "http:" && url.protocol !== "https:") {
    throw invalid(`Invalid ${param}: must start with http:// or https://.`, param);
  }
  return raw;
}

export function email(value, param) {
  const raw = text(value, param, { max: 512 });
  if (raw !== null && !/^[^\s@]+@[^\s@]+\.[^\s@]+$/.test(raw)) throw invalid(`Invalid ${param}: not an email address.`, param);
  return raw;
}

/** Metadata as the API allows it: up to 50 string pairs; an empty value drops the key. */
export function metadata(value, param) {
  if (!given(value)) return {};
  if (!isObject(value)) throw invalid(`Invalid ${param}: expected key-value pairs such as ${param}[key]=value.`, param);
  const out = {};
  for (const [key, entry] of Object.entries(value)) {
    const name = `${param}[${key}]`;
    if (typeof entry !== "string") throw invalid(`Invalid ${name}: metadata values must be strings.`, name);
    if (key.length > 40) throw invalid(`Invalid ${name}: metadata keys must be at most 40 characters.`, name);
    if (entry.length > 500) throw invalid(`Invalid ${name}: metadata values must be at most 500 characters.`, name);
    if (entry !== "") out[key] = entry;
  }
  if (Object.keys(out).length > 50) throw invalid(`Invalid ${param}: at most 50 keys are allowed.`, param);
  return out;
}

/** `expand[]` as a list of dotted paths. */
export function expandList(value) {
  if (!given(value)) return [];
  const list = Array.isArray(value) ? value : isObject(value) ? Object.values(value) : [value];
  for (const entry of list) {
    if (typeof entry !== "string" || entry === "") throw invalid("Invalid expand: expected a list of field names.", "expand");
  }
  return list;
}
