"use server";
import { redirect } from "next/navigation";
import { z } from "zod";
import type { PayState } from "@/components/payments/pay-form";
import { defineAction } from "@/lib/http/define-action";
import { idSchema } from "@/lib/http/id-schema";
import { startCheckout } from "@/lib/payments/start-checkout";

// Server action — the entry's driver or car owner starts paying its fee: a hosted checkout is
// opened through the payments SDK and the browser is sent to it.
export const startCheckoutAction = defineAction({
  fields: ["entryId"],
  schema: z.object({ entryId: idSchema }),
  access: { signedIn: true },
  refuse: ({ message }): PayState => ({ status: "error", message }),
  handler: async ({ entryId }, { user }): Promise<PayState> => {
    const { url } = await startCheckout({ entryId, userId: user.id });
    redirect(url);
  },
});
