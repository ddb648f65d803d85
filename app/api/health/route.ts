import { NextResponse } from "next/server";
import { checkHealth } from "@/lib/server/services/health";

export const dynamic = "force-dynamic";

// GET /api/health – database, storage and mail up or down, with latency; 200 only when all are up
export async function GET() {
  const { ok, services } = await checkHealth();
  return NextResponse.json(
    { status: ok ? "ok" : "degraded", services, checkedAt: new Date().toISOString() },
    { status: ok ? 200 : 503, headers: { "cache-control": "no-store" } },
  );
}
