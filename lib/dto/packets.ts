import type { PacketKind, PacketStatus } from "@/lib/domain/stored-values";

export type PacketDto = {
  id: string;
  kind: PacketKind;
  revision: number;
  status: PacketStatus;
  progress: number;
  step: string;
  changes: string[];
  overrideReason: string | null;
  sizeBytes: number | null;
  pageCount: number | null;
  sha256: string | null;
  error: string | null;
  requestedBy: string | null;
  readyAt: string | null;
  createdAt: string;
};
