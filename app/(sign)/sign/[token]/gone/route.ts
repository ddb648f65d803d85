import { getLinkSigner } from "@/lib/server/data/signature-requests";
import { clientOf, NO_INDEX, shareErrorResponse } from "@/lib/server/share-http";

// GET /sign/:token/gone – where the page sends a withdrawn, expired or throttled signing link: answers 410 or 429 with the reason
export async function GET(request: Request, { params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  try {
    await getLinkSigner(token, clientOf(request.headers));
  } catch (error) {
    return shareErrorResponse(error);
  }
  // The link works after all (a stale redirect): back to the page.
  return new Response(null, { status: 303, headers: { location: `/sign/${encodeURIComponent(token)}`, ...NO_INDEX } });
}
