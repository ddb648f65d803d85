import type { ProjectFileKind } from "@/lib/domain/stored-values";

export type ProjectFileDto = {
  id: string;
  kind: ProjectFileKind;
  fileName: string;
  contentType: string;
  sizeBytes: number;
  uploadedBy: string | null;
  createdAt: string;
  /** A picture: its thumbnail is served by the file's route with ?size=thumbnail. */
  hasThumbnail: boolean;
  /** The viewer may remove it (see mayRemoveUpload). */
  canRemove: boolean;
};
