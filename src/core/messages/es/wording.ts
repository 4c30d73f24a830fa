/**
 * Spanish wording of results: every sentence a patient or clinician reads about the numbers,
 * in neutral Spanish readable in Spain and Latin America (usted, no regionalisms). The outcome
 * is typed by the clinician as a noun phrase ("un infarto"), an infinitive phrase ("morir de un
 * infarto") or, for an event people want, a "que" clause ("que el dolor desaparezca"); each
 * takes its own verb, and no sentence needs the gender of a typed name: options lead with
 * "Con …" or stand as the subject, outcomes follow a verb or "de". A wanted event is had
 * "gracias a" an option and never "se libra", "se evita" or is caused.
 */
import { type NntInterval, writeNntInterval } from '../../nnt-interval.ts';
import { amountIn } from '../../time-unit.ts';
import type { TimeUnit } from '../../time-unit.ts';
import type {
  Amount,
  ChangeDirection,
  FrequencyBand,
  PeriodValues,
  RangeCase,
  WordingMessages,
} from '../../wording/wording-catalogue.ts';
import { NUMBER_SPACE, formatCountEs, formatDecimalEs } from './format-number-es.ts';
import { aEs, deEs, startsWithQueEs } from './joining-es.ts';
import { numberMessagesEs } from './numbers.ts';
import { capitaliseEs, pluralEs, startsWithVerbEs } from './spanish-grammar.ts';
import { durationEs } from './time-words-es.ts';

/** The forms of the verb an outcome takes. */
interface Verb {
  /** Present, one person and more: "tiene", "tienen". */
  readonly one: string;
  readonly other: string;
  /** Future, one person and more: "tendrá", "tendrán". */
  readonly futureOne: string;
  readonly futureOther: string;
  /** Present subjunctive, one person: "que tenga". */
  readonly subjunctive: string;
}

const TENER: Verb = { one: 'tiene', other: 'tienen', futureOne: 'tendrá', futureOther: 'tendrán', subjunctive: 'tenga' };
const LLEGAR_A: Verb = {
  one: 'llega a',
  other: 'llegan a',
  futureOne: 'llegará a',
  futureOther: 'llegarán a',
  subjunctive: 'llegue a',
};
const LOGRAR: Verb = { one: 'logra', other: 'logran', futureOne: 'logrará', futureOther: 'lograrán', subjunctive: 'logre' };
const SUFRIR: Verb = { one: 'sufre', other: 'sufren', futureOne: 'sufrirá', futureOther: 'sufrirán', subjunctive: 'sufra' };

/**
 * The verb before a typed outcome, as the chart's words choose it: "tener un infarto", "llegar a
 * morir de un infarto", and for a "que" clause "lograr que el dolor desaparezca" (wanted) or
 * "sufrir que…" (not wanted).
 */
function verbOf(outcome: string, wanted: boolean): Verb {
  if (startsWithQueEs(outcome)) return wanted ? LOGRAR : SUFRIR;
  return startsWithVerbEs(outcome) ? LLEGAR_A : TENER;
}

const present = (verb: Verb, count: number): string => pluralEs(count, verb.one, verb.other);
const future = (verb: Verb, count: number): string => pluralEs(count, verb.futureOne, verb.futureOther);

/** "el próximo año", "la próxima semana": a period of exactly one, with the unit's gender. */
const NEXT_ONE: Readonly<Record<TimeUnit, string>> = {
  days: 'en un día',
  weeks: 'en la próxima semana',
  months: 'en el próximo mes',
  years: 'en el próximo año',
};

/** A period as the clinician gave it: "en los próximos 10 años", "en las próximas 3 semanas", "para el día 3". */
const within = ({ years, unit }: PeriodValues): string => {
  const amount = amountIn(years, unit);
  if (amount === 1) return NEXT_ONE[unit];
  if (unit === 'days') return `para el día ${formatDecimalEs(amount, 2)}`;
  const length = durationEs({ years, unit });
  return unit === 'weeks' ? `en las próximas ${length}` : `en los próximos ${length}`;
};

/**
 * The period after an outcome's name, unless the name already says it: "dolor de garganta a los
 * 3 días" holds "3 días", "alivio del dolor para el día 3" holds the phrase itself.
 */
const periodAfter = (outcome: string, period: PeriodValues): string => {
  const phrase = within(period);
  const typed = outcome.toLowerCase();
  const amount = amountIn(period.years, period.unit);
  const said = [phrase, durationEs(period), ...(period.unit === 'days' ? [`día ${formatDecimalEs(amount, 2)}`] : [])];
  return said.some((found) => typed.includes(found.toLowerCase())) ? '' : ` ${phrase}`;
};

/** "de cada 100", "de cada millón": a count of people out of the denominator. */
const ofEach = (denominator: number): string =>
  denominator === 1000000 ? 'de cada millón' : `de cada ${formatCountEs(denominator)}`;

/** "de cada 100 personas", "de cada millón de personas". */
const ofEachPeople = (denominator: number): string =>
  denominator === 1000000 ? 'de cada millón de personas' : `de cada ${formatCountEs(denominator)} personas`;

/** An amount as it leads the event frame, with whether the verb after it is plural. */
const amountLead = (amount: Amount, denominator: number, group: string): { readonly text: string; readonly count: number } => {
  const size = formatCountEs(denominator);
  switch (amount.kind) {
    case 'none':
      return { text: `ninguna de las ${size} ${group}`, count: 1 };
    case 'fewer-than-one':
      return {
        text: denominator === 1000000 ? `menos de 1 de cada millón de ${group}` : `menos de 1 de cada ${size} ${group}`,
        count: 2,
      };
    case 'about':
      return { text: `alrededor de ${formatCountEs(amount.count)} de cada ${size} ${group}`, count: 2 };
    case 'nearly-all':
      return { text: `casi todas las ${size} ${group}`, count: 2 };
    case 'all':
      return { text: `todas las ${size} ${group}`, count: 2 };
  }
};

/** An amount as a figure on its own: "alrededor de 15 de cada 100", "menos de 1 de cada millón". */
const amountPhrase = (amount: Amount, denominator: number): string => {
  const size = formatCountEs(denominator);
  switch (amount.kind) {
    case 'none':
      return `ninguna de las ${size} personas`;
    case 'fewer-than-one':
      return `menos de 1 ${ofEach(denominator)}`;
    case 'about':
      return `alrededor de ${formatCountEs(amount.count)} de cada ${size}`;
    case 'nearly-all':
      return `casi todas las ${size} personas`;
    case 'all':
      return `todas las ${size} personas`;
  }
};

/**
 * The other frame, as a short second sentence that needs neither the outcome nor its gender:
 * "Alrededor de 85, no." after "… alrededor de 15 de cada 100 personas como usted tendrán un infarto".
 */
const freeFrame = (amount: Amount, denominator: number): string => {
  const size = formatCountEs(denominator);
  switch (amount.kind) {
    case 'none':
      return `Les pasará a las ${size}.`;
    case 'fewer-than-one':
      return `Menos de 1 ${ofEach(denominator)}, no.`;
    case 'about':
      return `Alrededor de ${formatCountEs(amount.count)}, no.`;
    case 'nearly-all':
      return `Casi las ${size}, no.`;
    case 'all':
      return `No le pasará a ninguna de las ${size}.`;
  }
};

/**
 * The frequency terms of a medicine's summary of product characteristics, in the singular of
 * the EMA's Spanish QRD template ("muy frecuente" … "frecuencia no conocida"; from memory).
 * They are quoted as a category ("la categoría «rara»"), so they agree with "categoría" and
 * never with the typed outcome.
 */
const bandNames: Readonly<Record<FrequencyBand, string>> = {
  'very-common': 'muy frecuente',
  common: 'frecuente',
  uncommon: 'poco frecuente',
  rare: 'rara',
  'very-rare': 'muy rara',
  'not-known': 'frecuencia no conocida',
};

/** "entre 2 y 6 de cada 100". */
const between = (low: number, high: number, denominator: number): string =>
  `entre ${formatCountEs(low)} y ${formatCountEs(high)} ${ofEach(denominator)}`;

/**
 * The range of a wanted event: `avoid` means fewer people have it (they do not have it
 * "debido a" the option), `get` means more people have it ("gracias a" the option).
 */
const wantedRange = (found: RangeCase, option: string, outcome: string, denominator: number): string => {
  const verb = verbOf(outcome, true);
  switch (found.variant) {
    case 'avoid':
      return `El número de personas que no ${verb.other} ${outcome} debido ${aEs(option)} podría estar ${between(found.low, found.high, denominator)}.`;
    case 'get':
      return `El número de personas que ${verb.other} ${outcome} gracias ${aEs(option)} podría estar ${between(found.low, found.high, denominator)}.`;
    case 'narrow':
      return found.direction === 'fewer'
        ? `Según la investigación, alrededor de ${formatCountEs(found.count)} ${ofEachPeople(denominator)} no ${present(verb, 2)} ${outcome} debido ${aEs(option)}, con poca incertidumbre.`
        : `Según la investigación, alrededor de ${formatCountEs(found.count)} ${ofEachPeople(denominator)} ${present(verb, 2)} ${outcome} gracias ${aEs(option)}, con poca incertidumbre.`;
    case 'either':
    case 'no-change':
    case 'below-one':
      return range(found, option, outcome, true, denominator);
  }
};

const range = (found: RangeCase, option: string, outcome: string, wanted: boolean, denominator: number): string => {
  const verb = verbOf(outcome, wanted);
  switch (found.variant) {
    case 'avoid':
      return `El número de personas que se libran ${deEs(outcome)} gracias ${aEs(option)} podría estar ${between(found.low, found.high, denominator)}.`;
    case 'get':
      return `El número de personas que ${verb.other} ${outcome} debido ${aEs(option)} podría estar ${between(found.low, found.high, denominator)}.`;
    case 'narrow':
      return found.direction === 'fewer'
        ? `Según la investigación, alrededor de ${formatCountEs(found.count)} ${ofEachPeople(denominator)} se libran ${deEs(outcome)} gracias ${aEs(option)}, con poca incertidumbre.`
        : `Según la investigación, alrededor de ${formatCountEs(found.count)} ${ofEachPeople(denominator)} ${verb.other} ${outcome} debido ${aEs(option)}, con poca incertidumbre.`;
    case 'either':
      return `Con ${option}, el número de personas que ${verb.other} ${outcome} podría ir desde ${formatCountEs(found.fewer)} menos hasta ${formatCountEs(found.more)} más ${ofEach(denominator)}.`;
    case 'no-change':
      return `Con ${option}, la investigación apunta a que el número de personas que ${verb.other} ${outcome} cambia poco o nada.`;
    case 'below-one':
      return `Con ${option}, según la investigación, todo el rango del cambio es de menos de 1 ${ofEachPeople(denominator)}.`;
  }
};

/**
 * GRADE informative statements (Santesso N et al. 2020, "GRADE guidelines 26: informative
 * statements to communicate the findings of systematic reviews of interventions", J Clin
 * Epidemiol 119:126–135), the "moderate effect" and "trivial" columns, in Spanish from memory.
 * The chance is the subject ("Con la estatina, la probabilidad de un infarto probablemente se
 * reduce"), never the option, so the verb never has to agree with a plural name ("las gotas").
 */
const hedges = {
  high: { reduce: 'se reduce', increase: 'aumenta', trivial: 'cambia poco o nada' },
  moderate: {
    reduce: 'probablemente se reduce',
    increase: 'probablemente aumenta',
    trivial: 'probablemente cambia poco o nada',
  },
  low: { reduce: 'puede reducirse', increase: 'puede aumentar', trivial: 'puede cambiar poco o nada' },
} as const;

/** The short form's change, the outcome said as what happens: "alrededor de 16 de cada 100 se libran gracias a la opción". */
const shortChange = (
  wanted: boolean,
  direction: ChangeDirection,
  count: number,
  either: Amount,
  hidden: 'fewer' | 'more' | null,
  denominator: number,
): string => {
  const people = `alrededor de ${formatCountEs(count)} ${ofEach(denominator)}`;
  const morePeople = `alrededor de ${formatCountEs(count)} más ${ofEach(denominator)}`;
  const them = pluralEs(count, 'le', 'les');
  if (direction === 'same') {
    return hidden === null
      ? `poca o ninguna diferencia, ${amountPhrase(either, denominator)} en ambos casos`
      : `ligeramente ${hidden === 'fewer' ? 'menos' : 'más'}, pero la diferencia es de menos de 1 ${ofEach(denominator)}: ${amountPhrase(either, denominator)} en ambos casos`;
  }
  if (!wanted) {
    return direction === 'fewer'
      ? `${people} ${pluralEs(count, 'se libra', 'se libran')} gracias a la opción`
      : `${them} pasa a ${people} debido a la opción`;
  }
  return direction === 'more'
    ? `${them} pasa a ${morePeople} gracias a la opción`
    : `no ${them} pasa a ${people} debido a la opción`;
};

/** The short form's range, in brackets after the change; the direction is said when it is not the change's own. */
const shortRange = (found: RangeCase | null, direction: ChangeDirection, denominator: number): string => {
  if (found === null) return 'la investigación no dice con qué precisión se conoce';
  switch (found.variant) {
    case 'avoid':
      return `entre ${formatCountEs(found.low)} y ${formatCountEs(found.high)}${direction === 'fewer' ? '' : ' menos'} ${ofEach(denominator)}`;
    case 'get':
      return `entre ${formatCountEs(found.low)} y ${formatCountEs(found.high)}${direction === 'more' ? '' : ' más'} ${ofEach(denominator)}`;
    case 'narrow':
      return 'con poca incertidumbre';
    case 'either':
      return `desde ${formatCountEs(found.fewer)} menos hasta ${formatCountEs(found.more)} más ${ofEach(denominator)}`;
    case 'no-change':
      return 'todo el rango es poco o ningún cambio';
    case 'below-one':
      return `todo el rango es de menos de 1 ${ofEach(denominator)}`;
  }
};

/** The one person of the NNT among those treated: "una de ellas", or "esa persona" when one is treated. */
const oneOf = (count: number): string => pluralEs(count, 'esa persona', 'una de ellas');

const rangeClause = (crossesNoEffect: boolean): string =>
  crossesNoEffect ? ' Su rango incluye que no haya ninguna diferencia.' : '';

/** "NNTB 25" or "NNTB 25 (NNTB 13 a 100)". */
const nntHead = (label: string, count: number, interval: NntInterval | null): string =>
  interval === null ? `${label} ${count}` : `${label} ${count} (${writeNntInterval(interval, numberMessagesEs)})`;

/** The Spanish wording catalogue. */
export const wordingMessagesEs: WordingMessages = {
  // The comparison's name stands as a label ("Sin tratamiento: 15 de cada 100…") and in quotes
  // ("con la opción «sin tratamiento»"), never after "con", so "sin tratamiento" reads in both.
  newComparison: 'sin tratamiento',
  group: (count) => pluralEs(count, 'persona como usted', 'personas como usted'),
  population: ({ population, group }) => {
    const trimmed = population.trim();
    return `En estos números, «${group}» quiere decir ${trimmed}${/[.!?]$/.test(trimmed) ? '' : '.'}`;
  },
  eventFrame: ({ option, outcome, wanted, amount, denominator, group, years, unit }) => {
    const lead = amountLead(amount, denominator, group);
    const verb = future(verbOf(outcome, wanted), lead.count);
    return `${capitaliseEs(option)}: ${lead.text} ${verb} ${outcome}${periodAfter(outcome, { years, unit })}.`;
  },
  freeFrame: ({ amount, denominator }) => freeFrame(amount, denominator),
  change: ({ option, outcome, wanted, direction, count, either, denominator, hidden }) => {
    const verb = verbOf(outcome, wanted);
    if (direction === 'same') {
      if (hidden === null) {
        return `Con ${option}, el número de personas que ${verb.other} ${outcome} cambia poco o nada: ${amountPhrase(either, denominator)} en ambos casos.`;
      }
      return `Con ${option}, ligeramente ${hidden === 'fewer' ? 'menos' : 'más'} personas ${verb.other} ${outcome}, pero la diferencia es de menos de 1 ${ofEachPeople(denominator)}: ${amountPhrase(either, denominator)} en ambos casos.`;
    }
    if (wanted) {
      return `Con ${option}, de cada ${formatCountEs(denominator)} personas, alrededor de ${formatCountEs(count)} ${direction === 'more' ? 'más' : 'menos'} ${present(verb, count)} ${outcome}.`;
    }
    return direction === 'fewer'
      ? `Con ${option}, alrededor de ${formatCountEs(count)} de esas ${formatCountEs(denominator)} personas ${pluralEs(count, 'se libra', 'se libran')} ${deEs(outcome)}.`
      : `Alrededor de ${formatCountEs(count)} ${ofEach(denominator)} ${present(verb, count)} ${outcome} debido ${aEs(option)}.`;
  },
  range: ({ option, outcome, wanted, range: found, denominator }) =>
    wanted ? wantedRange(found, option, outcome, denominator) : range(found, option, outcome, false, denominator),
  rangeUnknown: ({ option }) => `La investigación no dice con qué precisión se conocen los números para ${option}.`,
  certainty: ({ option, outcome, certainty, importance, direction }) => {
    if (certainty === 'very-low') {
      return `La evidencia es muy incierta sobre el efecto ${deEs(option)} en la probabilidad ${deEs(outcome)}.`;
    }
    const verb = hedges[certainty][importance === 'trivial' ? 'trivial' : direction];
    return `Con ${option}, la probabilidad ${deEs(outcome)} ${verb}.`;
  },
  shortEffect: ({ option, wanted, direction, count, either, hidden, denominator, range: found }) =>
    `${capitaliseEs(option)}: ${shortChange(wanted, direction, count, either, hidden, denominator)} (${shortRange(found, direction, denominator)}).`,
  shortCertainty: ({ certainty, importance, direction }) =>
    certainty === 'very-low'
      ? 'La evidencia es muy incierta sobre su efecto.'
      : `La probabilidad ${hedges[certainty][importance === 'trivial' ? 'trivial' : direction]}.`,
  shortNnt: ({ wanted, label, count, group, years, unit, interval, crossesNoEffect }) => {
    const treating = `${nntHead(label, count, interval)}: tratar a ${count} ${group} durante ${durationEs({ years, unit })}`;
    if (wanted) {
      return `${treating} significa una persona ${label === 'NNTB' ? 'más' : 'menos'} a la que le pasa.${rangeClause(crossesNoEffect)}`;
    }
    return `${treating} ${label === 'NNTB' ? 'evita' : 'hace'} que le pase a ${oneOf(count)}.${rangeClause(crossesNoEffect)}`;
  },
  band: ({ option, outcome, band, amount, denominator, comparison, comparisonAmount, direction, count }) => {
    if (band === 'not-known') return `Con ${option}, no se conoce la frecuencia ${deEs(outcome)}.`;
    const change =
      direction === 'same'
        ? 'el mismo número'
        : `${formatCountEs(count)} ${direction === 'fewer' ? 'menos' : 'más'} ${ofEach(denominator)}`;
    return `Con ${option}, la frecuencia ${deEs(outcome)} entra en la categoría «${bandNames[band]}»: ${amountPhrase(amount, denominator)}, frente a ${amountPhrase(comparisonAmount, denominator)} con la opción «${comparison}» (${change}).`;
  },
  /*
   * The NNT with its interval in Altman's form (Altman DG 1998, "Confidence intervals for the
   * number needed to treat", BMJ 317:1309–1312), the labels NNTB and NNTH kept as Altman wrote
   * them and "a" between the limits: "NNTB 10 (NNTB 4 a ∞ a NNTH 20)".
   */
  nnt: ({ option, outcome, wanted, label, count, group, years, unit, interval, crossesNoEffect }) => {
    const treating = `${nntHead(label, count, interval)}: tratar a ${count} ${group} con ${option} durante ${durationEs({ years, unit })}`;
    const verb = verbOf(outcome, wanted);
    if (wanted) {
      return `${treating} significa que una persona ${label === 'NNTB' ? 'más' : 'menos'} ${verb.one} ${outcome}.${rangeClause(crossesNoEffect)}`;
    }
    return `${treating} ${label === 'NNTB' ? 'evita' : 'hace'} que ${oneOf(count)} ${verb.subjunctive} ${outcome}.${rangeClause(crossesNoEffect)}`;
  },
  nntNone: ({ option, outcome }) =>
    `No hay número necesario a tratar: con estos números, la probabilidad ${deEs(outcome)} es la misma con ${option}.`,
  relative: ({ option, outcome, wanted, from, to, denominator, direction, percent }) => {
    const fromTo = `de ${formatCountEs(from)} ${ofEach(denominator)} a ${formatCountEs(to)} ${ofEach(denominator)}`;
    const percentText = `${percent}${NUMBER_SPACE}%`;
    return wanted
      ? `Con ${option}, el número de personas que ${verbOf(outcome, true).other} ${outcome} pasa ${fromTo}: un ${percentText} ${direction === 'increase' ? 'más' : 'menos'} de personas.`
      : `Con ${option}, la probabilidad ${deEs(outcome)} pasa ${fromTo}: ${direction === 'increase' ? 'un aumento relativo' : 'una reducción relativa'} del ${percentText}.`;
  },
};
