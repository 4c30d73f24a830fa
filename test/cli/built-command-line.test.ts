/**
 * The `chancewise` entry point runs the command line built into dist-cli/ and never a build
 * older than its sources: it builds when there is no build, runs the build as it is while
 * nothing changed, builds again when a source changed, and says so in one line when it cannot.
 * Checked on a copy of the real entry point and build scripts over a two-file command line
 * in a temporary project, so the repository's own build is not touched.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { cpSync, mkdirSync, mkdtempSync, readFileSync, symlinkSync, utimesSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { ROOT } from './support.ts';

const project = mkdtempSync(join(tmpdir(), 'chancewise-built-cli-'));
for (const folder of ['bin', 'scripts']) cpSync(join(ROOT, folder), join(project, folder), { recursive: true });
symlinkSync(join(ROOT, 'node_modules'), join(project, 'node_modules'), 'dir');
mkdirSync(join(project, 'src', 'cli'), { recursive: true });
writeFileSync(
  join(project, 'src', 'cli', 'main.ts'),
  [
    "import { WORD } from './word.ts';",
    'export async function main(args: readonly string[], io: { stdout: (text: string) => void }): Promise<number> {',
    "  io.stdout(`${WORD} ${args.join(' ')}\\n`);",
    '  return args.length;',
    '}',
    '',
  ].join('\n'),
);

/** Write the word module and date it `secondsAhead` from now (a later edit). */
function writeWord(word: string, secondsAhead = 0): void {
  const file = join(project, 'src', 'cli', 'word.ts');
  writeFileSync(file, `export const WORD: string = '${word}';\n`);
  const when = new Date(Date.now() + secondsAhead * 1000);
  utimesSync(file, when, when);
}

const runEntry = (...args: string[]) =>
  spawnSync(process.execPath, [join(project, 'bin', 'chancewise.mjs'), ...args], { encoding: 'utf8', timeout: 30_000 });
const buildStart = () =>
  (JSON.parse(readFileSync(join(project, 'dist-cli', 'cli', 'build-inputs.json'), 'utf8')) as { startedAt: number }).startedAt;

describe('the built command line', () => {
  it('is built on the first run, passes the arguments and exit status through, and is reused while nothing changed', () => {
    writeWord('first');
    const first = runEntry('a', 'b');
    expect(first).toMatchObject({ status: 2, stdout: 'first a b\n', stderr: '' });
    const built = buildStart();
    expect(runEntry()).toMatchObject({ status: 0, stdout: 'first \n' });
    expect(buildStart()).toBe(built);
  });

  it('is built again, before it runs, when a source is newer than the build', () => {
    writeWord('first');
    runEntry();
    const built = buildStart();
    writeWord('second', 2);
    expect(runEntry('x')).toMatchObject({ status: 1, stdout: 'second x\n', stderr: '' });
    expect(buildStart()).toBeGreaterThan(built);
  });

  it('says in one line, with exit 1, that it is out of date when it cannot be rebuilt, and runs nothing', () => {
    writeWord('first');
    runEntry();
    const file = join(project, 'src', 'cli', 'word.ts');
    writeFileSync(file, 'export const WORD: string = ;\n');
    const later = new Date(Date.now() + 4000);
    utimesSync(file, later, later);
    const result = runEntry();
    expect(result.status).toBe(1);
    expect(result.stdout).toBe('');
    expect(result.stderr).toMatch(
      /^chancewise: the built command line is out of date \(src\/cli\/word\.ts changed since it was built\) and could not be rebuilt: .+; run "npm run build:cli" to see why\.\n$/,
    );
  });

  it('for this repository, is built from src/cli/main.ts by the build script, and the record lists its sources', () => {
    const folder = mkdtempSync(join(tmpdir(), 'chancewise-repo-build-'));
    const script = `import { buildCli } from ${JSON.stringify(join(ROOT, 'scripts', 'build-cli.mjs'))};
      const layout = { root: ${JSON.stringify(ROOT)}, entry: ${JSON.stringify(join(ROOT, 'src', 'cli', 'main.ts'))},
        outFile: ${JSON.stringify(join(folder, 'cli', 'main.mjs'))}, stampFile: ${JSON.stringify(join(folder, 'cli', 'build-inputs.json'))} };
      await buildCli(layout);`;
    execFileSync(process.execPath, ['--input-type=module', '-e', script], { cwd: ROOT });
    const record = JSON.parse(readFileSync(join(folder, 'cli', 'build-inputs.json'), 'utf8')) as { inputs: string[] };
    for (const source of [
      'src/cli/main.ts',
      'src/cli/handout-command.ts',
      'src/render/svg/svg-text-document.ts',
      'package.json',
    ]) {
      expect(record.inputs).toContain(join(ROOT, source));
    }
    expect(record.inputs.some((input) => input.includes('node_modules'))).toBe(false);
    expect(readFileSync(join(folder, 'cli', 'main.mjs'), 'utf8')).not.toContain('jsdom');
  });
});
