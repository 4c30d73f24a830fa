import { describe, expect, it } from 'vitest';
import { warningSentences } from '../../src/cli/warning-sentences.ts';

describe('warningSentences', () => {
  it('gives each sentence once, in the order first met', () => {
    const sentences = warningSentences([
      { code: 'counts-baseline-from-trial', values: { outcome: 'a fracture' } },
      { code: 'hr-proportional-hazards', values: {} },
      { code: 'counts-baseline-from-trial', values: { outcome: 'a fracture' } },
    ]);
    expect(sentences).toHaveLength(2);
    expect(sentences[0]).toContain('comparison arm');
    expect(sentences[1]).toContain('proportional hazards');
  });

  it('names the outcome whose baseline came from a trial, so two such outcomes read apart', () => {
    const sentences = warningSentences([
      { code: 'counts-baseline-from-trial', values: { outcome: 'a fracture' } },
      { code: 'counts-baseline-from-trial', values: { outcome: 'a fall' } },
    ]);
    expect(sentences).toEqual([expect.stringContaining('for a fracture'), expect.stringContaining('for a fall')]);
  });

  it('keeps sentences that differ in what they show', () => {
    const sentences = warningSentences([
      { code: 'period-beyond-followup', values: { period: 10, followup: 5, option: 'the tablet' } },
      { code: 'period-beyond-followup', values: { period: 10, followup: 3, option: 'the tablet' } },
    ]);
    expect(sentences).toHaveLength(2);
    expect(sentences[0]).toContain('5 years');
    expect(sentences[1]).toContain('3 years');
  });

  it('gives nothing for no notices', () => {
    expect(warningSentences([])).toEqual([]);
  });
});
