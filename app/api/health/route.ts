import { NextResponse } from "next/server";
import { checkHealth } from "@/lib/health/check-health";

export const dynamic = "force-dynamic";

// GET /api/health — 200 when the database and the mail server answer, 503 saying which did not.
export async function GET() {
  const report = await checkHealth();
  return NextResponse.json(report, {
    status: report.ok ? 200 : 503,
    headers: { "cache-control": "no-store" },
  });
}
