/**
 * The steps of a teaching presentation, in their default order: the story of one
 * result told with people (the decision, without and with the option, who is helped,
 * who is harmed, how sure we are, the words a patient hears), then the same result
 * framed four ways, then three demonstrations of how the format changes what people
 * perceive.
 */

/** Every step kind, in the default order. */
export const STEP_KINDS = [
  'title',
  'baseline',
  'with-option',
  'helped',
  'harmed',
  'uncertainty',
  'patient-words',
  'framing',
  'denominator',
  'arrangement',
  'incremental',
] as const;

export type StepKind = (typeof STEP_KINDS)[number];

/** The steps shown when a topic or set item names none. */
export const DEFAULT_STEPS: readonly StepKind[] = STEP_KINDS;

/** The format demonstrations: commentary for trainees, in the clinician's language. */
export const LESSON_STEP_KINDS = ['framing', 'denominator', 'arrangement', 'incremental'] as const;

export type LessonStepKind = (typeof LESSON_STEP_KINDS)[number];

/** The steps that tell the topic's own story, in the topic's language. */
export type StoryStepKind = Exclude<StepKind, LessonStepKind>;

/** Whether a step is one of the format demonstrations. */
export function isLessonStep(kind: StepKind): kind is LessonStepKind {
  return (LESSON_STEP_KINDS as readonly StepKind[]).includes(kind);
}
