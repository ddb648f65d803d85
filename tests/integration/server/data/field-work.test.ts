import { PDFDocument } from "pdf-lib";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { AuditEvent, Equipment, OutboxMessage, ProjectFile } from "@/models";
import { AppError } from "@/lib/errors";
import { MAX_UPLOAD_BYTES } from "@/lib/field/upload-rules";
import { seedDemoCatalog } from "@/lib/seed/demo-catalog";
import { DESIGN_MODELS, demoDesign, type CatalogIds } from "@/lib/seed/demo-designs";
import { buildCommissioningDocumentInput, getCommissioning, saveCommissioning } from "@/lib/server/data/commissioning";
import { saveDesignDraft } from "@/lib/server/data/designs";
import { getProjectFileLocation, listProjectFiles, uploadProjectFile } from "@/lib/server/data/project-files";
import { db } from "@/lib/server/db";
import { getObjectBytes } from "@/lib/server/services/storage";
import { closeDb } from "../../support/db";
import { makeOrganization, makeProject, type OrgFixture } from "../../support/fixtures";
import { readsOf, sqlDuring } from "../../support/query-log";

let org: OrgFixture;
let rival: OrgFixture;
let ids: CatalogIds;
const PROFILE = "IEEE 1547-2018 Category B";
const code = async (promise: Promise<unknown>) =>
  promise.then(
    () => "resolved",
    (e: unknown) => (e instanceof AppError ? e.code : String(e)),
  );

beforeAll(async () => {
  org = await makeOrganization("Field");
  rival = await makeOrganization("Rival field");
  await org.utility.update({ acceptedGridProfiles: [PROFILE, "IEEE 1547-2018 Category B, volt-watt on"] });
  await db().transaction((t) => seedDemoCatalog(org.organization.id, t));
  const items = await Equipment.findAll({ where: { organizationId: org.organization.id } });
  ids = Object.fromEntries(Object.entries(DESIGN_MODELS).map(([k, model]) => [k, items.find((i) => i.model === model)!.id])) as CatalogIds;
});

afterAll(async () => {
  await closeDb();
});

/**
 * A project assigned to the fixture installer, with a demo design: variant 0 is a string inverter with
 * 2 strings of 11 behind shutdown devices that do not report; variant 1 has 2 strings of 10 optimizers that do.
 */
async function assignedProject(variant = 0) {
  const project = await makeProject(org, { installerId: org.users.installer.id, busbarA: 200, mainBreakerA: 200 });
  await saveDesignDraft({
    viewer: org.viewers.coordinator,
    projectId: project.id,
    draft: demoDesign(ids, { busbarA: 200, mainBreakerA: 200 }, variant),
  });
  return project;
}

type Facts = Awaited<ReturnType<typeof getCommissioning>>["facts"];

// At a 40 °C module, 11 × 37.2 × (1 + 15 × −0.0027) = 392.8 V (the demo module's data sheet, 690.7(A)(1) arithmetic).
function passingReadings(facts: Facts) {
  const ids = [...new Set([...facts.stringTests.map((s) => s.id), ...facts.strings.map((s) => s.id)])];
  return {
    vocTemperature: { tempC: "40", source: "module" as const },
    strings: ids.map((id) => {
      const tested = facts.stringTests.find((s) => s.id === id);
      const shutDown = facts.strings.find((s) => s.id === id);
      return {
        id,
        polarity: "correct" as const,
        vocV: tested?.vocApplies ? String(Math.round(tested.modulesInSeries * 37.2 * (1 - 0.0405) * 10) / 10) : "",
        insulationMohm: "250",
        devicesFound: "",
        measuredV: shutDown ? String(shutDown.devicesInSeries * (shutDown.perDeviceV ?? 1) - 0.3) : "",
      };
    }),
    inverters: facts.inverters.map((u) => ({ id: u.id, serial: "QN0730411", cardSerial: "qn-0730411", activated: true })),
    gridProfileSet: "IEEE 1547-2018 Cat B default", // typed as "other": compared loosely with the accepted profile
    devicesFound: facts.pairing ? String(facts.pairing.installed) : "",
    acVoltageV: "242",
    modulesReporting: facts.moduleMonitoring ? String(facts.modulesInstalled) : "",
    firstPowerW: String(Math.round(facts.acRatingW * 0.6)),
    firstPowerTime: "12:30",
    rapidShutdown: { boundary: "outside" as const, measuredV: "12", seconds: "9" },
  };
}

const pdfBytes = async () => {
  const doc = await PDFDocument.create();
  doc.addPage([612, 792]);
  return new Uint8Array(await doc.save());
};
// A Windows executable's first bytes ("MZ" header), as a renamed .exe would carry.
const executableBytes = () =>
  new Uint8Array([
    0x4d,
    0x5a,
    0x90,
    0x00,
    0x03,
    0x00,
    0x00,
    0x00,
    0x04,
    0x00,
    0x00,
    0x00,
    0xff,
    0xff,
    0x00,
    0x00,
    ...new Array(200).fill(0),
  ]);
const PNG_1PX = Buffer.from("iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mP8z8BQDwAEhQGAhKmMIQAAAABJRU5ErkJggg==", "base64");

describe("commissioning record", () => {
  it("starts empty with one line per string of the design, and is checked against the design", async () => {
    const project = await assignedProject();
    const record = await getCommissioning({ viewer: org.viewers.installer, projectId: project.id });
    expect(record.status).toBe("open");
    expect(record.facts).toMatchObject({
      acceptedGridProfiles: [PROFILE, "IEEE 1547-2018 Category B, volt-watt on"],
      nominalServiceV: 240,
      modulesInstalled: 22,
      moduleMonitoring: false,
      pairing: null,
    });
    expect(record.facts.strings.map((s) => [s.id, s.devicesInSeries])).toEqual([
      ["S1", 11],
      ["S2", 11],
    ]);
    expect(record.facts.stringTests.map((s) => [s.id, s.modulesInSeries, s.vocApplies])).toEqual([
      ["S1", 11, true],
      ["S2", 11, true],
    ]);
    expect(record.facts.inverters).toEqual([{ id: "inv-1", label: "Inverter", model: "Quillon QS-7600" }]);
    expect(record.completion.complete).toBe(false);
    expect(record.results.every((r) => r.reading === "missing")).toBe(true);
  });

  it("is hidden from an installer not assigned and from another organization", async () => {
    const project = await assignedProject();
    expect(await code(getCommissioning({ viewer: org.viewers.otherInstaller, projectId: project.id }))).toBe("NOT_FOUND");
    expect(await code(getCommissioning({ viewer: rival.viewers.admin, projectId: project.id }))).toBe("NOT_FOUND");
    expect(await code(saveCommissioning({ viewer: org.viewers.otherInstaller, input: { projectId: project.id, readings: {} } }))).toBe(
      "NOT_FOUND",
    );
  });

  it("saves a failing reading but refuses to complete, then completes once it is corrected", async () => {
    const project = await assignedProject();
    const { facts } = await getCommissioning({ viewer: org.viewers.installer, projectId: project.id });
    const readings = { ...passingReadings(facts), acVoltageV: "262" }; // above Range A and B for 240 V (ANSI C84.1, from memory)
    const refused = await saveCommissioning({ viewer: org.viewers.installer, input: { projectId: project.id, readings, complete: true } });
    expect(refused.status).toBe("open");
    expect(refused.completeRefused).toMatch(/1 failing/);
    expect(refused.results.find((r) => r.id === "ac-voltage")).toMatchObject({ status: "fail", value: 262 });

    // Resuming later shows what was saved.
    const resumed = await getCommissioning({ viewer: org.viewers.installer, projectId: project.id });
    expect(resumed.readings.acVoltageV).toBe(262);
    expect(resumed.readings.rapidShutdown).toEqual({ boundary: "outside", measuredV: 12, seconds: 9 });
    expect(resumed.readings.inverters).toEqual([{ id: "inv-1", serial: "QN0730411", cardSerial: "qn-0730411", activated: true }]);
    expect(resumed.readings.strings[0]).toMatchObject({ id: "S1", polarity: "correct", insulationMohm: 250 });
    expect(resumed.readings.vocTemperature).toEqual({ tempC: 40, source: "module" });

    const done = await saveCommissioning({
      viewer: org.viewers.installer,
      input: { projectId: project.id, readings: { ...readings, acVoltageV: "241" }, complete: true },
    });
    expect(done.completeRefused).toBeNull();
    expect(done.status).toBe("complete");
    expect(done.completedAt).not.toBeNull();
    expect(await AuditEvent.count({ where: { entityId: project.id, action: "commissioning.completed" } })).toBe(1);

    // A later change that fails reopens the record.
    const reopened = await saveCommissioning({
      viewer: org.viewers.installer,
      input: { projectId: project.id, readings: { ...readings, acVoltageV: "200" } },
    });
    expect(reopened.status).toBe("open");
    expect(await AuditEvent.count({ where: { entityId: project.id, action: "commissioning.reopened" } })).toBe(1);
  });

  it("completes without a modules-reporting count where the system has no module-level monitoring", async () => {
    const project = await assignedProject(0);
    const { facts } = await getCommissioning({ viewer: org.viewers.installer, projectId: project.id });
    const done = await saveCommissioning({
      viewer: org.viewers.installer,
      input: { projectId: project.id, readings: passingReadings(facts), complete: true },
    });
    expect(done.status).toBe("complete");
    expect(done.results.some((r) => r.kind === "modules-reporting" || r.kind === "device-pairing")).toBe(false);
    expect(done.results.find((r) => r.id === "grid-profile")).toMatchObject({ status: "pass" });
    expect(done.results.filter((r) => r.kind === "string-voc").map((r) => r.status)).toEqual(["pass", "pass"]);
  });

  it("refuses to complete while the activation card names another serial or the strings fail their tests", async () => {
    const project = await assignedProject(0);
    const { facts } = await getCommissioning({ viewer: org.viewers.installer, projectId: project.id });
    const good = passingReadings(facts);
    const wrongCard = { ...good, inverters: [{ ...good.inverters[0]!, cardSerial: "QN0730412" }] };
    const refused = await saveCommissioning({
      viewer: org.viewers.installer,
      input: { projectId: project.id, readings: wrongCard, complete: true },
    });
    expect(refused).toMatchObject({ status: "open", completion: { failing: ["inverter-serial:inv-1"] } });
    const wet = {
      ...good,
      strings: good.strings.map((s, i) => (i === 0 ? { ...s, insulationMohm: "0.4", polarity: "reversed" as const } : s)),
    };
    const alsoRefused = await saveCommissioning({
      viewer: org.viewers.installer,
      input: { projectId: project.id, readings: wet, complete: true },
    });
    expect(alsoRefused.completion.failing).toEqual(["string-polarity:S1", "string-insulation:S1"]);
    expect(
      (await saveCommissioning({ viewer: org.viewers.installer, input: { projectId: project.id, readings: good, complete: true } })).status,
    ).toBe("complete");
  });

  it("with devices that report: a shortfall of devices found waits, then completes once all are found and every module reports", async () => {
    const project = await assignedProject(1);
    const { facts } = await getCommissioning({ viewer: org.viewers.installer, projectId: project.id });
    expect(facts).toMatchObject({ moduleMonitoring: true, pairing: { word: "optimizers", installed: 20 } });
    expect(facts.stringTests.every((s) => !s.vocApplies)).toBe(true); // optimizer strings: no Voc test
    const good = passingReadings(facts);
    const waiting = await saveCommissioning({
      viewer: org.viewers.installer,
      input: { projectId: project.id, readings: { ...good, devicesFound: "18" }, complete: true },
    });
    expect(waiting).toMatchObject({ status: "open", completion: { failing: [], missing: [], waiting: ["device-pairing"] } });
    expect(waiting.completeRefused).toMatch(/1 waiting/);
    const done = await saveCommissioning({
      viewer: org.viewers.installer,
      input: { projectId: project.id, readings: good, complete: true },
    });
    expect(done.status).toBe("complete");
    expect(done.results.find((r) => r.id === "modules-reporting")).toMatchObject({ status: "pass", value: 20 });
  });

  it("rejects a reading that is not a number with the field named, saving nothing", async () => {
    const project = await assignedProject();
    const error = await saveCommissioning({
      viewer: org.viewers.installer,
      input: { projectId: project.id, readings: { acVoltageV: "two-forty" } },
    }).catch((e) => e);
    expect(error.issues?.[0]?.path).toEqual(["readings", "acVoltageV"]);
    expect((await getCommissioning({ viewer: org.viewers.installer, projectId: project.id })).updatedAt).toBeNull();
  });

  it("gathers what the certificate prints from the saved record", async () => {
    const project = await assignedProject();
    const { facts } = await getCommissioning({ viewer: org.viewers.installer, projectId: project.id });
    await saveCommissioning({
      viewer: org.viewers.installer,
      input: { projectId: project.id, readings: passingReadings(facts), complete: true },
    });
    const input = await buildCommissioningDocumentInput({ viewer: org.viewers.installer, projectId: project.id, kind: "certificate" });
    expect(input.installer).toMatchObject({ name: "Ivo Installer" });
    expect(input.system.moduleSummary).toMatch(/^22 × /);
    expect(input.record.inverters).toEqual([
      { id: "inv-1", label: "Inverter", model: "Quillon QS-7600", serial: "QN0730411", cardSerial: "qn-0730411", activated: true },
    ]);
    expect(input.record.stringTests?.map((s) => s.insulationMohm)).toEqual([250, 250]);
    expect(input.completion.complete).toBe(true);
    expect(input.completedAt).not.toBeNull();
  });

  it("checks the record and prints its documents against one read of the project and one review of its design", async () => {
    const project = await assignedProject();
    const looks: [string, () => Promise<unknown>][] = [
      ["the record", () => getCommissioning({ viewer: org.viewers.installer, projectId: project.id })],
      [
        "the certificate",
        () => buildCommissioningDocumentInput({ viewer: org.viewers.installer, projectId: project.id, kind: "certificate" }),
      ],
    ];
    for (const [what, work] of looks) {
      const { sql } = await sqlDuring(work);
      expect(readsOf(sql, "projects"), what).toHaveLength(1);
      expect(readsOf(sql, "designs"), what).toHaveLength(1);
      expect(readsOf(sql, "jurisdictions"), what).toHaveLength(1);
    }
  });
});

describe("field uploads", () => {
  it("stores a signed PDF under a server-made key and puts a notice to the coordinator in the outbox", async () => {
    const project = await assignedProject();
    const bytes = await pdfBytes();
    const before = await OutboxMessage.count({ where: { toAddress: org.users.coordinator.email } });
    const file = await uploadProjectFile({
      viewer: org.viewers.installer,
      projectId: project.id,
      kind: "signed-completion",
      fileName: "../../etc/Signed form.PDF",
      bytes,
    });
    expect(file).toMatchObject({
      kind: "signed-completion",
      fileName: "Signed form.pdf",
      contentType: "application/pdf",
      sizeBytes: bytes.length,
      uploadedBy: "Ivo Installer",
    });
    const location = await getProjectFileLocation({ viewer: org.viewers.coordinator, projectId: project.id, fileId: file.id });
    expect(location.key).toMatch(new RegExp(`^projects/${project.id}/field/[0-9a-f-]{36}\\.pdf$`));
    expect(Buffer.from(await getObjectBytes(location.key))).toEqual(Buffer.from(bytes));
    const mail = await OutboxMessage.findAll({ where: { toAddress: org.users.coordinator.email }, order: [["createdAt", "DESC"]] });
    expect(mail.length).toBe(before + 1);
    expect(mail[0].subject).toMatch(/Signed completion form received/);
    expect(mail[0].textBody).toContain(`/projects/${project.id}/field`);
  });

  it("refuses a renamed executable, a PDF as a site photo, an empty and an oversize file, and saves nothing", async () => {
    const project = await assignedProject();
    const viewer = org.viewers.installer;
    const outboxBefore = await OutboxMessage.count();
    const refused = await uploadProjectFile({
      viewer,
      projectId: project.id,
      kind: "signed-completion",
      fileName: "signed.pdf",
      bytes: executableBytes(),
    }).catch((e) => e);
    expect(refused).toMatchObject({ code: "UNSUPPORTED_TYPE" });
    expect(refused.message).toMatch(/not PDF, JPEG or PNG/);
    expect(
      await code(uploadProjectFile({ viewer, projectId: project.id, kind: "site-photo", fileName: "roof.png", bytes: await pdfBytes() })),
    ).toBe("UNSUPPORTED_TYPE");
    expect(
      await code(uploadProjectFile({ viewer, projectId: project.id, kind: "site-photo", fileName: "empty.png", bytes: new Uint8Array() })),
    ).toBe("INVALID_INPUT");
    const big = new Uint8Array(MAX_UPLOAD_BYTES + 1);
    big.set(PNG_1PX);
    expect(await code(uploadProjectFile({ viewer, projectId: project.id, kind: "site-photo", fileName: "big.png", bytes: big }))).toBe(
      "TOO_LARGE",
    );
    expect(await ProjectFile.count({ where: { projectId: project.id } })).toBe(0);
    expect(await OutboxMessage.count()).toBe(outboxBefore);
  });

  it("accepts a PNG site photo whatever its name says, and keeps files to the project's viewers", async () => {
    const project = await assignedProject();
    const photo = await uploadProjectFile({
      viewer: org.viewers.installer,
      projectId: project.id,
      kind: "site-photo",
      fileName: "array.jpeg",
      bytes: new Uint8Array(PNG_1PX),
    });
    expect(photo).toMatchObject({ contentType: "image/png", fileName: "array.png" });
    expect((await listProjectFiles({ viewer: org.viewers.coordinator, projectId: project.id })).map((f) => f.id)).toEqual([photo.id]);
    expect(await code(listProjectFiles({ viewer: org.viewers.otherInstaller, projectId: project.id }))).toBe("NOT_FOUND");
    expect(await code(getProjectFileLocation({ viewer: rival.viewers.admin, projectId: project.id, fileId: photo.id }))).toBe("NOT_FOUND");
    expect(
      await code(
        uploadProjectFile({
          viewer: org.viewers.otherInstaller,
          projectId: project.id,
          kind: "site-photo",
          fileName: "x.png",
          bytes: new Uint8Array(PNG_1PX),
        }),
      ),
    ).toBe("NOT_FOUND");
  });
});
