import { describe, expect, it } from 'vitest';
import { checkDraft } from '../../../src/ui/draft/check-draft.ts';
import { draftFromTopic } from '../../../src/ui/draft/draft-from-topic.ts';
import { setLanguage } from '../../../src/ui/draft/draft-edits.ts';
import { translatedCopy } from '../../../src/ui/draft/translated-copy.ts';
import { untranslatedTexts } from '../../../src/ui/draft/translation-texts.ts';
import { topicFileText, openTopicText } from '../../../src/ui/files/topic-files.ts';
import { DEMO_TOPICS } from '../state/demo-topics-read.ts';

// A copy in another language keeps every number and typed text, and marks the texts to translate
// (Chancewise's own design; the tag "es" is Spanish by RFC 5646, Phillips & Davis 2009).

const [stone] = DEMO_TOPICS;
if (stone === undefined) throw new Error('the demonstration topics are missing');
const english = draftFromTopic(stone.topic);

describe('a copy in Spanish', () => {
  const copy = translatedCopy(english, 'es');

  it('is in Spanish and says it was copied from English, with each typed text as its source', () => {
    expect(copy.language).toBe('es');
    expect(copy.translation?.from).toBe('en');
    expect(copy.translation?.sourceTexts).toMatchObject({
      title: 'Ways to cut the chance of a second kidney stone (illustrative)',
      population: 'adults who have passed one kidney stone and have no other kidney problems',
      'options.as-now.name': 'no change',
      'options.citrate.name': 'a citrate drink twice a day',
      'outcomes.stone.name': 'another kidney stone',
      'questions.2': 'Would I mind getting up at night?',
    });
    expect(Object.keys(copy.translation?.sourceTexts ?? {})).toHaveLength(12);
  });

  it('keeps every number, name and choice as it was: only the language and the marks differ', () => {
    const { language: _language, translation: _translation, ...rest } = copy;
    const { language: _was, translation: _none, ...original } = english;
    expect(rest).toEqual(original);
    const people = (draft: typeof copy) =>
      checkDraft(draft).result?.outcomes.map((outcome) => outcome.options.map((option) => option.perPeople));
    expect(people(copy)).toHaveLength(3);
    expect(people(copy)).toEqual(people(english));
  });

  it('marks every typed text still to translate, and leaves the topic copied unchanged', () => {
    expect(untranslatedTexts(copy)).toHaveLength(12);
    expect(english.language).toBe('en');
    expect(english.translation).toBeNull();
  });

  it('names the regional tag it came from, and English for a draft that names none', () => {
    expect(translatedCopy(setLanguage(english, 'es-MX'), 'en').translation?.from).toBe('es-MX');
    expect(translatedCopy(setLanguage(english, ''), 'es').translation?.from).toBe('en');
  });

  it('is saved with its marks, so a reopened file still knows what is untranslated', () => {
    const saved = topicFileText(copy, false);
    if (!saved.ok) throw new Error(saved.message);
    const opened = openTopicText('piedra.json', saved.text);
    if (!opened.ok) throw new Error(opened.message);
    expect(opened.draft.language).toBe('es');
    expect(opened.draft.translation).toEqual(copy.translation);
    expect(untranslatedTexts(opened.draft)).toHaveLength(12);
  });
});
