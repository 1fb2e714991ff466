"use server";
import { redirect } from "next/navigation";
import { z } from "zod";
import type { InviteAnswerState } from "@/components/invite-answer-form";
import { answerCoDriverInvite } from "@/db/queries/entering/answer-co-driver-invite";
import { clock } from "@/lib/clock";
import { acceptInviteSchema } from "@/lib/entries/entry-form-schema";
import { defineAction } from "@/lib/http/define-action";

const refuse = ({ message, fields }: { message: string; fields?: Record<string, string[]> }) =>
  ({ status: "error", message, fields }) satisfies InviteAnswerState as InviteAnswerState;

// Server action — the signed-in person accepts the invitation the link's token names and
// becomes the entry's co-driver (never the driver; one co-driver per entry).
export const acceptInviteAction = defineAction({
  fields: ["token", "lapTime", "experience"],
  schema: acceptInviteSchema,
  access: { signedIn: true },
  refuse,
  handler: async ({ token, lapTime, experience }, { user }): Promise<InviteAnswerState> => {
    const { entryId } = await answerCoDriverInvite({
      token,
      userId: user.id,
      now: clock.now(),
      answer: "accept",
      lapTimeEstimateMs: lapTime,
      experience,
    });
    redirect(`/entries/${entryId}`);
  },
});

// Server action — the signed-in person declines the invitation the link's token names.
export const declineInviteAction = defineAction({
  fields: ["token"],
  schema: z.object({ token: z.string().min(20).max(100) }),
  access: { signedIn: true },
  refuse,
  handler: async ({ token }, { user }): Promise<InviteAnswerState> => {
    await answerCoDriverInvite({ token, userId: user.id, now: clock.now(), answer: "decline" });
    redirect("/garage?declined=1");
  },
});
