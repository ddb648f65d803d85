import "server-only";
import nodemailer, { type Transporter } from "nodemailer";
import { env } from "../env";

export type OutgoingMail = {
  to: string;
  subject: string;
  text: string;
  html: string;
  attachments?: { filename: string; content: Buffer; contentType: string }[];
};

let transporter: Transporter | undefined;

/** Builds an SMTP transport; timeouts keep a hung server from holding the worker (and its row lock) for long. */
export function createMailTransport(smtpUrl: string): Transporter {
  return nodemailer.createTransport(smtpUrl, { connectionTimeout: 10_000, greetingTimeout: 10_000, socketTimeout: 30_000 });
}

function transport(): Transporter {
  transporter ??= createMailTransport(env().SMTP_URL);
  return transporter;
}

/**
 * Sends one message through the configured SMTP server (the local catcher in development), or through
 * `via` when given, and returns the server's reply. Application code enqueues mail instead (data/outbox.ts).
 */
export async function sendMail(mail: OutgoingMail & { messageId?: string }, via: Transporter = transport()): Promise<{ response: string }> {
  const info = await via.sendMail({ from: env().MAIL_FROM, ...mail });
  return { response: String(info.response ?? "") };
}

/** Opens and closes an SMTP session without sending, for the health check. */
export async function verifyMail(): Promise<void> {
  await transport().verify();
}
