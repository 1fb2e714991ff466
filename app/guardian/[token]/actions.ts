"use server";
import { headers } from "next/headers";
import type { FormState } from "@/components/form-state";
import { clientAddress } from "@/lib/auth/client-address";
import { clock } from "@/lib/clock";
import { defineAction } from "@/lib/http/define-action";
import { acceptGuardianWaiver } from "@/lib/waivers/accept-guardian-waiver";
import { acceptGuardianWaiverInputSchema } from "@/lib/waivers/waiver-input-schemas";

// Server action — a minor's parent or guardian accepts the waiver from the link they were
// e-mailed. No account: the link's token (only its SHA-256 is stored) is the proof, and it works once.
export const acceptGuardianWaiverAction = defineAction({
  fields: ["token", "guardianName"],
  schema: acceptGuardianWaiverInputSchema,
  access: { public: "a parent or guardian has no account; the e-mailed link's token is the proof" },
  refuse: ({ message, fields }): FormState => ({ status: "error", message, fields }),
  handler: async (input): Promise<FormState> => {
    const { minorName, eventName } = await acceptGuardianWaiver({
      input,
      ip: clientAddress(await headers()),
      now: clock.now(),
    });
    return {
      status: "done",
      message: `Accepted. Thank you: ${minorName}'s waiver for ${eventName} is complete. You can close this page.`,
    };
  },
});
