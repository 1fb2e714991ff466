"use client";
import type { FieldErrors, UseFormRegister } from "react-hook-form";
import type { WingPlanFormValues } from "@/lib/precheck/wing-plan-form-schema";

type LengthName =
  | "bodyWidth"
  | "roofHeight"
  | "rearmostBodywork"
  | "span"
  | "half"
  | "endPlate"
  | "chord"
  | "height"
  | "mountDistance";

/** One length of the pre-check form: the number (fractions welcome) and its own unit. */
export function LengthField({
  name,
  label,
  hint,
  register,
  errors,
}: {
  name: LengthName;
  label: string;
  hint?: string;
  register: UseFormRegister<WingPlanFormValues>;
  errors: FieldErrors<WingPlanFormValues>;
}) {
  const id = `plan-${name}`;
  const message = errors[name]?.text?.message ?? errors[name]?.message;
  return (
    <div>
      <label htmlFor={id} className="field-label">
        {label}
      </label>
      {hint ? <p className="text-base text-asphalt-800">{hint}</p> : null}
      <div className="flex gap-2">
        <input
          id={id}
          className="field-input min-w-0 flex-1 tabular"
          inputMode="decimal"
          autoComplete="off"
          aria-invalid={message ? true : undefined}
          aria-describedby={`${id}-error`}
          {...register(`${name}.text`)}
        />
        <select
          aria-label={`${label}: unit`}
          className="field-input w-24"
          {...register(`${name}.unit`)}
        >
          <option value="in">in</option>
          <option value="mm">mm</option>
        </select>
      </div>
      {message ? (
        <p id={`${id}-error`} className="field-error" role="alert">
          {String(message)}
        </p>
      ) : null}
    </div>
  );
}
