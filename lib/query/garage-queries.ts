import { queryOptions } from "@tanstack/react-query";
import type { Car } from "../cars/car-schema";
import { fetchJson } from "./fetch-json";

export const garageKeys = {
  all: ["garage"] as const,
  cars: () => [...garageKeys.all, "cars"] as const,
};

export const carsQuery = () =>
  queryOptions({
    queryKey: garageKeys.cars(),
    queryFn: () => fetchJson<{ cars: Car[] }>("/api/cars").then((r) => r.cars),
  });
