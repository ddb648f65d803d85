import type { ShareLinkAccessKind } from "@/lib/domain/stored-values";

export type ShareLinkStatus = "active" | "expired" | "revoked";
export type ShareLinkAccessDto = { kind: ShareLinkAccessKind; revision: string | null; address: string; userAgent: string; at: string };
export type ShareLinkDto = {
  id: string;
  recipientEmail: string | null;
  note: string;
  status: ShareLinkStatus;
  expiresAt: string;
  revokedAt: string | null;
  createdBy: string | null;
  createdAt: string;
  revisions: { packetId: string; label: string }[];
  accesses: ShareLinkAccessDto[];
};
