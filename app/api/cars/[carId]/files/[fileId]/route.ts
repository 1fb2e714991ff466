import { createHash } from "node:crypto";
import { getCarFile } from "@/db/queries/get-car-file";
import { carFileParams } from "@/lib/cars/car-route-params";
import { assertMaySeeCarFiles } from "@/lib/cars/may-see-car-files";
import { AppError } from "@/lib/errors";
import { defineRoute } from "@/lib/http/define-route";
import { getObject } from "@/lib/storage/get-object";

// GET /api/cars/[carId]/files/[fileId] — a car's photo or dyno sheet, for its owner and the
// officials of the events it is entered in.
export const GET = defineRoute({
  params: carFileParams,
  access: { signedIn: true },
  handler: async (_request, { params, user }) => {
    await assertMaySeeCarFiles({ carId: params.carId, userId: user.id });
    const file = await getCarFile(params);
    const object = file ? await getObject(file.objectKey) : null;
    if (!file || !object) throw new AppError("not_found", "No such file.");
    if (createHash("sha256").update(object.body).digest("hex") !== file.sha256)
      throw new AppError("conflict", "The stored file is not the one that was uploaded.");
    const name = `${file.kind}.${file.contentType === "application/pdf" ? "pdf" : "img"}`;
    return new Response(Buffer.from(object.body), {
      headers: {
        "content-type": file.contentType,
        "content-disposition": `inline; filename="${name}"`,
        "cache-control": "private, max-age=86400",
      },
    });
  },
});
