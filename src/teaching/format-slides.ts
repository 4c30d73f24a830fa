/**
 * The format demonstrations: the same result drawn with 100 and with 1000 people,
 * grouped and scattered, and as two totals or with the change as its own group. Each
 * says in one line what the research found, with its source.
 */
import { evaluateTopic } from '../core/topic/compute-topic.ts';
import type { Denominator } from '../core/types.ts';
import { DEFAULT_SCATTER_SEED } from '../render/icon-array-layout.ts';
import { benefitOutcome, headlineOutcome } from './presentation-item.ts';
import type { Slide } from './slide-model.ts';
import { armsOf, optionPanel, slide } from './story-slides.ts';
import type { OutcomeArms, SlideSource } from './story-slides.ts';
import { peoplePanel } from './people-panel.ts';

/** The arms of the result shown by the demonstrations, computed per `per` people. */
function demonstrationArms(source: SlideSource, per: Denominator | null): OutcomeArms | null {
  const { item } = source;
  const result =
    per === null
      ? item.result
      : (() => {
          const evaluation = evaluateTopic(item.topic, { per });
          return evaluation.ok ? evaluation.result : null;
        })();
  if (result === null) return null;
  return armsOf(benefitOutcome(result) ?? headlineOutcome(result), item.optionId);
}

function denominatorSlide(source: SlideSource): Slide {
  const hundred = demonstrationArms(source, 100);
  const thousand = demonstrationArms(source, 1000);
  if (hundred === null || thousand === null) return slide('denominator', source, {});
  const words = source.messages.clinician.panels;
  return slide('denominator', source, {
    layout: 'wide-pair',
    panels: [
      optionPanel(hundred, source, { id: 'per-100', title: words.denominatorCaption(100) }),
      optionPanel(thousand, source, { id: 'per-1000', title: words.denominatorCaption(1000) }),
    ],
    evidence: source.messages.clinician.evidence.denominator,
  });
}

function arrangementSlide(source: SlideSource): Slide {
  const arms = demonstrationArms(source, null);
  if (arms === null) return slide('arrangement', source, {});
  const words = source.messages.clinician.panels;
  const scattered = peoplePanel(
    {
      id: 'scattered',
      title: words.scattered,
      groups: arms.option.groups,
      outcome: arms.outcome.name,
      option: arms.option.name,
      wanted: arms.outcome.wanted,
      arrangement: 'scattered',
      seed: DEFAULT_SCATTER_SEED,
    },
    source.messages.patient,
  );
  return slide('arrangement', source, {
    layout: 'pair',
    panels: [optionPanel(arms, source, { id: 'grouped', title: words.grouped }), scattered],
    evidence: source.messages.clinician.evidence.arrangement,
  });
}

function incrementalSlide(source: SlideSource): Slide {
  const arms = demonstrationArms(source, null);
  if (arms === null) return slide('incremental', source, {});
  const words = source.messages.clinician.panels;
  return slide('incremental', source, {
    layout: 'pair',
    panels: [
      optionPanel(arms, source, { id: 'totals', title: words.totalsOnly, totals: true }),
      optionPanel(arms, source, { id: 'change', title: words.withChange }),
    ],
    lines: [
      {
        text: source.messages.patient.story.totalWithout(
          arms.comparison.groups.event,
          arms.comparison.groups.denominator,
          arms.comparison.name,
        ),
        tone: 'note',
        look: null,
      },
    ],
    evidence: source.messages.clinician.evidence.incremental,
  });
}

/** The format demonstration slides, by step. */
export const FORMAT_SLIDES = {
  denominator: denominatorSlide,
  arrangement: arrangementSlide,
  incremental: incrementalSlide,
} as const;
