"use server";

import { revalidatePath } from "next/cache";
import { defineAction } from "@/lib/server/action";
import { importProjects, previewProjectImport } from "@/lib/server/data/project-import";
import { ProjectImportInput } from "@/lib/schemas/project-import";

export const previewProjectImportAction = defineAction({ schema: ProjectImportInput, permission: "projects:import" }, (input, { viewer }) =>
  previewProjectImport({ viewer, ...input }),
);

export const importProjectsAction = defineAction(
  { schema: ProjectImportInput, permission: "projects:import" },
  async (input, { viewer }) => {
    const result = await importProjects({ viewer, ...input });
    revalidatePath("/dashboard");
    return result;
  },
);
