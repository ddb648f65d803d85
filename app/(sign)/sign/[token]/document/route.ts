import { signingDocument } from "@/lib/server/use-cases/signatures";
import { clientOf, NO_INDEX, shareErrorResponse } from "@/lib/server/share-http";

// GET /sign/:token/document – the document as a PDF attachment (the signed copy once signed); logged
export async function GET(request: Request, { params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  try {
    const file = await signingDocument(token, clientOf(request.headers));
    return new Response(Buffer.from(file.bytes), {
      headers: {
        "content-type": "application/pdf",
        "content-length": String(file.bytes.length),
        "content-disposition": `attachment; filename="${file.fileName}"`,
        "x-content-type-options": "nosniff",
        ...NO_INDEX,
      },
    });
  } catch (error) {
    return shareErrorResponse(error);
  }
}
