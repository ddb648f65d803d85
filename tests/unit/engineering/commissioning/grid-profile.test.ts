import { describe, expect, test } from "vitest";
import { checkGridProfile, matchAcceptedProfile, normalizeProfile, profileWords } from "@/lib/engineering";

const CAT_B = "IEEE 1547-2018 Category B";
const check = (acceptedGridProfiles: string[], gridProfileSet: string | null | undefined) =>
  checkGridProfile({ edition: 2023, acceptedGridProfiles, gridProfileSet });

// Basis: the utility's interconnection requirements list the profiles it accepts (an invented utility here).
// The crew picks one from that list; a profile typed by hand is compared loosely: case, punctuation,
// word order and filler words ("default", "settings", "utility's") do not decide which profile it is.
describe("grid profile chosen on the inverter vs the profiles the utility accepts", () => {
  test.each([
    [[CAT_B], CAT_B, "pass"], // chosen from the list
    [[CAT_B], "IEEE 1547-2018 Cat B default", "pass"], // the example: the inverter's wording
    [[CAT_B], "ieee1547-2018 category b", "pass"],
    [[CAT_B], "IEEE 1547-2018 Cat. B, utility's default settings", "pass"],
    [[CAT_B], "Category B IEEE 1547 2018", "pass"], // order does not matter
    [[CAT_B], "IEEE 1547-2018 Category A", "fail"],
    [[CAT_B], "IEEE 1547-2003", "fail"],
    [[CAT_B], "Category B", "fail"], // the standard is part of the profile
    [[CAT_B], "IEEE 1547-2018", "fail"],
    [["IEEE 1547-2018 Category B, abnormal performance Category II"], "IEEE 1547-2018 cat B, cat 2 abnormal performance", "pass"], // Roman II is 2
    [
      ["IEEE 1547-2018 Category B, abnormal performance Category II"],
      "IEEE 1547-2018 Category B, abnormal performance Category III",
      "fail",
    ],
    [["Northvale Rule 21 profile"], "NORTHVALE RULE21", "pass"],
    [["Northvale Co-op Cat A", CAT_B], "ieee 1547 2018 cat b", "pass"], // any accepted profile will do
  ])("accepted %j, set %j → %s", (accepted, set, status) => {
    const r = check(accepted, set);
    expect(r).toMatchObject({ status, kind: "grid-profile", reading: "recorded", clause: "utility interconnection requirement" });
    if (status === "fail") expect(r.fix).toContain(accepted[0]);
  });

  test("a loose match names the accepted profile it reads as", () => {
    expect(check([CAT_B], "IEEE 1547-2018 Cat B default").message).toContain(`names the accepted profile "${CAT_B}"`);
  });

  test.each([[null], [undefined], [""], ["  - "]])("setting %j missing → warn (not taken yet), listing what the utility accepts", (set) => {
    const r = check([CAT_B, "Rule 21"], set);
    expect(r).toMatchObject({ status: "warn", reading: "missing" });
    expect(r.message).toContain(`"${CAT_B}" or "Rule 21"`);
  });

  test.each([[[]], [["  "]]])("no accepted profile on file (%j) → fail", (accepted) => {
    const r = check(accepted, CAT_B);
    expect(r.status).toBe("fail");
    expect(r.message).toMatch(/not on file/);
  });

  test("the deciding words", () => {
    expect(profileWords("IEEE 1547-2018 Cat. B, the utility's default settings")).toEqual(["1547", "2018", "b", "category", "ieee"]);
    expect(profileWords("CatB")).toEqual(["b", "category"]);
    expect(normalizeProfile(" Rule-21 (Cat. B) ")).toBe("rule21catb");
    expect(matchAcceptedProfile("", [CAT_B])).toBeNull();
  });
});
