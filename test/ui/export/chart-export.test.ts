// @vitest-environment jsdom
/**
 * The exported SVG of a chart keeps what the screen shows: the range outline when it is on,
 * and the wanted-event attribute. Invented, illustrative counts per 100: 19 without and 15
 * with option A, interval 12 to 18.
 */
import { describe, expect, it } from 'vitest';
import { outcomeChart } from '../../../src/render/chart-model.ts';
import { chartSvgFile } from '../../../src/ui/export/chart-export.ts';
import { topicFixture } from '../../render/topic-fixture.ts';

describe('chartSvgFile', () => {
  const model = outcomeChart(topicFixture(), 'stroke');

  it('keeps the range outline when it is on, ringing the six people of ranks 12–17', () => {
    const text = chartSvgFile(model, document, { showRange: true });
    expect(text).toContain('data-show-range="true"');
    const outline = /<path [^>]*class="range-outline"[^>]* data-look="outline" data-count="(\d+)"[^>]* d="([^"]*)"/.exec(text);
    expect(outline?.[1]).toBe('6');
    expect(outline?.[2]?.match(/M/g)).toHaveLength(6);
    expect(text).toContain('Dashed ring:');
  });

  it('draws no outline when it is off, and the same people either way', () => {
    const plain = chartSvgFile(model, document);
    const ringed = chartSvgFile(model, document, { showRange: true });
    expect(plain).not.toContain('range-outline');
    const people = (text: string) => text.match(/<path data-outcome="[a-z]+" data-count="\d+"[^>]*>/g);
    expect(people(ringed)).toEqual(people(plain));
    const count = (text: string) =>
      [...text.matchAll(/data-outcome="[a-z]+" data-count="(\d+)"/g)].reduce((sum, found) => sum + Number(found[1]), 0);
    expect(count(plain)).toBe(200);
  });

  it('says whether the event is wanted on the root', () => {
    expect(chartSvgFile(model, document)).toMatch(/<svg [^>]*data-wanted="false"/);
    const wanted = outcomeChart(
      topicFixture(100, { comparison: 25, intervention: 45, wanted: true, name: 'a response' }),
      'stroke',
    );
    expect(chartSvgFile(wanted, document)).toMatch(/<svg [^>]*data-wanted="true"/);
  });
});
