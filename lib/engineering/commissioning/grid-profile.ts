// The grid profile chosen on the inverter against the profiles the utility
// accepts. The crew picks one from the utility's list; a profile typed by
// hand ("other") is compared loosely, because utilities, inverter screens
// and crews word the same profile differently.
import { build, type CheckBase } from "./reading";
import type { CommissioningCheck, CommissioningRecord } from "./types";

export const UTILITY_PROFILE_BASIS = "utility interconnection requirement";

/** Lower case, letters and digits only: "IEEE 1547-2018" and "ieee1547 2018" are the same text. */
export function normalizeProfile(text: string | null | undefined): string {
  return (text ?? "")
    .normalize("NFKC")
    .toLowerCase()
    .replace(/[^\p{L}\p{N}]+/gu, "");
}

// Words that name a profile without changing which one it is. Not "a": Category A is a profile.
const FILLER = new Set([
  "the",
  "utility",
  "utilities",
  "s",
  "default",
  "defaults",
  "setting",
  "settings",
  "profile",
  "grid",
  "mode",
  "and",
  "per",
  "its",
  "with",
]);
const ROMAN: Record<string, string> = { i: "1", ii: "2", iii: "3" };

/**
 * The words that decide which profile a text names, sorted: case, punctuation and word order
 * do not matter, "cat"/"cat." mean "category", Roman I–III are 1–3, and filler words
 * ("default", "settings", "utility's") are dropped.
 */
export function profileWords(text: string | null | undefined): string[] {
  const words = (text ?? "")
    .normalize("NFKC")
    .toLowerCase()
    .split(/[^\p{L}\p{N}]+/u)
    // "ieee1547" and "rule21" are two words each.
    .flatMap((w) => w.split(/(?<=\p{L})(?=\p{N})|(?<=\p{N})(?=\p{L})/u))
    .filter(Boolean)
    .flatMap((w) => {
      const joined = /^cat(?:egory)?(i{1,3}|[a-z])$/.exec(w); // "catb", "categoryii"
      return joined ? ["category", joined[1]] : [w === "cat" ? "category" : w];
    })
    .map((w) => ROMAN[w] ?? w)
    .filter((w) => !FILLER.has(w));
  return words.sort();
}

/** The accepted profile a text names, or null: exactly the same letters and digits, or the same deciding words. */
export function matchAcceptedProfile(
  set: string | null | undefined,
  accepted: readonly string[],
): { profile: string; exact: boolean } | null {
  const exact = accepted.find((p) => normalizeProfile(p) !== "" && normalizeProfile(p) === normalizeProfile(set));
  if (exact) return { profile: exact, exact: true };
  const words = profileWords(set).join(" ");
  if (words === "") return null;
  const loose = accepted.find((p) => profileWords(p).join(" ") === words);
  return loose ? { profile: loose, exact: false } : null;
}

const listed = (profiles: readonly string[]) => profiles.map((p) => `"${p.trim()}"`).join(" or ");

export function checkGridProfile(
  record: Pick<CommissioningRecord, "edition" | "acceptedGridProfiles" | "gridProfileSet">,
): CommissioningCheck {
  const base: CheckBase = {
    id: "grid-profile",
    title: "Grid profile on the inverter",
    unit: "",
    clause: UTILITY_PROFILE_BASIS,
    edition: record.edition,
  };
  const accepted = record.acceptedGridProfiles.map((p) => p.trim()).filter((p) => normalizeProfile(p) !== "");
  const set = record.gridProfileSet?.trim() ?? "";
  const reading = normalizeProfile(set) === "" ? "missing" : "recorded";
  const result = (status: "pass" | "warn" | "fail", message: string, fix?: string) =>
    build("grid-profile", reading, { ...base, status, value: null, limit: null, message, fix });
  if (accepted.length === 0) {
    return result(
      "fail",
      "The profiles the utility accepts are not on file, so the inverter's setting cannot be checked.",
      "Ask the office to enter the utility's accepted grid profiles (Settings → Utilities).",
    );
  }
  if (reading === "missing") {
    // Like every reading not taken yet, this warns: the record can be saved and finished later.
    return result(
      "warn",
      `The grid profile chosen on the inverter is not recorded; the utility accepts ${listed(accepted)}.`,
      "Choose the profile on the inverter's settings screen or app, read it back and record it.",
    );
  }
  const match = matchAcceptedProfile(set, accepted);
  if (!match) {
    return result(
      "fail",
      `The inverter is set to "${set}", which is not a profile the utility accepts (${listed(accepted)}).`,
      `Change the inverter's grid profile to ${listed(accepted)} and read it back.`,
    );
  }
  return result(
    "pass",
    match.exact
      ? `The inverter is set to "${set}", a profile the utility accepts.`
      : `The inverter is set to "${set}", which names the accepted profile "${match.profile}".`,
  );
}
