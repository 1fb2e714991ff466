"use server";
import { revalidatePath } from "next/cache";
import type { RevokePassState } from "@/components/pass-revoke-form";
import { revokePass } from "@/db/queries/revoke-pass";
import { requirePermission } from "@/lib/auth/require-permission";
import { clock } from "@/lib/clock";
import { AppError } from "@/lib/errors";
import { zodFieldErrors } from "@/lib/http/zod-field-errors";
import { revokePassInputSchema } from "@/lib/passes/revoke-pass-input-schema";
import { verifyPassOnServer } from "@/lib/passes/verify-pass-on-server";

// Server action — the organizer revokes the pass shown on /p/[token], with a reason.
export async function revokePassAction(
  _state: RevokePassState,
  formData: FormData,
): Promise<RevokePassState> {
  const input = revokePassInputSchema.safeParse({
    token: formData.get("token"),
    reason: formData.get("reason"),
  });
  if (!input.success) {
    return {
      status: "error",
      message: "Some fields need attention.",
      fields: zodFieldErrors(input.error),
    };
  }
  const { token, reason } = input.data;
  // The pass id and event come from the signed pass (or the key's row), never from the form.
  const { eventId, result } = await verifyPassOnServer({ token, now: clock.now() });
  const passId = result.ok ? result.claims.jti : result.claims?.jti;
  if (!eventId || !passId) {
    return { status: "error", message: "Only a pass Plumbline issued can be revoked." };
  }
  try {
    const { user } = await requirePermission({ eventId, permission: "event.manage" });
    const { revoked } = await revokePass({ eventId, passId, reason, revokedBy: user.id });
    revalidatePath(`/p/${token}`);
    return {
      status: "done",
      message: revoked
        ? "Revoked. Phones refuse it once their event pack is refreshed."
        : "This pass was already revoked.",
    };
  } catch (error) {
    if (error instanceof AppError) return { status: "error", message: error.message };
    throw error;
  }
}
