/**
 * The shape of a stored draft (autosave), checked on reading so that a damaged or older
 * copy in the browser's storage is refused rather than loaded half-way.
 */
import * as v from 'valibot';
import { MEASURES } from '../../core/effect-measures.ts';
import { DEFAULT_HANDOUT_CHOICES, EMPTY_DISCLOSURES } from '../../core/topic/topic.ts';
import { disclosuresSchema, handoutChoicesSchema, translationSchema } from '../../core/topic/topic-schema.ts';
import { EMPTY_SCREENING } from './topic-draft.ts';
import type { TopicDraft } from './topic-draft.ts';

const text = v.string();
// Drafts stored before units, wanted events and opposite-event effects existed read with their defaults.
const unit = v.optional(v.picklist(['days', 'weeks', 'months', 'years']), 'years');
const flag = v.optional(v.boolean(), false);

const effectDraftSchema = v.object({
  optionId: text,
  measure: v.picklist([...MEASURES, 'counts']),
  estimate: text,
  lower: text,
  upper: text,
  level: v.nullable(v.pipe(v.number(), v.finite())),
  opposite: flag,
  interventionEvents: text,
  interventionTotal: text,
  comparisonEvents: text,
  comparisonTotal: text,
  source: text,
  followUpYears: text,
  followUpUnit: unit,
  certainty: v.picklist(['high', 'moderate', 'low', 'very-low']),
  importance: v.picklist(['important', 'trivial']),
});

/** Schema of a whole draft. */
export const topicDraftSchema = v.object({
  title: text,
  population: text,
  periodYears: text,
  periodUnit: unit,
  illustrative: v.boolean(),
  options: v.array(v.object({ id: text, name: text, isComparison: v.boolean() })),
  outcomes: v.array(
    v.object({
      id: text,
      name: text,
      kind: v.picklist(['benefit', 'harm']),
      wanted: flag,
      isHeadline: v.boolean(),
      baselineRisk: text,
      baselinePeriodYears: text,
      baselinePeriodUnit: unit,
      baselineSource: text,
      effects: v.array(effectDraftSchema),
    }),
  ),
  evidenceSummary: text,
  evidenceReviewed: text,
  questions: v.array(text),
  clinician: text,
  patientName: text,
  patientReference: text,
  // Drafts stored before the handout's choices were kept read with the defaults.
  handout: v.optional(handoutChoicesSchema, DEFAULT_HANDOUT_CHOICES),
  // Drafts stored before the disclosures and the screening section read with them empty.
  about: v.optional(disclosuresSchema, EMPTY_DISCLOSURES),
  screening: v.optional(v.object({ positiveLeadsTo: text, missedCase: text, overdiagnosis: text }), EMPTY_SCREENING),
  // Drafts stored before topics had a patient language are English and not copies.
  language: v.optional(text, 'en'),
  translation: v.optional(v.nullable(translationSchema), null),
});

/** The draft in `data`, or null when it is not a whole draft. */
export function parseDraft(data: unknown): TopicDraft | null {
  const parsed = v.safeParse(topicDraftSchema, data);
  return parsed.success ? parsed.output : null;
}
