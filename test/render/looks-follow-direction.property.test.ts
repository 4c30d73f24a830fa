/**
 * Property: over every measure, both event directions (wanted or to avoid), both kinds of
 * outcome (aimed at, or a side effect) and both signs of the effect, the look, colour and
 * pattern of each people group and the words of its label agree with help and harm.
 * The oracle is the rule itself, not the code under test: fewer unwanted or more wanted
 * events help; more unwanted or fewer wanted events harm (Altman 1998, BMJ 317:1309, on
 * benefit and harm; the look code of the palette: Okabe & Ito 2008, with dots for help and
 * hatching for harm, common practice).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { changeOf } from '../../src/core/direction.ts';
import { computeTopic } from '../../src/core/topic/compute-topic.ts';
import type { Topic } from '../../src/core/topic/topic.ts';
import type { EnteredEffect } from '../../src/core/types.ts';
import { outcomeChart } from '../../src/render/chart-model.ts';
import { OKABE_ITO, colourPalette } from '../../src/render/palette.ts';
import { personLooks } from '../../src/render/svg/draw-people.ts';

type Measure = EnteredEffect['measure'];

/** An effect that makes the event more (`up`) or less likely, of a given size, in the measure's own units. */
function effectOf(measure: Measure, up: boolean, size: number, baseline: number): EnteredEffect {
  // A risk ratio applied to the baseline must leave the option's risk below 1 (here below 0.95).
  const rise = Math.min(size, 0.95 / baseline - 1);
  switch (measure) {
    case 'or':
    case 'hr':
      return { measure, estimate: up ? 1 + size : 1 / (1 + size) };
    case 'rr':
      return { measure, estimate: up ? 1 + rise : 1 / (1 + size) };
    case 'rrr':
      // A relative reduction in percent: negative is an increase.
      return { measure, estimate: up ? -rise * 100 : (size / 1.5) * 90 };
    case 'arr': {
      // An absolute reduction as a proportion, kept inside (0, 1) for the option's risk.
      const room = up ? 1 - baseline : baseline;
      return { measure, estimate: (up ? -1 : 1) * room * Math.min(size, 0.9) * 0.8 };
    }
  }
}

function topicOf(measure: Measure, wanted: boolean, kind: 'benefit' | 'harm', effect: EnteredEffect, baseline: number): Topic {
  return {
    title: 'Invented topic for a property test (illustrative)',
    population: 'people like you',
    periodYears: 1,
    illustrative: true,
    options: [
      { id: 'none', name: 'no treatment', isComparison: true },
      { id: 'a', name: 'option A', isComparison: false },
    ],
    outcomes: [
      {
        id: 'outcome',
        name: wanted ? 'a response' : 'a flare-up',
        kind,
        wanted,
        isHeadline: true,
        baseline: { risk: baseline, periodYears: 1, source: 'Invented' },
        effects: [
          { optionId: 'a', effect, source: 'Invented', followUpYears: 1, certainty: 'moderate', importance: 'important' },
        ],
      },
    ],
    evidence: { summary: 'Invented.', reviewed: '2026-11-01' },
    questions: [],
    clinician: '',
  };
}

const MEASURES: readonly Measure[] = ['rr', 'or', 'hr', 'rrr', 'arr'];

describe('people looks follow help and harm', () => {
  it('draws the changed group helped when the option helps and harmed when it harms, with the words to match', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...MEASURES),
        fc.boolean(),
        fc.constantFrom('benefit' as const, 'harm' as const),
        fc.boolean(),
        fc.double({ min: 0.05, max: 0.9, noNaN: true }),
        fc.double({ min: 0.05, max: 1.5, noNaN: true }),
        (measure, wanted, kind, up, baseline, size) => {
          const result = computeTopic(topicOf(measure, wanted, kind, effectOf(measure, up, size, baseline), baseline));
          const model = outcomeChart(result, 'outcome');
          const option = model.arrays[1]!;
          const outcome = result.outcomes[0]!;
          const changed = option.groups.prevented + option.groups.caused;
          // The rule, stated without the code under test: more of a wanted event or less of an unwanted one helps.
          const expected = changed === 0 ? 'none' : up === wanted ? 'helps' : 'harms';
          expect(changeOf(option.groups.prevented - option.groups.caused, wanted)).toBe(expected);
          expect(model.wanted).toBe(wanted);

          const changedLabels = option.labels.filter((label) => label.group === 'prevented' || label.group === 'caused');
          expect(changedLabels).toHaveLength(changed === 0 ? 0 : 1);
          for (const label of changedLabels) {
            const style = colourPalette.groups[label.look];
            if (expected === 'helps') {
              expect(label.look).toBe('helped');
              expect([style.fill, style.pattern]).toEqual([OKABE_ITO.bluishGreen, 'dots']);
            } else {
              expect(label.look).toBe('harmed');
              expect([style.fill, style.pattern]).toEqual([OKABE_ITO.vermillion, 'hatch']);
            }
            // The event's meaning stays: `caused` has it only with the option.
            expect(label.group).toBe(up ? 'caused' : 'prevented');
          }

          // Every person is drawn in the look of their label.
          const looks = personLooks(option.layout, wanted);
          for (const label of option.labels) expect(looks.filter((look) => look === label.look)).toHaveLength(label.count);

          // Words: a wanted event is never avoided or a risk; a prevented unwanted event is avoided.
          const words = [model.description, ...option.labels.map((label) => label.text)].join(' ');
          if (wanted) expect(words).not.toMatch(/\b(avoids?|risks?|caused?|causes)\b/i);
          else if (option.groups.prevented > 0) expect(words).toMatch(/avoids? a flare-up because of option A/);

          // The number needed follows the same rule (Altman 1998).
          const nnt = outcome.options.find((entry) => !entry.isComparison)!.nnt.label;
          if (option.groups.prevented + option.groups.caused > 0) expect(nnt).toBe(expected === 'helps' ? 'NNTB' : 'NNTH');
        },
      ),
      { numRuns: 10_000 },
    );
  });
});
