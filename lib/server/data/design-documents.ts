import "server-only";
import type { DesignDocument } from "@/lib/design/document";
import { problemsError } from "@/lib/design/document-problems";
import { reviewDocumentOrThrow } from "@/lib/design/document-review";
import { draftToDocument } from "@/lib/design/draft-to-document";
import type { ReviewJson } from "@/lib/design/review-json";
import type { Viewer } from "@/lib/domain/permissions";
import { getDesignWithContext } from "./designs";

/**
 * The project's saved design as a public design document; NOT_FOUND for projects the
 * viewer cannot see, INVALID_INPUT naming the editor's fields when the design is incomplete.
 */
export async function getProjectDesignDocument({ viewer, projectId }: { viewer: Viewer; projectId: string }): Promise<DesignDocument> {
  const { design, catalog, conditions } = await getDesignWithContext({ viewer, projectId });
  const out = draftToDocument(design.draft, catalog, conditions);
  if (!out.ok) throw problemsError("The saved design is incomplete; finish it in the design editor.", out.problems);
  return out.document;
}

/**
 * The review of the project's saved design, computed from its exported document, so it is
 * exactly what POST /api/v1/design-review answers for that document.
 */
export async function reviewProjectDocument({ viewer, projectId }: { viewer: Viewer; projectId: string }): Promise<ReviewJson> {
  return reviewDocumentOrThrow(await getProjectDesignDocument({ viewer, projectId }));
}
