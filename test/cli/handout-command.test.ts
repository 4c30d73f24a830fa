import { execFileSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { buildHandout } from '../../src/handout/build-handout.ts';
import { loadHandoutFonts } from '../../src/handout/node-fonts.ts';
import { demos, firstDemo } from '../handout/support.ts';
import { OVERLONG_SHAPE, type TopicShape, shapedTopic, topicFileOf } from '../handout/topic-builder.ts';
import { ROOT, run, runProcess } from './support.ts';

/** A topic file (format version 2) of the given shape. */
const shapedTopicFile = (shape: TopicShape) => topicFileOf(shapedTopic(shape));

const folder = mkdtempSync(join(tmpdir(), 'chancewise-handout-cli-'));
const out = (name: string) => join(folder, name);
const pdfText = (path: string) => execFileSync('pdftotext', [path, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
const pageSize = (path: string) => /Page size:\s*(.*)/.exec(execFileSync('pdfinfo', [path], { encoding: 'utf8' }))?.[1];
// The flags' own checks use the fracture demo (2 options, 2 outcomes), which fits one page with every
// choice on; how much a page holds is the fit tests' business (test/handout/).
const FRACTURE = 'assets/demo/03-fracture-medicine.json';
const fractureDemo = () => {
  const found = demos().find((demo) => demo.name === '03-fracture-medicine.json');
  if (found === undefined) throw new Error('the fracture demo is missing');
  return found;
};
const version = (JSON.parse(readFileSync(join(ROOT, 'package.json'), 'utf8')) as { version: string }).version;

describe('chancewise handout', () => {
  it('writes the first demo topic as a one-page A4 PDF and says so in one line with its reading grade', async () => {
    const path = out('demo.pdf');
    const result = await run(['handout', '--demo', '--out', path, '--date', '2026-12-01']);
    expect(result).toMatchObject({ code: 0, stderr: '' });
    const { topic, result: computed } = firstDemo();
    const built = buildHandout(computed, topic, { date: '2026-12-01', appVersion: version }, loadHandoutFonts());
    if (!built.ok) throw new Error(built.message);
    expect(result.stdout).toBe(
      `Wrote ${path}: 1 page, A4, reading grade ${built.readability.grade?.toFixed(1)} (Flesch–Kincaid).\n`,
    );
    // ISO 216 A4 in points.
    expect(pageSize(path)).toBe('595.28 x 841.89 pts (A4)');
    expect(Buffer.from(readFileSync(path)).equals(Buffer.from(built.pdf))).toBe(true);
    expect(pdfText(path)).toContain(`Chancewise ${version}`);
  });

  it('writes the same bytes on every run with the same --date', async () => {
    const [first, second] = [out('same-1.pdf'), out('same-2.pdf')];
    await run(['handout', '--demo', '--out', first, '--date', '2026-12-01']);
    await run(['handout', '--demo', '--out', second, '--date', '2026-12-01']);
    expect(readFileSync(first).equals(readFileSync(second))).toBe(true);
  });

  // US Letter, 8.5 × 11 inches = 612 × 792 points.
  it('prints on US Letter with --paper letter', async () => {
    const path = out('letter.pdf');
    const result = await run(['handout', '--demo', '--out', path, '--paper', 'letter', '--date', '2026-12-01']);
    expect(result.stdout).toMatch(/: 1 page, US Letter, reading grade \d+\.\d \(Flesch–Kincaid\)\.\n$/);
    expect(pageSize(path)).toBe('612 x 792 pts (letter)');
  });

  it('prints the clinician, the NNT sentences and the denominator asked for', async () => {
    const path = out('options.pdf');
    const result = await run([
      'handout',
      join(ROOT, FRACTURE),
      '--out',
      path,
      '--date',
      '2026-12-01',
      '--clinician',
      'Dr A. Patel, Riverside Surgery',
      '--show-nnt',
      '--per',
      '1000',
    ]);
    expect(result.code).toBe(0);
    const text = pdfText(path);
    expect(text).toContain('Prepared by Dr A. Patel, Riverside Surgery');
    expect(text).toMatch(/NNTB \d+ \(NNTB \d+ to \d+\): treating \d+ people like you/);
    expect(text).toContain('Every number on this sheet is out of 1000 people');
  });

  it('reads a topic file', async () => {
    const file = join(folder, 'topic.json');
    writeFileSync(file, shapedTopicFile({ options: 2, outcomes: 2 }));
    const path = out('file.pdf');
    expect((await run(['handout', file, '--out', path, '--date', '2026-12-01'])).code).toBe(0);
    expect(pdfText(path)).toContain('Option A');
  });

  it('prints today’s date when --date is not given', async () => {
    const path = out('today.pdf');
    expect((await run(['handout', '--demo', '--out', path])).code).toBe(0);
    const now = new Date();
    expect(pdfText(path)).toContain(`${now.getDate()} ${now.toLocaleString('en-GB', { month: 'long' })} ${now.getFullYear()}`);
  });

  it('refuses content that cannot fit on one page: exit 2, one line, and no file', async () => {
    const file = join(folder, 'long.json');
    writeFileSync(file, shapedTopicFile(OVERLONG_SHAPE));
    const path = out('long.pdf');
    const result = await run(['handout', file, '--out', path]);
    expect(result.code).toBe(2);
    expect(result.stdout).toBe('');
    expect(result.stderr).toMatch(/^The handout does not fit on one page \(about \d+ mm too long\): shorten the [^\n]+\.\n$/);
    expect(existsSync(path)).toBe(false);
  });

  it.each([
    [['handout', '--demo'], /--out/],
    [['handout', '--demo', '--out', join(folder, 'x.svg')], /must end in \.pdf/],
    [['handout', '--out', join(folder, 'y.pdf')], /needs a topic/],
    [['handout', '--demo', '--out', join(folder, 'z.pdf'), '--paper', 'a5'], /--paper "a5" is not allowed/],
    [['handout', '--demo', '--out', join(folder, 'w.pdf'), '--date', '2026-02-30'], /--date "2026-02-30" is not a date/],
    [['handout', '--demo', '--out', join(folder, 'v.pdf'), '--date', '1 Dec 2026'], /is not a date/],
    [['handout', '--demo', '--out', join(folder, 'u.pdf'), '--per', '50'], /--per "50" is not allowed/],
    [['handout', '--demo', '--out', join(folder, 't.pdf'), '--clinician', 'x'.repeat(81)], /--clinician is 81 characters long/],
    [['handout', '--demo', '--out', join(folder, 's.pdf'), '--rr', '0.5'], /Unknown option --rr/],
    [['handout', '--demo', '--out', join(folder, 'missing-folder', 'r.pdf')], /folder does not exist/],
  ])('refuses %j with exit 2 and one line', async (args, message) => {
    const result = await run(args);
    expect(result.code).toBe(2);
    expect(result.stdout).toBe('');
    expect(result.stderr).toMatch(message);
    expect(result.stderr.trim().split('\n')).toHaveLength(1);
  });

  it('runs from the real entry point as a user would', async () => {
    const [path, inProcess] = [out('process.pdf'), out('in-process.pdf')];
    const result = await runProcess(['handout', '--demo', '--out', path, '--date', '2026-12-01']);
    expect(result.code).toBe(0);
    expect(result.stdout).toMatch(/^Wrote .*process\.pdf: 1 page, A4, reading grade/);
    await run(['handout', '--demo', '--out', inProcess, '--date', '2026-12-01']);
    expect(readFileSync(path).equals(readFileSync(inProcess))).toBe(true);
  });
});

describe('chancewise handout with the choices a topic file keeps', () => {
  // A version 4 file stores the handout's choices; the flags override them one by one.
  const stored = join(folder, 'stored-choices.cwtopic');
  writeFileSync(
    stored,
    JSON.stringify({
      format: 'chancewise-topic',
      version: 4,
      topic: { ...fractureDemo().topic, patient: null, handout: { showNnt: true, per: 1000, outline: false, paper: 'letter' } },
    }),
  );

  it('prints on the stored paper, with the stored NNT sentences and denominator', async () => {
    const path = out('stored.pdf');
    const result = await run(['handout', stored, '--out', path, '--date', '2026-12-01']);
    expect(result).toMatchObject({ code: 0, stderr: '' });
    // US Letter, 8.5 × 11 inches = 612 × 792 points.
    expect(pageSize(path)).toBe('612 x 792 pts (letter)');
    const text = pdfText(path);
    expect(text).toMatch(/NNTB \d+ \(NNTB \d+ to \d+\): treating \d+ people like you/);
    expect(text).toContain('Every number on this sheet is out of 1000 people');
  });

  it('lets --paper, --no-nnt and --per override what the file stores', async () => {
    const path = out('overridden.pdf');
    const result = await run([
      'handout',
      stored,
      '--out',
      path,
      '--date',
      '2026-12-01',
      '--paper',
      'a4',
      '--no-nnt',
      '--per',
      '100',
    ]);
    expect(result).toMatchObject({ code: 0, stderr: '' });
    // ISO 216 A4 in points.
    expect(pageSize(path)).toBe('595.28 x 841.89 pts (A4)');
    const text = pdfText(path);
    expect(text).not.toMatch(/NNTB \d+/);
    expect(text).not.toContain('out of 1000 people');
  });
});

describe('chancewise handout warns about typed text that reads above the grade target', () => {
  it('names the title on stderr, still writes the handout and exits 0', async () => {
    const input = join(folder, 'hard-title.cwtopic');
    // "Stones topic (illustrative)": 3 words, 1 + 2 + 4 = 7 syllables, 1 sentence: Flesch–Kincaid grade
    // 0.39 × 3 + 11.8 × 7 / 3 − 15.59 = 13.1 (Kincaid et al. 1975), above the target of grade 8.
    writeFileSync(input, shapedTopicFile({ options: 2, outcomes: 2, title: 'Stones topic (illustrative)' }));
    const path = out('hard-title.pdf');
    const result = await run(['handout', input, '--out', path, '--date', '2026-12-01']);
    expect(result.code).toBe(0);
    expect(result.stderr).toBe(
      'Warning: The text in the title reads at about grade 13.1, above grade 8. Shorter sentences and everyday words make it easier to read.\n',
    );
    expect(result.stdout).toMatch(/^Wrote .*hard-title\.pdf: 1 page, A4/);
    expect(pdfText(path)).toContain('Stones topic (illustrative)');
  });

  it('names the population and each question by its number, and says nothing of plain text', async () => {
    const input = join(folder, 'hard-question.cwtopic');
    // "Cardiovascular comorbidities necessitate individualised anticoagulation": 5 words of 6 + 5 + 4 + 7 + 7
    // syllables is far above grade 8 by the same formula; "Can I stop?" is well below it.
    const hard = 'Cardiovascular comorbidities necessitate individualised anticoagulation.';
    writeFileSync(
      input,
      shapedTopicFile({ options: 2, outcomes: 2, title: 'A plain title', population: hard, questions: ['Can I stop?', hard] }),
    );
    const result = await run(['handout', input, '--out', out('hard-question.pdf'), '--date', '2026-12-01']);
    expect(result.code).toBe(0);
    const lines = result.stderr.trimEnd().split('\n');
    expect(lines).toHaveLength(2);
    expect(lines[0]).toMatch(/^Warning: The text in the population \(who the numbers are for\) reads at about grade \d+\.\d/);
    expect(lines[1]).toMatch(/^Warning: The text in question 2 reads at about grade \d+\.\d, above grade 8\./);
  });
});
