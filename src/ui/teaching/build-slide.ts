/**
 * The slide of one step of one presented topic.
 */
import { framingSlide } from './framing-slide.ts';
import { FORMAT_SLIDES } from './format-slides.ts';
import { teachingMessagesEn } from './messages/en.ts';
import type { TeachingMessages } from './messages/en.ts';
import type { PresentationItem } from './presentation-item.ts';
import type { Slide } from './slide-model.ts';
import { STORY_SLIDES } from './story-slides.ts';
import type { SlideSource } from './story-slides.ts';
import type { StepKind } from './teaching-steps.ts';

const BUILDERS: Readonly<Record<StepKind, (source: SlideSource) => Slide>> = {
  ...STORY_SLIDES,
  framing: framingSlide,
  ...FORMAT_SLIDES,
};

/** Build the slide of `kind` for a presented topic. */
export function buildSlide(item: PresentationItem, kind: StepKind, messages: TeachingMessages = teachingMessagesEn): Slide {
  return BUILDERS[kind]({ item, messages });
}
