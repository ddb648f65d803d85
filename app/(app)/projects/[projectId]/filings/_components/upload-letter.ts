import type { ActionResult } from "@/lib/dto/action-result";

/** Stores an authority's comment letter with the project's files; the round then points at it. */
export async function uploadLetter(projectId: string, file: File): Promise<ActionResult<{ id: string }>> {
  const body = new FormData();
  body.set("kind", "comment-letter");
  body.set("file", file);
  const response = await fetch(`/api/v1/projects/${projectId}/files`, { method: "POST", body }).catch(() => null);
  const answer = await response?.json().catch(() => null);
  if (response?.ok) return { ok: true, data: { id: answer.file.id } };
  return {
    ok: false,
    code: "INVALID_INPUT",
    message: answer?.error?.message ?? "The letter could not be uploaded. Check the connection and try again; nothing was saved.",
    fieldErrors: { letterFileId: [answer?.error?.message ?? "The letter could not be uploaded"] },
  };
}
