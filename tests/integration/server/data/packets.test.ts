import { createHash } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { AuditEvent, Equipment, Packet } from "@/models";
import { AppError } from "@/lib/errors";
import { seedDemoCatalog } from "@/lib/seed/demo-catalog";
import { DESIGN_MODELS, demoDesign, type CatalogIds } from "@/lib/seed/demo-designs";
import { saveDesignDraft } from "@/lib/server/data/designs";
import { failAbandonedPackets, getPacketFile, listPackets, requestPacket, retryPacket } from "@/lib/server/data/packets";
import { db } from "@/lib/server/db";
import { generatePacket } from "@/lib/server/jobs/generate-packet";
import { getObjectBytes, putObject } from "@/lib/server/services/storage";
import { planGenerationSteps } from "@/lib/documents/packets/generation-steps";
import { packetSheetTitles } from "@/lib/documents/packets/render";
import type { PacketInput } from "@/lib/documents/packets/input";
import { PDFDocument } from "pdf-lib";
import { closeDb } from "../../support/db";
import { makeOrganization, makeProject, type OrgFixture } from "../../support/fixtures";
import { readsOf, sqlDuring } from "../../support/query-log";

// The queue is exercised end to end by the e2e suite; here jobs run in-process.
vi.mock("@/lib/server/services/jobs", () => ({ enqueuePacketJob: vi.fn(async () => undefined), PACKET_QUEUE: "packet-generate" }));

let org: OrgFixture;
let rival: OrgFixture;
let ids: CatalogIds;
const code = async (promise: Promise<unknown>) =>
  promise.then(
    () => "resolved",
    (e: unknown) => (e instanceof AppError ? e.code : String(e)),
  );

beforeAll(async () => {
  org = await makeOrganization("Packets");
  rival = await makeOrganization("Rival packets");
  await db().transaction((t) => seedDemoCatalog(org.organization.id, t));
  const items = await Equipment.findAll({ where: { organizationId: org.organization.id } });
  ids = Object.fromEntries(Object.entries(DESIGN_MODELS).map(([k, model]) => [k, items.find((i) => i.model === model)!.id])) as CatalogIds;
});

afterAll(async () => {
  await closeDb();
});

async function projectWithDesign(modulesInSeries = "11") {
  const project = await makeProject(org, { busbarA: 200, mainBreakerA: 200, utilityAccountNumber: "BL-5550001", meterNumber: "M5550001" });
  const draft = demoDesign(ids, { busbarA: 200, mainBreakerA: 200 }, 0);
  draft.array.strings[0].modulesInSeries = modulesInSeries;
  await saveDesignDraft({ viewer: org.viewers.coordinator, projectId: project.id, draft });
  return project;
}

describe("packets", () => {
  it("generates Rev 1, stores it in S3 with a checksum that matches, then Rev 2 with its change list", async () => {
    const project = await projectWithDesign();
    const queued = await requestPacket({ viewer: org.viewers.coordinator, projectId: project.id, kind: "permit" });
    expect(queued).toMatchObject({ revision: 1, status: "queued", changes: [] });
    expect(await code(requestPacket({ viewer: org.viewers.coordinator, projectId: project.id, kind: "permit" }))).toBe("CONFLICT"); // one at a time

    await generatePacket(queued.id);
    const [rev1] = await listPackets({ viewer: org.viewers.coordinator, projectId: project.id });
    expect(rev1).toMatchObject({ revision: 1, status: "ready", progress: 100 });
    expect(rev1.pageCount).toBeGreaterThan(4);
    const file = await getPacketFile({ viewer: org.viewers.coordinator, packetId: rev1.id });
    const bytes = await getObjectBytes(file.key);
    expect(createHash("sha256").update(bytes).digest("hex")).toBe(rev1.sha256);
    expect(Buffer.from(bytes.slice(0, 5)).toString()).toBe("%PDF-");
    expect(file.fileName).toMatch(/-permit-rev1\.pdf$/);

    // A change to the design shows in Rev 2's change list.
    const draft = demoDesign(ids, { busbarA: 200, mainBreakerA: 200 }, 0);
    draft.service.pvBreakerA = "45";
    await saveDesignDraft({ viewer: org.viewers.coordinator, projectId: project.id, draft });
    const second = await requestPacket({ viewer: org.viewers.coordinator, projectId: project.id, kind: "permit" });
    expect(second.revision).toBe(2);
    expect(second.changes).toContain("PV breaker (A): 40 → 45");
    await generatePacket(second.id);
    expect((await listPackets({ viewer: org.viewers.coordinator, projectId: project.id })).map((p) => [p.revision, p.status])).toEqual([
      [2, "ready"],
      [1, "ready"],
    ]);
    expect(await AuditEvent.count({ where: { entityId: project.id, action: "packet.generated" } })).toBe(2);
  });

  it("records each step the worker takes, in order, as it starts it, with progress that only grows", async () => {
    const project = await projectWithDesign();
    const queued = await requestPacket({ viewer: org.viewers.coordinator, projectId: project.id, kind: "permit" });
    // One data sheet in storage, so the log also shows it being read and merged.
    const sheet = await PDFDocument.create();
    sheet.addPage([612, 792]);
    const key = `orgs/${org.organization.id}/test/datasheet-${queued.id}.pdf`;
    await putObject({ key, body: await sheet.save(), contentType: "application/pdf" });
    const row = (await Packet.findByPk(queued.id))!;
    const input = {
      ...(row.input as unknown as PacketInput),
      datasheets: [{ title: "NM-380B module data sheet", fileName: "nm-380b.pdf", objectKey: key }],
    };
    await row.update({ input: input as unknown as Record<string, unknown> });

    await generatePacket(queued.id);
    const done = (await Packet.findByPk(queued.id))!;
    const titles = packetSheetTitles(input);
    const planned = planGenerationSteps({ sheetTitles: titles, datasheetTitles: ["NM-380B module data sheet"] });
    expect(done.steps.map((s) => s.text)).toEqual([...planned.map((s) => s.text), "Ready"]);
    expect(done.steps[0]!.text).toBe(`Drawing sheet 1 of ${titles.length}: Cover sheet`);
    expect(done.steps.map((s) => s.progress)).toEqual([...planned.map((s) => s.progress), 100]);
    // In order, as they happened: times and progress never go back, and most steps sit strictly between 0 and 100.
    const times = done.steps.map((s) => Date.parse(s.at));
    times.slice(1).forEach((t, i) => expect(t).toBeGreaterThanOrEqual(times[i]!));
    done.steps.slice(1).forEach((s, i) => expect(s.progress).toBeGreaterThanOrEqual(done.steps[i]!.progress));
    expect(done.steps.filter((s) => s.progress > 0 && s.progress < 100).length).toBe(planned.length - 1);
    expect(done).toMatchObject({ status: "ready", progress: 100, pageCount: titles.length + 1 });
  });

  it("refuses a failing design unless a reason is written, and prints and records the reason", async () => {
    const project = await projectWithDesign("15"); // 15 × 42.5 V at −20 °C is above 600 V
    const refused = await requestPacket({ viewer: org.viewers.coordinator, projectId: project.id, kind: "interconnection" }).catch(
      (e) => e,
    );
    expect(refused.code).toBe("CONFLICT");
    expect(refused.fieldErrors.overrideReason).toBeDefined();
    const queued = await requestPacket({
      viewer: org.viewers.coordinator,
      projectId: project.id,
      kind: "interconnection",
      overrideReason: "AHJ accepted the engineer's letter for the string length",
    });
    const row = await Packet.findByPk(queued.id);
    expect((row!.input as { override: { reason: string } }).override.reason).toBe(
      "AHJ accepted the engineer's letter for the string length",
    );
    const audit = await AuditEvent.findOne({ where: { entityId: project.id, action: "packet.requested-with-override" } });
    expect(audit?.changes.overrideReason?.after).toBe("AHJ accepted the engineer's letter for the string length");
  });

  it("marks a generation that cannot finish as failed, keeps no object, and can retry it", async () => {
    const project = await projectWithDesign();
    const queued = await requestPacket({ viewer: org.viewers.coordinator, projectId: project.id, kind: "permit" });
    // A data sheet that is not in storage makes the generation fail part way.
    const row = await Packet.findByPk(queued.id);
    const input = row!.input as { datasheets: unknown[] };
    await row!.update({
      input: { ...input, datasheets: [{ title: "Missing", fileName: "missing.pdf", objectKey: "orgs/none/missing.pdf" }] },
    });
    await generatePacket(queued.id);
    const [failed] = await listPackets({ viewer: org.viewers.coordinator, projectId: project.id });
    expect(failed).toMatchObject({ status: "failed", sha256: null });
    // The attempt's log stops at the step that could not finish.
    expect((await Packet.findByPk(queued.id))!.steps.at(-1)!.text).toBe("Reading data sheet 1 of 1: Missing");
    expect(await code(getPacketFile({ viewer: org.viewers.coordinator, packetId: failed.id }))).toBe("NOT_FOUND");

    await row!.update({ input });
    await retryPacket({ viewer: org.viewers.coordinator, packetId: failed.id });
    await generatePacket(failed.id);
    expect((await listPackets({ viewer: org.viewers.coordinator, projectId: project.id }))[0]).toMatchObject({
      revision: 1,
      status: "ready",
    });
  });

  it("counts a generation abandoned by its worker as failed, so it can be retried", async () => {
    const project = await projectWithDesign();
    const queued = await requestPacket({ viewer: org.viewers.coordinator, projectId: project.id, kind: "permit" });
    await db().query(`update packets set status = 'running', updated_at = now() - interval '11 minutes' where id = :id`, {
      replacements: { id: queued.id },
    });
    // Shown as failed at once; listing never writes, the worker's maintenance does.
    const [row] = await listPackets({ viewer: org.viewers.coordinator, projectId: project.id });
    expect(row).toMatchObject({ status: "failed" });
    expect(row.error).toMatch(/Retry/);
    expect((await Packet.findByPk(queued.id))!.status).toBe("running");
    expect(await failAbandonedPackets()).toBeGreaterThanOrEqual(1);
    expect((await Packet.findByPk(queued.id))!.status).toBe("failed");
    expect((await requestPacket({ viewer: org.viewers.coordinator, projectId: project.id, kind: "permit" })).revision).toBe(1);
  });

  it("retries an abandoned generation even before maintenance marked it failed", async () => {
    const project = await projectWithDesign();
    const queued = await requestPacket({ viewer: org.viewers.coordinator, projectId: project.id, kind: "permit" });
    await db().query(`update packets set status = 'queued', updated_at = now() - interval '11 minutes' where id = :id`, {
      replacements: { id: queued.id },
    });
    const retried = await retryPacket({ viewer: org.viewers.coordinator, packetId: queued.id });
    expect(retried.status).toBe("queued");
    expect((await listPackets({ viewer: org.viewers.coordinator, projectId: project.id }))[0].status).toBe("queued");
  });

  it("marks a packet ready and audits it in one transaction: an audit row that cannot be written leaves the packet not ready", async () => {
    const project = await projectWithDesign();
    const queued = await requestPacket({ viewer: org.viewers.coordinator, projectId: project.id, kind: "interconnection" });
    const create = AuditEvent.create.bind(AuditEvent);
    const refused = vi.spyOn(AuditEvent, "create").mockImplementation(((values: { action?: string }, options?: unknown) => {
      if (values.action === "packet.generated") return Promise.reject(new Error("audit write refused"));
      return create(values as never, options as never);
    }) as typeof AuditEvent.create);
    try {
      await generatePacket(queued.id);
    } finally {
      refused.mockRestore();
    }
    const failed = (await Packet.findByPk(queued.id))!;
    // The ready mark rolled back with its audit row: no stored object, no checksum, no ready time.
    expect(failed).toMatchObject({ status: "failed", objectKey: null, sha256: null, readyAt: null, error: "audit write refused" });
    expect(await AuditEvent.count({ where: { entityId: project.id, action: "packet.generated" } })).toBe(0);

    await retryPacket({ viewer: org.viewers.coordinator, packetId: queued.id });
    await generatePacket(queued.id);
    const ready = (await Packet.findByPk(queued.id))!;
    expect(ready.status).toBe("ready");
    const audits = await AuditEvent.findAll({ where: { entityId: project.id, action: "packet.generated" } });
    expect(audits).toHaveLength(1);
    expect(audits[0]).toMatchObject({ organizationId: org.organization.id, actorId: org.viewers.coordinator.id });
    // Written in the same transaction as the ready mark: one commit stamps both with the same transaction time.
    const [[stamps]] = (await db().query(
      `select (select xmin::text from packets where id = :packet) as packet, (select xmin::text from audit_events where id = :audit) as audit`,
      { replacements: { packet: queued.id, audit: audits[0].id } },
    )) as [{ packet: string; audit: string }[], unknown];
    expect(stamps.packet).toBe(stamps.audit);
  });

  it("reads the project and its AHJ once to queue a packet, reviewing the saved design once", async () => {
    const project = await projectWithDesign();
    const { sql } = await sqlDuring(() => requestPacket({ viewer: org.viewers.coordinator, projectId: project.id, kind: "permit" }));
    expect(readsOf(sql, "projects")).toHaveLength(1);
    expect(readsOf(sql, "jurisdictions")).toHaveLength(1);
    expect(readsOf(sql, "designs")).toHaveLength(1);
  });

  it("keeps packets inside the organization and away from installers and unfinished designs", async () => {
    const project = await projectWithDesign();
    const queued = await requestPacket({ viewer: org.viewers.admin, projectId: project.id, kind: "interconnection" });
    expect(await code(listPackets({ viewer: rival.viewers.admin, projectId: project.id }))).toBe("NOT_FOUND");
    expect(await code(getPacketFile({ viewer: rival.viewers.admin, packetId: queued.id }))).toBe("NOT_FOUND");
    expect(await code(requestPacket({ viewer: org.viewers.installer, projectId: project.id, kind: "permit" }))).toBe("NOT_FOUND");
    const empty = await makeProject(org);
    expect(await code(requestPacket({ viewer: org.viewers.coordinator, projectId: empty.id, kind: "permit" }))).toBe("CONFLICT");
  });
});
