import { describe, expect, it } from 'vitest';
import { plural, wordingMessages } from '../../../../src/core/messages/en/wording.ts';

// English plural rule: the singular for exactly one, the plural otherwise, zero included
// (Unicode CLDR plural rules for English: "one" is n = 1 with no visible decimals; from memory).
describe('plural', () => {
  it('gives "1 person" and "2 people"', () => {
    expect(`1 ${plural(1, 'person', 'people')}`).toBe('1 person');
    expect(`2 ${plural(2, 'person', 'people')}`).toBe('2 people');
  });

  it('uses the plural for 0 and for decimals', () => {
    expect(plural(0, 'year', 'years')).toBe('years');
    expect(plural(2.5, 'year', 'years')).toBe('years');
  });
});

describe('wordingMessages', () => {
  it('gives the reference class in the singular and the plural', () => {
    expect(wordingMessages.group(1)).toBe('person like you');
    expect(wordingMessages.group(100)).toBe('people like you');
  });

  it('does not add a second full stop after a population that ends with one', () => {
    expect(wordingMessages.population({ population: 'adults over 60.', group: 'people like you' })).toBe(
      'In these numbers, "people like you" means adults over 60.',
    );
  });

  it('writes the free frame as a short second sentence: "About 1 will not."', () => {
    expect(wordingMessages.freeFrame({ amount: { kind: 'about', count: 1 }, denominator: 100 })).toBe('About 1 will not.');
  });
});
