import { NextResponse } from "next/server";
import { createProject, listProjects } from "@/lib/server/data/projects";
import { readJson, withAuth } from "@/lib/server/http";
import { ProjectInput, ProjectListQuery } from "@/lib/schemas/project";

// GET /api/v1/projects – list, paged, sorted, searched and filtered by stage
export const GET = withAuth(
  async (request, { viewer }) => {
    const query = ProjectListQuery.parse(Object.fromEntries(request.nextUrl.searchParams));
    return NextResponse.json(await listProjects({ viewer, query }));
  },
  { permission: "project:view" },
);

// POST /api/v1/projects – create a project in the draft stage
export const POST = withAuth(
  async (request, { viewer }) => {
    const values = ProjectInput.parse(await readJson(request));
    return NextResponse.json(await createProject({ viewer, values }), { status: 201 });
  },
  { permission: "project:create" },
);
