export const ROLES = ["admin", "coordinator", "installer"] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  admin: "Admin",
  coordinator: "Permit coordinator",
  installer: "Installer",
};

export const NEC_EDITIONS = [2017, 2020, 2023] as const;
export type NecEdition = (typeof NEC_EDITIONS)[number];
