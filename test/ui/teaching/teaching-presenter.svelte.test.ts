// @vitest-environment jsdom
import { describe, expect, it } from 'vitest';
import type { Topic } from '../../../src/core/topic/topic.ts';
import { DEFAULT_STEPS } from '../../../src/teaching/teaching-steps.ts';
import type { OpenedFile } from '../../../src/ui/platform/platform.ts';
import { EXAMPLE_SETS } from '../../../src/ui/teaching/teaching-examples.ts';
import { TeachingPresenter } from '../../../src/ui/teaching/teaching-presenter.svelte.ts';
import { STONE, demoTopic } from '../../teaching/teaching-fixtures.ts';

// The keys are those of slide software and presentation clickers (common practice, as in
// teaching-keys.ts); the messages are the view's own words (src/teaching/messages/en.ts).

interface Saved {
  readonly name: string;
  readonly contents: string | Uint8Array;
  readonly type: string;
}

/** A presenter of the kidney stone demonstration topic on a platform the test answers for. */
function setUp(
  answers: { save?: (name: string) => Promise<string | null>; pick?: () => Promise<OpenedFile | null> } = {},
  topic: Topic = demoTopic(STONE),
) {
  const saved: Saved[] = [];
  let left = 0;
  let focused = 0;
  const presenter = new TeachingPresenter({
    topic,
    per: null,
    platform: {
      saveFile: (name, contents, type) => {
        saved.push({ name, contents, type });
        return answers.save === undefined ? Promise.resolve(name) : answers.save(name);
      },
      pickTextFile: () => (answers.pick === undefined ? Promise.resolve(null) : answers.pick()),
    },
    document,
    examples: EXAMPLE_SETS,
    onleave: () => (left += 1),
    refocus: () => (focused += 1),
  });
  return { presenter, saved, left: () => left, focused: () => focused };
}

const stoneTitle = demoTopic(STONE).title;
// The kidney stone topic shows every default step, with one more slide each for its second harm and that harm's words.
const stoneSlides = DEFAULT_STEPS.length + 2;

describe('TeachingPresenter', () => {
  it('opens on the topic’s first slide and says where the presenter is', () => {
    const { presenter } = setUp();
    expect(presenter.problem).toBeNull();
    expect(presenter.session.slide?.kind).toBe('title');
    expect(presenter.progressLabel).toBe(`Slide 1 of ${stoneSlides}`);
    expect(presenter.announcement).toBe(`Slide 1 of ${stoneSlides}: ${stoneTitle}`);
  });

  it('says why a topic with a problem cannot be presented, and has no slides', () => {
    const topic = demoTopic(STONE);
    const broken: Topic = {
      ...topic,
      outcomes: topic.outcomes.map((outcome, index) =>
        index === 0 ? { ...outcome, baseline: { ...outcome.baseline, risk: '5/0' } } : outcome,
      ),
    };
    const { presenter } = setUp({}, broken);
    expect(presenter.problem).toBe(
      'This topic cannot be presented yet: "5/0" divides by zero. The number of people must be at least 1.',
    );
    expect(presenter.session.total).toBe(0);
    expect(presenter.announcement).toBe('');
  });

  it('takes the keys of the view and leaves others to the page', () => {
    const { presenter, left } = setUp();
    expect(presenter.key({ key: 'PageDown' })).toBe(true);
    expect(presenter.key({ key: 'ArrowRight' })).toBe(true);
    expect(presenter.session.slide?.kind).toBe('with-option');
    expect(presenter.key({ key: 'End' })).toBe(true);
    expect(presenter.announcement).toBe(`Slide ${stoneSlides} of ${stoneSlides}: Two totals, or the change itself?`);
    expect(presenter.key({ key: 'a' })).toBe(false);
    expect(presenter.key({ key: 's', ctrlKey: true })).toBe(false);
    // Space on a button presses the button, not the slide.
    expect(presenter.key({ key: ' ', onControl: true })).toBe(false);
    expect(left()).toBe(0);
  });

  it('closes its menu with Escape before leaving, and leaves once however often it is asked', () => {
    const { presenter, left } = setUp();
    presenter.toggleMenu();
    expect(presenter.key({ key: 'Escape' })).toBe(true);
    expect(presenter.menuOpen).toBe(false);
    expect(left()).toBe(0);
    presenter.toggleMenu();
    presenter.cancel();
    expect(presenter.menuOpen).toBe(false);
    expect(left()).toBe(0);
    expect(presenter.key({ key: 'Escape' })).toBe(true);
    presenter.cancel();
    presenter.leave();
    expect(left()).toBe(1);
  });

  it('opens the example set, says so on its first slide, and the message goes at the next step', async () => {
    const { presenter, focused } = setUp();
    presenter.step('next');
    await presenter.openExample();
    expect(presenter.session.index).toBe(0);
    expect(presenter.session.title).toBe('Framing and format: two illustrative topics');
    expect(presenter.message).toEqual({
      tone: 'info',
      text: 'Opened the teaching set “Framing and format: two illustrative topics”: 2 topics.',
    });
    expect(presenter.progressLabel).toMatch(/^Slide 1 of \d+, topic 1 of 2$/);
    expect(focused()).toBe(1);
    presenter.step('previous');
    expect(presenter.message).not.toBeNull();
    presenter.step('next');
    expect(presenter.message).toBeNull();
  });

  it('keeps the presentation when a picked set cannot be read, and says what is wrong', async () => {
    const { presenter } = setUp({ pick: () => Promise.resolve({ name: 'notes.json', text: '{"format": "something-else"}' }) });
    presenter.step('next');
    await presenter.openSet();
    expect(presenter.message?.tone).toBe('error');
    expect(presenter.message?.text).toMatch(/^“notes\.json”.* The presentation is unchanged\.$/);
    expect(presenter.session.title).toBe(stoneTitle);
    expect(presenter.session.index).toBe(1);
    // Opening the menu again clears the message.
    presenter.toggleMenu();
    expect(presenter.message).toBeNull();
  });

  it('saves the slide shown as SVG, named after the presentation and the step, with the place at its foot', async () => {
    const { presenter, saved, focused } = setUp();
    presenter.step('next');
    presenter.toggleMenu();
    await presenter.exportSlide('svg');
    expect(presenter.menuOpen).toBe(false);
    expect(presenter.busy).toBe(false);
    expect(saved).toHaveLength(1);
    expect(saved[0]?.name).toBe('ways-to-cut-the-chance-of-02-baseline.svg');
    expect(saved[0]?.type).toBe('image/svg+xml');
    expect(String(saved[0]?.contents)).toContain(`>Slide 2 of ${stoneSlides}</text>`);
    expect(presenter.message).toEqual({ tone: 'info', text: 'Saved the slide as “ways-to-cut-the-chance-of-02-baseline.svg”.' });
    expect(focused()).toBe(1);
  });

  it('says when the slide could not be saved, and says nothing when saving was cancelled', async () => {
    const failing = setUp({ save: () => Promise.reject(new Error('The disk is full')) });
    await failing.presenter.exportSlide('svg');
    expect(failing.presenter.message).toEqual({ tone: 'error', text: 'The slide could not be saved: The disk is full.' });
    expect(failing.presenter.busy).toBe(false);
    const cancelled = setUp({ save: () => Promise.resolve(null) });
    await cancelled.presenter.exportSlide('svg');
    expect(cancelled.presenter.message).toBeNull();
  });

  it('saves the presentation as a teaching set, under the set’s own name once it came from one', async () => {
    const { presenter, saved } = setUp();
    await presenter.saveSet();
    expect(saved[0]?.name).toBe('ways-to-cut-the-chance-of.teaching.json');
    expect(saved[0]?.type).toBe('application/json');
    expect(JSON.parse(String(saved[0]?.contents))).toMatchObject({ format: 'chancewise-teaching-set', title: stoneTitle });
    expect(presenter.message).toEqual({ tone: 'info', text: 'Saved “ways-to-cut-the-chance-of.teaching.json”.' });
    await presenter.openExample();
    await presenter.saveSet();
    expect(saved[1]?.name).toBe('framing-and-format.teaching.json');
  });
});
