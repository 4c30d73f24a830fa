/**
 * Spanish words a patient would read on the teaching slides: the story steps' headings, the
 * call-outs, the counts under the people, the certainty and the figure cards. Neutral Spanish
 * for Spain and Latin America, in the usted form. Numbers are written with a decimal comma
 * ("2,5"), digits grouped from 10 000 and "15 %"; the lesson's commentary and the controls stay
 * in the clinician's language (see `en.ts`).
 *
 * Outcome names are typed by the clinician as noun phrases ("un infarto", "alivio del dolor"),
 * infinitive phrases ("morir de cáncer de colon") or clauses ("que el dolor desaparezca"); the
 * verb before the name follows its kind, and the sentences never depend on the name's gender.
 */
import { aEs, deEs, startsWithQueEs } from '../../core/messages/es/joining-es.ts';
import { formatCountEs, formatDecimalEs, formatPercentEs } from '../../core/messages/es/format-number-es.ts';
import { capitaliseEs, joinListEs, pluralEs, startsWithVerbEs } from '../../core/messages/es/spanish-grammar.ts';
import { UNIT_NAMES_ES } from '../../core/messages/es/time-words-es.ts';
import { wordingMessagesEs } from '../../core/messages/es/wording.ts';
import { amountIn } from '../../core/time-unit.ts';
import type { ChangedGroup, Period, TeachingPatientSlideMessages } from './teaching-messages.ts';

/** A number with at most two decimals, with a decimal comma: 11.25 → "11,25", 3 → "3". */
const decimal = (value: number): string => formatDecimalEs(value, 2);

/** A count of people, grouped from 10 000. */
const count = (value: number): string => formatCountEs(value);

/**
 * A period with its preposition, in the unit given: "durante 10 años", "en los próximos 6 meses",
 * "en las próximas 2 semanas", "en los primeros 3 días".
 */
const over = ({ years, unit }: Period): string => {
  const amount = amountIn(years, unit);
  const shown = decimal(amount);
  const [one, other] = UNIT_NAMES_ES[unit];
  const name = pluralEs(amount, one, other);
  if (unit === 'years') return `durante ${shown} ${name}`;
  if (unit === 'days') return amount === 1 ? 'en un día' : `en los primeros ${shown} ${name}`;
  // "semana" is feminine, "mes" masculine.
  if (unit === 'weeks') return amount === 1 ? 'en la próxima semana' : `en las próximas ${shown} ${name}`;
  return amount === 1 ? 'en el próximo mes' : `en los próximos ${shown} ${name}`;
};

/**
 * The verb that comes before an outcome name: "tienen un infarto", "llegan a morir de cáncer",
 * "consiguen que el dolor desaparezca" (a wanted event typed as a clause).
 */
const have = (outcome: string, people: number): string => {
  if (startsWithVerbEs(outcome)) return pluralEs(people, 'llega a', 'llegan a');
  if (startsWithQueEs(outcome)) return pluralEs(people, 'consigue', 'consiguen');
  return pluralEs(people, 'tiene', 'tienen');
};

/** The same verb in the infinitive, after "pueden o no": "tener un infarto", "morir de cáncer". */
const haveInfinitive = (outcome: string): string => {
  if (startsWithVerbEs(outcome)) return '';
  return startsWithQueEs(outcome) ? 'conseguir ' : 'tener ';
};

/**
 * What the people changed by an option do, and why: an unwanted event is avoided thanks to the
 * option (`prevented`) or had because of it (`caused`); a wanted one is had thanks to the option
 * (`caused`) or gone without because of it (`prevented`). A wanted event is never avoided nor
 * said to be caused: those people "tienen alivio del dolor gracias a…" or "se quedan sin…".
 */
const changedBecause = (group: ChangedGroup, wanted: boolean, people: number, outcome: string, option: string): string => {
  const good = wanted === (group === 'caused');
  const reason = good ? `gracias ${aEs(option)}` : `a causa ${deEs(option)}`;
  if (wanted) {
    const verb = group === 'caused' ? have(outcome, people) : pluralEs(people, 'se queda sin', 'se quedan sin');
    return `${verb} ${outcome} ${reason}`;
  }
  const verb = group === 'prevented' ? pluralEs(people, 'evita', 'evitan') : have(outcome, people);
  return `${verb} ${outcome} ${reason}`;
};

/** The Spanish words a patient would read on the slides. */
export const teachingPatientSlideMessagesEs: TeachingPatientSlideMessages = {
  stepNames: {
    title: 'La decisión',
    baseline: 'Sin la opción',
    'with-option': 'Con la opción',
    helped: 'A quién ayuda',
    harmed: 'A quién perjudica',
    uncertainty: '¿Hasta qué punto lo sabemos?',
    'patient-words': 'Lo que oye el paciente',
  },

  wording: wordingMessagesEs,
  decimal,
  capitalise: capitaliseEs,

  title: {
    who: (population: string) => `Para ${population}.`,
    period: (period: Period) => `Todas las cifras cuentan lo que pasa ${over(period)}.`,
    comparing: (option: string, comparison: string) => `Se compara ${option} con ${comparison}.`,
    illustrative: 'Ejemplo ilustrativo: todas las cifras son inventadas, para enseñar. No sirve para decisiones reales.',
  },

  callouts: {
    countIn: (people: number, denominator: number) => `${count(people)} de cada ${count(denominator)}`,
    have: (people: number, outcome: string, period: Period) => `${have(outcome, people)} ${outcome} ${over(period)}`,
    /** "no tienen un infarto": Spanish names the outcome again, where English can say "do not". */
    doNot: (people: number, outcome: string) => `no ${have(outcome, people)} ${outcome}`,
    haveWith: (people: number, outcome: string, option: string) => `${have(outcome, people)} ${outcome} con ${option}`,
    without: (comparison: string) => `sin la opción (${comparison})`,
    changedBecause,
    anyway: (people: number, outcome: string) => `${have(outcome, people)} ${outcome} de todos modos`,
    peopleLikeYou: (denominator: number, population: string) =>
      `Cada figura es una de ${count(denominator)} personas como usted: ${population}.`,
    outlined: 'Solo el contorno: personas a las que puede pasarles o no, según dónde esté el valor real dentro del margen.',
  },

  chips: {
    event: (people: number, outcome: string) => `${count(people)} ${have(outcome, people)} ${outcome}`,
    changed: (group: ChangedGroup, wanted: boolean, people: number, outcome: string, option: string) =>
      `${count(people)} ${changedBecause(group, wanted, people, outcome, option)}`,
    free: (people: number, outcome: string) => `${count(people)} no ${have(outcome, people)} ${outcome}`,
    uncertain: (people: number, outcome: string) =>
      `${count(people)} ${pluralEs(people, 'puede', 'pueden')} o no ${haveInfinitive(outcome)}${outcome}`,
  },

  panels: {
    description: (title: string, labels: readonly string[]) => `${title}: ${joinListEs(labels)}.`,
  },

  story: {
    totalWithout: (people: number, denominator: number, comparison: string) =>
      `Sin la opción (${comparison}): ${count(people)} de cada ${count(denominator)}.`,
    /** No one changed: "ninguna de las 100 personas evita un infarto gracias a…". */
    noOneChanged: (group: ChangedGroup, wanted: boolean, denominator: number, outcome: string, option: string) =>
      `Con estas cifras, ninguna de las ${count(denominator)} personas ${changedBecause(group, wanted, 1, outcome, option)}.`,
    instead: (people: string, because: string) => `En cambio, ${people} ${because}.`,
    partOf: (heading: string, part: number, parts: number) => (parts > 1 ? `${heading} (${part} de ${parts})` : heading),
    certaintyLabel: 'Certeza de la evidencia',
    intervalLevel: (percent: number) =>
      `El margen es el intervalo del ${formatPercentEs(percent / 100)} que da la investigación.`,
    certaintyNames: { high: 'alta', moderate: 'moderada', low: 'baja', 'very-low': 'muy baja' },
    patientTopics: (outcome: string) => `Sobre ${outcome}`,
  },

  framing: {
    relativeLabel: 'Relativo',
    /** An unwanted event's relative change is a lower or higher risk; a wanted event's is more or fewer people having it. */
    relativeValue: (percent: number, direction: 'lower' | 'higher', wanted: boolean) => {
      const shown = formatPercentEs(percent / 100);
      if (wanted) return `Un ${shown} ${direction === 'higher' ? 'más' : 'menos'} de personas`;
      return `Riesgo un ${shown} ${direction === 'higher' ? 'mayor' : 'menor'}`;
    },
    relativeDetail: (from: string, to: string, denominator: number) => `De ${from} a ${to} de cada ${count(denominator)}`,
    relativeNone: 'Sin cambio relativo con estas cifras',
    absoluteLabel: 'Absoluto',
    absoluteValue: (people: number, denominator: number, direction: 'fewer' | 'more') =>
      `${count(people)} ${direction === 'fewer' ? 'menos' : 'más'} de cada ${count(denominator)}`,
    /** The subtraction, the larger count first: "15 − 11,25 = 3,75 menos de cada 100". */
    absoluteDetail: (larger: string, smaller: string, difference: string, denominator: number, direction: 'fewer' | 'more') =>
      `${larger} − ${smaller} = ${difference} ${direction === 'fewer' ? 'menos' : 'más'} de cada ${count(denominator)}`,
    absoluteNone: (denominator: number) => `Sin diferencia en ${count(denominator)} personas`,
    // The abbreviation is used in Spanish too (número necesario a tratar): common practice.
    nntLabel: 'NNT',
    nntValue: (people: number, change: 'helps' | 'harms', wanted: boolean) =>
      wanted
        ? `Tratar a ${count(people)} para 1 ${change === 'helps' ? 'más' : 'menos'}`
        : `Tratar a ${count(people)} para ${change === 'helps' ? 'evitar' : 'causar'} 1`,
    /** A number needed to benefit is rounded up, one needed to harm down. */
    nntDetail: (denominator: number, difference: string, quotient: string, people: number, rounding: 'up' | 'down') =>
      `${count(denominator)} ÷ ${difference} = ${quotient}, redondeado hacia ${rounding === 'up' ? 'arriba' : 'abajo'}: ${count(people)}`,
    nntNone: 'Sin número necesario a tratar',
  },
};
