import { NextResponse } from "next/server";
import { z } from "zod";
import { setCarRetired } from "@/db/queries/set-car-retired";
import { carParams } from "@/lib/cars/car-route-params";
import { getOwnCar } from "@/lib/cars/get-own-car";
import { AppError } from "@/lib/errors";
import { defineRoute } from "@/lib/http/define-route";

const retirementSchema = z.strictObject({
  retired: z.boolean({ message: "Say true to retire the car or false to bring it back" }),
});

// POST /api/cars/[carId]/retirement — retire one of the caller's cars (kept for its past
// entries, not offered for new ones) or bring it back: `{ retired: true | false }`.
export const POST = defineRoute({
  params: carParams,
  access: { signedIn: true },
  // Parsed after the owner check, so a stranger learns nothing from the body's problems.
  body: { json: z.unknown(), limit: "default" },
  handler: async (_request, { params, user, body }) => {
    await getOwnCar({ carId: params.carId, userId: user.id });
    const { retired } = retirementSchema.parse(body);
    const result = await setCarRetired({ ownerId: user.id, carId: params.carId, retired });
    if (!result.found) throw new AppError("not_found", "No such car.");
    return NextResponse.json({ retiredAt: result.retiredAt?.toISOString() ?? null });
  },
});
