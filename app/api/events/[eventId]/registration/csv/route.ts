import { NextResponse } from "next/server";
import { getEventSummary } from "@/db/queries/get-event-summary";
import { AppError } from "@/lib/errors";
import { defineRoute } from "@/lib/http/define-route";
import { eventParams, pathEvent } from "@/lib/http/route-params";
import { filterRegistrationRows } from "@/lib/registration/filter-registration-rows";
import { loadRegistrationRows } from "@/lib/registration/load-registration-rows";
import { registrationCsv } from "@/lib/registration/registration-csv";
import { registrationViewSchema } from "@/lib/registration/registration-view-schema";
import { sortRegistrationRows } from "@/lib/registration/sort-registration-rows";

// GET /api/events/[eventId]/registration/csv?q=&sort=&dir= — the sign-on desk's table as a CSV
// file, searched and sorted as on screen (the same permission as the desk's page).
export const GET = defineRoute({
  params: eventParams,
  query: registrationViewSchema,
  access: { permission: "registration.check", eventId: pathEvent },
  handler: async (_request, { params, query: view }) => {
    const [event, rows] = await Promise.all([
      getEventSummary({ eventId: params.eventId }),
      loadRegistrationRows({ eventId: params.eventId }),
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
  },
});
