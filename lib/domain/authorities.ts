/** The authorities a project answers to: the AHJ that issues the permit and the utility that lets the system connect. */
export const AUTHORITY_KINDS = ["jurisdiction", "utility"] as const;
export type AuthorityKind = (typeof AUTHORITY_KINDS)[number];

export function isAuthorityKind(value: unknown): value is AuthorityKind {
  return (AUTHORITY_KINDS as readonly unknown[]).includes(value);
}
