"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useForm } from "react-hook-form";
import { type Car, type CarFields, type CarInput, carInputSchema } from "@/lib/cars/car-schema";
import { carLengthText } from "@/lib/cars/format-car-length";
import { ApiError, fetchJson } from "@/lib/query/fetch-json";
import { garageKeys } from "@/lib/query/garage-queries";
import { FieldError } from "./field-error";

type FieldName = "make" | "model" | "year" | "colour" | "bodyWidth" | "roofHeight";
const fields: {
  name: FieldName;
  label: string;
  placeholder: string;
  hint?: string;
  inputMode?: "numeric" | "decimal";
}[] = [
  { name: "make", label: "Make", placeholder: "Mazda" },
  { name: "model", label: "Model", placeholder: "MX-5 NB" },
  { name: "year", label: "Model year", placeholder: "2001", inputMode: "numeric" },
  { name: "colour", label: "Colour", placeholder: "Silver" },
  {
    name: "bodyWidth",
    label: "Body width (optional)",
    placeholder: "1680 mm or 66.1 in",
    hint: "At the widest bodywork, mirrors folded or off. mm or in; a number alone is mm.",
  },
  {
    name: "roofHeight",
    label: "Roof height (optional)",
    placeholder: "1235 mm or 48.6 in",
    hint: "Ground to the roof's highest point, on level ground.",
  },
];

const blank: CarInput = {
  make: "",
  model: "",
  year: "",
  colour: "",
  notes: "",
  bodyWidth: "",
  roofHeight: "",
};

function asInput(car: Car): CarInput {
  return {
    make: car.make,
    model: car.model,
    year: String(car.year),
    colour: car.colour,
    notes: car.notes,
    bodyWidth: carLengthText(car.bodyWidthMm),
    roofHeight: carLengthText(car.roofHeightMm),
  };
}

/**
 * Add a car to the garage, or change one (`car` given). Checked in the browser with the same
 * schema POST /api/cars and PATCH /api/cars/[carId] use; the text as typed is what is sent, so
 * the server reads the lengths itself.
 */
export function CarForm({ car, onDone }: { car?: Car; onDone?: () => void }) {
  const queryClient = useQueryClient();
  const form = useForm<CarInput, unknown, CarFields>({
    resolver: zodResolver(carInputSchema),
    defaultValues: car ? asInput(car) : blank,
  });
  const idPrefix = car ? `car-${car.id}` : "car";
  const mutation = useMutation({
    mutationFn: (input: CarInput) =>
      fetchJson<{ car: Car }>(car ? `/api/cars/${car.id}` : "/api/cars", {
        method: car ? "PATCH" : "POST",
        body: JSON.stringify(input),
      }),
    onSuccess: ({ car: saved }) => {
      queryClient.setQueryData<Car[]>(garageKeys.cars(), (old) =>
        car ? (old ?? []).map((c) => (c.id === saved.id ? saved : c)) : [...(old ?? []), saved],
      );
      if (!car) form.reset(blank);
      onDone?.();
    },
    onError: (error) => {
      if (error instanceof ApiError && error.fields) {
        for (const [name, messages] of Object.entries(error.fields)) {
          form.setError(name as FieldName, { message: messages.join(" ") });
        }
      }
    },
  });
  const errors = form.formState.errors;
  return (
    <form
      className="card space-y-4"
      noValidate
      onSubmit={form.handleSubmit(() => mutation.mutate(form.getValues()))}
      data-testid={car ? "edit-car-form" : "add-car-form"}
    >
      <h2 className="text-xl font-bold">
        {car ? `Change the ${car.make} ${car.model}` : "Add a car"}
      </h2>
      <div className="grid gap-4 sm:grid-cols-2">
        {fields.map((f) => (
          <div key={f.name}>
            <label htmlFor={`${idPrefix}-${f.name}`} className="field-label">
              {f.label}
            </label>
            {f.hint ? (
              <p id={`${idPrefix}-${f.name}-hint`} className="text-base text-asphalt-700">
                {f.hint}
              </p>
            ) : null}
            <input
              id={`${idPrefix}-${f.name}`}
              className="field-input"
              placeholder={f.placeholder}
              inputMode={f.inputMode}
              aria-invalid={errors[f.name] ? true : undefined}
              aria-describedby={`${idPrefix}-${f.name}-error${f.hint ? ` ${idPrefix}-${f.name}-hint` : ""}`}
              {...form.register(f.name)}
            />
            <FieldError
              id={`${idPrefix}-${f.name}-error`}
              messages={errors[f.name]?.message ? [errors[f.name]?.message ?? ""] : undefined}
            />
          </div>
        ))}
      </div>
      {mutation.isError && !(mutation.error instanceof ApiError && mutation.error.fields) ? (
        <p className="field-error" role="alert">
          {mutation.error.message}
        </p>
      ) : null}
      <div className="flex flex-wrap gap-3">
        <button type="submit" className="btn-primary" disabled={mutation.isPending}>
          {mutation.isPending ? "Saving…" : car ? "Save changes" : "Add car"}
        </button>
        {car && onDone ? (
          <button type="button" className="btn-secondary" onClick={onDone}>
            Cancel
          </button>
        ) : null}
      </div>
    </form>
  );
}
