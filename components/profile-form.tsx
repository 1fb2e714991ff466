"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { startTransition, useActionState, useRef } from "react";
import { useForm } from "react-hook-form";
import type { ProfileState } from "@/app/(signed-in)/profile/actions";
import { experienceLevels } from "@/lib/paddock/drive";
import {
  experienceLevelWords,
  type Profile,
  type ProfileInput,
  profileSchema,
} from "@/lib/profile/profile-schema";
import { FieldError } from "./field-error";

type FieldName = keyof ProfileInput;

const textFields: {
  name: Exclude<FieldName, "experienceLevel">;
  label: string;
  type?: string;
  autoComplete?: string;
  inputMode?: "tel";
  hint?: string;
}[] = [
  { name: "fullName", label: "Full name", autoComplete: "name", hint: "As on your licence." },
  { name: "dateOfBirth", label: "Date of birth", type: "date", autoComplete: "bday" },
  { name: "phone", label: "Phone", type: "tel", autoComplete: "tel", inputMode: "tel" },
  { name: "emergencyContactName", label: "Emergency contact's name", autoComplete: "off" },
  {
    name: "emergencyContactPhone",
    label: "Emergency contact's phone",
    type: "tel",
    inputMode: "tel",
    autoComplete: "off",
  },
  {
    name: "licence",
    label: "Competition licence (optional)",
    autoComplete: "off",
    hint: "Grade and number as the licence shows them; leave empty if you have none.",
  },
];

/** The profile form: checked in the browser with the same schema the server action uses. */
export function ProfileForm({
  action,
  initial,
}: {
  action: (state: ProfileState, form: FormData) => Promise<ProfileState>;
  initial: Record<FieldName, string>;
}) {
  const [state, formAction, pending] = useActionState(action, {});
  const formRef = useRef<HTMLFormElement>(null);
  const form = useForm<ProfileInput, unknown, Profile>({
    resolver: zodResolver(profileSchema),
    defaultValues: initial as ProfileInput,
    mode: "onTouched",
  });
  const errors = form.formState.errors;
  const messagesFor = (name: FieldName): string[] | undefined => {
    const own = errors[name]?.message;
    if (own) return [own];
    return state.status === "refused" ? state.fields?.[name] : undefined;
  };
  return (
    <form
      ref={formRef}
      action={formAction}
      noValidate
      className="card space-y-4"
      aria-label="Profile"
      onSubmit={(event) => {
        event.preventDefault();
        void form.handleSubmit(() => {
          const element = formRef.current;
          if (!element) return;
          startTransition(() => formAction(new FormData(element)));
        })(event);
      }}
    >
      {textFields.map((f) => (
        <div key={f.name}>
          <label htmlFor={`profile-${f.name}`} className="field-label">
            {f.label}
          </label>
          {f.hint ? (
            <p id={`profile-${f.name}-hint`} className="text-base text-asphalt-700">
              {f.hint}
            </p>
          ) : null}
          <input
            id={`profile-${f.name}`}
            type={f.type ?? "text"}
            autoComplete={f.autoComplete}
            inputMode={f.inputMode}
            className="field-input"
            aria-invalid={messagesFor(f.name) ? true : undefined}
            aria-describedby={`profile-${f.name}-error${f.hint ? ` profile-${f.name}-hint` : ""}`}
            {...form.register(f.name)}
          />
          <FieldError id={`profile-${f.name}-error`} messages={messagesFor(f.name)} />
        </div>
      ))}
      <fieldset>
        <legend className="field-label">Experience</legend>
        <div className="mt-1 space-y-2">
          {experienceLevels.map((level) => (
            <label
              key={level}
              className="flex min-h-touch items-center gap-3 rounded-lg border-2 border-asphalt-300 px-3 py-2"
            >
              <input
                type="radio"
                value={level}
                className="size-5"
                aria-describedby="profile-experienceLevel-error"
                {...form.register("experienceLevel")}
              />
              <span className="text-base">{experienceLevelWords[level]}</span>
            </label>
          ))}
        </div>
        <FieldError id="profile-experienceLevel-error" messages={messagesFor("experienceLevel")} />
      </fieldset>
      {state.message ? (
        <p
          className={state.status === "saved" ? "text-lg font-semibold" : "field-error"}
          role={state.status === "saved" ? "status" : "alert"}
        >
          {state.message}
        </p>
      ) : null}
      <button type="submit" className="btn-primary w-full sm:w-auto" disabled={pending}>
        {pending ? "Saving…" : "Save profile"}
      </button>
    </form>
  );
}
