import { NextResponse } from "next/server";
import { listPackets, requestPacket } from "@/lib/server/data/packets";
import { readJson, withAuth } from "@/lib/server/http";
import { RequestPacketInput } from "@/lib/schemas/packet";

type Params = { projectId: string };

// GET /api/v1/projects/:projectId/packets – every generation of the project's packets, newest first
export const GET = withAuth<Params>(
  async (_request, { viewer, params }) => NextResponse.json({ items: await listPackets({ viewer, projectId: params.projectId }) }),
  { permission: "project:view" },
);

// POST /api/v1/projects/:projectId/packets – queue the next revision of a packet
export const POST = withAuth<Params>(
  async (request, { viewer, params }) => {
    const { kind, overrideReason } = RequestPacketInput.parse(await readJson(request));
    return NextResponse.json(await requestPacket({ viewer, projectId: params.projectId, kind, overrideReason }), { status: 202 });
  },
  { permission: "project:edit" },
);
