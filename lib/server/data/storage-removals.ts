import "server-only";
import { Op, type Transaction } from "sequelize";
import { StorageRemoval } from "@/models";
import { mailRetryDelayMs } from "@/lib/domain/mail-retry";
import { db } from "../db";
import { deleteObject } from "../services/storage";

/**
 * Marks stored objects for removal, inside the transaction that removes their record: the mark exists
 * exactly when the record is gone. The objects themselves go after the commit (sweepStorageRemovals).
 */
export async function queueStorageRemovals(objectKeys: string[], { transaction }: { transaction: Transaction }): Promise<void> {
  if (!objectKeys.length) return;
  const now = new Date();
  await StorageRemoval.bulkCreate(
    objectKeys.map((objectKey) => ({ objectKey, nextAttemptAt: now })),
    { transaction, ignoreDuplicates: true },
  );
}

/**
 * Removes marked objects that are due (all of them, or only `objectKeys`), oldest first. A removal that
 * fails is logged and tried again later, on the same growing waits as e-mail (5 s doubling to 10 min),
 * until storage takes it; removing an object that is already gone succeeds. Never throws for a storage
 * failure: the caller's request has already done its work.
 */
export async function sweepStorageRemovals({ objectKeys, limit = 50 }: { objectKeys?: string[]; limit?: number } = {}): Promise<{
  removed: number;
  failed: number;
}> {
  db();
  const due = await StorageRemoval.findAll({
    where: { nextAttemptAt: { [Op.lte]: new Date() }, ...(objectKeys ? { objectKey: objectKeys } : {}) },
    order: [["nextAttemptAt", "ASC"]],
    limit,
  });
  let removed = 0;
  let failed = 0;
  for (const row of due) {
    try {
      await deleteObject(row.objectKey);
      await row.destroy();
      removed++;
    } catch (error) {
      failed++;
      const attempts = row.attempts + 1;
      const message = error instanceof Error ? error.message : String(error);
      console.error(`storage removal of ${row.objectKey} failed (try ${attempts}); will try again`, message);
      await row
        .update({ attempts, lastError: message.slice(0, 1000), nextAttemptAt: new Date(Date.now() + mailRetryDelayMs(attempts)) })
        .catch((e: unknown) => console.error("storage removal bookkeeping", e));
    }
  }
  return { removed, failed };
}
