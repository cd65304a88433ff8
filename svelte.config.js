// Svelte compiler options. vite.config.ts points the Svelte plugin here explicitly,
// because the Vite root is src/ and the plugin would otherwise look there.
/** @type {import('@sveltejs/vite-plugin-svelte').SvelteConfig} */
export default {
  compilerOptions: {
    runes: true,
  },
};
