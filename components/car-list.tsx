"use client";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import type { Car } from "@/lib/cars/car-schema";
import { formatCarLength } from "@/lib/cars/format-car-length";
import { fetchJson } from "@/lib/query/fetch-json";
import { carsQuery, garageKeys } from "@/lib/query/garage-queries";
import { CarFiles } from "./car-files";
import { CarForm } from "./car-form";

/** One car: what it is, its figures, its files; change it, retire it or bring it back. */
function CarItem({ car }: { car: Car }) {
  const queryClient = useQueryClient();
  const [editing, setEditing] = useState(false);
  const retire = useMutation({
    mutationFn: (retired: boolean) =>
      fetchJson<{ retiredAt: string | null }>(`/api/cars/${car.id}/retirement`, {
        method: "POST",
        body: JSON.stringify({ retired }),
      }),
    onSuccess: ({ retiredAt }) =>
      queryClient.setQueryData<Car[]>(garageKeys.cars(), (old) =>
        (old ?? []).map((c) => (c.id === car.id ? { ...c, retiredAt } : c)),
      ),
  });
  if (editing) return <CarForm car={car} onDone={() => setEditing(false)} />;
  const retired = car.retiredAt !== null;
  return (
    <li
      className="card space-y-3"
      data-testid="car-item"
      data-car-id={car.id}
      data-retired={retired}
    >
      <div>
        <p className="text-lg font-semibold">
          {car.year} {car.make} {car.model}
          {retired ? (
            <span className="ml-2 rounded bg-asphalt-200 px-2 py-0.5 text-base">Retired</span>
          ) : null}
        </p>
        <p className="text-base text-asphalt-800">{car.colour}</p>
        <dl className="text-base text-asphalt-800">
          {car.bodyWidthMm !== null ? (
            <div className="flex gap-1">
              <dt>Body width</dt>
              <dd className="tabular" data-testid="car-body-width">
                {formatCarLength(car.bodyWidthMm)}
              </dd>
            </div>
          ) : null}
          {car.roofHeightMm !== null ? (
            <div className="flex gap-1">
              <dt>Roof height</dt>
              <dd className="tabular" data-testid="car-roof-height">
                {formatCarLength(car.roofHeightMm)}
              </dd>
            </div>
          ) : null}
        </dl>
      </div>
      {retired ? (
        <p className="text-base">Kept for its past entries; not offered when you enter an event.</p>
      ) : (
        <CarFiles car={car} />
      )}
      <div className="flex flex-wrap gap-2">
        {retired ? null : (
          <button type="button" className="btn-secondary" onClick={() => setEditing(true)}>
            Change
          </button>
        )}
        <button
          type="button"
          className="btn-secondary"
          disabled={retire.isPending}
          onClick={() => retire.mutate(!retired)}
        >
          {retired ? "Bring back" : "Retire"}
        </button>
      </div>
      {retire.isError ? (
        <p className="field-error" role="alert">
          {retire.error.message}
        </p>
      ) : null}
    </li>
  );
}

/** The person's cars: the ones in use first, then the retired ones. */
export function CarList() {
  const { data: cars = [], isPending } = useQuery(carsQuery());
  if (isPending) return <p>Loading your cars…</p>;
  if (cars.length === 0) return <p className="card">No cars yet. Add the car you will bring.</p>;
  const ordered = [...cars.filter((c) => !c.retiredAt), ...cars.filter((c) => c.retiredAt)];
  return (
    <ul className="grid gap-3 sm:grid-cols-2" data-testid="car-list">
      {ordered.map((car) => (
        <CarItem key={car.id} car={car} />
      ))}
    </ul>
  );
}
