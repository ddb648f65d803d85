import type { Role } from "./roles";

/** Who is asking: enough to scope and authorize, nothing more. */
export type Viewer = {
  id: string;
  organizationId: string;
  role: Role;
  name: string;
  email: string;
};

export type Permission =
  | "project:view"
  | "project:create"
  | "project:edit"
  | "project:change-stage"
  | "settings:view"
  | "users:manage"
  | "mailbox:view";

const GRANTS: Record<Role, readonly Permission[]> = {
  admin: ["project:view", "project:create", "project:edit", "project:change-stage", "settings:view", "users:manage", "mailbox:view"],
  coordinator: ["project:view", "project:create", "project:edit", "project:change-stage", "settings:view", "mailbox:view"],
  installer: ["project:view"],
};

type ProjectScope = { organizationId: string; installerId: string | null };

/**
 * The one permission rule. With a project, it also checks that the project is
 * the viewer's organization's and, for installers, assigned to them.
 */
export function can(viewer: Pick<Viewer, "id" | "role" | "organizationId">, permission: Permission, project?: ProjectScope): boolean {
  if (!GRANTS[viewer.role]?.includes(permission)) return false;
  if (!project) return true;
  if (project.organizationId !== viewer.organizationId) return false;
  if (viewer.role === "installer") return project.installerId === viewer.id;
  return true;
}
