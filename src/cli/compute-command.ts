import { computeEffect } from '../core/compute-effect.ts';
import { evaluateTopic } from '../core/topic/compute-topic.ts';
import { describeProblem } from '../core/messages/describe.ts';
import type { Topic } from '../core/topic/topic.ts';
import type { TopicResult } from '../core/topic/topic-result.ts';
import type { WordsDenominator } from '../core/types.ts';
import { EFFECT_FLAGS, EFFECT_ONLY_FLAGS, effectQueryFromFlags, parsePer } from './effect-flags.ts';
import { parseArgs } from './parse-args.ts';
import type { ParsedArgs } from './parse-args.ts';
import { effectJson, topicJson } from './result-json.ts';
import { effectSummary, topicSummary } from './summary-text.ts';
import { topicFromArgs } from './topic-input.ts';
import { UsageError } from './usage-error.ts';
import type { CommandOutput } from './command-output.ts';
import type { CliWords } from './messages/cli-messages.ts';

const COMPUTE_FLAGS = { ...EFFECT_FLAGS, '--json': { takesValue: false }, '--demo': { takesValue: false } };

/** Compute a topic or fail with the first problem, as the command line reports it. */
export function computeTopicOrFail(topic: Topic, per: WordsDenominator | null, words: CliWords): TopicResult {
  const evaluation = evaluateTopic(topic, { per });
  if (!evaluation.ok) {
    const [first] = evaluation.problems;
    const sentence =
      first === undefined ? words.usage.topicInvalidUnnamed() : `${first.field}: ${describeProblem(first, words.catalogue)}`;
    throw new UsageError(words.usage.topicInvalid(sentence, evaluation.problems.length));
  }
  return evaluation.result;
}

/** Reject effect flags when a topic was given. */
export function refuseEffectFlags(parsed: ParsedArgs, words: CliWords): void {
  const stray = EFFECT_ONLY_FLAGS.find((flag) => parsed.flags.has(flag));
  if (stray !== undefined) throw new UsageError(words.usage.notWithTopic(stray));
}

/** `chancewise compute`: numbers for one effect, for trial counts, or for a whole topic. */
export function runCompute(args: readonly string[], words: CliWords): CommandOutput {
  const parsed = parseArgs(args, COMPUTE_FLAGS, words);
  const json = parsed.flags.has('--json');
  const topic = topicFromArgs(parsed, words);
  if (topic !== null) {
    refuseEffectFlags(parsed, words);
    const result = computeTopicOrFail(topic, parsePer(parsed, words), words);
    return { stdout: json ? `${JSON.stringify(topicJson(result), null, 2)}\n` : topicSummary(result, words) };
  }
  const query = effectQueryFromFlags(parsed, words);
  const result = computeEffect(query);
  const wanted = query.wanted === true;
  return { stdout: json ? `${JSON.stringify(effectJson(result, wanted), null, 2)}\n` : effectSummary(result, wanted, words) };
}
