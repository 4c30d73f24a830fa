/**
 * `chancewise handout FILE... --out-dir DIR`: one PDF per topic file in one call, named from
 * each file's stem; a bad file gets its one line on stderr and the others are still written.
 * Exit 0 all written, 2 an input refused, 1 a file could not be written. Page sizes: ISO 216
 * A4 (595.28 × 841.89 pt) and US Letter (612 × 792 pt), read with poppler's pdfinfo.
 */
import { execFileSync } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readFileSync, readdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { shapedTopic } from '../handout/topic-builder.ts';
import { run, runProcess } from './support.ts';

const base = mkdtempSync(join(tmpdir(), 'chancewise-handout-batch-'));
let made = 0;
/** A fresh folder for one check. */
const freshFolder = () => {
  made += 1;
  const folder = join(base, `case-${made}`);
  mkdirSync(folder);
  return folder;
};

/** Write an invented topic file (format version 2) titled `title` at `path`. */
function topicFile(path: string, title: string): string {
  mkdirSync(join(path, '..'), { recursive: true });
  const topic = { ...shapedTopic({ options: 2, outcomes: 2, title }), patient: null };
  writeFileSync(path, JSON.stringify({ format: 'chancewise-topic', version: 2, topic }));
  return path;
}

/**
 * The lines of stderr that refuse something: a handout whose typed title reads above the grade
 * target is still written, with a warning line naming its file ("FILE: Warning: …"), left out here.
 */
const refusals = (stderr: string) =>
  stderr
    .split('\n')
    .filter((line) => line !== '' && !/: Warning: /.test(line))
    .map((line) => `${line}\n`)
    .join('');

const pdfText = (path: string) => execFileSync('pdftotext', [path, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
const pdfInfo = (path: string) => execFileSync('pdfinfo', [path], { encoding: 'utf8' });
const pageSize = (path: string) => /Page size:\s*(.*)/.exec(pdfInfo(path))?.[1];
const pages = (path: string) => Number(/Pages:\s*(\d+)/.exec(pdfInfo(path))?.[1]);

describe('chancewise handout FILE... --out-dir DIR', () => {
  it('writes the good files and refuses the bad ones in one call: exit 2, one line per bad file naming it', async () => {
    const folder = freshFolder();
    const first = topicFile(join(folder, 'in', 'stones.cwtopic'), 'Stones topic (illustrative)');
    const second = topicFile(join(folder, 'in', 'throat.chancewise.json'), 'Throat topic (illustrative)');
    const broken = join(folder, 'in', 'broken.cwtopic');
    writeFileSync(broken, '{ "format": "chancewise-topic", ');
    const missing = join(folder, 'in', 'missing.cwtopic');
    const out = join(folder, 'new', 'handouts');

    const result = await run(['handout', first, broken, second, missing, '--out-dir', out, '--date', '2026-12-01']);

    expect(result.code).toBe(2);
    expect(readdirSync(out).sort()).toEqual(['stones.pdf', 'throat.pdf']);
    for (const [name, title] of [
      ['stones.pdf', 'Stones topic'],
      ['throat.pdf', 'Throat topic'],
    ] as const) {
      const path = join(out, name);
      expect(pages(path)).toBe(1);
      expect(pageSize(path)).toBe('595.28 x 841.89 pts (A4)');
      expect(pdfText(path)).toContain(title);
    }
    const errors = refusals(result.stderr).trimEnd().split('\n');
    expect(errors).toHaveLength(2);
    // "Stones topic (illustrative)": 3 words of 1 + 2 + 4 = 7 syllables in 1 sentence, grade
    // 0.39 × 3 + 11.8 × 7 / 3 − 15.59 = 13.1 (Kincaid et al. 1975): a warning naming the file and
    // the title, and the handout is still written.
    expect(result.stderr).toContain(`${first}: Warning: The text in the title reads at about grade 13.1, above grade 8.`);
    expect(errors[0]).toMatch(new RegExp(`^${broken.replace(/[.*+?^${}()|[\]\\/]/g, '\\$&')}: `));
    expect(errors[1]).toBe(`Cannot read the topic file "${missing}": no such file.`);
    expect(result.stdout.trimEnd().split('\n')).toEqual([
      expect.stringMatching(
        new RegExp(`^Wrote ${join(out, 'stones.pdf')}: 1 page, A4, reading grade \\d+\\.\\d \\(Flesch–Kincaid\\)\\.$`),
      ),
      expect.stringMatching(new RegExp(`^Wrote ${join(out, 'throat.pdf')}: 1 page, A4, reading grade`)),
      `Wrote 2 of 4 handouts to ${out}.`,
    ]);
  });

  it('writes each file the bytes of the single-file form with the same flags, and exits 0 when all are written', async () => {
    const folder = freshFolder();
    const files = ['a', 'b', 'c'].map((name) => topicFile(join(folder, `${name}.cwtopic`), `Topic ${name} (illustrative)`));
    const flags = [
      '--date',
      '2026-12-01',
      '--paper',
      'letter',
      '--clinician',
      'Dr B. Osei, Hillside Practice',
      '--show-nnt',
      '--per',
      '1000',
    ];
    const result = await run(['handout', ...files, '--out-dir', join(folder, 'out'), ...flags]);
    expect(result.code).toBe(0);
    expect(refusals(result.stderr)).toBe('');
    for (const [index, file] of files.entries()) {
      const single = join(folder, `single-${index}.pdf`);
      expect((await run(['handout', file, '--out', single, ...flags])).code).toBe(0);
      const batch = join(folder, 'out', `${'abc'[index]}.pdf`);
      expect(readFileSync(batch).equals(readFileSync(single))).toBe(true);
      expect(pageSize(batch)).toBe('612 x 792 pts (letter)');
      expect(pdfText(batch)).toContain('Prepared by Dr B. Osei, Hillside Practice');
      expect(pdfText(batch)).toContain('Every number on this sheet is out of 1000 people');
    }
  });

  it('names files that share a stem -2, -3 in the order given, and replaces files already in the folder', async () => {
    const folder = freshFolder();
    const inputs = [
      topicFile(join(folder, 'one', 'clinic.cwtopic'), 'First clinic (illustrative)'),
      topicFile(join(folder, 'two', 'clinic.json'), 'Second clinic (illustrative)'),
      topicFile(join(folder, 'three', 'Clinic.cwtopic'), 'Third clinic (illustrative)'),
    ];
    const out = join(folder, 'out');
    mkdirSync(out);
    writeFileSync(join(out, 'clinic.pdf'), 'an older file');
    const result = await run(['handout', ...inputs, '--out-dir', out, '--date', '2026-12-01']);
    expect(result.code).toBe(0);
    expect(refusals(result.stderr)).toBe('');
    expect(readdirSync(out).sort()).toEqual(['Clinic-3.pdf', 'clinic-2.pdf', 'clinic.pdf']);
    expect(pdfText(join(out, 'clinic.pdf'))).toContain('First clinic');
    expect(pdfText(join(out, 'clinic-2.pdf'))).toContain('Second clinic');
    expect(pdfText(join(out, 'Clinic-3.pdf'))).toContain('Third clinic');
  });

  it('exits 1 when a file cannot be written, still writing the others', async () => {
    const folder = freshFolder();
    const inputs = [
      topicFile(join(folder, 'kept.cwtopic'), 'Kept (illustrative)'),
      topicFile(join(folder, 'blocked.cwtopic'), 'Blocked (illustrative)'),
    ];
    const out = join(folder, 'out');
    mkdirSync(join(out, 'blocked.pdf'), { recursive: true });
    const result = await run(['handout', ...inputs, '--out-dir', out, '--date', '2026-12-01']);
    expect(result.code).toBe(1);
    expect(refusals(result.stderr)).toBe(`Cannot write "${join(out, 'blocked.pdf')}": a folder of that name is in the way.\n`);
    expect(pages(join(out, 'kept.pdf'))).toBe(1);
    expect(readdirSync(out).sort()).toEqual(['blocked.pdf', 'kept.pdf']);
  });

  it('exits 1 with one line when the folder cannot be made', async () => {
    const folder = freshFolder();
    const input = topicFile(join(folder, 'a.cwtopic'), 'A (illustrative)');
    writeFileSync(join(folder, 'taken'), 'a file, not a folder');
    const result = await run(['handout', input, '--out-dir', join(folder, 'taken', 'out')]);
    expect(result).toMatchObject({ code: 1, stdout: '' });
    expect(result.stderr).toBe(`Cannot make the folder "${join(folder, 'taken', 'out')}": a file of that name is in the way.\n`);
  });

  it('writes the first demo topic under its own stem with --demo', async () => {
    const out = join(freshFolder(), 'demo');
    expect((await run(['handout', '--demo', '--out-dir', out, '--date', '2026-12-01'])).code).toBe(0);
    expect(readdirSync(out)).toEqual(['01-kidney-stone.pdf']);
  });

  it.each([
    [
      ['a.cwtopic', 'b.cwtopic', '--out', 'x.pdf'],
      '--out names one file, but 2 topic files were given: use --out-dir FOLDER to write one handout per file.',
    ],
    [
      ['a.cwtopic', '--out', 'x.pdf', '--out-dir', 'dir'],
      'Give --out FILE.pdf for one handout or --out-dir FOLDER for one per topic file, not both.',
    ],
    [['--out-dir', 'dir'], 'A handout needs a topic: give a topic file or --demo.'],
    [['a.cwtopic', '--demo', '--out-dir', 'dir'], 'Give a topic file or --demo, not both.'],
    [['a.cwtopic', 'b.cwtopic', '--out-dir', 'dir', '--paper', 'a5'], /^--paper "a5" is not allowed/],
  ])('refuses %j before writing anything: exit 2 and one line', async (args, message) => {
    const folder = freshFolder();
    const result = await run(['handout', ...args.map((arg) => (arg.includes('.') || arg === 'dir' ? join(folder, arg) : arg))]);
    expect(result.code).toBe(2);
    expect(result.stdout).toBe('');
    expect(result.stderr.trimEnd().split('\n')).toHaveLength(1);
    if (typeof message === 'string') expect(result.stderr).toBe(`${message}\n`);
    else expect(result.stderr).toMatch(message);
    expect(readdirSync(folder)).toEqual([]);
    expect(existsSync(join(folder, 'dir'))).toBe(false);
  });

  it('runs from the real entry point as a user would', async () => {
    const folder = freshFolder();
    const inputs = [
      topicFile(join(folder, 'p.cwtopic'), 'P (illustrative)'),
      topicFile(join(folder, 'q.cwtopic'), 'Q (illustrative)'),
    ];
    const result = await runProcess([
      'handout',
      ...inputs,
      join(folder, 'gone.cwtopic'),
      '--out-dir',
      join(folder, 'out'),
      '--date',
      '2026-12-01',
    ]);
    expect(result.code).toBe(2);
    expect(refusals(result.stderr)).toBe(`Cannot read the topic file "${join(folder, 'gone.cwtopic')}": no such file.\n`);
    expect(readdirSync(join(folder, 'out')).sort()).toEqual(['p.pdf', 'q.pdf']);
  });
});
