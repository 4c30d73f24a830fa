/**
 * Spanish wording of the printed handout: headings, captions, the standard caution, the
 * footer and the refusal sentence, in neutral Spanish readable in Spain and Latin America
 * (usted, "medicamento" where a patient reads, no regionalisms). Numbers and periods come
 * from the shared Spanish helpers: decimal comma, "10 000", "95 %", "3 días".
 */
import { formatCountEs, formatPercentEs } from '../../core/messages/es/format-number-es.ts';
import { deEs } from '../../core/messages/es/joining-es.ts';
import { capitaliseEs, joinListEs } from '../../core/messages/es/spanish-grammar.ts';
import { durationEs } from '../../core/messages/es/time-words-es.ts';
import type { TimeUnit } from '../../core/time-unit.ts';
import type { Amount, FrequencyBand } from '../../core/wording/wording-catalogue.ts';
import type { AboutSheetMessages, HandoutMessages, ScreeningMessages, SheetValues } from './handout-messages.ts';

const MONTHS = [
  'enero',
  'febrero',
  'marzo',
  'abril',
  'mayo',
  'junio',
  'julio',
  'agosto',
  'septiembre',
  'octubre',
  'noviembre',
  'diciembre',
];

/** "el próximo año", "la próxima semana": the unit's gender for a period of exactly one. */
const NEXT_ONE: Readonly<Record<TimeUnit, string>> = {
  days: 'el próximo día',
  weeks: 'la próxima semana',
  months: 'el próximo mes',
  years: 'el próximo año',
};

/** "los próximos 10 años", "las próximas 3 semanas", "el próximo año". */
const period = ({ years, unit }: SheetValues): string => {
  const length = durationEs({ years, unit });
  if (length.startsWith('1 ')) return NEXT_ONE[unit];
  return unit === 'weeks' ? `las próximas ${length}` : `los próximos ${length}`;
};

/** The frequency words of a medicine's leaflet (common practice). */
const bandWords: Readonly<Record<FrequencyBand, string>> = {
  'very-common': 'muy frecuente',
  common: 'frecuente',
  uncommon: 'poco frecuente',
  rare: 'raro',
  'very-rare': 'muy raro',
  'not-known': 'frecuencia no conocida',
};

const amountCell = (amount: Amount, denominator: number): string => {
  switch (amount.kind) {
    case 'none':
      return `0 de cada ${formatCountEs(denominator)}`;
    case 'fewer-than-one':
      return denominator === 1000000 ? 'menos de 1 de cada millón' : `menos de 1 de cada ${formatCountEs(denominator)}`;
    case 'about':
      return `${formatCountEs(amount.count)} de cada ${formatCountEs(denominator)}`;
    case 'nearly-all':
      return `casi las ${formatCountEs(denominator)}`;
    case 'all':
      return `las ${formatCountEs(denominator)}`;
  }
};

const NOT_STATED = 'no consta';

/** Text as typed, ending without its full stop (the sentence adds its own). */
const unstopped = (text: string): string => text.trim().replace(/[.!?]+$/, '');

const aboutSheetMessagesEs: AboutSheetMessages = {
  line: ({ preparedBy, funding, interests, reviewBy }) =>
    [
      'Sobre esta hoja.',
      `Escrita por: ${unstopped(preparedBy ?? NOT_STATED)}.`,
      `Financiación: ${unstopped(funding ?? NOT_STATED)}.`,
      `Conflictos de intereses: ${unstopped(interests ?? NOT_STATED)}.`,
      `Revisar antes del: ${reviewBy ?? NOT_STATED}.`,
    ].join(' '),
  effectSources: (groups) => {
    if (groups.length === 0) return null;
    const parts = groups.map(({ source, of }) => {
      const named = source === '' ? NOT_STATED : source;
      return of.length === 0 ? named : `${named} (${of.join('; ')})`;
    });
    return `Los efectos provienen de: ${parts.join('; ')}.`;
  },
};

/** "Alrededor de 3 de cada 1000 personas": the start of a screening sentence, and whether its verb is plural. */
const peopleStart = (amount: Amount, denominator: number): { readonly start: string; readonly many: boolean } => {
  const of = formatCountEs(denominator);
  switch (amount.kind) {
    case 'none':
      return { start: `Ninguna de las ${of} personas`, many: false };
    case 'fewer-than-one':
      return { start: `Menos de 1 de cada ${of} personas`, many: true };
    case 'about':
      return { start: `Alrededor de ${formatCountEs(amount.count)} de cada ${of} personas`, many: true };
    case 'nearly-all':
      return { start: `Casi todas las ${of} personas`, many: true };
    case 'all':
      return { start: `Todas las ${of} personas`, many: true };
  }
};

const screeningMessagesEs: ScreeningMessages = {
  heading: 'Si se hace la prueba:',
  positive: (leadsTo) => `un resultado positivo lleva a ${unstopped(leadsTo)}.`,
  missedCase: (amount, denominator) => {
    const { start, many } = peopleStart(amount, denominator);
    return `${start} que se hacen la prueba ${many ? 'reciben' : 'recibe'} un resultado normal, pero sí ${many ? 'tienen' : 'tiene'} la enfermedad. Esto es un caso no detectado.`;
  },
  overdiagnosis: (amount, denominator) => {
    const { start, many } = peopleStart(amount, denominator);
    return `${start} que se hacen la prueba ${many ? 'reciben' : 'recibe'} el diagnóstico de una enfermedad que nunca les habría hecho daño. Esto es un sobrediagnóstico.`;
  },
};

/** Spanish handout wording. */
export const handoutMessagesEs: HandoutMessages = {
  language: 'es',
  documentSubject: 'Beneficios y daños de las opciones, para hablar con su profesional de salud',
  paperName: { a4: 'A4', letter: 'Carta (EE. UU.)' },
  illustrativeBadge: 'Ejemplo ilustrativo: números inventados',
  numbersFor: (values) =>
    values.wordsDenominator === values.denominator
      ? `Todos los números de esta hoja son de cada ${formatCountEs(values.denominator)} personas, durante ${period(values)}.`
      : `Los dibujos muestran ${formatCountEs(values.denominator)} personas; los demás números son de cada ${formatCountEs(values.wordsDenominator)}, durante ${period(values)}.`,
  keyIntro: ({ denominator }) =>
    `Cada dibujo muestra ${formatCountEs(denominator)} personas como usted. Cada figura es una persona.`,
  keyGroups: {
    event: 'Personas a las que les pasa',
    prevented: 'Personas que se libran gracias a la opción',
    caused: 'Personas a las que les pasa debido a la opción',
    free: 'Personas a las que no les pasa',
  },
  wantedKeyGroups: {
    event: 'Personas a las que les pasa',
    prevented: 'Personas a las que no les pasa debido a la opción',
    caused: 'Personas a las que les pasa gracias a la opción',
    free: 'Personas a las que no les pasa',
  },
  sentencesHeading: 'Qué significan los números',
  tableBenefitRows: (aim) =>
    aim === 'lower'
      ? 'Lo que las opciones buscan reducir'
      : aim === 'raise'
        ? 'Lo que las opciones buscan hacer más probable'
        : 'Lo que las opciones buscan cambiar',
  tableHarmRows: 'Efectos secundarios: con qué frecuencia ocurren',
  tableCell: amountCell,
  bandCell: (band, amount, denominator) =>
    band === 'not-known' ? amountCell(amount, denominator) : `${bandWords[band]}: ${amountCell(amount, denominator)}`,
  tableChange: ({ direction, count, hidden }) => {
    if (direction !== 'same') return `${formatCountEs(count)} ${direction === 'fewer' ? 'menos' : 'más'}`;
    return hidden === null ? 'sin cambio' : `casi igual (algo ${hidden === 'fewer' ? 'menos' : 'más'})`;
  },
  certaintyShort: {
    high: 'certeza alta',
    moderate: 'certeza moderada',
    low: 'certeza baja',
    'very-low': 'certeza muy baja',
  },
  rangeLevel: (level, count) => `${count === 1 ? 'Ese rango es' : 'Cada rango es'} un intervalo del ${formatPercentEs(level)}.`,
  sideEffectHeading: (heading) => `Efecto secundario: ${heading.charAt(0).toLowerCase()}${heading.slice(1)}`,
  outcomeLabel: (outcome, kind) => `${capitaliseEs(outcome)}${kind === 'harm' ? ' (efecto secundario)' : ''}.`,
  closeUpLabel: 'Las 100 personas marcadas, ampliadas',
  rareRowsNote:
    'La fila de un efecto secundario raro cuenta sobre más personas, como se indica, para que la palabra y el número coincidan.',
  noSideEffects: 'En esta hoja no se anotaron efectos secundarios. Pregunte por ellos a su profesional de salud.',
  evidenceHeading: 'De dónde salen estos números:',
  evidenceSummary: (summary) => {
    const trimmed = summary.trim();
    if (trimmed === '') return 'No se indicó la fuente de la investigación.';
    return /[.!?]$/.test(trimmed) ? trimmed : `${trimmed}.`;
  },
  evidenceReviewed: (reviewed) =>
    reviewed.trim() === ''
      ? 'No se indicó la fecha en que se revisó la investigación.'
      : `La investigación se revisó por última vez el ${reviewed.trim()}.`,
  baselineSource: (outcome, source) => `Su probabilidad inicial ${deEs(outcome)} sale de: ${unstopped(source)}.`,
  baselineConverted: (outcome, from, to) =>
    `Su probabilidad inicial ${deEs(outcome)} se dio para ${from}. Se calculó para ${to}, suponiendo que se mantiene igual.`,
  beyondFollowUp: (option, followUp, period) =>
    `La investigación sobre ${option} duró ${followUp}. Los números para ${period} suponen que su efecto continúa.`,
  mattersHeading: 'Lo que más le importa a usted',
  mattersPrompt: ({ benefit, wanted, harms }) => {
    const aim = wanted ? `tener más probabilidad ${deEs(benefit)}` : `librarse ${deEs(benefit)}`;
    const against =
      harms.length === 0
        ? 'Compárelo con lo que le pide cada opción.'
        : `Compárelo con la probabilidad ${deEs(joinListEs(harms, 'o'))}.`;
    return `¿Cuánto le importa ${aim}? ${against} Escríbalo aquí para hablarlo.`;
  },
  questionsHeading: 'Preguntas que quizá quiera hacer',
  defaultQuestions: ['¿Qué pasa si espero y decido más tarde?', '¿Puedo cambiar de idea una vez que haya empezado?'],
  cautionHeading: 'Tenga en cuenta:',
  caution: (values) =>
    `estos números son estimaciones para grupos de ${formatCountEs(values.wordsDenominator)} personas como usted durante ${period(values)}, ` +
    'no una predicción para usted. ' +
    'Esta hoja le ayuda a hablar con su propio médico, enfermera o farmacéutico, y no sustituye sus consejos. ' +
    'Siga las recomendaciones locales.',
  preparedBy: (name) => `Preparado por ${name.trim()}`,
  preparedByBlank: 'Preparado por: ______________________',
  printed: (date) => `Impreso el ${date}`,
  appVersion: (version) => `Chancewise ${version}`,
  pageOfPages: 'Página 1 de 1',
  footerSeparator: '  ·  ',
  formatDate: (text) => {
    const found = /^(\d{4})-(\d{2})-(\d{2})$/.exec(text.trim());
    const month = found === null ? undefined : MONTHS[Number(found[2]) - 1];
    if (found === null || month === undefined) return text.trim();
    return `${Number(found[3])} de ${month} de ${found[1]}`;
  },
  duration: durationEs,
  capitalise: capitaliseEs,
  about: aboutSheetMessagesEs,
  screening: screeningMessagesEs,
};
