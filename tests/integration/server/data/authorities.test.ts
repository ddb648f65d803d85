import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { AuditEvent } from "@/models";
import { AppError } from "@/lib/errors";
import { JurisdictionInput, UtilityInput } from "@/lib/schemas/reference-data";
import { getAuthorityById, listAuthorities, saveAuthority } from "@/lib/server/data/authorities";
import { closeDb } from "../../support/db";
import { makeOrganization, type OrgFixture } from "../../support/fixtures";

let acme: OrgFixture;
let rival: OrgFixture;

const code = async (promise: Promise<unknown>) =>
  promise.then(
    () => "resolved",
    (e: unknown) => (e instanceof AppError ? e.code : String(e)),
  );
const jurisdiction = (patch: Record<string, unknown> = {}) =>
  JurisdictionInput.parse({
    name: "Fenmoor Building Office",
    state: "CO",
    necEdition: "2023",
    recordLowTempC: "-23",
    highDesignTempC: "34",
    ...patch,
  });
const utility = (patch: Record<string, unknown> = {}) =>
  UtilityInput.parse({
    name: "Fenmoor Power",
    serviceVoltages: "120/240 V split-phase",
    acceptedGridProfiles: "IEEE 1547-2018 Category B",
    ...patch,
  });

beforeAll(async () => {
  acme = await makeOrganization("Acme");
  rival = await makeOrganization("Rival");
});

afterAll(async () => {
  await closeDb();
});

describe("jurisdictions", () => {
  it("admins add and edit them, with audit events", async () => {
    const created = await saveAuthority({ viewer: acme.viewers.admin, kind: "jurisdiction", values: jurisdiction() });
    expect(created).toMatchObject({ necEdition: 2023, recordLowTempC: -23 });
    await saveAuthority({
      viewer: acme.viewers.admin,
      kind: "jurisdiction",
      authorityId: created.id,
      values: jurisdiction({ necEdition: "2020" }),
    });
    expect((await getAuthorityById({ viewer: acme.viewers.coordinator, kind: "jurisdiction", authorityId: created.id })).necEdition).toBe(
      2020,
    );
    const event = await AuditEvent.findOne({ where: { entityId: created.id, action: "jurisdiction.updated" } });
    expect(event?.changes).toEqual({ necEdition: { before: 2023, after: 2020 } });
    expect((await listAuthorities({ viewer: rival.viewers.admin, kind: "jurisdiction" })).some((j) => j.id === created.id)).toBe(false);
  });

  it("refuses coordinators and other organizations", async () => {
    expect(await code(saveAuthority({ viewer: acme.viewers.coordinator, kind: "jurisdiction", values: jurisdiction() }))).toBe("FORBIDDEN");
    expect(
      await code(
        saveAuthority({ viewer: rival.viewers.admin, kind: "jurisdiction", authorityId: acme.jurisdiction.id, values: jurisdiction() }),
      ),
    ).toBe("NOT_FOUND");
    expect(await code(getAuthorityById({ viewer: rival.viewers.admin, kind: "jurisdiction", authorityId: "nope" }))).toBe("NOT_FOUND");
  });
});

describe("utilities", () => {
  it("admins add and edit them, accepted grid profiles included", async () => {
    const created = await saveAuthority({ viewer: acme.viewers.admin, kind: "utility", values: utility() });
    expect(created).toMatchObject({ serviceVoltages: ["120/240 V split-phase"], acceptedGridProfiles: ["IEEE 1547-2018 Category B"] });
    await saveAuthority({
      viewer: acme.viewers.admin,
      kind: "utility",
      authorityId: created.id,
      values: utility({
        acceptedGridProfiles: "IEEE 1547-2018 Category B, utility's default settings\nIEEE 1547-2018 Category B, volt-watt on",
      }),
    });
    expect(
      (await getAuthorityById({ viewer: acme.viewers.coordinator, kind: "utility", authorityId: created.id })).acceptedGridProfiles,
    ).toEqual(["IEEE 1547-2018 Category B, utility's default settings", "IEEE 1547-2018 Category B, volt-watt on"]);
    expect((await listAuthorities({ viewer: rival.viewers.admin, kind: "utility" })).some((u) => u.id === created.id)).toBe(false);
  });

  it("refuses coordinators and other organizations", async () => {
    expect(await code(saveAuthority({ viewer: acme.viewers.coordinator, kind: "utility", values: utility() }))).toBe("FORBIDDEN");
    expect(
      await code(saveAuthority({ viewer: rival.viewers.admin, kind: "utility", authorityId: acme.utility.id, values: utility() })),
    ).toBe("NOT_FOUND");
  });
});
