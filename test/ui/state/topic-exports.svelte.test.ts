// @vitest-environment jsdom
import { describe, expect, it } from 'vitest';
import { outcomeChart } from '../../../src/render/chart-model.ts';
import { setHandoutChoice, setTopicText } from '../../../src/ui/draft/draft-edits.ts';
import type { HandoutMaker, HandoutRequest } from '../../../src/ui/handout/handout-builder.ts';
import { AppMessages } from '../../../src/ui/state/app-messages.svelte.ts';
import { DEMO_TOPICS } from './demo-topics-read.ts';
import { MemoryStorage } from '../../../src/ui/state/key-value-storage.ts';
import { TopicDocument } from '../../../src/ui/state/topic-document.svelte.ts';
import { TopicExports } from '../../../src/ui/state/topic-exports.svelte.ts';
import { fakePlatform } from './fake-platform.ts';

// A PDF file starts with "%PDF-" (ISO 32000-1:2008, 7.5.2); SVG is served as image/svg+xml
// (W3C SVG 1.1, Appendix P) and a standalone file opens with the XML declaration (W3C XML 1.0, 2.8).

const PDF_BYTES = new TextEncoder().encode('%PDF-1.7\n');

/** Exports of the first example, with a handout maker that records what it was asked. */
function setUp(
  made: () => Promise<Awaited<ReturnType<HandoutMaker['makeHandout']>>> = () => Promise.resolve({ ok: true, pdf: PDF_BYTES }),
) {
  const platform = fakePlatform('desktop', new MemoryStorage());
  const messages = new AppMessages(() => undefined);
  const topic = new TopicDocument({ platform, demos: DEMO_TOPICS, messages, editor: { schedule: () => () => undefined } });
  const requests: HandoutRequest[] = [];
  let loads = 0;
  const exports = new TopicExports({
    editor: topic.editor,
    platform,
    messages,
    document,
    loadMaker: () => {
      loads += 1;
      return Promise.resolve({ makeHandout: (request) => (requests.push(request), made()) });
    },
    today: () => new Date(2026, 10, 3, 23, 30),
  });
  return { platform, messages, topic, exports, requests, loads: () => loads };
}

describe('TopicExports', () => {
  it('keeps the warnings of the handout just made, and clears them with the next one', async () => {
    const warning = 'The text in the title reads at about grade 13.1, above grade 8.';
    let warnings: readonly string[] = [warning];
    const { exports, platform } = setUp(() => Promise.resolve({ ok: true, pdf: PDF_BYTES, warnings }));
    await exports.makeHandout();
    expect(exports.handoutWarnings).toEqual([warning]);
    // A warning never holds the handout back.
    expect(platform.savedHandouts).toHaveLength(1);
    warnings = [];
    await exports.makeHandout();
    expect(exports.handoutWarnings).toEqual([]);
  });

  it('drops the warnings once the topic changes, as they may no longer hold', async () => {
    const warning = 'The text in the title reads at about grade 13.1, above grade 8.';
    const { exports, topic } = setUp(() => Promise.resolve({ ok: true, pdf: PDF_BYTES, warnings: [warning] }));
    await exports.makeHandout();
    expect(exports.handoutWarnings).toEqual([warning]);
    topic.editor.change((draft) => setTopicText(draft, 'title', 'A plain title'), 'title');
    expect(exports.handoutWarnings).toEqual([]);
  });

  it('makes the handout of the results on screen, dated today where the person is, and saves it', async () => {
    const { exports, platform, messages, requests, topic } = setUp();
    const done = exports.makeHandout({ paper: 'letter', showNnt: true });
    expect(exports.handoutBusy).toBe(true);
    await done;
    expect(exports.handoutBusy).toBe(false);
    expect(requests).toHaveLength(1);
    expect(requests[0]).toMatchObject({ paper: 'letter', showNnt: true, date: '2026-11-03' });
    expect(requests[0]?.result).toBe(topic.editor.shown);
    expect(platform.savedHandouts.map((saved) => saved.name)).toEqual(['ways-to-cut-the-chance-of-a-second-handout.pdf']);
    expect(platform.savedHandouts[0]?.pdf).toBe(PDF_BYTES);
    expect(messages.message?.text).toBe(
      'The handout is saved as “ways-to-cut-the-chance-of-a-second-handout.pdf”. Open it to print it.',
    );
  });

  it('makes the menu’s handout with the topic’s own choices: A4 without the NNT unless the topic says otherwise', async () => {
    const { exports, requests, topic } = setUp();
    await exports.makeHandout();
    expect(requests[0]).toMatchObject({ paper: 'a4', showNnt: false });
    topic.editor.change((draft) => setHandoutChoice(setHandoutChoice(draft, 'paper', 'letter'), 'showNnt', true));
    await exports.makeHandout();
    expect(requests[1]).toMatchObject({ paper: 'letter', showNnt: true });
  });

  it('prints the handout with the topic’s choices and says where it is open, by file name', async () => {
    const { exports, platform, messages, requests } = setUp();
    await exports.printHandout();
    expect(requests[0]).toMatchObject({ paper: 'a4', showNnt: false });
    expect(platform.printedHandouts.map((printed) => printed.name)).toEqual(['ways-to-cut-the-chance-of-a-second-handout.pdf']);
    expect(platform.printedHandouts[0]?.pdf).toBe(PDF_BYTES);
    expect(messages.message).toEqual({
      tone: 'info',
      text: 'The handout “ways-to-cut-the-chance-of-a-second-handout.pdf” is open in your PDF viewer: print it from there.',
    });
    expect(exports.handoutBusy).toBe(false);
  });

  it('prints nothing from out-of-date results, and says why', async () => {
    const { exports, topic, platform, messages, loads } = setUp();
    topic.editor.change((draft) => setTopicText(draft, 'periodYears', 'ten'), 'periodYears');
    await exports.printHandout();
    expect(loads()).toBe(0);
    expect(platform.printedHandouts).toHaveLength(0);
    expect(messages.message).toEqual({
      tone: 'error',
      text: 'Fix the marked fields first: the handout is only made from up-to-date results.',
    });
  });

  it('says when the handout could not be printed, in the shell’s own words', async () => {
    const { exports, platform, messages } = setUp();
    platform.saveAnswer = () => new Error('The handout could not be printed. (no viewer)');
    await exports.printHandout();
    expect(messages.message).toEqual({ tone: 'error', text: 'The handout could not be printed. (no viewer)' });
  });

  it('makes nothing from results that are out of date', async () => {
    const { exports, topic, loads } = setUp();
    topic.editor.change((draft) => setTopicText(draft, 'periodYears', 'ten'), 'periodYears');
    expect(topic.editor.stale).toBe(true);
    await exports.makeHandout();
    expect(loads()).toBe(0);
  });

  it('says why a handout could not be made, in the handout’s words or the error’s', async () => {
    const refused = setUp(() => Promise.resolve({ ok: false, message: 'The handout does not fit on one page.' }));
    await refused.exports.makeHandout();
    expect(refused.messages.message).toEqual({ tone: 'error', text: 'The handout does not fit on one page.' });
    expect(refused.platform.savedHandouts).toHaveLength(0);
    const failed = setUp(() => Promise.reject(new Error('a font is missing')));
    await failed.exports.makeHandout();
    expect(failed.messages.message).toEqual({ tone: 'error', text: 'The handout could not be made: a font is missing.' });
    expect(failed.exports.handoutBusy).toBe(false);
  });

  it('saves a chart as SVG named after the topic and the chart, and says so with the file name', async () => {
    const { exports, platform, messages, topic } = setUp();
    const shown = topic.editor.shown;
    if (shown === null) throw new Error('the example has no results');
    const model = outcomeChart(shown, 'stone');
    await exports.exportChart(model, 'svg', false);
    expect(platform.savedFiles).toHaveLength(1);
    expect(platform.savedFiles[0]?.name).toBe('ways-to-cut-the-chance-of-a-second-another-kidney-stone.svg');
    expect(platform.savedFiles[0]?.type).toBe('image/svg+xml');
    expect(messages.message).toEqual({
      tone: 'info',
      text: `The chart is saved as “ways-to-cut-the-chance-of-a-second-another-kidney-stone.svg”.`,
    });
    expect(String(platform.savedFiles[0]?.contents)).toMatch(
      /^<\?xml version="1\.0" encoding="UTF-8"\?>\s*<svg[^>]*xmlns="http:\/\/www\.w3\.org\/2000\/svg"/,
    );
  });

  it('says when a chart could not be saved', async () => {
    const { exports, platform, messages, topic } = setUp();
    platform.saveAnswer = () => new Error('no room left');
    const shown = topic.editor.shown;
    if (shown === null) throw new Error('the example has no results');
    await exports.exportChart(outcomeChart(shown, 'stone'), 'svg', false);
    expect(messages.message).toEqual({ tone: 'error', text: 'The chart could not be saved: no room left.' });
  });
});
