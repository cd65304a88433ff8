/// <reference types="svelte" />
/// <reference types="vite/client" />
/// <reference types="vite-plugin-pwa/client" />

/** The app's version from package.json, set at build time. */
declare const __APP_VERSION__: string;
