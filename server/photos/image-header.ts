import { imageSize } from 'image-size';

export interface PixelSize {
  width: number;
  height: number;
}

/**
 * Width and height as the file's header states them (PNG IHDR, JPEG SOF, WebP VP8/VP8L/VP8X),
 * read without decoding a pixel; null when the header cannot be read.
 */
export function headerPixelSize(bytes: Buffer): PixelSize | null {
  try {
    const { width, height } = imageSize(bytes);
    return width > 0 && height > 0 ? { width, height } : null;
  } catch {
    return null;
  }
}
