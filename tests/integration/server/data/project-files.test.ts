import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { AuditEvent, Project, StorageRemoval } from "@/models";
import { AppError } from "@/lib/errors";
import { deleteProjectFile, getProjectFileLocation, listProjectFiles, uploadProjectFile } from "@/lib/server/data/project-files";
import { sweepStorageRemovals } from "@/lib/server/data/storage-removals";
import { getObjectBytes } from "@/lib/server/services/storage";
import { closeDb } from "../../support/db";
import { makeOrganization, makeProject, type OrgFixture } from "../../support/fixtures";

// Storage that can be made to refuse removals, as during an outage; everything else is the real fake.
const storage = vi.hoisted(() => ({ refuseRemovals: false }));
vi.mock("@/lib/server/services/storage", async (importOriginal) => {
  const real = await importOriginal<typeof import("@/lib/server/services/storage")>();
  return {
    ...real,
    deleteObject: async (key: string) => {
      if (storage.refuseRemovals) throw new Error("connect ECONNREFUSED (storage is down)");
      return real.deleteObject(key);
    },
  };
});

let org: OrgFixture;
let rival: OrgFixture;
const code = async (promise: Promise<unknown>) =>
  promise.then(
    () => "resolved",
    (e: unknown) => (e instanceof AppError ? e.code : String(e)),
  );
const PNG_1PX = Buffer.from("iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mP8z8BQDwAEhQGAhKmMIQAAAABJRU5ErkJggg==", "base64");
const stored = (key: string) =>
  getObjectBytes(key).then(
    () => true,
    () => false,
  );

beforeAll(async () => {
  org = await makeOrganization("Uploads");
  rival = await makeOrganization("Rival uploads");
});

afterAll(async () => {
  await closeDb();
});

async function photoBy(viewer: OrgFixture["viewers"][keyof OrgFixture["viewers"]], projectId: string, name = "wrong-roof.png") {
  const file = await uploadProjectFile({ viewer, projectId, kind: "site-photo", fileName: name, bytes: new Uint8Array(PNG_1PX) });
  const { key } = await getProjectFileLocation({ viewer: org.viewers.coordinator, projectId, fileId: file.id });
  return { file, key };
}

describe("removing an upload", () => {
  it("the uploader removes a wrong photo: the record and the stored object are gone, and the removal is audited", async () => {
    const project = await makeProject(org, { installerId: org.users.installer.id });
    const { file, key } = await photoBy(org.viewers.installer, project.id);
    expect(await stored(key)).toBe(true);
    expect((await listProjectFiles({ viewer: org.viewers.installer, projectId: project.id }))[0]).toMatchObject({
      id: file.id,
      hasThumbnail: true,
      canRemove: true,
    });

    await deleteProjectFile({ viewer: org.viewers.installer, projectId: project.id, fileId: file.id });
    expect(await listProjectFiles({ viewer: org.viewers.coordinator, projectId: project.id })).toEqual([]);
    expect(await stored(key)).toBe(false);
    expect(await StorageRemoval.count({ where: { objectKey: key } })).toBe(0);
    const audit = await AuditEvent.findOne({ where: { entityId: project.id, action: "file.removed" } });
    expect(audit?.actorId).toBe(org.users.installer.id);
    expect(audit?.changes.file?.before).toMatch(/^site-photo: wrong-roof\.png \(SHA-256 [0-9a-f]{12}…\)$/);
    expect(await code(deleteProjectFile({ viewer: org.viewers.installer, projectId: project.id, fileId: file.id }))).toBe("NOT_FOUND");
  });

  it("lets the uploader, the project's coordinator and an admin remove it, nobody else, and only while the field work is open", async () => {
    const project = await makeProject(org, { installerId: org.users.installer.id });
    const byCrew = await photoBy(org.viewers.installer, project.id, "crew.png");
    const byOffice = await photoBy(org.viewers.coordinator, project.id, "office.png");
    const flags = async (viewer: OrgFixture["viewers"]["admin"]) =>
      Object.fromEntries((await listProjectFiles({ viewer, projectId: project.id })).map((f) => [f.fileName, f.canRemove]));
    expect(await flags(org.viewers.installer)).toEqual({ "crew.png": true, "office.png": false });
    expect(await flags(org.viewers.coordinator)).toEqual({ "crew.png": true, "office.png": true });

    expect(await code(deleteProjectFile({ viewer: org.viewers.installer, projectId: project.id, fileId: byOffice.file.id }))).toBe(
      "FORBIDDEN",
    );
    expect(await code(deleteProjectFile({ viewer: org.viewers.otherInstaller, projectId: project.id, fileId: byCrew.file.id }))).toBe(
      "NOT_FOUND",
    );
    expect(await code(deleteProjectFile({ viewer: rival.viewers.admin, projectId: project.id, fileId: byCrew.file.id }))).toBe("NOT_FOUND");
    expect(
      await code(
        deleteProjectFile({ viewer: { ...org.viewers.admin, apiTokenId: "token" }, projectId: project.id, fileId: byCrew.file.id }),
      ),
    ).toBe("FORBIDDEN");
    expect(await stored(byCrew.key)).toBe(true);

    // Once the utility granted PTO the uploads are the record as filed.
    await Project.update({ stage: "pto_received" }, { where: { id: project.id } });
    expect(await flags(org.viewers.admin)).toEqual({ "crew.png": false, "office.png": false });
    const kept = await deleteProjectFile({ viewer: org.viewers.admin, projectId: project.id, fileId: byCrew.file.id }).catch(
      (e: AppError) => e,
    );
    expect(kept).toMatchObject({ code: "FORBIDDEN", message: "Uploads are kept as filed once the project reaches PTO received." });

    await Project.update({ stage: "installed" }, { where: { id: project.id } });
    await deleteProjectFile({ viewer: org.viewers.coordinator, projectId: project.id, fileId: byCrew.file.id });
    await deleteProjectFile({ viewer: org.viewers.admin, projectId: project.id, fileId: byOffice.file.id });
    expect(await listProjectFiles({ viewer: org.viewers.admin, projectId: project.id })).toEqual([]);
    expect(await AuditEvent.count({ where: { entityId: project.id, action: "file.removed" } })).toBe(2);
  });

  it("when storage fails after the record is gone, the removal still succeeds for the user and the sweep removes the object later", async () => {
    const project = await makeProject(org, { installerId: org.users.installer.id });
    const { file, key } = await photoBy(org.viewers.installer, project.id);
    const logged = vi.spyOn(console, "error").mockImplementation(() => undefined);
    storage.refuseRemovals = true;
    try {
      await expect(deleteProjectFile({ viewer: org.viewers.installer, projectId: project.id, fileId: file.id })).resolves.toBeUndefined();
    } finally {
      storage.refuseRemovals = false;
    }
    expect(logged.mock.calls.flat().join(" ")).toContain("will try again");
    logged.mockRestore();
    expect(await listProjectFiles({ viewer: org.viewers.installer, projectId: project.id })).toEqual([]);
    const pending = (await StorageRemoval.findOne({ where: { objectKey: key } }))!;
    expect(pending).toMatchObject({ attempts: 1, lastError: expect.stringContaining("storage is down") });
    expect(pending.nextAttemptAt.getTime()).toBeGreaterThan(Date.now()); // not before its wait
    expect(await sweepStorageRemovals({ objectKeys: [key] })).toEqual({ removed: 0, failed: 0 });
    expect(await stored(key)).toBe(true);

    // The wait has passed: the worker's sweep removes it.
    await pending.update({ nextAttemptAt: new Date(Date.now() - 1_000) });
    expect(await sweepStorageRemovals()).toMatchObject({ removed: expect.any(Number), failed: 0 });
    expect(await stored(key)).toBe(false);
    expect(await StorageRemoval.count({ where: { objectKey: key } })).toBe(0);
  });
});
