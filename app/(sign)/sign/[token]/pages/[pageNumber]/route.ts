import { signingPagePng } from "@/lib/server/use-cases/signatures";
import { clientOf, NO_INDEX, shareErrorResponse } from "@/lib/server/share-http";

// GET /sign/:token/pages/:pageNumber – one page of the document to sign as a PNG, for phones without a PDF viewer; logged
export async function GET(request: Request, { params }: { params: Promise<{ token: string; pageNumber: string }> }) {
  const { token, pageNumber } = await params;
  try {
    const png = await signingPagePng(token, /^\d{1,4}$/.test(pageNumber) ? Number(pageNumber) : 0, clientOf(request.headers));
    return new Response(Buffer.from(png), {
      headers: { "content-type": "image/png", "content-length": String(png.length), "x-content-type-options": "nosniff", ...NO_INDEX },
    });
  } catch (error) {
    return shareErrorResponse(error);
  }
}
