import { z } from "zod";

/** GET /api/v1/projects/:projectId/files/:fileId: the file itself, or with size=thumbnail a small picture of it. */
export const ProjectFileQuery = z.object({
  size: z.enum(["thumbnail"], { error: 'size may only be "thumbnail"' }).optional(),
});
