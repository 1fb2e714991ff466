import { photoTypeProblem } from "./photo-type-problem";

/** A photo ready for the outbox, or why the file cannot be one. */
export type PreparedPhoto = { ok: true; blob: Blob } | { ok: false; message: string };

/**
 * Check a picked file is a picture this device can open, then scale it down to at most
 * `maxSide` pixels as JPEG so the outbox stays small. A file that only claims to be an image
 * (a text file named .png) fails to decode and is refused here, before it is stored.
 */
export async function preparePhoto(file: File, maxSide = 1600): Promise<PreparedPhoto> {
  const problem = photoTypeProblem(file);
  if (problem !== null) return { ok: false, message: problem };
  let bitmap: ImageBitmap;
  try {
    bitmap = await createImageBitmap(file);
  } catch {
    return {
      ok: false,
      message: `"${file.name}" cannot be opened as a picture. Take the photo again, or pick a JPEG, PNG or WebP image.`,
    };
  }
  const scale = Math.min(1, maxSide / Math.max(bitmap.width, bitmap.height));
  const canvas = document.createElement("canvas");
  canvas.width = Math.max(1, Math.round(bitmap.width * scale));
  canvas.height = Math.max(1, Math.round(bitmap.height * scale));
  canvas.getContext("2d")?.drawImage(bitmap, 0, 0, canvas.width, canvas.height);
  bitmap.close();
  const blob = await new Promise<Blob | null>((resolve) =>
    canvas.toBlob(resolve, "image/jpeg", 0.82),
  );
  // Decoded but not re-encoded (rare): the original goes; the server checks its bytes too.
  return { ok: true, blob: blob ?? file };
}
