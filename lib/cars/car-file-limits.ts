/** The largest file a car may be given (a photo before it is reduced, or a dyno sheet). */
export const MAX_CAR_FILE_BYTES = 10 * 1024 * 1024;

/** Photos are stored no longer than this on their long side, in pixels. */
export const MAX_PHOTO_LONG_SIDE_PX = 1600;

/** Sharp refuses to decode a picture with more pixels than this (a decompression bomb guard):
 *  a 100-megapixel camera's frame is 100 million. */
export const MAX_INPUT_PIXELS = 120_000_000;

/** The kinds of file a car has, and what each is for, in words. */
export const CAR_FILE_KINDS = {
  front: "Front photo",
  side: "Side photo",
  rear: "Rear photo (wing visible)",
  "dyno-sheet": "Dyno sheet",
} as const;

export type CarFileKind = keyof typeof CAR_FILE_KINDS;
