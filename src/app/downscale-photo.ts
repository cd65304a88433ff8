/**
 * A photo ready to store: decoded, turned upright, drawn into a canvas no larger than 1600 px on
 * its long edge and re-encoded as JPEG. Re-encoding through a canvas keeps only pixels, so the
 * camera's EXIF data — GPS position, time, device — is dropped (privacy: tenants' homes, pupils'
 * rooms). The canvas is emptied afterwards, because iOS frees canvas memory late.
 *
 * Browser only (needs a canvas); run it before opening any storage transaction.
 * Example: a 4000 × 3000 camera JPEG becomes a 1600 × 1200 JPEG of a few hundred kB.
 */

/** Longest edge of a stored photo, px. */
export const LONG_EDGE_PX = 1600;
/** JPEG quality for stored photos (0-1). */
export const JPEG_QUALITY = 0.8;

export interface DownscaledPhoto {
  bytes: ArrayBuffer;
  width: number;
  height: number;
}

/** The size that fits within LONG_EDGE_PX, never enlarging. Example: 4000 × 3000 → 1600 × 1200. */
export function fittedSize(width: number, height: number, longEdge = LONG_EDGE_PX): { width: number; height: number } {
  const scale = Math.min(1, longEdge / Math.max(width, height));
  return { width: Math.max(1, Math.round(width * scale)), height: Math.max(1, Math.round(height * scale)) };
}

async function decode(file: Blob): Promise<HTMLImageElement> {
  const url = URL.createObjectURL(file);
  const image = new Image();
  image.src = url;
  try {
    await image.decode();
    return image;
  } catch {
    throw new Error('This photo could not be read (its format may not be supported here). Take it again, or choose a JPEG.');
  } finally {
    URL.revokeObjectURL(url);
  }
}

export async function downscalePhoto(file: Blob): Promise<DownscaledPhoto> {
  // Browsers draw an <img> the right way up from its EXIF orientation.
  const image = await decode(file);
  const { width, height } = fittedSize(image.naturalWidth, image.naturalHeight);
  const canvas = document.createElement('canvas');
  canvas.width = width;
  canvas.height = height;
  try {
    const context = canvas.getContext('2d');
    if (!context) throw new Error('This device could not prepare the photo (no drawing surface). Try again.');
    context.drawImage(image, 0, 0, width, height);
    const jpeg = await new Promise<Blob | null>((resolve) => canvas.toBlob(resolve, 'image/jpeg', JPEG_QUALITY));
    if (!jpeg) throw new Error('This device could not prepare the photo. Try again.');
    return { bytes: await jpeg.arrayBuffer(), width, height };
  } finally {
    canvas.width = 0;
    canvas.height = 0;
  }
}
