import { z } from "zod";
import { idSchema } from "../http/id-schema";
import { wingPlanSchema } from "../scrutineer/aero/wing-plan-schema";

/** What "Save this plan against a car" sends: the car, a name, and the plan as JSON. */
export const saveAeroPlanInputSchema = z.object({
  carId: idSchema,
  name: z
    .string()
    .trim()
    .min(1, "Give the plan a name.")
    .max(80, "Keep the name under 80 characters."),
  plan: z
    .string()
    .max(8_000, "The plan is too long.")
    .transform((text, ctx) => {
      try {
        return JSON.parse(text) as unknown;
      } catch {
        ctx.addIssue({ code: "custom", message: "The plan could not be read; check it again." });
        return z.NEVER;
      }
    })
    .pipe(wingPlanSchema),
});

/** What deleting a saved plan sends. */
export const deleteAeroPlanInputSchema = z.object({ planId: idSchema });
