import type { PacketKind, PacketStatus } from "@/lib/domain/stored-values";

export type PacketDto = {
  id: string;
  kind: PacketKind;
  revision: number;
  /** The design revision it was drawn from; null for packets made before this was recorded. */
  designRevision: number | null;
  /** The authorities it was submitted to; a sent revision is never regenerated or replaced. */
  sentTo: string[];
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
