// @vitest-environment jsdom
import { cleanup, render, screen } from '@testing-library/svelte';
import { afterEach, describe, expect, test } from 'vitest';
import HandoutCard from '../../../src/ui/components/HandoutCard.svelte';
import { draftFromTopic } from '../../../src/ui/draft/draft-from-topic.ts';
import { DEMO_TOPICS } from '../state/demo-topics-read.ts';
import { TopicEditor } from '../../../src/ui/state/topic-editor.svelte.ts';
import { englishLocales } from '../../../src/locale/english.ts';
import { localeContext } from '../../../src/ui/state/locale-context.ts';

const englishContext = () => localeContext({ current: englishLocales });

afterEach(() => cleanup());

const noop = () => undefined;

describe('HandoutCard', () => {
  // The card says what the printed sheet holds (src/handout/handout-content.ts and page-layout.ts):
  // every outcome with the same elements, pictures for all outcomes or none (compact when the page is full), the table, the prompts, the disclosures.
  test('describes what the handout holds, for benefits and side effects alike', () => {
    const first = DEMO_TOPICS[0];
    if (first === undefined) throw new Error('no demonstration topic');
    const editor = new TopicEditor(draftFromTopic(first.topic));
    render(HandoutCard, {
      context: englishContext(),
      props: { editor, illustrative: true, handoutBusy: false, desktop: false, onhandout: noop, onprint: noop },
    });
    const text = screen.getByRole('region', { name: 'Handout for the patient' }).textContent?.replace(/\s+/g, ' ') ?? '';
    expect(text).toContain('One printed page, marked illustrative.');
    expect(text).toContain('For every benefit and side effect alike');
    expect(text).toContain('with and without each option, the change, its range, how sure the research is');
    expect(text).toContain('Pictures of every outcome at one size, smaller when the page is full, or none when even small ones');
    expect(text).toContain('who prepared the sheet, its funding, interests and review date');
    expect(text).not.toContain('the same numbers, charts and words');
  });
});
