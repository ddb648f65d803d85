import "server-only";
import type { Transaction } from "sequelize";
import { AuditEvent, User } from "@/models";
import type { AuditChanges } from "@/lib/domain/stored-values";
import type { Viewer } from "@/lib/domain/permissions";
import { db } from "../db";
import type { AuditEventDto } from "@/lib/dto/audit";

/** Before/after pairs for the fields that differ. */
export function diffFields<T extends Record<string, unknown>>(before: Partial<T>, after: Partial<T>): AuditChanges {
  const changes: AuditChanges = {};
  for (const key of Object.keys(after)) {
    const a = before[key] instanceof Date ? (before[key] as Date).toISOString() : before[key];
    const b = after[key] instanceof Date ? (after[key] as Date).toISOString() : after[key];
    if (JSON.stringify(a ?? null) !== JSON.stringify(b ?? null)) changes[key] = { before: a ?? null, after: b ?? null };
  }
  return changes;
}

/** Who an audit event is by: the viewer, or for work done later on someone's behalf (the worker), their id in their organization. */
export type AuditActor = Pick<Viewer, "organizationId"> & { id: string | null };

/** Writes one audit event; pass the caller's transaction so it commits or rolls back with the change. */
export async function recordAudit(
  {
    viewer,
    action,
    entityType,
    entityId,
    changes = {},
  }: { viewer: AuditActor | null; action: string; entityType: string; entityId: string; changes?: AuditChanges },
  { transaction }: { transaction?: Transaction } = {},
) {
  db();
  if (!viewer) throw new Error("recordAudit needs a viewer");
  await AuditEvent.create(
    { organizationId: viewer.organizationId, actorId: viewer.id, action, entityType, entityId, changes },
    { transaction },
  );
}

/** The audit trail of one entity, newest first, within the viewer's organization. */
export async function listAuditEvents({
  viewer,
  entityType,
  entityId,
}: {
  viewer: Viewer;
  entityType: string;
  entityId: string;
}): Promise<AuditEventDto[]> {
  db();
  const rows = await AuditEvent.findAll({
    where: { organizationId: viewer.organizationId, entityType, entityId },
    include: [{ model: User, as: "actor", attributes: ["name"] }],
    order: [["createdAt", "DESC"]],
    limit: 200,
  });
  return rows.map((row) => ({
    id: row.id,
    action: row.action,
    entityType: row.entityType,
    entityId: row.entityId,
    actorName: row.actor?.name ?? null,
    changes: row.changes,
    createdAt: row.createdAt.toISOString(),
  }));
}
