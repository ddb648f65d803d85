import { getSharedPacketFile } from "@/lib/server/data/share-links";
import { getObjectBytes } from "@/lib/server/services/storage";
import { clientOf, NO_INDEX, shareErrorResponse } from "@/lib/server/share-http";

// GET /share/:token/packets/:packetId – one shared revision's PDF as an attachment; no session, read only, logged
export async function GET(request: Request, { params }: { params: Promise<{ token: string; packetId: string }> }) {
  const { token, packetId } = await params;
  try {
    const file = await getSharedPacketFile(token, packetId, clientOf(request.headers));
    const bytes = await getObjectBytes(file.key);
    return new Response(Buffer.from(bytes), {
      headers: {
        "content-type": "application/pdf",
        "content-length": String(bytes.length),
        "content-disposition": `attachment; filename="${file.fileName}"`,
        ...NO_INDEX,
      },
    });
  } catch (error) {
    return shareErrorResponse(error);
  }
}
