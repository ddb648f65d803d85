export type ApiTokenDto = {
  id: string;
  name: string;
  createdAt: string;
  createdByName: string | null;
  lastUsedAt: string | null;
  revokedAt: string | null;
};
