import "server-only";
import { Op, type Transaction } from "sequelize";
import { OutboxMessage } from "@/models";
import type { OutboxAttachment } from "@/lib/domain/stored-values";
import { afterFailedAttempt } from "@/lib/domain/mail-retry";
import { db } from "../db";

export type QueuedMail = {
  to: string;
  subject: string;
  text: string;
  html: string;
  organizationId?: string | null;
  attachments?: OutboxAttachment[];
};

/**
 * Puts one e-mail in the outbox. Pass the transaction of the change that causes the mail:
 * the message then exists exactly when the change commits, and the worker sends it.
 */
export async function enqueueMail(mail: QueuedMail, { transaction }: { transaction?: Transaction } = {}): Promise<{ id: string }> {
  db();
  const row = await OutboxMessage.create(
    {
      organizationId: mail.organizationId ?? null,
      toAddress: mail.to,
      subject: mail.subject,
      textBody: mail.text,
      htmlBody: mail.html,
      attachments: mail.attachments ?? [],
      nextAttemptAt: new Date(),
    },
    { transaction },
  );
  return { id: row.id };
}

/**
 * Holds one e-mail for `holdSeconds` from `startedAt` so that later news of the same thing (same
 * `coalesceKey`) joins it instead of making another message: `compose` is given the start of the
 * held window (this news's `startedAt` when nothing is held) and writes the whole mail from
 * everything since then. Call it inside the change's transaction, after locking what the key names,
 * so two changes at once merge rather than race.
 */
export async function holdOrMergeMail(
  {
    coalesceKey,
    holdSeconds,
    organizationId,
    to,
    startedAt,
  }: { coalesceKey: string; holdSeconds: number; organizationId: string; to: string; startedAt: Date },
  compose: (since: Date) => Promise<Pick<QueuedMail, "subject" | "text" | "html">>,
  { transaction }: { transaction: Transaction },
): Promise<{ id: string; merged: boolean }> {
  db();
  const now = new Date();
  const held = await OutboxMessage.findOne({
    where: { coalesceKey, toAddress: to, status: "queued", attempts: 0, nextAttemptAt: { [Op.gt]: now } },
    lock: transaction.LOCK.UPDATE,
    transaction,
  });
  // A held row is due at its window's start plus the hold, so the start is read back from it.
  const mail = await compose(held ? new Date(held.nextAttemptAt.getTime() - holdSeconds * 1000) : startedAt);
  if (held) {
    await held.update({ subject: mail.subject, textBody: mail.text, htmlBody: mail.html }, { transaction });
    return { id: held.id, merged: true };
  }
  const row = await OutboxMessage.create(
    {
      organizationId,
      toAddress: to,
      subject: mail.subject,
      textBody: mail.text,
      htmlBody: mail.html,
      attachments: [],
      nextAttemptAt: new Date(startedAt.getTime() + holdSeconds * 1000),
      coalesceKey,
    },
    { transaction },
  );
  return { id: row.id, merged: false };
}

/** A message due now, locked (FOR UPDATE SKIP LOCKED) for the caller's transaction so parallel workers never take it twice. */
export async function claimDueMail(transaction: Transaction): Promise<OutboxMessage | null> {
  db();
  return OutboxMessage.findOne({
    where: { status: "queued", nextAttemptAt: { [Op.lte]: new Date() } },
    order: [["nextAttemptAt", "ASC"]],
    lock: transaction.LOCK.UPDATE,
    skipLocked: true,
    transaction,
  });
}

/** Marks a claimed message sent, with the mail server's reply. */
export async function markMailSent(
  row: OutboxMessage,
  { attempts, response }: { attempts: number; response: string },
  transaction: Transaction,
): Promise<void> {
  await row.update({ status: "sent", attempts, smtpResponse: response, sentAt: new Date(), lastError: null }, { transaction });
}

/** Records a failed attempt: the message waits for its next try, or is failed for good after its last one. */
export async function markMailAttemptFailed(
  row: OutboxMessage,
  { attempts, error }: { attempts: number; error: unknown },
  transaction: Transaction,
): Promise<"retried" | "failed"> {
  const next = afterFailedAttempt(attempts, new Date());
  const lastError = (error instanceof Error ? error.message : String(error)).slice(0, 2000);
  await row.update(
    { attempts, lastError, ...(next.status === "failed" ? { status: "failed" as const } : { nextAttemptAt: next.nextAttemptAt }) },
    { transaction },
  );
  return next.status === "failed" ? "failed" : "retried";
}
