import { describe, expect, it } from 'vitest';
import { blankDraft, setDisclosure, setScreening } from '../../../src/ui/draft/draft-edits.ts';
import { draftFromTopic } from '../../../src/ui/draft/draft-from-topic.ts';
import { parseDraft } from '../../../src/ui/draft/draft-schema.ts';
import { topicFromDraft } from '../../../src/ui/draft/topic-from-draft.ts';
import { DEMO_TOPICS } from '../state/demo-topics-read.ts';

// The disclosures and the screening section as the editor keeps them (Chancewise's own draft shape):
// typed text kept as typed, written to the topic only when something is given.

describe('the disclosures and the screening section in a draft', () => {
  it('come back from the screening demo exactly as its file gives them', () => {
    const screeningDemo = DEMO_TOPICS.find((found) => found.topic.screening !== undefined);
    if (screeningDemo === undefined) throw new Error('no screening demo');
    const draft = draftFromTopic(screeningDemo.topic);
    expect(draft.screening).toEqual({
      positiveLeadsTo: 'a camera test of the bowel to look for the cause',
      missedCase: '3 in 1000',
      overdiagnosis: '4 in 1000',
    });
    expect(draft.about.reviewBy).toBe('2028-06-30');
    expect(topicFromDraft(draft).topic).toEqual(screeningDemo.topic);
  });

  it('are left out of the topic while nothing of them is typed, so an older topic reads back as it was', () => {
    const topic = topicFromDraft(blankDraft()).topic;
    expect(topic.about).toBeUndefined();
    expect(topic.screening).toBeUndefined();
  });

  it('are written once one entry is typed; an empty chance is not given', () => {
    let draft = setScreening(blankDraft(), 'overdiagnosis', '1 in 250');
    draft = setDisclosure(draft, 'interests', 'None declared');
    const { topic } = topicFromDraft(draft);
    expect(topic.screening).toEqual({ positiveLeadsTo: '', missedCase: null, overdiagnosis: '1 in 250' });
    expect(topic.about).toEqual({ preparedBy: '', funding: '', interests: 'None declared', reviewBy: '' });
  });

  it('show a chance stored as a proportion as its number', () => {
    const first = DEMO_TOPICS[0];
    if (first === undefined) throw new Error('no demo');
    const draft = draftFromTopic({ ...first.topic, screening: { positiveLeadsTo: '', missedCase: 0.003, overdiagnosis: null } });
    expect(draft.screening).toEqual({ positiveLeadsTo: '', missedCase: '0.003', overdiagnosis: '' });
  });

  it('read from a draft stored before they existed, empty', () => {
    const { about, screening, ...older } = blankDraft();
    expect(about).toBeDefined();
    expect(screening).toBeDefined();
    const read = parseDraft(JSON.parse(JSON.stringify(older)));
    expect(read?.about).toEqual({ preparedBy: '', funding: '', interests: '', reviewBy: '' });
    expect(read?.screening).toEqual({ positiveLeadsTo: '', missedCase: '', overdiagnosis: '' });
  });

  it('survive a stored draft', () => {
    const draft = setDisclosure(setScreening(blankDraft(), 'missedCase', '3 in 1000'), 'funding', 'None');
    expect(parseDraft(JSON.parse(JSON.stringify(draft)))).toEqual(draft);
  });
});
