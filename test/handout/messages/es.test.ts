import { describe, expect, it } from 'vitest';
import { yearsFrom } from '../../../src/core/time-unit.ts';
import { handoutMessagesEs as messages } from '../../../src/handout/messages/es.ts';

const nbsp = '\u00a0';
const sheet = { denominator: 100, wordsDenominator: 100, years: 10, unit: 'years' as const };
const rare = { denominator: 1000, wordsDenominator: 10000, years: 5, unit: 'years' as const };

describe('Spanish handout wording', () => {
  it('is tagged Spanish for the PDF and names the papers', () => {
    expect(messages.language).toBe('es');
    expect(messages.paperName).toEqual({ a4: 'A4', letter: 'Carta (EE. UU.)' });
    expect(messages.illustrativeBadge).toBe('Ejemplo ilustrativo: números inventados');
  });

  it('writes a YYYY-MM-DD date as "3 de diciembre de 2026" and leaves other text as typed', () => {
    expect(messages.formatDate('2026-12-03')).toBe('3 de diciembre de 2026');
    expect(messages.formatDate('2025-01-31')).toBe('31 de enero de 2025');
    expect(messages.formatDate(' marzo de 2024 ')).toBe('marzo de 2024');
    expect(messages.formatDate('2026-13-01')).toBe('2026-13-01');
    expect(messages.printed(messages.formatDate('2026-12-03'))).toBe('Impreso el 3 de diciembre de 2026');
  });

  it('says what every number is out of, with the period as "los próximos" or "el próximo"', () => {
    expect(messages.numbersFor(sheet)).toBe(
      'Todos los números de esta hoja son de cada 100 personas, durante los próximos 10 años.',
    );
    expect(messages.numbersFor(rare)).toBe(
      `Los dibujos muestran 1000 personas; los demás números son de cada 10${nbsp}000, durante los próximos 5 años.`,
    );
    expect(messages.numbersFor({ ...sheet, years: 1 })).toContain('durante el próximo año.');
    expect(messages.numbersFor({ ...sheet, years: yearsFrom(3, 'weeks'), unit: 'weeks' })).toContain(
      'durante las próximas 3 semanas.',
    );
    expect(messages.keyIntro({ ...sheet, denominator: 1000 })).toBe(
      'Cada dibujo muestra 1000 personas como usted. Cada figura es una persona.',
    );
  });

  it('keeps "se libran" out of the key of a wanted event', () => {
    expect(messages.keyGroups.prevented).toBe('Personas que se libran gracias a la opción');
    expect(Object.values(messages.wantedKeyGroups).join(' ')).not.toMatch(/libran|riesgo|evita|causa/);
    expect(messages.wantedKeyGroups.caused).toBe('Personas a las que les pasa gracias a la opción');
  });

  it('fills the table with "de cada", the leaflet frequency words and the change', () => {
    expect(messages.tableCell({ kind: 'about', count: 15 }, 100)).toBe('15 de cada 100');
    expect(messages.tableCell({ kind: 'fewer-than-one' }, 1000000)).toBe('menos de 1 de cada millón');
    expect(messages.tableCell({ kind: 'fewer-than-one' }, 10000)).toBe(`menos de 1 de cada 10${nbsp}000`);
    expect(messages.tableCell({ kind: 'nearly-all' }, 1000)).toBe('casi las 1000');
    expect(messages.bandCell('rare', { kind: 'about', count: 4 }, 10000)).toBe(`raro: 4 de cada 10${nbsp}000`);
    expect(messages.bandCell('not-known', { kind: 'about', count: 4 }, 100)).toBe('4 de cada 100');
    expect(messages.tableChange({ direction: 'more', count: 40, hidden: null })).toBe('40 más');
    expect(messages.tableChange({ direction: 'fewer', count: 5, hidden: null })).toBe('5 menos');
    expect(messages.tableChange({ direction: 'same', count: 0, hidden: null })).toBe('sin cambio');
    expect(messages.tableChange({ direction: 'same', count: 0, hidden: 'fewer' })).toBe('casi igual (algo menos)');
    expect(messages.tableBenefitRows('raise')).toBe('Lo que las opciones buscan hacer más probable');
    expect(messages.certaintyShort['very-low']).toBe('certeza muy baja');
  });

  it('labels outcomes and ranges, with "del 95 %"', () => {
    expect(messages.rangeLevel(0.95, 1)).toBe(`Ese rango es un intervalo del 95${nbsp}%.`);
    expect(messages.rangeLevel(0.9, 3)).toBe(`Cada rango es un intervalo del 90${nbsp}%.`);
    expect(messages.outcomeLabel('dolor muscular', 'harm')).toBe('Dolor muscular (efecto secundario).');
    expect(messages.sideEffectHeading('Probabilidad de dolor muscular en 10 años')).toBe(
      'Efecto secundario: probabilidad de dolor muscular en 10 años',
    );
  });

  it('says where the numbers come from, contracting "de el"', () => {
    expect(messages.evidenceReviewed(messages.formatDate('2026-11-01'))).toBe(
      'La investigación se revisó por última vez el 1 de noviembre de 2026.',
    );
    expect(messages.evidenceSummary('')).toBe('No se indicó la fuente de la investigación.');
    expect(messages.baselineSource('el ictus', 'Registro inventado.')).toBe(
      'Su probabilidad inicial del ictus sale de: Registro inventado.',
    );
    expect(messages.baselineConverted('un infarto', '10 años', '15 años')).toBe(
      'Su probabilidad inicial de un infarto se dio para 10 años. Se calculó para 15 años, suponiendo que se mantiene igual.',
    );
    expect(messages.beyondFollowUp('el cribado', '12 años', '15 años')).toBe(
      'La investigación sobre el cribado duró 12 años. Los números para 15 años suponen que su efecto continúa.',
    );
    expect(messages.duration({ years: yearsFrom(3, 'days'), unit: 'days' })).toBe('3 días');
  });

  it('asks what matters, as a better chance of a wanted event and never as avoiding it', () => {
    expect(messages.mattersPrompt({ benefit: 'que el dolor desaparezca', wanted: true, harms: ['mareo'] })).toBe(
      '¿Cuánto le importa tener más probabilidad de que el dolor desaparezca? Compárelo con la probabilidad de mareo. Escríbalo aquí para hablarlo.',
    );
    expect(messages.mattersPrompt({ benefit: 'un infarto', wanted: false, harms: ['dolor muscular', 'hinchazón'] })).toBe(
      '¿Cuánto le importa librarse de un infarto? Compárelo con la probabilidad de dolor muscular o hinchazón. Escríbalo aquí para hablarlo.',
    );
    expect(messages.mattersPrompt({ benefit: 'un infarto', wanted: false, harms: [] })).toContain(
      'Compárelo con lo que le pide cada opción.',
    );
  });

  it('cautions that the sheet supports and does not replace the advice of the patient’s own clinicians', () => {
    expect(messages.cautionHeading).toBe('Tenga en cuenta:');
    expect(messages.caution(rare)).toBe(
      `estos números son estimaciones para grupos de 10${nbsp}000 personas como usted durante los próximos 5 años, no una predicción para usted. ` +
        'Esta hoja le ayuda a hablar con su propio médico, enfermera o farmacéutico, y no sustituye sus consejos. ' +
        'Siga las recomendaciones locales.',
    );
  });

  it('asks default questions in usted and writes the footer', () => {
    expect(messages.questionsHeading).toBe('Preguntas que quizá quiera hacer');
    expect(messages.defaultQuestions).toEqual([
      '¿Qué pasa si espero y decido más tarde?',
      '¿Puedo cambiar de idea una vez que haya empezado?',
    ]);
    expect(messages.preparedBy(' Centro de Salud Norte ')).toBe('Preparado por Centro de Salud Norte');
    expect(messages.preparedByBlank).toBe('Preparado por: ______________________');
    expect(messages.pageOfPages).toBe('Página 1 de 1');
    expect(messages.appVersion('0.1.0')).toBe('Chancewise 0.1.0');
    expect(messages.capitalise('¿qué pasa?')).toBe('¿Qué pasa?');
  });

  it('writes the disclosures and the sources of the effects', () => {
    expect(
      messages.about.line({
        preparedBy: 'Equipo inventado.',
        funding: null,
        interests: 'Ninguno',
        reviewBy: '1 de enero de 2028',
      }),
    ).toBe(
      'Sobre esta hoja. Escrita por: Equipo inventado. Financiación: no consta. Conflictos de intereses: Ninguno. Revisar antes del: 1 de enero de 2028.',
    );
    expect(
      messages.about.effectSources([
        { source: 'Revisión inventada', of: ['estatina'] },
        { source: '', of: [] },
      ]),
    ).toBe('Los efectos provienen de: Revisión inventada (estatina); no consta.');
    expect(messages.about.effectSources([])).toBeNull();
  });

  it('words the screening section with the verb agreeing with "ninguna" or "personas"', () => {
    expect(messages.screening.heading).toBe('Si se hace la prueba:');
    expect(messages.screening.positive('una colonoscopia.')).toBe('un resultado positivo lleva a una colonoscopia.');
    expect(messages.screening.missedCase({ kind: 'about', count: 3 }, 1000)).toBe(
      'Alrededor de 3 de cada 1000 personas que se hacen la prueba reciben un resultado normal, pero sí tienen la enfermedad. Esto es un caso no detectado.',
    );
    expect(messages.screening.overdiagnosis({ kind: 'none' }, 1000)).toBe(
      'Ninguna de las 1000 personas que se hacen la prueba recibe el diagnóstico de una enfermedad que nunca les habría hecho daño. Esto es un sobrediagnóstico.',
    );
  });
});
