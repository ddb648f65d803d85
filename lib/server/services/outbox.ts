import "server-only";
import type { Transporter } from "nodemailer";
import { Op, type Transaction } from "sequelize";
import { OutboxMessage } from "@/models";
import type { OutboxAttachment } from "@/lib/domain/stored-values";
import { afterFailedAttempt } from "@/lib/domain/mail-retry";
import { db } from "../db";
import { sendMail } from "./mail";
import { getObjectBytes } from "./storage";

export type QueuedMail = { to: string; subject: string; text: string; html: string; organizationId?: string | null; attachments?: OutboxAttachment[] };
export type DeliveryReport = { sent: number; retried: number; failed: number };

/**
 * Puts one e-mail in the outbox. Pass the transaction of the change that causes the mail:
 * the message then exists exactly when the change commits, and the worker sends it.
 */
export async function enqueueMail(mail: QueuedMail, { transaction }: { transaction?: Transaction } = {}): Promise<{ id: string }> {
  db();
  const row = await OutboxMessage.create(
    { organizationId: mail.organizationId ?? null, toAddress: mail.to, subject: mail.subject, textBody: mail.text, htmlBody: mail.html, attachments: mail.attachments ?? [], nextAttemptAt: new Date() },
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
  { coalesceKey, holdSeconds, organizationId, to, startedAt }: { coalesceKey: string; holdSeconds: number; organizationId: string; to: string; startedAt: Date },
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
    { organizationId, toAddress: to, subject: mail.subject, textBody: mail.text, htmlBody: mail.html, attachments: [], nextAttemptAt: new Date(startedAt.getTime() + holdSeconds * 1000), coalesceKey },
    { transaction },
  );
  return { id: row.id, merged: false };
}

type Outcome = keyof DeliveryReport;

/**
 * Sends up to `limit` due messages, one row per transaction. The row stays locked (FOR UPDATE SKIP LOCKED)
 * while SMTP talks, so parallel workers never send it twice, and it is marked sent only after the server
 * accepted it. `transport` overrides the configured SMTP server (tests use their own).
 */
export async function deliverDueMail({ limit = 20, transport }: { limit?: number; transport?: Transporter } = {}): Promise<DeliveryReport> {
  const report: DeliveryReport = { sent: 0, retried: 0, failed: 0 };
  for (let i = 0; i < limit; i++) {
    const outcome = await db().transaction((transaction) => deliverOne(transaction, transport));
    if (!outcome) break;
    report[outcome]++;
  }
  return report;
}

async function deliverOne(transaction: Transaction, transport: Transporter | undefined): Promise<Outcome | null> {
  const row = await OutboxMessage.findOne({
    where: { status: "queued", nextAttemptAt: { [Op.lte]: new Date() } },
    order: [["nextAttemptAt", "ASC"]],
    lock: transaction.LOCK.UPDATE,
    skipLocked: true,
    transaction,
  });
  if (!row) return null;
  const attempts = row.attempts + 1;
  try {
    // A Message-ID fixed per row lets a receiving server spot the rare resend after a lost commit.
    // Attachments are read from storage at send time, so the outbox row stays small; a storage failure retries like SMTP's.
    const attachments = await Promise.all((row.attachments ?? []).map(async (a) => ({ filename: a.fileName, contentType: a.contentType, content: Buffer.from(await getObjectBytes(a.objectKey)) })));
    const { response } = await sendMail({ to: row.toAddress, subject: row.subject, text: row.textBody, html: row.htmlBody, attachments, messageId: `<${row.id}@outbox.ohmstead>` }, transport);
    await row.update({ status: "sent", attempts, smtpResponse: response, sentAt: new Date(), lastError: null }, { transaction });
    return "sent";
  } catch (error) {
    const next = afterFailedAttempt(attempts, new Date());
    const lastError = (error instanceof Error ? error.message : String(error)).slice(0, 2000);
    await row.update({ attempts, lastError, ...(next.status === "failed" ? { status: "failed" as const } : { nextAttemptAt: next.nextAttemptAt }) }, { transaction });
    return next.status === "failed" ? "failed" : "retried";
  }
}
