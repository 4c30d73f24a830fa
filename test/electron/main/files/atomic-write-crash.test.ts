// @vitest-environment node
import { spawn } from 'node:child_process';
import fs from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { build } from 'vite';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

const source = fileURLToPath(new URL('./fixtures/save-loop.ts', import.meta.url));
const ITERATIONS = 50;
const AT_ONCE = 5;

let base: string;
let child: string;

beforeAll(async () => {
  base = await fs.mkdtemp(path.join(os.tmpdir(), 'chancewise-crash-'));
  // Bundled once into plain JavaScript, so each of the 50 child processes starts in milliseconds.
  await build({
    configFile: false,
    logLevel: 'silent',
    publicDir: false,
    build: {
      ssr: source,
      outDir: path.join(base, 'child'),
      target: 'node20',
      minify: false,
      rollupOptions: { output: { format: 'es', entryFileNames: 'save-loop.mjs' } },
    },
  });
  child = path.join(base, 'child', 'save-loop.mjs');
}, 20_000);

afterAll(async () => {
  await fs.rm(base, { recursive: true, force: true });
});

/** Whether a file's text is one complete version written by the child (or the first one). */
function completeVersion(text: string): number | null {
  try {
    const data = JSON.parse(text) as { format?: unknown; generation?: unknown; payload?: unknown };
    if (data.format !== 'crash-test' || typeof data.generation !== 'number' || typeof data.payload !== 'string') return null;
    const letter = String.fromCharCode(97 + (data.generation % 26));
    if (data.payload.length !== 64 * 1024 || data.payload !== letter.repeat(64 * 1024)) return null;
    return data.generation;
  } catch {
    return null;
  }
}

/** A pseudo-random delay from a seed (Park and Miller 1988, "minimal standard" generator). */
function delayFor(seed: number): number {
  return ((seed * 16_807) % 2_147_483_647) % 40;
}

async function runOnce(index: number): Promise<{ generation: number; backup: number | null; leftovers: number }> {
  const folder = path.join(base, `run-${index}`);
  await fs.mkdir(folder);
  const target = path.join(folder, 'topic.cwtopic');
  await fs.writeFile(target, `${JSON.stringify({ format: 'crash-test', generation: 0, payload: 'a'.repeat(64 * 1024) })}\n`);

  const process_ = spawn(process.execPath, [child, target], { stdio: ['ignore', 'pipe', 'pipe'] });
  let errors = '';
  process_.stderr.on('data', (chunk: Buffer) => {
    errors += chunk.toString();
  });
  await new Promise<void>((resolve, reject) => {
    process_.stdout.once('data', () => {
      resolve();
    });
    process_.once('exit', (code) => {
      reject(new Error(`child ended early (${code}): ${errors}`));
    });
  });
  process_.removeAllListeners('exit');
  const exited = new Promise<NodeJS.Signals | null>((resolve) => process_.once('exit', (_code, signal) => resolve(signal)));
  await new Promise((resolve) => setTimeout(resolve, delayFor(index + 1)));
  process_.kill('SIGKILL');
  expect(await exited).toBe('SIGKILL');

  const generation = completeVersion(await fs.readFile(target, 'utf8'));
  if (generation === null) throw new Error(`run ${index}: the file is torn`);
  let backup: number | null = null;
  try {
    backup = completeVersion(await fs.readFile(`${target}.bak`, 'utf8'));
    if (backup === null) throw new Error(`run ${index}: the backup is torn`);
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code !== 'ENOENT') throw error;
  }
  const leftovers = (await fs.readdir(folder)).filter((name) => name.endsWith('.tmp')).length;
  return { generation, backup, leftovers };
}

describe('saveWithBackup() under SIGKILL', () => {
  it(
    'leaves the file and its backup whole and readable however often the saving process is killed',
    async () => {
      const results: { generation: number; backup: number | null; leftovers: number }[] = [];
      for (let start = 0; start < ITERATIONS; start += AT_ONCE) {
        const batch = Array.from({ length: Math.min(AT_ONCE, ITERATIONS - start) }, (_, offset) => runOnce(start + offset));
        results.push(...(await Promise.all(batch)));
      }
      expect(results).toHaveLength(ITERATIONS);
      for (const result of results) {
        // The backup always holds the version before the file's (or the file's own, when the kill came
        // between the two writes of a save).
        if (result.backup !== null) expect(result.generation - result.backup).toBeGreaterThanOrEqual(0);
        if (result.backup !== null) expect(result.generation - result.backup).toBeLessThanOrEqual(1);
      }
      // The kills must land while saving is going on, or the test proves nothing: some runs got past
      // their first save, and some were killed with a temporary file in flight.
      expect(results.some((result) => result.generation > 0)).toBe(true);
      expect(results.some((result) => result.leftovers > 0)).toBe(true);
    },
    // About 6 s on an idle two-core machine; the limit leaves room for a machine busy with other suites.
    60_000,
  );
});
