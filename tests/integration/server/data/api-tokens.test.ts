import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ApiToken, AuditEvent } from "@/models";
import { can } from "@/lib/domain/permissions";
import { AppError } from "@/lib/errors";
import { API_TOKEN_PREFIX, createApiToken, getViewerByApiToken, listApiTokens, revokeApiToken } from "@/lib/server/data/api-tokens";
import { getProjectById, listProjects } from "@/lib/server/data/projects";
import { ProjectListQuery } from "@/lib/schemas/project";
import { hashToken } from "@/lib/server/tokens";
import { closeDb } from "../../support/db";
import { makeOrganization, makeProject, type OrgFixture } from "../../support/fixtures";

let acme: OrgFixture;
let rival: OrgFixture;

const code = async (promise: Promise<unknown>) =>
  promise.then(
    () => "resolved",
    (e: unknown) => (e instanceof AppError ? e.code : String(e)),
  );

beforeAll(async () => {
  acme = await makeOrganization("Acme");
  rival = await makeOrganization("Rival");
});

afterAll(async () => {
  await closeDb();
});

describe("createApiToken", () => {
  it("shows the token once and stores only its SHA-256", async () => {
    const { token, apiToken } = await createApiToken({ viewer: acme.viewers.admin, input: { name: "Quote tool" } });
    expect(token.startsWith(API_TOKEN_PREFIX)).toBe(true);
    expect(token.length).toBeGreaterThan(40);
    const row = await ApiToken.findByPk(apiToken.id);
    expect(row?.tokenHash).toBe(hashToken(token));
    expect(JSON.stringify(row?.toJSON())).not.toContain(token.slice(API_TOKEN_PREFIX.length));
    const listed = await listApiTokens({ viewer: acme.viewers.admin });
    expect(listed.find((t) => t.id === apiToken.id)).toEqual({
      id: apiToken.id,
      name: "Quote tool",
      createdAt: expect.any(String),
      createdByName: "Ada Admin",
      lastUsedAt: null,
      revokedAt: null,
    });
    expect(JSON.stringify(listed)).not.toContain(row!.tokenHash);
    expect(await AuditEvent.count({ where: { entityId: apiToken.id, action: "api-token.created" } })).toBe(1);
  });

  it("lets only admins manage tokens", async () => {
    expect(await code(createApiToken({ viewer: acme.viewers.coordinator, input: { name: "Nope" } }))).toBe("FORBIDDEN");
    expect(await code(listApiTokens({ viewer: acme.viewers.installer }))).toBe("FORBIDDEN");
  });
});

describe("getViewerByApiToken", () => {
  it("acts for the creating admin's organization, read-only, and notes when it was used", async () => {
    const { token, apiToken } = await createApiToken({ viewer: acme.viewers.admin, input: { name: "Read only" } });
    const viewer = await getViewerByApiToken(token);
    expect(viewer).toMatchObject({ organizationId: acme.organization.id, apiTokenId: apiToken.id, name: 'API token "Read only"' });
    expect(can(viewer!, "design:review")).toBe(true);
    expect(can(viewer!, "project:view")).toBe(true);
    for (const permission of [
      "project:edit",
      "project:create",
      "project:change-stage",
      "users:manage",
      "api-tokens:manage",
      "catalog:edit",
      "settings:view",
    ] as const) {
      expect(can(viewer!, permission), permission).toBe(false);
    }
    expect((await ApiToken.findByPk(apiToken.id))?.lastUsedAt).toBeInstanceOf(Date);
  });

  it("refuses unknown, altered and foreign-looking tokens", async () => {
    const { token } = await createApiToken({ viewer: acme.viewers.admin, input: { name: "Altered" } });
    expect(await getViewerByApiToken(`${token.slice(0, -1)}${token.endsWith("A") ? "B" : "A"}`)).toBeNull();
    expect(await getViewerByApiToken(token.slice(API_TOKEN_PREFIX.length))).toBeNull();
    expect(await getViewerByApiToken("")).toBeNull();
    expect(await getViewerByApiToken(`${API_TOKEN_PREFIX}${"x".repeat(500)}`)).toBeNull();
  });

  it("sees only its own organization's projects, all of them", async () => {
    const own = await makeProject(acme, { customerName: "Token Owncase", installerId: acme.users.installer.id });
    const unassigned = await makeProject(acme, { customerName: "Token Unassigned" });
    const foreign = await makeProject(rival, { customerName: "Token Foreign" });
    const { token } = await createApiToken({ viewer: acme.viewers.admin, input: { name: "Projects" } });
    const viewer = (await getViewerByApiToken(token))!;
    expect((await getProjectById({ viewer, projectId: own.id })).id).toBe(own.id);
    expect((await getProjectById({ viewer, projectId: unassigned.id })).id).toBe(unassigned.id);
    expect(await code(getProjectById({ viewer, projectId: foreign.id }))).toBe("NOT_FOUND");
    const listed = await listProjects({ viewer, query: ProjectListQuery.parse({ pageSize: "100" }) });
    expect(listed.items.map((p: { customerName: string }) => p.customerName)).not.toContain("Token Foreign");
  });
});

describe("revokeApiToken", () => {
  it("refuses the token at once and keeps it listed as revoked", async () => {
    const { token, apiToken } = await createApiToken({ viewer: acme.viewers.admin, input: { name: "Old sync" } });
    expect(await getViewerByApiToken(token)).not.toBeNull();
    const revoked = await revokeApiToken({ viewer: acme.viewers.admin, apiTokenId: apiToken.id });
    expect(revoked.revokedAt).not.toBeNull();
    expect(await getViewerByApiToken(token)).toBeNull();
    // Revoking twice changes nothing and records nothing more.
    await revokeApiToken({ viewer: acme.viewers.admin, apiTokenId: apiToken.id });
    expect(await AuditEvent.count({ where: { entityId: apiToken.id, action: "api-token.revoked" } })).toBe(1);
    expect((await listApiTokens({ viewer: acme.viewers.admin })).find((t) => t.id === apiToken.id)?.revokedAt).toBe(revoked.revokedAt);
  });

  it("treats another organization's token as missing", async () => {
    const { token, apiToken } = await createApiToken({ viewer: acme.viewers.admin, input: { name: "Not yours" } });
    expect(await code(revokeApiToken({ viewer: rival.viewers.admin, apiTokenId: apiToken.id }))).toBe("NOT_FOUND");
    expect(await code(revokeApiToken({ viewer: rival.viewers.admin, apiTokenId: "not-a-uuid" }))).toBe("NOT_FOUND");
    expect((await listApiTokens({ viewer: rival.viewers.admin })).some((t) => t.id === apiToken.id)).toBe(false);
    expect(await getViewerByApiToken(token)).not.toBeNull();
  });
});
