import "server-only";
import { env } from "../env";

export type CaughtMessage = {
  id: string;
  messageId?: string;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string;
  attachments?: { fileName: string; contentType: string; sizeBytes: number }[];
};

/** True only when the local SMTP catcher runs beside the app. */
export function isMailboxEnabled(): boolean {
  return Boolean(env().MAILBOX_URL);
}

/** The outbox row a caught message was sent from, read from the Message-ID the outbox gives each row. */
export function outboxIdOf(message: CaughtMessage): string | null {
  return /^<([0-9a-f-]{36})@outbox\.ohmstead>$/i.exec(message.messageId ?? "")?.[1] ?? null;
}

/** Every message the local catcher holds, newest first; callers show only the viewer's organization's. */
export async function listCaughtMessages(): Promise<CaughtMessage[]> {
  const base = env().MAILBOX_URL;
  if (!base) return [];
  const res = await fetch(`${base}/messages`, { cache: "no-store" });
  if (!res.ok) throw new Error(`mail catcher answered ${res.status}`);
  return res.json();
}
