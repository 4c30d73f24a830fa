import { describe, expect, it } from 'vitest';
import { computeJson, estimateOf, run } from './support.ts';

interface Nnt {
  readonly estimate: number | null;
  readonly rounded: number | null;
  readonly label: string | null;
  readonly text: string;
}
interface People {
  readonly denominator: number;
  readonly comparison: number;
  readonly intervention: number;
  readonly difference: number;
}
const nntOf = (json: Record<string, unknown>): Nnt => json.nnt as Nnt;
const peopleOf = (json: Record<string, unknown>): People => json.perPeople as People;

describe('chancewise compute applies an effect to a baseline risk', () => {
  it('turns a risk ratio of 0.92 at 30% into 24 fewer per 1000 and NNT 42', async () => {
    // Cochrane Handbook 5.1 (Higgins & Green 2011) §12.5.4.2: RR 0.92, assumed comparator
    // risk 0.3 → 276 per 1000 with the intervention, 24 fewer per 1000, NNT = 1/0.024 → 42.
    const json = await computeJson(['--baseline', '0.3', '--rr', '0.92', '--per', '1000']);
    expect(estimateOf(json, 'interventionRisk')?.estimate).toBeCloseTo(0.276, 12);
    expect(estimateOf(json, 'absoluteReduction')?.estimate).toBeCloseTo(0.024, 12);
    expect(estimateOf(json, 'relativeRisk')?.estimate).toBeCloseTo(0.92, 12);
    expect(peopleOf(json)).toEqual({
      denominator: 1000,
      pictureDenominator: 1000,
      comparison: 300,
      intervention: 276,
      difference: 24,
    });
    expect(nntOf(json)).toMatchObject({ rounded: 42, label: 'NNTB', text: 'NNTB 42' });
    expect(nntOf(json).estimate).toBeCloseTo(1 / 0.024, 9);
  });

  it('turns an odds ratio of 0.73 at 30% into 62 fewer per 1000 and NNT 17', async () => {
    // Cochrane Handbook 5.1 §12.5.4.3: OR 0.73 at ACR 0.3 → 0.73·0.3/(1 − 0.3 + 0.73·0.3) = 0.2383,
    // 62 fewer per 1000, NNT = 1/0.0617 → 17.
    const json = await computeJson(['--baseline', '30%', '--or', '0.73', '--per', '1000']);
    expect(estimateOf(json, 'interventionRisk')?.estimate).toBeCloseTo(0.2383, 4);
    expect(peopleOf(json)).toEqual({
      denominator: 1000,
      pictureDenominator: 1000,
      comparison: 300,
      intervention: 238,
      difference: 62,
    });
    expect(nntOf(json)).toMatchObject({ rounded: 17, label: 'NNTB', text: 'NNTB 17' });
    // The implied risk ratio at this baseline: 0.2383 / 0.3 (derived).
    expect(estimateOf(json, 'relativeRisk')?.estimate).toBeCloseTo(0.2383 / 0.3, 3);
  });

  it('gives NNT 9 for a risk difference of 0.12 and NNT 5 for 0.22', async () => {
    // Cochrane Handbook 5.1 §12.5.4.1: NNT = 1/RD rounded up; 1/0.12 = 8.3 → 9, 1/0.22 = 4.5 → 5.
    expect(nntOf(await computeJson(['--arr', '0.12']))).toMatchObject({ rounded: 9, label: 'NNTB', text: 'NNTB 9' });
    expect(nntOf(await computeJson(['--arr', '0.22']))).toMatchObject({ rounded: 5, label: 'NNTB', text: 'NNTB 5' });
  });

  it('writes an NNT interval that crosses no effect through infinity', async () => {
    // Altman (1998) BMJ 317:1309, "Confidence intervals for the number needed to treat":
    // ARR 10% (−5% to 25%) → NNTB 10, limits 1/0.25 = 4 (benefit) and 1/0.05 = 20 (harm), through ∞.
    const json = await computeJson(['--arr', '0.10', '--ci', '-0.05,0.25']);
    expect(nntOf(json)).toMatchObject({ rounded: 10, label: 'NNTB', text: 'NNTB 10 (NNTB 4 to ∞ to NNTH 20)' });
    expect(estimateOf(json, 'absoluteReduction')).toEqual({ estimate: 0.1, lower: -0.05, upper: 0.25 });
  });

  it('writes an interval with a limit at no effect as reaching infinity', async () => {
    // Altman (1998) BMJ 317:1309: a limit of exactly no effect is an NNT of ∞.
    const json = await computeJson(['--arr', '10%', '--ci', '0%,25%']);
    expect(nntOf(json).text).toBe('NNTB 10 (NNTB 4 to ∞)');
  });

  it('labels a harm NNTH with its interval on the harm side', async () => {
    // Altman (1998) BMJ 317:1309: an increase in risk is a number needed to harm, NNTH.
    // ARR −4% → 1/0.04 = 25; the limits are exact reciprocals, −1/12 and −1/90, so NNTH 12 to 90 (derived).
    const json = await computeJson(['--arr', '-0.04', '--ci', `${-1 / 12},${-1 / 90}`]);
    expect(nntOf(json)).toMatchObject({ rounded: 25, label: 'NNTH', text: 'NNTH 25 (NNTH 12 to 90)' });
  });

  it('gives exactly NNT 100 for a risk ratio of 0.8 at 5%, despite binary rounding', async () => {
    // Common practice: 0.05 − 0.05·0.8 = 0.01 exactly, so NNT = 100 (floating point gives 100.00000000000006).
    const json = await computeJson(['--baseline', '5%', '--rr', '0.8']);
    expect(nntOf(json)).toMatchObject({ rounded: 100, label: 'NNTB', text: 'NNTB 100' });
  });

  it('gives exactly NNTH 100 for a risk ratio of 1.5 at 2%, despite binary rounding', async () => {
    // Common practice: 0.02·1.5 − 0.02 = 0.01 exactly, so NNTH = 100.
    const json = await computeJson(['--baseline', '2%', '--rr', '1.5']);
    expect(nntOf(json)).toMatchObject({ rounded: 100, label: 'NNTH', text: 'NNTH 100' });
    expect(estimateOf(json, 'absoluteReduction')?.estimate).toBeCloseTo(-0.01, 12);
  });

  it('reads a relative reduction of 25% (10% to 40%) as the risk ratio 0.75 (0.6 to 0.9)', async () => {
    // Cochrane Handbook 5.1 §12.5.4.2: RRR = 1 − RR, so the interval's ends swap (derived).
    const fromReduction = await computeJson(['--baseline', '20%', '--rrr', '25', '--ci', '10,40']);
    const fromRatio = await computeJson(['--baseline', '20%', '--rr', '0.75', '--ci', '0.6,0.9']);
    for (const key of ['interventionRisk', 'relativeRisk', 'absoluteReduction']) {
      const reduction = estimateOf(fromReduction, key);
      const ratio = estimateOf(fromRatio, key);
      expect(reduction?.estimate).toBeCloseTo(ratio?.estimate ?? Number.NaN, 12);
      expect(reduction?.lower).toBeCloseTo(ratio?.lower ?? Number.NaN, 12);
      expect(reduction?.upper).toBeCloseTo(ratio?.upper ?? Number.NaN, 12);
    }
    expect(estimateOf(fromReduction, 'relativeRisk')).toMatchObject({
      lower: expect.closeTo(0.6, 12),
      upper: expect.closeTo(0.9, 12),
    });
    expect(nntOf(fromReduction)).toEqual(nntOf(fromRatio));
    expect(peopleOf(fromReduction)).toEqual(peopleOf(fromRatio));
  });

  it('reads --rrr 25% like --rrr 25, and --ci in percent with or without the sign', async () => {
    // Common practice: a relative reduction is quoted in percent.
    const plain = await computeJson(['--baseline', '20%', '--rrr', '25', '--ci', '10,40']);
    const signed = await computeJson(['--baseline', '20%', '--rrr', '25%', '--ci', '10%,40%']);
    expect(signed).toEqual(plain);
  });

  it('refuses an interval given high end first, saying which limit is which', async () => {
    // Limits in the wrong order are almost certainly a typing mistake (common practice: refuse, do not repair).
    const found = await run(['compute', '--baseline', '20%', '--rr', '0.8', '--ci', '0.9,0.7']);
    expect(found.code).toBe(2);
    expect(found.stderr.trim().split('\n')).toHaveLength(1);
    expect(found.stderr).toContain('its first limit, 0.9, is above its second, 0.7');
  });

  it('reads every way of writing a risk alike', async () => {
    // Common practice: 0.2, 20%, 20/100, 1 in 5 and 200 per 1000 are the same risk.
    const forms = ['0.2', '20%', '20/100', '1 in 5', '200 per 1000'];
    const results = await Promise.all(forms.map((form) => computeJson(['--baseline', form, '--rr', '0.75'])));
    for (const result of results) expect(result).toEqual(results[0]);
    expect(estimateOf(results[0] ?? {}, 'interventionRisk')?.estimate).toBeCloseTo(0.15, 12);
  });

  it('reads negative values after an option: --arr -2% and --ci -0.05,0.25', async () => {
    const json = await computeJson(['--baseline', '10%', '--arr', '-2%']);
    expect(estimateOf(json, 'interventionRisk')?.estimate).toBeCloseTo(0.12, 12);
    expect(nntOf(json)).toMatchObject({ rounded: 50, label: 'NNTH' });
    const equals = await computeJson(['--arr=0.1', '--ci=-0.05,0.25']);
    expect(nntOf(equals).text).toBe('NNTB 10 (NNTB 4 to ∞ to NNTH 20)');
  });

  it('reads the level as 0.95 or 95%', async () => {
    const decimal = await computeJson(['--baseline', '20%', '--rr', '0.75', '--ci', '0.6,0.9', '--level', '0.95']);
    const percent = await computeJson(['--baseline', '20%', '--rr', '0.75', '--ci', '0.6,0.9', '--level', '95%']);
    expect(percent).toEqual(decimal);
  });

  it('accepts the highest level, 99.9%, written either way', async () => {
    // 99.9 / 100 is 0.9990000000000001 in binary floating point (common practice: compare decimals).
    const decimal = await computeJson(['--counts', '5/10,3/10', '--level', '0.999']);
    const percent = await computeJson(['--counts', '5/10,3/10', '--level', '99.9%']);
    expect(percent).toEqual(decimal);
  });
});

describe('chancewise compute converts the baseline between periods', () => {
  it('turns a 4% risk over 5 years into 15.07% over 20 years', async () => {
    // Cabot Institute, University of Bristol (2016), blog "Converting probabilities between
    // time-intervals": p₂₀ = 1 − (1 − 0.04)^(20/5) = 0.1507.
    const json = await computeJson(['--baseline', '0.04', '--rr', '0.5', '--over', '5', '--to', '20']);
    expect(estimateOf(json, 'comparisonRisk')?.estimate).toBeCloseTo(0.1507, 4);
    expect(estimateOf(json, 'interventionRisk')?.estimate).toBeCloseTo(0.1507 / 2, 4);
    const warnings = json.warnings as string[];
    expect(
      warnings.some((sentence) => sentence.includes('4%') && sentence.includes('15.07%') && sentence.includes('constant hazard')),
    ).toBe(true);
  });

  it('warns when the period asked for is longer than the follow-up of the effect', async () => {
    // Common practice: extrapolating an effect beyond its trial's follow-up is flagged.
    const json = await computeJson(['--baseline', '10%', '--rr', '0.8', '--over', '10', '--to', '15', '--followup', '5']);
    const warnings = json.warnings as string[];
    expect(warnings.some((sentence) => sentence.includes('15 years') && sentence.includes('5 years'))).toBe(true);
  });

  it('leaves the baseline alone when both periods are the same', async () => {
    const json = await computeJson(['--baseline', '10%', '--rr', '0.8', '--over', '10', '--to', '10']);
    expect(estimateOf(json, 'comparisonRisk')?.estimate).toBe(0.1);
    expect(json.warnings).toEqual([]);
  });
});

describe('chancewise compute analyses trial counts', () => {
  it('reports the difference of 56/70 and 48/80 as comparison − option, with Newcombe’s interval', async () => {
    // Newcombe (1998) Stat Med 17:873, "Interval estimation for the difference between independent
    // proportions", Table II (a): 56/70 − 48/80 = 0.2000, method 10 interval 0.0524 to 0.3339.
    // Here the option arm comes first (56/70), so comparison − option = 48/80 − 56/70 = −0.2.
    const json = await computeJson(['--counts', '56/70,48/80']);
    const difference = estimateOf(json, 'absoluteReduction');
    expect(difference?.estimate).toBeCloseTo(-0.2, 12);
    expect(difference?.lower).toBeCloseTo(-0.3339, 4);
    expect(difference?.upper).toBeCloseTo(-0.0524, 4);
    expect(estimateOf(json, 'interventionRisk')?.estimate).toBeCloseTo(0.8, 12);
    expect(estimateOf(json, 'comparisonRisk')?.estimate).toBeCloseTo(0.6, 12);
    expect(nntOf(json)).toMatchObject({ rounded: 5, label: 'NNTH' });
    expect(peopleOf(json)).toEqual({
      denominator: 100,
      pictureDenominator: 100,
      comparison: 60,
      intervention: 80,
      difference: -20,
    });
  });

  it('gives the same difference with the arms swapped, sign reversed', async () => {
    // Newcombe (1998) Table II (a), as published: option 48/80 against comparison 56/70 → +0.2 (0.0524 to 0.3339).
    const difference = estimateOf(await computeJson(['--counts', '48/80,56/70']), 'absoluteReduction');
    expect(difference?.estimate).toBeCloseTo(0.2, 12);
    expect(difference?.lower).toBeCloseTo(0.0524, 4);
    expect(difference?.upper).toBeCloseTo(0.3339, 4);
  });

  it('uses the Wald interval when asked', async () => {
    // Newcombe (1998) Table II (a), method 1 (simple asymptotic): 0.0575 to 0.3425.
    const difference = estimateOf(await computeJson(['--counts', '48/80,56/70', '--method', 'wald']), 'absoluteReduction');
    expect(difference?.lower).toBeCloseTo(0.0575, 4);
    expect(difference?.upper).toBeCloseTo(0.3425, 4);
  });

  it('carries the ratios, tests and association of the trial table', async () => {
    // Derived by hand from the textbook formulas for the table [[56, 14], [48, 32]], n = 150:
    // RR = 0.8/0.6 = 1.3333, Katz SE(log RR) = √(1/56 − 1/70 + 1/48 − 1/80) = 0.10911 → 1.0766 to 1.6512;
    // OR = (56·32)/(14·48) = 2.6667; Pearson χ² = n(ad − bc)²/(r₁r₂c₁c₂) = 7.0234; Yates χ² = 6.1143;
    // Cramér's V = √(χ²/n) = 0.2164.
    const json = await computeJson(['--counts', '56/70,48/80']);
    const ratio = estimateOf(json, 'relativeRisk');
    expect(ratio?.estimate).toBeCloseTo(4 / 3, 10);
    expect(ratio?.lower).toBeCloseTo(1.0766, 4);
    expect(ratio?.upper).toBeCloseTo(1.6512, 4);
    expect(estimateOf(json, 'oddsRatio')?.estimate).toBeCloseTo(8 / 3, 10);
    expect((json.chiSquare as { statistic: number }).statistic).toBeCloseTo(7.0234, 4);
    expect((json.chiSquareYates as { statistic: number }).statistic).toBeCloseTo(6.1143, 4);
    expect(json.cramersV as number).toBeCloseTo(0.2164, 4);
    const fisher = json.fisherExactP as number;
    expect(fisher).toBeGreaterThan(0);
    expect(fisher).toBeLessThan(0.05);
  });

  it('gives each arm a Wilson interval that widens with the level', async () => {
    // Wilson (1927) JASA 22:209: a higher level gives a wider score interval (derived).
    const at95 = estimateOf(await computeJson(['--counts', '56/70,48/80']), 'comparisonRisk');
    const at99 = estimateOf(await computeJson(['--counts', '56/70,48/80', '--level', '99%']), 'comparisonRisk');
    expect(at95?.lower).not.toBeNull();
    expect(at99?.lower ?? 1).toBeLessThan(at95?.lower ?? 0);
    expect(at99?.upper ?? 0).toBeGreaterThan(at95?.upper ?? 1);
  });
});

describe('chancewise compute counts people per 100 or per 1000', () => {
  it('keeps 100 when rounding does not distort the difference, and --per 1000 overrides it', async () => {
    // Cochrane Handbook 5.1 §12.5.4.2 example: 30% and 27.6% are 30 and 28 in 100 (common practice rounding).
    const automatic = await computeJson(['--baseline', '0.3', '--rr', '0.92']);
    expect(peopleOf(automatic)).toEqual({
      denominator: 100,
      pictureDenominator: 100,
      comparison: 30,
      intervention: 28,
      difference: 2,
    });
    const forced = await computeJson(['--baseline', '0.3', '--rr', '0.92', '--per', '1000']);
    expect(peopleOf(forced).denominator).toBe(1000);
  });

  it('raises to 1000 when per 100 would round the difference away, and --per 100 overrides it', async () => {
    // Common practice: 2% and 1.8% are both 2 in 100, so the difference would vanish; per 1000 it is 20 and 18.
    const automatic = await computeJson(['--baseline', '2%', '--rr', '0.9']);
    expect(peopleOf(automatic)).toEqual({
      denominator: 1000,
      pictureDenominator: 1000,
      comparison: 20,
      intervention: 18,
      difference: 2,
    });
    expect((automatic.warnings as string[]).some((sentence) => sentence.includes('per 1000'))).toBe(true);
    const forced = await computeJson(['--baseline', '2%', '--rr', '0.9', '--per', '100']);
    expect(peopleOf(forced)).toEqual({
      denominator: 100,
      pictureDenominator: 100,
      comparison: 2,
      intervention: 2,
      difference: 0,
    });
    expect((forced.warnings as string[]).some((sentence) => sentence.includes('per 1000'))).toBe(false);
  });
});

describe('chancewise compute prints a readable summary without --json', () => {
  it('shows the risks, the difference, the NNT and the people counts', async () => {
    // Cochrane Handbook 5.1 §12.5.4.2: RR 0.92 at 30%.
    const found = await run(['compute', '--baseline', '30%', '--rr', '0.92', '--per', '1000']);
    expect(found.code).toBe(0);
    expect(found.stderr).toBe('');
    for (const part of ['30%', '27.6%', '0.92', '2.4 percentage points', 'NNTB 42', '300', '276', '24 fewer']) {
      expect(found.stdout).toContain(part);
    }
    expect(found.stdout).not.toMatch(/NaN|Infinity|undefined|\{/);
  });

  it('shows an increase as a negative reduction and people more, with the warnings', async () => {
    const found = await run(['compute', '--baseline', '2%', '--rr', '1.5', '--ci', '1.2,1.9']);
    expect(found.code).toBe(0);
    for (const part of ['3%', '−1', 'an increase', 'NNTH 100', 'more', 'Warnings:', 'baseline risk']) {
      expect(found.stdout).toContain(part);
    }
  });

  it('shows an absolute reduction alone without risks or people', async () => {
    // Altman (1998) BMJ 317:1309 example, as above.
    const found = await run(['compute', '--arr', '0.10', '--ci', '-0.05,0.25']);
    expect(found.code).toBe(0);
    expect(found.stdout).toContain('NNTB 10 (NNTB 4 to ∞ to NNTH 20)');
    expect(found.stdout).toContain('10 (−5 to 25) percentage points');
    expect(found.stdout).not.toContain('Risk with the option');
    expect(found.stdout).not.toContain('Out of');
  });

  it('shows the trial statistics for counts', async () => {
    const found = await run(['compute', '--counts', '56/70,48/80']);
    expect(found.code).toBe(0);
    for (const part of [
      '80%',
      '60%',
      'Odds ratio',
      'Chi-square',
      '7.023',
      'Yates',
      '6.114',
      "Fisher's exact p",
      'Cramér',
      'NNTH 5',
    ]) {
      expect(found.stdout).toContain(part);
    }
  });
});
