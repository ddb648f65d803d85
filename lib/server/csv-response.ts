import "server-only";

/** A CSV export sent as a download named for what it holds and the day it was made. */
export function csvResponse(fileName: string, text: string): Response {
  return new Response(text, {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="${fileName.replace(/[^\w.-]/g, "_")}"`,
      "x-content-type-options": "nosniff",
      "cache-control": "private, no-store",
    },
  });
}

/** True when the request asks for CSV: `?format=csv`, or an Accept header that puts text/csv first. */
export function wantsCsv(request: Request): boolean {
  if (new URL(request.url).searchParams.get("format") === "csv") return true;
  return (request.headers.get("accept") ?? "").split(",")[0]!.trim().toLowerCase().startsWith("text/csv");
}
