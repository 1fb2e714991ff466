"use server";
import { revalidatePath } from "next/cache";
import type { InviteCoDriverState } from "@/components/co-driver-invite-form";
import { reinviteCoDriver } from "@/db/queries/entering/reinvite-co-driver";
import { clock } from "@/lib/clock";
import { inviteCoDriverSchema } from "@/lib/entries/entry-form-schema";
import { env } from "@/lib/env";
import { defineAction } from "@/lib/http/define-action";

// Server action — the entry's driver invites a co-driver by e-mail (a new invitation closes the
// older one). Whose entry it is is read from the entry's row, never from the form.
export const inviteCoDriverAction = defineAction({
  fields: ["entryId", "coDriverEmail"],
  schema: inviteCoDriverSchema,
  access: { signedIn: true },
  refuse: ({ message, fields }): InviteCoDriverState => ({ status: "error", message, fields }),
  handler: async ({ entryId, coDriverEmail }, { user }): Promise<InviteCoDriverState> => {
    await reinviteCoDriver({
      entryId,
      userId: user.id,
      email: coDriverEmail,
      now: clock.now(),
      appUrl: env.APP_URL,
    });
    revalidatePath(`/entries/${entryId}`);
    return { status: "done", message: `Invitation sent to ${coDriverEmail}.` };
  },
});
