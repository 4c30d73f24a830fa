import { describe, expect, it } from 'vitest';
import { evaluateTopic } from '../../src/core/topic/compute-topic.ts';
import type { PeopleGroups } from '../../src/core/types.ts';
import { DEFAULT_SCATTER_SEED } from '../../src/render/icon-array-layout.ts';
import { buildSlide } from '../../src/teaching/build-slide.ts';
import type { PeoplePanel } from '../../src/teaching/slide-model.ts';
import { STONE, SCREENING, demoTopic, itemOf } from './teaching-fixtures.ts';

// Each demonstration states one finding with its source: Galesic, Garcia-Retamero & Gigerenzer
// (2009, Health Psychol 28:210) for 100 vs 1000; Ancker, Weber & Kukafka (2011, Med Decis Making
// 31:143) for grouped vs scattered; Zikmund-Fisher et al. (2008, J Health Commun 13:107) and
// Zikmund-Fisher et al. (2008, Patient Educ Couns 73:209) for incremental framing.

const counts = (panel: PeoplePanel | undefined): Record<string, number> =>
  Object.fromEntries((panel?.chips ?? []).map((chip) => [chip.look, chip.count]));

function groupsAt(name: string, per: 100 | 1000) {
  const evaluation = evaluateTopic(demoTopic(name), { per });
  if (!evaluation.ok) throw new Error('did not compute');
  const option = evaluation.result.outcomes[0]?.options.find((entry) => !entry.isComparison);
  return option?.groups;
}

/** The counts of each look for an unwanted event's groups, the empty ones left out. */
function looksOf(groups: PeopleGroups | undefined): Record<string, number> {
  const found = {
    event: groups?.event ?? 0,
    helped: groups?.prevented ?? 0,
    harmed: groups?.caused ?? 0,
    free: groups?.free ?? 0,
  };
  return Object.fromEntries(Object.entries(found).filter(([, value]) => value > 0));
}

describe('the format demonstrations', () => {
  it.each([STONE, SCREENING])('draws %s with 100 and with 1000 people, each as the core counts it', (name) => {
    const slide = buildSlide(itemOf(demoTopic(name)), 'denominator');
    const [hundred, thousand] = slide.panels;
    expect(hundred?.layout.denominator).toBe(100);
    expect(thousand?.layout.denominator).toBe(1000);
    const at100 = groupsAt(name, 100);
    const at1000 = groupsAt(name, 1000);
    // The demonstration topics' events are unwanted: the people spared are drawn helped.
    expect(counts(hundred)).toEqual(looksOf(at100));
    expect(counts(thousand)).toEqual(looksOf(at1000));
    expect(slide.evidence).toEqual({
      finding: 'With 1000 rather than 100 people, risks seemed more serious and risk reductions larger.',
      source: 'Galesic, Garcia-Retamero & Gigerenzer 2009',
    });
  });

  it('draws the same people grouped and scattered, with the fixed seed, so only the arrangement differs', () => {
    const slide = buildSlide(itemOf(demoTopic(STONE)), 'arrangement');
    const [grouped, scattered] = slide.panels;
    expect(grouped?.layout.arrangement).toBe('grouped');
    expect(scattered?.layout.arrangement).toBe('scattered');
    expect(scattered?.layout.seed).toBe(DEFAULT_SCATTER_SEED);
    expect(counts(scattered)).toEqual(counts(grouped));
    const placesOf = (panel: PeoplePanel | undefined) =>
      panel?.layout.people.filter((person) => person.group !== 'free').map((person) => person.index);
    expect(placesOf(scattered)).not.toEqual(placesOf(grouped));
    // Drawn twice, the scattered picture is the same picture.
    expect(placesOf(buildSlide(itemOf(demoTopic(STONE)), 'arrangement').panels[1])).toEqual(placesOf(scattered));
    expect(slide.evidence?.source).toBe('Ancker, Weber & Kukafka 2011');
  });

  it('draws two totals beside the change shown as its own group, and gives the comparison’s total', () => {
    const slide = buildSlide(itemOf(demoTopic(STONE)), 'incremental');
    const [totals, change] = slide.panels;
    expect(counts(totals)).toEqual({ event: 24, free: 76 });
    expect(counts(change)).toEqual({ event: 24, helped: 16, free: 60 });
    expect(slide.lines.map((line) => line.text)).toEqual(['Without it (no change): 40 in 100.']);
    // Zikmund-Fisher et al. (J Health Commun 2008;13:107–124), abstract: in two online experiments
    // on medication side effects, incremental risk formats lowered worry and reduced the bias from
    // the denominator. Zikmund-Fisher et al. (Patient Educ Couns 2008;73:209–214), abstract: with 631
    // women weighing tamoxifen, incremental formats gave low knowledge in numeric text only, and
    // pictographs raised comprehension. The line says the studies were about side effects.
    expect(slide.evidence).toEqual({
      finding: 'Side effects: the extra risk on its own eased worry; in words alone it was less clear, with pictures clearer.',
      source: 'Zikmund-Fisher, J Health Commun 2008;13:107 · Patient Educ Couns 2008;73:209',
    });
  });
});
