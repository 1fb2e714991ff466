"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { startTransition, useActionState } from "react";
import { useForm } from "react-hook-form";
import {
  type EntryFormInput,
  type EntryFormValues,
  entryFormSchema,
} from "@/lib/entries/entry-form-schema";
import { experienceLabels } from "@/lib/entries/experience-labels";
import type { FieldErrors } from "@/lib/errors";
import { experienceLevels } from "@/lib/paddock/drive";
import { type ClassFit, ClassPicker } from "./class-picker";
import { FieldError } from "./field-error";

export type EnterEventState = { status: "idle" | "error"; message?: string; fields?: FieldErrors };

/**
 * Enter a car: checked in the browser with the same zod schema the server action parses again;
 * the action redirects to the new entry's page.
 */
export function EntryForm({
  eventSlug,
  cars,
  classes,
  classFits,
  defaultExperience,
  action,
}: {
  eventSlug: string;
  cars: Array<{ id: string; label: string }>;
  classes: Array<{ id: string; name: string; summary: string }>;
  /** The pre-check per car id, then per class id (the picker shows the chosen car's). */
  classFits?: Record<string, Record<string, ClassFit>>;
  /** The experience the profile gives, offered first (the driver may say otherwise here). */
  defaultExperience?: string | null;
  action: (state: EnterEventState, form: FormData) => Promise<EnterEventState>;
}) {
  const [state, formAction, pending] = useActionState(action, { status: "idle" });
  const form = useForm<EntryFormInput, unknown, EntryFormValues>({
    resolver: zodResolver(entryFormSchema),
    defaultValues: {
      eventSlug,
      carId: cars.length === 1 ? cars[0]?.id : "",
      classId: "",
      lapTime: "",
      coDriverEmail: "",
      ...(defaultExperience ? { experience: defaultExperience } : {}),
    } as Partial<EntryFormInput>,
  });
  const errors = form.formState.errors;
  const chosenCar = form.watch("carId");
  const messages = (name: keyof EntryFormInput) =>
    errors[name]?.message ? [String(errors[name]?.message)] : state.fields?.[name];
  const onValid = () => {
    const data = new FormData();
    for (const [k, v] of Object.entries(form.getValues())) data.set(k, String(v ?? ""));
    startTransition(() => formAction(data));
  };
  return (
    <form
      className="space-y-5"
      noValidate
      onSubmit={form.handleSubmit(onValid)}
      data-testid="entry-form"
    >
      <input type="hidden" {...form.register("eventSlug")} />
      <div>
        <label htmlFor="entry-car" className="field-label">
          Car
        </label>
        <select
          id="entry-car"
          className="field-input"
          aria-invalid={messages("carId") ? true : undefined}
          aria-describedby="entry-car-error"
          {...form.register("carId")}
        >
          <option value="">Choose a car…</option>
          {cars.map((c) => (
            <option key={c.id} value={c.id}>
              {c.label}
            </option>
          ))}
        </select>
        <FieldError id="entry-car-error" messages={messages("carId")} />
      </div>
      <div>
        <ClassPicker
          classes={classes}
          classFits={chosenCar ? classFits?.[chosenCar] : undefined}
          field={form.register("classId")}
          invalid={Boolean(messages("classId"))}
          describedBy="entry-class-error"
        />
        <FieldError id="entry-class-error" messages={messages("classId")} />
        {chosenCar && !classFits?.[chosenCar] ? (
          <p className="mt-2 text-base" data-testid="no-wing-plan">
            No wing plan is saved for this car.{" "}
            <a href={`/pre-check?event=${encodeURIComponent(eventSlug)}`} className="underline">
              Pre-check a wing design
            </a>{" "}
            to see which classes it fits before you choose.
          </p>
        ) : null}
      </div>
      <div>
        <label htmlFor="entry-lap-time" className="field-label">
          Your lap-time estimate at this circuit (minutes:seconds)
        </label>
        <input
          id="entry-lap-time"
          className="field-input"
          inputMode="decimal"
          placeholder="1:52"
          aria-invalid={messages("lapTime") ? true : undefined}
          aria-describedby="entry-lap-time-error"
          {...form.register("lapTime")}
        />
        <FieldError id="entry-lap-time-error" messages={messages("lapTime")} />
      </div>
      <div>
        <label htmlFor="entry-experience" className="field-label">
          Your experience
        </label>
        <select
          id="entry-experience"
          className="field-input"
          aria-invalid={messages("experience") ? true : undefined}
          aria-describedby="entry-experience-error"
          defaultValue={defaultExperience ?? ""}
          {...form.register("experience")}
        >
          <option value="" disabled>
            Choose…
          </option>
          {experienceLevels.map((level) => (
            <option key={level} value={level}>
              {experienceLabels[level]}
            </option>
          ))}
        </select>
        <FieldError id="entry-experience-error" messages={messages("experience")} />
      </div>
      <div>
        <label htmlFor="entry-co-driver" className="field-label">
          Co-driver&apos;s e-mail (optional)
        </label>
        <input
          id="entry-co-driver"
          className="field-input"
          type="email"
          autoComplete="off"
          placeholder="name@example.com"
          aria-invalid={messages("coDriverEmail") ? true : undefined}
          aria-describedby="entry-co-driver-error"
          {...form.register("coDriverEmail")}
        />
        <p className="text-base text-asphalt-700">
          They get an e-mail and accept from their own account with their own estimate.
        </p>
        <FieldError id="entry-co-driver-error" messages={messages("coDriverEmail")} />
      </div>
      {state.status === "error" && state.message ? (
        <p className="field-error" role="alert" data-testid="entry-form-error">
          {state.message}
        </p>
      ) : null}
      <button type="submit" className="btn-primary w-full sm:w-auto" disabled={pending}>
        {pending ? "Entering…" : "Enter"}
      </button>
    </form>
  );
}
