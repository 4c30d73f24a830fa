import { describe, expect, it } from 'vitest';
import { blankDraft, setDisclosure, setEffectField, setOptionName, setOutcomeText } from '../../../src/ui/draft/draft-edits.ts';
import { draftFromTopic } from '../../../src/ui/draft/draft-from-topic.ts';
import { checkDraft } from '../../../src/ui/draft/check-draft.ts';
import { handoutGaps } from '../../../src/ui/draft/handout-gaps.ts';
import { fieldPlace } from '../../../src/ui/draft/field-keys.ts';
import { DEMO_TOPICS } from '../state/demo-topics-read.ts';
import { TopicEditor } from '../../../src/ui/state/topic-editor.svelte.ts';

// "Still to fill in for the handout": what the handout would print as "not stated". The items are
// the IPDAS instrument's disclosures (Elwyn et al. 2009, PLoS ONE 4(3):e4705: developers, funding,
// conflicts of interest, update date, references to the evidence); their order is the editor's own.

const demo = (index: number) => {
  const found = DEMO_TOPICS[index];
  if (found === undefined) throw new Error('no demonstration topic');
  return draftFromTopic(found.topic);
};

describe('the entries the handout still lacks', () => {
  it('are, for a new topic, the source of its one effect and every disclosure, in the order on screen', () => {
    const draft = setOptionName(blankDraft(), 'option-1', 'the tablet');
    expect(handoutGaps(draft)).toEqual([
      { key: 'outcomes.outcome-1.effects.option-1.source', what: 'effect-source' },
      { key: 'about.preparedBy', what: 'preparedBy' },
      { key: 'about.funding', what: 'funding' },
      { key: 'about.interests', what: 'interests' },
      { key: 'about.reviewBy', what: 'reviewBy' },
    ]);
    // The effect's entry says where it is, as the list shows it away from its field.
    expect(fieldPlace('outcomes.outcome-1.effects.option-1.source', setOutcomeText(draft, 'outcome-1', 'name', 'a stroke'))).toBe(
      'a stroke, effect of the tablet',
    );
  });

  it('leave out each disclosure once it is given, and count blank text as not given', () => {
    let draft = setDisclosure(blankDraft(), 'preparedBy', 'Hillside practice');
    draft = setDisclosure(draft, 'funding', '   ');
    draft = setEffectField(draft, 'outcome-1', 'option-1', 'source', 'An invented trial');
    expect(handoutGaps(draft).map((gap) => gap.key)).toEqual(['about.funding', 'about.interests', 'about.reviewBy']);
  });

  it('are none for the screening demo, which gives every disclosure and every source', () => {
    expect(handoutGaps(demo(1))).toEqual([]);
  });

  it('are only the disclosures for a demo that gives every source but no disclosures', () => {
    expect(handoutGaps(demo(0)).map((gap) => gap.key)).toEqual([
      'about.preparedBy',
      'about.funding',
      'about.interests',
      'about.reviewBy',
    ]);
  });

  it('never hold back the results: a topic lacking all of them still computes', () => {
    const draft = demo(0);
    expect(handoutGaps(draft)).toHaveLength(4);
    expect(checkDraft(draft).result).not.toBeNull();
    expect(checkDraft(draft).problems).toEqual([]);
  });

  it('follow every edit in the editor’s state', () => {
    const editor = new TopicEditor(demo(0));
    expect(editor.handoutGaps).toHaveLength(4);
    editor.change((draft) => setDisclosure(draft, 'reviewBy', '2028-06-30'), 'about.reviewBy');
    expect(editor.handoutGaps.map((gap) => gap.key)).toEqual(['about.preparedBy', 'about.funding', 'about.interests']);
    editor.undo();
    expect(editor.handoutGaps).toHaveLength(4);
  });
});

describe('a review-by date typed in the editor', () => {
  it('is marked on its own field when it is not YYYY-MM-DD, and holds back the results like any mistake', () => {
    const editor = new TopicEditor(demo(0));
    editor.change((draft) => setDisclosure(draft, 'reviewBy', 'June 2028'), 'about.reviewBy');
    expect(editor.problemsFor('about.reviewBy').map((found) => found.message)).toEqual([
      'The review-by date "June 2028" is not written as year-month-day. Write it YYYY-MM-DD, for example 2028-06-30, or leave it empty.',
    ]);
    expect(editor.stale).toBe(true);
  });
});
