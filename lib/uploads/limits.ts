// What uploads the product accepts. The limits are ours: a phone photo is a few
// MB, a scanned drawing set a few tens; anything far beyond is a mistake or an attack.

export const MB = 1024 * 1024;
export const PHOTO_MAX_BYTES = 25 * MB;
export const DRAWING_MAX_BYTES = 50 * MB;
/** Refuses decompression bombs before decoding: 100 megapixels is twice the largest phone sensor's default output. */
export const PHOTO_MAX_PIXELS = 100_000_000;
export const PHOTOS_PER_INSPECTION = 200;

export const PHOTO_TYPES = ["image/jpeg", "image/png", "image/webp"] as const;
export type TPhotoType = (typeof PHOTO_TYPES)[number];
export const DRAWING_TYPES = ["application/pdf", "image/png", "image/jpeg"] as const;
export type TDrawingType = (typeof DRAWING_TYPES)[number];

/** The longest side of the report variant and of the thumbnail, in pixels. */
export const REPORT_LONG_SIDE = 1600;
export const THUMB_LONG_SIDE = 320;
/** 60 report variants of this size fit in a report of 8 MB with room for its text and drawings. */
export const REPORT_TARGET_BYTES = 120_000;

export const formatBytes = (n: number) => (n >= MB ? `${(n / MB).toFixed(n >= 10 * MB ? 0 : 1)} MB` : n >= 1024 ? `${Math.round(n / 1024)} KB` : `${n} bytes`);
