import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { wordingMessagesEs as es } from '../../../../src/core/messages/es/wording.ts';
import { computeTopic } from '../../../../src/core/topic/compute-topic.ts';
import { readTopicFile } from '../../../../src/core/topic/topic-file.ts';
import type { Topic } from '../../../../src/core/topic/topic.ts';
import { yearsFrom } from '../../../../src/core/time-unit.ts';
import { handoutSentences, shortHandoutSentences, topicWording } from '../../../../src/core/wording/topic-wording.ts';
import type { Amount, RangeCase } from '../../../../src/core/wording/wording-catalogue.ts';
import { topicOf } from '../../wording/single-outcome-topic.ts';
import type { Spec } from '../../wording/single-outcome-topic.ts';

// The Spanish sentences of the core. Conventions, as the Spanish chart and handout words use them:
// natural frequencies "de cada 100", a decimal comma, digits grouped by U+00A0 from 10 000, "15 %"
// (RAE & ASALE 2010, Ortografía de la lengua española, on numerals; from memory); one verb per kind
// of typed outcome name ("tener un infarto", "llegar a morir de un infarto", "lograr que el dolor
// desaparezca"), so no sentence needs the typed name's gender; a wanted event is had "gracias a" an
// option and never "se libra", "se evita" or is caused (common practice in risk communication).

const nbsp = '\u00a0';
const group = 'personas como usted';
const tenYears = { years: 10, unit: 'years' as const };

/** The values every option sentence takes, for a typed outcome. */
const about = (outcome: string, wanted = false) => ({ option: 'la estatina', outcome, wanted });

const NOUN = 'un infarto';
const INFINITIVE = 'morir de un infarto';
const WANTED_CLAUSE = 'que el dolor desaparezca';
const WANTED_NOUN = 'alivio del dolor';

describe('the reference class and who the numbers are for', () => {
  it('says "persona como usted" for one and "personas como usted" for more', () => {
    expect(es.group(1)).toBe('persona como usted');
    expect(es.group(100)).toBe('personas como usted');
  });

  it('quotes the reference class and adds one full stop', () => {
    expect(es.population({ population: 'adultos de 60 a 69 años', group })).toBe(
      'En estos números, «personas como usted» quiere decir adultos de 60 a 69 años.',
    );
    expect(es.population({ population: 'adultos de 60 a 69 años.', group })).toBe(
      'En estos números, «personas como usted» quiere decir adultos de 60 a 69 años.',
    );
  });
});

describe('the event frame', () => {
  const frame = (outcome: string, amount: Amount, wanted = false, denominator = 100) =>
    es.eventFrame({ ...about(outcome, wanted), amount, denominator, group, ...tenYears });

  it('writes every amount for a noun outcome, with the period in years', () => {
    expect(frame(NOUN, { kind: 'about', count: 15 })).toBe(
      'La estatina: alrededor de 15 de cada 100 personas como usted tendrán un infarto en los próximos 10 años.',
    );
    expect(frame(NOUN, { kind: 'none' })).toBe(
      'La estatina: ninguna de las 100 personas como usted tendrá un infarto en los próximos 10 años.',
    );
    expect(frame(NOUN, { kind: 'fewer-than-one' })).toBe(
      'La estatina: menos de 1 de cada 100 personas como usted tendrán un infarto en los próximos 10 años.',
    );
    expect(frame(NOUN, { kind: 'nearly-all' })).toBe(
      'La estatina: casi todas las 100 personas como usted tendrán un infarto en los próximos 10 años.',
    );
    expect(frame(NOUN, { kind: 'all' })).toBe(
      'La estatina: todas las 100 personas como usted tendrán un infarto en los próximos 10 años.',
    );
  });

  it('says "1 de cada millón" for a million and groups 10 000 with a non-breaking space', () => {
    expect(frame(NOUN, { kind: 'fewer-than-one' }, false, 1000000)).toBe(
      'La estatina: menos de 1 de cada millón de personas como usted tendrán un infarto en los próximos 10 años.',
    );
    expect(frame(NOUN, { kind: 'about', count: 3 }, false, 10000)).toBe(
      `La estatina: alrededor de 3 de cada 10${nbsp}000 personas como usted tendrán un infarto en los próximos 10 años.`,
    );
  });

  it('puts "llegar a" before an infinitive and "lograr" before a wanted "que" clause', () => {
    expect(frame(INFINITIVE, { kind: 'about', count: 15 })).toBe(
      'La estatina: alrededor de 15 de cada 100 personas como usted llegarán a morir de un infarto en los próximos 10 años.',
    );
    expect(frame(WANTED_CLAUSE, { kind: 'about', count: 45 }, true)).toBe(
      'La estatina: alrededor de 45 de cada 100 personas como usted lograrán que el dolor desaparezca en los próximos 10 años.',
    );
  });

  it('says the period in the unit it was given in', () => {
    const inPeriod = (years: number, unit: 'days' | 'weeks' | 'months' | 'years') =>
      es.eventFrame({ ...about(NOUN), amount: { kind: 'about', count: 15 }, denominator: 100, group, years, unit });
    expect(inPeriod(1, 'years')).toBe(
      'La estatina: alrededor de 15 de cada 100 personas como usted tendrán un infarto en el próximo año.',
    );
    expect(inPeriod(0.5, 'months')).toBe(
      'La estatina: alrededor de 15 de cada 100 personas como usted tendrán un infarto en los próximos 6 meses.',
    );
    expect(inPeriod(yearsFrom(1, 'months'), 'months')).toBe(
      'La estatina: alrededor de 15 de cada 100 personas como usted tendrán un infarto en el próximo mes.',
    );
    expect(inPeriod(yearsFrom(2, 'weeks'), 'weeks')).toBe(
      'La estatina: alrededor de 15 de cada 100 personas como usted tendrán un infarto en las próximas 2 semanas.',
    );
    expect(inPeriod(yearsFrom(3, 'days'), 'days')).toBe(
      'La estatina: alrededor de 15 de cada 100 personas como usted tendrán un infarto para el día 3.',
    );
    expect(inPeriod(2.5, 'years')).toBe(
      'La estatina: alrededor de 15 de cada 100 personas como usted tendrán un infarto en los próximos 2,5 años.',
    );
  });

  it('leaves the period out when the typed name already says it', () => {
    const days = { years: yearsFrom(3, 'days'), unit: 'days' as const };
    const amount = { kind: 'about', count: 15 } as const;
    expect(es.eventFrame({ ...about('dolor de garganta a los 3 días'), amount, denominator: 100, group, ...days })).toBe(
      'La estatina: alrededor de 15 de cada 100 personas como usted tendrán dolor de garganta a los 3 días.',
    );
    expect(es.eventFrame({ ...about('alivio del dolor para el día 3', true), amount, denominator: 100, group, ...days })).toBe(
      'La estatina: alrededor de 15 de cada 100 personas como usted tendrán alivio del dolor para el día 3.',
    );
  });
});

describe('the free frame', () => {
  it('is a short second sentence that needs neither the outcome nor its gender', () => {
    expect(es.freeFrame({ amount: { kind: 'about', count: 85 }, denominator: 100 })).toBe('Alrededor de 85, no.');
    expect(es.freeFrame({ amount: { kind: 'fewer-than-one' }, denominator: 100 })).toBe('Menos de 1 de cada 100, no.');
    expect(es.freeFrame({ amount: { kind: 'fewer-than-one' }, denominator: 1000000 })).toBe('Menos de 1 de cada millón, no.');
    expect(es.freeFrame({ amount: { kind: 'nearly-all' }, denominator: 100 })).toBe('Casi las 100, no.');
  });

  it('says that it happens to all, or to none', () => {
    expect(es.freeFrame({ amount: { kind: 'none' }, denominator: 100 })).toBe('Les pasará a las 100.');
    expect(es.freeFrame({ amount: { kind: 'all' }, denominator: 100 })).toBe('No le pasará a ninguna de las 100.');
  });
});

describe('the change', () => {
  const either: Amount = { kind: 'about', count: 15 };
  const change = (
    outcome: string,
    wanted: boolean,
    direction: 'fewer' | 'more' | 'same',
    count: number,
    hidden: 'fewer' | 'more' | null = null,
  ) => es.change({ ...about(outcome, wanted), direction, count, either, hidden, denominator: 100 });

  it('says that people "se libran de" an unwanted event, in the singular for one', () => {
    expect(change(NOUN, false, 'fewer', 4)).toBe('Con la estatina, alrededor de 4 de esas 100 personas se libran de un infarto.');
    expect(change(NOUN, false, 'fewer', 1)).toBe('Con la estatina, alrededor de 1 de esas 100 personas se libra de un infarto.');
    expect(change(INFINITIVE, false, 'fewer', 4)).toBe(
      'Con la estatina, alrededor de 4 de esas 100 personas se libran de morir de un infarto.',
    );
  });

  it('says that people have an unwanted event "debido a" the option', () => {
    expect(change(NOUN, false, 'more', 4)).toBe('Alrededor de 4 de cada 100 tienen un infarto debido a la estatina.');
    expect(change(INFINITIVE, false, 'more', 1)).toBe(
      'Alrededor de 1 de cada 100 llega a morir de un infarto debido a la estatina.',
    );
  });

  it('counts a wanted event as more or fewer people who have it, never as avoided', () => {
    expect(change(WANTED_CLAUSE, true, 'more', 20)).toBe(
      'Con la estatina, de cada 100 personas, alrededor de 20 más logran que el dolor desaparezca.',
    );
    expect(change(WANTED_NOUN, true, 'fewer', 10)).toBe(
      'Con la estatina, de cada 100 personas, alrededor de 10 menos tienen alivio del dolor.',
    );
    expect(change(WANTED_NOUN, true, 'fewer', 1)).toBe(
      'Con la estatina, de cada 100 personas, alrededor de 1 menos tiene alivio del dolor.',
    );
  });

  it('says "cambia poco o nada" only for no difference at all', () => {
    expect(change(NOUN, false, 'same', 0)).toBe(
      'Con la estatina, el número de personas que tienen un infarto cambia poco o nada: alrededor de 15 de cada 100 en ambos casos.',
    );
    expect(change(WANTED_CLAUSE, true, 'same', 0)).toBe(
      'Con la estatina, el número de personas que logran que el dolor desaparezca cambia poco o nada: alrededor de 15 de cada 100 en ambos casos.',
    );
  });

  it('names the direction of a difference too small to show as one person', () => {
    expect(change(NOUN, false, 'same', 0, 'fewer')).toBe(
      'Con la estatina, ligeramente menos personas tienen un infarto, pero la diferencia es de menos de 1 de cada 100 personas: alrededor de 15 de cada 100 en ambos casos.',
    );
    expect(change(INFINITIVE, false, 'same', 0, 'more')).toBe(
      'Con la estatina, ligeramente más personas llegan a morir de un infarto, pero la diferencia es de menos de 1 de cada 100 personas: alrededor de 15 de cada 100 en ambos casos.',
    );
    expect(
      es.change({
        ...about(NOUN),
        direction: 'same',
        count: 0,
        either: { kind: 'fewer-than-one' },
        hidden: 'more',
        denominator: 1000000,
      }),
    ).toBe(
      'Con la estatina, ligeramente más personas tienen un infarto, pero la diferencia es de menos de 1 de cada millón de personas: menos de 1 de cada millón en ambos casos.',
    );
  });
});

describe('the range', () => {
  const range = (outcome: string, wanted: boolean, found: RangeCase, denominator = 100) =>
    es.range({ ...about(outcome, wanted), range: found, denominator });

  it('writes every case for an unwanted noun outcome', () => {
    expect(range(NOUN, false, { variant: 'avoid', low: 2, high: 6 })).toBe(
      'El número de personas que se libran de un infarto gracias a la estatina podría estar entre 2 y 6 de cada 100.',
    );
    expect(range(NOUN, false, { variant: 'get', low: 2, high: 6 })).toBe(
      'El número de personas que tienen un infarto debido a la estatina podría estar entre 2 y 6 de cada 100.',
    );
    expect(range(NOUN, false, { variant: 'narrow', direction: 'fewer', count: 4 })).toBe(
      'Según la investigación, alrededor de 4 de cada 100 personas se libran de un infarto gracias a la estatina, con poca incertidumbre.',
    );
    expect(range(NOUN, false, { variant: 'narrow', direction: 'more', count: 4 })).toBe(
      'Según la investigación, alrededor de 4 de cada 100 personas tienen un infarto debido a la estatina, con poca incertidumbre.',
    );
    expect(range(NOUN, false, { variant: 'either', fewer: 2, more: 3 })).toBe(
      'Con la estatina, el número de personas que tienen un infarto podría ir desde 2 menos hasta 3 más de cada 100.',
    );
    expect(range(NOUN, false, { variant: 'no-change' })).toBe(
      'Con la estatina, la investigación apunta a que el número de personas que tienen un infarto cambia poco o nada.',
    );
    expect(range(NOUN, false, { variant: 'below-one' })).toBe(
      'Con la estatina, según la investigación, todo el rango del cambio es de menos de 1 de cada 100 personas.',
    );
    expect(range(NOUN, false, { variant: 'below-one' }, 1000000)).toBe(
      'Con la estatina, según la investigación, todo el rango del cambio es de menos de 1 de cada millón de personas.',
    );
  });

  it('takes "llegar a" for an infinitive outcome', () => {
    expect(range(INFINITIVE, false, { variant: 'get', low: 2, high: 6 })).toBe(
      'El número de personas que llegan a morir de un infarto debido a la estatina podría estar entre 2 y 6 de cada 100.',
    );
    expect(range(INFINITIVE, false, { variant: 'either', fewer: 4, more: 1 })).toBe(
      'Con la estatina, el número de personas que llegan a morir de un infarto podría ir desde 4 menos hasta 1 más de cada 100.',
    );
  });

  it('writes a wanted event had "gracias a" the option, or not had "debido a" it', () => {
    expect(range(WANTED_CLAUSE, true, { variant: 'get', low: 10, high: 33 })).toBe(
      'El número de personas que logran que el dolor desaparezca gracias a la estatina podría estar entre 10 y 33 de cada 100.',
    );
    expect(range(WANTED_NOUN, true, { variant: 'avoid', low: 5, high: 15 })).toBe(
      'El número de personas que no tienen alivio del dolor debido a la estatina podría estar entre 5 y 15 de cada 100.',
    );
    expect(range(WANTED_NOUN, true, { variant: 'narrow', direction: 'more', count: 4 })).toBe(
      'Según la investigación, alrededor de 4 de cada 100 personas tienen alivio del dolor gracias a la estatina, con poca incertidumbre.',
    );
    expect(range(WANTED_CLAUSE, true, { variant: 'narrow', direction: 'fewer', count: 4 })).toBe(
      'Según la investigación, alrededor de 4 de cada 100 personas no logran que el dolor desaparezca debido a la estatina, con poca incertidumbre.',
    );
    expect(range(WANTED_CLAUSE, true, { variant: 'either', fewer: 2, more: 3 })).toBe(
      'Con la estatina, el número de personas que logran que el dolor desaparezca podría ir desde 2 menos hasta 3 más de cada 100.',
    );
    expect(range(WANTED_NOUN, true, { variant: 'no-change' })).toBe(
      'Con la estatina, la investigación apunta a que el número de personas que tienen alivio del dolor cambia poco o nada.',
    );
    expect(range(WANTED_NOUN, true, { variant: 'below-one' })).toBe(
      'Con la estatina, según la investigación, todo el rango del cambio es de menos de 1 de cada 100 personas.',
    );
  });

  it('says when the research does not tell how precise the numbers are', () => {
    expect(es.rangeUnknown(about(NOUN))).toBe(
      'La investigación no dice con qué precisión se conocen los números para la estatina.',
    );
  });
});

// Santesso N et al. (2020), "GRADE guidelines 26: informative statements to communicate the findings
// of systematic reviews of interventions", J Clin Epidemiol 119:126–135, the "moderate effect" and
// "trivial" columns; the Spanish rendering is from memory.
describe('the GRADE informative statement', () => {
  const certainty = (
    outcome: string,
    level: 'high' | 'moderate' | 'low' | 'very-low',
    direction: 'reduce' | 'increase',
    importance: 'important' | 'trivial' = 'important',
  ) => es.certainty({ ...about(outcome), certainty: level, importance, direction });

  it('hedges by certainty: "se reduce", "probablemente se reduce", "puede reducirse"', () => {
    expect(certainty(NOUN, 'high', 'reduce')).toBe('Con la estatina, la probabilidad de un infarto se reduce.');
    expect(certainty(NOUN, 'moderate', 'reduce')).toBe('Con la estatina, la probabilidad de un infarto probablemente se reduce.');
    expect(certainty(NOUN, 'low', 'reduce')).toBe('Con la estatina, la probabilidad de un infarto puede reducirse.');
  });

  it('writes an increase the same way, for an infinitive and a "que" clause', () => {
    expect(certainty(INFINITIVE, 'high', 'increase')).toBe('Con la estatina, la probabilidad de morir de un infarto aumenta.');
    expect(certainty(WANTED_CLAUSE, 'moderate', 'increase')).toBe(
      'Con la estatina, la probabilidad de que el dolor desaparezca probablemente aumenta.',
    );
    expect(certainty(INFINITIVE, 'low', 'increase')).toBe(
      'Con la estatina, la probabilidad de morir de un infarto puede aumentar.',
    );
  });

  it('says "cambia poco o nada" for a trivial effect at each certainty', () => {
    expect(certainty(NOUN, 'high', 'reduce', 'trivial')).toBe(
      'Con la estatina, la probabilidad de un infarto cambia poco o nada.',
    );
    expect(certainty(NOUN, 'moderate', 'increase', 'trivial')).toBe(
      'Con la estatina, la probabilidad de un infarto probablemente cambia poco o nada.',
    );
    expect(certainty(NOUN, 'low', 'reduce', 'trivial')).toBe(
      'Con la estatina, la probabilidad de un infarto puede cambiar poco o nada.',
    );
  });

  it('says the evidence is very uncertain at very low certainty', () => {
    expect(certainty(NOUN, 'very-low', 'reduce')).toBe(
      'La evidencia es muy incierta sobre el efecto de la estatina en la probabilidad de un infarto.',
    );
    expect(
      es.certainty({
        ...about(NOUN),
        option: 'el comprimido',
        certainty: 'very-low',
        importance: 'important',
        direction: 'increase',
      }),
    ).toBe('La evidencia es muy incierta sobre el efecto del comprimido en la probabilidad de un infarto.');
  });

  it('keeps the verb right for an option named in the plural, which is never the subject', () => {
    expect(
      es.certainty({
        ...about(NOUN),
        option: 'las gotas',
        certainty: 'moderate',
        importance: 'important',
        direction: 'increase',
      }),
    ).toBe('Con las gotas, la probabilidad de un infarto probablemente aumenta.');
  });

  it('has a short form with the same certainty words', () => {
    expect(es.shortCertainty({ certainty: 'high', importance: 'important', direction: 'reduce' })).toBe(
      'La probabilidad se reduce.',
    );
    expect(es.shortCertainty({ certainty: 'moderate', importance: 'important', direction: 'increase' })).toBe(
      'La probabilidad probablemente aumenta.',
    );
    expect(es.shortCertainty({ certainty: 'low', importance: 'trivial', direction: 'reduce' })).toBe(
      'La probabilidad puede cambiar poco o nada.',
    );
    expect(es.shortCertainty({ certainty: 'very-low', importance: 'important', direction: 'reduce' })).toBe(
      'La evidencia es muy incierta sobre su efecto.',
    );
  });
});

describe('the short form of the change and its range', () => {
  const short = (
    wanted: boolean,
    direction: 'fewer' | 'more' | 'same',
    found: RangeCase | null,
    hidden: 'fewer' | 'more' | null = null,
  ) =>
    es.shortEffect({
      ...about(wanted ? WANTED_NOUN : NOUN, wanted),
      direction,
      count: direction === 'same' ? 0 : 16,
      either: { kind: 'about', count: 15 },
      hidden,
      denominator: 100,
      range: found,
    });

  it('leads with the option and says the outcome only as what happens', () => {
    expect(short(false, 'fewer', { variant: 'avoid', low: 8, high: 22 })).toBe(
      'La estatina: alrededor de 16 de cada 100 se libran gracias a la opción (entre 8 y 22 de cada 100).',
    );
    expect(short(false, 'more', { variant: 'get', low: 8, high: 22 })).toBe(
      'La estatina: les pasa a alrededor de 16 de cada 100 debido a la opción (entre 8 y 22 de cada 100).',
    );
    expect(short(true, 'more', { variant: 'get', low: 8, high: 22 })).toBe(
      'La estatina: les pasa a alrededor de 16 más de cada 100 gracias a la opción (entre 8 y 22 de cada 100).',
    );
    expect(short(true, 'fewer', { variant: 'avoid', low: 8, high: 22 })).toBe(
      'La estatina: no les pasa a alrededor de 16 de cada 100 debido a la opción (entre 8 y 22 de cada 100).',
    );
  });

  it('says the range’s direction when it is not the change’s own', () => {
    expect(short(false, 'fewer', { variant: 'get', low: 1, high: 3 })).toBe(
      'La estatina: alrededor de 16 de cada 100 se libran gracias a la opción (entre 1 y 3 más de cada 100).',
    );
    expect(short(false, 'more', { variant: 'avoid', low: 1, high: 3 })).toBe(
      'La estatina: les pasa a alrededor de 16 de cada 100 debido a la opción (entre 1 y 3 menos de cada 100).',
    );
  });

  it('writes every other range case', () => {
    expect(short(false, 'fewer', { variant: 'narrow', direction: 'fewer', count: 16 })).toBe(
      'La estatina: alrededor de 16 de cada 100 se libran gracias a la opción (con poca incertidumbre).',
    );
    expect(short(false, 'fewer', { variant: 'either', fewer: 20, more: 2 })).toBe(
      'La estatina: alrededor de 16 de cada 100 se libran gracias a la opción (desde 20 menos hasta 2 más de cada 100).',
    );
    expect(short(false, 'same', { variant: 'no-change' })).toBe(
      'La estatina: poca o ninguna diferencia, alrededor de 15 de cada 100 en ambos casos (todo el rango es poco o ningún cambio).',
    );
    expect(short(false, 'same', { variant: 'below-one' }, 'fewer')).toBe(
      'La estatina: ligeramente menos, pero la diferencia es de menos de 1 de cada 100: alrededor de 15 de cada 100 en ambos casos (todo el rango es de menos de 1 de cada 100).',
    );
    expect(short(false, 'fewer', null)).toBe(
      'La estatina: alrededor de 16 de cada 100 se libran gracias a la opción (la investigación no dice con qué precisión se conoce).',
    );
  });
});

// The frequency terms of the EMA's Spanish QRD template for the summary of product characteristics
// ("muy frecuente", "frecuente", "poco frecuente", "rara", "muy rara", "frecuencia no conocida";
// from memory), quoted as a category so that they agree with "categoría", never with the outcome.
describe('the frequency band', () => {
  const band = (found: 'very-common' | 'common' | 'uncommon' | 'rare' | 'very-rare' | 'not-known') =>
    es.band({
      ...about('dolor muscular'),
      band: found,
      amount: { kind: 'about', count: 3 },
      denominator: 10000,
      comparison: 'sin tratamiento',
      comparisonAmount: { kind: 'about', count: 1 },
      direction: 'more',
      count: 2,
    });

  it('quotes the term with the numbers with and without the option, and the change', () => {
    expect(band('rare')).toBe(
      `Con la estatina, la frecuencia de dolor muscular entra en la categoría «rara»: alrededor de 3 de cada 10${nbsp}000, frente a alrededor de 1 de cada 10${nbsp}000 con la opción «sin tratamiento» (2 más de cada 10${nbsp}000).`,
    );
  });

  it('uses every term of the template', () => {
    const terms = (['very-common', 'common', 'uncommon', 'rare', 'very-rare'] as const).map(
      (found) => /«([^»]+)»/.exec(band(found))?.[1],
    );
    expect(terms).toEqual(['muy frecuente', 'frecuente', 'poco frecuente', 'rara', 'muy rara']);
  });

  it('says when the frequency is not known', () => {
    expect(band('not-known')).toBe('Con la estatina, no se conoce la frecuencia de dolor muscular.');
  });

  it('says "el mismo número" when the option changes nothing', () => {
    expect(
      es.band({
        ...about(INFINITIVE),
        band: 'rare',
        amount: { kind: 'fewer-than-one' },
        denominator: 1000000,
        comparison: 'sin tratamiento',
        comparisonAmount: { kind: 'fewer-than-one' },
        direction: 'same',
        count: 0,
      }),
    ).toBe(
      'Con la estatina, la frecuencia de morir de un infarto entra en la categoría «rara»: menos de 1 de cada millón, frente a menos de 1 de cada millón con la opción «sin tratamiento» (el mismo número).',
    );
  });
});

// Altman DG (1998), "Confidence intervals for the number needed to treat", BMJ 317:1309–1312: an
// absolute risk reduction of 10% with 95% interval −5% to 25% gives "NNTB 10 (NNTB 4 to ∞ to NNTH 20)";
// in Spanish the limits are joined by "a".
describe('the number needed to treat', () => {
  const altman = {
    label: 'NNTB' as const,
    count: 10,
    group,
    interval: { kind: 'through-infinity', benefit: 4, harm: 20 } as const,
    crossesNoEffect: true,
    ...tenYears,
  };

  it('writes Altman’s example in Spanish, and says that the range includes no difference', () => {
    expect(es.nnt({ ...about(NOUN), ...altman })).toBe(
      'NNTB 10 (NNTB 4 a ∞ a NNTH 20): tratar a 10 personas como usted con la estatina durante 10 años evita que una de ellas tenga un infarto. Su rango incluye que no haya ninguna diferencia.',
    );
  });

  it('writes a harm with "hace que", and an infinitive outcome with "llegue a"', () => {
    const interval = { kind: 'one-side', label: 'NNTH', from: 20, to: 100 } as const;
    expect(es.nnt({ ...about(INFINITIVE), ...altman, label: 'NNTH', count: 50, interval, crossesNoEffect: false })).toBe(
      'NNTH 50 (NNTH 20 a 100): tratar a 50 personas como usted con la estatina durante 10 años hace que una de ellas llegue a morir de un infarto.',
    );
  });

  it('never says that a wanted event is prevented or caused', () => {
    const interval = { kind: 'one-side', label: 'NNTB', from: 4, to: 10 } as const;
    const days = { years: yearsFrom(3, 'days'), unit: 'days' as const };
    expect(es.nnt({ ...about(WANTED_CLAUSE, true), ...altman, count: 5, interval, crossesNoEffect: false, ...days })).toBe(
      'NNTB 5 (NNTB 4 a 10): tratar a 5 personas como usted con la estatina durante 3 días significa que una persona más logra que el dolor desaparezca.',
    );
    expect(es.nnt({ ...about(WANTED_NOUN, true), ...altman, label: 'NNTH', interval: null, crossesNoEffect: false })).toBe(
      'NNTH 10: tratar a 10 personas como usted con la estatina durante 10 años significa que una persona menos tiene alivio del dolor.',
    );
  });

  it('says "esa persona" when one person is treated', () => {
    expect(
      es.nnt({ ...about(NOUN), ...altman, count: 1, group: 'persona como usted', interval: null, crossesNoEffect: false }),
    ).toBe('NNTB 1: tratar a 1 persona como usted con la estatina durante 10 años evita que esa persona tenga un infarto.');
  });

  it('has a short form with the same label and interval, without the names', () => {
    expect(es.shortNnt({ wanted: false, ...altman })).toBe(
      'NNTB 10 (NNTB 4 a ∞ a NNTH 20): tratar a 10 personas como usted durante 10 años evita que le pase a una de ellas. Su rango incluye que no haya ninguna diferencia.',
    );
    expect(
      es.shortNnt({ wanted: false, ...altman, label: 'NNTH', interval: { kind: 'to-infinity', label: 'NNTH', from: 8 } }),
    ).toBe(
      'NNTH 10 (NNTH 8 a ∞): tratar a 10 personas como usted durante 10 años hace que le pase a una de ellas. Su rango incluye que no haya ninguna diferencia.',
    );
    expect(es.shortNnt({ wanted: true, ...altman, crossesNoEffect: false, interval: null, years: 0.25, unit: 'months' })).toBe(
      'NNTB 10: tratar a 10 personas como usted durante 3 meses significa una persona más a la que le pasa.',
    );
    expect(es.shortNnt({ wanted: true, ...altman, label: 'NNTH', crossesNoEffect: false, interval: null })).toBe(
      'NNTH 10: tratar a 10 personas como usted durante 10 años significa una persona menos a la que le pasa.',
    );
  });

  it('says there is no number needed to treat, never "infinito", when nothing changes', () => {
    expect(es.nntNone(about(NOUN))).toBe(
      'No hay número necesario a tratar: con estos números, la probabilidad de un infarto es la misma con la estatina.',
    );
  });
});

describe('the relative change', () => {
  it('always gives the numbers it comes from, with "15 %" spacing', () => {
    expect(es.relative({ ...about(NOUN), from: 15, to: 11, denominator: 100, direction: 'reduction', percent: 27 })).toBe(
      `Con la estatina, la probabilidad de un infarto pasa de 15 de cada 100 a 11 de cada 100: una reducción relativa del 27${nbsp}%.`,
    );
    expect(es.relative({ ...about(INFINITIVE), from: 11, to: 15, denominator: 100, direction: 'increase', percent: 36 })).toBe(
      `Con la estatina, la probabilidad de morir de un infarto pasa de 11 de cada 100 a 15 de cada 100: un aumento relativo del 36${nbsp}%.`,
    );
  });

  it('writes a wanted event as more or fewer people, not as a probability that rises', () => {
    expect(
      es.relative({ ...about(WANTED_CLAUSE, true), from: 25, to: 45, denominator: 100, direction: 'increase', percent: 80 }),
    ).toBe(
      `Con la estatina, el número de personas que logran que el dolor desaparezca pasa de 25 de cada 100 a 45 de cada 100: un 80${nbsp}% más de personas.`,
    );
  });
});

/** A one-outcome topic with Spanish names (invented, illustrative), computed and worded in Spanish. */
function spanishSentences(spec: Spec, outcome: string, option: string): string[] {
  const topic: Topic = {
    ...topicOf(spec),
    population: 'adultos con una enfermedad inventada',
    options: [
      { id: 'none', name: 'sin tratamiento', isComparison: true },
      { id: 'drops', name: option, isComparison: false },
    ],
  };
  const named: Topic = { ...topic, outcomes: topic.outcomes.map((found) => ({ ...found, name: outcome })) };
  const wording = topicWording(computeTopic(named), { catalogue: es });
  return wording.outcomes.flatMap((found) =>
    found.options.flatMap((option) => option.sentences.map((sentence) => sentence.text)),
  );
}

describe('whole topics worded in Spanish', () => {
  // Baseline 16% over 10 years, risk ratio 0.75 (0.6 to 0.9): 12 with the option (9.6 → 10 to 14.4 → 14),
  // 2 to 6 fewer; NNT 1/0.04 = 25, its limits 1/0.064 = 15.6 → 16 and 1/0.016 = 62.5 → 63, each rounded up.
  it('words a noun outcome over 10 years', () => {
    const sentences = spanishSentences(
      {
        wanted: false,
        kind: 'benefit',
        measure: 'rr',
        estimate: 0.75,
        lower: 0.6,
        upper: 0.9,
        baseline: 0.16,
        period: { amount: 10, unit: 'years' },
      },
      'un infarto',
      'la estatina',
    );
    expect(sentences).toEqual([
      'Sin tratamiento: alrededor de 16 de cada 100 personas como usted tendrán un infarto en los próximos 10 años.',
      'Alrededor de 84, no.',
      'La estatina: alrededor de 12 de cada 100 personas como usted tendrán un infarto en los próximos 10 años.',
      'Alrededor de 88, no.',
      'Con la estatina, alrededor de 4 de esas 100 personas se libran de un infarto.',
      'El número de personas que se libran de un infarto gracias a la estatina podría estar entre 2 y 6 de cada 100.',
      'Con la estatina, la probabilidad de un infarto probablemente se reduce.',
      'NNTB 25 (NNTB 16 a 63): tratar a 25 personas como usted con la estatina durante 10 años evita que una de ellas tenga un infarto.',
      `Con la estatina, la probabilidad de un infarto pasa de 16 de cada 100 a 12 de cada 100: una reducción relativa del 25${nbsp}%.`,
    ]);
  });

  // Baseline 10% over 6 months, risk ratio 0.8 (0.6 to 1.1): 8 with the option, range 6 to 11, so
  // anything from 4 fewer to 1 more; NNTB 50 (1/0.02), its limits 1/0.04 = 25 and 1/0.01 = 100 for a harm.
  it('words an infinitive outcome over 6 months, with an interval through infinity', () => {
    const sentences = spanishSentences(
      {
        wanted: false,
        kind: 'benefit',
        measure: 'rr',
        estimate: 0.8,
        lower: 0.6,
        upper: 1.1,
        baseline: 0.1,
        period: { amount: 6, unit: 'months' },
      },
      'morir de cáncer de colon',
      'la prueba de cribado',
    );
    expect(sentences).toEqual([
      'Sin tratamiento: alrededor de 10 de cada 100 personas como usted llegarán a morir de cáncer de colon en los próximos 6 meses.',
      'Alrededor de 90, no.',
      'La prueba de cribado: alrededor de 8 de cada 100 personas como usted llegarán a morir de cáncer de colon en los próximos 6 meses.',
      'Alrededor de 92, no.',
      'Con la prueba de cribado, alrededor de 2 de esas 100 personas se libran de morir de cáncer de colon.',
      'Con la prueba de cribado, el número de personas que llegan a morir de cáncer de colon podría ir desde 4 menos hasta 1 más de cada 100.',
      'Con la prueba de cribado, la probabilidad de morir de cáncer de colon probablemente se reduce.',
      'NNTB 50 (NNTB 25 a ∞ a NNTH 100): tratar a 50 personas como usted con la prueba de cribado durante 6 meses evita que una de ellas llegue a morir de cáncer de colon. Su rango incluye que no haya ninguna diferencia.',
      `Con la prueba de cribado, la probabilidad de morir de cáncer de colon pasa de 10 de cada 100 a 8 de cada 100: una reducción relativa del 20${nbsp}%.`,
    ]);
  });

  // Baseline 25% by day 3, risk ratio 1.8 (1.4 to 2.3): 45 with the drops, 35 to 57.5 → 58, so 10 to 33
  // more; NNTB 5 with limits 1/0.325 = 3.1 → 4 and 1/0.1 = 10 (Altman 1998; Cochrane Handbook 5.1 §12.5.4.1).
  it('words a wanted event by day 3, never avoided nor caused', () => {
    const sentences = spanishSentences(
      {
        wanted: true,
        kind: 'benefit',
        measure: 'rr',
        estimate: 1.8,
        lower: 1.4,
        upper: 2.3,
        baseline: 0.25,
        period: { amount: 3, unit: 'days' },
      },
      'que el dolor desaparezca',
      'las gotas',
    );
    expect(sentences).toEqual([
      'Sin tratamiento: alrededor de 25 de cada 100 personas como usted lograrán que el dolor desaparezca para el día 3.',
      'Alrededor de 75, no.',
      'Las gotas: alrededor de 45 de cada 100 personas como usted lograrán que el dolor desaparezca para el día 3.',
      'Alrededor de 55, no.',
      'Con las gotas, de cada 100 personas, alrededor de 20 más logran que el dolor desaparezca.',
      'El número de personas que logran que el dolor desaparezca gracias a las gotas podría estar entre 10 y 33 de cada 100.',
      'Con las gotas, la probabilidad de que el dolor desaparezca probablemente aumenta.',
      'NNTB 5 (NNTB 4 a 10): tratar a 5 personas como usted con las gotas durante 3 días significa que una persona más logra que el dolor desaparezca.',
      `Con las gotas, el número de personas que logran que el dolor desaparezca pasa de 25 de cada 100 a 45 de cada 100: un 80${nbsp}% más de personas.`,
    ]);
    for (const sentence of sentences) expect(sentence).not.toMatch(/libra|evit|riesgo|debido|caus/i);
  });

  // Baseline 50% over 1 year, risk ratio 0.8 (0.7 to 0.9): 40 with the drops, 5 to 15 fewer, a harm:
  // NNTH 10, limits 1/0.15 = 6.7 → 6 and 1/0.05 = 20, rounded down for a harm.
  it('words a wanted event made less likely over 1 year as a harm, without "se libran"', () => {
    const sentences = spanishSentences(
      {
        wanted: true,
        kind: 'harm',
        measure: 'rr',
        estimate: 0.8,
        lower: 0.7,
        upper: 0.9,
        baseline: 0.5,
        period: { amount: 1, unit: 'years' },
      },
      'alivio del dolor',
      'las gotas',
    );
    expect(sentences).toContain(
      'Sin tratamiento: alrededor de 50 de cada 100 personas como usted tendrán alivio del dolor en el próximo año.',
    );
    expect(sentences).toContain('Con las gotas, de cada 100 personas, alrededor de 10 menos tienen alivio del dolor.');
    expect(sentences).toContain(
      'El número de personas que no tienen alivio del dolor debido a las gotas podría estar entre 5 y 15 de cada 100.',
    );
    expect(sentences).toContain(
      'NNTH 10 (NNTH 6 a 20): tratar a 10 personas como usted con las gotas durante 1 año significa que una persona menos tiene alivio del dolor.',
    );
    for (const sentence of sentences) expect(sentence).not.toMatch(/libra|evit|riesgo|gracias/i);
  });
});

/** Every sentence of the catalogue, for every case, for the three kinds of typed outcome. */
function everySentence(): string[] {
  const amounts: Amount[] = [
    { kind: 'none' },
    { kind: 'fewer-than-one' },
    { kind: 'about', count: 15 },
    { kind: 'nearly-all' },
    { kind: 'all' },
  ];
  const ranges: RangeCase[] = [
    { variant: 'avoid', low: 2, high: 6 },
    { variant: 'get', low: 2, high: 6 },
    { variant: 'narrow', direction: 'fewer', count: 4 },
    { variant: 'narrow', direction: 'more', count: 4 },
    { variant: 'either', fewer: 2, more: 3 },
    { variant: 'no-change' },
    { variant: 'below-one' },
  ];
  const directions = ['fewer', 'more', 'same'] as const;
  const hiddens = [null, 'fewer', 'more'] as const;
  const levels = ['high', 'moderate', 'low', 'very-low'] as const;
  const intervals = [
    null,
    { kind: 'one-side', label: 'NNTB', from: 13, to: 100 },
    { kind: 'to-infinity', label: 'NNTH', from: 8 },
    { kind: 'through-infinity', benefit: 4, harm: 20 },
    { kind: 'infinity' },
  ] as const;
  const out: string[] = [es.group(1), es.group(2), es.population({ population: 'adultos', group })];
  const outcomes: [string, boolean][] = [
    [NOUN, false],
    [INFINITIVE, false],
    [WANTED_CLAUSE, true],
    [WANTED_NOUN, true],
  ];
  const periods = [
    tenYears,
    { years: 1, unit: 'years' as const },
    { years: 0.5, unit: 'months' as const },
    { years: yearsFrom(3, 'days'), unit: 'days' as const },
  ];
  for (const [outcome, wanted] of outcomes) {
    const values = about(outcome, wanted);
    for (const amount of amounts) {
      for (const period of periods) out.push(es.eventFrame({ ...values, amount, denominator: 100, group, ...period }));
      out.push(es.freeFrame({ amount, denominator: 1000000 }));
    }
    for (const direction of directions) {
      for (const hidden of hiddens) {
        const count = direction === 'same' ? 0 : 4;
        const change = { ...values, direction, count, either: amounts[2] ?? { kind: 'none' }, hidden, denominator: 100 };
        out.push(es.change(change));
        for (const found of [null, ...ranges]) out.push(es.shortEffect({ ...change, range: found }));
      }
    }
    for (const found of ranges) out.push(es.range({ ...values, range: found, denominator: 1000000 }));
    out.push(es.rangeUnknown(values));
    for (const level of levels) {
      for (const direction of ['reduce', 'increase'] as const) {
        for (const importance of ['important', 'trivial'] as const) {
          out.push(es.certainty({ ...values, certainty: level, importance, direction }));
          out.push(es.shortCertainty({ certainty: level, importance, direction }));
        }
      }
    }
    for (const label of ['NNTB', 'NNTH'] as const) {
      for (const interval of intervals) {
        const nnt = { label, count: 10, group, interval, crossesNoEffect: interval !== null, ...tenYears };
        out.push(es.nnt({ ...values, ...nnt }), es.shortNnt({ wanted, ...nnt }));
      }
    }
    out.push(es.nntNone(values));
    for (const direction of ['reduction', 'increase'] as const) {
      out.push(es.relative({ ...values, from: 15, to: 11, denominator: 100, direction, percent: 27 }));
    }
    for (const band of ['very-common', 'common', 'uncommon', 'rare', 'very-rare', 'not-known'] as const) {
      for (const direction of directions) {
        out.push(
          es.band({
            ...values,
            band,
            amount: amounts[2] ?? { kind: 'none' },
            denominator: 100,
            comparison: 'sin tratamiento',
            comparisonAmount: { kind: 'fewer-than-one' },
            direction,
            count: 3,
          }),
        );
      }
    }
  }
  return out;
}

describe('every Spanish sentence', () => {
  const sentences = everySentence();

  it('holds no English words', () => {
    expect(sentences.length).toBeGreaterThan(500);
    for (const sentence of sentences) {
      expect(sentence).not.toMatch(/ in | the |because| with | to | of | people|chance/i);
    }
  });

  it('ends with a full stop and holds no doubled spaces, "undefined" or "NaN"', () => {
    for (const sentence of sentences.slice(3)) {
      expect(sentence).toMatch(/[.]$/);
      expect(sentence).not.toMatch(/ {2}|undefined|NaN|\.\./);
    }
  });

  it('never says that a wanted event is avoided, caused or a risk', () => {
    const wanted = everyWantedSentence();
    for (const sentence of wanted) expect(sentence).not.toMatch(/se libra|evit|caus|riesgo/i);
  });
});

/** The sentences of the two wanted outcomes, in every case. */
function everyWantedSentence(): string[] {
  return everySentence().filter((sentence) => sentence.includes(WANTED_CLAUSE) || sentence.includes(WANTED_NOUN));
}

// The Spanish demo (assets/demo/05-migrana-es.json: invented, illustrative numbers), over 3 months:
// baseline 25% and risk ratio 1.8 (1.4 to 2.3) for the wanted outcome, shown per 1000 people.
describe('the Spanish demo through topicWording', () => {
  const reading = readTopicFile(readFileSync(new URL('../../../../assets/demo/05-migrana-es.json', import.meta.url), 'utf8'));
  if (!reading.ok) throw new Error('the Spanish demo does not read');
  const result = computeTopic(reading.topic);
  const wording = topicWording(result, { catalogue: es });
  const texts = wording.outcomes.flatMap((outcome) =>
    outcome.options.flatMap((option) => option.sentences.map((found) => found.text)),
  );

  it('says who the numbers are for', () => {
    expect(wording.population?.text).toBe(
      'En estos números, «personas como usted» quiere decir adultos que tienen migraña entre 4 y 14 días al mes.',
    );
  });

  // 0.25 × 1000 = 250 without, 0.45 × 1000 = 450 with; 0.25 × 1.4 = 350 and 0.25 × 2.3 = 575, so 100 to 325 more.
  it('words the wanted headline outcome over the next 3 months', () => {
    expect(texts).toContain(
      'No tomar nada a diario: alrededor de 250 de cada 1000 personas como usted tendrán la mitad de días con migraña o menos en los próximos 3 meses.',
    );
    expect(texts).toContain(
      'Con el comprimido diario, de cada 1000 personas, alrededor de 200 más tienen la mitad de días con migraña o menos.',
    );
    expect(texts).toContain(
      'El número de personas que tienen la mitad de días con migraña o menos gracias al comprimido diario podría estar entre 100 y 325 de cada 1000.',
    );
    expect(texts).toContain(
      'Con el comprimido diario, la probabilidad de la mitad de días con migraña o menos probablemente aumenta.',
    );
  });

  // 8% × 1.9 = 15.2% → 152 in 1000, 72 more; a side effect at 15.2% is "muy frecuente" (≥ 1 in 10).
  it('words the side effects with their band, and an infinitive outcome with "llegar a"', () => {
    expect(texts).toContain(
      'Con el comprimido diario, la frecuencia de cansancio durante el día entra en la categoría «muy frecuente»: alrededor de 152 de cada 1000, frente a alrededor de 80 de cada 1000 con la opción «no tomar nada a diario» (72 más de cada 1000).',
    );
    expect(texts).toContain(
      'El comprimido diario: alrededor de 75 de cada 1000 personas como usted llegarán a dejar el comprimido por sus efectos en los próximos 3 meses.',
    );
    expect(texts).toContain(
      'Alrededor de 45 de cada 1000 llegan a dejar el comprimido por sus efectos debido al comprimido diario.',
    );
  });

  it('writes every NNT interval with "a", never "to"', () => {
    const nnts = wording.outcomes.flatMap((outcome) =>
      outcome.options.flatMap((option) => option.sentences.filter((found) => found.kind === 'nnt').map((found) => found.text)),
    );
    expect(nnts.map((text) => text.split(':')[0])).toEqual([
      'NNTB 5 (NNTB 4 a 10)',
      'NNTH 13 (NNTH 6 a 62)',
      'NNTH 22 (NNTH 8 a 111)',
    ]);
  });

  it('holds no English words in any sentence, long or short, nor a second full stop', () => {
    const handout = handoutSentences(result, { catalogue: es, showNnt: true, showBands: true, showRelative: true }).map(
      (found) => found.text,
    );
    const short = shortHandoutSentences(result, { catalogue: es, showNnt: true }).map((found) => found.text);
    expect(short).toContain(
      'El comprimido diario: les pasa a alrededor de 200 más de cada 1000 gracias a la opción (entre 100 y 325 de cada 1000).',
    );
    for (const sentence of [...handout, ...short]) {
      expect(sentence).not.toMatch(/ in | the |because| with | to |people|chance/i);
      expect(sentence).not.toMatch(/\.\./);
    }
  });
});
