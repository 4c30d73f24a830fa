import { describe, expect, it } from 'vitest';
import { readTeachingSet } from '../../../src/teaching/teaching-set-file.ts';
import { resolveTeachingSet } from '../../../src/teaching/resolve-teaching-set.ts';
import { teachingKeyAction } from '../../../src/ui/teaching/teaching-keys.ts';
import type { KeyPress } from '../../../src/ui/teaching/teaching-keys.ts';
import { slidePlaces } from '../../../src/teaching/slide-places.ts';
import { TeachingSession } from '../../../src/ui/teaching/teaching-session.svelte.ts';
import { DEFAULT_STEPS } from '../../../src/teaching/teaching-steps.ts';
import { STONE, SCREENING, demoTopic, itemOf } from '../../teaching/teaching-fixtures.ts';

// The step order is the teaching sequence of this view: the result told with people first
// (baseline, with the option, helped, harmed, uncertainty, patient words), then one result
// framed four ways, then the format demonstrations (Galesic 2009; Ancker 2011;
// Zikmund-Fisher 2008), as listed in src/teaching/teaching-steps.ts.

function stoneSession(): TeachingSession {
  return new TeachingSession('Kidney stone', [itemOf(demoTopic(STONE))]);
}

function press(session: TeachingSession, key: KeyPress): boolean {
  const action = teachingKeyAction(key);
  return action === null ? false : session.act(action);
}

describe('TeachingSession', () => {
  it('starts on the first slide, the decision, and shows every step in the teaching order, every harm on its own slide', () => {
    const session = stoneSession();
    expect(session.index).toBe(0);
    expect(session.slide?.kind).toBe('title');
    const shown: string[] = [];
    do shown.push(`${session.slide?.kind ?? ''}: ${session.slide?.heading ?? ''}`);
    while (session.next());
    expect(shown).toEqual([
      `title: ${demoTopic(STONE).title}`,
      'baseline: Without the option',
      'with-option: With the option',
      'helped: Who is helped',
      'harmed: Who is harmed (1 of 2)',
      'harmed: Who is harmed (2 of 2)',
      'uncertainty: How sure are we?',
      'patient-words: What the patient hears (1 of 2)',
      'patient-words: What the patient hears (2 of 2)',
      'framing: One result, four ways',
      'denominator: 100 or 1000 people?',
      'arrangement: Grouped or scattered?',
      'incremental: Two totals, or the change itself?',
    ]);
    // The kidney stone topic has two harms: one more harm slide, and its harms' words on a slide of their own.
    expect(session.total).toBe(DEFAULT_STEPS.length + 2);
  });

  it('stays on the last slide going forward and on the first going back', () => {
    const session = stoneSession();
    expect(session.previous()).toBe(false);
    expect(session.atStart).toBe(true);
    expect(session.last()).toBe(true);
    expect(session.atEnd).toBe(true);
    expect(session.next()).toBe(false);
    expect(session.slide?.kind).toBe('incremental');
    expect(session.first()).toBe(true);
    expect(session.slide?.kind).toBe('title');
  });

  it('steps with the keys of a keyboard and of a presentation clicker', () => {
    const session = stoneSession();
    expect(press(session, { key: 'PageDown' })).toBe(true);
    expect(press(session, { key: 'ArrowRight' })).toBe(true);
    expect(press(session, { key: ' ' })).toBe(true);
    expect(press(session, { key: 'ArrowDown' })).toBe(true);
    expect(session.slide?.kind).toBe('harmed');
    expect(press(session, { key: 'PageUp' })).toBe(true);
    expect(press(session, { key: 'ArrowUp' })).toBe(true);
    expect(press(session, { key: 'ArrowLeft' })).toBe(true);
    expect(session.slide?.kind).toBe('baseline');
    expect(press(session, { key: 'End' })).toBe(true);
    expect(session.slide?.kind).toBe('incremental');
    expect(press(session, { key: 'Home' })).toBe(true);
    expect(session.slide?.kind).toBe('title');
    // Leaving is the view's business: the place does not change.
    expect(press(session, { key: 'Escape' })).toBe(false);
    expect(session.index).toBe(0);
  });

  it('runs the topics of a set in sequence, each with its own steps', async () => {
    const set = readTeachingSet(
      'set.json',
      JSON.stringify({
        format: 'chancewise-teaching-set',
        version: 1,
        title: 'Two topics',
        items: [
          {
            topic: JSON.parse(JSON.stringify({ format: 'chancewise-topic', version: 2, topic: demoTopic(STONE) })),
            steps: ['title', 'helped'],
          },
          {
            topic: { format: 'chancewise-topic', version: 2, topic: demoTopic(SCREENING) },
            steps: ['title', 'harmed', 'framing'],
          },
        ],
      }),
    );
    if (!set.ok) throw new Error(set.message);
    const resolved = await resolveTeachingSet('set.json', set.set, null);
    if (!resolved.ok) throw new Error(resolved.message);
    const session = stoneSession();
    session.next();
    session.load(resolved.title, resolved.items, 'set.json');
    expect(session.index).toBe(0);
    expect(session.title).toBe('Two topics');
    expect(session.fileName).toBe('set.json');
    expect(slidePlaces(session.items).map((place) => [place.item, place.kind])).toEqual([
      [0, 'title'],
      [0, 'helped'],
      [1, 'title'],
      [1, 'harmed'],
      [1, 'harmed'],
      [1, 'framing'],
    ]);
    session.goTo(2);
    expect(session.item?.topic.title).toBe(demoTopic(SCREENING).title);
    expect(session.slide?.heading).toBe(demoTopic(SCREENING).title);
  });

  it('writes the presentation as a set that reads back to the same topics and steps', () => {
    const session = new TeachingSession('Saved', [itemOf(demoTopic(STONE), { steps: ['helped', 'framing'], option: 'citrate' })]);
    const reading = readTeachingSet('saved.json', session.setFileText());
    if (!reading.ok) throw new Error(reading.message);
    expect(reading.set.title).toBe('Saved');
    expect(reading.set.items[0]).toMatchObject({
      option: 'citrate',
      steps: ['helped', 'framing'],
      source: { kind: 'embedded', topic: demoTopic(STONE) },
    });
  });

  it('presents a copy: stepping through never changes the topic it was given', () => {
    const topic = demoTopic(STONE);
    const before = JSON.stringify(topic);
    const session = new TeachingSession('Kidney stone', [itemOf(topic)]);
    while (session.next()) void session.slide;
    expect(JSON.stringify(topic)).toBe(before);
  });
});
