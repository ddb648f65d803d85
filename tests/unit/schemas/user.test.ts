import { describe, expect, it } from "vitest";
import { InviteUserInput, SetPasswordInput } from "@/lib/schemas/user";

describe("InviteUserInput", () => {
  it("normalizes the e-mail address", () => {
    expect(InviteUserInput.parse({ name: " Nell ", email: " Nell@Example.COM ", role: "installer" })).toEqual({
      name: "Nell",
      email: "nell@example.com",
      role: "installer",
    });
  });

  it.each([
    [{ role: "inspector" }, "role"],
    [{ email: "not an address" }, "email"],
    [{ name: "N" }, "name"],
  ])("refuses %j", (patch, path) => {
    const result = InviteUserInput.safeParse({ name: "Nell", email: "nell@example.com", role: "admin", ...patch });
    expect(result.error?.issues.map((i) => i.path.join("."))).toContain(path);
  });
});

describe("SetPasswordInput", () => {
  const token = "t".repeat(43);
  it("wants two equal passwords of at least 10 characters", () => {
    expect(SetPasswordInput.safeParse({ token, password: "long enough 1", confirm: "long enough 1" }).success).toBe(true);
    expect(SetPasswordInput.safeParse({ token, password: "short", confirm: "short" }).error?.issues[0].message).toBe(
      "Use at least 10 characters",
    );
    expect(SetPasswordInput.safeParse({ token, password: "long enough 1", confirm: "long enough 2" }).error?.issues[0].path).toEqual([
      "confirm",
    ]);
  });
});
