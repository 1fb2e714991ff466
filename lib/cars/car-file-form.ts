import { z } from "zod";
import { AppError } from "../errors";
import { CAR_FILE_KINDS, type CarFileKind } from "./car-file-limits";

const kindSchema = z.enum(Object.keys(CAR_FILE_KINDS) as [CarFileKind, ...CarFileKind[]]);

/** POST /api/cars/[carId]/files — the multipart form's two values as sent, checked later by
 *  {@link parseCarFileForm} (after the caller is known to own the car, so a stranger learns
 *  nothing from the form's problems). */
export function readCarFileForm(form: FormData): { kind: unknown; file: unknown } {
  return { kind: form.get("kind"), file: form.get("file") };
}

/** The form's `kind` and `file`, or a refusal in words (422). */
export function parseCarFileForm(form: { kind: unknown; file: unknown }): {
  kind: CarFileKind;
  file: File;
} {
  const kind = kindSchema.safeParse(form.kind);
  if (!kind.success) {
    throw new AppError("invalid_input", "Say what the file is.", {
      kind: ["Choose what the file is: front, side or rear photo, or the dyno sheet"],
    });
  }
  if (!(form.file instanceof File)) {
    throw new AppError("invalid_input", "No file in the form.", { file: ["Attach the file"] });
  }
  return { kind: kind.data, file: form.file };
}
