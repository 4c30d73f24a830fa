// @vitest-environment jsdom
import { cleanup, fireEvent, render, screen } from '@testing-library/svelte';
import { flushSync } from 'svelte';
import { afterEach, describe, expect, test } from 'vitest';
import EditorPanel from '../../../src/ui/components/EditorPanel.svelte';
import { draftFromTopic } from '../../../src/ui/draft/draft-from-topic.ts';
import { DEMO_TOPICS } from '../state/demo-topics-read.ts';
import { TopicEditor } from '../../../src/ui/state/topic-editor.svelte.ts';
import { englishLocales } from '../../../src/locale/english.ts';
import { localeContext } from '../../../src/ui/state/locale-context.ts';

const englishContext = () => localeContext({ current: englishLocales });

// The editor's "About this topic" group and "Still to fill in for the handout" (Chancewise's own
// screens); the entries are the IPDAS instrument's disclosures (Elwyn et al. 2009, PLoS ONE 4(3):e4705).

afterEach(() => cleanup());

function setUp(index: number) {
  const found = DEMO_TOPICS[index];
  if (found === undefined) throw new Error('no demonstration topic');
  const editor = new TopicEditor(draftFromTopic(found.topic));
  render(EditorPanel, { context: englishContext(), props: { editor } });
  return editor;
}

const gapsRegion = () => screen.queryByRole('region', { name: /Still to fill in for the handout/ });

describe('the About this topic group', () => {
  test('asks for who prepared the topic, funding, interests and a review-by date, each labelled', () => {
    setUp(0);
    const group = screen.getByRole('region', { name: 'About this topic' });
    for (const label of ['Prepared by', 'Funding', 'Interests', 'Review by']) {
      const field = screen.getByLabelText(label);
      expect(group.contains(field)).toBe(true);
      expect(field).toHaveProperty('value', '');
    }
  });

  test('lists the missing disclosures as still to fill in for the handout, each a link to its field', () => {
    setUp(0);
    const region = gapsRegion();
    expect(region?.querySelector('h3')?.textContent).toBe('Still to fill in for the handout (4)');
    const links = [...(region?.querySelectorAll('a') ?? [])];
    expect(links.map((link) => link.textContent)).toEqual([
      'Who prepared this topic',
      'Who funded it',
      'Interests (conflicts of interest) of those who prepared it',
      'The date to review it by',
    ]);
    expect(links[1]?.getAttribute('href')).toBe(`#${screen.getByLabelText('Funding').id}`);
    // The results do not wait for them: nothing is listed as blocking.
    expect(screen.queryByText(/before the results can update/)).toBeNull();
  });

  test('takes an entry off the list once it is typed, and the list away once all are', () => {
    const editor = setUp(0);
    fireEvent.input(screen.getByLabelText('Funding'), { target: { value: 'None' } });
    flushSync();
    expect(gapsRegion()?.querySelector('h3')?.textContent).toBe('Still to fill in for the handout (3)');
    for (const [label, value] of [
      ['Prepared by', 'Hillside practice nurses'],
      ['Interests', 'None declared'],
      ['Review by', '2028-06-30'],
    ] as const) {
      fireEvent.input(screen.getByLabelText(label), { target: { value } });
    }
    flushSync();
    expect(gapsRegion()).toBeNull();
    expect(editor.draft.about).toEqual({
      preparedBy: 'Hillside practice nurses',
      funding: 'None',
      interests: 'None declared',
      reviewBy: '2028-06-30',
    });
  });

  test('marks a review-by date that is not YYYY-MM-DD beside its field', () => {
    setUp(0);
    const field = screen.getByLabelText('Review by');
    fireEvent.input(field, { target: { value: '30/06/2028' } });
    flushSync();
    expect(field.getAttribute('aria-invalid')).toBe('true');
    expect(screen.getAllByText(/is not written as year-month-day/).length).toBeGreaterThan(0);
  });
});

describe('the Screening test group', () => {
  test('is open with the screening demo’s entries, and closed for a topic with none', () => {
    setUp(1);
    expect(screen.getByLabelText('Missed cases (false reassurance)')).toHaveProperty('value', '3 in 1000');
    expect(screen.getByLabelText('Overdiagnosis')).toHaveProperty('value', '4 in 1000');
    const open = screen.getByLabelText('Overdiagnosis').closest('details');
    expect(open?.open).toBe(true);
    cleanup();
    setUp(0);
    expect(screen.getByLabelText('Overdiagnosis').closest('details')?.open).toBe(false);
  });

  test('refuses a chance that is not a risk, with the forms a risk may take', () => {
    setUp(1);
    const field = screen.getByLabelText('Overdiagnosis');
    fireEvent.input(field, { target: { value: 'some' } });
    flushSync();
    expect(field.getAttribute('aria-invalid')).toBe('true');
    expect(
      screen.getAllByText('"some" is not a risk. Write it as 20%, 0.2, 20/100, 1 in 5 or 200 per 1000.').length,
    ).toBeGreaterThan(0);
  });
});
