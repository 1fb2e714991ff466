import { NextResponse } from "next/server";
import { getEventSummary } from "@/db/queries/get-event-summary";
import { requirePermission } from "@/lib/auth/require-permission";
import { AppError } from "@/lib/errors";
import { handleRoute } from "@/lib/http/handle-route";
import { idSchema } from "@/lib/http/id-schema";
import { filterRegistrationRows } from "@/lib/registration/filter-registration-rows";
import { loadRegistrationRows } from "@/lib/registration/load-registration-rows";
import { registrationCsv } from "@/lib/registration/registration-csv";
import { registrationViewSchema } from "@/lib/registration/registration-view-schema";
import { sortRegistrationRows } from "@/lib/registration/sort-registration-rows";

type Context = { params: Promise<{ eventId: string }> };

// GET /api/events/[eventId]/registration/csv?q=&sort=&dir= — the sign-on desk's table as a CSV
// file, searched and sorted as on screen (the same permission as the desk's page).
export const GET = handleRoute(async (request: Request, { params }: Context) => {
  const eventId = idSchema.parse((await params).eventId);
  const search = new URL(request.url).searchParams;
  const view = registrationViewSchema.parse({
    q: search.get("q") ?? undefined,
    sort: search.get("sort") ?? undefined,
    dir: search.get("dir") ?? undefined,
  });
  await requirePermission({ eventId, permission: "registration.check" });
  const [event, rows] = await Promise.all([
    getEventSummary({ eventId }),
    loadRegistrationRows({ eventId }),
  ]);
  if (!event) throw new AppError("not_found", "No such event.");
  const shown = sortRegistrationRows(filterRegistrationRows(rows, view.q), view);
  return new NextResponse(registrationCsv(shown), {
    headers: {
      "content-type": "text/csv; charset=utf-8; header=present",
      "content-disposition": `attachment; filename="sign-on-${event.slug.replace(/[^a-z0-9-]/gi, "")}.csv"`,
      "cache-control": "no-store",
    },
  });
});
