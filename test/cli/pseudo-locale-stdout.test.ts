/**
 * Every word the command line prints comes from the `CliWords` it is given. Run with a pseudo
 * locale (every string and every function's result wrapped as ⟦…⟧; pseudo-localisation is
 * common practice for finding text that bypasses a catalogue), each output, once its wrapped
 * parts are removed, holds only what is not words: the demo topic's typed texts, numbers, the
 * labels NNTB and NNTH (Altman 1998, BMJ 317:1309), file paths, flags and symbols. JSON output
 * is data and is not checked here.
 */
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { main } from '../../src/cli/main.ts';
import { cliWordsEn } from '../../src/cli/messages/en.ts';
import { demoFiles } from '../../src/cli/topic-input.ts';
import { OVERLONG_SHAPE, shapedTopic, topicFileOf } from '../handout/topic-builder.ts';
import { HANDED_CODES, noting, pseudoLocale, stripPseudo } from '../support/pseudo-locale.ts';

const folder = mkdtempSync(join(tmpdir(), 'chancewise-pseudo-cli-'));
const chartPath = join(folder, 'chart.svg');
const handoutPath = join(folder, 'handout.pdf');

/** Every string in a JSON value. */
const stringsIn = (value: unknown): string[] => {
  if (typeof value === 'string') return [value];
  if (Array.isArray(value)) return value.flatMap(stringsIn);
  if (typeof value === 'object' && value !== null) return Object.values(value).flatMap(stringsIn);
  return [];
};

/** A topic too long for one page: its handout is refused, with the clinician told what to shorten. */
const longPath = join(folder, 'long.json');
const longTopic = shapedTopic(OVERLONG_SHAPE);
writeFileSync(longPath, topicFileOf(longTopic));

/** The typed texts of the demo topic (`--demo` is the first demo file) and the long one, longest first. */
const demoPath = demoFiles()[0] ?? '';
const typedTexts = [...stringsIn(JSON.parse(readFileSync(demoPath, 'utf8'))), ...stringsIn(longTopic)]
  .filter((text) => text.trim() !== '')
  .sort((a, b) => b.length - a.length);

/** The values code hands to wrapped words that are codes the words turn into words: the shared ones, and the handout's parts. */
const CODES = new Set([...HANDED_CODES, 'header', 'options', 'outcomes', 'evidence', 'screening', 'questions']);

/** What is left of an output once the pseudo text and everything allowed unwrapped is removed. */
function leftover(text: string): string[] {
  let rest = stripPseudo(text);
  for (const allowed of [chartPath, handoutPath, folder, demoPath, ...typedTexts]) rest = rest.split(allowed).join(' ');
  rest = rest
    .replace(/--[a-z][a-z-]*/g, ' ')
    .replace(/\bNNT[BH]?\b/g, ' ')
    .replace(/[0-9.,%\u00a0\u202f−+]/g, ' ')
    .replace(/[∞–—·():\-/]/g, ' ');
  return rest.split(/\s+/).filter((part) => part !== '');
}

interface PseudoRun {
  readonly code: number;
  readonly stdout: string;
  readonly stderr: string;
  readonly argumentsLeft: string[];
}

/** Run `chancewise ARGS` with the pseudo locale, keeping what leaked through the arguments of its words. */
async function runPseudo(args: readonly string[]): Promise<PseudoRun> {
  const argumentsLeft: string[] = [];
  const words = pseudoLocale(
    noting(cliWordsEn, (argument) => {
      if (!CODES.has(argument)) argumentsLeft.push(...leftover(argument));
    }),
  );
  let stdout = '';
  let stderr = '';
  const code = await main(
    args,
    {
      stdout: (text) => {
        stdout += text;
      },
      stderr: (text) => {
        stderr += text;
      },
    },
    words,
  );
  return { code, stdout, stderr, argumentsLeft };
}

const CASES: readonly {
  readonly name: string;
  readonly args: readonly string[];
  readonly code: number;
  /** Part of what it must print (inside the brackets) when the case is about one message. */
  readonly says?: string;
}[] = [
  {
    name: 'compute with effect flags',
    args: ['compute', '--baseline', '15%', '--hr', '0.8', '--ci', '0.6,1.1', '--over', '10', '--to', '5'],
    code: 0,
  },
  {
    name: 'compute with a wanted event',
    args: ['compute', '--baseline', '30%', '--rr', '1.5', '--ci', '1.1,2', '--wanted'],
    code: 0,
  },
  { name: 'compute --demo', args: ['compute', '--demo'], code: 0 },
  { name: 'compute --counts', args: ['compute', '--counts', '12/100,20/100'], code: 0 },
  { name: 'chart --demo --out', args: ['chart', '--demo', '--out', chartPath], code: 0 },
  { name: 'handout --demo --out', args: ['handout', '--demo', '--out', handoutPath, '--date', '2026-12-01'], code: 0 },
  {
    name: 'a handout that does not fit',
    args: ['handout', longPath, '--out', join(folder, 'long.pdf')],
    code: 2,
    says: 'The handout does not fit on one page',
  },
  { name: 'a usage error', args: ['compute', '--rr', '0.5'], code: 2 },
  { name: 'a problem the core words', args: ['compute', '--baseline', '150%', '--rr', '0.5'], code: 2 },
  { name: 'an unknown flag', args: ['chart', '--demo', '--colour', 'red'], code: 2 },
  { name: '--help', args: ['--help'], code: 0 },
];

describe('the command line in a pseudo locale', () => {
  it.each(CASES)('$name prints no word of its own', async ({ args, code, says }) => {
    const found = await runPseudo(args);
    expect(found.code).toBe(code);
    if (says !== undefined) expect(`${found.stdout}${found.stderr}`).toContain(says);
    // Something was printed, and through the words: the check below cannot pass on silence.
    expect(`${found.stdout}${found.stderr}`).toContain('⟦');
    expect({ stdout: leftover(found.stdout), stderr: leftover(found.stderr), arguments: found.argumentsLeft }).toEqual({
      stdout: [],
      stderr: [],
      arguments: [],
    });
  });

  it('finds a word printed around the words: the check itself can fail', () => {
    expect(leftover('⟦Risk: ⟦15%⟧⟧ Warnings: 12%')).toEqual(['Warnings']);
    expect(leftover(`${typedTexts[0] ?? ''} ⟦a ⟦nested⟧ text⟧ --rr 0.5 NNTB 4 (−1,5 – ∞)`)).toEqual([]);
  });
});
