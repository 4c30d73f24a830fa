/**
 * Build of the people-chart check page (browser tests and the chart benchmark), kept
 * apart from the app's build: `vite build -c e2e/chart-page/vite.config.ts` writes
 * e2e/chart-page/dist. The page carries the app's security policy as a meta tag.
 */
import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vite';
import type { Plugin } from 'vite';
import { metaContentSecurityPolicy } from '../../src/shared/content-security-policy.ts';

const here = fileURLToPath(new URL('.', import.meta.url));

/** The app's policy as the first element of the page's head. */
function policyMetaTag(): Plugin {
  return {
    name: 'chart-page-policy-meta',
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
  root: here,
  base: './',
  publicDir: false,
  plugins: [policyMetaTag()],
  logLevel: 'warn',
  build: {
    outDir: 'dist',
    emptyOutDir: true,
    target: 'es2022',
    assetsInlineLimit: 0,
    modulePreload: { polyfill: false },
    reportCompressedSize: false,
    // CHART_PAGE_MINIFY=off keeps function names readable in a browser profile.
    minify: process.env['CHART_PAGE_MINIFY'] !== 'off',
  },
});
