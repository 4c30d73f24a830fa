import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { computeEffect } from '../../src/core/compute-effect.ts';
import { effectSummary } from '../../src/cli/summary-text.ts';
import { computeJson, run } from './support.ts';

// Rare outcomes and honest rounding. The rules (a non-zero difference is never written as 0 or as
// "no difference"; a limit keeps its sign; one denominator large enough to show the difference as
// whole people, up to a million; a warning whenever rounding moves a difference by half a person
// or more) are common practice in presenting risks as natural frequencies (Trevena LJ et al.,
// BMC Med Inform Decis Mak 2013;13 Suppl 2:S7, on one denominator and on rounding). The numbers
// below are arithmetic on the inputs, shown beside each check.

describe('a rare outcome: baseline 0.1%, hazard ratio 0.8 (0.7 to 0.9)', () => {
  it('never says "no difference" nor "0 (0 to 0)", and counts per 10,000 so the difference is whole people', async () => {
    const found = await run(['compute', '--baseline', '0.1%', '--hr', '0.8', '--ci', '0.7,0.9']);
    expect(found.code).toBe(0);
    expect(found.stdout).not.toContain('no difference');
    expect(found.stdout).not.toContain('0 (0 to 0)');
    // 1 − 0.999^0.8 = 0.0800%: per 10,000 that is 10 without and 8 with, 2 fewer.
    expect(found.stdout).toContain('Out of 10,000 people:    10 without, 8 with the option (2 fewer)');
    expect(found.stdout).toContain('Absolute reduction:      0.02 (0.01 to 0.03) percentage points');
  });

  it('gives the words denominator and the pictures denominator in the JSON', async () => {
    const json = await computeJson(['--baseline', '0.1%', '--hr', '0.8', '--ci', '0.7,0.9']);
    expect(json.perPeople).toEqual({
      denominator: 10000,
      pictureDenominator: 1000,
      comparison: 10,
      intervention: 8,
      difference: 2,
    });
    expect(json.level).toBe(0.95);
  });
});

describe('a rare harm shown per 100 because it was asked for', () => {
  it('says the difference is too small to show as whole people, and warns', async () => {
    const found = await run(['compute', '--baseline', '0.1%', '--hr', '1.3', '--ci', '1.1,1.5', '--per', '100']);
    expect(found.stdout).not.toContain('no difference');
    expect(found.stdout).toContain('0 without, 0 with the option (fewer than 1 in 100 more: too small to show as whole people)');
    expect(found.stdout).toContain('A difference is smaller than 1 person in 100');
    // The increase keeps its sign in every limit: 1 − 0.999^1.1 − 0.001 = 0.0100 points, and so on.
    expect(found.stdout).toContain('−0.03 (−0.05 to −0.01) percentage points, negative: an increase');
  });
});

describe('trial counts of 2 and 10 events in two million each', () => {
  it('writes risks with their significant figures and counts per million', async () => {
    const found = await run(['compute', '--counts', '2/2000000,10/2000000']);
    expect(found.stdout).toContain('Risk with the option:    0.0001%');
    expect(found.stdout).toContain('Risk without the option: 0.0005%');
    expect(found.stdout).toContain('Out of 1,000,000 people: 5 without, 1 with the option (4 fewer)');
    expect(found.stdout).not.toContain('no difference');
  });
});

describe('an absolute difference that crosses no effect: 0.02 (−0.01 to 0.05) points', () => {
  it('keeps the sign of the lower limit', async () => {
    const found = await run(['compute', '--arr', '0.02%', '--ci', '-0.01%,0.05%', '--baseline', '10%']);
    expect(found.stdout).toContain('0.02 (−0.01 to 0.05) percentage points');
  });
});

describe('--per accepts the larger denominators', () => {
  it.each([
    ['10000', 10000, 1000],
    ['100,000', 100000, 1000],
    ['1000000', 1000000, 1000],
    ['100', 100, 100],
  ])('--per %s counts the words per %d and draws %d people', async (per, words, picture) => {
    const json = await computeJson(['--baseline', '20%', '--rr', '0.8', '--per', per]);
    expect(json.perPeople).toMatchObject({ denominator: words, pictureDenominator: picture });
  });
});

describe('what is almost certainly a typing mistake is refused, not repaired', () => {
  it.each([
    [['--baseline', '20%', '--rr', '0.8', '--ci', '0.9,0.7'], 'first limit, 0.9, is above its second, 0.7'],
    [['--counts', '5/2000000000,3/100'], '"5/2000000000" is more people than Chancewise counts in one arm'],
    [['--baseline', '20%', '--or', '0'], 'greater than 0'],
    [['--baseline', '20%', '--or', '1e-320'], 'impossible (0%)'],
    [['--baseline', '20%', '--or', '1e-400'], '"1e-400" is too small'],
    [['--baseline', '50%', '--rr', '2'], 'certain (100%)'],
  ])('compute %j exits 2 with one line', async (args, words) => {
    const found = await run(['compute', ...args]);
    expect(found.code).toBe(2);
    expect(found.stderr.trim().split('\n')).toHaveLength(1);
    expect(found.stderr).toContain(words);
  });
});

describe('for baselines from 1 in a million to 99%', () => {
  const baseline = fc.oneof(fc.double({ min: 1e-6, max: 0.001, noNaN: true }), fc.double({ min: 0.001, max: 0.99, noNaN: true }));
  const ratio = fc.double({ min: 0.5, max: 1.6, noNaN: true });

  it('no text says "no difference" unless the exact difference is 0, the counts add up, and rounding that moves a difference by half a person is warned of', () => {
    fc.assert(
      fc.property(baseline, ratio, fc.constantFrom(null, 100, 1000), (risk, hr, per) => {
        let result;
        try {
          result = computeEffect({ baseline: risk, effect: { measure: 'hr', estimate: hr }, per });
        } catch {
          return; // a risk outside 0% to 100%: refused, tested elsewhere
        }
        const text = effectSummary(result);
        const exact = result.absoluteReduction.estimate;
        if (exact !== 0) expect(text).not.toContain('no difference');
        const people = result.wordsPeople;
        if (people === null) throw new Error('no people');
        expect(people.difference).toBe(people.comparison - people.intervention);
        expect(people.comparison).toBeLessThanOrEqual(people.denominator);
        const shift = Math.abs(people.difference - exact * people.denominator);
        if (shift >= 0.5) expect(result.notices.map((found) => found.code)).toContain('rounding-moves-difference');
        if (per === null && exact !== 0 && Math.abs(exact) * 1e6 >= 1)
          expect(Math.abs(people.difference)).toBeGreaterThanOrEqual(1);
      }),
      { numRuns: 3000 },
    );
  });

  it('every printed limit of the difference has the sign of its exact value', () => {
    fc.assert(
      fc.property(
        baseline,
        fc.double({ min: 0.5, max: 0.99, noNaN: true }),
        fc.double({ min: 1.01, max: 1.5, noNaN: true }),
        (risk, low, high) => {
          let result;
          try {
            result = computeEffect({ baseline: risk, effect: { measure: 'rr', estimate: 1, lower: low, upper: high } });
          } catch {
            return;
          }
          const line =
            effectSummary(result)
              .split('\n')
              .find((found) => found.startsWith('Absolute reduction')) ?? '';
          const match = /\((\S+) to (\S+)\)/.exec(line);
          expect(match).not.toBeNull();
          const sign = (value: string) => (value.startsWith('−') ? -1 : value === '0' ? 0 : 1);
          expect(sign(match?.[1] ?? '')).toBe(Math.sign(result.absoluteReduction.lower ?? 0));
          expect(sign(match?.[2] ?? '')).toBe(Math.sign(result.absoluteReduction.upper ?? 0));
        },
      ),
      { numRuns: 3000 },
    );
  });
});
