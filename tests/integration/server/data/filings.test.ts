// Filings through the data layer: the stage follows the facts (DESIGN.md §3), the project's waiting-on
// follows its filings, and nothing is approved without the authority's reference number.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  AuditEvent,
  CommissioningRecord,
  Design,
  Filing,
  Jurisdiction,
  Packet,
  Project,
  ProjectFile,
  StageChange,
  Utility,
} from "@/models";
import { AppError } from "@/lib/errors";
import { db } from "@/lib/server/db";
import {
  addFiling,
  answerFilingItem,
  answeredSinceLastSending,
  attachRoundLetter,
  changeFilingStatus,
  ensureDefaultFilings,
  listProjectFilings,
  markRevisionNeeded,
  recordCorrectionRound,
  recordInspectionResult,
  recordPto,
  scheduleInspection,
} from "@/lib/server/data/filings";
import { refreshProjectFacts } from "@/lib/server/data/project-facts";
import { uploadProjectFile } from "@/lib/server/data/project-files";
import { changeProjectStage, listProjects, setProjectHold } from "@/lib/server/data/projects";
import { ProjectListQuery } from "@/lib/schemas/project";
import { closeDb } from "../../support/db";
import { makeOrganization, makeProject, type OrgFixture } from "../../support/fixtures";

let org: OrgFixture;
let rival: OrgFixture;

const failure = async (promise: Promise<unknown>) =>
  promise.then(
    () => null,
    (e: unknown) =>
      e instanceof AppError
        ? { code: e.code, message: e.message, fields: Object.keys(e.fieldErrors ?? {}) }
        : { code: String(e), message: "", fields: [] },
  );

beforeAll(async () => {
  org = await makeOrganization("Filings");
  rival = await makeOrganization("Rival filings");
});

afterAll(async () => {
  await closeDb();
});

/** A project with its default filings, a design that passes its review, and ready packets of each kind. */
async function filedProject() {
  const project = await makeProject(org, { installerId: org.users.installer.id });
  await Design.create({
    organizationId: org.organization.id,
    projectId: project.id,
    draft: {},
    reviewStatus: "pass",
    reviewSummary: null,
    updatedById: null,
  });
  await db().transaction((transaction) => ensureDefaultFilings(project, { transaction, actorId: null }));
  const packet = (kind: "permit" | "interconnection", revision: number) =>
    Packet.create({
      organizationId: org.organization.id,
      projectId: project.id,
      kind,
      revision,
      status: "ready",
      input: {},
      overrideReason: null,
      requestedById: null,
    });
  const packets = {
    permit1: await packet("permit", 1),
    permit2: await packet("permit", 2),
    interconnection1: await packet("interconnection", 1),
  };
  const filings = await Filing.findAll({ where: { projectId: project.id } });
  const permit = filings.find((f) => f.kind === "permit")!;
  const interconnection = filings.find((f) => f.kind === "interconnection")!;
  return { project, packets, permit, interconnection };
}

const coordinator = () => org.viewers.coordinator;
const stageOf = async (projectId: string) => (await Project.findByPk(projectId))!;

describe("filings", () => {
  it("gives every project a permit and an interconnection filing for its AHJ and utility, once", async () => {
    const { project } = await filedProject();
    await db().transaction((transaction) => ensureDefaultFilings(project, { transaction, actorId: null }));
    const { filings } = await listProjectFilings({ viewer: coordinator(), projectId: project.id });
    expect(filings.map((f) => [f.kind, f.authority.kind, f.status])).toEqual([
      ["permit", "ahj", "preparing"],
      ["interconnection", "utility", "preparing"],
    ]);
    expect(filings[0]!.authority.name).toBe(org.jurisdiction.name);
  });

  it("moves a filing nobody sent yet to the project's new AHJ, and leaves one that went in with its authority", async () => {
    const { project, packets, interconnection } = await filedProject();
    // The customer has not signed Rev 1's application here: filing it is refused until the coordinator says why.
    const unsigned = {
      filingId: interconnection.id,
      status: "submitted" as const,
      packetId: packets.interconnection1.id,
      sentTo: "",
      note: "",
    };
    const refused = await changeFilingStatus({ viewer: coordinator(), input: unsigned }).catch((e: AppError) => e);
    expect(refused).toMatchObject({ code: "INVALID_INPUT", fieldErrors: { unsignedReason: [expect.stringContaining("has not signed")] } });
    expect((await Filing.findByPk(interconnection.id))!.status).toBe("preparing");
    await changeFilingStatus({
      viewer: coordinator(),
      input: { ...unsigned, unsignedReason: "Signed on the utility's paper form at the kitchen table" },
    });
    const audit = await AuditEvent.findOne({
      where: { entityId: interconnection.id, action: "filing.status-changed" },
      order: [["createdAt", "DESC"]],
    });
    expect(audit!.changes.filedWithoutCustomerSignature).toEqual({
      before: null,
      after: "Signed on the utility's paper form at the kitchen table",
    });
    const ahj = await Jurisdiction.create({
      organizationId: org.organization.id,
      name: `Second AHJ ${org.tag}`,
      state: "CO",
      necEdition: 2023,
      recordLowTempC: -20,
      highDesignTempC: 33,
      notes: "",
    });
    const utility = await Utility.create({
      organizationId: org.organization.id,
      name: `Second utility ${org.tag}`,
      serviceVoltages: [],
      notes: "",
    });
    await project.update({ jurisdictionId: ahj.id, utilityId: utility.id });
    await db().transaction((transaction) => ensureDefaultFilings(project, { transaction, actorId: null }));
    const { filings } = await listProjectFilings({ viewer: coordinator(), projectId: project.id });
    expect(filings.map((f) => [f.kind, f.authority.id, f.authority.name])).toEqual([
      ["permit", ahj.id, ahj.name],
      ["interconnection", org.utility.id, org.utility.name],
    ]);
  });

  it("refuses to approve a filing without the authority's reference number, and keeps it unchanged", async () => {
    const { project, packets, permit } = await filedProject();
    await changeFilingStatus({
      viewer: coordinator(),
      input: { filingId: permit.id, status: "submitted", packetId: packets.permit1.id, sentTo: "", note: "" },
    });
    const refused = await failure(
      changeFilingStatus({ viewer: coordinator(), input: { filingId: permit.id, status: "approved", sentTo: "", note: "" } }),
    );
    expect(refused).toMatchObject({ code: "INVALID_INPUT", fields: ["referenceNumber"] });
    expect((await Filing.findByPk(permit.id))!.status).toBe("submitted");
    expect((await stageOf(project.id)).stage).toBe("permit_filed");
  });

  it("needs the packet revision to submit, of the filing's own kind", async () => {
    const { packets, permit } = await filedProject();
    expect(
      await failure(
        changeFilingStatus({ viewer: coordinator(), input: { filingId: permit.id, status: "submitted", sentTo: "", note: "" } }),
      ),
    ).toMatchObject({ fields: ["packetRevision"] });
    expect(
      await failure(
        changeFilingStatus({
          viewer: coordinator(),
          input: { filingId: permit.id, status: "submitted", packetId: packets.interconnection1.id, sentTo: "", note: "" },
        }),
      ),
    ).toMatchObject({
      fields: ["packetId"],
    });
  });

  it("walks the whole job: the stage moves by itself and the project waits on the right party at each step", async () => {
    const { project, packets, permit, interconnection } = await filedProject();
    const v = coordinator();
    const waiting = async () => (await stageOf(project.id)).waitingOn;
    expect(await waiting()).toBe("office");

    // Both go in the same day.
    await changeFilingStatus({
      viewer: v,
      input: {
        filingId: permit.id,
        status: "submitted",
        packetId: packets.permit1.id,
        channel: "portal",
        sentTo: "plan review desk",
        note: "",
      },
    });
    await changeFilingStatus({
      viewer: v,
      input: {
        filingId: interconnection.id,
        status: "submitted",
        packetId: packets.interconnection1.id,
        channel: "email",
        sentTo: "",
        note: "",
        unsignedReason: "Customer signed the paper application",
      },
    });
    expect((await stageOf(project.id)).stage).toBe("permit_filed");
    expect(await waiting()).toBe("ahj");
    expect((await packets.permit1.reload()).sentTo).toEqual([permit.authorityName]); // the Documents page marks it as sent
    expect((await packets.permit2.reload()).sentTo).toEqual([]);
    const submitted = (await Filing.findByPk(permit.id))!;
    expect(submitted.nextFollowUpOn).not.toBeNull(); // from the AHJ profile's usual review time

    // Round 1 with two items; one answered by a design revision.
    const { number } = await recordCorrectionRound({
      viewer: v,
      input: {
        filingId: permit.id,
        receivedOn: "2026-03-10",
        items: [
          { text: "Show the rapid shutdown initiator location.", reference: "PV-3" },
          { text: "Label the AC disconnect.", reference: "NEC 690.13(B)" },
        ],
      },
    });
    expect(number).toBe(1);
    expect(await waiting()).toBe("office");
    const listed = await listProjectFilings({ viewer: v, projectId: project.id });
    const [first, second] = listed.filings[0]!.rounds[0]!.items;
    expect(
      await failure(
        changeFilingStatus({
          viewer: v,
          input: { filingId: permit.id, status: "resubmitted", packetId: packets.permit2.id, sentTo: "", note: "" },
        }),
      ),
    ).toMatchObject({ fields: ["rounds"] });
    await answerFilingItem({
      viewer: v,
      input: { itemId: first!.id, response: "Initiator added beside the service on sheet PV-3.", designRevision: 1 },
    });
    await answerFilingItem({ viewer: v, input: { itemId: second!.id, response: "Label added to the label sheet." } });
    // The next permit revision's change list names both answers; the interconnection packet answers none.
    expect(await answeredSinceLastSending(project.id, "permit")).toEqual([
      {
        round: 1,
        position: 0,
        text: "Show the rapid shutdown initiator location.",
        reference: "PV-3",
        response: "Initiator added beside the service on sheet PV-3.",
      },
      { round: 1, position: 1, text: "Label the AC disconnect.", reference: "NEC 690.13(B)", response: "Label added to the label sheet." },
    ]);
    expect(await answeredSinceLastSending(project.id, "interconnection")).toEqual([]);
    await changeFilingStatus({
      viewer: v,
      input: { filingId: permit.id, status: "resubmitted", packetId: packets.permit2.id, sentTo: "", note: "" },
    });
    expect(await waiting()).toBe("ahj");
    const afterRound = await listProjectFilings({ viewer: v, projectId: project.id });
    expect(afterRound.filings[0]).toMatchObject({ status: "resubmitted", packetRevision: 2 });
    expect(afterRound.filings[0]!.rounds[0]).toMatchObject({ revisionAtReceipt: 1, resubmittedRevision: 2 });
    expect(afterRound.filings[0]!.rounds[0]!.answeredAt).not.toBeNull();
    expect(await answeredSinceLastSending(project.id, "permit")).toEqual([]); // sent back: a later revision does not repeat them

    // Approved with its number: the stage moves by itself, and the crew is up.
    await changeFilingStatus({
      viewer: v,
      input: { filingId: permit.id, status: "approved", referenceNumber: "BP-26-0412", on: "2026-03-20", sentTo: "", note: "" },
    });
    let p = await stageOf(project.id);
    expect(p.stage).toBe("permit_issued");
    expect(p.waitingOn).toBe("crew");
    expect((await Filing.findByPk(permit.id))!.expiresOn).toBe("2026-09-16"); // 180 days, the profile's default

    // A failed final inspection, then a passed re-inspection.
    const { inspectionId } = await scheduleInspection({
      viewer: v,
      input: {
        filingId: permit.id,
        kind: "final",
        scheduledFor: "2026-04-02",
        timeWindow: "8–12",
        inspectorName: "",
        reinspectionOfId: undefined,
      },
      now: new Date("2026-03-30T15:00:00Z"),
    });
    expect(await waiting()).toBe("crew"); // booked: the crew has until the day
    await db().transaction((transaction) => refreshProjectFacts(project.id, { transaction, now: new Date("2026-04-03T15:00:00Z") }));
    expect(await waiting()).toBe("ahj"); // the day passed with no result recorded
    await recordInspectionResult({
      viewer: v,
      input: {
        inspectionId,
        result: "failed",
        resultOn: "2026-04-02",
        inspectorName: "R. Vale",
        notes: "",
        items: [{ text: "Conduit strap missing at the roof edge", reference: "" }],
      },
    });
    p = await stageOf(project.id);
    expect(p.stage).toBe("installed"); // an inspection happened, so the work is built
    expect(p.waitingOn).toBe("crew");
    const re = await scheduleInspection({
      viewer: v,
      input: {
        filingId: permit.id,
        kind: "final",
        scheduledFor: "2026-04-09",
        timeWindow: "",
        inspectorName: "",
        reinspectionOfId: inspectionId,
      },
    });
    await recordInspectionResult({
      viewer: v,
      input: { inspectionId: re.inspectionId, result: "passed", resultOn: "2026-04-09", inspectorName: "", notes: "", items: [] },
    });
    expect((await stageOf(project.id)).stage).toBe("utility_filed"); // the interconnection went in on day one

    // The utility approves; the field record is completed; PTO.
    await changeFilingStatus({
      viewer: v,
      input: { filingId: interconnection.id, status: "approved", referenceNumber: "IA-55120", sentTo: "", note: "" },
    });
    expect((await stageOf(project.id)).stage).toBe("utility_approved");
    expect(await waiting()).toBe("crew");
    await CommissioningRecord.create({
      organizationId: org.organization.id,
      projectId: project.id,
      readings: {},
      status: "complete",
      completedAt: new Date("2026-04-15T18:00:00Z"),
      updatedById: null,
    });
    await db().transaction((transaction) => refreshProjectFacts(project.id, { transaction }));
    expect((await stageOf(project.id)).stage).toBe("commissioned");
    expect(await waiting()).toBe("utility");
    await recordPto({ viewer: v, input: { filingId: interconnection.id, ptoOn: "2026-04-22" } });
    p = await stageOf(project.id);
    expect(p.stage).toBe("pto_received");
    expect(p.waitingOn).toBeNull();

    // The timeline names the facts that moved the stage.
    const moves = await StageChange.findAll({ where: { projectId: project.id, cause: "facts" }, order: [["createdAt", "ASC"]] });
    expect(moves.map((m) => m.toStage)).toEqual([
      "permit_filed",
      "permit_issued",
      "installed",
      "utility_filed",
      "utility_approved",
      "commissioned",
      "pto_received",
    ]);
    expect(moves.find((m) => m.toStage === "permit_issued")!.note).toBe("Permit issued with its number");
    expect(await AuditEvent.count({ where: { entityType: "filing", entityId: permit.id } })).toBeGreaterThanOrEqual(8);
  });

  it("books inspections only under an issued permit, and a re-inspection only of a failed one", async () => {
    const { packets, permit } = await filedProject();
    const v = coordinator();
    expect(
      await failure(
        scheduleInspection({
          viewer: v,
          input: { filingId: permit.id, kind: "final", scheduledFor: "2026-04-02", timeWindow: "", inspectorName: "" },
        }),
      ),
    ).toMatchObject({ code: "CONFLICT" });
    await changeFilingStatus({
      viewer: v,
      input: { filingId: permit.id, status: "submitted", packetId: packets.permit1.id, sentTo: "", note: "" },
    });
    await changeFilingStatus({
      viewer: v,
      input: { filingId: permit.id, status: "approved", referenceNumber: "BP-1", sentTo: "", note: "" },
    });
    expect(
      await failure(
        scheduleInspection({
          viewer: v,
          input: { filingId: permit.id, kind: "meter_set", scheduledFor: "2026-04-02", timeWindow: "", inspectorName: "" },
        }),
      ),
    ).toMatchObject({ fields: ["kind"] });
    const { inspectionId } = await scheduleInspection({
      viewer: v,
      input: { filingId: permit.id, kind: "rough", scheduledFor: "2026-04-02", timeWindow: "", inspectorName: "" },
    });
    expect(
      await failure(
        scheduleInspection({
          viewer: v,
          input: {
            filingId: permit.id,
            kind: "final",
            scheduledFor: "2026-04-09",
            timeWindow: "",
            inspectorName: "",
            reinspectionOfId: inspectionId,
          },
        }),
      ),
    ).toMatchObject({
      fields: ["reinspectionOfId"],
    });
    expect(
      await failure(
        recordInspectionResult({
          viewer: v,
          input: { inspectionId, result: "failed", resultOn: "2026-04-02", inspectorName: "", notes: "", items: [] },
        }),
      ),
    ).toMatchObject({ fields: ["items"] });
  });

  it("keeps the authority's comment letter with its round: a comment letter of the same project, uploaded by the office", async () => {
    const { project, packets, permit } = await filedProject();
    const v = coordinator();
    await changeFilingStatus({
      viewer: v,
      input: { filingId: permit.id, status: "submitted", packetId: packets.permit1.id, sentTo: "", note: "" },
    });
    const file = (kind: "comment-letter" | "site-photo", projectId = project.id) =>
      ProjectFile.create({
        organizationId: org.organization.id,
        projectId,
        kind,
        objectKey: `projects/${projectId}/letters/fixture-${kind}.pdf`,
        fileName: `${kind}.pdf`,
        contentType: "application/pdf",
        sizeBytes: 10,
        sha256: "0".repeat(64),
        uploadedById: v.id,
      });
    const photo = await file("site-photo");
    expect(
      await failure(
        recordCorrectionRound({
          viewer: v,
          input: {
            filingId: permit.id,
            receivedOn: "2026-03-10",
            letterFileId: photo.id,
            items: [{ text: "Show the setbacks.", reference: "" }],
          },
        }),
      ),
    ).toMatchObject({ code: "INVALID_INPUT", fields: ["letterFileId"] });
    const { roundId } = await recordCorrectionRound({
      viewer: v,
      input: { filingId: permit.id, receivedOn: "2026-03-10", items: [{ text: "Show the setbacks.", reference: "" }] },
    });
    const elsewhere = await file("comment-letter", (await makeProject(org)).id);
    expect(await failure(attachRoundLetter({ viewer: v, input: { roundId, letterFileId: elsewhere.id } }))).toMatchObject({
      code: "INVALID_INPUT",
    });
    const letter = await file("comment-letter");
    expect(await failure(attachRoundLetter({ viewer: org.viewers.installer, input: { roundId, letterFileId: letter.id } }))).toMatchObject({
      code: "FORBIDDEN",
    });
    await attachRoundLetter({ viewer: v, input: { roundId, letterFileId: letter.id } });
    const [round] = (await listProjectFilings({ viewer: v, projectId: project.id })).filings[0]!.rounds;
    expect(round).toMatchObject({ letterFileId: letter.id, letterFileName: "comment-letter.pdf" });
    expect(await AuditEvent.count({ where: { entityId: permit.id, action: "filing.letter-attached" } })).toBe(1);
    // Only the office uploads a letter; the crew's uploads are the field record.
    expect(
      await failure(
        uploadProjectFile({
          viewer: org.viewers.installer,
          projectId: project.id,
          kind: "comment-letter",
          fileName: "letter.pdf",
          bytes: new TextEncoder().encode("%PDF-1.4"),
        }),
      ),
    ).toMatchObject({ code: "FORBIDDEN" });
  });

  it("adds another approval from an authority profile or a named body, and an HOA reviewing holds the built project", async () => {
    const { project, permit } = await filedProject();
    const v = coordinator();
    const { filingId } = await addFiling({
      viewer: v,
      input: { projectId: project.id, title: "HOA approval", authority: "other", authorityName: "Juniper Hollow HOA" },
    });
    const electrical = await addFiling({
      viewer: v,
      input: {
        projectId: project.id,
        title: "Separate electrical permit",
        authority: `jurisdiction:${project.jurisdictionId}`,
        authorityName: "",
      },
    });
    const listed = (await listProjectFilings({ viewer: v, projectId: project.id })).filings;
    expect(listed.map((f) => [f.kind, f.title, f.authority.kind, f.authority.name])).toEqual([
      ["permit", "", "ahj", permit.authorityName],
      ["interconnection", "", "utility", expect.any(String)],
      ["other", "HOA approval", "other", "Juniper Hollow HOA"],
      ["other", "Separate electrical permit", "ahj", permit.authorityName],
    ]);
    expect(listed[3]!.id).toBe(electrical.filingId);
    // A body that approves without a packet: submitted with no revision, and it holds the project once nothing else does.
    await changeFilingStatus({ viewer: v, input: { filingId, status: "submitted", sentTo: "Architectural committee", note: "" } });
    expect((await listProjectFilings({ viewer: v, projectId: project.id })).filings[2]).toMatchObject({ status: "submitted" });
    expect(
      await failure(
        addFiling({
          viewer: v,
          input: { projectId: project.id, title: "HOA approval", authority: `utility:${rival.organization.id}`, authorityName: "" },
        }),
      ),
    ).toMatchObject({ code: "INVALID_INPUT", fields: ["authority"] });
    expect(
      await failure(
        addFiling({
          viewer: org.viewers.installer,
          input: { projectId: project.id, title: "HOA approval", authority: "other", authorityName: "Juniper Hollow HOA" },
        }),
      ),
    ).toMatchObject({ code: "FORBIDDEN" });
    expect(
      await failure(
        addFiling({
          viewer: rival.viewers.coordinator,
          input: { projectId: project.id, title: "HOA approval", authority: "other", authorityName: "Juniper Hollow HOA" },
        }),
      ),
    ).toMatchObject({ code: "NOT_FOUND" });
  });

  it("marks a submitted filing as owing a new revision when the design changes, and the office holds the project", async () => {
    const { project, packets, permit, interconnection } = await filedProject();
    await changeFilingStatus({
      viewer: coordinator(),
      input: { filingId: permit.id, status: "submitted", packetId: packets.permit1.id, sentTo: "", note: "" },
    });
    expect((await stageOf(project.id)).waitingOn).toBe("ahj"); // the interconnection application still being prepared does not hold it
    await changeFilingStatus({
      viewer: coordinator(),
      input: {
        filingId: interconnection.id,
        status: "submitted",
        packetId: packets.interconnection1.id,
        sentTo: "",
        note: "",
        unsignedReason: "Customer signed the paper application",
      },
    });
    expect((await stageOf(project.id)).waitingOn).toBe("ahj");
    await db().transaction(async (transaction) => {
      expect(await markRevisionNeeded(project.id, { transaction })).toBe(2);
      await refreshProjectFacts(project.id, { transaction });
    });
    expect((await stageOf(project.id)).waitingOn).toBe("office");
    expect((await listProjectFilings({ viewer: coordinator(), projectId: project.id })).filings[0]!.revisionNeededSince).not.toBeNull();
  });

  it("keeps filings within their organization and away from installers' pens", async () => {
    const { project, permit } = await filedProject();
    expect(await failure(listProjectFilings({ viewer: rival.viewers.admin, projectId: project.id }))).toMatchObject({ code: "NOT_FOUND" });
    expect(
      await failure(
        changeFilingStatus({ viewer: rival.viewers.admin, input: { filingId: permit.id, status: "withdrawn", sentTo: "", note: "" } }),
      ),
    ).toMatchObject({ code: "NOT_FOUND" });
    expect(
      await failure(
        changeFilingStatus({ viewer: org.viewers.installer, input: { filingId: permit.id, status: "withdrawn", sentTo: "", note: "" } }),
      ),
    ).toMatchObject({ code: "FORBIDDEN" });
    expect(await failure(listProjectFilings({ viewer: org.viewers.otherInstaller, projectId: project.id }))).toMatchObject({
      code: "NOT_FOUND",
    });
    expect((await listProjectFilings({ viewer: org.viewers.installer, projectId: project.id })).filings).toHaveLength(2);
  });

  it("lists projects by who they wait on and by their filings' statuses", async () => {
    const { project, packets, permit } = await filedProject();
    await changeFilingStatus({
      viewer: coordinator(),
      input: { filingId: permit.id, status: "submitted", packetId: packets.permit1.id, sentTo: "", note: "" },
    });
    const numbers = async (query: Record<string, string>) =>
      (await listProjects({ viewer: coordinator(), query: ProjectListQuery.parse({ pageSize: "100", ...query }) })).items.map(
        (p) => p.number,
      );
    expect(await numbers({ waitingOn: "ahj" })).toContain(project.number);
    expect(await numbers({ waitingOn: "office" })).not.toContain(project.number);
    expect(await numbers({ permitStatus: "submitted", interconnectionStatus: "preparing" })).toContain(project.number);
    expect(await numbers({ permitStatus: "approved" })).not.toContain(project.number);
    const listed = (
      await listProjects({ viewer: coordinator(), query: ProjectListQuery.parse({ pageSize: "100", waitingOn: "ahj" }) })
    ).items.find((p) => p.id === project.id)!;
    expect(listed).toMatchObject({ waitingOn: "ahj", permitStatus: "submitted", interconnectionStatus: "preparing" });
    expect(ProjectListQuery.safeParse({ waitingOn: "inspector" }).success).toBe(false);
  });

  it("asks why a hand move skips a fact nobody recorded, and never moves back past the filings", async () => {
    const { project, packets, permit } = await filedProject();
    const v = coordinator();
    await changeFilingStatus({
      viewer: v,
      input: { filingId: permit.id, status: "submitted", packetId: packets.permit1.id, sentTo: "", note: "" },
    });
    const skipped = await failure(changeProjectStage({ viewer: v, projectId: project.id, toStage: "installed", note: "" }));
    expect(skipped).toMatchObject({ code: "CONFLICT", fields: ["note"] });
    expect(skipped!.message).toContain("Permit issued");
    expect((await stageOf(project.id)).stage).toBe("permit_filed");

    await changeProjectStage({ viewer: v, projectId: project.id, toStage: "installed", note: "Permit card on site; number to follow" });
    expect((await stageOf(project.id)).stage).toBe("installed");
    const audit = await AuditEvent.findOne({
      where: { entityId: project.id, action: "project.stage-changed" },
      order: [["createdAt", "DESC"]],
    });
    expect(audit!.changes.skippedFacts).toEqual({ before: null, after: ["permit_issued"] });

    // The hand move stands for the stages before it; moving back below what the filings record is refused.
    expect(await failure(changeProjectStage({ viewer: v, projectId: project.id, toStage: "design_checked", note: "oops" }))).toMatchObject({
      code: "CONFLICT",
    });
    await changeProjectStage({ viewer: v, projectId: project.id, toStage: "permit_filed", note: "Not installed after all" });
    expect((await stageOf(project.id)).stage).toBe("permit_filed");
  });

  it("sets a project aside with a reason: it waits on nobody and leaves the active list until taken up again", async () => {
    const { project, packets, permit } = await filedProject();
    const v = coordinator();
    await changeFilingStatus({
      viewer: v,
      input: { filingId: permit.id, status: "submitted", packetId: packets.permit1.id, sentTo: "", note: "" },
    });
    expect(await failure(setProjectHold({ viewer: v, projectId: project.id, hold: "on_hold", reason: " " }))).toMatchObject({
      fields: ["reason"],
    });
    await setProjectHold({ viewer: v, projectId: project.id, hold: "on_hold", reason: "Customer re-roofing first" });
    let p = await stageOf(project.id);
    expect([p.holdState, p.waitingOn, p.stage]).toEqual(["on_hold", null, "permit_filed"]);
    const active = async () =>
      (await listProjects({ viewer: v, query: ProjectListQuery.parse({ pageSize: "100", hold: "active" }) })).items.map((i) => i.id);
    expect(await active()).not.toContain(project.id);
    expect(
      await failure(setProjectHold({ viewer: org.viewers.installer, projectId: project.id, hold: "active", reason: "" })),
    ).toMatchObject({
      code: expect.stringMatching(/FORBIDDEN|NOT_FOUND/),
    });
    await setProjectHold({ viewer: v, projectId: project.id, hold: "active", reason: "" });
    p = await stageOf(project.id);
    expect([p.holdState, p.waitingOn]).toEqual([null, "ahj"]);
    expect(await active()).toContain(project.id);
    expect(await AuditEvent.count({ where: { entityId: project.id, action: "project.hold-changed" } })).toBe(2);
  });
});
