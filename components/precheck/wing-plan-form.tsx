"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useEffect } from "react";
import { useForm } from "react-hook-form";
import { type WingPlanFormValues, wingPlanFormSchema } from "@/lib/precheck/wing-plan-form-schema";
import type { WingPlan } from "@/lib/scrutineer/aero/wing-plan-schema";
import { LengthField } from "./length-field";

/** Empty form values, every length in the event's unit. */
export function blankPlanForm(unit: "mm" | "in"): WingPlanFormValues {
  const l = { text: "", unit };
  return {
    bodyWidth: l,
    roofHeight: l,
    rearmostBodywork: l,
    spanKind: "parts",
    span: l,
    half: l,
    endPlate: l,
    chord: l,
    height: l,
    mountDistance: l,
    mountDirection: "behind",
  };
}

/**
 * The car and the planned wing, each length in mm or in (chosen per field, or typed: "¼ in").
 * Checked in the browser with the engine's own plan schema; nothing is sent anywhere.
 */
export function WingPlanForm({
  values,
  onPlan,
}: {
  /** Values to show (a saved plan opened, or blank); a new object resets the form. */
  values: WingPlanFormValues;
  onPlan: (plan: WingPlan) => void;
}) {
  const {
    register,
    handleSubmit,
    watch,
    reset,
    formState: { errors },
  } = useForm<WingPlanFormValues, unknown, WingPlan>({
    resolver: zodResolver(wingPlanFormSchema),
    defaultValues: values,
  });
  useEffect(() => reset(values), [values, reset]);
  const spanKind = watch("spanKind");
  const field = { register, errors };
  return (
    <form
      onSubmit={handleSubmit(onPlan)}
      className="space-y-5"
      noValidate
      data-testid="wing-plan-form"
    >
      <fieldset className="card space-y-4">
        <legend className="text-xl font-bold">The car</legend>
        <LengthField
          name="bodyWidth"
          label="Body width"
          hint="At the widest bodywork, mirrors excluded."
          {...field}
        />
        <LengthField
          name="roofHeight"
          label="Roof height"
          hint="Ground to the roof's highest point."
          {...field}
        />
        <LengthField
          name="rearmostBodywork"
          label="Rearmost bodywork"
          hint="How far the rearmost bodywork sits behind the rear axle's centre line."
          {...field}
        />
      </fieldset>
      <fieldset className="card space-y-4">
        <legend className="text-xl font-bold">The wing</legend>
        <div className="space-y-2" role="radiogroup" aria-label="How the span is given">
          <label className="flex min-h-touch items-center gap-3 text-lg">
            <input type="radio" value="parts" className="size-6" {...register("spanKind")} />
            Two halves and two end plates
          </label>
          <label className="flex min-h-touch items-center gap-3 text-lg">
            <input type="radio" value="whole" className="size-6" {...register("spanKind")} />
            The whole span, end plates included
          </label>
        </div>
        {spanKind === "whole" ? (
          <LengthField
            name="span"
            label="Span"
            hint="Between the end plates' outer faces."
            {...field}
          />
        ) : (
          <LengthField name="half" label="Each half" hint="Width of one wing half." {...field} />
        )}
        <LengthField
          name="endPlate"
          label="Each end plate"
          hint="Thickness of one end plate."
          {...field}
        />
        <LengthField name="chord" label="Chord" hint="Leading edge to trailing edge." {...field} />
        <LengthField
          name="height"
          label="Wing's highest point"
          hint="From the ground, as it will sit on the car."
          {...field}
        />
        <LengthField
          name="mountDistance"
          label="Trailing edge distance"
          hint="How far the wing's rearmost point sits from the rearmost bodywork."
          {...field}
        />
        <div>
          <label htmlFor="plan-mountDirection" className="field-label">
            Trailing edge is
          </label>
          <select id="plan-mountDirection" className="field-input" {...register("mountDirection")}>
            <option value="behind">behind the rearmost bodywork</option>
            <option value="ahead">ahead of the rearmost bodywork</option>
          </select>
        </div>
      </fieldset>
      <button type="submit" className="btn-primary w-full">
        Check the wing
      </button>
    </form>
  );
}
