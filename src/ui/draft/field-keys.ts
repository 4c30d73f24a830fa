/**
 * Field keys: stable names for the editor's fields, built from ids rather than positions
 * ("outcomes.muscle.effects.standard.estimate"), and the translation from the core's
 * positional field paths ("outcomes.1.effects.0.effect.estimate") to them.
 */
import { effectOptionIds } from './topic-from-draft.ts';
import type { TopicDraft } from './topic-draft.ts';

/** The parts of one effect a problem can point at. */
export type EffectPart =
  | 'estimate'
  | 'lower'
  | 'upper'
  | 'interval'
  | 'source'
  | 'followUpYears'
  | 'intervention'
  | 'intervention.events'
  | 'intervention.total'
  | 'comparison'
  | 'comparison.events'
  | 'comparison.total';

/** The parts of one outcome a problem can point at. */
export type OutcomePart = 'name' | 'baseline.risk' | 'baseline.periodYears' | 'baseline.source' | 'effects';

/** Key of a field of an outcome. */
export function outcomeKey(outcomeId: string, part: OutcomePart): string {
  return `outcomes.${outcomeId}.${part}`;
}

/** Key of a field of one option's effect on one outcome; without a part, the effect as a whole. */
export function effectKey(outcomeId: string, optionId: string, part?: EffectPart): string {
  const base = `outcomes.${outcomeId}.effects.${optionId}`;
  return part === undefined ? base : `${base}.${part}`;
}

/** Key of an option's name field. */
export function optionKey(optionId: string): string {
  return `options.${optionId}.name`;
}

/** A key as an element id: letters, digits and dashes only, unique per key. */
export function fieldId(key: string): string {
  const safe = key.replace(/[^A-Za-z0-9]+/g, '-');
  // Keys differ only in the characters replaced above when ids contain them: keep a short hash.
  let hash = 0;
  for (const character of key) hash = (Math.imul(hash, 31) + (character.codePointAt(0) ?? 0)) | 0;
  return `field-${safe}-${(hash >>> 0).toString(36)}`;
}

/** The parts of an effect, in the order the editor shows them. */
const EFFECT_ORDER: readonly EffectPart[] = [
  'estimate',
  'lower',
  'upper',
  'interval',
  'intervention',
  'intervention.events',
  'intervention.total',
  'comparison',
  'comparison.events',
  'comparison.total',
  'followUpYears',
  'source',
];

/** The parts of an effect the core names under `effect.` (its follow-up and source sit beside it). */
const EFFECT_PARTS: ReadonlySet<string> = new Set(EFFECT_ORDER.filter((part) => part !== 'followUpYears' && part !== 'source'));

function effectFieldKey(draft: TopicDraft, outcomeId: string, effectIndex: number, rest: string): string | null {
  const optionId = effectOptionIds(draft)[effectIndex];
  if (optionId === undefined) return null;
  if (rest === 'source' || rest === 'followUpYears') return effectKey(outcomeId, optionId, rest);
  if (!rest.startsWith('effect')) return effectKey(outcomeId, optionId);
  const part = rest.slice('effect.'.length);
  if (EFFECT_PARTS.has(part)) return effectKey(outcomeId, optionId, part as EffectPart);
  // The baseline as the core used it: its period conversion or its absence.
  if (part === 'period') return outcomeKey(outcomeId, 'baseline.periodYears');
  if (part === 'baseline') return outcomeKey(outcomeId, 'baseline.risk');
  return effectKey(outcomeId, optionId);
}

const OUTCOME_PARTS: ReadonlySet<string> = new Set([
  'name',
  'baseline.risk',
  'baseline.periodYears',
  'baseline.source',
  'effects',
]);

function outcomeFieldKey(draft: TopicDraft, index: number, rest: string): string | null {
  const outcome = draft.outcomes[index];
  if (outcome === undefined) return null;
  const effect = /^effects\.(\d+)\.?(.*)$/.exec(rest);
  if (effect !== null) return effectFieldKey(draft, outcome.id, Number(effect[1]), effect[2] ?? '');
  if (OUTCOME_PARTS.has(rest)) return outcomeKey(outcome.id, rest as OutcomePart);
  return outcomeKey(outcome.id, 'name');
}

/** The fields of the disclosures and the screening section: their keys are the core's paths. */
export const ABOUT_KEYS = ['about.preparedBy', 'about.funding', 'about.interests', 'about.reviewBy'] as const;
export const SCREENING_KEYS = ['screening.positiveLeadsTo', 'screening.missedCase', 'screening.overdiagnosis'] as const;
const OWN_PATHS: ReadonlySet<string> = new Set([...ABOUT_KEYS, ...SCREENING_KEYS]);

/** Every field key in the order the editor shows the fields, top to bottom. */
export function fieldOrder(draft: TopicDraft): string[] {
  const order = [
    'title',
    'population',
    'periodYears',
    'language',
    'options',
    ...draft.options.map((option) => optionKey(option.id)),
    'outcomes',
  ];
  const others = effectOptionIds(draft);
  for (const outcome of draft.outcomes) {
    order.push(outcomeKey(outcome.id, 'effects'), outcomeKey(outcome.id, 'name'));
    order.push(
      outcomeKey(outcome.id, 'baseline.risk'),
      outcomeKey(outcome.id, 'baseline.periodYears'),
      outcomeKey(outcome.id, 'baseline.source'),
    );
    for (const optionId of others) {
      order.push(effectKey(outcome.id, optionId), ...EFFECT_ORDER.map((part) => effectKey(outcome.id, optionId, part)));
    }
  }
  order.push(
    'evidence.summary',
    'evidence.reviewed',
    'clinician',
    'questions',
    ...draft.questions.map((_, place) => `questions.${place}`),
    ...ABOUT_KEYS,
    ...SCREENING_KEYS,
  );
  return order;
}

/**
 * The editor field a core problem belongs to, or null when it belongs to no one field
 * (it is then shown only in the list of every problem).
 *
 * @param questionPlaces - the draft place of each question of the topic (blank ones are left out)
 * @example fieldKeyForPath('outcomes.0.baseline.risk', draft) // => "outcomes.heart-stroke.baseline.risk"
 */
export function fieldKeyForPath(path: string, draft: TopicDraft, questionPlaces: readonly number[] = []): string | null {
  if (path === 'title' || path === 'population' || path === 'periodYears' || path === 'clinician') return path;
  if (path === 'language') return path;
  if (path === 'evidence.summary' || path === 'evidence.reviewed') return path;
  if (path === 'options' || path === 'outcomes' || path === 'questions') return path;
  if (OWN_PATHS.has(path)) return path;
  const question = /^questions\.(\d+)$/.exec(path);
  if (question !== null) {
    const place = questionPlaces[Number(question[1])];
    return place === undefined ? 'questions' : `questions.${place}`;
  }
  const option = /^options\.(\d+)\.(name|id)$/.exec(path);
  if (option !== null) {
    const found = draft.options[Number(option[1])];
    return found === undefined ? 'options' : optionKey(found.id);
  }
  const outcome = /^outcomes\.(\d+)\.?(.*)$/.exec(path);
  if (outcome !== null) return outcomeFieldKey(draft, Number(outcome[1]), outcome[2] ?? '');
  return null;
}

/**
 * Where a field is, in words, for a list of problems read away from the fields: "Option 2",
 * "a stroke", "a stroke, effect of the tablet"; null for the topic's own fields.
 */
export function fieldPlace(key: string, draft: TopicDraft): string | null {
  const named = (name: string, fallback: string) => (name.trim() === '' ? fallback : name.trim());
  const option = /^options\.(.+)\.name$/.exec(key);
  if (option !== null) {
    const index = draft.options.findIndex((candidate) => candidate.id === option[1]);
    return index === -1 ? null : `Option ${index + 1}`;
  }
  const outcome = /^outcomes\.([^.]+)\.(.+)$/.exec(key);
  if (outcome === null) return null;
  const index = draft.outcomes.findIndex((candidate) => candidate.id === outcome[1]);
  const found = draft.outcomes[index];
  if (found === undefined) return null;
  const outcomeName = named(found.name, `Outcome ${index + 1}`);
  const effect = /^effects\.([^.]+)/.exec(outcome[2] ?? '');
  if (effect === null) return outcomeName;
  const optionIndex = draft.options.findIndex((candidate) => candidate.id === effect[1]);
  const optionFound = draft.options[optionIndex];
  if (optionFound === undefined) return outcomeName;
  return `${outcomeName}, effect of ${named(optionFound.name, `option ${optionIndex + 1}`)}`;
}
