import type { AuditChanges } from "@/lib/domain/stored-values";

export type AuditEventDto = {
  id: string;
  action: string;
  entityType: string;
  entityId: string;
  actorName: string | null;
  changes: AuditChanges;
  createdAt: string;
};
