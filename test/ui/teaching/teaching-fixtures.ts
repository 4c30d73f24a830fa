/**
 * Topics for the teaching-view tests: the shipped demonstration topics (invented,
 * illustrative) and small two-option topics built from one baseline and one effect.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describeProblem } from '../../../src/core/messages/describe.ts';
import { readTopicFile } from '../../../src/core/topic/topic-file.ts';
import type { Topic, TopicOutcome } from '../../../src/core/topic/topic.ts';
import type { Denominator, EnteredEffect } from '../../../src/core/types.ts';
import { presentationItem } from '../../../src/ui/teaching/presentation-item.ts';
import type { PresentationItem } from '../../../src/ui/teaching/presentation-item.ts';
import type { ItemChoices } from '../../../src/ui/teaching/teaching-set-file.ts';
import { DEFAULT_STEPS } from '../../../src/ui/teaching/teaching-steps.ts';

export const STONE = '01-kidney-stone.json';
export const SCREENING = '02-bowel-screening.json';

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

/** The text of a demonstration topic's file. */
export function demoText(name: string): string {
  return readFileSync(projectFile(`assets/demo/${name}`), 'utf8');
}

export interface PairSettings {
  readonly baseline: string;
  readonly effect: EnteredEffect;
  /** A harm outcome, when wanted: its baseline and effect. */
  readonly harm?: { readonly baseline: string; readonly effect: EnteredEffect };
  readonly periodYears?: number;
}

function outcome(id: string, name: string, kind: 'benefit' | 'harm', baseline: string, effect: EnteredEffect, periodYears: number): TopicOutcome {
  return {
    id,
    name,
    kind,
    isHeadline: kind === 'benefit',
    baseline: { risk: baseline, periodYears, source: 'Invented for a test' },
    effects: [{ optionId: 'treated', effect, source: 'Invented for a test', followUpYears: periodYears, certainty: 'moderate', importance: 'important' }],
  };
}

/** A topic with a comparison, one option and a benefit outcome (and a harm if asked). */
export function pairTopic(settings: PairSettings): Topic {
  const periodYears = settings.periodYears ?? 5;
  const outcomes = [outcome('stroke', 'a stroke', 'benefit', settings.baseline, settings.effect, periodYears)];
  if (settings.harm !== undefined) outcomes.push(outcome('bleed', 'a serious bleed', 'harm', settings.harm.baseline, settings.harm.effect, periodYears));
  return {
    title: 'A test decision (illustrative)',
    population: 'people in a test',
    periodYears,
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
