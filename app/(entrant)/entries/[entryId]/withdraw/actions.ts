"use server";
import { revalidatePath } from "next/cache";
import { z } from "zod";
import type { WithdrawState } from "@/components/payments/withdraw-form";
import { formatMoney } from "@/lib/format-money";
import { defineAction } from "@/lib/http/define-action";
import { idSchema } from "@/lib/http/id-schema";
import { withdrawEntry } from "@/lib/payments/withdraw-entry";

// Server action — the entry's driver or car owner withdraws it: refund per the event's policy
// through the payments SDK, and the waiting list moves up.
export const withdrawEntryAction = defineAction({
  fields: ["entryId", "confirm"],
  schema: z.object({
    entryId: idSchema,
    confirm: z.literal("yes", { message: "Tick the box to say you want to withdraw." }),
  }),
  access: { signedIn: true },
  refuse: ({ message, fields }): WithdrawState => ({
    status: "error",
    message: fields?.confirm?.[0] ?? message,
  }),
  handler: async ({ entryId }, { user }): Promise<WithdrawState> => {
    const outcome = await withdrawEntry({ entryId, userId: user.id });
    revalidatePath(`/entries/${entryId}/withdraw`);
    revalidatePath(`/entries/${entryId}/pay`);
    return {
      status: "done",
      message:
        outcome.refundMinor > 0
          ? `Withdrawn. ${formatMoney(outcome.refundMinor, outcome.currency)} is being refunded to your card; the e-mail has the details.`
          : "Withdrawn. The event's refund policy gives nothing back at this point.",
    };
  },
});
