import "server-only";
import { Op, type Transaction } from "sequelize";
import { Invitation, Organization, User } from "@/models";
import type { Viewer } from "@/lib/domain/permissions";
import type { Role } from "@/lib/domain/roles";
import { AppError } from "@/lib/errors";
import type { InviteUserInput } from "@/lib/schemas/user";
import { invitationEmail } from "@/templates/email/invitation";
import { db } from "../db";
import { env } from "../env";
import { hashPassword, verifyPassword } from "../passwords";
import { enqueueMail } from "../services/outbox";
import { hashToken, newToken } from "../tokens";
import { recordAudit } from "./audit";
import { assertSignInAllowed, clearAccountFailures, recordSignInFailure } from "./sign-in-throttle";

export const INVITATION_DAYS = 7;

export type UserStatus = "active" | "invited" | "deactivated";
export type UserDto = { id: string; name: string; email: string; role: Role; status: UserStatus; lastSignInAt: string | null };

function toViewer(user: User): Viewer {
  return { id: user.id, organizationId: user.organizationId, role: user.role, name: user.name, email: user.email };
}

function toUserDto(user: User): UserDto {
  const status: UserStatus = !user.isActive ? "deactivated" : user.passwordHash ? "active" : "invited";
  return { id: user.id, name: user.name, email: user.email, role: user.role, status, lastSignInAt: user.lastSignInAt?.toISOString() ?? null };
}

/** Checks e-mail and password under the sign-in throttle; returns the viewer or throws a readable AppError. */
export async function authenticate({ email, password, address }: { email: string; password: string; address: string }): Promise<Viewer> {
  db();
  await assertSignInAllowed({ email, address });
  const user = await User.findOne({ where: { email: email.toLowerCase() } });
  const ok = await verifyPassword(password, user?.passwordHash ?? null);
  if (!user || !ok) {
    await recordSignInFailure({ email, address });
    throw new AppError("UNAUTHORIZED", "That e-mail address and password do not match an account.");
  }
  if (!user.isActive) throw new AppError("FORBIDDEN", "This account has been deactivated. Ask your organization's admin.");
  await clearAccountFailures(email);
  await user.update({ lastSignInAt: new Date() });
  return toViewer(user);
}

/** The user behind a session, when still active. */
export async function getActiveViewer(userId: string): Promise<Viewer | null> {
  db();
  const user = await User.findOne({ where: { id: userId, isActive: true } });
  return user ? toViewer(user) : null;
}

/** Everyone in the viewer's organization, for the users page and assignment pickers. */
export async function listUsers({ viewer, role }: { viewer: Viewer; role?: Role }): Promise<UserDto[]> {
  db();
  const rows = await User.findAll({
    where: { organizationId: viewer.organizationId, ...(role ? { role } : {}) },
    order: [["name", "ASC"]],
  });
  return rows.map(toUserDto);
}

async function getUserInOrganization(viewer: Viewer, userId: string) {
  const user = await User.findOne({ where: { id: userId, organizationId: viewer.organizationId } });
  if (!user) throw new AppError("NOT_FOUND", "No such user.");
  return user;
}

/** Queues the set-password e-mail in the transaction that creates the invitation, so both exist or neither. */
async function enqueueInvitationEmail({ viewer, user, token }: { viewer: Viewer; user: User; token: string }, transaction: Transaction) {
  const organization = await Organization.findByPk(viewer.organizationId, { transaction });
  const url = `${env().APP_URL}/invitation/${token}`;
  const mail = invitationEmail({ name: user.name, organizationName: organization?.name ?? "", inviterName: viewer.name, url, days: INVITATION_DAYS });
  await enqueueMail({ to: user.email, organizationId: viewer.organizationId, ...mail }, { transaction });
}

/** Adds a user without a password and a one-time invitation, and queues the invitation e-mail; returns the token for tests. */
export async function inviteUser({ viewer, input }: { viewer: Viewer; input: InviteUserInput }) {
  const sequelize = db();
  const existing = await User.findOne({ where: { email: input.email } });
  if (existing) throw new AppError("CONFLICT", "A user with this e-mail address already exists.", { email: ["Already in use"] });
  const { token, tokenHash } = newToken();
  const user = await sequelize.transaction(async (transaction) => {
    const created = await User.create({ organizationId: viewer.organizationId, email: input.email, name: input.name, role: input.role, passwordHash: null, lastSignInAt: null }, { transaction });
    await Invitation.create(
      { organizationId: viewer.organizationId, userId: created.id, tokenHash, expiresAt: new Date(Date.now() + INVITATION_DAYS * 86_400_000), usedAt: null, createdById: viewer.id },
      { transaction },
    );
    await recordAudit({ viewer, action: "user.invited", entityType: "user", entityId: created.id, changes: { email: { before: null, after: created.email }, role: { before: null, after: created.role } } }, { transaction });
    await enqueueInvitationEmail({ viewer, user: created, token }, transaction);
    return created;
  });
  return { user: toUserDto(user), token };
}

export async function updateUserRole({ viewer, userId, role }: { viewer: Viewer; userId: string; role: Role }) {
  const sequelize = db();
  if (userId === viewer.id) throw new AppError("CONFLICT", "You cannot change your own role; ask another admin.");
  return sequelize.transaction(async (transaction) => {
    const user = await getUserInOrganization(viewer, userId);
    const before = user.role;
    await user.update({ role }, { transaction });
    await recordAudit({ viewer, action: "user.role-changed", entityType: "user", entityId: user.id, changes: { role: { before, after: role } } }, { transaction });
    return toUserDto(user);
  });
}

export async function setUserActive({ viewer, userId, isActive }: { viewer: Viewer; userId: string; isActive: boolean }) {
  const sequelize = db();
  if (userId === viewer.id) throw new AppError("CONFLICT", "You cannot deactivate your own account.");
  return sequelize.transaction(async (transaction) => {
    const user = await getUserInOrganization(viewer, userId);
    const before = user.isActive;
    await user.update({ isActive }, { transaction });
    await recordAudit({ viewer, action: isActive ? "user.reactivated" : "user.deactivated", entityType: "user", entityId: user.id, changes: { isActive: { before, after: isActive } } }, { transaction });
    return toUserDto(user);
  });
}

async function findOpenInvitation(token: string) {
  const invitation = await Invitation.findOne({ where: { tokenHash: hashToken(token), usedAt: null, expiresAt: { [Op.gt]: new Date() } } });
  if (!invitation) return null;
  const user = await User.findOne({ where: { id: invitation.userId, isActive: true } });
  return user ? { invitation, user } : null;
}

/** What the set-password page shows for a token, or null when it is unknown, used or expired. */
export async function getInvitationByToken(token: string) {
  db();
  const found = await findOpenInvitation(token);
  if (!found) return null;
  const organization = await Organization.findByPk(found.user.organizationId);
  return { name: found.user.name, email: found.user.email, organizationName: organization?.name ?? "" };
}

/** Sets the invited user's password and uses up the invitation. */
export async function acceptInvitation({ token, password }: { token: string; password: string }) {
  const sequelize = db();
  const passwordHash = await hashPassword(password);
  return sequelize.transaction(async (transaction) => {
    const found = await findOpenInvitation(token);
    if (!found) throw new AppError("NOT_FOUND", "This invitation link is not valid any more. Ask your admin for a new one.");
    // Marking it used only when still unused makes a double submit harmless.
    const [used] = await Invitation.update({ usedAt: new Date() }, { where: { id: found.invitation.id, usedAt: null }, transaction });
    if (used !== 1) throw new AppError("CONFLICT", "This invitation has already been used.");
    await found.user.update({ passwordHash }, { transaction });
    await recordAudit({ viewer: toViewer(found.user), action: "user.password-set", entityType: "user", entityId: found.user.id }, { transaction });
    return { email: found.user.email };
  });
}

/** A fresh one-time link, queued by e-mail, for a user who has not set a password yet; older links stop working. */
export async function renewInvitation({ viewer, userId }: { viewer: Viewer; userId: string }) {
  const sequelize = db();
  const { token, tokenHash } = newToken();
  const user = await sequelize.transaction(async (transaction) => {
    const found = await getUserInOrganization(viewer, userId);
    if (found.passwordHash || !found.isActive) throw new AppError("CONFLICT", "Only active users who have not set a password can get a new invitation.");
    await Invitation.update({ usedAt: new Date() }, { where: { userId, usedAt: null }, transaction });
    await Invitation.create({ organizationId: viewer.organizationId, userId, tokenHash, expiresAt: new Date(Date.now() + INVITATION_DAYS * 86_400_000), usedAt: null, createdById: viewer.id }, { transaction });
    await recordAudit({ viewer, action: "user.invitation-renewed", entityType: "user", entityId: userId }, { transaction });
    await enqueueInvitationEmail({ viewer, user: found, token }, transaction);
    return found;
  });
  return { user: toUserDto(user), token };
}
