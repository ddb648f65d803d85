import { NextResponse } from "next/server";
import { getDesignForProject, saveDesignDraft } from "@/lib/server/data/designs";
import { readJson, withAuth } from "@/lib/server/http";

type Params = { projectId: string };

// GET /api/v1/projects/:projectId/design – the saved design draft (or a new one prefilled from the project)
export const GET = withAuth<Params>(
  async (_request, { viewer, params }) => NextResponse.json(await getDesignForProject({ viewer, projectId: params.projectId })),
  { permission: "project:view" },
);

// PUT /api/v1/projects/:projectId/design – save the draft as given and review it
export const PUT = withAuth<Params>(
  async (request, { viewer, params }) => {
    const saved = await saveDesignDraft({ viewer, projectId: params.projectId, draft: await readJson(request) });
    return NextResponse.json(saved);
  },
  { permission: "project:edit" },
);
