import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { main } from '../../src/cli/main.ts';

async function run(args: string[]) {
  let stdout = '';
  let stderr = '';
  const code = await main(args, { stdout: (text) => (stdout += text), stderr: (text) => (stderr += text) });
  return { code, stdout, stderr };
}

/** People per group: each people's shape names its group and how many it draws. */
function groupCounts(svg: string): Record<string, number> {
  const counts: Record<string, number> = {};
  for (const match of svg.matchAll(/data-outcome="([a-z]+)" data-count="(\d+)"/g))
    counts[match[1] ?? ''] = (counts[match[1] ?? ''] ?? 0) + Number(match[2]);
  return counts;
}

/** People of `group` drawn with `fill`. */
function paintedCount(svg: string, group: string, fill: string): number {
  let count = 0;
  for (const match of svg.matchAll(/data-outcome="([a-z]+)" data-count="(\d+)" fill="([^"]*)"/g))
    if (match[1] === group && match[3] === fill) count += Number(match[2]);
  return count;
}

const folder = mkdtempSync(join(tmpdir(), 'chancewise-chart-'));

describe('chancewise chart', () => {
  // 20% with RR 0.75 is 15% (Cochrane Handbook 5.1 §11.5.5 uses RR 0.75 at 20% → 15%).
  it('draws the comparison and the option side by side for bare effect flags, every person counted', async () => {
    const out = join(folder, 'pair.svg');
    const result = await run(['chart', '--baseline', '20%', '--rr', '0.75', '--per', '100', '--out', out]);
    expect(result).toMatchObject({ code: 0, stderr: '' });
    const svg = readFileSync(out, 'utf8');
    expect(groupCounts(svg)).toEqual({ event: 35, free: 160, prevented: 5 });
    expect(svg).toContain('Without the option');
    expect(svg).toContain('With the option');
  });

  it('draws every option of the demo topic for its headline outcome, per the topic denominator', async () => {
    const out = join(folder, 'demo.svg');
    expect((await run(['chart', '--demo', '--out', out])).code).toBe(0);
    const svg = readFileSync(out, 'utf8');
    const counts = groupCounts(svg);
    expect(Object.values(counts).reduce((a, b) => a + b)).toBe(300);
    expect(svg).toContain('role="img"');
  });

  it('draws a named outcome', async () => {
    const out = join(folder, 'harm.svg');
    expect((await run(['chart', '--demo', '--outcome', 'broken sleep from passing urine at night', '--out', out])).code).toBe(0);
    expect(groupCounts(readFileSync(out, 'utf8')).caused).toBeGreaterThan(0);
  });

  // Baseline 25%, RR 1.8 (1.4 to 2.3): 45% with the option (0.25 × 1.8; Cochrane Handbook 5.1,
  // §12.5.4), so 20 in 100 gain the wanted event; the interval gives 35 to 58 in 100 (0.25 × 1.4
  // and 0.25 × 2.3 = 0.575, rounded half up).
  it('writes the contract attributes for a wanted event: data-wanted, the gained people as "caused" in the helped look', async () => {
    const out = join(folder, 'wanted.svg');
    const args = [
      'chart',
      '--baseline',
      '25%',
      '--rr',
      '1.8',
      '--ci',
      '1.4,2.3',
      '--per',
      '100',
      '--outcome',
      'pain gone by day 3',
    ];
    expect(await run([...args, '--wanted', '--show-range', '--out', out])).toMatchObject({ code: 0, stderr: '' });
    const svg = readFileSync(out, 'utf8');
    expect(/<svg [^>]*data-wanted="true"/.test(svg)).toBe(true);
    expect(groupCounts(svg)).toEqual({ event: 50, caused: 20, free: 130 });
    // Each gained person is painted with the dot pattern of the helped look, none with the hatch of harm.
    expect(paintedCount(svg, 'caused', 'url(#export-pair-dots)')).toBe(20);
    expect(svg).not.toContain('url(#export-pair-hatch)"');
    expect(svg).toContain('20 have pain gone by day 3 because of the option');
    // What a person reads (the text alternative and every text), not the attribute values.
    const read = `${/aria-label="([^"]*)"/.exec(svg)?.[1] ?? ''} ${svg.replace(/<[^>]*>/g, ' ')}`;
    expect(read).toContain('because of the option');
    expect(read).not.toMatch(/\b(avoids?|causes?|caused|risks?)\b/i);
    // The range outline rings ranks 35–57 and leaves every count as it was.
    expect(/<path [^>]*class="range-outline"[^>]* data-look="outline" data-count="23"/.test(svg)).toBe(true);

    const plain = join(folder, 'unwanted.svg');
    expect((await run([...args, '--out', plain])).code).toBe(0);
    const unwanted = readFileSync(plain, 'utf8');
    expect(/<svg [^>]*data-wanted="false"/.test(unwanted)).toBe(true);
    expect(paintedCount(unwanted, 'caused', 'url(#export-pair-hatch)')).toBe(20);
  });

  it('draws people who lose a wanted event in the harmed look', async () => {
    const out = join(folder, 'wanted-lost.svg');
    expect((await run(['chart', '--baseline', '40%', '--rr', '0.75', '--per', '100', '--wanted', '--out', out])).code).toBe(0);
    const svg = readFileSync(out, 'utf8');
    expect(groupCounts(svg)).toEqual({ event: 70, prevented: 10, free: 120 });
    expect(paintedCount(svg, 'prevented', 'url(#export-pair-hatch)')).toBe(10);
    expect(svg).toContain('10 miss out on the outcome because of the option');
  });

  it.each([
    [['chart', '--demo', '--wanted', '--out', join(folder, 'u.svg')], /--wanted/],
    [['chart', '--demo'], /--out/],
    [['chart', '--demo', '--out', join(folder, 'x.png')], /must end in \.svg/],
    [['chart', '--demo', '--outcome', 'nothing', '--out', join(folder, 'y.svg')], /no outcome "nothing"/],
    [['chart', '--arr', '2%', '--out', join(folder, 'z.svg')], /--baseline/],
    [['chart', '--baseline', '20', '--rr', '0.75', '--out', join(folder, 'w.svg')], /ambiguous/],
    [['chart', '--demo', '--out', join(folder, 'missing-folder', 'v.svg')], /folder does not exist/],
  ])('refuses %j with exit 2 and one line', async (args, message) => {
    const result = await run(args);
    expect(result.code).toBe(2);
    expect(result.stdout).toBe('');
    expect(result.stderr).toMatch(message);
    expect(result.stderr.trim().split('\n')).toHaveLength(1);
  });
});
