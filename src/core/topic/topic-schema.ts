import * as v from 'valibot';
import { MEASURES } from '../effect-measures.ts';
import { WORDS_DENOMINATORS } from '../types.ts';

/** The name every topic file carries in its `format` field. */
export const TOPIC_FORMAT = 'chancewise-topic';
/**
 * The version this build writes. Version 3 added `wanted` on outcomes and the time units
 * (`periodUnit`, `followUpUnit`) and the `opposite` flag of effects; a version 2 file has none
 * of them and reads with their defaults (all events unwanted, periods in years). Version 1
 * files are migrated on reading. Version 4 added the handout's choices (`handout`: `showNnt`,
 * `per`, `outline`, `paper`); a version 2 or 3 file has none and reads without them.
 * Version 5 added the disclosures (`about`: `preparedBy`, `funding`, `interests`, `reviewBy`)
 * and the screening section (`screening`: `positiveLeadsTo`, `missedCase`, `overdiagnosis`);
 * a version 2 to 4 file has neither and reads as it always did.
 * Version 6 added the patient language (`language`, a BCP 47 tag; absent means English) and
 * the translation marks of a copied topic (`translation`: `from`, `sourceTexts`); a version 2
 * to 5 file has neither and reads as an English topic.
 */
export const TOPIC_VERSION = 6;

const text = v.string();
const years = v.pipe(v.number(), v.finite());
const finite = v.pipe(v.number(), v.finite());
const bound = v.optional(v.nullable(finite));
const whole = v.pipe(v.number(), v.integer());
const arm = v.object({ events: whole, total: whole });
const unit = v.optional(v.picklist(['days', 'weeks', 'months', 'years']));
const opposite = v.optional(v.boolean());

const enteredEffect = v.object({
  measure: v.picklist(MEASURES),
  estimate: finite,
  lower: bound,
  upper: bound,
  level: v.optional(finite),
  opposite,
});
const countsEffect = v.object({
  measure: v.literal('counts'),
  intervention: arm,
  comparison: arm,
  level: v.optional(finite),
  opposite,
});
const effect = v.variant('measure', [countsEffect, enteredEffect]);

const certainty = v.picklist(['high', 'moderate', 'low', 'very-low']);
const importance = v.picklist(['important', 'trivial']);

/** Schema of the handout's choices (version 4). */
export const handoutChoicesSchema = v.object({
  showNnt: v.boolean(),
  per: v.nullable(v.picklist(WORDS_DENOMINATORS)),
  outline: v.boolean(),
  paper: v.picklist(['a4', 'letter']),
});

/** Schema of the disclosures (version 5). */
export const disclosuresSchema = v.object({ preparedBy: text, funding: text, interests: text, reviewBy: text });

const chance = v.nullable(v.union([finite, text]));

/** Schema of the screening section (version 5). */
export const screeningSchema = v.object({ positiveLeadsTo: text, missedCase: chance, overdiagnosis: chance });

/** Schema of a copied topic's translation marks (version 6): the language it was copied from, and each typed text as it was then. */
export const translationSchema = v.object({ from: text, sourceTexts: v.record(text, text) });

/** Schema of one topic, as stored (versions 2 to 6; the fields versions 3 to 6 added are optional). */
export const topicSchema = v.object({
  title: text,
  population: text,
  periodYears: years,
  periodUnit: unit,
  illustrative: v.boolean(),
  options: v.array(v.object({ id: text, name: text, isComparison: v.boolean() })),
  outcomes: v.array(
    v.object({
      id: text,
      name: text,
      kind: v.picklist(['benefit', 'harm']),
      wanted: v.optional(v.boolean()),
      isHeadline: v.boolean(),
      baseline: v.object({ risk: v.nullable(v.union([finite, text])), periodYears: years, periodUnit: unit, source: text }),
      effects: v.array(
        v.object({
          optionId: text,
          effect,
          source: text,
          followUpYears: v.nullable(years),
          followUpUnit: unit,
          certainty,
          importance: v.optional(importance, 'important'),
        }),
      ),
    }),
  ),
  evidence: v.object({ summary: text, reviewed: text }),
  questions: v.array(text),
  clinician: v.optional(text, ''),
  patient: v.optional(v.nullable(v.object({ name: text, reference: text })), null),
  handout: v.optional(handoutChoicesSchema),
  about: v.optional(disclosuresSchema),
  screening: v.optional(screeningSchema),
  language: v.optional(text),
  translation: v.optional(translationSchema),
});

/** Schema of a version 2 to 6 file. */
export const topicFileSchema = v.object({
  format: v.literal(TOPIC_FORMAT),
  version: v.picklist([2, 3, 4, 5, TOPIC_VERSION]),
  topic: topicSchema,
});

/**
 * Schema of a version 1 file: the first layout, with the topic's fields at the top level,
 * `years` for periods, the comparison named by `comparisonId`, and effects keyed by option id.
 */
export const topicFileV1Schema = v.object({
  format: v.literal(TOPIC_FORMAT),
  version: v.literal(1),
  title: text,
  population: text,
  years,
  illustrative: v.optional(v.boolean(), false),
  comparisonId: text,
  options: v.array(v.object({ id: text, name: text })),
  outcomes: v.array(
    v.object({
      id: text,
      name: text,
      kind: v.picklist(['benefit', 'harm']),
      headline: v.optional(v.boolean(), false),
      baseline: v.object({ risk: v.nullable(v.union([finite, text])), years, source: v.optional(text, '') }),
      effects: v.record(
        text,
        v.object({ effect, source: v.optional(text, ''), followUpYears: v.optional(v.nullable(years), null), certainty }),
      ),
    }),
  ),
  source: v.optional(text, ''),
  reviewed: v.optional(text, ''),
});

export type TopicFileV1 = v.InferOutput<typeof topicFileV1Schema>;
