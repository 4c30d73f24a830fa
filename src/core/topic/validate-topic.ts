import { computeEffect } from '../compute-effect.ts';
import { checkArm } from '../counts/check-arm.ts';
import type { EffectComputation } from '../compute-effect.ts';
import { parseBaselineRisk } from '../parse-risk.ts';
import { problem } from '../problems.ts';
import type { Problem } from '../problems.ts';
import { checkDisclosures, checkScreening } from './check-about.ts';
import { checkText, collect } from './check-text.ts';
import { TOPIC_LIMITS } from './topic.ts';
import type { OptionEffect, Topic, TopicOutcome } from './topic.ts';

function checkPeriod(problems: Problem[], years: number, field: string): void {
  if (!Number.isFinite(years) || years <= 0) problems.push(problem('period-not-positive', field, { input: String(years) }));
  else if (years > TOPIC_LIMITS.maxPeriodYears) {
    problems.push(problem('period-too-long', field, { input: String(years), limit: TOPIC_LIMITS.maxPeriodYears }));
  }
}

function checkUnique(
  problems: Problem[],
  values: readonly string[],
  field: string,
  code: 'topic-duplicate-id' | 'topic-duplicate-name',
): void {
  const seen = new Set<string>();
  values.forEach((value, index) => {
    const key = code === 'topic-duplicate-name' ? value.trim().toLowerCase() : value;
    if (key === '') return;
    if (seen.has(key)) {
      const values: Record<string, string> = code === 'topic-duplicate-id' ? { id: value } : { name: value };
      problems.push(problem(code, `${field}.${index}.${code === 'topic-duplicate-id' ? 'id' : 'name'}`, values));
    }
    seen.add(key);
  });
}

/** Every problem of a topic, and the computations of the effects that could be computed. */
export interface TopicCheck {
  readonly problems: Problem[];
  /** Keyed by the effect entry of the topic itself. */
  readonly computed: Map<OptionEffect, EffectComputation>;
}

function checkOutcome(check: TopicCheck, topic: Topic, outcome: TopicOutcome, index: number): void {
  const { problems } = check;
  const field = `outcomes.${index}`;
  checkText(problems, outcome.name, `${field}.name`, 'outcome name', TOPIC_LIMITS.outcomeNameLength);
  checkText(problems, outcome.baseline.source, `${field}.baseline.source`, 'source', TOPIC_LIMITS.sourceLength, false);
  checkPeriod(problems, outcome.baseline.periodYears, `${field}.baseline.periodYears`);
  const allCounts = outcome.effects.length > 0 && outcome.effects.every((entry) => entry.effect.measure === 'counts');
  let baseline: number | null = null;
  const baselineProblems: Problem[] = [];
  if (outcome.baseline.risk === null) {
    if (!allCounts) baselineProblems.push(problem('baseline-missing', `${field}.baseline.risk`));
  } else {
    const risk = outcome.baseline.risk;
    collect(baselineProblems, () => {
      baseline = parseBaselineRisk(risk, `${field}.baseline.risk`);
    });
  }
  problems.push(...baselineProblems);
  const optionsById = new Map(topic.options.map((option) => [option.id, option]));
  outcome.effects.forEach((entry, effectIndex) => {
    const effectField = `${field}.effects.${effectIndex}`;
    const option = optionsById.get(entry.optionId);
    if (option === undefined) {
      problems.push(problem('topic-effect-unknown-option', `${effectField}.optionId`, { option: entry.optionId }));
      return;
    }
    if (option.isComparison) {
      problems.push(problem('topic-effect-on-comparison', `${effectField}.optionId`, { option: option.name }));
      return;
    }
    checkText(problems, entry.source, `${effectField}.source`, 'source', TOPIC_LIMITS.sourceLength, false);
    if (entry.followUpYears !== null) checkPeriod(problems, entry.followUpYears, `${effectField}.followUpYears`);
    if (entry.effect.measure === 'counts') {
      const { intervention, comparison } = entry.effect;
      const armProblems: Problem[] = [];
      collect(armProblems, () => checkArm(intervention, `${effectField}.effect.intervention`));
      collect(armProblems, () => checkArm(comparison, `${effectField}.effect.comparison`));
      problems.push(...armProblems);
      if (armProblems.length > 0) return;
    }
    if (baselineProblems.length > 0) return;
    const periodOk = outcome.baseline.periodYears > 0 && topic.periodYears > 0;
    const fromTrial = baseline === null && entry.effect.measure === 'counts' ? trialBaseline(entry.effect) : null;
    if (baseline === null && (fromTrial === null || fromTrial <= 0 || fromTrial >= 1)) {
      const arm = entry.effect.measure === 'counts' ? `${entry.effect.comparison.events}/${entry.effect.comparison.total}` : '';
      problems.push(
        entry.effect.measure === 'counts'
          ? problem('trial-baseline-unusable', `${field}.baseline.risk`, { arm })
          : problem('baseline-missing', `${field}.baseline.risk`),
      );
      return;
    }
    collect(problems, () => {
      const computation = computeEffect({
        baseline: baseline ?? fromTrial,
        effect: entry.effect,
        periods: periodOk
          ? {
              baselineYears: outcome.baseline.periodYears,
              targetYears: topic.periodYears,
              baselineUnit: outcome.baseline.periodUnit ?? 'years',
              targetUnit: topic.periodUnit ?? 'years',
            }
          : null,
        followUpYears: entry.followUpYears,
        followUpUnit: entry.followUpUnit ?? 'years',
        resultYears: topic.periodYears,
        resultUnit: topic.periodUnit ?? 'years',
        wanted: outcome.wanted === true,
        per: 100,
        field: `${effectField}.effect`,
      });
      check.computed.set(entry, computation);
    });
  });
  for (const option of topic.options) {
    if (option.isComparison) continue;
    const count = outcome.effects.filter((entry) => entry.optionId === option.id).length;
    if (count === 0)
      problems.push(problem('topic-effect-missing', `${field}.effects`, { option: option.name, outcome: outcome.name }));
    if (count > 1) problems.push(problem('topic-duplicate-id', `${field}.effects`, { id: option.id }));
  }
}

/** The comparison arm's risk of a trial, used as the baseline when none is given. */
export function trialBaseline(effect: { comparison: { events: number; total: number }; opposite?: boolean }): number | null {
  const { events, total } = effect.comparison;
  if (!(total > 0 && events >= 0 && events <= total)) return null;
  // Counts of the opposite event: the comparison arm's risk of the outcome is that of the others.
  return effect.opposite === true ? (total - events) / total : events / total;
}

/**
 * Check a whole topic and return every problem at once, each with its field path, code and
 * values, so an editor can show each beside its field without discarding what was typed.
 *
 * @example validateTopic(demoTopic) // => []
 */
export function validateTopic(topic: Topic): Problem[] {
  return checkTopic(topic).problems;
}

/** Check a whole topic, keeping the computations made along the way so they are not repeated. */
export function checkTopic(topic: Topic): TopicCheck {
  const problems: Problem[] = [];
  const check: TopicCheck = { problems, computed: new Map() };
  checkText(problems, topic.title, 'title', 'decision', TOPIC_LIMITS.titleLength);
  checkText(problems, topic.population, 'population', 'description of who the numbers are for', TOPIC_LIMITS.populationLength);
  checkPeriod(problems, topic.periodYears, 'periodYears');
  checkText(problems, topic.evidence.summary, 'evidence.summary', 'evidence summary', TOPIC_LIMITS.evidenceSummaryLength, false);
  checkText(problems, topic.clinician, 'clinician', 'clinician or practice name', TOPIC_LIMITS.clinicianLength, false);
  if (topic.questions.length > TOPIC_LIMITS.maxQuestions) {
    problems.push(
      problem('topic-text-too-long', 'questions', {
        what: 'list of questions',
        length: topic.questions.length,
        limit: TOPIC_LIMITS.maxQuestions,
      }),
    );
  }
  topic.questions.forEach((question, index) =>
    checkText(problems, question, `questions.${index}`, 'question', TOPIC_LIMITS.questionLength),
  );
  const { options, outcomes } = topic;
  if (options.length < TOPIC_LIMITS.minOptions) {
    problems.push(problem('topic-too-few-options', 'options', { limit: TOPIC_LIMITS.minOptions, count: options.length }));
  }
  if (options.length > TOPIC_LIMITS.maxOptions) {
    problems.push(problem('topic-too-many-options', 'options', { limit: TOPIC_LIMITS.maxOptions, count: options.length }));
  }
  const comparisons = options.filter((option) => option.isComparison).length;
  if (comparisons !== 1) problems.push(problem('topic-comparison-count', 'options', { count: comparisons }));
  options.forEach((option, index) =>
    checkText(problems, option.name, `options.${index}.name`, 'option name', TOPIC_LIMITS.optionNameLength),
  );
  checkUnique(
    problems,
    options.map((option) => option.id),
    'options',
    'topic-duplicate-id',
  );
  checkUnique(
    problems,
    options.map((option) => option.name),
    'options',
    'topic-duplicate-name',
  );
  if (outcomes.length < TOPIC_LIMITS.minOutcomes) problems.push(problem('topic-too-few-outcomes', 'outcomes'));
  if (outcomes.length > TOPIC_LIMITS.maxOutcomes) {
    problems.push(problem('topic-too-many-outcomes', 'outcomes', { limit: TOPIC_LIMITS.maxOutcomes, count: outcomes.length }));
  }
  const headlines = outcomes.filter((outcome) => outcome.isHeadline).length;
  if (outcomes.length > 0 && headlines !== 1) problems.push(problem('topic-headline-count', 'outcomes', { count: headlines }));
  checkUnique(
    problems,
    outcomes.map((outcome) => outcome.id),
    'outcomes',
    'topic-duplicate-id',
  );
  checkUnique(
    problems,
    outcomes.map((outcome) => outcome.name),
    'outcomes',
    'topic-duplicate-name',
  );
  outcomes.forEach((outcome, index) => checkOutcome(check, topic, outcome, index));
  if (topic.about !== undefined) checkDisclosures(problems, topic.about);
  if (topic.screening !== undefined) checkScreening(problems, topic.screening);
  return check;
}
