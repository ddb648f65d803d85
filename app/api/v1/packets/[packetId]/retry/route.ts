import { NextResponse } from "next/server";
import { retryPacket } from "@/lib/server/data/packets";
import { withAuth } from "@/lib/server/http";

// POST /api/v1/packets/:packetId/retry – queue a failed generation again
export const POST = withAuth<{ packetId: string }>(
  async (_request, { viewer, params }) => NextResponse.json(await retryPacket({ viewer, packetId: params.packetId }), { status: 202 }),
  { permission: "project:edit", body: "none" },
);
