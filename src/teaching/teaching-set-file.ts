/**
 * Reading and writing teaching sets. Reading gives the set, or one clear message
 * naming the first wrong field (the set's own fields, or a field of a topic written
 * inside it); writing always puts each topic inside the set, without the patient's
 * details, so a saved set opens anywhere, a browser included.
 */
import * as v from 'valibot';
import { describeProblem } from '../core/messages/describe.ts';
import type { Problem } from '../core/problems.ts';
import { readTopicFile, writeTopicFile } from '../core/topic/topic-file.ts';
import { TOPIC_FORMAT } from '../core/topic/topic-schema.ts';
import type { Topic } from '../core/topic/topic.ts';
import { locateIssue } from '../core/topic/schema-expectation.ts';
import type { SchemaNode } from '../core/topic/schema-expectation.ts';
import type { Denominator } from '../core/types.ts';
import { teachingPresenterMessagesEn } from './messages/en.ts';
import { TEACHING_SET_FORMAT, TEACHING_SET_VERSION, teachingSetSchema } from './teaching-set-schema.ts';
import type { StepKind } from './teaching-steps.ts';

/** Where an item's topic comes from: written inside the set, or a file path relative to the set. */
export type TopicSource = { readonly kind: 'embedded'; readonly topic: Topic } | { readonly kind: 'path'; readonly path: string };

/** How one topic is presented. */
export interface ItemChoices {
  /** The option shown against the comparison; null: the first option that is not the comparison. */
  readonly option: string | null;
  /** The one harm outcome of the "who is harmed" step; null: every harm of the topic, a slide each. */
  readonly harm: string | null;
  /** 100 or 1000 people; null lets the core choose. */
  readonly per: Denominator | null;
  readonly steps: readonly StepKind[];
}

export interface TeachingSetItem extends ItemChoices {
  readonly source: TopicSource;
}

export interface TeachingSet {
  readonly title: string;
  readonly items: readonly TeachingSetItem[];
}

/** What went wrong, at which field of the file (a dotted path, or "(file)"). */
export interface SetProblem {
  readonly field: string;
  readonly message: string;
}

export type TeachingSetReading = { readonly ok: true; readonly set: TeachingSet } | ({ readonly ok: false } & SetProblem);

const words = teachingPresenterMessagesEn.file;

function fail(field: string, message: string): { readonly ok: false } & SetProblem {
  return { ok: false, field, message };
}

/** The first problem valibot found, in words: the path, what is expected there, what is there instead. */
function firstIssue(fileName: string, issues: readonly v.BaseIssue<unknown>[]): { readonly ok: false } & SetProblem {
  const { issue, path, expected, received } = locateIssue(teachingSetSchema as unknown as SchemaNode, issues);
  if (issue?.type === 'min_length' && Array.isArray(issue.input)) {
    return fail(path, words.emptyList(fileName, path, path === 'items' ? 'topic' : 'step'));
  }
  return fail(
    path === '' ? '(file)' : path,
    words.damaged(fileName, path === '' ? '(the whole file)' : path, expected ?? '', received),
  );
}

/** A topic file's problem, placed at the item's path inside the set. */
function topicFileProblem(fileName: string, index: number, base: string, found: Problem): { readonly ok: false } & SetProblem {
  if (found.code === 'file-field-invalid') {
    const inner = String(found.values.path ?? '');
    const path = found.field === '(file)' ? base : `${base}.${inner}`;
    return fail(path, words.damaged(fileName, path, String(found.values.expected ?? ''), String(found.values.received ?? '')));
  }
  const path = found.field === '(file)' ? base : `${base}.${found.field}`;
  return fail(path, words.topicProblem(fileName, index + 1, base, describeProblem(found)));
}

/**
 * Read a teaching set's text. Topics written inside it are read with the topic file
 * reader (so older topic versions are migrated); topics named by path are left for
 * {@link resolveTeachingSet}.
 */
export function readTeachingSet(fileName: string, text: string): TeachingSetReading {
  if (text.trim() === '') return fail('(file)', words.empty(fileName));
  let data: unknown;
  try {
    data = JSON.parse(text.replace(/^\uFEFF/, ''));
  } catch (error) {
    return fail('(file)', words.notJson(fileName, error instanceof Error ? error.message : 'unreadable'));
  }
  if (typeof data !== 'object' || data === null || Array.isArray(data)) return fail('format', words.notASet(fileName, 'none'));
  const record = data as Record<string, unknown>;
  if (record.format === TOPIC_FORMAT) return fail('format', words.isATopic(fileName));
  if (record.format !== TEACHING_SET_FORMAT) return fail('format', words.notASet(fileName, String(record.format ?? 'none')));
  if (typeof record.version === 'number' && record.version > TEACHING_SET_VERSION) {
    return fail('version', words.newerVersion(fileName, String(record.version), TEACHING_SET_VERSION));
  }
  const parsed = v.safeParse(teachingSetSchema, data);
  if (!parsed.success) return firstIssue(fileName, parsed.issues);
  const items: TeachingSetItem[] = [];
  for (const [index, item] of parsed.output.items.entries()) {
    const base = `items.${index}.topic`;
    let source: TopicSource;
    if (typeof item.topic === 'string') {
      source = { kind: 'path', path: item.topic };
    } else {
      const reading = readTopicFile(JSON.stringify(item.topic));
      if (!reading.ok) return topicFileProblem(fileName, index, base, reading.problem);
      source = { kind: 'embedded', topic: reading.topic };
    }
    items.push({ source, option: item.option, harm: item.harm, per: item.per, steps: item.steps });
  }
  return { ok: true, set: { title: parsed.output.title, items } };
}

/** One topic of a set to write, with how it is presented. */
export interface TeachingSetEntry extends ItemChoices {
  readonly topic: Topic;
}

/** A teaching set as file text, every topic written inside it without the patient's details. */
export function writeTeachingSet(title: string, entries: readonly TeachingSetEntry[]): string {
  const items = entries.map((entry) => ({
    topic: JSON.parse(writeTopicFile(entry.topic)) as unknown,
    option: entry.option,
    harm: entry.harm,
    per: entry.per,
    steps: [...entry.steps],
  }));
  return `${JSON.stringify({ format: TEACHING_SET_FORMAT, version: TEACHING_SET_VERSION, title, items }, null, 2)}\n`;
}
