"use server";
import { revalidatePath } from "next/cache";
import type { RevokePassState } from "@/components/pass-revoke-form";
import { revokePass } from "@/db/queries/revoke-pass";
import { clock } from "@/lib/clock";
import { AppError } from "@/lib/errors";
import { defineAction } from "@/lib/http/define-action";
import { revokePassInputSchema } from "@/lib/passes/revoke-pass-input-schema";
import { verifyPassOnServer } from "@/lib/passes/verify-pass-on-server";

/** The pass id and event come from the signed pass (or its key's row), never from the form. */
async function passOf(token: string): Promise<{ eventId: string; passId: string }> {
  const { eventId, result } = await verifyPassOnServer({ token, now: clock.now() });
  const passId = result.ok ? result.claims.jti : result.claims?.jti;
  if (!eventId || !passId) {
    throw new AppError("not_found", "Only a pass Plumbline issued can be revoked.");
  }
  return { eventId, passId };
}

// Server action — the organizer revokes the pass shown on /p/[token], with a reason.
export const revokePassAction = defineAction({
  fields: ["token", "reason"],
  schema: revokePassInputSchema,
  access: {
    permission: "event.manage",
    eventIdFrom: async ({ token }) => (await passOf(token)).eventId,
  },
  refuse: ({ message, fields }): RevokePassState => ({ status: "error", message, fields }),
  handler: async ({ token, reason }, { user }): Promise<RevokePassState> => {
    const { eventId, passId } = await passOf(token);
    const { revoked } = await revokePass({ eventId, passId, reason, revokedBy: user.id });
    revalidatePath(`/p/${token}`);
    return {
      status: "done",
      message: revoked
        ? "Revoked. Phones refuse it once their event pack is refreshed."
        : "This pass was already revoked.",
    };
  },
});
