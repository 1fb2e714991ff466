"use server";
import { revalidatePath } from "next/cache";
import type { AeroPlanState } from "@/components/precheck/aero-plan-state";
import { deleteAeroPlan } from "@/db/queries/aero-plans/delete-aero-plan";
import { MAX_AERO_PLANS_PER_OWNER, saveAeroPlan } from "@/db/queries/aero-plans/save-aero-plan";
import { AppError } from "@/lib/errors";
import { defineAction } from "@/lib/http/define-action";
import {
  deleteAeroPlanInputSchema,
  saveAeroPlanInputSchema,
} from "@/lib/precheck/save-aero-plan-input-schema";

const refuse = ({ message, fields }: { message: string; fields?: Record<string, string[]> }) =>
  ({ status: "error", message, fields }) satisfies AeroPlanState as AeroPlanState;

// Server action — a signed-in entrant saves the pre-check's plan against one of their own cars
// (the car is looked up with its owner, never trusted from the form).
export const saveAeroPlanAction = defineAction({
  fields: ["carId", "name", "plan"],
  schema: saveAeroPlanInputSchema,
  access: { signedIn: true },
  refuse,
  handler: async ({ carId, name, plan }, { user }): Promise<AeroPlanState> => {
    const saved = await saveAeroPlan({ ownerId: user.id, carId, name, plan });
    if (!saved.ok) {
      if (saved.why === "too-many") {
        throw new AppError(
          "conflict",
          `You keep ${MAX_AERO_PLANS_PER_OWNER} plans already; delete one first.`,
        );
      }
      throw new AppError("not_found", "Choose one of your own cars still in use.", {
        carId: ["Choose one of your own cars still in use."],
      });
    }
    revalidatePath("/pre-check");
    return { status: "done", message: `Saved "${name}".` };
  },
});

// Server action — the owner deletes one of their saved plans; anyone else's is left alone.
export const deleteAeroPlanAction = defineAction({
  fields: ["planId"],
  schema: deleteAeroPlanInputSchema,
  access: { signedIn: true },
  refuse,
  handler: async ({ planId }, { user }): Promise<AeroPlanState> => {
    const { deleted } = await deleteAeroPlan({ ownerId: user.id, planId });
    if (!deleted) throw new AppError("not_found", "No such plan of yours.");
    revalidatePath("/pre-check");
    return { status: "done", message: "Deleted." };
  },
});
