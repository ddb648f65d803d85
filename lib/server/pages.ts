import "server-only";
import { notFound } from "next/navigation";
import type { Viewer } from "@/lib/domain/permissions";
import { isAppError } from "@/lib/errors";
import { getProjectById } from "./data/projects";

/** For pages: the project, or the not-found page for missing and foreign ids alike. */
export async function loadProjectOr404(viewer: Viewer, projectId: string) {
  try {
    return await getProjectById({ viewer, projectId });
  } catch (error) {
    if (isAppError(error) && error.code === "NOT_FOUND") notFound();
    throw error;
  }
}
