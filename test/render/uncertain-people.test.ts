import { describe, expect, it } from 'vitest';
import { peopleGroups } from '../../src/core/people-groups.ts';
import { fillSequence } from '../../src/render/fill-sequence.ts';
import { isUncertain, uncertainRanks } from '../../src/render/uncertain-people.ts';

describe('uncertainRanks', () => {
  it('spans the ranks from the lower to the upper count', () => {
    expect(uncertainRanks({ lower: 13, upper: 18 }, 15)).toEqual({ from: 13, to: 18 });
  });

  it('is null when the interval is a single count', () => {
    expect(uncertainRanks({ lower: 15, upper: 15 }, 15)).toBeNull();
  });

  // Checked by brute force: a rank is uncertain exactly when its group differs for some count
  // between the limits (the comparison fixed), using the same fill sequence as the layout.
  it('marks exactly the people whose group changes somewhere in the interval', () => {
    const comparison = 20;
    for (const [lower, upper, estimate] of [
      [13, 18, 15],
      [18, 26, 22],
      [0, 4, 2],
      [15, 25, 20],
    ] as const) {
      const span = uncertainRanks({ lower, upper }, estimate);
      const sequences = [];
      for (let count = lower; count <= upper; count += 1) sequences.push(fillSequence(peopleGroups(comparison, count, 100)));
      for (let rank = 0; rank < 100; rank += 1) {
        const varies = new Set(sequences.map((sequence) => sequence[rank])).size > 1;
        expect(isUncertain(rank, span)).toBe(varies);
      }
    }
  });
});
