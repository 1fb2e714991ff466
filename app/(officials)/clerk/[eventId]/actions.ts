"use server";
import { revalidatePath } from "next/cache";
import { z } from "zod";
import { clock } from "@/lib/clock";
import { defineAction } from "@/lib/http/define-action";
import { idSchema } from "@/lib/http/id-schema";
import { jsonField } from "@/lib/http/json-field";
import { runGroupsSchema } from "@/lib/paddock/run-group-plan";
import { checkedScheduleSettingsSchema } from "@/lib/paddock/schedule-settings";
import { sessionCallStates } from "@/lib/paddock/session-call";
import { askReinspection } from "@/lib/reinspections/ask-reinspection";
import { buildDraft } from "@/lib/run-sheet/build-draft";
import { callSession } from "@/lib/run-sheet/call-session";
import type { ClerkActionState } from "@/lib/run-sheet/clerk-action-state";
import { publishRunSheet } from "@/lib/run-sheet/publish-run-sheet";
import { saveDraftChange } from "@/lib/run-sheet/save-draft-change";

const refuse = ({ message, fields }: { message: string; fields?: Record<string, string[]> }) =>
  ({ status: "error", message, fields }) satisfies ClerkActionState;
const revision = z
  .string()
  .regex(/^\d{0,9}$/, "Not a revision number")
  .transform((v) => (v === "" ? null : Number(v)));
const callWords = {
  called: "called to the assembly area",
  "on-track": "on track",
  "red-flag": "red flag, session stopped",
  finished: "finished",
  "cut-short": "cut short",
} as const;
const access = {
  permission: "run-groups.write" as const,
  eventId: (form: { eventId: string }) => form.eventId,
};

// Server action — build run groups from the cars ready to run and save them as the draft.
export const buildRunGroupsAction = defineAction({
  fields: ["eventId", "settings", "revision"],
  schema: z.object({
    eventId: idSchema,
    settings: jsonField(checkedScheduleSettingsSchema),
    revision,
  }),
  access,
  refuse,
  handler: async ({ eventId, settings, revision }, { user }): Promise<ClerkActionState> => {
    const saved = await buildDraft({
      eventId,
      settings,
      revision,
      builtBy: user.id,
      now: clock.now(),
    });
    revalidatePath(`/clerk/${eventId}`);
    return { status: "saved", revision: saved.revision, message: saved.message };
  },
});

// Server action — save the clerk's own change to the draft (a car moved, groups reordered).
export const saveRunGroupsAction = defineAction({
  fields: ["eventId", "groups", "settings", "revision"],
  schema: z.object({
    eventId: idSchema,
    groups: jsonField(runGroupsSchema),
    settings: jsonField(checkedScheduleSettingsSchema),
    revision,
  }),
  access,
  refuse,
  handler: async ({ eventId, groups, settings, revision }, { user }): Promise<ClerkActionState> => {
    const saved = await saveDraftChange({
      eventId,
      groups,
      settings,
      revision,
      updatedBy: user.id,
      now: clock.now(),
    });
    revalidatePath(`/clerk/${eventId}`);
    return { status: "saved", revision: saved, message: "Saved. Not published yet." };
  },
});

// Server action — publish the draft as the next run-sheet version and e-mail who it changes.
export const publishRunSheetAction = defineAction({
  fields: ["eventId", "revision"],
  schema: z.object({ eventId: idSchema, revision: z.coerce.number().int().min(1).max(1e9) }),
  access: {
    permission: "run-groups.publish",
    eventId: (form: { eventId: string }) => form.eventId,
  },
  refuse,
  handler: async ({ eventId, revision }, { user }): Promise<ClerkActionState> => {
    const published = await publishRunSheet({
      eventId,
      revision,
      publishedBy: user.id,
      now: clock.now(),
    });
    revalidatePath(`/clerk/${eventId}`);
    revalidatePath(`/board/${eventId}`);
    const mailed =
      published.mailed === 0
        ? "Nobody's group or times changed, so nobody was e-mailed."
        : `${published.mailed} e-mail${published.mailed === 1 ? "" : "s"} queued to entrants whose group or times changed.`;
    return {
      status: "published",
      version: published.version,
      diff: published.diff,
      mailed: published.mailed,
      message: [
        `Run sheet version ${published.version} published.`,
        mailed,
        ...published.warnings,
      ].join(" "),
    };
  },
});

// Server action — mark a session called, on track, red-flagged, finished or cut short.
export const callSessionAction = defineAction({
  fields: ["eventId", "sessionKey", "state", "note"],
  schema: z
    .object({
      eventId: idSchema,
      sessionKey: z.string().regex(/^\d{1,2}-\d{1,2}$/, "Not a session of the run sheet"),
      state: z.enum(sessionCallStates, { message: "Choose what happened to the session" }),
      note: z.string().trim().max(500, "Keep the note under 500 characters.").default(""),
    })
    .refine((v) => !(v.state === "red-flag" || v.state === "cut-short") || v.note.length >= 3, {
      path: ["note"],
      message: "Say why (at least 3 characters): it goes on the board and the day's record.",
    }),
  access: {
    permission: "run-groups.publish",
    eventId: (form: { eventId: string }) => form.eventId,
  },
  refuse,
  handler: async ({ eventId, sessionKey, state, note }, { user }): Promise<ClerkActionState> => {
    const session = await callSession({
      eventId,
      sessionKey,
      state,
      note: note === "" ? null : note,
      calledAt: clock.now(),
      calledBy: user.id,
    });
    revalidatePath(`/clerk/${eventId}`);
    revalidatePath(`/board/${eventId}`);
    return {
      status: "done",
      message: `${session.groupName}, round ${session.round}: ${callWords[state]}.`,
    };
  },
});

// Server action — send a car back to the tech line after an incident or a protest.
export const askReinspectionAction = defineAction({
  fields: ["eventId", "entryId", "cause", "askedBy", "reason"],
  schema: z.object({
    eventId: idSchema,
    entryId: idSchema,
    cause: z.enum(["incident", "protest", "other"], { message: "Choose why the car goes back" }),
    askedBy: z
      .string()
      .trim()
      .min(2, "Say who asked (a name or a role).")
      .max(160, "Keep it under 160 characters."),
    reason: z
      .string()
      .trim()
      .min(3, "Say what is to be looked at (at least 3 characters).")
      .max(1000, "Keep the reason under 1,000 characters."),
  }),
  access,
  refuse,
  handler: async (input, { user }): Promise<ClerkActionState> => {
    await askReinspection({ ...input, askedAt: clock.now(), createdBy: user.id, now: clock.now() });
    revalidatePath(`/clerk/${input.eventId}`);
    return {
      status: "done",
      message:
        "Sent back for re-inspection: the car shows Waiting until the chief scrutineer closes it.",
    };
  },
});
