/** Upload limits for inspection photos and other image attachments. */
export const MAX_IMAGE_BYTES = 10 * 1024 * 1024;
/** Larger images are refused so decoding one for its thumbnail cannot exhaust memory. */
export const MAX_IMAGE_PIXELS = 60_000_000;
/** Longest side of a thumbnail, in pixels. */
export const THUMBNAIL_SIDE = 320;
