import "server-only";
import { DEFAULT_TIME_ZONE, localIsoDate, localLongDate } from "@/lib/domain/time-zones";
import { z } from "zod";
import { Organization, Packet, ShareLink, ShareLinkAccess, ShareLinkPacket, User } from "@/models";
import { can, type Viewer } from "@/lib/domain/permissions";
import { AppError } from "@/lib/errors";
import type { PacketKind, ShareLinkAccessKind } from "@/lib/domain/stored-values";
import { PACKET_TITLES, type PacketInput } from "@/lib/documents/packets/input";
import { siteAddress } from "@/lib/documents/packets/facts";
import { CreateShareLinkInput } from "@/lib/schemas/share-link";
import { inspectorLinkEmail } from "@/templates/email/inspector-link";
import { db } from "../db";
import { env } from "../env";
import { enqueueMail } from "./outbox";
import { hashToken, newToken } from "../tokens";
import { getOrganization } from "./organizations";
import { recordTokenMiss, refuseTokenGuesser, TOKEN_GUESS_THROTTLE } from "./token-guesses";
import { recordAudit } from "./audit";
import { isUuid } from "./ids";
import { getProjectById } from "./projects";
import type { ShareLinkStatus, ShareLinkDto } from "@/lib/dto/share-links";

/** Unknown tokens allowed per client address and window before every share link answers 429 to it. */
export const SHARE_THROTTLE = TOKEN_GUESS_THROTTLE;
const DAY_MS = 24 * 60 * 60_000;

export type ClientInfo = { address: string; userAgent: string };

/** "Permit packet Rev 2": how links, the access log and the inspector page name a revision. */
export const revisionLabel = (p: { kind: PacketKind; revision: number }) => `${PACKET_TITLES[p.kind]} Rev ${p.revision}`;

function statusOf(link: ShareLink, now = new Date()): ShareLinkStatus {
  if (link.revokedAt) return "revoked";
  return link.expiresAt <= now ? "expired" : "active";
}

function toShareLinkDto(link: ShareLink): ShareLinkDto {
  const packets = [...(link.packets ?? [])].sort((a, b) => a.kind.localeCompare(b.kind) || a.revision - b.revision);
  const labels = new Map(packets.map((p) => [p.id, revisionLabel(p)]));
  const accesses = [...(link.accesses ?? [])].sort((a, b) => b.createdAt.getTime() - a.createdAt.getTime());
  return {
    id: link.id,
    recipientEmail: link.recipientEmail,
    note: link.note,
    status: statusOf(link),
    expiresAt: link.expiresAt.toISOString(),
    revokedAt: link.revokedAt?.toISOString() ?? null,
    createdBy: link.createdBy?.name ?? null,
    createdAt: link.createdAt.toISOString(),
    revisions: packets.map((p) => ({ packetId: p.id, label: labels.get(p.id)! })),
    accesses: accesses.map((a) => ({
      kind: a.kind,
      revision: a.packetId ? (labels.get(a.packetId) ?? null) : null,
      address: a.address,
      userAgent: a.userAgent,
      at: a.createdAt.toISOString(),
    })),
  };
}

async function assertCanShare(viewer: Viewer, projectId: string) {
  await getProjectById({ viewer, projectId }); // NOT_FOUND for foreign and unassigned projects
  if (!can(viewer, "project:edit")) throw new AppError("FORBIDDEN", "Only coordinators and admins share packets.");
}

/**
 * Creates a read-only link to chosen ready revisions of one project. The token is returned
 * once and only its hash is stored; with a recipient, the link goes out through the outbox
 * in the same transaction.
 */
export async function createShareLink({
  viewer,
  projectId,
  input,
}: {
  viewer: Viewer;
  projectId: string;
  input: CreateShareLinkInput;
}): Promise<{ link: ShareLinkDto; url: string }> {
  const sequelize = db();
  await assertCanShare(viewer, projectId);
  const parsed = CreateShareLinkInput.safeParse(input);
  if (!parsed.success)
    throw new AppError(
      "INVALID_INPUT",
      "Check the highlighted fields.",
      z.flattenError(parsed.error).fieldErrors as Record<string, string[]>,
    );
  const values = parsed.data;
  const packetIds = [...new Set(values.packetIds)];
  const packets = await Packet.findAll({ where: { id: packetIds, projectId, organizationId: viewer.organizationId, status: "ready" } });
  if (packets.length !== packetIds.length)
    throw new AppError("INVALID_INPUT", "Only ready revisions of this project can be shared.", {
      packetIds: ["Choose ready revisions of this project"],
    });

  const { token, tokenHash } = newToken();
  const url = `${env().APP_URL}/share/${token}`;
  const expiresAt = new Date(Date.now() + values.expiresInDays * DAY_MS);
  const recipientEmail = values.recipientEmail || null;
  const organization = await getOrganization({ viewer });
  const zone = organization.timeZone;
  const id = await sequelize.transaction(async (transaction) => {
    const link = await ShareLink.create(
      { organizationId: viewer.organizationId, projectId, tokenHash, recipientEmail, note: values.note, expiresAt, createdById: viewer.id },
      { transaction },
    );
    await ShareLinkPacket.bulkCreate(
      packets.map((p) => ({ shareLinkId: link.id, packetId: p.id })),
      { transaction },
    );
    await recordAudit(
      {
        viewer,
        action: "share-link.created",
        entityType: "project",
        entityId: projectId,
        changes: {
          inspectorLink: {
            before: null,
            after: `${packets.map(revisionLabel).join(", ")} to ${recipientEmail ?? "no recipient"}, until ${localIsoDate(expiresAt.toISOString(), zone)}`,
          },
        },
      },
      { transaction },
    );
    if (recipientEmail) {
      const input = packets[0].input as unknown as PacketInput;
      const mail = inspectorLinkEmail({
        organizationName: organization.name,
        senderName: viewer.name,
        siteAddress: siteAddress(input),
        revisions: packets.map(revisionLabel),
        note: values.note,
        url,
        expiresOn: localLongDate(expiresAt.toISOString(), zone),
      });
      await enqueueMail({ to: recipientEmail, ...mail, organizationId: viewer.organizationId }, { transaction });
    }
    return link.id;
  });
  return { link: toShareLinkDto(await loadLink(viewer, id)), url };
}

async function loadLink(viewer: Viewer, shareLinkId: string) {
  const link = await ShareLink.findOne({
    where: { id: shareLinkId, organizationId: viewer.organizationId },
    include: [
      { model: Packet, as: "packets", attributes: ["id", "kind", "revision"] },
      { model: ShareLinkAccess, as: "accesses" },
      { model: User, as: "createdBy", attributes: ["name"] },
    ],
  });
  if (!link) throw new AppError("NOT_FOUND", "No such link.");
  return link;
}

/** The project's share links, newest first, each with its access log. */
export async function listShareLinks({ viewer, projectId }: { viewer: Viewer; projectId: string }): Promise<ShareLinkDto[]> {
  db();
  await assertCanShare(viewer, projectId);
  const links = await ShareLink.findAll({
    where: { projectId, organizationId: viewer.organizationId },
    include: [
      { model: Packet, as: "packets", attributes: ["id", "kind", "revision"] },
      { model: ShareLinkAccess, as: "accesses" },
      { model: User, as: "createdBy", attributes: ["name"] },
    ],
    order: [["createdAt", "DESC"]],
  });
  return links.map(toShareLinkDto);
}

/** Ends a link at once; the page then answers 410. Revoking twice changes nothing. */
export async function revokeShareLink({ viewer, shareLinkId }: { viewer: Viewer; shareLinkId: string }): Promise<ShareLinkDto> {
  const sequelize = db();
  if (!isUuid(shareLinkId)) throw new AppError("NOT_FOUND", "No such link.");
  const found = await ShareLink.findOne({ where: { id: shareLinkId, organizationId: viewer.organizationId } });
  if (!found) throw new AppError("NOT_FOUND", "No such link.");
  await assertCanShare(viewer, found.projectId);
  if (!found.revokedAt) {
    await sequelize.transaction(async (transaction) => {
      await found.update({ revokedAt: new Date() }, { transaction });
      await recordAudit(
        {
          viewer,
          action: "share-link.revoked",
          entityType: "project",
          entityId: found.projectId,
          changes: { inspectorLink: { before: found.recipientEmail ?? "link without recipient", after: "revoked" } },
        },
        { transaction },
      );
    });
  }
  return toShareLinkDto(await loadLink(viewer, shareLinkId));
}

/** What the public page shows: taken from the newest shared revision, so it matches the PDFs. */
export type SharedView = {
  organizationName: string;
  /** The sending organization's zone: the page's dates are its calendar days. */
  timeZone: string;
  expiresAt: string;
  note: string;
  input: PacketInput;
  revisions: {
    packetId: string;
    kind: PacketKind;
    label: string;
    pageCount: number | null;
    sizeBytes: number | null;
    readyAt: string | null;
    /** The newest revision of the same packet that this link also covers; never one it does not. */
    supersededBy: string | null;
  }[];
};

const clip = (client: ClientInfo) => ({ address: client.address.slice(0, 100), userAgent: client.userAgent.slice(0, 500) });

/**
 * Resolves a token to its live link. Throttled per client address: too many unknown tokens
 * lately → LIMIT_EXCEEDED (even for a good token, so a guesser learns nothing). Unknown → NOT_FOUND
 * (and counted); expired or revoked → GONE.
 */
async function liveLinkByToken(token: string, client: ClientInfo) {
  const { address } = clip(client);
  await refuseTokenGuesser(address, "links");
  const link = /^[A-Za-z0-9_-]{16,100}$/.test(token) ? await ShareLink.findOne({ where: { tokenHash: hashToken(token) } }) : null;
  if (!link) {
    await recordTokenMiss(address);
    throw new AppError("NOT_FOUND", "This link does not exist. Check that it was copied whole.");
  }
  const status = statusOf(link);
  if (status === "revoked")
    throw new AppError("GONE", "This link was withdrawn by the sender. Ask them for a new one if you still need the documents.");
  if (status === "expired") {
    const organization = await Organization.findByPk(link.organizationId, { attributes: ["timeZone"] });
    throw new AppError(
      "GONE",
      `This link expired on ${localLongDate(link.expiresAt.toISOString(), organization?.timeZone ?? DEFAULT_TIME_ZONE)}. Ask the sender for a new one if you still need the documents.`,
    );
  }
  return link;
}

/** Throws like openShareLink when the token does not open a live link; logs nothing. */
export async function checkShareLink(token: string, client: ClientInfo): Promise<void> {
  db();
  await liveLinkByToken(token, client);
}

async function logAccess(link: ShareLink, kind: ShareLinkAccessKind, packetId: string | null, client: ClientInfo) {
  await ShareLinkAccess.create({ shareLinkId: link.id, kind, packetId, ...clip(client) });
}

/** Opens a share link for its public page and logs the view. Throws LIMIT_EXCEEDED, NOT_FOUND or GONE. */
export async function openShareLink(token: string, client: ClientInfo): Promise<SharedView> {
  db();
  const link = await liveLinkByToken(token, client);
  const [packets, organization] = await Promise.all([
    Packet.findAll({
      include: [{ model: ShareLink, as: "shareLinks", where: { id: link.id }, attributes: [] }],
      where: { organizationId: link.organizationId, status: "ready" },
      order: [
        ["kind", "DESC"],
        ["revision", "DESC"],
      ],
    }),
    Organization.findByPk(link.organizationId),
  ]);
  if (packets.length === 0) throw new AppError("GONE", "The documents behind this link are no longer available.");
  await logAccess(link, "view", null, client);
  const newest = [...packets].sort((a, b) => (b.readyAt?.getTime() ?? 0) - (a.readyAt?.getTime() ?? 0))[0];
  return {
    organizationName: organization?.name ?? "",
    timeZone: organization?.timeZone ?? DEFAULT_TIME_ZONE,
    expiresAt: link.expiresAt.toISOString(),
    note: link.note,
    input: newest.input as unknown as PacketInput,
    revisions: packets.map((p) => ({
      packetId: p.id,
      kind: p.kind,
      label: revisionLabel(p),
      pageCount: p.pageCount,
      sizeBytes: p.sizeBytes,
      readyAt: p.readyAt?.toISOString() ?? null,
      supersededBy: supersededBy(p, packets),
    })),
  };
}

// Only among the link's own revisions: an unshared newer revision stays unknown to the recipient.
function supersededBy(packet: Packet, shared: Packet[]): string | null {
  const newer = shared.filter((p) => p.kind === packet.kind && p.revision > packet.revision).sort((a, b) => b.revision - a.revision)[0];
  return newer ? revisionLabel(newer) : null;
}

/** The stored PDF of one revision the link covers; logs the download. Same errors as openShareLink. */
export async function getSharedPacketFile(token: string, packetId: string, client: ClientInfo): Promise<{ key: string; fileName: string }> {
  db();
  const link = await liveLinkByToken(token, client);
  const covered = isUuid(packetId) ? await ShareLinkPacket.findOne({ where: { shareLinkId: link.id, packetId } }) : null;
  const packet = covered ? await Packet.findOne({ where: { id: packetId, organizationId: link.organizationId, status: "ready" } }) : null;
  if (!packet?.objectKey) throw new AppError("NOT_FOUND", "This link does not cover that document.");
  await logAccess(link, "download", packet.id, client);
  const input = packet.input as unknown as PacketInput;
  return { key: packet.objectKey, fileName: `ohmstead-${input.project.number}-${packet.kind}-rev${packet.revision}.pdf` };
}
