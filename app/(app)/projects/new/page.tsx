import type { Metadata } from "next";
import { requirePermission } from "@/lib/server/auth";
import { getProjectFormOptions } from "@/lib/server/data/reference-data";
import { ProjectForm } from "../_components/project-form";
import { createProjectAction } from "../actions";

export const metadata: Metadata = { title: "New project" };

export default async function NewProjectPage() {
  const viewer = await requirePermission("project:create");
  const options = await getProjectFormOptions({ viewer });
  return (
    <div className="mx-auto max-w-3xl space-y-4">
      <h1>New project</h1>
      <p className="text-sm text-ink-soft">
        Start with the customer and the site; the design comes next. Anything not known yet can be filled in later.
      </p>
      <ProjectForm
        save={{ create: createProjectAction }}
        options={options}
        defaultCoordinatorId={options.coordinators.some((c) => c.id === viewer.id) ? viewer.id : ""}
      />
    </div>
  );
}
