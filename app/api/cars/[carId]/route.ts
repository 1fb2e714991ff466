import { NextResponse } from "next/server";
import { z } from "zod";
import { listGarage } from "@/db/queries/list-garage";
import { updateCar } from "@/db/queries/update-car";
import { carParams } from "@/lib/cars/car-route-params";
import { carInputSchemaFor } from "@/lib/cars/car-schema";
import { getOwnCar } from "@/lib/cars/get-own-car";
import { clock } from "@/lib/clock";
import { AppError } from "@/lib/errors";
import { defineRoute } from "@/lib/http/define-route";

// PATCH /api/cars/[carId] — change one of the caller's own cars (every field sent again).
export const PATCH = defineRoute({
  params: carParams,
  access: { signedIn: true },
  body: { json: z.unknown(), limit: "default" },
  handler: async (_request, { params, user, body }) => {
    await getOwnCar({ carId: params.carId, userId: user.id });
    const car = carInputSchemaFor({ thisYear: clock.now().getUTCFullYear() }).parse(body);
    if (!(await updateCar({ ownerId: user.id, carId: params.carId, car })))
      throw new AppError("not_found", "No such car.");
    const [saved] = (await listGarage({ userId: user.id })).cars.filter(
      (c) => c.id === params.carId,
    );
    return NextResponse.json({ car: saved });
  },
});
