"use server";
import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { z } from "zod";
import type { PinRuleSetState } from "@/components/rules/pin-rule-set-form";
import type { RuleSetDraftState } from "@/components/rules/rule-set-editor";
import { insertRuleSetVersion } from "@/db/queries/insert-rule-set-version";
import { defineAction } from "@/lib/http/define-action";
import { idSchema } from "@/lib/http/id-schema";
import { checkRuleSetDraft } from "@/lib/rule-sets/check-rule-set-draft";
import { pinRuleSet } from "@/lib/rule-sets/pin-rule-set";
import { previewRuleSetChange } from "@/lib/rule-sets/preview-rule-set-change";
import { MAX_RULE_SET_CHARS } from "@/lib/scrutineer/rule-sets/parse-rule-set-json";

const draftFormSchema = z.object({
  eventId: idSchema,
  intent: z.enum(["check", "save"]),
  text: z.string().max(MAX_RULE_SET_CHARS, "That is too long for a rule set.").default(""),
  notes: z.string().max(500, "Keep the note under 500 characters.").trim().default(""),
});

// Server action — the organizer checks a draft rule-set version (schema, successor rules and the
// verdicts it would change) and, with intent "save", stores it as the next version.
export const draftRuleSetAction = defineAction({
  fields: ["eventId", "intent", "text", "notes"],
  schema: draftFormSchema,
  access: { permission: "rule-sets.manage", eventId: (form) => form.eventId },
  refuse: ({ message, fields }): RuleSetDraftState => ({
    status: "error",
    message,
    fields,
    issues: [],
  }),
  handler: async ({ eventId, intent, text, notes }, { user }): Promise<RuleSetDraftState> => {
    const checked = await checkRuleSetDraft({ eventId, text });
    if (!checked.ok) {
      return {
        status: "error",
        message: `${checked.issues.length} ${checked.issues.length === 1 ? "problem" : "problems"} to fix before this can be saved.`,
        issues: checked.issues,
      };
    }
    if (intent === "check") {
      const preview = await previewRuleSetChange({ eventId, candidate: checked.ruleSet });
      return { status: "checked", preview, issues: [] };
    }
    if (notes.length < 3) {
      return {
        status: "error",
        message: "Say what changed and why before saving.",
        fields: { notes: ["Say what changed and why (at least 3 characters)."] },
        issues: [],
      };
    }
    const saved = await insertRuleSetVersion({
      eventId,
      ruleSet: checked.ruleSet,
      notes,
      createdBy: user.id,
    });
    revalidatePath(`/organizer/${eventId}/rules`);
    redirect(`/organizer/${eventId}/rules?version=${saved.id}`);
  },
});

const pinFormSchema = z.object({
  eventId: idSchema,
  versionId: idSchema,
  confirm: z.literal("yes", { message: "Tick the box to confirm." }),
});

// Server action — the organizer makes a saved version the one the event judges cars by; every
// verdict is recomputed and drivers whose verdict changed are e-mailed.
export const pinRuleSetAction = defineAction({
  fields: ["eventId", "versionId", "confirm"],
  schema: pinFormSchema,
  access: { permission: "rule-sets.manage", eventId: (form) => form.eventId },
  refuse: ({ message, fields }): PinRuleSetState => ({ status: "error", message, fields }),
  handler: async ({ eventId, versionId }, { user }): Promise<PinRuleSetState> => {
    const result = await pinRuleSet({ eventId, versionId, userId: user.id });
    if (result.previousVersion === null) {
      return {
        status: "done",
        message: `Version ${result.version} was already the pinned version.`,
      };
    }
    revalidatePath(`/organizer/${eventId}`, "layout");
    redirect(
      `/organizer/${eventId}/rules?pinned=${result.version}&changed=${result.changed}&mailed=${result.mailed}`,
    );
  },
});
