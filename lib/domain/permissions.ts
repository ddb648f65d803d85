import type { Role } from "./roles";

/** Who is asking: enough to scope and authorize, nothing more. */
export type Viewer = {
  id: string;
  organizationId: string;
  role: Role;
  name: string;
  email: string;
  apiTokenId?: string; // set when an API token, not a person, is asking
};

export type Permission =
  | "project:view"
  | "project:create"
  | "project:edit"
  | "project:change-stage"
  | "settings:view"
  | "users:manage"
  | "catalog:view"
  | "catalog:edit"
  | "reference:edit"
  | "mailbox:view"
  | "design:review"
  | "api-tokens:manage"
  | "field:record"
  | "fees:pay"
  | "fees:refund"
  | "filings:edit"
  | "desk:view"
  | "profile:edit"
  | "organization:edit"
  | "reports:view"
  | "projects:import"
  | "signatures:request";

const GRANTS: Record<Role, readonly Permission[]> = {
  admin: [
    "project:view",
    "project:create",
    "project:edit",
    "project:change-stage",
    "settings:view",
    "users:manage",
    "catalog:view",
    "catalog:edit",
    "reference:edit",
    "mailbox:view",
    "design:review",
    "api-tokens:manage",
    "field:record",
    "fees:pay",
    "fees:refund",
    "filings:edit",
    "desk:view",
    "profile:edit",
    "organization:edit",
    "reports:view",
    "projects:import",
    "signatures:request",
  ],
  coordinator: [
    "project:view",
    "project:create",
    "project:edit",
    "project:change-stage",
    "settings:view",
    "catalog:view",
    "design:review",
    "field:record",
    "fees:pay",
    "filings:edit",
    "desk:view",
    "profile:edit",
    "reports:view",
    "projects:import",
    "signatures:request",
  ],
  installer: ["project:view", "design:review", "field:record", "profile:edit"],
};

// An API token reads on its organization's behalf and never changes anything (README, "Design review API").
export const API_TOKEN_GRANTS: readonly Permission[] = ["project:view", "catalog:view", "design:review", "reports:view"];

type ProjectScope = { organizationId: string; installerId: string | null };

/**
 * The one permission rule. With a project, it also checks that the project is
 * the viewer's organization's and, for installers, assigned to them.
 */
export function can(
  viewer: Pick<Viewer, "id" | "role" | "organizationId" | "apiTokenId">,
  permission: Permission,
  project?: ProjectScope,
): boolean {
  const grants = viewer.apiTokenId ? API_TOKEN_GRANTS : GRANTS[viewer.role];
  if (!grants?.includes(permission)) return false;
  if (!project) return true;
  if (project.organizationId !== viewer.organizationId) return false;
  if (viewer.role === "installer") return project.installerId === viewer.id;
  return true;
}
