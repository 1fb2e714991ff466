/** The picture formats the tech line stores, as MIME types. */
export type PhotoType = "image/jpeg" | "image/png" | "image/webp";

const PNG_SIGNATURE = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];
const ascii = (bytes: Uint8Array, at: number, text: string) =>
  [...text].every((ch, i) => bytes[at + i] === ch.charCodeAt(0));

/**
 * What a file really is, from its first bytes (its "magic number"), whatever its name or stated
 * type says: JPEG starts with the SOI marker FF D8 followed by another marker (FF), PNG with its
 * 8-byte signature, WebP with a RIFF header whose form type is "WEBP". Anything else is null.
 */
export function sniffImageType(bytes: Uint8Array): PhotoType | null {
  if (bytes.length >= 4 && bytes[0] === 0xff && bytes[1] === 0xd8 && bytes[2] === 0xff) {
    return "image/jpeg";
  }
  if (bytes.length >= 8 && PNG_SIGNATURE.every((b, i) => bytes[i] === b)) return "image/png";
  if (bytes.length >= 12 && ascii(bytes, 0, "RIFF") && ascii(bytes, 8, "WEBP")) return "image/webp";
  return null;
}
