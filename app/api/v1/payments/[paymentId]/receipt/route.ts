import { getReceiptLocation } from "@/lib/server/data/payments";
import { attachmentHeaders, withAuth } from "@/lib/server/http";
import { getObjectBytes } from "@/lib/server/services/storage";

// GET /api/v1/payments/:paymentId/receipt – the receipt PDF as issued, after the project check
export const GET = withAuth<{ paymentId: string }>(
  async (_request, { viewer, params }) => {
    const receipt = await getReceiptLocation({ viewer, paymentId: params.paymentId });
    const bytes = await getObjectBytes(receipt.key);
    return new Response(Buffer.from(bytes), {
      headers: attachmentHeaders({ fileName: receipt.fileName, contentType: "application/pdf", length: bytes.length }),
    });
  },
  { permission: "project:view" },
);
