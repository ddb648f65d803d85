import { NextResponse } from "next/server";
import { z } from "zod";
import { changeProjectStage } from "@/lib/server/data/projects";
import { readJson, withAuth } from "@/lib/server/http";
import { ChangeStageInput } from "@/lib/schemas/project";

const Body = ChangeStageInput.omit({ projectId: true }).strict();

// POST /api/v1/projects/:projectId/stage – move the project to another stage with a note
export const POST = withAuth<{ projectId: string }>(
  async (request, { viewer, params }) => {
    const { toStage, note } = Body.parse(await readJson(request)) as z.output<typeof Body>;
    return NextResponse.json(await changeProjectStage({ viewer, projectId: params.projectId, toStage, note }));
  },
  { permission: "project:change-stage" },
);
