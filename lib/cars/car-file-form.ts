import { z } from "zod";
import { AppError } from "../errors";
import { CAR_FILE_KINDS, type CarFileKind } from "./car-file-limits";

const kindSchema = z.enum(Object.keys(CAR_FILE_KINDS) as [CarFileKind, ...CarFileKind[]], {
  message: "Choose what the file is: front, side or rear photo, or the dyno sheet",
});

/** POST /api/cars/[carId]/files — the multipart form: `kind` and `file`. */
export function readCarFileForm(form: FormData): { kind: CarFileKind; file: File } {
  const kind = kindSchema.safeParse(form.get("kind"));
  if (!kind.success) {
    throw new AppError("invalid_input", "Say what the file is.", {
      kind: ["Choose what the file is: front, side or rear photo, or the dyno sheet"],
    });
  }
  const file = form.get("file");
  if (!(file instanceof File)) {
    throw new AppError("invalid_input", "No file in the form.", { file: ["Attach the file"] });
  }
  return { kind: kind.data, file };
}
