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
          expect.arrayContaining(['name', 'comparisonRisk', 'interventionRisk', 'relativeRisk', 'absoluteReduction', 'nnt', 'perPeople']),
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

  it('computes the first demo: a risk ratio of 0.75 at 15% is 11 in 100 and NNTB 27', async () => {
    const json = await topicJson(['--demo']);
    expect(json.topic).toMatch(/illustrative/i);
    expect(json.denominator).toBe(100);
    expect(json.period).toBe(10);
    const standard = option(json, 0, 1);
    expect(standard.name).toBe('the standard dose');
    // 0.15 × 0.75 = 0.1125 → 11 in 100 (rounded half up); 1/0.0375 = 26.7 → NNTB 27 (derived).
    expect(standard.interventionRisk.estimate).toBeCloseTo(0.1125, 12);
    expect(standard.perPeople).toEqual({ denominator: 100, pictureDenominator: 100, comparison: 15, intervention: 11, difference: 4 });
    expect(standard.nnt).toMatchObject({ rounded: 27, label: 'NNTB' });
    expect(standard.groups).toEqual({ event: 11, prevented: 4, caused: 0, free: 85 });
    // A harm: muscle pain 5% × 1.2 = 6% → NNTH 100 (derived).
    const muscle = option(json, 1, 1);
    expect(muscle.nnt).toMatchObject({ rounded: 100, label: 'NNTH' });
    expect(muscle.groups).toEqual({ event: 5, prevented: 0, caused: 1, free: 94 });
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
    // 0.1125 × 1000 = 112.5 → 113 (rounded half up, common practice).
    expect(option(json, 0, 1).perPeople).toEqual({ denominator: 1000, pictureDenominator: 1000, comparison: 150, intervention: 113, difference: 37 });
    expect(json.warnings.some((sentence) => sentence.includes('per 1000 people, because'))).toBe(false);
  });

  it('prints a readable summary of the demo with its numbers', async () => {
    const found = await run(['compute', '--demo']);
    expect(found.code).toBe(0);
    for (const part of ['Illustrative', 'a heart attack or stroke', 'no tablet (comparison): 15 in 100', 'NNTB 27', 'NNTH 100', '15 without, 11 with the option (4 fewer)']) {
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
