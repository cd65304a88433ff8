/**
 * `npm run icons`: renders static/icons/icon.svg to the PNG icons the manifest lists
 * (192, 512, maskable 512, apple-touch 180) and a 32 px favicon.ico, in headless Chromium.
 * Run it after changing the SVG and commit the results; a test checks their sizes.
 */
import { writeFileSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { launchBrowser } from './browser.ts';

const iconsDir = fileURLToPath(new URL('../../static/icons/', import.meta.url));
const staticDir = fileURLToPath(new URL('../../static/', import.meta.url));
const svg = readFileSync(`${iconsDir}icon.svg`, 'utf8');

/** The maskable icon keeps its mark inside the central safe circle (80 % of the width). */
function page(size: number, maskable: boolean): string {
  const inner = maskable
    ? `<div style="width:${size}px;height:${size}px;background:#173f4a;display:grid;place-items:center">
         <img src="data:image/svg+xml;base64,${Buffer.from(svg).toString('base64')}" style="width:${size * 0.72}px;height:${size * 0.72}px">
       </div>`
    : `<img src="data:image/svg+xml;base64,${Buffer.from(svg).toString('base64')}" style="width:${size}px;height:${size}px;display:block">`;
  return `<html><body style="margin:0;background:transparent">${inner}</body></html>`;
}

/** A .ico file holding one PNG image (the format allows PNG payloads since Windows Vista). */
function icoFromPng(png: Buffer, size: number): Buffer {
  const header = Buffer.alloc(6);
  header.writeUInt16LE(0, 0);
  header.writeUInt16LE(1, 2);
  header.writeUInt16LE(1, 4);
  const entry = Buffer.alloc(16);
  entry.writeUInt8(size, 0);
  entry.writeUInt8(size, 1);
  entry.writeUInt16LE(1, 4);
  entry.writeUInt16LE(32, 6);
  entry.writeUInt32LE(png.length, 8);
  entry.writeUInt32LE(22, 12);
  return Buffer.concat([header, entry, png]);
}

const browser = await launchBrowser();
if (!browser) throw new Error('No Chromium found: set CHROME_PATH or apt-get install chromium');
try {
  const targets: Array<[string, number, boolean]> = [
    [`${iconsDir}icon-192.png`, 192, false],
    [`${iconsDir}icon-512.png`, 512, false],
    [`${iconsDir}icon-maskable-512.png`, 512, true],
    [`${iconsDir}apple-touch-icon.png`, 180, true],
  ];
  for (const [path, size, maskable] of targets) {
    const p = await browser.newPage({ viewport: { width: size, height: size }, deviceScaleFactor: 1 });
    await p.setContent(page(size, maskable));
    writeFileSync(path, await p.screenshot({ omitBackground: !maskable, clip: { x: 0, y: 0, width: size, height: size } }));
    await p.close();
  }
  const p = await browser.newPage({ viewport: { width: 32, height: 32 }, deviceScaleFactor: 1 });
  await p.setContent(page(32, false));
  const png = await p.screenshot({ omitBackground: true, clip: { x: 0, y: 0, width: 32, height: 32 } });
  writeFileSync(`${staticDir}favicon.ico`, icoFromPng(png, 32));
  console.log('icons written');
} finally {
  await browser.close();
}
