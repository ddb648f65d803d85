import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { AuditEvent, Equipment } from "@/models";
import { AppError } from "@/lib/errors";
import { EquipmentInput, type EquipmentValues } from "@/lib/schemas/equipment";
import {
  attachDatasheet,
  createEquipment,
  getDatasheetLocation,
  getEquipmentById,
  getEquipmentByIds,
  listEquipment,
  setEquipmentArchived,
  updateEquipment,
} from "@/lib/server/data/equipment";
import { getObjectBytes } from "@/lib/server/services/storage";
import { closeDb } from "../../support/db";
import { makeOrganization, type OrgFixture } from "../../support/fixtures";

let acme: OrgFixture;
let rival: OrgFixture;

const code = async (promise: Promise<unknown>) =>
  promise.then(
    () => "resolved",
    (e: unknown) => (e instanceof AppError ? e.code : String(e)),
  );

// Invented equipment; the figures are in the range of current residential products.
const moduleValues = (model: string, patch: Record<string, unknown> = {}): EquipmentValues =>
  EquipmentInput.parse({
    kind: "module",
    maker: "Larkspur",
    model,
    listing: "UL 61730",
    specs: {
      powerW: 405,
      vocV: 37.2,
      vmpV: 31.0,
      iscA: 13.85,
      impA: 13.07,
      vocTempCoeff: { value: -0.27, unit: "%/C" },
      lengthIn: 67.8,
      widthIn: 44.6,
      weightLb: 46.3,
      ...patch,
    },
  });
const inverterValues = (model: string): EquipmentValues =>
  EquipmentInput.parse({
    kind: "inverter",
    maker: "Quillon",
    model,
    specs: {
      inverterKind: "string",
      acPowerW: 7600,
      acOutputCurrentA: 32,
      acVoltageV: 240,
      phase: 1,
      maxDcInputV: 600,
      mpptMinV: 200,
      mpptMaxV: 480,
    },
  });
const pdf = (text: string) => new TextEncoder().encode(`%PDF-1.7\n% ${text}\n%%EOF\n`);

beforeAll(async () => {
  acme = await makeOrganization("Acme");
  rival = await makeOrganization("Rival");
});

afterAll(async () => {
  await closeDb();
});

describe("createEquipment", () => {
  it("adds an item with parsed figures and an audit event", async () => {
    const item = await createEquipment({ viewer: acme.viewers.admin, values: moduleValues("LK-405") });
    expect(item).toMatchObject({
      kind: "module",
      maker: "Larkspur",
      model: "LK-405",
      isArchived: false,
      datasheet: null,
      specs: { powerW: 405, vocTempCoeff: { value: -0.27, unit: "%/C" } },
    });
    const event = await AuditEvent.findOne({ where: { entityId: item.id, action: "equipment.created" } });
    expect(event?.changes.model).toEqual({ before: null, after: "LK-405" });
  });

  it("lets only admins add items", async () => {
    expect(await code(createEquipment({ viewer: acme.viewers.coordinator, values: moduleValues("LK-C") }))).toBe("FORBIDDEN");
    expect(await code(createEquipment({ viewer: acme.viewers.installer, values: moduleValues("LK-I") }))).toBe("FORBIDDEN");
  });

  it("refuses the same maker and model of the same kind, whatever the case, with CONFLICT", async () => {
    await createEquipment({ viewer: acme.viewers.admin, values: moduleValues("LK-410") });
    const error = await createEquipment({ viewer: acme.viewers.admin, values: moduleValues("lk-410") }).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(AppError);
    expect(error).toMatchObject({ code: "CONFLICT", fieldErrors: { model: ["Already in the catalog"] } });
    expect(await Equipment.count({ where: { organizationId: acme.organization.id, model: "lk-410" } })).toBe(0);
  });

  it("allows the same model in another organization", async () => {
    await createEquipment({ viewer: acme.viewers.admin, values: inverterValues("QS-7600") });
    expect((await createEquipment({ viewer: rival.viewers.admin, values: inverterValues("QS-7600") })).model).toBe("QS-7600");
  });
});

describe("listEquipment and getEquipmentById", () => {
  it("shows only the viewer's organization, filtered by kind", async () => {
    await createEquipment({ viewer: rival.viewers.admin, values: moduleValues("RIVAL-ONLY") });
    const all = await listEquipment({ viewer: acme.viewers.coordinator });
    expect(all.length).toBeGreaterThan(0);
    expect(all.some((i) => i.model === "RIVAL-ONLY")).toBe(false);
    const inverters = await listEquipment({ viewer: acme.viewers.coordinator, kind: "inverter" });
    expect(inverters.map((i) => i.kind)).toEqual(["inverter"]);
  });

  it("answers NOT_FOUND for another organization's item and a malformed id", async () => {
    const foreign = await createEquipment({ viewer: rival.viewers.admin, values: moduleValues("RIVAL-2") });
    expect(await code(getEquipmentById({ viewer: acme.viewers.admin, equipmentId: foreign.id }))).toBe("NOT_FOUND");
    expect(await code(getEquipmentById({ viewer: acme.viewers.admin, equipmentId: "not-a-uuid" }))).toBe("NOT_FOUND");
    expect((await getEquipmentById({ viewer: rival.viewers.coordinator, equipmentId: foreign.id })).model).toBe("RIVAL-2");
  });

  it("refuses to hand out figures the schema would refuse", async () => {
    const item = await createEquipment({ viewer: acme.viewers.admin, values: moduleValues("LK-BROKEN") });
    await Equipment.update({ specs: { powerW: "lots" } }, { where: { id: item.id } });
    const error = await getEquipmentById({ viewer: acme.viewers.admin, equipmentId: item.id }).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(Error);
    expect(error).not.toBeInstanceOf(AppError);
    await Equipment.destroy({ where: { id: item.id } });
  });
});

describe("getEquipmentByIds", () => {
  it("returns the items in the order asked, once each, archived ones included", async () => {
    const a = await createEquipment({ viewer: acme.viewers.admin, values: moduleValues("LK-A") });
    const b = await createEquipment({ viewer: acme.viewers.admin, values: inverterValues("QS-B") });
    await setEquipmentArchived({ viewer: acme.viewers.admin, equipmentId: a.id, isArchived: true });
    const found = await getEquipmentByIds({ viewer: acme.viewers.coordinator, ids: [b.id, a.id.toUpperCase(), b.id] });
    expect(found.map((i) => [i.model, i.isArchived])).toEqual([
      ["QS-B", false],
      ["LK-A", true],
    ]);
    expect(await getEquipmentByIds({ viewer: acme.viewers.coordinator, ids: [] })).toEqual([]);
  });

  it("leaves out missing, malformed and other organizations' ids without telling them apart", async () => {
    const own = await createEquipment({ viewer: acme.viewers.admin, values: moduleValues("LK-OWN") });
    const foreign = await createEquipment({ viewer: rival.viewers.admin, values: moduleValues("RIVAL-3") });
    const found = await getEquipmentByIds({
      viewer: acme.viewers.admin,
      ids: [foreign.id, own.id, "not-a-uuid", "6f1c1a3e-8d0e-4b7a-9a53-2f0d7f7c1b11"],
    });
    expect(found.map((i) => i.id)).toEqual([own.id]);
  });
});

describe("updateEquipment and setEquipmentArchived", () => {
  it("records what changed", async () => {
    const item = await createEquipment({ viewer: acme.viewers.admin, values: moduleValues("LK-UPD") });
    const updated = await updateEquipment({
      viewer: acme.viewers.admin,
      equipmentId: item.id,
      values: moduleValues("LK-UPD", { weightLb: 47.1 }),
    });
    expect(updated.kind === "module" && updated.specs.weightLb).toBe(47.1);
    const event = await AuditEvent.findOne({ where: { entityId: item.id, action: "equipment.updated" } });
    expect(Object.keys(event?.changes ?? {})).toEqual(["specs"]);
  });

  it("keeps the kind, refuses duplicates and foreign ids", async () => {
    const item = await createEquipment({ viewer: acme.viewers.admin, values: moduleValues("LK-KIND") });
    await createEquipment({ viewer: acme.viewers.admin, values: moduleValues("LK-TAKEN") });
    expect(await code(updateEquipment({ viewer: acme.viewers.admin, equipmentId: item.id, values: inverterValues("LK-KIND") }))).toBe(
      "INVALID_INPUT",
    );
    expect(await code(updateEquipment({ viewer: acme.viewers.admin, equipmentId: item.id, values: moduleValues("LK-TAKEN") }))).toBe(
      "CONFLICT",
    );
    expect(await code(updateEquipment({ viewer: rival.viewers.admin, equipmentId: item.id, values: moduleValues("LK-KIND") }))).toBe(
      "NOT_FOUND",
    );
    expect(await code(updateEquipment({ viewer: acme.viewers.coordinator, equipmentId: item.id, values: moduleValues("LK-KIND") }))).toBe(
      "FORBIDDEN",
    );
  });

  it("archives out of the default list and restores", async () => {
    const item = await createEquipment({ viewer: acme.viewers.admin, values: moduleValues("LK-ARCH") });
    await setEquipmentArchived({ viewer: acme.viewers.admin, equipmentId: item.id, isArchived: true });
    expect((await listEquipment({ viewer: acme.viewers.admin })).some((i) => i.id === item.id)).toBe(false);
    expect((await listEquipment({ viewer: acme.viewers.admin, includeArchived: true })).find((i) => i.id === item.id)?.isArchived).toBe(
      true,
    );
    await setEquipmentArchived({ viewer: acme.viewers.admin, equipmentId: item.id, isArchived: false });
    expect((await listEquipment({ viewer: acme.viewers.admin })).some((i) => i.id === item.id)).toBe(true);
    expect(await AuditEvent.count({ where: { entityId: item.id, action: ["equipment.archived", "equipment.restored"] } })).toBe(2);
    expect(await code(setEquipmentArchived({ viewer: rival.viewers.admin, equipmentId: item.id, isArchived: true }))).toBe("NOT_FOUND");
  });
});

describe("attachDatasheet", () => {
  it("stores the PDF under a server-made key, reads it back, and replaces it", async () => {
    const item = await createEquipment({ viewer: acme.viewers.admin, values: moduleValues("LK-SHEET") });
    const first = await attachDatasheet({
      viewer: acme.viewers.admin,
      equipmentId: item.id,
      fileName: "LK sheet (rev 2).pdf",
      bytes: pdf("first"),
    });
    expect(first.datasheet).toMatchObject({ fileName: "LK sheet (rev 2).pdf", sizeBytes: pdf("first").byteLength });
    const stored = await getDatasheetLocation({ viewer: acme.viewers.coordinator, equipmentId: item.id });
    expect(stored.key).toMatch(new RegExp(`^orgs/${acme.organization.id}/datasheets/${item.id}/[0-9a-f-]{36}\\.pdf$`));
    expect(new TextDecoder().decode(await getObjectBytes(stored.key))).toContain("first");

    await attachDatasheet({ viewer: acme.viewers.admin, equipmentId: item.id, fileName: "../../etc/passwd.pdf", bytes: pdf("second") });
    const replaced = await getDatasheetLocation({ viewer: acme.viewers.coordinator, equipmentId: item.id });
    expect(replaced.fileName).toBe(".._.._etc_passwd.pdf");
    expect(new TextDecoder().decode(await getObjectBytes(replaced.key))).toContain("second");
    await expect(getObjectBytes(stored.key)).rejects.toThrow();
    expect(await AuditEvent.count({ where: { entityId: item.id, action: "equipment.datasheet-attached" } })).toBe(2);
  });

  it.each([
    ["a file that is not a PDF", "sheet.pdf", new TextEncoder().encode("<html>not a pdf</html>"), "The file is not a PDF."],
    ["an empty file", "sheet.pdf", new Uint8Array(0), "The file is empty."],
    [
      "a file over 20 MB",
      "sheet.pdf",
      (() => {
        const big = new Uint8Array(20 * 1024 * 1024 + 1);
        big.set(pdf("big"));
        return big;
      })(),
      "The file is larger than 20 MB.",
    ],
    ["a name without .pdf", "sheet.exe", pdf("x"), "Data sheets must be PDF files (.pdf)"],
  ])("refuses %s", async (_what, fileName, bytes, message) => {
    const item = await createEquipment({ viewer: acme.viewers.admin, values: moduleValues(`LK-BAD-${fileName}-${bytes.byteLength}`) });
    const error = await attachDatasheet({ viewer: acme.viewers.admin, equipmentId: item.id, fileName, bytes }).catch((e: unknown) => e);
    expect(error).toMatchObject({ code: "INVALID_INPUT", message });
    expect((await getEquipmentById({ viewer: acme.viewers.admin, equipmentId: item.id })).datasheet).toBeNull();
  });

  it("refuses coordinators and other organizations, and has no data sheet to hand out before one is attached", async () => {
    const item = await createEquipment({ viewer: acme.viewers.admin, values: moduleValues("LK-NOSHEET") });
    expect(
      await code(attachDatasheet({ viewer: acme.viewers.coordinator, equipmentId: item.id, fileName: "a.pdf", bytes: pdf("c") })),
    ).toBe("FORBIDDEN");
    expect(await code(attachDatasheet({ viewer: rival.viewers.admin, equipmentId: item.id, fileName: "a.pdf", bytes: pdf("r") }))).toBe(
      "NOT_FOUND",
    );
    expect(await code(getDatasheetLocation({ viewer: acme.viewers.admin, equipmentId: item.id }))).toBe("NOT_FOUND");
  });
});
