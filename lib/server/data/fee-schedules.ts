import "server-only";
import { FeeSchedule, Jurisdiction, Utility } from "@/models";
import type { Viewer } from "@/lib/domain/permissions";
import { AppError } from "@/lib/errors";
import { assertValidFeeLines, FeeScheduleError, type FeeLine } from "@/lib/fees";
import type { FeeAuthorityKind } from "@/lib/fees/types";
import { db } from "../db";
import { diffFields, recordAudit } from "./audit";
import { isUuid } from "./ids";

async function assertAuthority(viewer: Viewer, kind: FeeAuthorityKind, authorityId: string) {
  const where = { id: authorityId, organizationId: viewer.organizationId };
  const found = isUuid(authorityId) ? await (kind === "jurisdiction" ? Jurisdiction.findOne({ where }) : Utility.findOne({ where })) : null;
  if (!found) throw new AppError("NOT_FOUND", kind === "jurisdiction" ? "No such jurisdiction." : "No such utility.");
  return found.name;
}

/** The schedule's stored lines (every version); empty when none was entered. */
export async function getFeeSchedule({
  viewer,
  authorityKind,
  authorityId,
}: {
  viewer: Viewer;
  authorityKind: FeeAuthorityKind;
  authorityId: string;
}): Promise<FeeLine[]> {
  db();
  await assertAuthority(viewer, authorityKind, authorityId);
  const row = await FeeSchedule.findOne({ where: { organizationId: viewer.organizationId, authorityKind, authorityId } });
  return (row?.lines ?? []) as FeeLine[];
}

/**
 * Replaces the schedule's lines, already parsed by the shared schema (FeeScheduleInput) at the edge,
 * and checked once more against the arithmetic's own rules; the audit trail keeps the before and after.
 */
export async function saveFeeSchedule({
  viewer,
  authorityKind,
  authorityId,
  lines,
}: {
  viewer: Viewer;
  authorityKind: FeeAuthorityKind;
  authorityId: string;
  lines: FeeLine[];
}): Promise<FeeLine[]> {
  const sequelize = db();
  try {
    assertValidFeeLines(lines);
  } catch (error) {
    if (error instanceof FeeScheduleError) throw new AppError("INVALID_INPUT", error.message, { [error.field]: [error.message] });
    throw error;
  }
  await assertAuthority(viewer, authorityKind, authorityId);
  await sequelize.transaction(async (transaction) => {
    const existing = await FeeSchedule.findOne({
      where: { organizationId: viewer.organizationId, authorityKind, authorityId },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    const before = existing?.lines ?? [];
    if (existing) await existing.update({ lines, updatedById: viewer.id }, { transaction });
    else
      await FeeSchedule.create(
        { organizationId: viewer.organizationId, authorityKind, authorityId, lines, updatedById: viewer.id },
        { transaction },
      );
    await recordAudit(
      {
        viewer,
        action: "fee-schedule.saved",
        entityType: authorityKind,
        entityId: authorityId,
        changes: diffFields({ lines: before }, { lines }),
      },
      { transaction },
    );
  });
  return lines;
}

/** Both schedules that apply to a project, each line labelled with its authority. */
export async function schedulesForProject(
  viewer: Viewer,
  project: { jurisdiction: { id: string; name: string } | null; utility: { id: string; name: string } | null },
) {
  const sources = [
    project.jurisdiction ? { kind: "jurisdiction" as const, id: project.jurisdiction.id, name: project.jurisdiction.name } : null,
    project.utility ? { kind: "utility" as const, id: project.utility.id, name: project.utility.name } : null,
  ].filter((s) => s !== null);
  const rows = await FeeSchedule.findAll({ where: { organizationId: viewer.organizationId, authorityId: sources.map((s) => s.id) } });
  return sources.map((source) => ({
    ...source,
    lines: (rows.find((r) => r.authorityKind === source.kind && r.authorityId === source.id)?.lines ?? []) as FeeLine[],
  }));
}
