import "server-only";
import { Op } from "sequelize";
import { Packet, Project, User } from "@/models";
import { can, type Viewer } from "@/lib/domain/permissions";
import { AppError } from "@/lib/errors";
import { describeAnswers, describeChanges } from "@/lib/documents/packets/changes";
import type { PacketKind } from "@/lib/domain/stored-values";
import type { PacketInput } from "@/lib/documents/packets/input";
import { db } from "../db";
import { enqueuePacketJob } from "../services/jobs";
import { recordAudit } from "./audit";
import { answeredSinceLastSending } from "./filings";
import { isUuid } from "./ids";
import { buildPacketInput, reviewedOrConflict } from "./packet-input";
import { getReviewedDesign } from "./reviewed-design";
import { getProjectById } from "./projects";
import type { PacketDto } from "@/lib/dto/packets";

// Far longer than any generation takes; a row still in flight after this was abandoned.
const STALE_AFTER_MS = 10 * 60_000;
const ABANDONED = {
  status: "failed" as const,
  progress: 0,
  step: "Failed",
  error: "The generation stopped without finishing (the worker may have restarted). Retry it.",
};
const isAbandoned = (p: Packet) => (p.status === "queued" || p.status === "running") && p.updatedAt.getTime() < Date.now() - STALE_AFTER_MS;

function toPacketDto(p: Packet): PacketDto {
  // Shown as failed as soon as it is stale, even before the worker's maintenance writes it so.
  const { status, progress, step, error } = isAbandoned(p) ? ABANDONED : p;
  return {
    id: p.id,
    kind: p.kind,
    revision: p.revision,
    designRevision: p.designRevision,
    sentTo: p.sentTo,
    status,
    progress,
    step,
    changes: p.changes,
    overrideReason: p.overrideReason,
    sizeBytes: p.sizeBytes,
    pageCount: p.pageCount,
    sha256: p.sha256,
    error,
    requestedBy: p.requestedBy?.name ?? null,
    readyAt: p.readyAt?.toISOString() ?? null,
    createdAt: p.createdAt.toISOString(),
  };
}

/**
 * A worker that stopped mid-job leaves its row in flight; after a while it counts as failed, so it can be
 * retried. The worker runs this for every project now and then; asking for a packet runs it for its project.
 */
export async function failAbandonedPackets({ projectId }: { projectId?: string } = {}): Promise<number> {
  db();
  const [count] = await Packet.update(ABANDONED, {
    where: {
      ...(projectId ? { projectId } : {}),
      status: { [Op.in]: ["queued", "running"] },
      updatedAt: { [Op.lt]: new Date(Date.now() - STALE_AFTER_MS) },
    },
  });
  return count;
}

/** Every generation of the project's packets, newest first. */
export async function listPackets({ viewer, projectId }: { viewer: Viewer; projectId: string }): Promise<PacketDto[]> {
  db();
  await getProjectById({ viewer, projectId });
  const rows = await Packet.findAll({
    where: { projectId, organizationId: viewer.organizationId },
    include: [{ model: User, as: "requestedBy", attributes: ["name"] }],
    order: [
      ["revision", "DESC"],
      ["createdAt", "DESC"],
    ],
  });
  return rows.map(toPacketDto);
}

/**
 * Asks for a new revision of a packet. A failing review needs a written
 * reason, which is printed on the cover and kept in the audit trail. The
 * revision number is the next after the last ready one; a failed attempt
 * is replaced, so revisions stay consecutive.
 */
export async function requestPacket({
  viewer,
  projectId,
  kind,
  overrideReason,
}: {
  viewer: Viewer;
  projectId: string;
  kind: PacketKind;
  overrideReason?: string | null;
}): Promise<PacketDto> {
  const sequelize = db();
  const project = await getProjectById({ viewer, projectId });
  if (!can(viewer, "project:edit", { organizationId: viewer.organizationId, installerId: project.installer?.id ?? null }))
    throw new AppError("FORBIDDEN", "Your role cannot generate packets.");
  await failAbandonedPackets({ projectId });
  const reviewed = reviewedOrConflict(await getReviewedDesign({ viewer, projectId, project }));
  const base = await buildPacketInput({ viewer, reviewed, kind });
  const failing = base.review.summary.status === "fail";
  const reason = overrideReason?.trim() || null;
  if (failing && !reason) {
    throw new AppError("CONFLICT", "The design review has failing checks. Fix them first, or write why the packet must go out anyway.", {
      overrideReason: ["Write the reason for generating with failing checks"],
    });
  }

  const created = await sequelize.transaction(async (transaction) => {
    // One generation at a time per project: the lock orders concurrent requests.
    await Project.findOne({ where: { id: projectId, organizationId: viewer.organizationId }, transaction, lock: transaction.LOCK.UPDATE });
    const inFlight = await Packet.findOne({ where: { projectId, kind, status: { [Op.in]: ["queued", "running"] } }, transaction });
    if (inFlight) throw new AppError("CONFLICT", `Revision ${inFlight.revision} of this packet is still being generated.`);
    await Packet.destroy({ where: { projectId, kind, status: "failed" }, transaction });
    const previous = await Packet.findOne({ where: { projectId, kind, status: "ready" }, order: [["revision", "DESC"]], transaction });
    const revision = (previous?.revision ?? 0) + 1;
    const override = failing ? { reason: reason!, byName: viewer.name } : null;
    const answered = describeAnswers(await answeredSinceLastSending(projectId, kind, transaction));
    const changes = [...answered, ...describeChanges(previous ? (previous.input as unknown as PacketInput) : null, base as PacketInput)];
    const input: PacketInput = { ...base, revision, changes, override };
    const row = await Packet.create(
      {
        organizationId: viewer.organizationId,
        projectId,
        kind,
        revision,
        designRevision: reviewed.designRevision,
        input: input as unknown as Record<string, unknown>,
        changes,
        overrideReason: override?.reason ?? null,
        requestedById: viewer.id,
        step: "Waiting for a worker",
      },
      { transaction },
    );
    await recordAudit(
      {
        viewer,
        action: override ? "packet.requested-with-override" : "packet.requested",
        entityType: "project",
        entityId: projectId,
        changes: {
          [`${kind} packet`]: { before: previous ? `Rev ${previous.revision}` : null, after: `Rev ${revision}` },
          ...(override ? { overrideReason: { before: null, after: override.reason } } : {}),
        },
      },
      { transaction },
    );
    return row;
  });
  await enqueueOrFail(created);
  return toPacketDto(created);
}

async function enqueueOrFail(packet: Packet) {
  try {
    await enqueuePacketJob(packet.id);
  } catch (error) {
    console.error("could not queue packet", error);
    await packet.update({ status: "failed", error: "The job queue could not be reached. Try again in a moment." });
  }
}

async function findVisiblePacket(viewer: Viewer, packetId: string) {
  if (!isUuid(packetId)) throw new AppError("NOT_FOUND", "No such packet.");
  const packet = await Packet.findOne({ where: { id: packetId, organizationId: viewer.organizationId } });
  if (!packet) throw new AppError("NOT_FOUND", "No such packet.");
  await getProjectById({ viewer, projectId: packet.projectId }); // installers: only their projects
  return packet;
}

/** Puts a failed generation back in the queue, unchanged. */
export async function retryPacket({ viewer, packetId }: { viewer: Viewer; packetId: string }): Promise<PacketDto> {
  db();
  const packet = await findVisiblePacket(viewer, packetId);
  if (!can(viewer, "project:edit")) throw new AppError("FORBIDDEN", "Your role cannot generate packets.");
  if (packet.status !== "failed" && !isAbandoned(packet)) throw new AppError("CONFLICT", "Only a failed generation can be retried.");
  packet.set({ status: "queued", progress: 0, step: "Waiting for a worker", error: null });
  packet.changed("updatedAt", true); // an abandoned row may already hold these values; the new time makes it fresh
  await packet.save();
  await enqueueOrFail(packet);
  return toPacketDto(packet);
}

/** Where a ready packet's PDF is stored and the file name to download it as. */
export async function getPacketFile({ viewer, packetId }: { viewer: Viewer; packetId: string }) {
  db();
  const packet = await findVisiblePacket(viewer, packetId);
  if (packet.status !== "ready" || !packet.objectKey) throw new AppError("NOT_FOUND", "This packet is not ready.");
  const input = packet.input as unknown as PacketInput;
  return {
    key: packet.objectKey,
    fileName: `ohmstead-${input.project.number}-${packet.kind}-rev${packet.revision}.pdf`,
    sizeBytes: packet.sizeBytes,
  };
}

/** One attempt at generating a packet, as the worker sees it: what to print and how to report each step. */
export type PacketGeneration = {
  packet: { id: string; organizationId: string; projectId: string; kind: PacketKind; revision: number; input: PacketInput };
  /** Writes the step as it starts (text, progress and the attempt's log); the bar of an attempt only moves forward. */
  begin(step: { text: string; progress: number }): Promise<void>;
  /** Marks the packet ready with its stored object, and audits it in the same transaction. */
  markReady(result: { objectKey: string; sha256: string; sizeBytes: number; pageCount: number; doneText: string }): Promise<void>;
  /** Marks the attempt failed with what went wrong; the step log keeps where it stopped. */
  markFailed(message: string): Promise<void>;
};

/** Starts a new attempt at a queued packet (a new step log); null when there is none or it is ready already. */
export async function startPacketGeneration(packetId: string): Promise<PacketGeneration | null> {
  const sequelize = db();
  const row = await Packet.findByPk(packetId);
  if (!row || row.status === "ready") return null;
  await row.update({ attempts: row.attempts + 1, error: null, steps: [] });
  const logged = (progress: number, text: string) => [...row.steps, { at: new Date().toISOString(), progress, text }];
  return {
    packet: {
      id: row.id,
      organizationId: row.organizationId,
      projectId: row.projectId,
      kind: row.kind,
      revision: row.revision,
      input: row.input as unknown as PacketInput,
    },
    async begin(step) {
      const progress = Math.max(row.progress, step.progress);
      await row.update({ status: "running", progress, step: step.text, steps: logged(progress, step.text) });
    },
    async markReady({ objectKey, sha256, sizeBytes, pageCount, doneText }) {
      const committed = sequelize.transaction(async (transaction) => {
        await row.update(
          {
            status: "ready",
            progress: 100,
            step: doneText,
            steps: logged(100, doneText),
            objectKey,
            sha256,
            sizeBytes,
            pageCount,
            readyAt: new Date(),
          },
          { transaction },
        );
        await recordAudit(
          {
            viewer: { organizationId: row.organizationId, id: row.requestedById },
            action: "packet.generated",
            entityType: "project",
            entityId: row.projectId,
            changes: {
              [`${row.kind} packet`]: { before: null, after: `Rev ${row.revision}, ${pageCount} pages, SHA-256 ${sha256.slice(0, 12)}…` },
            },
          },
          { transaction },
        );
      });
      // A ready mark rolled back leaves its values on the instance: start again from what is stored.
      await committed.catch(async (error: unknown) => {
        await row.reload();
        throw error;
      });
    },
    async markFailed(message) {
      await row.update({ status: "failed", progress: 0, step: "Failed", error: message.slice(0, 500) });
    },
  };
}
