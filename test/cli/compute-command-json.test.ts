import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { computeJson, estimatesIn, numbersIn, run } from './support.ts';

// The JSON printed by `chancewise compute --json` is a contract other programs read: the keys
// below, nulls where a value does not exist, lower ≤ upper, and never Infinity or NaN.

const ESTIMATE_KEYS = ['estimate', 'lower', 'upper'];
const NNT_KEYS = ['estimate', 'label', 'rounded', 'text'];
const PEOPLE_KEYS = ['comparison', 'denominator', 'difference', 'intervention', 'pictureDenominator'];
const EFFECT_KEYS = [
  'absoluteReduction',
  'comparisonRisk',
  'interventionRisk',
  'nnt',
  'perPeople',
  'level',
  'relativeRisk',
  'wanted',
  'warnings',
];
const COUNTS_KEYS = [...EFFECT_KEYS, 'chiSquare', 'chiSquareYates', 'cramersV', 'fisherExactP', 'oddsRatio'];

const keysOf = (value: unknown): string[] => Object.keys(value as object).sort();

describe('the JSON of one effect', () => {
  it('has exactly the contract keys, with the comparison risk as a point', async () => {
    const json = await computeJson(['--baseline', '20%', '--rr', '0.75', '--ci', '0.6,0.9']);
    expect(keysOf(json)).toEqual([...EFFECT_KEYS].sort());
    for (const key of ['comparisonRisk', 'interventionRisk', 'relativeRisk', 'absoluteReduction']) {
      expect(keysOf(json[key])).toEqual(ESTIMATE_KEYS);
    }
    expect(keysOf(json.nnt)).toEqual(NNT_KEYS);
    expect(keysOf(json.perPeople)).toEqual(PEOPLE_KEYS);
    expect(json.comparisonRisk).toEqual({ estimate: 0.2, lower: null, upper: null });
    // Cochrane Handbook 5.1 §12.5.4.5: each limit goes through the same formula, 0.2·0.6 and 0.2·0.9.
    expect(json.interventionRisk).toEqual({
      estimate: expect.closeTo(0.15, 12),
      lower: expect.closeTo(0.12, 12),
      upper: expect.closeTo(0.18, 12),
    });
    expect(json.absoluteReduction).toEqual({
      estimate: expect.closeTo(0.05, 12),
      lower: expect.closeTo(0.02, 12),
      upper: expect.closeTo(0.08, 12),
    });
    expect(json.warnings).toEqual(['The intervals reflect uncertainty in the effect only, not in the baseline risk.']);
  });

  it('has null bounds everywhere without an interval', async () => {
    const json = await computeJson(['--baseline', '20%', '--or', '0.8']);
    for (const key of ['comparisonRisk', 'interventionRisk', 'relativeRisk', 'absoluteReduction']) {
      expect(json[key]).toMatchObject({ lower: null, upper: null });
    }
    expect(json.warnings).toEqual([]);
  });

  it('has null risks and people for an absolute reduction alone', async () => {
    const json = await computeJson(['--arr', '3%', '--ci', '1%,5%']);
    expect(keysOf(json)).toEqual([...EFFECT_KEYS].sort());
    expect(json.comparisonRisk).toBeNull();
    expect(json.interventionRisk).toBeNull();
    expect(json.relativeRisk).toBeNull();
    expect(json.perPeople).toBeNull();
    expect(json.absoluteReduction).toEqual({ estimate: 0.03, lower: 0.01, upper: 0.05 });
    // 1/0.03 = 33.3 → 34; limits 1/0.05 = 20 and 1/0.01 = 100 (Cochrane Handbook 5.1 §12.5.4.1 rounding up).
    expect(json.nnt).toEqual({
      estimate: expect.closeTo(100 / 3, 9),
      rounded: 34,
      label: 'NNTB',
      text: 'NNTB 34 (NNTB 20 to 100)',
    });
  });

  it('has the risks when an absolute reduction comes with a baseline', async () => {
    const json = await computeJson(['--baseline', '10%', '--arr', '3%']);
    expect(json.comparisonRisk).toEqual({ estimate: 0.1, lower: null, upper: null });
    expect(json.interventionRisk).toEqual({ estimate: expect.closeTo(0.07, 12), lower: null, upper: null });
    expect(json.perPeople).toEqual({ denominator: 100, pictureDenominator: 100, comparison: 10, intervention: 7, difference: 3 });
  });

  it('has no NNT number or label at exactly no difference, only a plain phrase', async () => {
    // Altman (1998) BMJ 317:1309: with no difference the NNT is infinite, so none is given.
    const json = await computeJson(['--baseline', '20%', '--rr', '1']);
    const nnt = json.nnt as { estimate: unknown; rounded: unknown; label: unknown; text: string };
    expect([nnt.estimate, nnt.rounded, nnt.label]).toEqual([null, null, null]);
    expect(nnt.text).toMatch(/^No difference/);
    expect(nnt.text).not.toMatch(/NNT[BH]|∞|Infinity/);
    const withInterval = await computeJson(['--arr', '0', '--ci', '-0.1,0.1']);
    expect((withInterval.nnt as { text: string }).text).toContain('NNTB 10 to ∞ to NNTH 10');
  });
});

describe('the JSON of trial counts', () => {
  it('adds the trial statistics to the effect keys', async () => {
    const json = await computeJson(['--counts', '15/100,25/100']);
    expect(keysOf(json)).toEqual([...COUNTS_KEYS].sort());
    expect(keysOf(json.oddsRatio)).toEqual(ESTIMATE_KEYS);
    expect(keysOf(json.chiSquare)).toEqual(['p', 'statistic']);
    expect(keysOf(json.chiSquareYates)).toEqual(['p', 'statistic']);
    // With counts both arms carry their own Wilson interval.
    for (const key of ['comparisonRisk', 'interventionRisk', 'relativeRisk', 'absoluteReduction', 'oddsRatio']) {
      const value = json[key] as { lower: number | null; upper: number | null };
      expect(value.lower).not.toBeNull();
      expect(value.upper).not.toBeNull();
    }
  });

  it('has null ratios and tests, not Infinity, when no arm has an event', async () => {
    // Common practice: with a zero margin the ratios and the chi-square are undefined.
    const found = await run(['compute', '--counts', '0/10,0/10', '--json']);
    expect(found.code).toBe(0);
    expect(found.stdout).not.toMatch(/Infinity|NaN/);
    const json = JSON.parse(found.stdout) as Record<string, unknown>;
    expect(json.relativeRisk).toBeNull();
    expect(json.oddsRatio).toBeNull();
    expect(json.chiSquare).toBeNull();
    expect(json.cramersV).toBeNull();
    expect(json.fisherExactP).toBe(1);
    expect((json.warnings as string[]).length).toBe(1);
  });
});

// ---- many random inputs ------------------------------------------------------------------------

const RUNS = { numRuns: 10_000 };
const decimal = (value: number, digits: number): string => value.toFixed(digits).replace(/\.?0+$/, '') || '0';

/** A risk strictly between 0 and 1, written in any of the accepted forms. */
const riskText = fc.oneof(
  fc.integer({ min: 1, max: 99_999 }).map((perHundredThousand) => decimal(perHundredThousand / 100_000, 5)),
  fc.integer({ min: 1, max: 9_999 }).map((perTenThousand) => `${decimal(perTenThousand / 100, 2)}%`),
  fc.integer({ min: 2, max: 500 }).chain((total) => fc.integer({ min: 1, max: total - 1 }).map((events) => `${events}/${total}`)),
  fc.integer({ min: 2, max: 1000 }).map((people) => `1 in ${people}`),
  fc.integer({ min: 1, max: 999 }).map((count) => `${count} per 1000`),
);

/** An entered effect: flag, estimate and an optional interval around it, as typed. */
const effectArgs = fc
  .tuple(
    fc.constantFrom('--rr', '--or', '--hr', '--rrr', '--arr'),
    fc.double({ min: 0, max: 1, noNaN: true }),
    fc.double({ min: 0, max: 1, noNaN: true }),
    fc.double({ min: 0, max: 1, noNaN: true }),
    fc.boolean(),
  )
  .map(([flag, a, b, c, withInterval]) => {
    const [low, mid, high] = [a, b, c].sort((x, y) => x - y) as [number, number, number];
    const write = (value: number): string => {
      if (flag === '--rrr') return decimal(-200 + value * 299.9, 2);
      if (flag === '--arr') return decimal(-0.95 + value * 1.9, 4);
      return decimal(0.01 + value * 9.99, 3);
    };
    return withInterval ? [flag, write(mid), '--ci', `${write(low)},${write(high)}`] : [flag, write(mid)];
  });

const optional = (args: fc.Arbitrary<string[]>): fc.Arbitrary<string[]> =>
  fc.option(args, { nil: undefined }).map((found) => found ?? []);

/** Arguments of `compute` for one entered effect, mostly valid, sometimes impossible at the baseline. */
const effectCommand = fc
  .tuple(
    riskText,
    effectArgs,
    fc.boolean(),
    optional(
      fc
        .tuple(fc.integer({ min: 1, max: 40 }), fc.integer({ min: 1, max: 40 }))
        .map(([over, to]) => ['--over', String(over), '--to', String(to)]),
    ),
    optional(fc.integer({ min: 1, max: 30 }).map((years) => ['--followup', String(years)])),
    optional(fc.constantFrom('100', '1000').map((per) => ['--per', per])),
  )
  .map(([risk, effect, withBaseline, periods, followUp, per]) => {
    const isArr = effect[0] === '--arr';
    const baseline = withBaseline || !isArr ? ['--baseline', risk] : [];
    return ['compute', ...baseline, ...effect, ...(isArr ? [] : periods), ...followUp, ...per, '--json'];
  });

/** Arguments of `compute` for trial counts. */
const countsCommand = fc
  .tuple(
    fc.integer({ min: 1, max: 2000 }).chain((total) => fc.integer({ min: 0, max: total }).map((events) => `${events}/${total}`)),
    fc.integer({ min: 1, max: 2000 }).chain((total) => fc.integer({ min: 0, max: total }).map((events) => `${events}/${total}`)),
    optional(fc.constantFrom('0.8', '90%', '0.95', '99%', '0.999').map((level) => ['--level', level])),
    optional(fc.constantFrom('newcombe', 'wald').map((method) => ['--method', method])),
    optional(fc.constantFrom('100', '1000').map((per) => ['--per', per])),
  )
  .map(([option, comparison, level, method, per]) => [
    'compute',
    '--counts',
    `${option},${comparison}`,
    ...level,
    ...method,
    ...per,
    '--json',
  ]);

const TOLERANCE = 1e-12;

/** What is wrong with one successful run's JSON, as sentences; empty when it keeps the contract. */
function contractBreaches(json: Record<string, unknown>): string[] {
  const breaches: string[] = [];
  if (numbersIn(json).some((value) => !Number.isFinite(value))) breaches.push('a number is not finite');
  for (const value of estimatesIn(json)) {
    if (value.lower === null || value.upper === null) {
      if (value.lower !== value.upper) breaches.push(`only one bound is null: ${JSON.stringify(value)}`);
      continue;
    }
    if (!(value.lower <= value.upper)) breaches.push(`lower above upper: ${JSON.stringify(value)}`);
    if (value.estimate < value.lower - TOLERANCE || value.estimate > value.upper + TOLERANCE) {
      breaches.push(`estimate outside its interval: ${JSON.stringify(value)}`);
    }
  }
  const people = json.perPeople as {
    denominator: number;
    pictureDenominator: number;
    comparison: number;
    intervention: number;
    difference: number;
  } | null;
  if (people !== null) {
    if (![100, 1000, 10000, 100000, 1000000].includes(people.denominator)) breaches.push(`denominator ${people.denominator}`);
    if (
      people.pictureDenominator !== Math.min(people.denominator, 1000) &&
      !(people.denominator === 100 && people.pictureDenominator === 100)
    ) {
      breaches.push(`picture denominator ${people.pictureDenominator} for words per ${people.denominator}`);
    }
    if (people.difference !== people.comparison - people.intervention)
      breaches.push('difference is not comparison − intervention');
    for (const count of [people.comparison, people.intervention]) {
      if (!Number.isInteger(count) || count < 0 || count > people.denominator) breaches.push(`people count ${count}`);
    }
  }
  const nnt = json.nnt as { estimate: number | null; rounded: number | null; label: string | null; text: string };
  const reduction = json.absoluteReduction as { estimate: number };
  if (reduction.estimate === 0) {
    if (nnt.estimate !== null || nnt.rounded !== null || nnt.label !== null) breaches.push('an NNT at no difference');
  } else {
    if (nnt.label !== (reduction.estimate > 0 ? 'NNTB' : 'NNTH'))
      breaches.push(`label ${String(nnt.label)} for ${reduction.estimate}`);
    if (!Number.isInteger(nnt.rounded)) breaches.push(`rounded NNT ${String(nnt.rounded)}`);
    if (!nnt.text.startsWith(`${nnt.label ?? ''} ${String(nnt.rounded)}`)) breaches.push(`NNT text "${nnt.text}"`);
  }
  return breaches;
}

/** Check one run against the contract, whatever the input. */
async function expectContract(args: readonly string[]): Promise<'done' | 'refused'> {
  const found = await run(args);
  const where = `${args.join(' ')} → exit ${found.code}: ${found.stderr}`;
  if (found.code === 2) {
    const oneLine =
      found.stdout === '' && found.stderr.trimEnd().split('\n').length === 1 && !/Infinity|NaN|undefined/.test(found.stderr);
    if (!oneLine) expect.fail(`a refusal broke the contract: ${where}`);
    return 'refused';
  }
  if (found.code !== 0 || found.stderr !== '' || /Infinity|NaN/.test(found.stdout)) expect.fail(where);
  const breaches = contractBreaches(JSON.parse(found.stdout) as Record<string, unknown>);
  if (breaches.length > 0) expect.fail(`${args.join(' ')}: ${breaches.join('; ')}`);
  return 'done';
}

describe('the JSON for many random inputs', () => {
  it('never holds Infinity or NaN and keeps lower ≤ estimate ≤ upper, for entered effects', async () => {
    const outcomes = { done: 0, refused: 0 };
    await fc.assert(
      fc.asyncProperty(effectCommand, async (args) => {
        outcomes[await expectContract(args)] += 1;
      }),
      RUNS,
    );
    // Most random effects are possible at their baseline; some (a large risk ratio at a high risk) are not.
    expect(outcomes.done).toBeGreaterThan(outcomes.refused);
  });

  it('never holds Infinity or NaN and keeps lower ≤ estimate ≤ upper, for trial counts', async () => {
    const outcomes = { done: 0, refused: 0 };
    await fc.assert(
      fc.asyncProperty(countsCommand, async (args) => {
        outcomes[await expectContract(args)] += 1;
      }),
      RUNS,
    );
    expect(outcomes.refused).toBe(0);
  });

  it('answers every mixture of options with exit 0 or 2, never a crash', async () => {
    const token = fc.oneof(
      fc.constantFrom(
        '--baseline',
        '--rr',
        '--or',
        '--hr',
        '--rrr',
        '--arr',
        '--ci',
        '--level',
        '--over',
        '--to',
        '--followup',
        '--counts',
        '--method',
        '--per',
        '--json',
        '--demo',
      ),
      fc.constantFrom(
        '0.2',
        '20%',
        '1 in 5',
        '-0.05,0.25',
        '0.6,0.9',
        '5',
        '0',
        '-1',
        '1e400',
        'wald',
        '1000',
        '12/100,20/100',
        '',
        ',',
        '%',
        '∞',
        '--',
        '-',
      ),
      fc.string({ maxLength: 6 }),
    );
    await fc.assert(
      fc.asyncProperty(fc.array(token, { maxLength: 8 }), async (tokens) => {
        const args = ['compute', ...tokens.filter((value) => !value.endsWith('.json')), '--json'];
        const found = await run(args);
        const kept =
          found.code === 2
            ? found.stdout === '' && found.stderr.trimEnd().split('\n').length === 1
            : found.code === 0 && !/Infinity|NaN/.test(found.stdout);
        if (!kept) expect.fail(`${args.join(' ')} → exit ${found.code}: ${found.stderr}`);
      }),
      { numRuns: 10_000 },
    );
  });
});
