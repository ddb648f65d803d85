import "server-only";
import { notFound } from "next/navigation";
import type { Viewer } from "@/lib/domain/permissions";
import { isAppError } from "@/lib/errors";
import { getProjectById } from "./data/projects";

/** For pages: the data call's result, or the not-found page when it answers NOT_FOUND (missing and foreign ids alike). */
export async function orNotFoundPage<T>(load: Promise<T>): Promise<T> {
  try {
    return await load;
  } catch (error) {
    if (isAppError(error) && error.code === "NOT_FOUND") notFound();
    throw error;
  }
}

/** For pages: the project, or the not-found page for missing and foreign ids alike. */
export function loadProjectOr404(viewer: Viewer, projectId: string) {
  return orNotFoundPage(getProjectById({ viewer, projectId }));
}
