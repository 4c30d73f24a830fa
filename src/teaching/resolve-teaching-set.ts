/**
 * From a read teaching set to topics ready to present: topics named by path are read
 * (where the platform can read files), every topic is computed, and the choices of
 * each item are checked against its topic. The first problem stops the set, with one
 * message naming its field.
 */
import { describeProblem } from '../core/messages/describe.ts';
import { readTopicFile } from '../core/topic/topic-file.ts';
import type { Topic } from '../core/topic/topic.ts';
import { teachingPresenterMessagesEn } from './messages/en.ts';
import { presentationItem } from './presentation-item.ts';
import type { ItemProblem, PresentationItem } from './presentation-item.ts';
import type { SetProblem, TeachingSet, TeachingSetItem } from './teaching-set-file.ts';

/** Reads the text of a topic file named by a path relative to the set; rejects when it cannot. */
export type ReadTopicText = (path: string) => Promise<string>;

export type ResolvedTeachingSet =
  | { readonly ok: true; readonly title: string; readonly items: readonly PresentationItem[] }
  | ({ readonly ok: false } & SetProblem);

const words = teachingPresenterMessagesEn.file;

/** A relative path to a .json file: no scheme, no drive, no leading slash. */
export function isUsableTopicPath(path: string): boolean {
  return path.trim() !== '' && /\.json$/i.test(path) && !/^([a-z][a-z0-9+.-]*:|[\\/])/i.test(path);
}

function itemProblem(fileName: string, index: number, problem: ItemProblem): SetProblem {
  const base = `items.${index}`;
  switch (problem.kind) {
    case 'not-computed': {
      const field = problem.field === '' ? `${base}.topic` : `${base}.topic.topic.${problem.field}`;
      return { field, message: words.topicNotComputed(fileName, index + 1, field, problem.detail) };
    }
    case 'unknown-option':
      return {
        field: `${base}.option`,
        message: words.unknownOption(fileName, `${base}.option`, problem.value, problem.known.map((id) => `"${id}"`).join(', ')),
      };
    case 'comparison-option':
      return { field: `${base}.option`, message: words.comparisonOption(fileName, `${base}.option`, problem.value) };
    case 'unknown-harm': {
      const known = problem.known.length === 0 ? words.noHarms : words.harmsAre(problem.known.map((id) => `"${id}"`).join(', '));
      return { field: `${base}.harm`, message: words.unknownHarm(fileName, `${base}.harm`, problem.value, known) };
    }
  }
}

async function topicOf(
  fileName: string,
  index: number,
  item: TeachingSetItem,
  readTopicText: ReadTopicText | null,
): Promise<{ readonly ok: true; readonly topic: Topic } | ({ readonly ok: false } & SetProblem)> {
  if (item.source.kind === 'embedded') return { ok: true, topic: item.source.topic };
  const { path } = item.source;
  const field = `items.${index}.topic`;
  if (readTopicText === null) return { ok: false, field, message: words.pathInBrowser(fileName, index + 1, path) };
  if (!isUsableTopicPath(path)) return { ok: false, field, message: words.pathUnusable(fileName, index + 1, path) };
  let text: string;
  try {
    text = await readTopicText(path);
  } catch (error) {
    return {
      ok: false,
      field,
      message: words.pathUnreadable(fileName, index + 1, path, error instanceof Error ? error.message : String(error)),
    };
  }
  const reading = readTopicFile(text);
  if (!reading.ok) {
    return { ok: false, field, message: words.topicProblem(fileName, index + 1, path, describeProblem(reading.problem)) };
  }
  return { ok: true, topic: reading.topic };
}

/**
 * Resolve every item of a set, in order.
 *
 * @param readTopicText - reads topic files named by path; null where files cannot be read (a browser)
 */
export async function resolveTeachingSet(
  fileName: string,
  set: TeachingSet,
  readTopicText: ReadTopicText | null,
): Promise<ResolvedTeachingSet> {
  const items: PresentationItem[] = [];
  for (const [index, item] of set.items.entries()) {
    const found = await topicOf(fileName, index, item, readTopicText);
    if (!found.ok) return found;
    const checked = presentationItem(found.topic, item);
    if (!checked.ok) return { ok: false, ...itemProblem(fileName, index, checked.problem) };
    items.push(checked.item);
  }
  return { ok: true, title: set.title, items };
}
