import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { AuditEvent } from "@/models";
import { AppError } from "@/lib/errors";
import { OrganizationInput } from "@/lib/schemas/organization";
import { getOrganization, updateOrganization } from "@/lib/server/data/organizations";
import { closeDb } from "../../support/db";
import { makeOrganization, type OrgFixture } from "../../support/fixtures";

let org: OrgFixture;
let rival: OrgFixture;
const code = async (promise: Promise<unknown>) =>
  promise.then(
    () => "resolved",
    (e: unknown) => (e instanceof AppError ? e.code : String(e)),
  );

beforeAll(async () => {
  org = await makeOrganization("Org settings");
  rival = await makeOrganization("Rival org settings");
});

afterAll(async () => {
  await closeDb();
});

describe("organization settings", () => {
  it("starts in the default zone, saves the admin's changes with an audit event, and touches no other organization", async () => {
    expect((await getOrganization({ viewer: org.viewers.coordinator })).timeZone).toBe("America/New_York");
    const values = OrganizationInput.parse({ name: `Renamed ${org.tag}`, licenseNumber: " EC-1 ", phone: "", timeZone: "America/Denver" });
    const saved = await updateOrganization({ viewer: org.viewers.admin, values });
    expect(saved).toMatchObject({ name: `Renamed ${org.tag}`, licenseNumber: "EC-1", phone: null, timeZone: "America/Denver" });
    const event = await AuditEvent.findOne({ where: { entityId: org.organization.id, action: "organization.updated" } });
    expect(Object.keys(event!.changes).sort()).toEqual(["licenseNumber", "name", "timeZone"]);
    expect((await getOrganization({ viewer: rival.viewers.admin })).name).toBe(rival.organization.name);
  });

  it("is refused to a coordinator, and a zone outside the list is refused by the schema", async () => {
    const values = OrganizationInput.parse({ name: "Nope", licenseNumber: "", phone: "", timeZone: "America/Chicago" });
    expect(await code(updateOrganization({ viewer: org.viewers.coordinator, values }))).toBe("FORBIDDEN");
    expect(OrganizationInput.safeParse({ name: "X Co", licenseNumber: "", phone: "", timeZone: "Europe/Paris" }).success).toBe(false);
  });
});
