/**
 * The web app manifest: our own name, colours and icons. Read by vite.config.ts at build time.
 * Colours: a deep slate blue-green chosen for contrast in sunlight, and a warm paper white.
 */
import type { ManifestOptions } from 'vite-plugin-pwa';

export const THEME_COLOUR = '#173f4a';
export const BACKGROUND_COLOUR = '#f6f3ec';

export const manifest: Partial<ManifestOptions> = {
  name: 'Ventwalk — ventilation survey',
  short_name: 'Ventwalk',
  description:
    'Walk a building room by room, record openings, occupants and CO2 readings offline, and get screening estimates of fresh-air supply with a findings report.',
  lang: 'en-GB',
  start_url: './',
  scope: './',
  display: 'standalone',
  orientation: 'any',
  theme_color: THEME_COLOUR,
  background_color: BACKGROUND_COLOUR,
  icons: [
    { src: 'icons/icon-192.png', sizes: '192x192', type: 'image/png', purpose: 'any' },
    { src: 'icons/icon-512.png', sizes: '512x512', type: 'image/png', purpose: 'any' },
    { src: 'icons/icon-maskable-512.png', sizes: '512x512', type: 'image/png', purpose: 'maskable' },
    { src: 'icons/icon.svg', sizes: 'any', type: 'image/svg+xml', purpose: 'any' },
  ],
};
