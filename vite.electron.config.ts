import { builtinModules } from 'node:module';
import { defineConfig } from 'vite';

/**
 * Build of the desktop shell: the main process and the preload, each into ONE CommonJS file
 * in dist-electron/ (`vite build -c vite.electron.config.ts --mode main`, then
 * `--mode preload`). Two builds, not two inputs of one build, so no chunk is ever shared:
 * a sandboxed preload cannot load a second file. `electron` and Node's own modules stay
 * external; everything else (the core's topic reader, valibot) is bundled in.
 */
const entries = {
  main: 'electron/main/main.ts',
  preload: 'electron/preload/preload.ts',
} as const;

const external = ['electron', /^electron\/.+/u, /^node:/u, ...builtinModules];

export default defineConfig(({ mode }) => {
  const entry = mode === 'preload' ? 'preload' : 'main';
  return {
    publicDir: false,
    logLevel: 'warn',
    ssr: { noExternal: true, target: 'node' },
    build: {
      outDir: 'dist-electron',
      emptyOutDir: entry === 'main',
      ssr: entries[entry],
      target: 'node22',
      minify: false,
      sourcemap: false,
      reportCompressedSize: false,
      rollupOptions: {
        external,
        output: {
          format: 'cjs',
          entryFileNames: `${entry}.cjs`,
          codeSplitting: false,
        },
      },
    },
  };
});
