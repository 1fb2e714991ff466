import { NextResponse } from "next/server";
import { createCar } from "@/db/queries/create-car";
import { listGarage } from "@/db/queries/list-garage";
import { carInputSchema } from "@/lib/cars/car-schema";
import { defineRoute } from "@/lib/http/define-route";

// GET /api/cars — the signed-in person's garage.
export const GET = defineRoute({
  access: { signedIn: true },
  handler: async (_request, { user }) => {
    const garage = await listGarage({ userId: user.id });
    return NextResponse.json({ cars: garage.cars });
  },
});

// POST /api/cars — add a car to the signed-in person's garage.
export const POST = defineRoute({
  access: { signedIn: true },
  body: { json: carInputSchema, limit: "default" },
  handler: async (_request, { user, body: car }) => {
    const { id } = await createCar({ ownerId: user.id, car });
    return NextResponse.json({ car: { id, ...car } }, { status: 201 });
  },
});
