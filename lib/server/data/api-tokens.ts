import "server-only";
import { timingSafeEqual } from "node:crypto";
import { ApiToken, User } from "@/models";
import { can, type Viewer } from "@/lib/domain/permissions";
import { AppError } from "@/lib/errors";
import type { CreateApiTokenInput } from "@/lib/schemas/api-token";
import { db } from "../db";
import { isUuid } from "./ids";
import { hashToken, newToken } from "../tokens";
import { recordAudit } from "./audit";
import type { ApiTokenDto } from "@/lib/dto/api-tokens";

// A recognisable prefix lets people and secret scanners tell an Ohmstead token from other strings.
export const API_TOKEN_PREFIX = "ohm_";
const MAX_ACTIVE_TOKENS = 25;
// Writing last_used_at on every call would turn each read into a write; a minute is precise enough to see which tokens are in use.
const LAST_USED_PRECISION_MS = 60_000;

function toDto(row: ApiToken, createdByName: string | null): ApiTokenDto {
  return {
    id: row.id,
    name: row.name,
    createdAt: row.createdAt.toISOString(),
    createdByName,
    lastUsedAt: row.lastUsedAt?.toISOString() ?? null,
    revokedAt: row.revokedAt?.toISOString() ?? null,
  };
}

function assertManager(viewer: Viewer) {
  if (!can(viewer, "api-tokens:manage")) throw new AppError("FORBIDDEN", "Only admins manage API tokens.");
}

/** Makes a token for the viewer's organization. The token is in this answer only; the database keeps its SHA-256. */
export async function createApiToken({
  viewer,
  input,
}: {
  viewer: Viewer;
  input: CreateApiTokenInput;
}): Promise<{ token: string; apiToken: ApiTokenDto }> {
  assertManager(viewer);
  const token = `${API_TOKEN_PREFIX}${newToken().token}`;
  const row = await db().transaction(async (transaction) => {
    const active = await ApiToken.count({ where: { organizationId: viewer.organizationId, revokedAt: null }, transaction });
    if (active >= MAX_ACTIVE_TOKENS)
      throw new AppError("LIMIT_EXCEEDED", `An organization can hold ${MAX_ACTIVE_TOKENS} active tokens; revoke one you no longer use.`);
    const created = await ApiToken.create(
      { organizationId: viewer.organizationId, name: input.name, tokenHash: hashToken(token), createdById: viewer.id },
      { transaction },
    );
    await recordAudit(
      {
        viewer,
        action: "api-token.created",
        entityType: "api-token",
        entityId: created.id,
        changes: { name: { before: null, after: input.name } },
      },
      { transaction },
    );
    return created;
  });
  return { token, apiToken: toDto(row, viewer.name) };
}

/** The organization's tokens, newest first, revoked ones included so the trail stays visible. */
export async function listApiTokens({ viewer }: { viewer: Viewer }): Promise<ApiTokenDto[]> {
  assertManager(viewer);
  db();
  const rows = await ApiToken.findAll({
    where: { organizationId: viewer.organizationId },
    include: [{ model: User, as: "createdBy", attributes: ["name"] }],
    order: [["createdAt", "DESC"]],
    limit: 200,
  });
  return rows.map((row) => toDto(row, row.createdBy?.name ?? null));
}

/** Revokes a token at once; NOT_FOUND for another organization's. Revoking twice changes nothing. */
export async function revokeApiToken({ viewer, apiTokenId }: { viewer: Viewer; apiTokenId: string }): Promise<ApiTokenDto> {
  assertManager(viewer);
  return db().transaction(async (transaction) => {
    // A malformed id is just another token the viewer cannot see.
    const row = isUuid(apiTokenId)
      ? await ApiToken.findOne({
          where: { id: apiTokenId, organizationId: viewer.organizationId },
          transaction,
          lock: transaction.LOCK.UPDATE,
        })
      : null;
    if (!row) throw new AppError("NOT_FOUND", "No such API token.");
    if (!row.revokedAt) {
      await row.update({ revokedAt: new Date() }, { transaction });
      await recordAudit(
        {
          viewer,
          action: "api-token.revoked",
          entityType: "api-token",
          entityId: row.id,
          changes: { revokedAt: { before: null, after: row.revokedAt!.toISOString() } },
        },
        { transaction },
      );
    }
    const creator = row.createdById ? await User.findByPk(row.createdById, { attributes: ["name"], transaction }) : null;
    return toDto(row, creator?.name ?? null);
  });
}

/**
 * The read-only identity behind a bearer token, or null for an unknown or revoked one.
 * It acts for the token's organization with API_TOKEN_GRANTS only (lib/domain/permissions.ts).
 */
export async function getViewerByApiToken(token: string): Promise<Viewer | null> {
  if (!token.startsWith(API_TOKEN_PREFIX) || token.length > 200) return null;
  db();
  const tokenHash = hashToken(token);
  // The key is the hash of a 256-bit secret, so index timing reveals nothing useful; compare in constant time all the same.
  const row = await ApiToken.findOne({ where: { tokenHash } });
  if (!row || !timingSafeEqual(Buffer.from(row.tokenHash, "hex"), Buffer.from(tokenHash, "hex")) || row.revokedAt) return null;
  if (!row.lastUsedAt || Date.now() - row.lastUsedAt.getTime() > LAST_USED_PRECISION_MS) {
    await ApiToken.update({ lastUsedAt: new Date() }, { where: { id: row.id } });
  }
  // The role only sets the scope (the whole organization, not an installer's projects); apiTokenId limits what it may do.
  return {
    id: row.id,
    organizationId: row.organizationId,
    role: "coordinator",
    name: `API token "${row.name}"`,
    email: "",
    apiTokenId: row.id,
  };
}
