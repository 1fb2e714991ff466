import { z } from "zod";
import {
  PLAN_LENGTH_UNITS,
  type PlanLength,
  type WingPlan,
  wingPlanSchema,
} from "../scrutineer/aero/wing-plan-schema";
import { convertLength } from "../scrutineer/units/convert-length";
import { parseLength } from "../scrutineer/units/parse-length";

/** One length as the form holds it: the text typed and the unit chosen beside it. */
const lengthField = z.object({ text: z.string().max(40), unit: z.enum(PLAN_LENGTH_UNITS) });
/** A form length. */
export type LengthField = z.infer<typeof lengthField>;

/**
 * The pre-check form's values: every length as text with its own unit (a unit typed in the text,
 * "6 mm" or "¼ in", wins over the one chosen), the span whole or as its halves.
 */
export const wingPlanFormSchema = z
  .object({
    bodyWidth: lengthField,
    roofHeight: lengthField,
    rearmostBodywork: lengthField,
    spanKind: z.enum(["whole", "parts"]),
    span: lengthField,
    half: lengthField,
    endPlate: lengthField,
    chord: lengthField,
    height: lengthField,
    mountDistance: lengthField,
    mountDirection: z.enum(["behind", "ahead"]),
  })
  .transform((form, ctx): WingPlan => {
    const read = (field: LengthField, path: string): PlanLength => {
      const parsed = parseLength(field.text, { defaultUnit: field.unit });
      if (!parsed.ok) {
        ctx.addIssue({ code: "custom", path: [path, "text"], message: parsed.message });
        return { value: 0, unit: field.unit };
      }
      const unit = parsed.unit === "mm" || parsed.unit === "in" ? parsed.unit : field.unit;
      return { value: convertLength(parsed.mm, "mm", unit), unit };
    };
    const plan = {
      car: {
        bodyWidth: read(form.bodyWidth, "bodyWidth"),
        roofHeight: read(form.roofHeight, "roofHeight"),
        rearmostBodywork: read(form.rearmostBodywork, "rearmostBodywork"),
      },
      wing: {
        span:
          form.spanKind === "whole"
            ? { kind: "whole" as const, span: read(form.span, "span") }
            : { kind: "parts" as const, half: read(form.half, "half") },
        endPlate: read(form.endPlate, "endPlate"),
        chord: read(form.chord, "chord"),
        height: read(form.height, "height"),
        mount: {
          distance: read(form.mountDistance, "mountDistance"),
          direction: form.mountDirection,
        },
      },
    };
    const checked = wingPlanSchema.safeParse(plan);
    if (!checked.success) {
      for (const issue of checked.error.issues) {
        const [group, field, ...rest] = issue.path.map(String);
        // car.bodyWidth → bodyWidth; wing.span.half → half; wing.mount.distance → mountDistance
        const name =
          group === "car"
            ? field
            : field === "span"
              ? (rest[0] ?? "span")
              : field === "mount"
                ? "mountDistance"
                : field;
        ctx.addIssue({
          code: "custom",
          path: [name ?? "bodyWidth", "text"],
          message: issue.message,
        });
      }
      return z.NEVER;
    }
    return checked.data;
  });
/** Form values before parsing. */
export type WingPlanFormValues = z.input<typeof wingPlanFormSchema>;

/** A plan back into form values (opening a saved plan), each length in its own unit. */
export function wingPlanToFormValues(plan: WingPlan): WingPlanFormValues {
  const f = (l: PlanLength): LengthField => ({
    text: String(Number(l.value.toFixed(4))),
    unit: l.unit,
  });
  const span = plan.wing.span;
  const blankSpan = { text: "", unit: span.kind === "whole" ? span.span.unit : span.half.unit };
  return {
    bodyWidth: f(plan.car.bodyWidth),
    roofHeight: f(plan.car.roofHeight),
    rearmostBodywork: f(plan.car.rearmostBodywork),
    spanKind: span.kind,
    span: span.kind === "whole" ? f(span.span) : blankSpan,
    half: span.kind === "parts" ? f(span.half) : blankSpan,
    endPlate: f(plan.wing.endPlate),
    chord: f(plan.wing.chord),
    height: f(plan.wing.height),
    mountDistance: f(plan.wing.mount.distance),
    mountDirection: plan.wing.mount.direction,
  };
}
