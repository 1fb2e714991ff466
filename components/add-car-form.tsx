"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useForm } from "react-hook-form";
import { type Car, type CarInput, carInputSchema } from "@/lib/cars/car-schema";
import { ApiError, fetchJson } from "@/lib/query/fetch-json";
import { garageKeys } from "@/lib/query/garage-queries";
import { FieldError } from "./field-error";

const fields = [
  { name: "make", label: "Make", placeholder: "Mazda" },
  { name: "model", label: "Model", placeholder: "MX-5 NB" },
  { name: "year", label: "Year", placeholder: "2001", inputMode: "numeric" as const },
  { name: "colour", label: "Colour", placeholder: "Silver" },
] as const;

/** Add a car to the garage. Validated in the browser and again by POST /api/cars. */
export function AddCarForm() {
  const queryClient = useQueryClient();
  const form = useForm<CarInput>({
    resolver: zodResolver(carInputSchema),
    defaultValues: { notes: "" },
  });
  const mutation = useMutation({
    mutationFn: (car: CarInput) =>
      fetchJson<{ car: Car }>("/api/cars", { method: "POST", body: JSON.stringify(car) }),
    onSuccess: ({ car }) => {
      queryClient.setQueryData<Car[]>(garageKeys.cars(), (old) => [...(old ?? []), car]);
      form.reset({ make: "", model: "", year: undefined, colour: "", notes: "" });
    },
    onError: (error) => {
      if (error instanceof ApiError && error.fields) {
        for (const [name, messages] of Object.entries(error.fields)) {
          form.setError(name as keyof CarInput, { message: messages.join(" ") });
        }
      }
    },
  });
  const errors = form.formState.errors;
  return (
    <form
      className="card space-y-4"
      noValidate
      onSubmit={form.handleSubmit((car) => mutation.mutate(car))}
      data-testid="add-car-form"
    >
      <h2 className="text-xl font-bold">Add a car</h2>
      <div className="grid gap-4 sm:grid-cols-2">
        {fields.map((f) => (
          <div key={f.name}>
            <label htmlFor={`car-${f.name}`} className="field-label">
              {f.label}
            </label>
            <input
              id={`car-${f.name}`}
              className="field-input"
              placeholder={f.placeholder}
              inputMode={"inputMode" in f ? f.inputMode : undefined}
              aria-invalid={errors[f.name] ? true : undefined}
              aria-describedby={`car-${f.name}-error`}
              {...form.register(f.name)}
            />
            <FieldError
              id={`car-${f.name}-error`}
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
      <button type="submit" className="btn-primary" disabled={mutation.isPending}>
        {mutation.isPending ? "Saving…" : "Add car"}
      </button>
    </form>
  );
}
