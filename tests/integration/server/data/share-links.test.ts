import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { OutboxMessage, Packet, ShareLink, ShareLinkAccess, ShareLinkMiss, type Project } from "@/models";
import { AppError } from "@/lib/errors";
import {
  createShareLink,
  getSharedPacketFile,
  listShareLinks,
  openShareLink,
  revokeShareLink,
  SHARE_THROTTLE,
} from "@/lib/server/data/share-links";
import { hashToken } from "@/lib/server/tokens";
import { db } from "@/lib/server/db";
import { closeDb } from "../../support/db";
import { makeOrganization, makeProject, type OrgFixture } from "../../support/fixtures";

let org: OrgFixture;
let rival: OrgFixture;
const code = async (promise: Promise<unknown>) =>
  promise.then(
    () => "resolved",
    (e: unknown) => (e instanceof AppError ? e.code : String(e)),
  );
const tokenOf = (url: string) => url.split("/share/")[1];
const client = (address: string) => ({ address, userAgent: "fixture-browser/1.0" });

// Ready rows stand in for generated packets: sharing reads only their status, revision and stored key.
async function packet(project: Project, revision: number, status: "ready" | "failed" = "ready") {
  const input = {
    project: { number: 7, customerName: "Fixture Customer", street: "1 Fixture Way", city: "Testville", state: "CO", postalCode: "80000" },
  };
  return Packet.create({
    organizationId: project.organizationId,
    projectId: project.id,
    kind: "permit",
    revision,
    status,
    input,
    overrideReason: null,
    requestedById: null,
    objectKey: status === "ready" ? `packets/fixture-${project.id}-${revision}.pdf` : null,
    readyAt: new Date(),
  });
}

beforeAll(async () => {
  org = await makeOrganization("Share");
  rival = await makeOrganization("Rival share");
});

afterAll(async () => {
  await closeDb();
});

describe("share links", () => {
  it("stores only the token's hash, mails the recipient and opens the shared revisions", async () => {
    const project = await makeProject(org);
    const rev1 = await packet(project, 1);
    const { url, link } = await createShareLink({
      viewer: org.viewers.coordinator,
      projectId: project.id,
      input: { packetIds: [rev1.id], recipientEmail: "Inspector@AHJ.example", note: "For the rough-in" },
    });
    const token = tokenOf(url);
    expect(token.length).toBeGreaterThanOrEqual(22); // ≥ 128 bits in base64url
    const row = await ShareLink.findByPk(link.id);
    expect(row!.tokenHash).toBe(hashToken(token));
    expect(JSON.stringify(row!.toJSON())).not.toContain(token);
    expect(link).toMatchObject({
      status: "active",
      recipientEmail: "inspector@ahj.example",
      revisions: [{ label: "Permit packet Rev 1" }],
    });
    expect(Math.round((new Date(link.expiresAt).getTime() - Date.now()) / 86_400_000)).toBe(30);
    const mail = await OutboxMessage.findOne({ where: { toAddress: "inspector@ahj.example" }, order: [["createdAt", "DESC"]] });
    expect(mail!.textBody).toContain(url);

    const view = await openShareLink(token, client("198.51.100.7"));
    expect(view.revisions.map((r) => r.packetId)).toEqual([rev1.id]);
    const file = await getSharedPacketFile(token, rev1.id, client("198.51.100.7"));
    expect(file.key).toBe(rev1.objectKey);
    const [listed] = await listShareLinks({ viewer: org.viewers.admin, projectId: project.id });
    expect(listed.accesses.map((a) => [a.kind, a.revision, a.address, a.userAgent])).toEqual([
      ["download", "Permit packet Rev 1", "198.51.100.7", "fixture-browser/1.0"],
      ["view", null, "198.51.100.7", "fixture-browser/1.0"],
    ]);
  });

  it("tells of a newer revision only when the link shares it too", async () => {
    const project = await makeProject(org);
    const rev1 = await packet(project, 1);
    const rev2 = await packet(project, 2);
    const share = async (packetIds: string[]) =>
      tokenOf(
        (
          await createShareLink({
            viewer: org.viewers.coordinator,
            projectId: project.id,
            input: { packetIds, recipientEmail: "plans@ahj.example", note: "" },
          })
        ).url,
      );
    const onlyOld = await openShareLink(await share([rev1.id]), client("198.51.100.8"));
    expect(onlyOld.revisions.map((r) => [r.label, r.supersededBy])).toEqual([["Permit packet Rev 1", null]]);
    expect(JSON.stringify(onlyOld)).not.toContain("Rev 2");
    const both = await openShareLink(await share([rev1.id, rev2.id]), client("198.51.100.8"));
    expect(both.revisions.map((r) => [r.label, r.supersededBy])).toEqual([
      ["Permit packet Rev 2", null],
      ["Permit packet Rev 1", "Permit packet Rev 2"],
    ]);
  });

  it("refuses revisions that are not ready or belong to another project, and other roles and organizations", async () => {
    const project = await makeProject(org);
    const other = await makeProject(org);
    const failed = await packet(project, 1, "failed");
    const foreign = await packet(other, 1);
    const ready = await packet(project, 2);
    for (const packetId of [failed.id, foreign.id]) {
      expect(
        await code(createShareLink({ viewer: org.viewers.coordinator, projectId: project.id, input: { packetIds: [ready.id, packetId] } })),
      ).toBe("INVALID_INPUT");
    }
    expect(
      await code(
        createShareLink({ viewer: org.viewers.coordinator, projectId: project.id, input: { packetIds: [ready.id], expiresInDays: 366 } }),
      ),
    ).toBe("INVALID_INPUT");
    await project.update({ installerId: org.users.installer.id });
    expect(await code(createShareLink({ viewer: org.viewers.installer, projectId: project.id, input: { packetIds: [ready.id] } }))).toBe(
      "FORBIDDEN",
    );
    expect(
      await code(createShareLink({ viewer: rival.viewers.coordinator, projectId: project.id, input: { packetIds: [ready.id] } })),
    ).toBe("NOT_FOUND");
    expect(await code(listShareLinks({ viewer: rival.viewers.admin, projectId: project.id }))).toBe("NOT_FOUND");

    const { link, url } = await createShareLink({
      viewer: org.viewers.coordinator,
      projectId: project.id,
      input: { packetIds: [ready.id], expiresInDays: 7 },
    });
    expect(await code(revokeShareLink({ viewer: rival.viewers.admin, shareLinkId: link.id }))).toBe("NOT_FOUND");
    // A packet of the same organization that the link does not cover stays closed.
    expect(await code(getSharedPacketFile(tokenOf(url), foreign.id, client("198.51.100.8")))).toBe("NOT_FOUND");
  });

  it("answers GONE for revoked and expired links and NOT_FOUND for unknown tokens", async () => {
    const project = await makeProject(org);
    const rev1 = await packet(project, 1);
    const revoked = await createShareLink({ viewer: org.viewers.coordinator, projectId: project.id, input: { packetIds: [rev1.id] } });
    const after = await revokeShareLink({ viewer: org.viewers.coordinator, shareLinkId: revoked.link.id });
    expect(after.status).toBe("revoked");
    expect(await code(openShareLink(tokenOf(revoked.url), client("198.51.100.9")))).toBe("GONE");
    expect(await code(getSharedPacketFile(tokenOf(revoked.url), rev1.id, client("198.51.100.9")))).toBe("GONE");

    const expired = await createShareLink({
      viewer: org.viewers.coordinator,
      projectId: project.id,
      input: { packetIds: [rev1.id], expiresInDays: 1 },
    });
    await ShareLink.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { id: expired.link.id } });
    expect(await code(openShareLink(tokenOf(expired.url), client("198.51.100.9")))).toBe("GONE");
    expect((await listShareLinks({ viewer: org.viewers.coordinator, projectId: project.id })).map((l) => l.status).sort()).toEqual([
      "expired",
      "revoked",
    ]);

    expect(await code(openShareLink("made-up-token-made-up-token-made-up-1234", client("198.51.100.9")))).toBe("NOT_FOUND");
    expect(await ShareLinkAccess.count({ where: { shareLinkId: [revoked.link.id, expired.link.id] } })).toBe(0);
  });

  it("throttles an address that tries too many unknown tokens, even with a good token", async () => {
    const project = await makeProject(org);
    const { url } = await createShareLink({
      viewer: org.viewers.coordinator,
      projectId: project.id,
      input: { packetIds: [(await packet(project, 1)).id] },
    });
    const guesser = client(`203.0.113.${Math.floor(Math.random() * 250)}`);
    await ShareLinkMiss.destroy({ where: { address: guesser.address } });
    for (let i = 0; i < SHARE_THROTTLE.maxMisses; i++)
      expect(await code(openShareLink(`guess-guess-guess-guess-${i}`, guesser))).toBe("NOT_FOUND");
    expect(await code(openShareLink("guess-guess-guess-guess-last", guesser))).toBe("LIMIT_EXCEEDED");
    expect(await code(openShareLink(tokenOf(url), guesser))).toBe("LIMIT_EXCEEDED");
    expect(await code(openShareLink(tokenOf(url), client("192.0.2.44")))).toBe("resolved"); // others are not affected
  });

  it("forgets misses older than the throttle window", async () => {
    const old = await ShareLinkMiss.create({ address: "198.51.100.200" });
    await db().query(
      `update share_link_misses set created_at = now() - interval '${SHARE_THROTTLE.windowMinutes + 1} minutes' where id = :id`,
      { replacements: { id: old.id } },
    );
    expect(await code(openShareLink("guess-guess-guess-guess-x", client("198.51.100.201")))).toBe("NOT_FOUND");
    expect(await ShareLinkMiss.findByPk(old.id)).toBeNull();
  });
});
