import type { UseFormRegisterReturn } from "react-hook-form";

/** What a pre-check says about the car in one class (the lead wires the pre-check in). */
export type ClassFit = { fits: boolean; words: string };

/**
 * The event's classes as large radio choices, low → high, each with its rules in one line and,
 * when a pre-check result is given, whether the car fits it (a word and an icon, never colour
 * alone).
 */
export function ClassPicker({
  classes,
  classFits,
  field,
  invalid,
  describedBy,
}: {
  classes: Array<{ id: string; name: string; summary: string }>;
  classFits?: Record<string, ClassFit>;
  field: UseFormRegisterReturn;
  invalid?: boolean;
  describedBy?: string;
}) {
  return (
    <fieldset
      className="space-y-2"
      aria-invalid={invalid ? true : undefined}
      aria-describedby={describedBy}
      data-testid="class-picker"
    >
      <legend className="field-label">Class</legend>
      {classes.map((cls) => {
        const fit = classFits?.[cls.id];
        return (
          <label
            key={cls.id}
            className="card flex min-h-touch cursor-pointer items-start gap-3 has-[:checked]:border-accent has-[:checked]:ring-2 has-[:checked]:ring-accent"
          >
            <input type="radio" value={cls.id} className="mt-1 size-6 shrink-0" {...field} />
            <span className="min-w-0">
              <span className="block text-lg font-semibold">{cls.name}</span>
              <span className="block text-base text-asphalt-800">{cls.summary}</span>
              {fit ? (
                <span
                  className={`mt-1 block text-base font-semibold ${fit.fits ? "text-cleared" : "text-stopped"}`}
                  data-testid="class-fit"
                >
                  {fit.fits ? "✓ Fits" : "✗ Does not fit"}: {fit.words}
                </span>
              ) : null}
            </span>
          </label>
        );
      })}
    </fieldset>
  );
}
