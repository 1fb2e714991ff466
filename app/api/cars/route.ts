import { NextResponse } from "next/server";
import { z } from "zod";
import { createCar } from "@/db/queries/create-car";
import { listGarage } from "@/db/queries/list-garage";
import { carInputSchemaFor } from "@/lib/cars/car-schema";
import { clock } from "@/lib/clock";
import { defineRoute } from "@/lib/http/define-route";

// GET /api/cars — the signed-in person's garage.
export const GET = defineRoute({
  access: { signedIn: true },
  handler: async (_request, { user }) => {
    const garage = await listGarage({ userId: user.id });
    return NextResponse.json({ cars: garage.cars });
  },
});

// POST /api/cars — add a car to the signed-in person's garage (model year checked against the
// server's clock).
export const POST = defineRoute({
  access: { signedIn: true },
  body: { json: z.unknown(), limit: "default" },
  handler: async (_request, { user, body }) => {
    const car = carInputSchemaFor({ thisYear: clock.now().getUTCFullYear() }).parse(body);
    const { id } = await createCar({ ownerId: user.id, car });
    const [saved] = (await listGarage({ userId: user.id })).cars.filter((c) => c.id === id);
    return NextResponse.json({ car: saved }, { status: 201 });
  },
});
