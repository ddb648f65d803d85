import "server-only";
import nodemailer, { type Transporter } from "nodemailer";
import { env } from "../env";

export type OutgoingMail = { to: string; subject: string; text: string; html: string };

let transporter: Transporter | undefined;

function transport(): Transporter {
  transporter ??= nodemailer.createTransport(env().SMTP_URL);
  return transporter;
}

/** Sends one message through the configured SMTP server (the local catcher in development). */
export async function sendMail(mail: OutgoingMail): Promise<void> {
  await transport().sendMail({ from: env().MAIL_FROM, ...mail });
}

/** Opens and closes an SMTP session without sending, for the health check. */
export async function verifyMail(): Promise<void> {
  await transport().verify();
}
