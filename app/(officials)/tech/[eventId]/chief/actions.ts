"use server";
import { revalidatePath } from "next/cache";
import { z } from "zod";
import type { CloseReinspectionState } from "@/components/tech/reinspection-close-form";
import { clock } from "@/lib/clock";
import { defineAction } from "@/lib/http/define-action";
import { idSchema } from "@/lib/http/id-schema";
import { finishReinspection } from "@/lib/reinspections/finish-reinspection";

// Server action — the chief scrutineer closes a re-inspection once the car has been looked at
// again; its verdict is then derived from its records again.
export const closeReinspectionAction = defineAction({
  fields: ["eventId", "reinspectionId", "note"],
  schema: z.object({
    eventId: idSchema,
    reinspectionId: idSchema,
    note: z
      .string()
      .trim()
      .min(3, "Say what the re-inspection found (at least 3 characters).")
      .max(1000, "Keep it under 1,000 characters."),
  }),
  access: { permission: "verdicts.override", eventId: (form) => form.eventId },
  refuse: ({ message, fields }, form): CloseReinspectionState => ({
    status: "error",
    message,
    fields,
    note: String(form.get("note") ?? "").slice(0, 1000),
  }),
  handler: async ({ eventId, reinspectionId, note }, { user }): Promise<CloseReinspectionState> => {
    await finishReinspection({
      eventId,
      reinspectionId,
      closedBy: user.id,
      closedAt: clock.now(),
      note,
    });
    revalidatePath(`/tech/${eventId}/chief`);
    return {
      status: "done",
      message: "Closed. The car's verdict comes from its records again in a moment.",
    };
  },
});
