import * as v from 'valibot';
import { problem } from '../problems.ts';
import type { Problem } from '../problems.ts';
import type { Topic } from './topic.ts';
import { TOPIC_FORMAT, TOPIC_VERSION, topicFileSchema, topicFileV1Schema } from './topic-schema.ts';
import type { TopicFileV1 } from './topic-schema.ts';
import { locateIssue } from './schema-expectation.ts';
import type { SchemaNode } from './schema-expectation.ts';
import { readLanguageTag } from './topic-language.ts';
import { fileWords } from '../messages/en/file-words.ts';

/** What reading a topic file gives: the topic, or the first thing wrong with the file. */
export type TopicFileReading =
  | { readonly ok: true; readonly topic: Topic; readonly migratedFrom: number | null }
  | { readonly ok: false; readonly problem: Problem };

/** The first problem valibot found, as one clear problem (see `locateIssue`). */
function firstIssue(root: SchemaNode, issues: readonly v.BaseIssue<unknown>[]): Problem {
  const { path, expected, received } = locateIssue(root, issues);
  return problem('file-field-invalid', path === '' ? '(file)' : path, {
    path: path === '' ? fileWords.wholeFile : path,
    expected: expected ?? fileWords.anyValue,
    received,
  });
}

/** Turn a version 1 file into the current topic shape. */
export function migrateTopicV1(file: TopicFileV1): Topic {
  const headline = file.outcomes.findIndex((outcome) => outcome.headline);
  return {
    title: file.title,
    population: file.population,
    periodYears: file.years,
    illustrative: file.illustrative,
    options: file.options.map((option) => ({ ...option, isComparison: option.id === file.comparisonId })),
    outcomes: file.outcomes.map((outcome, index) => ({
      id: outcome.id,
      name: outcome.name,
      kind: outcome.kind,
      isHeadline: headline === -1 ? index === 0 : index === headline,
      baseline: { risk: outcome.baseline.risk, periodYears: outcome.baseline.years, source: outcome.baseline.source },
      effects: Object.entries(outcome.effects).map(([optionId, entry]) => ({
        optionId,
        effect: entry.effect,
        source: entry.source,
        followUpYears: entry.followUpYears,
        certainty: entry.certainty,
        importance: 'important' as const,
      })),
    })),
    evidence: { summary: file.source, reviewed: file.reviewed },
    questions: [],
    clinician: '',
    patient: null,
  };
}

/**
 * Read a topic file's text. A damaged or foreign file gives one clear problem naming the
 * first wrong field and what was expected; a version 1 file is migrated.
 */
export function readTopicFile(contents: string): TopicFileReading {
  let data: unknown;
  try {
    data = JSON.parse(contents.replace(/^\uFEFF/, ''));
  } catch (error) {
    const detail = error instanceof Error ? error.message : 'unreadable';
    return { ok: false, problem: problem('file-not-json', '(file)', { detail }) };
  }
  if (typeof data !== 'object' || data === null || Array.isArray(data)) {
    return { ok: false, problem: problem('file-format-unknown', 'format', { format: fileWords.noFormat }) };
  }
  const record = data as Record<string, unknown>;
  if (record.format !== TOPIC_FORMAT) {
    return {
      ok: false,
      problem: problem('file-format-unknown', 'format', { format: String(record.format ?? fileWords.noFormat) }),
    };
  }
  if (typeof record.version === 'number' && record.version > TOPIC_VERSION) {
    return {
      ok: false,
      problem: problem('file-version-unsupported', 'version', { version: record.version, supported: TOPIC_VERSION }),
    };
  }
  if (record.version === 1) {
    const old = v.safeParse(topicFileV1Schema, data);
    if (!old.success) return { ok: false, problem: firstIssue(topicFileV1Schema, old.issues) };
    return { ok: true, topic: migrateTopicV1(old.output), migratedFrom: 1 };
  }
  const parsed = v.safeParse(topicFileSchema, data);
  if (!parsed.success) return { ok: false, problem: firstIssue(topicFileSchema, parsed.issues) };
  const language = readLanguageTag(parsed.output.topic.language);
  if (!language.ok) {
    return {
      ok: false,
      problem: problem('topic-language-unsupported', 'topic.language', {
        language: language.tag,
        reason: language.reason,
      }),
    };
  }
  return { ok: true, topic: parsed.output.topic, migratedFrom: null };
}

/**
 * Write a topic as file text (current version). Patient-identifying details are left out
 * unless `includePatient` is set.
 */
export function writeTopicFile(topic: Topic, settings: { readonly includePatient?: boolean } = {}): string {
  const { patient, ...rest } = topic;
  const stored = settings.includePatient === true && patient !== undefined ? { ...rest, patient } : { ...rest, patient: null };
  return `${JSON.stringify({ format: TOPIC_FORMAT, version: TOPIC_VERSION, topic: stored }, null, 2)}\n`;
}
