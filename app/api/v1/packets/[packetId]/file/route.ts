import { getPacketFile } from "@/lib/server/data/packets";
import { withAuth } from "@/lib/server/http";
import { getObjectBytes } from "@/lib/server/services/storage";

// GET /api/v1/packets/:packetId/file – the ready packet's PDF, after the project check
export const GET = withAuth<{ packetId: string }>(
  async (_request, { viewer, params }) => {
    const file = await getPacketFile({ viewer, packetId: params.packetId });
    const bytes = await getObjectBytes(file.key);
    return new Response(Buffer.from(bytes), {
      headers: {
        "content-type": "application/pdf",
        "content-length": String(bytes.length),
        "content-disposition": `attachment; filename="${file.fileName}"`,
        "cache-control": "private, no-store",
      },
    });
  },
  { permission: "project:view" },
);
