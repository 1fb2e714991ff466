"use server";
import { revalidatePath } from "next/cache";
import { headers } from "next/headers";
import type { FormState } from "@/components/form-state";
import { clientAddress } from "@/lib/auth/client-address";
import { clock } from "@/lib/clock";
import { defineAction } from "@/lib/http/define-action";
import { signWaiver } from "@/lib/waivers/sign-waiver";
import { signWaiverInputSchema } from "@/lib/waivers/waiver-input-schemas";

// Server action — a driver (or co-driver) accepts the entry's waiver with their typed full name;
// a minor names a parent or guardian, who is e-mailed a link. Who signs is checked in signWaiver.
export const signWaiverAction = defineAction({
  fields: ["entryId", "signedName", "guardianName", "guardianEmail"],
  schema: signWaiverInputSchema,
  access: { signedIn: true },
  refuse: ({ message, fields }): FormState => ({ status: "error", message, fields }),
  handler: async (input, { user }): Promise<FormState> => {
    const result = await signWaiver({
      input,
      userId: user.id,
      ip: clientAddress(await headers()),
      now: clock.now(),
    });
    revalidatePath(`/entries/${input.entryId}/waiver`);
    if (result.outcome === "guardian-asked") {
      return {
        status: "done",
        message: `Signed. We have e-mailed ${result.guardianEmail}: your waiver is complete once your parent or guardian accepts it from that e-mail.`,
      };
    }
    return {
      status: "done",
      message:
        result.outcome === "already-signed"
          ? "You have accepted this waiver already."
          : "Signed. Thank you.",
    };
  },
});
