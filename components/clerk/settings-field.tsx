import type { FieldErrors } from "@/lib/errors";
import { FieldError } from "../field-error";

/** One labelled input of the schedule settings form, with its messages. */
export function SettingsField({
  name,
  label,
  type,
  defaultValue,
  fields,
  disabled = false,
}: {
  name: string;
  label: string;
  type: "time" | "number";
  defaultValue: string | number;
  fields: FieldErrors;
  disabled?: boolean;
}) {
  const errorId = `${name}-error`;
  const invalid = Boolean(fields[name]?.length);
  return (
    <label className="field-label">
      {label}
      <input
        name={name}
        type={type}
        defaultValue={defaultValue}
        disabled={disabled}
        min={type === "number" ? 0 : undefined}
        inputMode={type === "number" ? "numeric" : undefined}
        className="field-input tabular"
        aria-invalid={invalid || undefined}
        aria-describedby={invalid ? errorId : undefined}
      />
      <FieldError id={errorId} messages={fields[name]} />
    </label>
  );
}
