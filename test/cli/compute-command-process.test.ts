import { describe, expect, it } from 'vitest';
import { runProcess } from './support.ts';

// A few runs of the real entry point, bin/chancewise.mjs, in a child process: the exit status
// and the streams a shell sees (common practice for Unix tools: 0 done, 2 usage, stderr for messages).

describe('the chancewise program run from a shell', () => {
  it('answers a cold call with the JSON of an effect and exit 0', async () => {
    // Cochrane Handbook 5.1 §12.5.4.2: RR 0.92 at 30% → NNT 42.
    const started = Date.now();
    const found = await runProcess(['compute', '--baseline', '30%', '--rr', '0.92', '--json']);
    const seconds = (Date.now() - started) / 1000;
    expect(found.code).toBe(0);
    expect(found.stderr).toBe('');
    const json = JSON.parse(found.stdout) as { nnt: { text: string } };
    expect(json.nnt.text).toBe('NNTB 42');
    // Generous: a cold start through the TypeScript loader, on a loaded machine.
    expect(seconds).toBeLessThan(20);
  });

  it('exits 2 with one line on stderr and nothing on stdout for a bare baseline above 1', async () => {
    const found = await runProcess(['compute', '--baseline', '30', '--rr', '0.8']);
    expect(found.code).toBe(2);
    expect(found.stdout).toBe('');
    expect(found.stderr.trimEnd().split('\n')).toEqual(['--baseline: A risk of "30" is ambiguous: write 30% or 0.3.']);
  });

  it('exits 2 for an unknown command, with one line', async () => {
    const found = await runProcess(['frobnicate']);
    expect(found.code).toBe(2);
    expect(found.stdout).toBe('');
    expect(found.stderr.trimEnd().split('\n')).toHaveLength(1);
    expect(found.stderr).toContain('"frobnicate"');
  });

  it('exits 2 for a missing topic file, naming it', async () => {
    const found = await runProcess(['compute', 'no-such-topic.json']);
    expect(found.code).toBe(2);
    expect(found.stdout).toBe('');
    expect(found.stderr.trimEnd().split('\n')).toEqual(['Cannot read the topic file "no-such-topic.json": no such file.']);
  });

  it('reads a negative value after an option from the real argument vector', async () => {
    // Altman (1998) BMJ 317:1309: ARR 10% (−5% to 25%).
    const found = await runProcess(['compute', '--arr', '0.10', '--ci', '-0.05,0.25']);
    expect(found.code).toBe(0);
    expect(found.stdout).toContain('NNTB 10 (NNTB 4 to ∞ to NNTH 20)');
  });

  it('prints the demo topic as JSON', async () => {
    const found = await runProcess(['compute', '--demo', '--json']);
    expect(found.code).toBe(0);
    expect(found.stderr).toBe('');
    const json = JSON.parse(found.stdout) as { topic: string; outcomes: unknown[] };
    expect(json.topic).toContain('illustrative');
    expect(json.outcomes.length).toBeGreaterThan(0);
  });
});
