import { defineConfig } from 'vite';
import type { Plugin } from 'vite';
import { svelte } from '@sveltejs/vite-plugin-svelte';
import { metaContentSecurityPolicy } from './src/shared/content-security-policy.ts';

/** Puts the app's policy into the built page too, for shells that load it from files. */
function policyMetaTag(): Plugin {
  return {
    name: 'chancewise-policy-meta',
    apply: 'build',
    transformIndexHtml: () => [
      {
        tag: 'meta',
        attrs: { 'http-equiv': 'Content-Security-Policy', content: metaContentSecurityPolicy() },
        injectTo: 'head-prepend',
      },
    ],
  };
}

export default defineConfig({
  plugins: [svelte(), policyMetaTag()],
  // Relative asset addresses, so the same build loads over http and from files.
  base: './',
  build: {
    outDir: 'dist',
    emptyOutDir: true,
    target: 'es2022',
    // Never inline fonts or images as data addresses, and no inline preload helper.
    assetsInlineLimit: 0,
    modulePreload: { polyfill: false },
    reportCompressedSize: false,
    // The timing report is for tuning plugins; `npm run web` builds quietly.
    rolldownOptions: { checks: { bundlerTimings: false } },
  },
  server: { host: '127.0.0.1', strictPort: true },
});
