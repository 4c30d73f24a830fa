/**
 * The slide of one step of one presented topic.
 */
import { framingSlide } from './framing-slide.ts';
import { FORMAT_SLIDES } from './format-slides.ts';
import { teachingMessagesEn } from './messages/en.ts';
import type { TeachingMessages } from './messages/teaching-messages.ts';
import type { PresentationItem } from './presentation-item.ts';
import type { Slide } from './slide-model.ts';
import { STORY_SLIDES, patientWordsParts } from './story-slides.ts';
import type { SlideSource } from './story-slides.ts';
import type { StepKind } from './teaching-steps.ts';

const BUILDERS: Readonly<Record<StepKind, (source: SlideSource) => Slide>> = {
  ...STORY_SLIDES,
  framing: framingSlide,
  ...FORMAT_SLIDES,
};

/**
 * How many slides a step has for a presented topic: one for each harm on the harm step (one
 * that says there is none when the topic lists none), the headline and then the harms on the
 * patient's words when there are several harms, one for every other step.
 */
export function slideCount(item: PresentationItem, kind: StepKind): number {
  if (kind === 'harmed') return Math.max(1, item.harmIds.length);
  if (kind === 'patient-words') return patientWordsParts(item).length;
  return 1;
}

/** Build the slide of `kind` for a presented topic; `part` picks one of a step's several slides (see `slideCount`). */
export function buildSlide(
  item: PresentationItem,
  kind: StepKind,
  messages: TeachingMessages = teachingMessagesEn,
  part = 0,
): Slide {
  return BUILDERS[kind]({ item, messages, part });
}
