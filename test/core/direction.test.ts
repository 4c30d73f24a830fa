import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { benefitOf, changeOf, lookOf } from '../../src/core/direction.ts';
import { numberNeeded } from '../../src/core/number-needed.ts';
import { peopleGroups } from '../../src/core/people-groups.ts';

// Whether an option helps follows from the direction of the event and of the change: fewer
// unwanted events or more wanted events help (Altman 1998, BMJ 317:1309, defines NNTB and NNTH
// by benefit and harm, not by the sign of the difference; applying that to wanted events is
// common practice).

describe('changeOf reads help and harm from both directions', () => {
  it.each([
    [0.05, false, 'helps'],
    [-0.05, false, 'harms'],
    [-0.2, true, 'helps'],
    [0.2, true, 'harms'],
    [0, true, 'none'],
    [0, false, 'none'],
  ] as const)('a difference of %d with wanted = %s %s', (difference, wanted, expected) => {
    expect(changeOf(difference, wanted)).toBe(expected);
  });
});

describe('benefitOf signs a difference so that positive helps', () => {
  it('leaves an unwanted event as it is', () => {
    expect(benefitOf({ estimate: 0.05, lower: 0.02, upper: 0.08 }, false)).toEqual({ estimate: 0.05, lower: 0.02, upper: 0.08 });
  });

  it('turns a wanted event round and swaps the interval ends', () => {
    expect(benefitOf({ estimate: -0.2, lower: -0.325, upper: -0.1 }, true)).toEqual({ estimate: 0.2, lower: 0.1, upper: 0.325 });
  });

  it('keeps a missing interval missing', () => {
    expect(benefitOf({ estimate: -0.2, lower: null, upper: null }, true)).toEqual({ estimate: 0.2, lower: null, upper: null });
  });
});

describe('lookOf gives each people group the look of what the option did for them', () => {
  it.each([
    ['event', false, 'event'],
    ['free', false, 'free'],
    ['prevented', false, 'helped'],
    ['caused', false, 'harmed'],
    ['event', true, 'event'],
    ['free', true, 'free'],
    ['caused', true, 'helped'],
    ['prevented', true, 'harmed'],
  ] as const)('%s with wanted = %s is drawn %s', (group, wanted, look) => {
    expect(lookOf(group, wanted)).toBe(look);
  });
});

describe('the NNT label, the looks and the direction always agree', () => {
  it('for any risks, event direction and interval', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: 100 }),
        fc.integer({ min: 0, max: 100 }),
        fc.boolean(),
        (comparison, option, wanted) => {
          const difference = (comparison - option) / 100;
          const change = changeOf(difference, wanted);
          const nnt = numberNeeded({ estimate: difference, lower: null, upper: null }, { wanted });
          const groups = peopleGroups(comparison, option, 100);
          const changed = groups.prevented > 0 ? 'prevented' : groups.caused > 0 ? 'caused' : null;
          if (change === 'none') {
            expect(nnt.label).toBeNull();
            expect(changed).toBeNull();
            return;
          }
          expect(nnt.label).toBe(change === 'helps' ? 'NNTB' : 'NNTH');
          expect(changed).not.toBeNull();
          expect(lookOf(changed ?? 'event', wanted)).toBe(change === 'helps' ? 'helped' : 'harmed');
        },
      ),
      { numRuns: 10_000 },
    );
  });
});
