import type { EffectQuery } from '../core/compute-effect.ts';
import { DEFAULT_LEVEL } from '../core/check-effect.ts';
import { checkArm } from '../core/counts/index.ts';
import { EFFECT_MEASURES, MEASURES } from '../core/effect-measures.ts';
import { parseNumber } from '../core/parse-number.ts';
import { parseBaselineRisk, parseSignedRisk } from '../core/parse-risk.ts';
import { InputError, fail } from '../core/problems.ts';
import type { ProblemCode, ProblemValues } from '../core/problems.ts';
import { WORDS_DENOMINATORS } from '../core/types.ts';
import type { ArmCounts, EffectMeasure, WordsDenominator } from '../core/types.ts';
import type { FlagSpec, ParsedArgs } from './parse-args.ts';
import { valueOf } from './parse-args.ts';
import type { CliWords } from './messages/cli-messages.ts';
import { UsageError } from './usage-error.ts';

/** The flag of each measure, from the registry: `--rr`, `--or`, `--hr`, `--rrr`, `--arr`. */
const MEASURE_FLAGS: readonly [string, EffectMeasure][] = MEASURES.map((measure) => [EFFECT_MEASURES[measure].flag, measure]);

/** An example value for a measure's flag, as typed on the command line (an absolute reduction in percent). */
const flagExample = (measure: EffectMeasure): string =>
  EFFECT_MEASURES[measure].example.estimate + (EFFECT_MEASURES[measure].input === 'difference' ? '%' : '');

/** The flags that describe one effect, shared by `compute` and `chart`. */
export const EFFECT_FLAGS: Readonly<Record<string, FlagSpec>> = {
  '--baseline': { takesValue: true, example: '15%' },
  ...Object.fromEntries(MEASURE_FLAGS.map(([flag, measure]) => [flag, { takesValue: true, example: flagExample(measure) }])),
  '--ci': { takesValue: true, example: '0.6,0.9' },
  '--level': { takesValue: true, example: '0.95' },
  '--over': { takesValue: true, example: '10' },
  '--to': { takesValue: true, example: '5' },
  '--followup': { takesValue: true, example: '5' },
  '--counts': { takesValue: true, example: '12/100,20/100' },
  '--method': { takesValue: true, example: 'newcombe' },
  '--per': { takesValue: true, example: '100' },
  '--wanted': { takesValue: false },
  '--opposite': { takesValue: false },
};

/** Flags that only make sense with bare effect flags, not with a topic. */
export const EFFECT_ONLY_FLAGS = Object.keys(EFFECT_FLAGS).filter((flag) => flag !== '--per');

/** Read a number, reporting anything unreadable as `code` so the message can say what is allowed. */
function readNumber(input: string, field: string, code: ProblemCode, values: ProblemValues): number {
  try {
    return parseNumber(input, field);
  } catch (error) {
    if (error instanceof InputError) fail(code, field, values);
    throw error;
  }
}

/** Read a percentage: "25" and "25%" both mean 25. */
function parsePercent(input: string, field: string): number {
  const cleaned = input.trim().replace(/%$/, '');
  return readNumber(cleaned, field, 'percent-unparsable', { input: input.trim() });
}

/** Read an interval level: 0.95 or 95%. */
export function parseLevel(input: string, field = '--level'): number {
  const trimmed = input.trim();
  const values = { input: trimmed };
  // 99.9 / 100 is 0.9990000000000001 in binary; 12 significant digits give back 0.999.
  const value = trimmed.endsWith('%')
    ? Number((readNumber(trimmed.slice(0, -1), field, 'level-out-of-range', values) / 100).toPrecision(12))
    : readNumber(trimmed, field, 'level-out-of-range', values);
  if (!(value > 0.5 && value <= 0.999)) fail('level-out-of-range', field, values);
  return value;
}

/** The longest period, in years, the command line takes. */
const MAX_YEARS = 1000;

/** Read a positive number of years. */
export function parseYears(input: string, field: string): number {
  const value = readNumber(input, field, 'period-not-positive', { input: input.trim() });
  if (!(value > 0)) fail('period-not-positive', field, { input: input.trim() });
  if (value > MAX_YEARS) fail('period-too-long', field, { input: input.trim(), limit: MAX_YEARS });
  return value;
}

/** Read --per: the words' denominator, 100 to 1,000,000 (written with or without commas). */
export function parsePer(parsed: ParsedArgs, words: CliWords): WordsDenominator | null {
  const value = valueOf(parsed, '--per');
  if (value === undefined) return null;
  const cleaned = value.trim().replace(/[,_\s]/g, '');
  const found = WORDS_DENOMINATORS.find((denominator) => String(denominator) === cleaned);
  if (found === undefined) throw new UsageError(words.usage.perValue(value));
  return found;
}

function parseValue(measure: EffectMeasure, input: string, field: string): number {
  switch (EFFECT_MEASURES[measure].input) {
    case 'percent':
      return parsePercent(input, field);
    case 'difference':
      return parseSignedRisk(input, field);
    case 'ratio':
      return parseNumber(input, field);
  }
}

function parseInterval(measure: EffectMeasure, input: string, words: CliWords): { lower: number; upper: number } {
  const parts = input.split(',');
  if (parts.length !== 2 || (parts[0] ?? '').trim() === '' || (parts[1] ?? '').trim() === '') {
    throw new UsageError(words.usage.ciFormat(input));
  }
  return { lower: parseValue(measure, parts[0] ?? '', '--ci'), upper: parseValue(measure, parts[1] ?? '', '--ci') };
}

function parseArm(input: string, whole: string): ArmCounts {
  const match = /^\s*([^/\s]+)\s*\/\s*([^/\s]+)\s*$/.exec(input);
  if (match === null) fail('counts-unparsable', '--counts', { input: whole });
  const events = readNumber(match[1] ?? '', '--counts', 'counts-unparsable', { input: whole });
  const total = readNumber(match[2] ?? '', '--counts', 'counts-unparsable', { input: whole });
  const arm = { events, total };
  checkArm(arm, '--counts', input.trim());
  return arm;
}

function parseCounts(input: string): { intervention: ArmCounts; comparison: ArmCounts } {
  const whole = input.trim();
  const arms = input.split(',');
  if (arms.length !== 2) fail('counts-unparsable', '--counts', { input: whole });
  return { intervention: parseArm(arms[0] ?? '', whole), comparison: parseArm(arms[1] ?? '', whole) };
}

function parsePeriods(parsed: ParsedArgs, words: CliWords): EffectQuery['periods'] {
  const over = valueOf(parsed, '--over');
  const to = valueOf(parsed, '--to');
  if (over === undefined && to === undefined) return null;
  if (over === undefined || to === undefined) throw new UsageError(words.usage.overAndTo());
  return { baselineYears: parseYears(over, '--over'), targetYears: parseYears(to, '--to') };
}

/**
 * Build the core's effect query from the effect flags of `compute` (and `chart`).
 *
 * @throws UsageError (worded in `words`) or InputError for anything the user must fix
 */
export function effectQueryFromFlags(parsed: ParsedArgs, words: CliWords): EffectQuery {
  const given = MEASURE_FLAGS.filter(([flag]) => parsed.flags.has(flag));
  const countsText = valueOf(parsed, '--counts');
  const baselineText = valueOf(parsed, '--baseline');
  const ciText = valueOf(parsed, '--ci');
  const levelText = valueOf(parsed, '--level');
  const methodText = valueOf(parsed, '--method');
  const per = parsePer(parsed, words);
  const followUpText = valueOf(parsed, '--followup');
  const wanted = parsed.flags.has('--wanted');
  const opposite = parsed.flags.has('--opposite');
  if (given.length > 1) throw new UsageError(words.usage.twoEffects(given[0]?.[0] ?? '', given[1]?.[0] ?? ''));
  let method: 'newcombe' | 'wald' = 'newcombe';
  if (methodText !== undefined) {
    if (countsText === undefined) throw new UsageError(words.usage.methodWithoutCounts());
    const normalised = methodText.trim().toLowerCase();
    if (normalised !== 'newcombe' && normalised !== 'wald') throw new UsageError(words.usage.methodValue(methodText));
    method = normalised;
  }
  if (countsText !== undefined) {
    if (given.length > 0) throw new UsageError(words.usage.effectWithCounts(given[0]?.[0] ?? ''));
    if (baselineText !== undefined) throw new UsageError(words.usage.baselineWithCounts());
    for (const flag of ['--ci', '--over', '--to', '--followup']) {
      if (parsed.flags.has(flag)) throw new UsageError(words.usage.effectWithCounts(flag));
    }
    const level = levelText === undefined ? DEFAULT_LEVEL : parseLevel(levelText);
    return {
      baseline: null,
      effect: { measure: 'counts', ...parseCounts(countsText), level, ...(opposite ? { opposite } : {}) },
      per,
      method,
      field: '--counts',
      wanted,
    };
  }
  const chosen = given[0];
  if (chosen === undefined) throw new UsageError(words.usage.noEffect());
  const [flag, measure] = chosen;
  if (levelText !== undefined && ciText === undefined) throw new UsageError(words.usage.levelWithoutInterval());
  const periods = parsePeriods(parsed, words);
  if (measure === 'arr' && periods !== null) throw new UsageError(words.usage.periodsWithArr());
  if (baselineText === undefined && measure !== 'arr') throw new UsageError(words.usage.baselineNeeded(flag));
  const baseline = baselineText === undefined ? null : parseBaselineRisk(baselineText, '--baseline');
  const estimate = parseValue(measure, valueOf(parsed, flag) ?? '', flag);
  const interval = ciText === undefined ? null : parseInterval(measure, ciText, words);
  const level = levelText === undefined ? DEFAULT_LEVEL : parseLevel(levelText);
  const followUpYears = followUpText === undefined ? null : parseYears(followUpText, '--followup');
  return {
    baseline,
    effect: {
      measure,
      estimate,
      lower: interval?.lower ?? null,
      upper: interval?.upper ?? null,
      level,
      ...(opposite ? { opposite } : {}),
    },
    periods,
    followUpYears,
    resultYears: periods?.targetYears ?? null,
    per,
    field: flag,
    wanted,
  };
}
