import { describe, expect, it } from "vitest";
import { can, type Permission } from "@/lib/domain/permissions";
import type { Role } from "@/lib/domain/roles";

const viewer = (role: Role) => ({ id: "u1", organizationId: "org-a", role });

describe("can", () => {
  it.each<[Role, Permission, boolean]>([
    ["admin", "users:manage", true],
    ["coordinator", "users:manage", false],
    ["installer", "users:manage", false],
    ["coordinator", "project:create", true],
    ["installer", "project:create", false],
    ["installer", "project:edit", false],
    ["installer", "project:change-stage", false],
    ["installer", "settings:view", false],
    ["coordinator", "settings:view", true],
    ["installer", "project:view", true],
    ["admin", "catalog:view", true],
    ["coordinator", "catalog:view", true],
    ["installer", "catalog:view", false],
    ["admin", "catalog:edit", true],
    ["coordinator", "catalog:edit", false],
    ["installer", "catalog:edit", false],
    ["admin", "reference:edit", true],
    ["coordinator", "reference:edit", false],
    ["installer", "reference:edit", false],
    ["installer", "field:record", true],
    ["coordinator", "field:record", true],
    ["admin", "fees:pay", true],
    ["coordinator", "fees:pay", true],
    ["installer", "fees:pay", false],
    ["admin", "filings:edit", true],
    ["coordinator", "filings:edit", true],
    ["installer", "filings:edit", false],
    // The desk lists the office's to-dos: the crew's are on the field page (issue 15).
    ["admin", "desk:view", true],
    ["coordinator", "desk:view", true],
    ["installer", "desk:view", false],
    // Everyone keeps their own digest choice and calendar feed (issue 15).
    ["admin", "profile:edit", true],
    ["coordinator", "profile:edit", true],
    ["installer", "profile:edit", true],
    ["admin", "fees:refund", true],
    ["coordinator", "fees:refund", false],
    ["installer", "fees:refund", false],
    ["admin", "organization:edit", true],
    ["coordinator", "organization:edit", false],
    ["installer", "organization:edit", false],
  ])("%s → %s is %s", (role, permission, expected) => {
    expect(can(viewer(role), permission)).toBe(expected);
  });

  it("refuses every role another organization's project", () => {
    for (const role of ["admin", "coordinator", "installer"] as const) {
      expect(can(viewer(role), "project:view", { organizationId: "org-b", installerId: "u1" })).toBe(false);
    }
  });

  it("lets installers see only projects assigned to them", () => {
    expect(can(viewer("installer"), "project:view", { organizationId: "org-a", installerId: "u1" })).toBe(true);
    expect(can(viewer("installer"), "project:view", { organizationId: "org-a", installerId: "u2" })).toBe(false);
    expect(can(viewer("installer"), "project:view", { organizationId: "org-a", installerId: null })).toBe(false);
    expect(can(viewer("coordinator"), "project:view", { organizationId: "org-a", installerId: null })).toBe(true);
  });

  it("lets only the assigned installer record field work on a project", () => {
    expect(can(viewer("installer"), "field:record", { organizationId: "org-a", installerId: "u1" })).toBe(true);
    expect(can(viewer("installer"), "field:record", { organizationId: "org-a", installerId: "u2" })).toBe(false);
    expect(can(viewer("coordinator"), "field:record", { organizationId: "org-b", installerId: "u1" })).toBe(false);
  });

  it("gives API tokens no write, payment or field permission", () => {
    const token = { ...viewer("admin"), apiTokenId: "t1" };
    for (const permission of ["field:record", "fees:pay", "fees:refund", "filings:edit", "organization:edit", "project:edit"] as const)
      expect(can(token, permission)).toBe(false);
  });
});
