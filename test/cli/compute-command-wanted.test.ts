import { describe, expect, it } from 'vitest';
import { computeJson, ROOT, run } from './support.ts';

// `--wanted`: the outcome is an event people want. The contract: a top-level "wanted" always,
// nnt.label follows help and harm, absoluteReduction and perPeople.difference stay comparison −
// option. NNT = 1/|ARD| rounded up (Cochrane Handbook 5.1 §12.5.4.1), labels after Altman 1998.

describe('compute --wanted', () => {
  it('labels a wanted event made more likely NNTB, keeping the signs of the differences', async () => {
    const json = await computeJson(['--baseline', '30%', '--rr', '1.5', '--ci', '1.2,1.9', '--wanted']);
    expect(json.wanted).toBe(true);
    expect(json.nnt).toMatchObject({ rounded: 7, label: 'NNTB', text: 'NNTB 7 (NNTB 4 to 17)' });
    expect(json.absoluteReduction).toEqual({
      estimate: expect.closeTo(-0.15, 12),
      lower: expect.closeTo(-0.27, 12),
      upper: expect.closeTo(-0.06, 12),
    });
    expect(json.perPeople).toEqual({
      denominator: 100,
      pictureDenominator: 100,
      comparison: 30,
      intervention: 45,
      difference: -15,
    });
  });

  it('says wanted is false without the flag, and the rest is as before', async () => {
    const json = await computeJson(['--baseline', '30%', '--rr', '1.5', '--ci', '1.2,1.9']);
    expect(json.wanted).toBe(false);
    // The same numbers as a harm: 1/0.15 = 6.7, 1/0.27 = 3.7 and 1/0.06 = 16.7, each NNTH rounded down.
    expect(json.nnt).toMatchObject({ label: 'NNTH', text: 'NNTH 6 (NNTH 3 to 16)' });
  });

  it('labels a wanted event made less likely NNTH', async () => {
    const json = await computeJson(['--baseline', '50%', '--rr', '0.8', '--wanted']);
    expect(json.nnt).toMatchObject({ rounded: 10, label: 'NNTH', text: 'NNTH 10' });
  });

  it('works with trial counts', async () => {
    // 60/100 with the option against 40/100 without: 20 more in 100, NNTB 5.
    const json = await computeJson(['--counts', '60/100,40/100', '--wanted']);
    expect(json.wanted).toBe(true);
    expect(json.nnt).toMatchObject({ rounded: 5, label: 'NNTB' });
  });

  it('keeps --arr in the comparison − option sign', async () => {
    const json = await computeJson(['--baseline', '30%', '--arr', '-10%', '--wanted']);
    expect(json.absoluteReduction).toMatchObject({ estimate: expect.closeTo(-0.1, 12) });
    expect(json.nnt).toMatchObject({ rounded: 10, label: 'NNTB' });
  });

  it('writes the text with chances and a gain, never a risk or a reduction of the good event', async () => {
    const found = await run(['compute', '--baseline', '25%', '--rr', '1.8', '--ci', '1.4,2.3', '--wanted']);
    expect(found.code).toBe(0);
    expect(found.stdout).toContain('Chance without the option: 25%');
    expect(found.stdout).toContain('Chance with the option:    45% (35% to 57.5%)');
    expect(found.stdout).toContain('Absolute gain:             20 (10 to 32.5) percentage points');
    expect(found.stdout).toContain('Number needed to treat:    NNTB 5 (NNTB 4 to 10)');
    expect(found.stdout).not.toMatch(/Risk without|Risk with|reduction/);
  });

  it('refuses --wanted with a topic file: the topic says it per outcome', async () => {
    const found = await run(['compute', `${ROOT}assets/demo/02-bowel-screening.json`, '--wanted']);
    expect(found.code).toBe(2);
    expect(found.stderr.trim().split('\n')).toHaveLength(1);
    expect(found.stderr).toContain('--wanted cannot be used with a topic file');
  });
});

describe('compute --opposite', () => {
  it('applies a risk ratio reported for the opposite event to the chance of not having it, and warns', async () => {
    // 40% pain gone; the trial's RR 0.75 is for still being in pain: 60% × 0.75 = 45% still in pain, 55% pain gone.
    const json = await computeJson(['--baseline', '40%', '--rr', '0.75', '--ci', '0.6,0.9', '--opposite', '--wanted']);
    expect(json.interventionRisk).toMatchObject({ estimate: expect.closeTo(0.55, 12) });
    expect(json.relativeRisk).toMatchObject({ estimate: expect.closeTo(1.375, 12) });
    expect(json.nnt).toMatchObject({ label: 'NNTB', rounded: 7 });
    expect(String(json.warnings)).toContain('A ratio for one event is not the same as the inverse ratio for its opposite');
  });
});

describe('compute TOPIC --json', () => {
  it('carries wanted on each outcome', async () => {
    const json = await computeJson([`${ROOT}assets/demo/02-bowel-screening.json`]);
    const outcomes = json.outcomes as { wanted: boolean }[];
    expect(outcomes.length).toBeGreaterThan(0);
    for (const outcome of outcomes) expect(outcome.wanted).toBe(false);
  });
});
