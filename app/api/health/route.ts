import { NextResponse } from "next/server";
import { isEventOfficial } from "@/db/queries/is-event-official";
import { checkHealth } from "@/lib/health/check-health";
import { defineRoute } from "@/lib/http/define-route";

export const dynamic = "force-dynamic";

// GET /api/health — 200 when the database and the mail server answer, else 503. Anyone learns
// only ok / not ok; an official also sees which part failed (and the server log always says).
export const GET = defineRoute({
  access: { public: "a load balancer's liveness probe; the details are for officials" },
  handler: async (_request, { user }) => {
    const report = await checkHealth();
    if (!report.ok) console.error("[health] not ok", JSON.stringify(report.checks));
    const official = user !== null && (await isEventOfficial({ userId: user.id }));
    return NextResponse.json(official ? report : { ok: report.ok }, {
      status: report.ok ? 200 : 503,
      headers: { "cache-control": "no-store" },
    });
  },
});
