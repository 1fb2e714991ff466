import { MAX_PHOTO_BYTES } from "@/lib/tech/upload-schema";

/**
 * Why a picked file cannot be a photo, judged before anything is stored: it must say it is an
 * image (image/*) and be neither empty nor larger than the server takes. Whether it really is a
 * picture is settled next by decoding it (preparePhoto) and on the server by its bytes.
 */
export function photoTypeProblem(file: {
  type: string;
  size: number;
  name?: string;
}): string | null {
  const name = file.name ? `"${file.name}"` : "That file";
  if (!file.type.startsWith("image/")) {
    return `${name} is not a picture. Take a photo, or pick a JPEG, PNG or WebP image.`;
  }
  if (file.size === 0) return `${name} is empty. Take the photo again.`;
  if (file.size > MAX_PHOTO_BYTES) {
    return `${name} is larger than ${MAX_PHOTO_BYTES / 1024 / 1024} MB. Take the photo again.`;
  }
  return null;
}
