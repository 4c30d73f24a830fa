import { execFile } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { main } from '../../src/cli/main.ts';

/** What one run of the command line produced. */
export interface Run {
  readonly code: number;
  readonly stdout: string;
  readonly stderr: string;
}

/** The repository root, for running the real entry point and naming demo files. */
export const ROOT = fileURLToPath(new URL('../../', import.meta.url));

/** Run `chancewise ARGS` in this process, collecting what it writes. */
export async function run(args: readonly string[]): Promise<Run> {
  let stdout = '';
  let stderr = '';
  const code = await main(args, {
    stdout: (text) => {
      stdout += text;
    },
    stderr: (text) => {
      stderr += text;
    },
  });
  return { code, stdout, stderr };
}

/** Run `compute ARGS --json` in this process and parse its one JSON object. */
export async function computeJson(args: readonly string[]): Promise<Record<string, unknown>> {
  const found = await run(['compute', ...args, '--json']);
  if (found.code !== 0) throw new Error(`exit ${found.code}: ${found.stderr}`);
  return JSON.parse(found.stdout) as Record<string, unknown>;
}

/** Run `node bin/chancewise.mjs ARGS` as a child process, as a user would from a shell. */
export function runProcess(args: readonly string[]): Promise<Run> {
  return new Promise((resolve, reject) => {
    execFile(
      process.execPath,
      ['bin/chancewise.mjs', ...args],
      { cwd: ROOT, timeout: 30_000, encoding: 'utf8' },
      (error, stdout, stderr) => {
        if (error !== null && typeof error.code !== 'number') {
          reject(error);
          return;
        }
        resolve({ code: error === null ? 0 : Number(error.code), stdout, stderr });
      },
    );
  });
}

/** An estimate as the JSON output holds it. */
export interface EstimateJson {
  readonly estimate: number;
  readonly lower: number | null;
  readonly upper: number | null;
}

/** Read a field of a parsed JSON object as an estimate (or null). */
export function estimateOf(json: Record<string, unknown>, key: string): EstimateJson | null {
  return json[key] as EstimateJson | null;
}

/** Every number anywhere inside a JSON value. */
export function numbersIn(value: unknown): number[] {
  if (typeof value === 'number') return [value];
  if (Array.isArray(value)) return value.flatMap(numbersIn);
  if (typeof value === 'object' && value !== null) return Object.values(value).flatMap(numbersIn);
  return [];
}

/** Every object with `estimate`, `lower` and `upper` anywhere inside a JSON value. */
export function estimatesIn(value: unknown): EstimateJson[] {
  if (Array.isArray(value)) return value.flatMap(estimatesIn);
  if (typeof value !== 'object' || value === null) return [];
  const record = value as Record<string, unknown>;
  const own = 'estimate' in record && 'lower' in record && 'upper' in record ? [record as unknown as EstimateJson] : [];
  return [...own, ...Object.values(record).flatMap(estimatesIn)];
}
