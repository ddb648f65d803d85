import "server-only";
import { Op } from "sequelize";
import { OutboxMessage } from "@/models";
import { can, type Viewer } from "@/lib/domain/permissions";
import { AppError } from "@/lib/errors";
import { db } from "../db";
import { listCaughtMessages, outboxIdOf, type CaughtMessage } from "../services/mailbox";

/**
 * The local catcher's messages that the viewer's organization sent, newest first. The catcher holds
 * everyone's mail (invitation and inspector links among it), so a message shows only when its
 * Message-ID names an outbox row of this organization.
 */
export async function listOrganizationMail({ viewer }: { viewer: Viewer }): Promise<CaughtMessage[]> {
  if (!can(viewer, "mailbox:view")) throw new AppError("NOT_FOUND", "No such page.");
  db();
  const messages = await listCaughtMessages();
  const ids = [...new Set(messages.map(outboxIdOf).filter((id): id is string => id !== null))];
  if (ids.length === 0) return [];
  const own = await OutboxMessage.findAll({ where: { id: { [Op.in]: ids }, organizationId: viewer.organizationId }, attributes: ["id"] });
  const ownIds = new Set(own.map((row) => row.id));
  return messages.filter((m) => ownIds.has(outboxIdOf(m) ?? ""));
}
