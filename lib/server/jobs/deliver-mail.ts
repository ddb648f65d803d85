import "server-only";
import type { Transporter } from "nodemailer";
import type { Transaction } from "sequelize";
import { db } from "../db";
import { claimDueMail, markMailAttemptFailed, markMailSent } from "../data/outbox";
import { sendMail } from "../services/mail";
import { getObjectBytes } from "../services/storage";

export type DeliveryReport = { sent: number; retried: number; failed: number };
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
  const row = await claimDueMail(transaction);
  if (!row) return null;
  const attempts = row.attempts + 1;
  try {
    // A Message-ID fixed per row lets a receiving server spot the rare resend after a lost commit.
    // Attachments are read from storage at send time, so the outbox row stays small; a storage failure retries like SMTP's.
    const attachments = await Promise.all(
      (row.attachments ?? []).map(async (a) => ({
        filename: a.fileName,
        contentType: a.contentType,
        content: Buffer.from(await getObjectBytes(a.objectKey)),
      })),
    );
    const { response } = await sendMail(
      {
        to: row.toAddress,
        subject: row.subject,
        text: row.textBody,
        html: row.htmlBody,
        attachments,
        messageId: `<${row.id}@outbox.ohmstead>`,
      },
      transport,
    );
    await markMailSent(row, { attempts, response }, transaction);
    return "sent";
  } catch (error) {
    return markMailAttemptFailed(row, { attempts, error }, transaction);
  }
}
