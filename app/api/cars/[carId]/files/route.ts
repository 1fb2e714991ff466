import { NextResponse } from "next/server";
import { parseCarFileForm, readCarFileForm } from "@/lib/cars/car-file-form";
import { carParams } from "@/lib/cars/car-route-params";
import { getOwnCar } from "@/lib/cars/get-own-car";
import { storeCarFile } from "@/lib/cars/store-car-file";
import { defineRoute } from "@/lib/http/define-route";

// POST /api/cars/[carId]/files — a photo (front, side, rear) or the dyno sheet of one of the
// caller's cars (multipart: kind, file); judged by its bytes, pictures reduced, then stored.
export const POST = defineRoute({
  params: carParams,
  access: { signedIn: true },
  body: { form: readCarFileForm, limit: "upload" },
  handler: async (_request, { params, user, body }) => {
    await getOwnCar({ carId: params.carId, userId: user.id });
    const form = parseCarFileForm(body);
    const file = await storeCarFile({ carId: params.carId, ...form, uploadedBy: user.id });
    return NextResponse.json({ file }, { status: 201 });
  },
});
