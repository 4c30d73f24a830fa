import { describe, expect, it } from 'vitest';
import { draftFromTopic } from '../../../src/ui/draft/draft-from-topic.ts';
import {
  addOption,
  blankDraft,
  keepAsTranslated,
  removeQuestion,
  setOptionName,
  setQuestion,
  setTopicText,
} from '../../../src/ui/draft/draft-edits.ts';
import { translatableTexts, untranslatedTexts } from '../../../src/ui/draft/translation-texts.ts';
import { DEMO_TOPICS } from '../state/demo-topics-read.ts';

// Which typed texts a patient reads is Chancewise's own design (the handout prints the title,
// population, names, evidence, questions, disclosures and the screening line); a text still to
// translate is one that still equals its source text (common practice of translation tools).

const [stone, screening] = DEMO_TOPICS;
if (stone === undefined || screening === undefined) throw new Error('the demonstration topics are missing');

describe('the typed texts a patient reads', () => {
  it('lists the kidney stone example’s texts in the order of the fields, each by its field key', () => {
    const texts = translatableTexts(draftFromTopic(stone.topic));
    expect(texts.map((entry) => entry.key)).toEqual([
      'title',
      'population',
      'options.as-now.name',
      'options.water.name',
      'options.citrate.name',
      'outcomes.stone.name',
      'outcomes.night.name',
      'outcomes.stomach.name',
      'evidence.summary',
      'questions.0',
      'questions.1',
      'questions.2',
    ]);
    expect(texts[3]).toEqual({ key: 'options.water.name', kind: 'optionName', text: 'extra water each day' });
    expect(texts[6]).toEqual({
      key: 'outcomes.night.name',
      kind: 'outcomeName',
      text: 'broken sleep from passing urine at night',
    });
  });

  it('includes the funding, interests and screening line, and leaves out names, dates and sources', () => {
    const texts = translatableTexts(draftFromTopic(screening.topic));
    const byKey = new Map(texts.map((entry) => [entry.key, entry]));
    expect(byKey.get('about.funding')).toEqual({
      key: 'about.funding',
      kind: 'funding',
      text: 'none, as an invented example for teaching',
    });
    expect(byKey.get('about.interests')?.text).toBe('None declared');
    expect(byKey.get('screening.positiveLeadsTo')?.text).toBe('a camera test of the bowel to look for the cause');
    for (const key of ['about.preparedBy', 'about.reviewBy', 'clinician', 'evidence.reviewed', 'screening.missedCase']) {
      expect(byKey.has(key)).toBe(false);
    }
    expect(texts.some((entry) => entry.key.endsWith('.source'))).toBe(false);
  });

  it('leaves out what is empty: a new topic has only its comparison’s name to translate', () => {
    expect(translatableTexts(blankDraft())).toEqual([
      { key: 'options.comparison.name', kind: 'optionName', text: 'no treatment' },
    ]);
  });
});

describe('the texts still to translate', () => {
  const copied = {
    ...draftFromTopic(stone.topic),
    language: 'es',
    translation: {
      from: 'en',
      sourceTexts: {
        title: 'Ways to cut the chance of a second kidney stone (illustrative)',
        'options.water.name': 'extra water each day',
        'questions.0': 'How much would another stone matter to me?',
      },
    },
  };

  it('are none for a topic that is not a copy', () => {
    expect(untranslatedTexts(draftFromTopic(stone.topic))).toEqual([]);
  });

  it('are the texts that still equal their source text', () => {
    expect(untranslatedTexts(copied).map((entry) => entry.key)).toEqual(['title', 'options.water.name', 'questions.0']);
  });

  it('lose a text once it is rewritten, but not when only spaces around it change', () => {
    const renamed = setOptionName(copied, 'water', 'más agua cada día');
    expect(untranslatedTexts(renamed).map((entry) => entry.key)).toEqual(['title', 'questions.0']);
    const spaced = setTopicText(copied, 'title', '  Ways to cut the chance of a second kidney stone (illustrative) ');
    expect(untranslatedTexts(spaced).map((entry) => entry.key)).toContain('title');
    const asked = setQuestion(copied, 0, '¿Cuánto me importaría tener otro cálculo?');
    expect(untranslatedTexts(asked).map((entry) => entry.key)).toEqual(['title', 'options.water.name']);
  });

  it('never include a text typed after the copy was made, nor one emptied', () => {
    const added = addOption(copied, 'extra water each day');
    expect(untranslatedTexts(added.draft).map((entry) => entry.key)).toEqual(['title', 'options.water.name', 'questions.0']);
    const emptied = setTopicText(copied, 'title', '');
    expect(untranslatedTexts(emptied).map((entry) => entry.key)).toEqual(['options.water.name', 'questions.0']);
  });

  it('lose a text the clinician keeps as it is (it reads the same in both languages), and only that one', () => {
    const kept = keepAsTranslated(copied, 'options.water.name');
    expect(untranslatedTexts(kept).map((entry) => entry.key)).toEqual(['title', 'questions.0']);
    // Keeping it again, or a text that is not a copy's, changes nothing.
    expect(keepAsTranslated(kept, 'options.water.name')).toBe(kept);
    const english = draftFromTopic(stone.topic);
    expect(keepAsTranslated(english, 'title')).toBe(english);
  });

  it('follow a question as the ones above it are removed, since questions are kept by their place', () => {
    const asking = {
      ...copied,
      questions: ['First question?', 'Second question?', 'Third question?'],
      translation: {
        from: 'en',
        sourceTexts: { 'questions.0': 'First question?', 'questions.1': 'Second question?', 'questions.2': 'Third question?' },
      },
    };
    const rewritten = setQuestion(asking, 1, '¿Segunda pregunta?');
    expect(untranslatedTexts(rewritten).map((entry) => entry.text)).toEqual(['First question?', 'Third question?']);
    // Remove the first: the third moves to place 1 and is still to translate; the rewritten second is not.
    const removed = removeQuestion(rewritten, 0);
    expect(removed.questions).toEqual(['¿Segunda pregunta?', 'Third question?']);
    expect(untranslatedTexts(removed).map((entry) => [entry.key, entry.text])).toEqual([['questions.1', 'Third question?']]);
    expect(removed.translation?.sourceTexts).toEqual({ 'questions.0': 'Second question?', 'questions.1': 'Third question?' });
  });
});
