import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { ROOT, estimatesIn, numbersIn, run } from './support.ts';

// The demo topics are invented, illustrative scenarios; the expected numbers below are derived
// from their entered effects with the Cochrane Handbook 5.1 §12.5.4 formulas.

interface OptionJson {
  readonly name: string;
  readonly comparison: boolean;
  readonly comparisonRisk: { estimate: number };
  readonly interventionRisk: { estimate: number };
  readonly absoluteReduction: { estimate: number; lower: number | null; upper: number | null };
  readonly nnt: { estimate: number | null; rounded: number | null; label: string | null; text: string };
  readonly perPeople: { denominator: number; comparison: number; intervention: number; difference: number };
  readonly groups: { event: number; prevented: number; caused: number; free: number };
}
interface TopicJson {
  readonly topic: string;
  readonly denominator: number;
  readonly period: number;
  readonly outcomes: readonly { name: string; kind: string; options: readonly OptionJson[] }[];
  readonly warnings: readonly string[];
}

const DEMO_FOLDER = join(ROOT, 'assets/demo');
const demoFiles = readdirSync(DEMO_FOLDER)
  .filter((name) => name.endsWith('.json'))
  .sort();

async function topicJson(args: readonly string[]): Promise<TopicJson> {
  const found = await run(['compute', ...args, '--json']);
  if (found.code !== 0) throw new Error(`exit ${found.code}: ${found.stderr}`);
  expect(found.stderr).toBe('');
  expect(found.stdout).not.toMatch(/Infinity|NaN/);
  return JSON.parse(found.stdout) as TopicJson;
}

function option(json: TopicJson, outcome: number, index: number): OptionJson {
  const found = json.outcomes[outcome]?.options[index];
  if (found === undefined) throw new Error(`no option ${index} in outcome ${outcome}`);
  return found;
}

describe('chancewise compute with a topic', () => {
  it('there are demo topics to check', () => {
    expect(demoFiles.length).toBeGreaterThanOrEqual(3);
  });

  it.each(demoFiles)('prints %s in the shape of the contract', async (name) => {
    const json = await topicJson([join(DEMO_FOLDER, name)]);
    expect(Object.keys(json)).toEqual(expect.arrayContaining(['topic', 'denominator', 'period', 'outcomes', 'warnings']));
    expect(typeof json.topic).toBe('string');
    expect([100, 1000]).toContain(json.denominator);
    expect(json.period).toBeGreaterThan(0);
    expect(json.warnings.every((sentence) => typeof sentence === 'string' && sentence.length > 0)).toBe(true);
    expect(new Set(json.warnings).size).toBe(json.warnings.length);
    for (const value of numbersIn(json)) expect(Number.isFinite(value)).toBe(true);
    for (const value of estimatesIn(json)) {
      if (value.lower !== null && value.upper !== null) expect(value.lower).toBeLessThanOrEqual(value.upper);
    }
    for (const outcome of json.outcomes) {
      expect(typeof outcome.name).toBe('string');
      expect(['benefit', 'harm']).toContain(outcome.kind);
      expect(outcome.options.filter((entry) => entry.comparison)).toHaveLength(1);
      for (const entry of outcome.options) {
        expect(Object.keys(entry)).toEqual(
          expect.arrayContaining([
            'name',
            'comparisonRisk',
            'interventionRisk',
            'relativeRisk',
            'absoluteReduction',
            'nnt',
            'perPeople',
          ]),
        );
        // One denominator for the whole topic (Trevena et al. 2013, BMC Med Inform Decis Mak 13 Suppl 2:S7, risk communication primer).
        expect(entry.perPeople.denominator).toBe(json.denominator);
        const { event, prevented, caused, free } = entry.groups;
        expect(event + prevented + caused + free).toBe(json.denominator);
        expect(entry.perPeople.difference).toBe(entry.perPeople.comparison - entry.perPeople.intervention);
        if (entry.comparison) {
          expect(entry.absoluteReduction.estimate).toBe(0);
          expect(entry.nnt.label).toBeNull();
          expect(entry.perPeople.difference).toBe(0);
        }
      }
    }
  });

  it('computes the first demo: a risk ratio of 0.6 at 4 in 10 is 24 in 100 and NNTB 7', async () => {
    const json = await topicJson(['--demo']);
    expect(json.topic).toMatch(/illustrative/i);
    expect(json.denominator).toBe(100);
    expect(json.period).toBe(5);
    const water = option(json, 0, 1);
    expect(water.name).toBe('extra water each day');
    // 0.4 × 0.6 = 0.24 → 24 in 100; 1/0.16 = 6.25 → NNTB 7 (derived).
    expect(water.interventionRisk.estimate).toBeCloseTo(0.24, 12);
    expect(water.perPeople).toEqual({
      denominator: 100,
      pictureDenominator: 100,
      comparison: 40,
      intervention: 24,
      difference: 16,
    });
    expect(water.nnt).toMatchObject({ rounded: 7, label: 'NNTB' });
    expect(water.groups).toEqual({ event: 24, prevented: 16, caused: 0, free: 60 });
    // A harm: broken sleep 15% × 1.6 = 24% → 9 more in 100, 1/0.09 = 11.1 → NNTH 11 (derived; an NNTH is rounded down).
    const night = option(json, 1, 1);
    expect(night.nnt).toMatchObject({ rounded: 11, label: 'NNTH' });
    expect(night.groups).toEqual({ event: 15, prevented: 0, caused: 9, free: 76 });
  });

  it('computes the screening demo over 15 years from a 10-year baseline, per 1000', async () => {
    const json = await topicJson([join(DEMO_FOLDER, '02-bowel-screening.json')]);
    expect(json.period).toBe(15);
    expect(json.denominator).toBe(1000);
    // Constant hazard (Fleurence & Hollenbeak 2007, PharmacoEconomics 25:3): 1 − 0.98^(15/10) = 0.02985.
    const comparison = option(json, 0, 0);
    expect(comparison.comparisonRisk.estimate).toBeCloseTo(1 - 0.98 ** 1.5, 12);
    // Hazard ratio 0.8 under proportional hazards: 1 − (1 − p)^0.8 (Altman & Andersen 1999, BMJ 319:1492).
    const screening = option(json, 0, 1);
    expect(screening.interventionRisk.estimate).toBeCloseTo(1 - (0.98 ** 1.5) ** 0.8, 12);
    expect(json.warnings.some((sentence) => sentence.includes('converted') && sentence.includes('15 years'))).toBe(true);
    expect(json.warnings.some((sentence) => sentence.includes('12 years'))).toBe(true);
    expect(json.warnings.some((sentence) => sentence.includes('per 1000'))).toBe(true);
  });

  it('computes the trial-counts demo from the comparison arm when no baseline is given', async () => {
    const json = await topicJson([join(DEMO_FOLDER, '03-fracture-medicine.json')]);
    const comparison = option(json, 0, 0);
    // 91/1000 = 9.1% (the invented trial's comparison arm).
    expect(comparison.comparisonRisk.estimate).toBeCloseTo(0.091, 12);
    // Risk ratio (52/1000)/(91/1000) applied at 9.1% gives back 5.2% (derived).
    expect(option(json, 0, 1).interventionRisk.estimate).toBeCloseTo(0.052, 12);
    expect(json.warnings.some((sentence) => sentence.includes('comparison arm'))).toBe(true);
  });

  it('uses the denominator given with --per for every option', async () => {
    const json = await topicJson(['--demo', '--per', '1000']);
    expect(json.denominator).toBe(1000);
    // 0.45 × 0.4 = 0.18 → 180 in 1000 with the citrate drink; the comparison 0.4 → 400 (derived).
    expect(option(json, 0, 2).perPeople).toEqual({
      denominator: 1000,
      pictureDenominator: 1000,
      comparison: 400,
      intervention: 180,
      difference: 220,
    });
    expect(json.warnings.some((sentence) => sentence.includes('per 1000 people, because'))).toBe(false);
  });

  it('prints a readable summary of the demo with its numbers', async () => {
    const found = await run(['compute', '--demo']);
    expect(found.code).toBe(0);
    for (const part of [
      'Illustrative',
      'another kidney stone',
      'no change (comparison): 40 in 100',
      'NNTB 7',
      'NNTH 11',
      '40 without, 24 with the option (16 fewer)',
    ]) {
      expect(found.stdout).toContain(part);
    }
    expect(found.stdout).not.toMatch(/NaN|Infinity|undefined/);
  });

  it('shows a risk below 1% with two decimals, so 0.15% is not printed as 0.1%', async () => {
    // Screening demo, bleeding: 5 per 10000 plus 0.1% (0.05% to 0.16%) → 0.15% (0.1% to 0.21%) (derived).
    const found = await run(['compute', join(DEMO_FOLDER, '02-bowel-screening.json')]);
    expect(found.stdout).toContain('Risk without the option: 0.05%');
    expect(found.stdout).toContain('Risk with the option:    0.15% (0.1% to 0.21%)');
  });
});
