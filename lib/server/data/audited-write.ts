import "server-only";
import type { Transaction } from "sequelize";
import type { AuditChanges } from "@/lib/domain/stored-values";
import type { Viewer } from "@/lib/domain/permissions";
import { db } from "../db";
import { recordAudit } from "./audit";

/**
 * Runs one write and records its audit event in the same transaction, so both
 * commit or neither does. The work returns the written row and what changed.
 */
export async function writeWithAudit<R extends { id: string }>(
  { viewer, action, entityType }: { viewer: Viewer; action: string; entityType: string },
  work: (transaction: Transaction) => Promise<{ row: R; changes: AuditChanges }>,
): Promise<R> {
  return db().transaction(async (transaction) => {
    const { row, changes } = await work(transaction);
    await recordAudit({ viewer, action, entityType, entityId: row.id, changes }, { transaction });
    return row;
  });
}
