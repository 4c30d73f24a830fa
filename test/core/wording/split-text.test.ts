import { describe, expect, it } from 'vitest';
import { splitSentences, splitWords } from '../../../src/core/wording/split-text.ts';

// Counting rules: numbers and symbols read as words count as words, hyphenated words and
// contractions count as one (from memory: Flesch 1949, The Art of Readable Writing); "13 in 100"
// counts as three words and "13%" as one (tokenising numbers consistently is common practice).
describe('splitWords', () => {
  it('counts the words of the cat sentence as 6', () => {
    expect(splitWords('The cat sat on the mat.')).toHaveLength(6);
  });

  it('counts "15 in 100" as three words and "15%" as one', () => {
    expect(splitWords('15 in 100')).toEqual(['15', 'in', '100']);
    expect(splitWords('about 15% of people')).toHaveLength(4);
  });

  it('keeps hyphenated words and contractions whole', () => {
    expect(splitWords("Don't stop long-term treatment.")).toEqual(["Don't", 'stop', 'long-term', 'treatment.']);
  });

  it('does not count a dash or an ampersand standing alone as a word', () => {
    expect(splitWords('heart & lungs – both')).toEqual(['heart', 'lungs', 'both']);
  });

  it('splits words joined by a dash or a slash between letters', () => {
    expect(splitWords('nurse/doctor')).toEqual(['nurse', 'doctor']);
    expect(splitWords('10–20 years')).toEqual(['10', '20', 'years']);
  });
});

describe('splitSentences', () => {
  it('ends a sentence at a full stop, question mark or exclamation mark followed by a space', () => {
    expect(splitSentences('One. Two? Three! Four')).toEqual(['One.', 'Two?', 'Three!', 'Four']);
  });

  it('does not end a sentence at a decimal point or after a title or Latin abbreviation', () => {
    expect(splitSentences('It lasts 2.5 years. Ask Dr. Jones, e.g. by phone.')).toEqual([
      'It lasts 2.5 years.',
      'Ask Dr. Jones, e.g. by phone.',
    ]);
  });

  it('ends a sentence after a closing quote or bracket that follows the full stop', () => {
    expect(splitSentences('She said "Stop." Then (she left.) We stayed.')).toHaveLength(3);
  });

  it('ends a sentence at a blank line, and treats text without an end mark as one sentence', () => {
    expect(splitSentences('A heading\n\nSome text with no end mark')).toEqual(['A heading', 'Some text with no end mark']);
  });

  it('does not end sentences at colons or semicolons', () => {
    expect(splitSentences('No tablet: about 15 in 100; most will not.')).toHaveLength(1);
  });

  it('finds no sentence in empty or punctuation-only text', () => {
    expect(splitSentences('')).toEqual([]);
    expect(splitSentences(' ... ')).toEqual([]);
  });
});
