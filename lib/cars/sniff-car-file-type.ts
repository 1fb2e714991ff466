import { type PhotoType, sniffImageType } from "../tech/sniff-image-type";

/** What a car's file may be: a picture, or (for the dyno sheet) a PDF. */
export type CarFileType = PhotoType | "application/pdf";

/**
 * What a car's file really is, from its first bytes: a JPEG, PNG or WebP picture
 * (`sniffImageType`), or a PDF, which starts with "%PDF-" (ISO 32000-1:2008 §7.5.2, the file
 * header). Anything else — text, an executable ("MZ"), a ZIP — is null, whatever its name says.
 */
export function sniffCarFileType(bytes: Uint8Array): CarFileType | null {
  const image = sniffImageType(bytes);
  if (image) return image;
  const pdf = [0x25, 0x50, 0x44, 0x46, 0x2d]; // %PDF-
  if (bytes.length >= pdf.length && pdf.every((b, i) => bytes[i] === b)) return "application/pdf";
  return null;
}
