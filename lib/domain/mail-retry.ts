// When a failed e-mail is tried again. SMTP outages are usually short (a restart,
// a full queue), so retries start fast and spread out; after the last attempt
// (some fifty minutes after the first) the message is marked failed with its error.

export const MAIL_RETRY = { firstDelayMs: 5_000, maxDelayMs: 10 * 60_000, maxAttempts: 12 } as const;

/** Wait before the next try, after `attempts` failed tries (1 or more): 5 s, 10 s, 20 s … capped at 10 min. */
export function mailRetryDelayMs(attempts: number): number {
  const doublings = Math.max(0, attempts - 1);
  return Math.min(MAIL_RETRY.maxDelayMs, MAIL_RETRY.firstDelayMs * 2 ** doublings);
}

/** What a failed try leads to: another try at a later time, or giving up. */
export function afterFailedAttempt(attempts: number, now: Date): { status: "queued"; nextAttemptAt: Date } | { status: "failed" } {
  if (attempts >= MAIL_RETRY.maxAttempts) return { status: "failed" };
  return { status: "queued", nextAttemptAt: new Date(now.getTime() + mailRetryDelayMs(attempts)) };
}
