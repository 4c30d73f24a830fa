/**
 * Names of the files the app exports, named for what they hold: `<topic>-<outcome>.svg` or
 * `.png` for a chart, `<topic>-handout.pdf` for the handout. Each part is written in lower-case
 * ASCII letters, digits and hyphens, and the whole name is at most {@link EXPORT_NAME_LIMIT}
 * characters, so it is safe on Windows, macOS and Linux alike.
 */
import { plainFileStem } from './plain-file-stem.ts';

/** The longest exported file name, ending included. */
export const EXPORT_NAME_LIMIT = 80;

/** The most of the name the second part (an outcome's name) may take. */
const SECOND_PART_LIMIT = 32;

/** A name in lower-case ASCII letters, digits and hyphens, or `fallback` when nothing is left. */
export function namePart(text: string, fallback: string): string {
  return plainFileStem(text, Number.POSITIVE_INFINITY, fallback);
}

/** A part cut to at most `limit` characters, at a hyphen where one is near enough. */
function cut(part: string, limit: number): string {
  if (part.length <= limit) return part;
  const hard = part.slice(0, limit);
  const hyphen = hard.lastIndexOf('-');
  return (part[limit] === '-' || hyphen < limit / 2 ? hard : hard.slice(0, hyphen)).replace(/-+$/, '');
}

/** The topic's part: its file's name without the ending, else its decision's first words. */
export function topicPart(title: string, fileName: string | null): string {
  const stem = fileName === null ? '' : fileName.replace(/(\.chancewise)?\.(cwtopic|json)$/i, '');
  return stem === '' ? plainFileStem(title, 8, 'topic') : namePart(stem, 'topic');
}

/** `<topic>-<what>.<ending>`, within the limit: the second part keeps up to 32 characters, the topic the rest. */
export function exportFileName(topic: string, what: string, ending: 'svg' | 'png' | 'pdf'): string {
  const second = cut(namePart(what, 'chart'), SECOND_PART_LIMIT);
  const room = EXPORT_NAME_LIMIT - second.length - ending.length - 2;
  return `${cut(namePart(topic, 'topic'), room)}-${second}.${ending}`;
}
