/**
 * The photo downscaler on a real canvas in Chromium: a camera-sized JPEG carrying EXIF with a
 * GPS position and a "rotate 90°" orientation comes out upright, 1600 px on its long edge, as
 * a JPEG with no EXIF at all. The input is made here: a canvas JPEG with an EXIF APP1 segment
 * written by hand (EXIF 2.32 / TIFF 6.0 layout: big-endian IFD0 with Orientation and a pointer
 * to a GPS IFD holding GPSLatitudeRef and GPSLatitude).
 */
import { describe, it, expect, beforeAll, afterAll, inject } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { openPhone } from '../support/browser.ts';
import { pageBundle } from '../support/page-bundle.ts';

const baseURL = inject('baseURL');

/** An EXIF APP1 segment: Orientation 6 (rotate 90° clockwise) and latitude N 51° 30′ 26″. */
function exifWithGps(): number[] {
  const tiff: number[] = [];
  const u16 = (n: number) => tiff.push((n >> 8) & 255, n & 255);
  const u32 = (n: number) => tiff.push((n >>> 24) & 255, (n >> 16) & 255, (n >> 8) & 255, n & 255);
  tiff.push(0x4d, 0x4d); // "MM": big-endian
  u16(42);
  u32(8); // IFD0 at 8
  u16(2); // two entries
  u16(0x0112), u16(3), u32(1), u16(6), u16(0); // Orientation SHORT = 6
  const gpsIfd = 8 + 2 + 2 * 12 + 4;
  u16(0x8825), u16(4), u32(1), u32(gpsIfd); // GPS IFD pointer
  u32(0); // no next IFD
  const gpsData = gpsIfd + 2 + 2 * 12 + 4;
  u16(2); // two GPS entries
  u16(0x0001), u16(2), u32(2), tiff.push(0x4e, 0, 0, 0); // GPSLatitudeRef "N"
  u16(0x0002), u16(5), u32(3), u32(gpsData); // GPSLatitude, 3 rationals
  u32(0);
  for (const [num, den] of [[51, 1], [30, 1], [26, 1]]) u32(num!), u32(den!);
  const body = [0x45, 0x78, 0x69, 0x66, 0, 0, ...tiff]; // "Exif\0\0"
  const length = body.length + 2;
  return [0xff, 0xe1, (length >> 8) & 255, length & 255, ...body];
}

/** Marker bytes of the segments before the image data (stops at start of scan). */
function segments(bytes: number[]): number[] {
  expect([bytes[0], bytes[1]]).toEqual([0xff, 0xd8]);
  const markers: number[] = [];
  let at = 2;
  while (at < bytes.length) {
    expect(bytes[at]).toBe(0xff);
    const marker = bytes[at + 1]!;
    markers.push(marker);
    if (marker === 0xda) break;
    at += 2 + ((bytes[at + 2]! << 8) | bytes[at + 3]!);
  }
  return markers;
}

describe.skipIf(!baseURL)('photo downscaling in Chromium', () => {
  let context: BrowserContext;
  let page: Page;
  let close: () => Promise<void>;

  beforeAll(async () => {
    ({ context, close } = await openPhone());
    page = context.pages()[0] ?? (await context.newPage());
    await page.goto(baseURL);
    await page.addScriptTag({ content: await pageBundle('src/app/downscale-photo.ts', 'VentwalkPhotos') });
  });

  afterAll(async () => {
    await close?.();
  });

  it('turns a 3000 × 2000 camera JPEG with GPS into an upright 1067 × 1600 JPEG with no EXIF', async () => {
    const result = await page.evaluate(async (app1) => {
      const canvas = document.createElement('canvas');
      canvas.width = 3000;
      canvas.height = 2000;
      const ctx = canvas.getContext('2d')!;
      ctx.fillStyle = '#7a9';
      ctx.fillRect(0, 0, 3000, 2000);
      ctx.fillStyle = '#a33';
      ctx.fillRect(0, 0, 600, 400); // a mark in the top-left corner, to see the rotation
      const plain = new Uint8Array(await (await new Promise<Blob>((r) => canvas.toBlob((b) => r(b!), 'image/jpeg', 0.9))).arrayBuffer());
      const camera = new Uint8Array([...plain.slice(0, 2), ...app1, ...plain.slice(2)]);
      const photos = (window as unknown as { VentwalkPhotos: typeof import('../../src/app/downscale-photo.ts') }).VentwalkPhotos;
      const out = await photos.downscalePhoto(new Blob([camera], { type: 'image/jpeg' }));
      const check = new Image();
      check.src = URL.createObjectURL(new Blob([out.bytes], { type: 'image/jpeg' }));
      await check.decode();
      const probe = document.createElement('canvas');
      probe.width = out.width;
      probe.height = out.height;
      const pctx = probe.getContext('2d')!;
      pctx.drawImage(check, 0, 0);
      // Orientation 6 puts the original top-left corner at the top right.
      const topRight = [...pctx.getImageData(out.width - 20, 20, 1, 1).data.slice(0, 3)];
      return { input: [...camera], output: [...new Uint8Array(out.bytes)], width: out.width, height: out.height, decoded: [check.naturalWidth, check.naturalHeight], topRight };
    }, exifWithGps());

    expect(segments(result.input)).toContain(0xe1); // the input does carry EXIF
    expect([result.width, result.height]).toEqual([1067, 1600]);
    expect(result.decoded).toEqual([1067, 1600]);
    expect(result.topRight[0]!).toBeGreaterThan(140); // red mark: upright
    expect(segments(result.output)).not.toContain(0xe1); // no APP1: no EXIF, no GPS
    const text = String.fromCharCode(...result.output.slice(0, 2000));
    expect(text).not.toContain('Exif');
    expect(result.output.length).toBeLessThan(600_000);
  });

  it('never enlarges a small photo', async () => {
    const size = await page.evaluate(async () => {
      const canvas = document.createElement('canvas');
      canvas.width = 800;
      canvas.height = 600;
      canvas.getContext('2d')!.fillRect(0, 0, 800, 600);
      const blob = await new Promise<Blob>((r) => canvas.toBlob((b) => r(b!), 'image/jpeg'));
      const photos = (window as unknown as { VentwalkPhotos: typeof import('../../src/app/downscale-photo.ts') }).VentwalkPhotos;
      const out = await photos.downscalePhoto(blob);
      return [out.width, out.height];
    });
    expect(size).toEqual([800, 600]);
  });

  it('says plainly when a file is not a readable image', async () => {
    const message = await page.evaluate(async () => {
      const photos = (window as unknown as { VentwalkPhotos: typeof import('../../src/app/downscale-photo.ts') }).VentwalkPhotos;
      return photos.downscalePhoto(new Blob(['not an image'], { type: 'image/heic' })).then(
        () => 'no error',
        (e: Error) => e.message,
      );
    });
    expect(message).toMatch(/could not be read.*Take it again, or choose a JPEG/);
  });
});
