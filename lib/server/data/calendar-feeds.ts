import "server-only";
import { Op, type WhereOptions } from "sequelize";
import { Filing, Inspection, Organization, Project, User } from "@/models";
import { can, type Viewer } from "@/lib/domain/permissions";
import { addCalendarDays, localIsoDate } from "@/lib/domain/time-zones";
import type { InspectionEvent } from "@/lib/calendar/inspection-events";
import { AppError } from "@/lib/errors";
import { db } from "../db";
import { env } from "../env";
import { hashToken, newToken } from "../tokens";
import { recordAudit } from "./audit";
import { isUuid } from "./ids";
import { recordTokenMiss, refuseTokenGuesser } from "./token-guesses";

/** How far back a feed reaches: a calendar keeps its own copy of older visits. */
const FEED_HISTORY_DAYS = 90;

export type CalendarFeedStatus = { createdAt: string | null; dailyDigest: boolean };

/** "Their projects": the crew's assigned ones, a coordinator's own, an admin's whole company. */
function theirProjects(viewer: Viewer): WhereOptions<Project> {
  if (viewer.role === "installer") return { organizationId: viewer.organizationId, installerId: viewer.id };
  if (viewer.role === "coordinator") return { organizationId: viewer.organizationId, coordinatorId: viewer.id };
  return { organizationId: viewer.organizationId };
}

async function eventsOf(projects: Project[], where: WhereOptions<Inspection>): Promise<InspectionEvent[]> {
  if (projects.length === 0) return [];
  const filings = await Filing.findAll({
    where: { projectId: projects.map((p) => p.id) },
    attributes: ["id", "projectId", "authorityName"],
    include: [{ model: Inspection, as: "inspections", where: { [Op.and]: [where, { scheduledFor: { [Op.ne]: null } }] } }],
  });
  const byId = new Map(projects.map((p) => [p.id, p]));
  return filings
    .flatMap((f) =>
      (f.inspections ?? []).map((i) => {
        const p = byId.get(f.projectId)!;
        return {
          inspectionId: i.id,
          kind: i.kind,
          day: i.scheduledFor!,
          timeWindow: i.timeWindow,
          inspectorName: i.inspectorName,
          result: i.result,
          authorityName: f.authorityName,
          projectNumber: p.number,
          customerName: p.customerName,
          siteAddress: `${p.street}, ${p.city}, ${p.state} ${p.postalCode}`,
          filingUrl: `${env().APP_URL}/projects/${p.id}/filings#filing-${f.id}`,
          updatedAt: i.updatedAt.toISOString(),
        } satisfies InspectionEvent;
      }),
    )
    .sort((a, b) => a.day.localeCompare(b.day) || a.projectNumber - b.projectNumber);
}

const PROJECT_ATTRIBUTES = ["id", "number", "customerName", "street", "city", "state", "postalCode", "installerId", "organizationId"];

/** One inspection of a project the viewer may see, as a calendar event. */
export async function getInspectionEvent({ viewer, inspectionId }: { viewer: Viewer; inspectionId: string }): Promise<InspectionEvent> {
  db();
  const missing = () => new AppError("NOT_FOUND", "No such inspection.");
  if (!isUuid(inspectionId)) throw missing();
  const inspection = await Inspection.findOne({ where: { id: inspectionId, organizationId: viewer.organizationId } });
  const filing = inspection ? await Filing.findByPk(inspection.filingId, { attributes: ["projectId"] }) : null;
  const project = filing
    ? await Project.findOne({ where: { id: filing.projectId, organizationId: viewer.organizationId }, attributes: PROJECT_ATTRIBUTES })
    : null;
  if (!project || !can(viewer, "project:view", project)) throw missing();
  const [event] = await eventsOf([project], { id: inspectionId });
  if (!event) throw new AppError("NOT_FOUND", "This inspection has no day booked yet.");
  return event;
}

/** Whether the viewer has a calendar feed (since when) and receives the morning digest: the profile page. */
export async function getProfileSettings({ viewer }: { viewer: Viewer }): Promise<CalendarFeedStatus> {
  db();
  const user = await User.findOne({ where: { id: viewer.id, organizationId: viewer.organizationId } });
  if (!user) throw new AppError("NOT_FOUND", "No such user.");
  return { createdAt: user.calendarTokenCreatedAt?.toISOString() ?? null, dailyDigest: user.dailyDigest };
}

/**
 * A new private feed address for the viewer, shown once: only its token's hash is kept, and a new one
 * replaces (revokes) the old. Not for API tokens: the feed is a person's.
 */
export async function createCalendarFeed({ viewer }: { viewer: Viewer }): Promise<{ url: string }> {
  if (!can(viewer, "profile:edit")) throw new AppError("FORBIDDEN", "A calendar feed belongs to a person.");
  const sequelize = db();
  const { token, tokenHash } = newToken();
  await sequelize.transaction(async (transaction) => {
    await User.update(
      { calendarTokenHash: tokenHash, calendarTokenCreatedAt: new Date() },
      { where: { id: viewer.id, organizationId: viewer.organizationId }, transaction },
    );
    await recordAudit({ viewer, action: "calendar-feed.created", entityType: "user", entityId: viewer.id, changes: {} }, { transaction });
  });
  return { url: `${env().APP_URL}/calendar/${token}` };
}

/** Turns the viewer's feed off: its address stops answering at once. */
export async function revokeCalendarFeed({ viewer }: { viewer: Viewer }): Promise<void> {
  if (!can(viewer, "profile:edit")) throw new AppError("FORBIDDEN", "A calendar feed belongs to a person.");
  const sequelize = db();
  await sequelize.transaction(async (transaction) => {
    await User.update(
      { calendarTokenHash: null, calendarTokenCreatedAt: null },
      { where: { id: viewer.id, organizationId: viewer.organizationId }, transaction },
    );
    await recordAudit({ viewer, action: "calendar-feed.revoked", entityType: "user", entityId: viewer.id, changes: {} }, { transaction });
  });
}

/**
 * The inspections of the feed owner's projects, from three months back on, for the public feed route.
 * Throttled per address like inspector links; an unknown, revoked or deactivated owner's token is NOT_FOUND.
 */
export async function openCalendarFeed(token: string, address: string): Promise<{ calName: string; events: InspectionEvent[] }> {
  db();
  await refuseTokenGuesser(address, "calendar addresses");
  const user = /^[A-Za-z0-9_-]{16,100}$/.test(token) ? await User.findOne({ where: { calendarTokenHash: hashToken(token) } }) : null;
  if (!user || !user.isActive) {
    await recordTokenMiss(address);
    throw new AppError("NOT_FOUND", "This calendar address does not exist or was turned off.");
  }
  const viewer: Viewer = { id: user.id, organizationId: user.organizationId, role: user.role, name: user.name, email: user.email };
  const organization = await Organization.findByPk(user.organizationId, { attributes: ["name", "timeZone"] });
  const from = addCalendarDays(localIsoDate(new Date().toISOString(), organization!.timeZone), -FEED_HISTORY_DAYS);
  const projects = await Project.findAll({ where: theirProjects(viewer), attributes: PROJECT_ATTRIBUTES });
  const events = await eventsOf(projects, { scheduledFor: { [Op.gte]: from } });
  return { calName: `Inspections · ${organization!.name}`, events };
}
