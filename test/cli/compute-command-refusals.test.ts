import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { main } from '../../src/cli/main.ts';
import { ROOT, run } from './support.ts';

// Every refusal follows the command-line contract of Chancewise (common practice for Unix tools):
// exit status 2, nothing on stdout, exactly one line on stderr that names the offending value
// and says what is allowed, and no stack trace.

const folder = mkdtempSync(join(tmpdir(), 'chancewise-refusals-'));
afterAll(() => rmSync(folder, { recursive: true, force: true }));

const demo = join(ROOT, 'assets/demo/01-kidney-stone.json');
const truncated = join(folder, 'truncated.json');
writeFileSync(truncated, readFileSync(demo, 'utf8').slice(0, 400));
const wrongType = join(folder, 'wrong-type.json');
const wrongTypeData = JSON.parse(readFileSync(demo, 'utf8')) as { topic: Record<string, unknown> };
wrongTypeData.topic.periodYears = 'ten';
writeFileSync(wrongType, JSON.stringify(wrongTypeData));
const impossible = join(folder, 'impossible-baseline.json');
const impossibleData = JSON.parse(readFileSync(demo, 'utf8')) as { topic: { outcomes: { baseline: { risk: unknown } }[] } };
const firstOutcome = impossibleData.topic.outcomes[0];
if (firstOutcome !== undefined) firstOutcome.baseline.risk = '150%';
writeFileSync(impossible, JSON.stringify(impossibleData));
const twoProblems = join(folder, 'two-problems.json');
const twoProblemsData = JSON.parse(readFileSync(demo, 'utf8')) as { topic: Record<string, unknown> };
twoProblemsData.topic.title = '';
twoProblemsData.topic.periodYears = 0;
writeFileSync(twoProblems, JSON.stringify(twoProblemsData));
const notATopic = join(folder, 'other.json');
writeFileSync(notATopic, JSON.stringify({ format: 'spreadsheet', rows: [] }));
const subfolder = join(folder, 'a-folder.json');
mkdirSync(subfolder);
const missing = join(folder, 'no-such-topic.json');

/** [what is wrong, arguments after `compute`, fragments the one-line message must contain]. */
const refusals: readonly [string, readonly string[], readonly string[]][] = [
  // reading numbers
  ['an effect that is not a number', ['--baseline', '30%', '--rr', 'abc'], ['--rr', '"abc"', 'not a number', 'digits']],
  ['an effect written as Infinity', ['--baseline', '30%', '--rr', 'Infinity'], ['--rr', '"Infinity"', 'not a number']],
  ['an effect too large to be a number', ['--baseline', '30%', '--or', '1e400'], ['--or', '"1e400"', 'too large']],
  ['an effect written as NaN', ['--baseline', '30%', '--hr', 'NaN'], ['--hr', '"NaN"', 'not a number']],
  // reading risks
  [
    'a baseline that is not a risk',
    ['--baseline', 'abc', '--rr', '0.8'],
    ['--baseline', '"abc"', '20%, 0.2, 20/100, 1 in 5 or 200 per 1000'],
  ],
  ['a baseline of 0', ['--baseline', '0', '--rr', '0.8'], ['--baseline', '0%', 'more than 0% and less than 100%']],
  ['a baseline of 1', ['--baseline', '1', '--rr', '0.8'], ['--baseline', '100%', 'more than 0% and less than 100%']],
  ['a baseline of 100%', ['--baseline', '100%', '--rr', '0.8'], ['--baseline', '100%', 'less than 100%']],
  ['a negative baseline', ['--baseline', '-0.1', '--rr', '0.8'], ['--baseline', '"-0.1"', 'between 0% and 100%']],
  ['a baseline above 100%', ['--baseline', '120%', '--rr', '0.8'], ['--baseline', '"120%"', 'between 0% and 100%']],
  ['a bare baseline above 1', ['--baseline', '30', '--rr', '0.8'], ['--baseline', '"30"', 'ambiguous', '30%', '0.3']],
  ['a bare baseline of 1.5', ['--baseline', '1.5', '--rr', '0.8'], ['--baseline', '"1.5"', 'ambiguous', '1.5%', '0.015']],
  ['a baseline that divides by zero', ['--baseline', '1 in 0', '--rr', '0.8'], ['--baseline', '"1 in 0"', 'at least 1']],
  ['a bare absolute reduction above 1', ['--arr', '2'], ['--arr', '"2"', 'ambiguous', '2%', '0.02']],
  ['an absolute reduction beyond 100%', ['--arr', '150%'], ['--arr', '150%', 'between −100% and 100%']],
  // effects
  ['a negative risk ratio', ['--baseline', '30%', '--rr', '-0.8'], ['--rr', '-0.8', 'greater than 0']],
  ['a risk ratio of zero', ['--baseline', '30%', '--rr', '0'], ['--rr', 'risk ratio of 0', 'greater than 0']],
  ['an odds ratio of zero', ['--baseline', '30%', '--or', '0'], ['--or', 'odds ratio of 0', 'greater than 0']],
  ['a negative hazard ratio', ['--baseline', '30%', '--hr', '-1'], ['--hr', 'hazard ratio of -1', 'greater than 0']],
  ['a relative reduction of 100%', ['--baseline', '30%', '--rrr', '100'], ['--rrr', '100%', 'less than 100%']],
  ['a relative reduction above 100%', ['--baseline', '30%', '--rrr', '120%'], ['--rrr', '120%', 'less than 100%']],
  ['a relative reduction that is not a percentage', ['--baseline', '30%', '--rrr', 'abc%'], ['--rrr', '"abc%"', '25 or 25%']],
  ['a risk ratio pushing the risk above 100%', ['--baseline', '60%', '--rr', '2'], ['--rr', '120%', 'odds ratio']],
  [
    'an interval limit pushing the risk above 100%',
    ['--baseline', '30%', '--rr', '2', '--ci', '1.5,3.5'],
    ['--ci', '3.5', '105%', 'odds ratio'],
  ],
  [
    'an absolute reduction larger than the baseline',
    ['--baseline', '30%', '--arr', '40%'],
    ['--arr', '40%', '-10%', '0% to 100%'],
  ],
  ['an absolute increase pushing the risk above 100%', ['--baseline', '30%', '--arr', '-80%'], ['--arr', '-80%', '110%']],
  [
    'an increase entered as a negative relative reduction beyond 100%',
    ['--baseline', '50%', '--rrr', '-150'],
    ['--rrr', '-150', '125%'],
  ],
  // intervals
  [
    'an interval that does not contain its estimate',
    ['--baseline', '30%', '--rr', '0.8', '--ci', '0.85,0.95'],
    ['--ci', '0.85 to 0.95', 'estimate 0.8'],
  ],
  ['an interval with no upper limit', ['--baseline', '30%', '--rr', '0.8', '--ci', '0.6,'], ['--ci', '"0.6,"', 'LOW,HIGH']],
  ['an interval with no lower limit', ['--baseline', '30%', '--rr', '0.8', '--ci', ',0.9'], ['--ci', '",0.9"', 'LOW,HIGH']],
  ['an interval of one number', ['--baseline', '30%', '--rr', '0.8', '--ci', '0.6'], ['--ci', '"0.6"', 'LOW,HIGH']],
  ['an interval written with a dash', ['--baseline', '30%', '--rr', '0.8', '--ci', '0.6-0.9'], ['--ci', '"0.6-0.9"', 'LOW,HIGH']],
  [
    'an interval of three numbers',
    ['--baseline', '30%', '--rr', '0.8', '--ci', '0.6,0.9,1.0'],
    ['--ci', '"0.6,0.9,1.0"', 'LOW,HIGH'],
  ],
  ['an interval of words', ['--baseline', '30%', '--rr', '0.8', '--ci', 'a,b'], ['--ci', '"a"', 'not a number']],
  [
    'an interval limit of zero for a ratio',
    ['--baseline', '30%', '--hr', '0.8', '--ci', '0,0.9'],
    ['--ci', 'hazard ratio of 0', 'greater than 0'],
  ],
  [
    'a relative reduction interval reaching past 100%',
    ['--baseline', '30%', '--rrr', '25', '--ci', '10,110'],
    ['--ci', '110%', 'less than 100%'],
  ],
  // interval levels
  ['a level without an interval', ['--baseline', '30%', '--rr', '0.8', '--level', '0.9'], ['--level', '--ci']],
  [
    'a level above 1',
    ['--baseline', '30%', '--rr', '0.8', '--ci', '0.6,0.9', '--level', '1.2'],
    ['--level', '"1.2"', '50%', '99.9%', '0.95 or 95%'],
  ],
  [
    'a level that is not a number',
    ['--baseline', '30%', '--rr', '0.8', '--ci', '0.6,0.9', '--level', 'abc'],
    ['--level', '"abc"', '0.95 or 95%'],
  ],
  ['a level below 50%', ['--baseline', '30%', '--rr', '0.8', '--ci', '0.6,0.9', '--level', '40%'], ['--level', '"40%"', '50%']],
  [
    'a level of 95 without a percent sign',
    ['--baseline', '30%', '--rr', '0.8', '--ci', '0.6,0.9', '--level', '95'],
    ['--level', '"95"', '95%'],
  ],
  ['a level above 99.9% for trial counts', ['--counts', '10/100,20/100', '--level', '2'], ['--level', '"2"', '99.9%']],
  // trial counts
  ['more events than people', ['--counts', '60/50,20/100'], ['--counts', '"60/50"', 'more events than people']],
  ['an arm of no people', ['--counts', '10/0,20/100'], ['--counts', '"10/0"', 'at least 1']],
  ['counts that are not whole', ['--counts', '10.5/100,20/100'], ['--counts', '"10.5/100"', 'whole number']],
  ['a negative count', ['--counts', '-1/100,20/100'], ['--counts', '"-1/100"', 'below 0']],
  ['a negative total in the comparison arm', ['--counts', '1/100,2/-20'], ['--counts', '"2/-20"', 'below 0']],
  ['counts of one arm only', ['--counts', '10/100'], ['--counts', '"10/100"', 'EVENTS/TOTAL,EVENTS/TOTAL']],
  ['counts of three arms', ['--counts', '1/10,2/10,3/10'], ['--counts', '"1/10,2/10,3/10"', 'EVENTS/TOTAL,EVENTS/TOTAL']],
  ['counts written with a dash', ['--counts', '10-100,20/100'], ['--counts', '"10-100,20/100"', 'EVENTS/TOTAL,EVENTS/TOTAL']],
  ['counts written in words', ['--counts', 'a/b,c/d'], ['--counts', '"a/b,c/d"', '12/100,20/100']],
  // combinations
  ['two effects at once', ['--baseline', '30%', '--rr', '0.8', '--or', '0.7'], ['--rr', '--or', 'one effect']],
  ['an effect with trial counts', ['--counts', '10/100,20/100', '--rr', '0.8'], ['--rr', '--counts']],
  ['a baseline with trial counts', ['--baseline', '30%', '--counts', '10/100,20/100'], ['--baseline', '--counts']],
  ['an interval with trial counts', ['--counts', '10/100,20/100', '--ci', '1,2'], ['--ci', '--counts']],
  ['--over without --to', ['--baseline', '30%', '--rr', '0.8', '--over', '5'], ['--over', '--to', 'or neither']],
  ['--to without --over', ['--baseline', '30%', '--rr', '0.8', '--to', '5'], ['--over', '--to', 'or neither']],
  ['--over and --to with an absolute reduction', ['--arr', '5%', '--over', '5', '--to', '10'], ['--over', '--arr']],
  [
    'a period of zero years',
    ['--baseline', '30%', '--rr', '0.8', '--over', '0', '--to', '5'],
    ['--over', '"0"', 'greater than 0'],
  ],
  [
    'a period that is not a number',
    ['--baseline', '30%', '--rr', '0.8', '--over', '5', '--to', 'ten'],
    ['--to', '"ten"', 'greater than 0'],
  ],
  [
    'a period too long to mean anything',
    ['--baseline', '30%', '--rr', '0.8', '--over', '5', '--to', '5000'],
    ['--to', '"5000"', 'at most 1000 years'],
  ],
  ['a negative follow-up', ['--baseline', '30%', '--rr', '0.8', '--followup', '-2'], ['--followup', '"-2"', 'greater than 0']],
  ['a ratio without a baseline', ['--rr', '0.8'], ['--rr', '--baseline', '15%']],
  ['a baseline without an effect', ['--baseline', '30%'], ['--rr', '--counts', '--demo']],
  ['nothing to compute', [], ['--rr', '--counts', '--demo']],
  // option values
  [
    'a denominator other than 100 or 1000',
    ['--baseline', '30%', '--rr', '0.8', '--per', '10'],
    ['--per', '"10"', '--per 100', '1000000'],
  ],
  ['a denominator in words', ['--baseline', '30%', '--rr', '0.8', '--per', 'hundred'], ['--per', '"hundred"', '--per 100']],
  ['an unknown interval method', ['--counts', '10/100,20/100', '--method', 'exact'], ['--method', '"exact"', 'newcombe', 'wald']],
  ['an interval method without counts', ['--baseline', '30%', '--rr', '0.8', '--method', 'wald'], ['--method', '--counts']],
  // the shape of the command line
  ['an unknown option', ['--baseline', '30%', '--rr', '0.8', '--frobnicate'], ['--frobnicate', '--help']],
  ['an unknown option given with =', ['--baseline', '30%', '--rr', '0.8', '--colour=red'], ['--colour', '--help']],
  ['a repeated option', ['--baseline', '30%', '--rr', '0.8', '--rr', '0.7'], ['--rr', 'twice']],
  ['a repeated switch', ['--demo', '--json', '--json'], ['--json', 'twice']],
  ['an option missing its value at the end', ['--baseline', '30%', '--rr'], ['--rr', 'needs a value', '--rr 0.75']],
  ['an option followed by another option', ['--baseline', '--rr', '0.8'], ['--baseline', 'needs a value', '--baseline 15%']],
  ['an empty value', ['--baseline', '', '--rr', '0.8'], ['--baseline', 'needs a value']],
  ['a value given to a switch', ['--baseline', '30%', '--rr', '0.8', '--json=yes'], ['--json', 'no value']],
  ['two topic files', ['one.json', 'two.json'], ['"two.json"', 'one topic file']],
  // topics
  ['a topic file and --demo', [demo, '--demo'], ['topic file or --demo', 'not both']],
  ['an effect with --demo', ['--demo', '--rr', '0.8'], ['--rr', '--demo', 'its own numbers']],
  ['a baseline with a topic file', [demo, '--baseline', '30%'], ['--baseline', 'topic file', 'its own numbers']],
  ['trial counts with a topic file', [demo, '--counts', '1/10,2/10'], ['--counts', 'topic file']],
  ['a topic file that does not exist', [missing], [`"${missing}"`, 'no such file']],
  ['a folder given as a topic file', [subfolder], [`"${subfolder}"`, 'folder']],
  ['a truncated topic file', [truncated], [truncated, 'not complete JSON', 'backup']],
  ['a topic file with a field of the wrong type', [wrongType], ['topic.periodYears', 'expected a number', 'the text "ten"']],
  ['a file of another format', [notATopic], [notATopic, 'not a Chancewise topic', '"spreadsheet"']],
  ['a topic with two problems', [twoProblems], ['title: The decision is empty', 'and 1 more problem in the topic']],
  ['a topic whose baseline is impossible', [impossible], ['outcomes.0.baseline.risk', '"150%"', 'between 0% and 100%']],
];

describe('chancewise compute refuses input it cannot use', () => {
  it('checks at least 40 different refusals', () => {
    expect(refusals.length).toBeGreaterThanOrEqual(40);
  });

  it.each(refusals)('refuses %s with exit 2 and one line naming the value', async (_what, args, fragments) => {
    const found = await run(['compute', ...args]);
    expect(found.code).toBe(2);
    expect(found.stdout).toBe('');
    expect(found.stderr.endsWith('\n')).toBe(true);
    expect(found.stderr.trimEnd().split('\n')).toHaveLength(1);
    expect(found.stderr).not.toMatch(/\bat .+:\d+:\d+|Error:|undefined|(?<!")NaN|\[object/);
    for (const fragment of fragments) expect(found.stderr).toContain(fragment);
  });
});

describe('chancewise outside the compute command', () => {
  it('refuses an unknown command, naming it and the commands there are', async () => {
    const found = await run(['frobnicate']);
    expect(found).toEqual({ code: 2, stdout: '', stderr: expect.stringContaining('"frobnicate"') as string });
    expect(found.stderr).toContain('compute');
    expect(found.stderr.trimEnd().split('\n')).toHaveLength(1);
  });

  it('refuses to run with no command at all', async () => {
    const found = await run([]);
    expect(found.code).toBe(2);
    expect(found.stdout).toBe('');
    expect(found.stderr).toContain('No command');
  });

  it('prints the usage on --help with exit 0, including every compute form', async () => {
    const found = await run(['--help']);
    expect(found.code).toBe(0);
    expect(found.stderr).toBe('');
    for (const form of ['--baseline RISK', '--counts EVENTS/TOTAL,EVENTS/TOTAL', 'TOPIC-FILE | --demo']) {
      expect(found.stdout).toContain(form);
    }
  });

  it('exits 1 with one line when something other than the input fails', async () => {
    let stderr = '';
    const code = await main(['compute', '--baseline', '30%', '--rr', '0.8'], {
      stdout: () => {
        throw new Error('the output stream is closed');
      },
      stderr: (text) => {
        stderr += text;
      },
    });
    expect(code).toBe(1);
    expect(stderr.trimEnd().split('\n')).toEqual(['Chancewise failed unexpectedly: the output stream is closed']);
  });

  it('prints the usage for compute --help instead of computing', async () => {
    const found = await run(['compute', '--baseline', '30%', '--help']);
    expect(found.code).toBe(0);
    expect(found.stdout).toContain('Usage:');
  });
});
