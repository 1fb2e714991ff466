import { NextResponse } from "next/server";
import { z } from "zod";
import { getEntryCarId } from "@/db/queries/get-entry-car-id";
import { listCarFiles } from "@/db/queries/list-car-files";
import { carFileUrl } from "@/lib/cars/car-file-url";
import { AppError } from "@/lib/errors";
import { defineRoute } from "@/lib/http/define-route";
import { idSchema } from "@/lib/http/id-schema";
import { pathEvent } from "@/lib/http/route-params";

// GET /api/events/[eventId]/entries/[entryId]/car-files — the entered car's current photos and
// dyno sheet, listed for the officials' car card (the files themselves: /api/cars/…/files/…).
export const GET = defineRoute({
  params: z.object({ eventId: idSchema, entryId: idSchema }),
  access: { permission: "entries.read", eventId: pathEvent },
  handler: async (_request, { params }) => {
    const carId = await getEntryCarId(params);
    if (!carId) throw new AppError("not_found", "That car is not entered in this event.");
    const files = await listCarFiles({ carIds: [carId] });
    return NextResponse.json({
      files: files.map(({ carId: _carId, ...f }) => ({
        ...f,
        url: carFileUrl({ carId, fileId: f.id }),
      })),
    });
  },
});
