import type { CheckResult, CheckStatus } from "./types";

// Floating-point products such as 1.25 × 32 or 1.2 × 225 must count as "at the limit".
const EPSILON = 1e-9;

export function atMost(value: number, limit: number): boolean {
  return value <= limit + EPSILON;
}

export function atLeast(value: number, limit: number): boolean {
  return value >= limit - EPSILON;
}

export function round(value: number, digits = 2): number {
  const scale = 10 ** digits;
  return Math.round(value * scale) / scale;
}

/** A number as a sentence shows it: at most two decimals, no trailing zeros. */
export function fmt(value: number, digits = 2): string {
  return String(round(value, digits));
}

/** "1 string", "2 strings"; words with an irregular plural name it ("1 busbar", "2 busbars"; "1 device", "3 devices"). */
export function plural(count: number, word: string, pluralWord = `${word}s`): string {
  return `${count} ${count === 1 ? word : pluralWord}`;
}

/** A count with its noun and a verb that agrees: "1 string feeds", "2 strings feed". */
export function countAgrees(count: number, word: string, verbOne: string, verbMany: string): string {
  return `${plural(count, word)} ${count === 1 ? verbOne : verbMany}`;
}

// Letters whose spoken name starts with a vowel sound, for initialisms read letter by letter ("an MC cable").
const VOWEL_SOUND_LETTERS = new Set(["A", "E", "F", "H", "I", "L", "M", "N", "O", "R", "S", "X"]);

/**
 * "a" or "an" for the word or figure that follows, as it is spoken: "an inverter", "a unit",
 * "an 8 AWG conductor", "an 18 A device", "a 10 AWG conductor", "an EMT raceway", "a PV breaker".
 */
export function article(next: string): "a" | "an" {
  const word = next.trim();
  const digits = /^\d+/.exec(word)?.[0];
  if (digits !== undefined) {
    // Spoken numbers that start with a vowel: eight…, eighty…, eight hundred…, eleven, eighteen, eleven thousand…
    const leadingPair = digits.length % 3 === 2 ? digits.slice(0, 2) : "";
    return digits.startsWith("8") || leadingPair === "11" || leadingPair === "18" ? "an" : "a";
  }
  const initialism = /^[A-Z]{2,}|^[A-Z](?=[-\d\s]|$)/.exec(word)?.[0];
  if (initialism !== undefined) return VOWEL_SOUND_LETTERS.has(initialism[0]!) ? "an" : "a";
  const lower = word.toLowerCase();
  if (/^(uni|use|usu|uti|ure|euro|one|once)/.test(lower)) return "a";
  if (/^(hour|honest|honou?r)/.test(lower)) return "an";
  return /^[aeiou]/.test(lower) ? "an" : "a";
}

/** The word with its article: "an inverter", "a 40 A breaker". */
export function withArticle(next: string): string {
  return `${article(next)} ${next}`;
}

export function worstStatus(statuses: CheckStatus[]): CheckStatus {
  if (statuses.includes("fail")) return "fail";
  if (statuses.includes("warn")) return "warn";
  return "pass";
}

/** What a check hands to makeCheck: a result before rounding. */
export type CheckInput = CheckResult;

/** Builds a result, rounding numbers and refusing NaN so none reaches a screen or a PDF. */
export function makeCheck(input: CheckInput): CheckResult {
  for (const key of ["value", "limit"] as const) {
    const n = input[key];
    if (n !== null && !Number.isFinite(n)) {
      throw new Error(`Check ${input.id} computed a non-finite ${key}.`);
    }
  }
  const result: CheckResult = {
    ...input,
    value: input.value === null ? null : round(input.value),
    limit: input.limit === null ? null : round(input.limit),
  };
  if (input.fix === undefined) delete result.fix;
  if (input.field === undefined) delete result.field;
  return result;
}
