"use server";
import { redirect } from "next/navigation";
import type { EnterEventState } from "@/components/entry-form";
import { createEntry } from "@/db/queries/entering/create-entry";
import { getPublicEvent } from "@/db/queries/entering/get-public-event";
import { clock } from "@/lib/clock";
import { entryFormSchema } from "@/lib/entries/entry-form-schema";
import { env } from "@/lib/env";
import { AppError } from "@/lib/errors";
import { defineAction } from "@/lib/http/define-action";

// Server action — a signed-in person enters one of their own cars in an event. The driver is the
// caller, never a field; the car must be theirs (checked under the event's row lock).
export const enterEventAction = defineAction({
  fields: ["eventSlug", "carId", "classId", "lapTime", "experience", "coDriverEmail"],
  schema: entryFormSchema,
  access: { signedIn: true },
  refuse: ({ message, fields }): EnterEventState => ({ status: "error", message, fields }),
  handler: async (input, { user }): Promise<EnterEventState> => {
    const event = await getPublicEvent({ slug: input.eventSlug });
    if (!event) throw new AppError("not_found", "There is no such event.");
    const created = await createEntry({
      eventId: event.id,
      driverId: user.id,
      carId: input.carId,
      classId: input.classId,
      lapTimeEstimateMs: input.lapTime,
      experience: input.experience,
      coDriverEmail: input.coDriverEmail,
      now: clock.now(),
      appUrl: env.APP_URL,
    });
    redirect(`/entries/${created.entryId}?entered=1`);
  },
});
