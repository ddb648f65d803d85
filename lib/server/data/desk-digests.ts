import "server-only";
import { QueryTypes } from "sequelize";
import { DeskDigest, Organization, User } from "@/models";
import { can, type Viewer } from "@/lib/domain/permissions";
import { AppError } from "@/lib/errors";
import { DIGEST_ROWS_SHOWN, DESK_SECTIONS, DESK_SECTION_TITLES, deskDayText, type Desk, type DeskRow } from "@/lib/domain/desk";
import { calendarDayText } from "@/lib/domain/time-zones";
import { deskDigestEmail } from "@/templates/email/desk-digest";
import { db } from "../db";
import { env } from "../env";
import { deskOf } from "./desk";
import { enqueueMail } from "./outbox";

export type DigestRecipient = { viewer: Viewer; timeZone: string };
export type DigestOutcome = "sent" | "empty" | "already";

/**
 * Active coordinators who have set a password and keep the digest on, with their organization's zone
 * (of the given organizations only, when named).
 */
export async function listDigestRecipients({ organizationIds }: { organizationIds?: string[] } = {}): Promise<DigestRecipient[]> {
  db();
  const users = await User.findAll({
    where: { role: "coordinator", isActive: true, dailyDigest: true, ...(organizationIds ? { organizationId: organizationIds } : {}) },
  });
  const signedUp = users.filter((u) => u.passwordHash !== null);
  const organizations = await Organization.findAll({
    where: { id: [...new Set(signedUp.map((u) => u.organizationId))] },
    attributes: ["id", "timeZone"],
  });
  const zoneOf = new Map(organizations.map((o) => [o.id, o.timeZone]));
  return signedUp.map((u) => ({
    viewer: { id: u.id, organizationId: u.organizationId, role: u.role, name: u.name, email: u.email },
    timeZone: zoneOf.get(u.organizationId)!,
  }));
}

/** The link a desk row opens: the filings page, at the filing's card. */
export const filingUrl = (row: Pick<DeskRow, "path">) => `${env().APP_URL}${row.path}`;

/** One line of the digest: the project, what is owed, to whom, since when. */
export function digestLine(row: DeskRow): string {
  return `Project ${row.projectNumber} · ${row.customerName}: ${row.what} · ${row.toWhom} · ${calendarDayText(row.since)} (${deskDayText(row)})`;
}

function digestMail(desk: Desk, today: string) {
  return deskDigestEmail({
    dayText: calendarDayText(today),
    deskUrl: `${env().APP_URL}/dashboard`,
    sections: DESK_SECTIONS.map((s) => ({
      title: DESK_SECTION_TITLES[s],
      total: desk[s].length,
      rows: desk[s].slice(0, DIGEST_ROWS_SHOWN).map((row) => ({ text: digestLine(row), url: filingUrl(row) })),
      moreUrl: `${env().APP_URL}/dashboard?desk=${s}#desk-${s}`,
    })),
  });
}

/**
 * The digest of one coordinator for one local day, at most once: the day is claimed with a unique row
 * and the e-mail queued in the same transaction, so a second worker (or a second run that morning) finds
 * the claim and sends nothing. A desk with nothing on it sends no e-mail; the claim is kept all the same,
 * so a row added later that morning waits for the next working day's digest rather than a second message.
 */
export async function sendDeskDigest({ recipient, today }: { recipient: DigestRecipient; today: string }): Promise<DigestOutcome> {
  const sequelize = db();
  const { viewer, timeZone } = recipient;
  const desk = await deskOf({ viewer, timeZone, today });
  const count = DESK_SECTIONS.reduce((n, s) => n + desk[s].length, 0);
  return sequelize.transaction(async (transaction) => {
    const claimed = await sequelize.query<{ id: string }>(
      `INSERT INTO desk_digests (id, organization_id, user_id, local_day, item_count, created_at)
       VALUES (gen_random_uuid(), :organizationId, :userId, :day, :count, now())
       ON CONFLICT (user_id, local_day) DO NOTHING RETURNING id`,
      {
        replacements: { organizationId: viewer.organizationId, userId: viewer.id, day: today, count },
        type: QueryTypes.SELECT,
        transaction,
      },
    );
    if (claimed.length === 0) return "already";
    if (count === 0) return "empty";
    const { id } = await enqueueMail(
      { to: viewer.email, organizationId: viewer.organizationId, ...digestMail(desk, today) },
      { transaction },
    );
    await DeskDigest.update({ outboxMessageId: id }, { where: { id: claimed[0]!.id }, transaction });
    return "sent";
  });
}

/** Whether the person receives the morning digest; only their own setting. */
export async function setDailyDigest({ viewer, enabled }: { viewer: Viewer; enabled: boolean }): Promise<{ enabled: boolean }> {
  if (!can(viewer, "profile:edit")) throw new AppError("FORBIDDEN", "The digest is each person's own choice.");
  db();
  await User.update({ dailyDigest: enabled }, { where: { id: viewer.id, organizationId: viewer.organizationId } });
  return { enabled };
}
