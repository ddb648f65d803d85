import { checkShareLink } from "@/lib/server/data/share-links";
import { clientOf, NO_INDEX, shareErrorResponse } from "@/lib/server/share-http";

// GET /share/:token/gone – where the page sends an expired, revoked or throttled link: answers 410 or 429 with the reason
export async function GET(request: Request, { params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  try {
    await checkShareLink(token, clientOf(request.headers));
  } catch (error) {
    return shareErrorResponse(error);
  }
  // The link works after all (a stale redirect): back to the page.
  return new Response(null, { status: 303, headers: { location: `/share/${encodeURIComponent(token)}`, ...NO_INDEX } });
}
