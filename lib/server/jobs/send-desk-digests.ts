import "server-only";
import { digestDayAt } from "@/lib/domain/desk";
import { listDigestRecipients, sendDeskDigest, type DigestOutcome } from "../data/desk-digests";

export type DigestReport = Record<DigestOutcome, number>;

/**
 * Sends each coordinator's digest whose working morning it is in their organization's zone. Run by the
 * worker on a pg-boss schedule every quarter hour; any number of workers may run it at once, because
 * each person's day is claimed once (`sendDeskDigest`).
 */
export async function sendDueDeskDigests({
  now = new Date(),
  organizationIds,
}: { now?: Date; organizationIds?: string[] } = {}): Promise<DigestReport> {
  const report: DigestReport = { sent: 0, empty: 0, already: 0 };
  for (const recipient of await listDigestRecipients({ organizationIds })) {
    const today = digestDayAt(now.toISOString(), recipient.timeZone);
    if (!today) continue;
    report[await sendDeskDigest({ recipient, today })]++;
  }
  return report;
}
