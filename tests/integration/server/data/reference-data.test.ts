import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { AuditEvent } from "@/models";
import { AppError } from "@/lib/errors";
import { JurisdictionInput, UtilityInput } from "@/lib/schemas/reference-data";
import { createJurisdiction, createUtility, getJurisdictionById, getUtilityById, listJurisdictions, listUtilities, updateJurisdiction, updateUtility } from "@/lib/server/data/reference-data";
import { closeDb } from "../../support/db";
import { makeOrganization, type OrgFixture } from "../../support/fixtures";

let acme: OrgFixture;
let rival: OrgFixture;

const code = async (promise: Promise<unknown>) => promise.then(() => "resolved", (e: unknown) => (e instanceof AppError ? e.code : String(e)));
const jurisdiction = (patch: Record<string, unknown> = {}) => JurisdictionInput.parse({ name: "Fenmoor Building Office", state: "CO", necEdition: "2023", recordLowTempC: "-23", highDesignTempC: "34", ...patch });
const utility = (patch: Record<string, unknown> = {}) => UtilityInput.parse({ name: "Fenmoor Power", serviceVoltages: "120/240 V split-phase", acceptedGridProfiles: "IEEE 1547-2018 Category B", ...patch });

beforeAll(async () => {
  acme = await makeOrganization("Acme");
  rival = await makeOrganization("Rival");
});

afterAll(async () => {
  await closeDb();
});

describe("jurisdictions", () => {
  it("admins add and edit them, with audit events", async () => {
    const created = await createJurisdiction({ viewer: acme.viewers.admin, values: jurisdiction() });
    expect(created).toMatchObject({ necEdition: 2023, recordLowTempC: -23 });
    await updateJurisdiction({ viewer: acme.viewers.admin, jurisdictionId: created.id, values: jurisdiction({ necEdition: "2020" }) });
    expect((await getJurisdictionById({ viewer: acme.viewers.coordinator, jurisdictionId: created.id })).necEdition).toBe(2020);
    const event = await AuditEvent.findOne({ where: { entityId: created.id, action: "jurisdiction.updated" } });
    expect(event?.changes).toEqual({ necEdition: { before: 2023, after: 2020 } });
    expect((await listJurisdictions({ viewer: rival.viewers.admin })).some((j) => j.id === created.id)).toBe(false);
  });

  it("refuses coordinators and other organizations", async () => {
    expect(await code(createJurisdiction({ viewer: acme.viewers.coordinator, values: jurisdiction() }))).toBe("FORBIDDEN");
    expect(await code(updateJurisdiction({ viewer: rival.viewers.admin, jurisdictionId: acme.jurisdiction.id, values: jurisdiction() }))).toBe("NOT_FOUND");
    expect(await code(getJurisdictionById({ viewer: rival.viewers.admin, jurisdictionId: "nope" }))).toBe("NOT_FOUND");
  });
});

describe("utilities", () => {
  it("admins add and edit them, accepted grid profiles included", async () => {
    const created = await createUtility({ viewer: acme.viewers.admin, values: utility() });
    expect(created).toMatchObject({ serviceVoltages: ["120/240 V split-phase"], acceptedGridProfiles: ["IEEE 1547-2018 Category B"] });
    await updateUtility({ viewer: acme.viewers.admin, utilityId: created.id, values: utility({ acceptedGridProfiles: "IEEE 1547-2018 Category B, utility's default settings\nIEEE 1547-2018 Category B, volt-watt on" }) });
    expect((await getUtilityById({ viewer: acme.viewers.coordinator, utilityId: created.id })).acceptedGridProfiles).toEqual(["IEEE 1547-2018 Category B, utility's default settings", "IEEE 1547-2018 Category B, volt-watt on"]);
    expect((await listUtilities({ viewer: rival.viewers.admin })).some((u) => u.id === created.id)).toBe(false);
  });

  it("refuses coordinators and other organizations", async () => {
    expect(await code(createUtility({ viewer: acme.viewers.coordinator, values: utility() }))).toBe("FORBIDDEN");
    expect(await code(updateUtility({ viewer: rival.viewers.admin, utilityId: acme.utility.id, values: utility() }))).toBe("NOT_FOUND");
  });
});
