import { describe, expect, it } from 'vitest';
import { describeProblem } from '../../src/core/messages/describe.ts';
import { parseBaselineRisk, parseRisk, parseSignedRisk } from '../../src/core/parse-risk.ts';
import { InputError } from '../../src/core/problems.ts';

function problemOf(attempt: () => unknown): { code: string; message: string } {
  try {
    attempt();
  } catch (error) {
    if (error instanceof InputError) return { code: error.problem.code, message: describeProblem(error.problem) };
    throw error;
  }
  throw new Error('expected an InputError');
}

// The forms in which clinicians write a risk (common practice).
describe('parseRisk reads risks as clinicians write them', () => {
  it.each([
    ['0.2', 0.2],
    ['20%', 0.2],
    ['20 %', 0.2],
    ['20/100', 0.2],
    ['1 in 5', 0.2],
    ['200 per 1000', 0.2],
    ['1 out of 5', 0.2],
    ['  0.15 ', 0.15],
    ['.5', 0.5],
    ['12.5%', 0.125],
    ['0', 0],
    ['1', 1],
    ['100%', 1],
  ])('reads %j as %d', (input, expected) => {
    expect(parseRisk(input, 'risk')).toBeCloseTo(expected, 12);
  });

  it('accepts a proportion given as a number', () => {
    expect(parseRisk(0.3, 'risk')).toBe(0.3);
  });

  it('refuses a bare number above 1 as ambiguous and suggests both readings', () => {
    const found = problemOf(() => parseRisk('20', 'risk'));
    expect(found.code).toBe('risk-ambiguous');
    expect(found.message).toBe('A risk of "20" is ambiguous: write 20% or 0.2.');
  });

  it('refuses a numeric 20 the same way', () => {
    expect(problemOf(() => parseRisk(20, 'risk')).code).toBe('risk-ambiguous');
  });

  it.each([
    ['abc', 'risk-unparsable'],
    ['20%%', 'risk-unparsable'],
    ['1 in', 'risk-unparsable'],
    ['', 'risk-empty'],
    ['   ', 'risk-empty'],
    ['1/0', 'risk-denominator-zero'],
    ['120%', 'risk-out-of-range'],
    ['-5%', 'risk-out-of-range'],
    ['6 in 5', 'risk-out-of-range'],
    ['-0.2', 'risk-out-of-range'],
  ])('refuses %j with %s', (input, code) => {
    expect(problemOf(() => parseRisk(input, 'risk')).code).toBe(code);
  });

  it('names the value it could not read', () => {
    expect(problemOf(() => parseRisk('about a fifth', 'risk')).message).toContain('"about a fifth"');
  });
});

describe('parseBaselineRisk requires a risk strictly between 0 and 1', () => {
  it('accepts 15%', () => {
    expect(parseBaselineRisk('15%', 'baseline')).toBeCloseTo(0.15, 12);
  });
  it.each(['0', '0%', '1', '100%'])('refuses %j', (input) => {
    const found = problemOf(() => parseBaselineRisk(input, 'baseline'));
    expect(found.code).toBe('baseline-out-of-range');
    expect(found.message).toMatch(/more than 0% and less than 100%/);
  });
});

describe('parseSignedRisk reads absolute reductions, which may be negative', () => {
  it.each([
    ['-2%', -0.02],
    ['\u22122%', -0.02],
    ['0.05', 0.05],
    ['-0.12', -0.12],
  ])('reads %j as %d', (input, expected) => {
    expect(parseSignedRisk(input, 'arr')).toBeCloseTo(expected, 12);
  });
  it('refuses a bare -20 as ambiguous', () => {
    expect(problemOf(() => parseSignedRisk('-20', 'arr')).code).toBe('risk-ambiguous');
  });
});
