import * as v from 'valibot';

/** The name every topic file carries in its `format` field. */
export const TOPIC_FORMAT = 'chancewise-topic';
/** The version this build writes. Older versions are migrated on reading. */
export const TOPIC_VERSION = 2;

const text = v.string();
const years = v.pipe(v.number(), v.finite());
const finite = v.pipe(v.number(), v.finite());
const bound = v.optional(v.nullable(finite));
const whole = v.pipe(v.number(), v.integer());
const arm = v.object({ events: whole, total: whole });

const enteredEffect = v.object({
  measure: v.picklist(['rr', 'or', 'hr', 'rrr', 'arr']),
  estimate: finite,
  lower: bound,
  upper: bound,
  level: v.optional(finite),
});
const countsEffect = v.object({
  measure: v.literal('counts'),
  intervention: arm,
  comparison: arm,
  level: v.optional(finite),
});
const effect = v.variant('measure', [countsEffect, enteredEffect]);

const certainty = v.picklist(['high', 'moderate', 'low', 'very-low']);
const importance = v.picklist(['important', 'trivial']);

/** Schema of one topic, as stored (version 2). */
export const topicSchema = v.object({
  title: text,
  population: text,
  periodYears: years,
  illustrative: v.boolean(),
  options: v.array(v.object({ id: text, name: text, isComparison: v.boolean() })),
  outcomes: v.array(
    v.object({
      id: text,
      name: text,
      kind: v.picklist(['benefit', 'harm']),
      isHeadline: v.boolean(),
      baseline: v.object({ risk: v.nullable(v.union([finite, text])), periodYears: years, source: text }),
      effects: v.array(
        v.object({
          optionId: text,
          effect,
          source: text,
          followUpYears: v.nullable(years),
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
});

/** Schema of a version 2 file. */
export const topicFileSchema = v.object({
  format: v.literal(TOPIC_FORMAT),
  version: v.literal(TOPIC_VERSION),
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
