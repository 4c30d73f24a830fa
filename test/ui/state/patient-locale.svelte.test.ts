import { describe, expect, it } from 'vitest';
import { englishPatientWords } from '../../../src/locale/english.ts';
import type { PatientLanguage, PatientWords } from '../../../src/locale/locale-bundle.ts';
import { PatientLocale } from '../../../src/ui/state/patient-locale.svelte.ts';

/** Another language's words, as a loaded chunk would give them (the English ones relabelled: only the plumbing is under test). */
const spanishStandIn: PatientWords = { ...englishPatientWords, language: 'es' };

function loaderCounting(outcomes: ('ok' | 'fail')[]) {
  const calls: PatientLanguage[] = [];
  const load = async (language: PatientLanguage): Promise<PatientWords> => {
    calls.push(language);
    if (outcomes.shift() === 'fail') throw new Error('the chunk could not be read');
    return spanishStandIn;
  };
  return { calls, load };
}

describe('the patient words of the open topic', () => {
  it('gives English at once, without loading anything', () => {
    const { calls, load } = loaderCounting([]);
    const locale = new PatientLocale(englishPatientWords, load);
    expect(locale.wordsFor('en')).toBe(englishPatientWords);
    expect(calls).toEqual([]);
  });

  it('loads another language once, on first use, and gives nothing until it has arrived', async () => {
    const { calls, load } = loaderCounting(['ok']);
    const locale = new PatientLocale(englishPatientWords, load);
    expect(locale.wordsFor('es')).toBeNull();
    expect(locale.wordsFor('es')).toBeNull();
    await locale.ready('es');
    expect(locale.wordsFor('es')).toBe(spanishStandIn);
    expect(calls).toEqual(['es']);
  });

  it('says what failed, does not retry on its own, and loads when asked again', async () => {
    const { calls, load } = loaderCounting(['fail', 'ok']);
    const locale = new PatientLocale(englishPatientWords, load);
    await locale.ready('es');
    expect(locale.failure).toEqual({ language: 'es', detail: 'the chunk could not be read' });
    expect(locale.wordsFor('es')).toBeNull();
    expect(calls).toEqual(['es']);
    await locale.ready('es');
    expect(locale.failure).toBeNull();
    expect(locale.wordsFor('es')).toBe(spanishStandIn);
  });
});
