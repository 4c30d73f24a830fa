/**
 * The chart models of the check page: the bench's own topic (bench/fixtures/, invented
 * numbers kept fixed, so the checks and the chart benchmark do not move with the examples), each
 * outcome with the comparison and extra water side by side, so every chart has two
 * arrays of the chosen number of people.
 */
import demoText from '../../bench/fixtures/bench-topic.chancewise.json?raw';
import { computeTopic } from '../../src/core/topic/compute-topic.ts';
import type { Topic } from '../../src/core/topic/topic.ts';
import { readTopicFile } from '../../src/core/topic/topic-file.ts';
import type { Denominator } from '../../src/core/types.ts';
import { type ChartModel, outcomeChart } from '../../src/render/chart-model.ts';

/** The option drawn beside the comparison. */
export const SHOWN_OPTION = 'water';

/** The check page's topic as read from its file. */
export function demoTopic(): Topic {
  const reading = readTopicFile(demoText);
  if (!reading.ok) throw new Error('the check page’s topic does not read');
  return reading.topic;
}

/** The topic with one outcome's baseline risk replaced (for redraws with changed counts). */
export function withBaseline(topic: Topic, outcomeId: string, risk: string): Topic {
  return {
    ...topic,
    outcomes: topic.outcomes.map((outcome) =>
      outcome.id === outcomeId ? { ...outcome, baseline: { ...outcome.baseline, risk } } : outcome,
    ),
  };
}

/** One chart per outcome (headline first), comparison and {@link SHOWN_OPTION} only. */
export function demoChartModels(topic: Topic, per: Denominator): ChartModel[] {
  const result = computeTopic(topic, { per });
  const ordered = [...result.outcomes].sort((first, second) => Number(second.isHeadline) - Number(first.isHeadline));
  return ordered.map((outcome) => outcomeChart(result, outcome.outcomeId, { optionIds: [SHOWN_OPTION] }));
}

/** The headline outcome's chart at a given baseline risk. */
export function headlineChartAt(topic: Topic, per: Denominator, risk: string): ChartModel {
  const headline = topic.outcomes.find((outcome) => outcome.isHeadline) ?? topic.outcomes[0];
  if (headline === undefined) throw new Error('the check page’s topic has no outcome');
  const [model] = demoChartModels(withBaseline(topic, headline.id, risk), per);
  if (model === undefined) throw new Error('no chart for the headline outcome');
  return model;
}
