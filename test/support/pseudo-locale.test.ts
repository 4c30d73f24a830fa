import { describe, expect, test } from 'vitest';
import { cliWordsEn } from '../../src/cli/messages/en.ts';
import { chartMessagesEn } from '../../src/render/messages/en.ts';
import { uiMessagesEn } from '../../src/ui/messages/en.ts';
import { pseudoLocale, stripPseudo } from './pseudo-locale.ts';

// A pseudo locale (common practice in software localisation) shows, in a test, every word
// that did not come from the catalogue: each catalogue word is bracketed, everything else is bare.
describe('pseudoLocale', () => {
  test('wraps every string of a catalogue in ⟦…⟧, in every nested section', () => {
    const ui = pseudoLocale(uiMessagesEn);
    expect(ui.appBar.save).toBe('⟦Save⟧');
    expect(ui.saveDialog.includePatient).toBe('⟦Include the patient’s name and reference in the file⟧');
    expect(Object.keys(ui)).toEqual(Object.keys(uiMessagesEn));
    expect(Object.keys(ui.start)).toEqual(Object.keys(uiMessagesEn.start));
  });

  test('wraps what a function returns, given the same values', () => {
    const ui = pseudoLocale(uiMessagesEn);
    expect(ui.headline.outOf('Stroke', '100')).toBe('⟦Stroke, out of 100:⟧');
    expect(ui.start.demoFacts(2, 3, '10 years')).toBe('⟦2 options · 3 outcomes · 10 years⟧');
    const cli = pseudoLocale(cliWordsEn.usage);
    expect(cli.repeatedFlag('--rr')).toBe('⟦The option --rr is given twice. Give it once.⟧');
    expect(cli.noCommand()).toBe('⟦No command given. Use compute, chart or handout (see chancewise --help).⟧');
  });

  test('walks arrays and keeps numbers, booleans, null and functions that return no string', () => {
    const catalogue = {
      steps: ['First', { name: 'Second', order: 2 }],
      limit: 8,
      shown: true,
      missing: null,
      count: (people: number) => people * 2,
      parts: (name: string) => [name, 'and more'],
    };
    const pseudo = pseudoLocale(catalogue);
    expect(pseudo.steps).toEqual(['⟦First⟧', { name: '⟦Second⟧', order: 2 }]);
    expect(pseudo.limit).toBe(8);
    expect(pseudo.shown).toBe(true);
    expect(pseudo.missing).toBeNull();
    expect(pseudo.count(21)).toBe(42);
    expect(pseudo.parts('Stroke')).toEqual(['Stroke', 'and more']);
  });

  test('leaves the given catalogue as it was', () => {
    pseudoLocale(uiMessagesEn);
    expect(uiMessagesEn.appBar.save).toBe('Save');
  });

  test('wraps a catalogue of another layer: the charts’ words', () => {
    const chart = pseudoLocale(chartMessagesEn);
    for (const [key, value] of Object.entries(chart)) {
      if (typeof value === 'string') expect(value, key).toMatch(/^⟦[\s\S]*⟧$/);
    }
  });
});

describe('stripPseudo', () => {
  test('takes out every wrapped segment, nested ones included, and keeps what lies between', () => {
    expect(stripPseudo('⟦Stroke, out of 100:⟧')).toBe('');
    expect(stripPseudo('⟦With ⟦Statin⟧ taken⟧ daily')).toBe(' daily');
    expect(stripPseudo('⟦a⟧ 12 % ⟦b ⟦c ⟦d⟧⟧ e⟧')).toBe(' 12 % ');
  });

  test('leaves an unmatched bracket in place, so a broken wrap shows', () => {
    expect(stripPseudo('⟦open only')).toBe('⟦open only');
    expect(stripPseudo('close ⟦x⟧ only⟧')).toBe('close  only⟧');
  });
});
