export const ROLES = ["admin", "coordinator", "installer"] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  admin: "Admin",
  coordinator: "Permit coordinator",
  installer: "Installer",
};
