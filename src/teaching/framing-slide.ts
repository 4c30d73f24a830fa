/**
 * The framing step: one result as a relative change, an absolute difference, a
 * number needed to treat and people, side by side, so that trainees see one fact
 * described four ways. The figures are the core's own: its risk ratio, its absolute
 * reduction, its rounded people counts and its NNT. The words follow the event's direction:
 * an unwanted event has a lower or higher risk and is prevented or caused; a wanted one is
 * had by more or fewer people, never a "risk".
 */
import { changeOf } from '../core/direction.ts';
import type { ChangeDirection } from '../core/direction.ts';
import type { OptionOutcomeResult } from '../core/topic/topic-result.ts';
import type { Denominator } from '../core/types.ts';
import { benefitOutcome, headlineOutcome } from './presentation-item.ts';
import type { FramingCard, Slide } from './slide-model.ts';
import { armsOf, optionPanel, slide } from './story-slides.ts';
import type { SlideSource } from './story-slides.ts';

/** The one result in every frame. */
export interface FramingNumbers {
  readonly denominator: Denominator;
  /** The outcome's event is one people want. */
  readonly wanted: boolean;
  /** The comparison's and the option's risks, per denominator, unrounded. */
  readonly from: number;
  readonly to: number;
  /** |1 − risk ratio| as a whole percent; null without a ratio or when it rounds to 0. */
  readonly relativePercent: number | null;
  readonly relativeDirection: 'lower' | 'higher' | null;
  /** The difference as drawn (rounded people) and unrounded, both per denominator and without sign. */
  readonly people: number;
  readonly exact: number;
  /** Whether fewer or more people have the event with the option (as drawn); null when the drawn counts are the same. */
  readonly direction: 'fewer' | 'more' | null;
  /** Whether the option helps or harms on this outcome (unrounded, as the NNT counts it). */
  readonly change: ChangeDirection;
  /** The NNT as the core rounds it (up), and before rounding; null when there is no difference. */
  readonly nnt: number | null;
  readonly nntExact: number | null;
  readonly nntLabel: 'NNTB' | 'NNTH' | null;
}

/** A percentage to a whole number, half away from zero, after trimming float noise to 12 digits (as the core's relative sentence). */
function wholePercent(value: number): number {
  const trimmed = Number(Math.abs(value).toPrecision(12));
  return Math.sign(value) * Math.floor(trimmed + 0.5);
}

/** The framing figures of one option against the comparison. */
export function framingNumbers(option: OptionOutcomeResult, denominator: Denominator, wanted: boolean): FramingNumbers {
  const ratio = option.relativeRisk?.estimate ?? null;
  const percent = ratio === null || !Number.isFinite(ratio) ? null : Math.abs(wholePercent((1 - ratio) * 100));
  const reduction = option.absoluteReduction.estimate;
  const people = option.perPeople.difference;
  const towards = (difference: number): 'fewer' | 'more' | null => (difference > 0 ? 'fewer' : difference < 0 ? 'more' : null);
  return {
    denominator,
    wanted,
    from: option.comparisonRisk.estimate * denominator,
    to: option.interventionRisk.estimate * denominator,
    relativePercent: percent === 0 ? null : percent,
    relativeDirection: ratio === null || percent === null || percent === 0 ? null : ratio < 1 ? 'lower' : 'higher',
    people: Math.abs(people),
    exact: Math.abs(reduction * denominator),
    direction: towards(people),
    change: changeOf(reduction, wanted),
    nnt: option.nnt.rounded,
    nntExact: option.nnt.estimate,
    nntLabel: option.nnt.label,
  };
}

/** The three figure cards of the framing step. */
export function framingCards(numbers: FramingNumbers, source: SlideSource): FramingCard[] {
  const words = source.messages.patient.framing;
  const shortDecimal = source.messages.patient.decimal;
  const { denominator } = numbers;
  const from = shortDecimal(numbers.from);
  const to = shortDecimal(numbers.to);
  const relative: FramingCard =
    numbers.relativePercent === null || numbers.relativeDirection === null
      ? { id: 'relative', label: words.relativeLabel, value: words.relativeNone, detail: null }
      : {
          id: 'relative',
          label: words.relativeLabel,
          value: words.relativeValue(numbers.relativePercent, numbers.relativeDirection, numbers.wanted),
          detail: words.relativeDetail(from, to, denominator),
        };
  const absolute: FramingCard =
    numbers.direction === null
      ? { id: 'absolute', label: words.absoluteLabel, value: words.absoluteNone(denominator), detail: null }
      : {
          id: 'absolute',
          label: words.absoluteLabel,
          value: words.absoluteValue(numbers.people, denominator, numbers.direction),
          detail:
            numbers.direction === 'fewer'
              ? words.absoluteDetail(from, to, shortDecimal(numbers.exact), denominator, 'fewer')
              : words.absoluteDetail(to, from, shortDecimal(numbers.exact), denominator, 'more'),
        };
  const nnt: FramingCard =
    numbers.nnt === null || numbers.nntExact === null || numbers.change === 'none'
      ? { id: 'nnt', label: words.nntLabel, value: words.nntNone, detail: null }
      : {
          id: 'nnt',
          label: numbers.nntLabel ?? words.nntLabel,
          value: words.nntValue(numbers.nnt, numbers.change, numbers.wanted),
          detail: words.nntDetail(
            denominator,
            shortDecimal(numbers.exact),
            shortDecimal(numbers.nntExact),
            numbers.nnt,
            numbers.change === 'harms' ? 'down' : 'up',
          ),
        };
  return [relative, absolute, nnt];
}

/** The framing slide: the option's people beside the three figure cards. */
export function framingSlide(source: SlideSource): Slide {
  const { result, optionId } = source.item;
  const arms = armsOf(benefitOutcome(result) ?? headlineOutcome(result), optionId);
  if (arms === null) return slide('framing', source, {});
  const numbers = framingNumbers(arms.option, result.denominator, arms.outcome.wanted);
  return slide('framing', source, {
    layout: 'cards',
    panels: [optionPanel(arms, source)],
    cards: framingCards(numbers, source),
    evidence: source.messages.clinician.evidence.framing,
  });
}
