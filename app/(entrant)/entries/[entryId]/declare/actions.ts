"use server";
import { revalidatePath } from "next/cache";
import { z } from "zod";
import type { FormState } from "@/components/form-state";
import { saveDeclarations } from "@/lib/declarations/save-declarations";
import { defineAction } from "@/lib/http/define-action";
import { idSchema } from "@/lib/http/id-schema";

/** The declarations travel as one JSON field; once the caller is known to be allowed, the
 *  engine's own schema parses them again (saveDeclarations). */
const declareInputSchema = z.object({
  entryId: idSchema,
  declarations: z
    .string({ error: "The declarations are missing" })
    .max(20_000, "The declarations are too long")
    .transform((text, ctx) => {
      try {
        return JSON.parse(text) as unknown;
      } catch {
        ctx.addIssue({ code: "custom", message: "The declarations could not be read" });
        return z.NEVER;
      }
    }),
});

// Server action — the driver or car owner saves the entry's declarations; the verdict is
// recomputed by the worker from them (queued in the same transaction).
export const saveDeclarationsAction = defineAction({
  fields: ["entryId", "declarations"],
  schema: declareInputSchema,
  access: { signedIn: true },
  refuse: ({ message, fields }): FormState => ({ status: "error", message, fields }),
  handler: async ({ entryId, declarations }, { user }): Promise<FormState> => {
    await saveDeclarations({ entryId, userId: user.id, declarations });
    revalidatePath(`/entries/${entryId}`);
    return {
      status: "done",
      message: "Saved. The verdict is being worked out again with these declarations.",
    };
  },
});
