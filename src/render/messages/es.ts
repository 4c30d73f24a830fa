/**
 * Spanish wording of the people charts: titles, group labels and the range sentence, in
 * neutral Spanish (usted, no regionalisms). Outcome names are typed in Spanish as a noun
 * phrase ("un infarto"), an infinitive phrase ("morir de cáncer de colon") or, for an event
 * people want, a "que" clause ("que el dolor desaparezca"); each takes its own verb, so no
 * sentence depends on the gender of a typed name.
 */
import { joinListEs, pluralEs, startsWithVerbEs } from '../../core/messages/es/spanish-grammar.ts';
import { formatCountEs, formatPercentEs } from '../../core/messages/es/format-number-es.ts';
import { aEs, startsWithQueEs } from '../../core/messages/es/joining-es.ts';
import { durationEs } from '../../core/messages/es/time-words-es.ts';
import type { TimeUnit } from '../../core/time-unit.ts';
import type {
  ArmRole,
  BelowOneValues,
  ChartMessages,
  LabelValues,
  NarrowRangeValues,
  RangeValues,
  TitleValues,
} from './chart-messages.ts';

/** The verb an outcome takes: infinitive, one person, more people. */
interface Verb {
  readonly infinitive: string;
  readonly one: string;
  readonly other: string;
}

const TENER: Verb = { infinitive: 'tener', one: 'tiene', other: 'tienen' };
const LLEGAR_A: Verb = { infinitive: 'llegar a', one: 'llega a', other: 'llegan a' };
const LOGRAR: Verb = { infinitive: 'lograr', one: 'logra', other: 'logran' };
const SUFRIR: Verb = { infinitive: 'sufrir', one: 'sufre', other: 'sufren' };

/**
 * "tienen un infarto", "llegan a morir de cáncer", and for a "que" clause "logran que el dolor
 * desaparezca" (an event people want) or "sufren que…" (one they do not).
 */
function verbOf(outcome: string, wanted = true): Verb {
  if (startsWithQueEs(outcome)) return wanted ? LOGRAR : SUFRIR;
  return startsWithVerbEs(outcome) ? LLEGAR_A : TENER;
}

const conjugated = (verb: Verb, count: number): string => pluralEs(count, verb.one, verb.other);

/** A name as it reads inside a sentence: "Opción A" → "opción A"; acronyms such as "IECA" kept. */
function inSentence(name: string): string {
  const trimmed = name.trim();
  const [first, second] = [trimmed.charAt(0), trimmed.charAt(1)];
  const acronym = second !== '' && second === second.toUpperCase() && second !== second.toLowerCase();
  return acronym ? trimmed : first.toLowerCase() + trimmed.slice(1);
}

/** A name that starts a title: "opción A" → "Opción A". */
const leading = (name: string): string => {
  const trimmed = name.trim();
  return trimmed.charAt(0).toUpperCase() + trimmed.slice(1);
};

/** A period in its unit; without one, whole months under a year read as months: 0.5 → "6 meses". */
function period(years: number, unit: TimeUnit | undefined): string {
  const months = years * 12;
  if (unit === undefined && years < 1 && Math.abs(months - Math.round(months)) < 1e-9) {
    return durationEs({ years, unit: 'months' });
  }
  return durationEs({ years, unit: unit ?? 'years' });
}

/** " en 10 años", or nothing without a period. */
const within = (periodYears: number | null, periodUnit?: TimeUnit): string =>
  periodYears === null ? '' : ` en ${period(periodYears, periodUnit)}`;

/** One array's title, led by the option's name so that no "con" meets a name like "Sin tratamiento". */
const groupTitle = (values: TitleValues): string =>
  `${leading(values.option)}: ${formatCountEs(values.denominator)} personas${within(values.periodYears, values.periodUnit)}`;

/** "15 tienen un infarto", "15 tienen un infarto de todos modos" under an option. */
const event =
  (wanted: boolean) =>
  ({ count, outcome, role }: LabelValues) =>
    `${count} ${conjugated(verbOf(outcome, wanted), count)} ${outcome}${role === 'option' ? ' de todos modos' : ''}`;
/** "85 no tienen un infarto". */
const free =
  (wanted: boolean) =>
  ({ count, outcome }: LabelValues) =>
    `${count} no ${conjugated(verbOf(outcome, wanted), count)} ${outcome}`;

/** Spanish chart wording. */
export const chartMessagesEs: ChartMessages = {
  /** "Probabilidad de un infarto en 10 años". */
  heading: (outcome, periodYears, periodUnit) => `Probabilidad de ${outcome}${within(periodYears, periodUnit)}`,
  illustrative: 'Ejemplo ilustrativo: números inventados, no de un estudio real.',
  optionTitle: (values) => groupTitle(values),
  comparisonTitle: (values) => groupTitle(values),
  pairComparisonName: 'Sin la opción',
  pairOptionName: 'Con la opción',
  /** "Sin la opción: 100 personas como usted, en 10 años". */
  pairTitle: (values: TitleValues, role: ArmRole) =>
    `${role === 'comparison' ? 'Sin' : 'Con'} la opción: ${formatCountEs(values.denominator)} personas como usted${
      values.periodYears === null ? '' : `,${within(values.periodYears, values.periodUnit)}`
    }`,
  causeName: (option, bare) => (bare ? 'la opción' : inSentence(option)),
  defaultOutcome: 'este resultado',
  labels: {
    event: event(false),
    /** "5 se libran de un infarto gracias a la estatina". */
    prevented: ({ count, outcome, option }) =>
      `${count} ${pluralEs(count, 'se libra', 'se libran')} de ${outcome} gracias ${aEs(option)}`,
    /** "3 tienen dolor muscular debido a la estatina". */
    caused: ({ count, outcome, option }) =>
      `${count} ${conjugated(verbOf(outcome, false), count)} ${outcome} debido ${aEs(option)}`,
    free: free(false),
  },
  wantedLabels: {
    event: event(true),
    /** "3 no logran que el dolor desaparezca debido a la opción B": never "se libran". */
    prevented: ({ count, outcome, option }) =>
      `${count} no ${conjugated(verbOf(outcome), count)} ${outcome} debido ${aEs(option)}`,
    /** "20 logran que el dolor desaparezca gracias a la opción A": never "causa". */
    caused: ({ count, outcome, option }) => `${count} ${conjugated(verbOf(outcome), count)} ${outcome} gracias ${aEs(option)}`,
    free: free(true),
  },
  noDifference: (outcome, option) =>
    `Con ${option}, el número de personas que ${verbOf(outcome).other} ${outcome} es el mismo que sin esta opción.`,
  belowOnePerson: ({ outcome, option, denominator, direction, count, wordsDenominator }: BelowOneValues) => {
    const which = direction === 'fewer' ? 'menos' : 'más';
    const verb = verbOf(outcome);
    return wordsDenominator === null || count === 0
      ? `Menos de 1 de cada ${formatCountEs(denominator)}, y menos de 1 de cada millón: con ${option}, ligeramente ${which} personas ${verb.other} ${outcome}; son demasiado pocas para verse aquí como una persona entera.`
      : `Menos de 1 de cada ${formatCountEs(denominator)}: con ${option}, alrededor de ${formatCountEs(count)} de cada ${formatCountEs(wordsDenominator)} personas ${which} ${conjugated(verb, count)} ${outcome}; son demasiado pocas para verse aquí como una persona entera.`;
  },
  /** "Con la estatina, entre 13 y 18 de estas 100 personas podrían tener un infarto (rango: intervalo del 95 %)." */
  range: ({ lower, upper, denominator, outcome, option, level }: RangeValues) =>
    `Con ${option}, entre ${lower} y ${upper} de estas ${formatCountEs(denominator)} personas podrían ${verbOf(outcome).infinitive} ${outcome}${
      level === null ? '' : ` (rango: intervalo del ${formatPercentEs(level)})`
    }.`,
  narrowRange: ({ lower, denominator, outcome, option, level, words }: NarrowRangeValues) => {
    const range = level === null ? 'el rango' : `el rango (intervalo del ${formatPercentEs(level)})`;
    const verb = verbOf(outcome).infinitive;
    return words === null
      ? `Con ${option}, ${range} mide menos de una persona: en cualquiera de sus extremos, alrededor de ${lower} de estas ${formatCountEs(denominator)} personas podrían ${verb} ${outcome}.`
      : `Con ${option}, ${range} mide menos de una persona de estas ${formatCountEs(denominator)}: entre ${formatCountEs(words.lower)} y ${formatCountEs(words.upper)} de cada ${formatCountEs(words.denominator)} podrían ${verb} ${outcome}.`;
  },
  rangeOutline: (outcome, option) =>
    `Círculo de trazos: personas que pueden ${verbOf(outcome).infinitive} ${outcome} con ${option}, o no, según dónde esté el valor real dentro de ese rango.`,
  summary: (title, labels) => `${title}: ${joinListEs(labels)}.`,
};
