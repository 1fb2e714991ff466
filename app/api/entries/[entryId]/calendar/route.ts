import { defineRoute } from "@/lib/http/define-route";
import { entryParams } from "@/lib/http/route-params";
import { loadEntryCalendar } from "@/lib/run-sheet/load-entry-calendar";

// GET /api/entries/[entryId]/calendar — the entry's sessions from the latest run sheet as an
// iCalendar file, for its entrants and the event's officials.
export const GET = defineRoute({
  params: entryParams,
  access: { entry: ({ params }) => params.entryId },
  handler: async (_request, { params }) => {
    const { fileName, ics } = await loadEntryCalendar({ entryId: params.entryId });
    return new Response(ics, {
      headers: {
        "content-type": "text/calendar; charset=utf-8",
        "content-disposition": `attachment; filename="${fileName}"`,
        "cache-control": "no-store",
      },
    });
  },
});
