import "server-only";
import sharp from "sharp";
import { AppError } from "../errors";
import type { PhotoType } from "../tech/sniff-image-type";
import { MAX_INPUT_PIXELS, MAX_PHOTO_LONG_SIDE_PX } from "./car-file-limits";

/**
 * A picture made fit to store (sharp, libvips): turned upright by its EXIF orientation, reduced
 * to at most {@link MAX_PHOTO_LONG_SIDE_PX} on its long side (never enlarged), and written again
 * in its own format with no metadata (sharp keeps none unless asked: no GPS position, no camera
 * serial). A file whose first bytes say "picture" but that does not decode is refused in words.
 */
export async function reduceImage(
  bytes: Uint8Array,
  type: PhotoType,
): Promise<{ bytes: Uint8Array; widthPx: number; heightPx: number }> {
  try {
    let pipeline = sharp(bytes, { limitInputPixels: MAX_INPUT_PIXELS, failOn: "error" })
      .rotate()
      .resize({
        width: MAX_PHOTO_LONG_SIDE_PX,
        height: MAX_PHOTO_LONG_SIDE_PX,
        fit: "inside",
        withoutEnlargement: true,
      });
    pipeline =
      type === "image/jpeg"
        ? pipeline.jpeg({ quality: 85 })
        : type === "image/png"
          ? pipeline.png({ compressionLevel: 9 })
          : pipeline.webp({ quality: 85 });
    const { data, info } = await pipeline.toBuffer({ resolveWithObject: true });
    return { bytes: new Uint8Array(data), widthPx: info.width, heightPx: info.height };
  } catch {
    throw new AppError(
      "invalid_input",
      "This picture could not be read: the file looks like an image but is damaged or too large to open. Export it again as JPEG or PNG.",
      { file: ["Attach a picture that opens on your phone or computer"] },
    );
  }
}
