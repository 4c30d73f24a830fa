/**
 * Shared set-up for the handout tests: the demo topics computed, the fonts read
 * once, and poppler's pdfinfo and pdftotext run on a built file.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, readdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { computeTopic } from '../../src/core/topic/compute-topic.ts';
import type { Topic } from '../../src/core/topic/topic.ts';
import type { TopicResult } from '../../src/core/topic/topic-result.ts';
import { readTopicFile } from '../../src/core/topic/topic-file.ts';
import { topicLanguage } from '../../src/core/topic/topic-language.ts';
import type { HandoutFonts } from '../../src/handout/handout-fonts.ts';
import { loadHandoutFonts } from '../../src/handout/node-fonts.ts';

const DEMO_FOLDER = fileURLToPath(new URL('../../assets/demo/', import.meta.url));

/** A demo topic and its computed result. */
export interface Demo {
  readonly name: string;
  readonly topic: Topic;
  readonly result: TopicResult;
}

/**
 * The English demo topics, in file order: the handout checks that read English words from the
 * sheet. A demo in another language has its own checks (see spanish-handout.test.ts).
 */
export function demos(): Demo[] {
  return allDemos().filter((demo) => topicLanguage(demo.topic) === 'en');
}

/** The demo topics written in Spanish, in file order. */
export function spanishDemos(): Demo[] {
  return allDemos().filter((demo) => topicLanguage(demo.topic) === 'es');
}

/** Every demo topic, in file order. */
function allDemos(): Demo[] {
  return readdirSync(DEMO_FOLDER)
    .filter((name) => name.endsWith('.json'))
    .sort()
    .map((name) => {
      const reading = readTopicFile(readFileSync(join(DEMO_FOLDER, name), 'utf8'));
      if (!reading.ok) throw new Error(`demo ${name} does not read`);
      return { name, topic: reading.topic, result: computeTopic(reading.topic) };
    });
}

/** The first demo topic (the one `--demo` uses). */
export function firstDemo(): Demo {
  const first = demos()[0];
  if (first === undefined) throw new Error('no demo topics');
  return first;
}

let fonts: HandoutFonts | null = null;

/** DejaVu Sans, read once for all tests of a file. */
export function testFonts(): HandoutFonts {
  fonts ??= loadHandoutFonts();
  return fonts;
}

const folder = mkdtempSync(join(tmpdir(), 'chancewise-handout-'));
let counter = 0;

/** Write PDF bytes to a fresh temporary file and return its path. */
export function writePdf(bytes: Uint8Array): string {
  counter += 1;
  const path = join(folder, `handout-${counter}.pdf`);
  writeFileSync(path, bytes);
  return path;
}

/** pdfinfo's fields, by name. */
export function pdfInfo(path: string): Record<string, string> {
  const text = execFileSync('pdfinfo', [path], { encoding: 'utf8' });
  return Object.fromEntries(
    text
      .split('\n')
      .map((line) => /^([^:]+):\s*(.*)$/.exec(line))
      .filter((found): found is RegExpExecArray => found !== null)
      .map((found) => [found[1] ?? '', found[2] ?? '']),
  );
}

/** The page's text as pdftotext extracts it, with every run of white space made one space. */
export function pdfText(path: string): string {
  return normalise(execFileSync('pdftotext', [path, '-'], { encoding: 'utf8' }));
}

/** Runs of white space (line breaks included) as one space. */
export function normalise(text: string): string {
  return text.replace(/\s+/g, ' ').trim();
}

/** One word's box, in points from the top-left corner of the page. */
export interface WordBox {
  readonly word: string;
  readonly xMin: number;
  readonly yMin: number;
  readonly xMax: number;
  readonly yMax: number;
}

/** Every word's box, from `pdftotext -bbox`. */
export function wordBoxes(path: string): WordBox[] {
  const html = execFileSync('pdftotext', ['-bbox', path, '-'], { encoding: 'utf8' });
  return [...html.matchAll(/<word xMin="([\d.]+)" yMin="([\d.]+)" xMax="([\d.]+)" yMax="([\d.]+)">([^<]*)<\/word>/g)].map(
    (found) => ({
      word: found[5] ?? '',
      xMin: Number(found[1]),
      yMin: Number(found[2]),
      xMax: Number(found[3]),
      yMax: Number(found[4]),
    }),
  );
}
