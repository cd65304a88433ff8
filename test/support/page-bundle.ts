/**
 * Bundle a module of ours into one script for a browser page, exposed as a global. Browser
 * tests and Chromium benchmarks use it to run our real code (the store on the page's real
 * IndexedDB, the photo downscaler on a real canvas) without a test hook in the app itself:
 *
 *     await page.addScriptTag({ content: await pageBundle('src/app/downscale-photo.ts', 'Photos') });
 *     await page.evaluate(() => (window as any).Photos.downscalePhoto(...));
 *
 * Built with Vite (library mode, IIFE, not minified, nothing written to disk).
 */
import { fileURLToPath } from 'node:url';
import { build, type Rolldown } from 'vite';

const root = fileURLToPath(new URL('../../', import.meta.url));

export async function pageBundle(entry: string, globalName: string): Promise<string> {
  const result = await build({
    configFile: false,
    root,
    logLevel: 'silent',
    define: { __APP_VERSION__: JSON.stringify('bench') },
    build: {
      write: false,
      minify: false,
      emptyOutDir: false,
      lib: { entry: fileURLToPath(new URL(entry, `file://${root}`)), formats: ['iife'], name: globalName },
    },
  });
  const outputs = (Array.isArray(result) ? result : [result]) as Rolldown.RolldownOutput[];
  const chunk = outputs[0]!.output.find((o) => o.type === 'chunk');
  if (!chunk || chunk.type !== 'chunk') throw new Error(`No script built for ${entry}`);
  return chunk.code;
}
