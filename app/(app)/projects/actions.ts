"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { defineAction } from "@/lib/server/action";
import { changeProjectStage, createProject, setProjectHold, updateProject } from "@/lib/server/data/projects";
import { ChangeStageInput, ProjectHoldInput, ProjectInput } from "@/lib/schemas/project";

export const createProjectAction = defineAction({ schema: ProjectInput, permission: "project:create" }, async (values, { viewer }) => {
  const project = await createProject({ viewer, values });
  return { id: project.id };
});

export const updateProjectAction = defineAction(
  { schema: z.object({ projectId: z.string().uuid(), values: ProjectInput }), permission: "project:edit" },
  async ({ projectId, values }, { viewer }) => {
    const project = await updateProject({ viewer, projectId, values });
    revalidatePath(`/projects/${projectId}`);
    return { id: project.id };
  },
);

export const changeStageAction = defineAction(
  { schema: ChangeStageInput, permission: "project:change-stage" },
  async ({ projectId, toStage, note }, { viewer }) => {
    const project = await changeProjectStage({ viewer, projectId, toStage, note });
    revalidatePath(`/projects/${projectId}`);
    return { stage: project.stage };
  },
);

export const setHoldAction = defineAction(
  { schema: ProjectHoldInput, permission: "project:change-stage" },
  async ({ projectId, hold, reason }, { viewer }) => {
    const project = await setProjectHold({ viewer, projectId, hold, reason });
    revalidatePath(`/projects/${projectId}`);
    return { holdState: project.holdState };
  },
);
