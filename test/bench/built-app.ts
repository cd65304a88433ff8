/**
 * The built app served for browser benchmarks: a production build into dist/ (the same build the
 * browser tests make), served with Vite's preview on 127.0.0.1 at the first free port from 4181.
 */
import { fileURLToPath } from 'node:url';
import { build, preview } from 'vite';

const configFile = fileURLToPath(new URL('../../vite.config.ts', import.meta.url));

export async function serveBuiltApp(): Promise<{ url: string; close: () => Promise<void> }> {
  process.env.NODE_ENV = 'production';
  await build({ configFile, mode: 'production', logLevel: 'warn' });
  const server = await preview({ configFile, logLevel: 'warn', preview: { port: 4181, strictPort: false } });
  const url = server.resolvedUrls?.local[0];
  if (!url) throw new Error('The preview server did not report an address');
  return { url, close: () => server.close() };
}
