import { NextResponse } from "next/server";
import { getProjectById, updateProject } from "@/lib/server/data/projects";
import { readJson, withAuth } from "@/lib/server/http";
import { ProjectInput } from "@/lib/schemas/project";

type Params = { projectId: string };

// GET /api/v1/projects/:projectId – one project (404 for missing and foreign alike)
export const GET = withAuth<Params>(
  async (_request, { viewer, params }) => NextResponse.json(await getProjectById({ viewer, projectId: params.projectId })),
  { permission: "project:view" },
);

// PUT /api/v1/projects/:projectId – replace the project's editable fields
export const PUT = withAuth<Params>(
  async (request, { viewer, params }) => {
    const values = ProjectInput.parse(await readJson(request));
    return NextResponse.json(await updateProject({ viewer, projectId: params.projectId, values }));
  },
  { permission: "project:edit" },
);
