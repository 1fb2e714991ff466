"use client";
import { useQuery } from "@tanstack/react-query";
import { carsQuery } from "@/lib/query/garage-queries";

export function CarList() {
  const { data: cars = [], isPending } = useQuery(carsQuery());
  if (isPending) return <p>Loading your cars…</p>;
  if (cars.length === 0) return <p className="card">No cars yet. Add the car you will bring.</p>;
  return (
    <ul className="grid gap-2 sm:grid-cols-2" data-testid="car-list">
      {cars.map((car) => (
        <li key={car.id} className="card">
          <p className="text-lg font-semibold">
            {car.year} {car.make} {car.model}
          </p>
          <p className="text-base text-asphalt-800">{car.colour}</p>
        </li>
      ))}
    </ul>
  );
}
