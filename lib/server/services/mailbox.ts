import "server-only";
import { env } from "../env";

export type CaughtMessage = {
  id: string;
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

export async function listCaughtMessages(): Promise<CaughtMessage[]> {
  const base = env().MAILBOX_URL;
  if (!base) return [];
  const res = await fetch(`${base}/messages`, { cache: "no-store" });
  if (!res.ok) throw new Error(`mail catcher answered ${res.status}`);
  return res.json();
}
