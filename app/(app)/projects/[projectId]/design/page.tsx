import type { Metadata } from "next";
import { ProjectSubpageHeader } from "@/components/projects/project-subpage-header";
import { editorValues } from "@/lib/design/defaults";
import { checkEditorValues } from "@/lib/design/editor-checks";
import { can } from "@/lib/domain/permissions";
import { requireUser } from "@/lib/server/auth";
import { getDesignWithContext } from "@/lib/server/data/designs";
import { listEquipment } from "@/lib/server/data/equipment";
import { listProjectFilings } from "@/lib/server/data/filings";
import { loadProjectOr404 } from "@/lib/server/pages";
import { DesignEditor } from "./_components/design-editor";
import { SubmittedBanner } from "./_components/submitted-banner";
import { saveDesignAction } from "./actions";

export const metadata: Metadata = { title: "Design" };

export default async function DesignPage({ params }: { params: Promise<{ projectId: string }> }) {
  const viewer = await requireUser();
  const project = await loadProjectOr404(viewer, (await params).projectId);
  const [catalog, context, filings] = await Promise.all([
    listEquipment({ viewer }),
    getDesignWithContext({ viewer, projectId: project.id }),
    listProjectFilings({ viewer, projectId: project.id }),
  ]);
  const { design } = context;
  // Items the design already uses stay choosable even when archived since.
  const known = new Set(catalog.map((c) => c.id));
  const choices = [...catalog, ...context.catalog.filter((c) => !known.has(c.id))];
  // The first paint already shows the checks the editor would run on the draft as it opens.
  const initialChecks = checkEditorValues(editorValues(design.draft), choices, context.conditions);
  return (
    <div className="space-y-4">
      <ProjectSubpageHeader project={project} title="Design">
        {project.jurisdiction
          ? `Checked against NEC ${project.jurisdiction.necEdition} as adopted by ${project.jurisdiction.name}.`
          : "Choose the project's AHJ to run the code checks."}{" "}
        Your input is saved as you go.
      </ProjectSubpageHeader>
      <SubmittedBanner projectId={project.id} filings={filings} />
      <DesignEditor
        save={saveDesignAction}
        projectId={project.id}
        initialDraft={design.draft}
        initialRevision={design.revision}
        initialChecks={initialChecks}
        catalog={choices}
        conditions={context.conditions}
        readOnly={!can(viewer, "project:edit")}
      />
    </div>
  );
}
