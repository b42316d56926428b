export { MAX_IMAGE_BYTES, MAX_IMAGE_PIXELS, THUMBNAIL_SIDE } from './limits';
export { sniffImage, type ImageHeader, type ImageType, type SniffResult } from './sniff';
export { checkImageUpload } from './check-upload';
export { decodeImage, type RgbaImage } from './decode';
export { downscale } from './downscale';
export { makeThumbnail, type Thumbnail } from './thumbnail';
