// What every commissioning check shares: how a typed reading is judged
// present, missing or not valid, and how a result is built from it.
import { makeCheck, type CheckInput } from "../check-result";
import type { CommissioningCheck, CommissioningKind, ReadingState } from "./types";

export type Reading = number | null | undefined;

/** A meter reading: missing when not entered, invalid when not a finite number of zero or more. */
export function readingState(value: Reading): ReadingState {
  if (value === null || value === undefined) return "missing";
  return Number.isFinite(value) && value >= 0 ? "recorded" : "invalid";
}

export function build(
  kind: CommissioningKind,
  reading: ReadingState,
  input: CheckInput,
  extra: { waiting?: boolean } = {},
): CommissioningCheck {
  return { ...makeCheck(input), kind, reading, ...(extra.waiting ? { waiting: true } : {}) };
}

export const ENTER_AGAIN = "Enter the voltage as read on the meter, in volts.";

export type CheckBase = Omit<CheckInput, "status" | "value" | "limit" | "message" | "fix">;

/** A reading not taken yet warns (the record can be saved and resumed); one that is not a number fails. */
export function unrecorded(
  kind: CommissioningKind,
  state: Exclude<ReadingState, "recorded">,
  base: CheckBase,
  text: { missing: string; invalid: string; fix?: string; limit?: number },
): CommissioningCheck {
  return build(kind, state, {
    ...base,
    status: state === "missing" ? "warn" : "fail",
    value: null,
    limit: text.limit ?? null,
    message: state === "missing" ? text.missing : text.invalid,
    fix: state === "missing" ? undefined : text.fix,
  });
}

/** A count the installer reads off a screen: a whole number of zero or more. */
export function countState(value: Reading): ReadingState {
  if (value === null || value === undefined) return "missing";
  return Number.isInteger(value) && value >= 0 ? "recorded" : "invalid";
}
