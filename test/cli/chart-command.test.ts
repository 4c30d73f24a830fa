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

function groupCounts(svg: string): Record<string, number> {
  const counts: Record<string, number> = {};
  for (const match of svg.matchAll(/data-outcome="([a-z]+)"/g)) counts[match[1] ?? ''] = (counts[match[1] ?? ''] ?? 0) + 1;
  return counts;
}

const folder = mkdtempSync(join(tmpdir(), 'chancewise-chart-'));

describe('chancewise chart', () => {
  // 20% with RR 0.75 is 15% (Cochrane Handbook 5.1 §11.5.5 uses RR 0.75 at 20% → 15%).
  it('draws the comparison and the option side by side for bare effect flags, one element per person', async () => {
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

  it.each([
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
