/**
 * The app as the benchmark opens it: the production build (`vite.config.ts`), except that
 * the examples module is replaced by `bench-topics.ts`, so the app starts on the bench's
 * own fixture (bench/fixtures/) instead of the first example, whose numbers change. The
 * production build gains nothing: the swap lives only in this file.
 * `vite build -c bench/app-page/vite.config.ts` writes bench/app-page/dist.
 */
import { fileURLToPath } from 'node:url';
import { mergeConfig } from 'vite';
import type { Plugin } from 'vite';
import appConfig from '../../vite.config.ts';

const examples = fileURLToPath(new URL('../../src/ui/state/demo-topics.ts', import.meta.url));
const benchTopics = fileURLToPath(new URL('./bench-topics.ts', import.meta.url));

/** Resolve the examples module to the bench's stand-in. */
function benchTopic(): Plugin {
  return {
    name: 'chancewise-bench-topic',
    enforce: 'pre',
    async resolveId(source, importer, options) {
      if (importer === benchTopics) return null;
      const resolved = await this.resolve(source, importer, { ...options, skipSelf: true });
      return resolved?.id === examples ? benchTopics : null;
    },
  };
}

export default mergeConfig(appConfig, {
  plugins: [benchTopic()],
  logLevel: 'warn',
  build: { outDir: fileURLToPath(new URL('./dist', import.meta.url)) },
});
