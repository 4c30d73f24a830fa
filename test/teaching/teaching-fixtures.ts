/**
 * Topics for the teaching-view tests: the shipped demonstration topics (invented,
 * illustrative) and small two-option topics built from one baseline and one effect.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describeProblem } from '../../src/core/messages/describe.ts';
import { readTopicFile } from '../../src/core/topic/topic-file.ts';
import type { Topic, TopicOutcome } from '../../src/core/topic/topic.ts';
import { yearsFrom } from '../../src/core/time-unit.ts';
import type { TimeUnit } from '../../src/core/time-unit.ts';
import type { Denominator, EnteredEffect } from '../../src/core/types.ts';
import { presentationItem } from '../../src/teaching/presentation-item.ts';
import type { PresentationItem } from '../../src/teaching/presentation-item.ts';
import type { ItemChoices } from '../../src/teaching/teaching-set-file.ts';
import { DEFAULT_STEPS } from '../../src/teaching/teaching-steps.ts';

export const STONE = '01-kidney-stone.json';
export const SCREENING = '02-bowel-screening.json';
/** An invented topic whose headline event is wanted, with an unwanted and a wanted harm (test/fixtures/topics). */
export const WANTED = 'wanted-itch-relief.json';

/** A file of the project, by its path from the project's folder (where Vitest runs). */
export function projectFile(path: string): string {
  return join(process.cwd(), path);
}

/** A shipped demonstration topic. */
export function demoTopic(name: string): Topic {
  const reading = readTopicFile(demoText(name));
  if (!reading.ok) throw new Error(describeProblem(reading.problem));
  return reading.topic;
}

/** A topic of the test fixtures. */
export function fixtureTopic(name: string): Topic {
  const reading = readTopicFile(readFileSync(projectFile(`test/fixtures/topics/${name}`), 'utf8'));
  if (!reading.ok) throw new Error(describeProblem(reading.problem));
  return reading.topic;
}

/** The text of a demonstration topic's file. */
export function demoText(name: string): string {
  return readFileSync(projectFile(`assets/demo/${name}`), 'utf8');
}

export interface PairSettings {
  readonly baseline: string;
  readonly effect: EnteredEffect;
  /** The benefit outcome's name (default "a stroke") and whether its event is one people want. */
  readonly name?: string;
  readonly wanted?: boolean;
  /** A harm outcome, when asked for: its baseline and effect, and whether its event is wanted. */
  readonly harm?: {
    readonly baseline: string;
    readonly effect: EnteredEffect;
    readonly name?: string;
    readonly wanted?: boolean;
  };
  /** The period (default 5 years), in a unit. */
  readonly period?: { readonly amount: number; readonly unit: TimeUnit };
}

interface OutcomeSettings {
  readonly id: string;
  readonly name: string;
  readonly kind: 'benefit' | 'harm';
  readonly wanted: boolean;
  readonly baseline: string;
  readonly effect: EnteredEffect;
}

function outcome(settings: OutcomeSettings, periodYears: number, periodUnit: TimeUnit): TopicOutcome {
  const { id, name, kind, wanted, baseline, effect } = settings;
  return {
    id,
    name,
    kind,
    ...(wanted ? { wanted } : {}),
    isHeadline: kind === 'benefit',
    baseline: { risk: baseline, periodYears, periodUnit, source: 'Invented for a test' },
    effects: [
      {
        optionId: 'treated',
        effect,
        source: 'Invented for a test',
        followUpYears: periodYears,
        followUpUnit: periodUnit,
        certainty: 'moderate',
        importance: 'important',
      },
    ],
  };
}

/** A topic with a comparison, one option and a benefit outcome (and a harm if asked). */
export function pairTopic(settings: PairSettings): Topic {
  const period = settings.period ?? { amount: 5, unit: 'years' };
  const periodYears = yearsFrom(period.amount, period.unit);
  const outcomes = [
    outcome(
      {
        id: 'stroke',
        name: settings.name ?? 'a stroke',
        kind: 'benefit',
        wanted: settings.wanted === true,
        baseline: settings.baseline,
        effect: settings.effect,
      },
      periodYears,
      period.unit,
    ),
  ];
  if (settings.harm !== undefined) {
    const { harm } = settings;
    outcomes.push(
      outcome(
        {
          id: 'bleed',
          name: harm.name ?? 'a serious bleed',
          kind: 'harm',
          wanted: harm.wanted === true,
          baseline: harm.baseline,
          effect: harm.effect,
        },
        periodYears,
        period.unit,
      ),
    );
  }
  return {
    title: 'A test decision (illustrative)',
    population: 'people in a test',
    periodYears,
    periodUnit: period.unit,
    illustrative: true,
    options: [
      { id: 'untreated', name: 'no treatment', isComparison: true },
      { id: 'treated', name: 'the treatment', isComparison: false },
    ],
    outcomes,
    evidence: { summary: 'Invented for a test.', reviewed: '2026-01-01' },
    questions: [],
    clinician: '',
    patient: null,
  };
}

/** A topic ready to present, with the default choices unless given. */
export function itemOf(topic: Topic, choices: Partial<ItemChoices> = {}, per: Denominator | null = null): PresentationItem {
  const checked = presentationItem(topic, { option: null, harm: null, per, steps: DEFAULT_STEPS, ...choices });
  if (!checked.ok) throw new Error(`cannot present: ${JSON.stringify(checked.problem)}`);
  return checked.item;
}
