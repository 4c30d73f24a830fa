/**
 * `chancewise chart` writes the very file the app saves for the same chart and settings:
 * the app draws in the page's document (here a jsdom page's, serialised by its XMLSerializer) and
 * the command line in its own text document, and the bytes are compared whole. Every demo
 * topic's every outcome, with and without the range outline, and an invented topic whose
 * names hold the characters XML escapes.
 */
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { computeTopic } from '../../src/core/topic/compute-topic.ts';
import { outcomeChart } from '../../src/render/chart-model.ts';
import { chartSvgFile } from '../../src/ui/export/chart-export.ts';
import { demos } from '../handout/support.ts';
import { shapedTopic } from '../handout/topic-builder.ts';
import { testDocument } from '../render/svg/parse-svg.ts';
import { ROOT, run } from './support.ts';

const folder = mkdtempSync(join(tmpdir(), 'chancewise-chart-export-'));

async function cliChart(topicFile: string, outcomeId: string, showRange: boolean): Promise<string> {
  const out = join(folder, `${outcomeId}-${String(showRange)}.svg`);
  const result = await run(['chart', topicFile, '--outcome', outcomeId, '--out', out, ...(showRange ? ['--show-range'] : [])]);
  expect(result).toMatchObject({ code: 0, stderr: '' });
  return readFileSync(out, 'utf8');
}

describe('chancewise chart and the app’s SVG export', () => {
  const cases = demos().flatMap((demo) =>
    demo.result.outcomes.flatMap((outcome) =>
      [false, true].map((showRange) => [demo.name, outcome.outcomeId, showRange] as const),
    ),
  );

  it.each(cases)('%s, outcome %s, range outline %s: the same bytes', async (name, outcomeId, showRange) => {
    const demo = demos().find((each) => each.name === name);
    if (demo === undefined) throw new Error(`no demo ${name}`);
    const app = chartSvgFile(outcomeChart(demo.result, outcomeId), testDocument, { showRange });
    const cli = await cliChart(join(ROOT, 'assets', 'demo', name), outcomeId, showRange);
    expect(cli).toBe(app);
    expect(cli.startsWith('<?xml version="1.0" encoding="UTF-8"?>\n<svg xmlns="http://www.w3.org/2000/svg" viewBox="')).toBe(
      true,
    );
  });

  it('escapes names with &, <, > and quotes as the app’s serialiser does', async () => {
    const topic = shapedTopic({
      options: 3,
      outcomes: 2,
      optionName: (index) => `tablet "${index}" & <rest>`,
      outcomeName: (index) => `a fall > ${index + 1} m & "bruising"`,
    });
    const file = join(folder, 'escapes.json');
    writeFileSync(file, JSON.stringify({ format: 'chancewise-topic', version: 2, topic: { ...topic, patient: null } }));
    const app = chartSvgFile(outcomeChart(computeTopic(topic), 'outcome-0'), testDocument, { showRange: true });
    const cli = await cliChart(file, 'outcome-0', true);
    expect(cli).toBe(app);
    expect(cli).toContain('&amp;');
    expect(cli).toContain('&lt;rest&gt;');
  });
});
