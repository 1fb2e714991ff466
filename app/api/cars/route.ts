import { NextResponse } from "next/server";
import { createCar } from "@/db/queries/create-car";
import { listGarage } from "@/db/queries/list-garage";
import { requireUser } from "@/lib/auth/require-permission";
import { carInputSchema } from "@/lib/cars/car-schema";
import { handleRoute, parseJsonBody } from "@/lib/http/handle-route";

// GET /api/cars — the signed-in person's garage.
export const GET = handleRoute(async () => {
  const user = await requireUser();
  const garage = await listGarage({ userId: user.id });
  return NextResponse.json({ cars: garage.cars });
});

// POST /api/cars — add a car to the signed-in person's garage.
export const POST = handleRoute(async (request: Request) => {
  const user = await requireUser();
  const car = await parseJsonBody(request, carInputSchema);
  const { id } = await createCar({ ownerId: user.id, car });
  return NextResponse.json({ car: { id, ...car } }, { status: 201 });
});
