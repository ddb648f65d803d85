import "server-only";
import { Op, UniqueConstraintError, type Transaction } from "sequelize";
import { Invitation, Organization, User } from "@/models";
import type { Viewer } from "@/lib/domain/permissions";
import type { Role } from "@/lib/domain/roles";
import { throttleMessage } from "@/lib/domain/sign-in-throttle";
import { AppError } from "@/lib/errors";
import type { InviteUserInput } from "@/lib/schemas/user";
import { invitationEmail } from "@/templates/email/invitation";
import { db } from "../db";
import { env } from "../env";
import { hashPassword, verifyPassword } from "../passwords";
import { enqueueMail } from "./outbox";
import { hashToken, newToken } from "../tokens";
import { recordAudit } from "./audit";
import { throttledSignIn } from "./sign-in-throttle";
import type { UserStatus, UserDto } from "@/lib/dto/users";

export const INVITATION_DAYS = 7;

function toViewer(user: User): Viewer {
  return { id: user.id, organizationId: user.organizationId, role: user.role, name: user.name, email: user.email };
}

function toUserDto(user: User): UserDto {
  const status: UserStatus = !user.isActive ? "deactivated" : user.passwordHash ? "active" : "invited";
  return {
    id: user.id,
    name: user.name,
    email: user.email,
    role: user.role,
    status,
    lastSignInAt: user.lastSignInAt?.toISOString() ?? null,
  };
}

const NO_MATCH = "That e-mail address and password do not match an account.";

/**
 * The account an address signs in to: the active one with a password, else a deactivated one (to say
 * so). One address may have been invited by several organizations, but only one account per address
 * can hold a password while active (a unique index).
 */
async function findSignInAccount(email: string, transaction: Transaction) {
  const accounts = await User.findAll({
    where: { email: email.toLowerCase(), passwordHash: { [Op.ne]: null } },
    order: [
      ["isActive", "DESC"],
      ["updatedAt", "DESC"],
    ],
    transaction,
  });
  return accounts[0] ?? null;
}

/** Checks e-mail and password under the sign-in throttle; returns the viewer or throws a readable AppError. */
export async function authenticate({ email, password, address }: { email: string; password: string; address: string }): Promise<Viewer> {
  const outcome = await throttledSignIn({ email, address }, async (transaction) => {
    const user = await findSignInAccount(email, transaction);
    const matched = await verifyPassword(password, user?.passwordHash ?? null);
    if (matched && user!.isActive) await user!.update({ lastSignInAt: new Date() }, { transaction });
    return { matched, value: user };
  });
  if (!outcome.decision.allowed) throw new AppError("LIMIT_EXCEEDED", throttleMessage(outcome.decision));
  if (!outcome.matched || !outcome.value) throw new AppError("UNAUTHORIZED", NO_MATCH);
  if (!outcome.value.isActive) throw new AppError("FORBIDDEN", "This account has been deactivated. Ask your organization's admin.");
  return toViewer(outcome.value);
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
  const mail = invitationEmail({
    name: user.name,
    organizationName: organization?.name ?? "",
    inviterName: viewer.name,
    url,
    days: INVITATION_DAYS,
  });
  await enqueueMail({ to: user.email, organizationId: viewer.organizationId, ...mail }, { transaction });
}

/**
 * Adds a user without a password and a one-time invitation, and queues the invitation e-mail; returns the token for tests.
 * The answer is the same whether or not the address has an account with another organization, so an
 * admin cannot learn who uses Ohmstead elsewhere; that clash is settled with the address's owner when
 * they open the link (see getInvitationByToken).
 */
export async function inviteUser({ viewer, input }: { viewer: Viewer; input: InviteUserInput }) {
  const sequelize = db();
  const { token, tokenHash } = newToken();
  const user = await sequelize.transaction(async (transaction) => {
    const existing = await User.findOne({ where: { email: input.email, organizationId: viewer.organizationId }, transaction });
    if (existing)
      throw new AppError("CONFLICT", "Someone in your organization already has this e-mail address.", {
        email: ["Already in your organization"],
      });
    const created = await User.create(
      {
        organizationId: viewer.organizationId,
        email: input.email,
        name: input.name,
        role: input.role,
        passwordHash: null,
        lastSignInAt: null,
      },
      { transaction },
    ).catch((error: unknown) => {
      // Two admins inviting the same address at once: the unique (organization, e-mail) index decides.
      if (error instanceof UniqueConstraintError)
        throw new AppError("CONFLICT", "Someone in your organization already has this e-mail address.", {
          email: ["Already in your organization"],
        });
      throw error;
    });
    await Invitation.create(
      {
        organizationId: viewer.organizationId,
        userId: created.id,
        tokenHash,
        expiresAt: new Date(Date.now() + INVITATION_DAYS * 86_400_000),
        usedAt: null,
        createdById: viewer.id,
      },
      { transaction },
    );
    await recordAudit(
      {
        viewer,
        action: "user.invited",
        entityType: "user",
        entityId: created.id,
        changes: { email: { before: null, after: created.email }, role: { before: null, after: created.role } },
      },
      { transaction },
    );
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
    await recordAudit(
      { viewer, action: "user.role-changed", entityType: "user", entityId: user.id, changes: { role: { before, after: role } } },
      { transaction },
    );
    return toUserDto(user);
  });
}

export async function setUserActive({ viewer, userId, isActive }: { viewer: Viewer; userId: string; isActive: boolean }) {
  const sequelize = db();
  if (userId === viewer.id) throw new AppError("CONFLICT", "You cannot deactivate your own account.");
  return sequelize.transaction(async (transaction) => {
    const user = await getUserInOrganization(viewer, userId);
    const before = user.isActive;
    await user.update({ isActive }, { transaction }).catch((error: unknown) => {
      // Its address has since been given a password in another organization: one active account per address.
      if (error instanceof UniqueConstraintError)
        throw new AppError(
          "CONFLICT",
          "This account cannot be reactivated while its e-mail address signs in for another account. Invite the person with another address.",
        );
      throw error;
    });
    await recordAudit(
      {
        viewer,
        action: isActive ? "user.reactivated" : "user.deactivated",
        entityType: "user",
        entityId: user.id,
        changes: { isActive: { before, after: isActive } },
      },
      { transaction },
    );
    return toUserDto(user);
  });
}

async function findOpenInvitation(token: string) {
  const invitation = await Invitation.findOne({ where: { tokenHash: hashToken(token), usedAt: null, expiresAt: { [Op.gt]: new Date() } } });
  if (!invitation) return null;
  const user = await User.findOne({ where: { id: invitation.userId, isActive: true } });
  return user ? { invitation, user } : null;
}

/** Another organization's active account that already signs in with this address, if any. */
async function signInAccountElsewhere(user: User, transaction?: Transaction) {
  return User.findOne({
    where: { email: user.email, id: { [Op.ne]: user.id }, isActive: true, passwordHash: { [Op.ne]: null } },
    transaction,
  });
}

const ADDRESS_IN_USE =
  "This e-mail address already signs in to Ohmstead for another organization, and an address can sign in for one organization at a time. Ask that organization's admin to deactivate your account there and then open this link again, or ask the organization that invited you to use another address.";

/**
 * What the set-password page shows for a token, or null when it is unknown, used or expired.
 * The person holding the link owns the address, so they alone are told when it already signs in elsewhere.
 */
export async function getInvitationByToken(token: string) {
  db();
  const found = await findOpenInvitation(token);
  if (!found) return null;
  const organization = await Organization.findByPk(found.user.organizationId);
  const clash = (await signInAccountElsewhere(found.user)) ? ADDRESS_IN_USE : null;
  return { name: found.user.name, email: found.user.email, organizationName: organization?.name ?? "", clash };
}

/** Sets the invited user's password and uses up the invitation. */
export async function acceptInvitation({ token, password }: { token: string; password: string }) {
  const sequelize = db();
  const passwordHash = await hashPassword(password);
  return sequelize.transaction(async (transaction) => {
    const found = await findOpenInvitation(token);
    if (!found) throw new AppError("NOT_FOUND", "This invitation link is not valid any more. Ask your admin for a new one.");
    if (await signInAccountElsewhere(found.user, transaction)) throw new AppError("CONFLICT", ADDRESS_IN_USE);
    // Marking it used only when still unused makes a double submit harmless.
    const [used] = await Invitation.update({ usedAt: new Date() }, { where: { id: found.invitation.id, usedAt: null }, transaction });
    if (used !== 1) throw new AppError("CONFLICT", "This invitation has already been used.");
    await found.user.update({ passwordHash }, { transaction }).catch((error: unknown) => {
      // Another organization's account got its password in the meantime: the unique index keeps one.
      if (error instanceof UniqueConstraintError) throw new AppError("CONFLICT", ADDRESS_IN_USE);
      throw error;
    });
    await recordAudit(
      { viewer: toViewer(found.user), action: "user.password-set", entityType: "user", entityId: found.user.id },
      { transaction },
    );
    return { email: found.user.email };
  });
}

/** A fresh one-time link, queued by e-mail, for a user who has not set a password yet; older links stop working. */
export async function renewInvitation({ viewer, userId }: { viewer: Viewer; userId: string }) {
  const sequelize = db();
  const { token, tokenHash } = newToken();
  const user = await sequelize.transaction(async (transaction) => {
    const found = await getUserInOrganization(viewer, userId);
    if (found.passwordHash || !found.isActive)
      throw new AppError("CONFLICT", "Only active users who have not set a password can get a new invitation.");
    await Invitation.update({ usedAt: new Date() }, { where: { userId, usedAt: null }, transaction });
    await Invitation.create(
      {
        organizationId: viewer.organizationId,
        userId,
        tokenHash,
        expiresAt: new Date(Date.now() + INVITATION_DAYS * 86_400_000),
        usedAt: null,
        createdById: viewer.id,
      },
      { transaction },
    );
    await recordAudit({ viewer, action: "user.invitation-renewed", entityType: "user", entityId: userId }, { transaction });
    await enqueueInvitationEmail({ viewer, user: found, token }, transaction);
    return found;
  });
  return { user: toUserDto(user), token };
}
