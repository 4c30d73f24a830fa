import { describe, expect, it } from 'vitest';
import { yearsFrom } from '../../../src/core/time-unit.ts';
import { chartMessagesEs as messages } from '../../../src/render/messages/es.ts';

const nbsp = '\u00a0';
const label = { count: 15, outcome: 'un infarto', option: 'la estatina', role: 'option' as const };

describe('Spanish chart wording', () => {
  it('heads a chart with the outcome and the period in its own unit', () => {
    expect(messages.heading('un infarto', 10)).toBe('Probabilidad de un infarto en 10 años');
    expect(messages.heading('que el dolor desaparezca', yearsFrom(3, 'days'), 'days')).toBe(
      'Probabilidad de que el dolor desaparezca en 3 días',
    );
    expect(messages.heading('un infarto', 0.5)).toBe('Probabilidad de un infarto en 6 meses');
    expect(messages.heading('un infarto', null)).toBe('Probabilidad de un infarto');
  });

  it('leads every array title with the option, so no "con" meets a name such as "Sin tratamiento"', () => {
    const values = { denominator: 1000, option: 'sin tratamiento', periodYears: 1 };
    expect(messages.comparisonTitle(values)).toBe('Sin tratamiento: 1000 personas en 1 año');
    expect(messages.optionTitle({ ...values, denominator: 100, option: 'estatina', periodYears: 10 })).toBe(
      'Estatina: 100 personas en 10 años',
    );
    expect(messages.pairTitle({ denominator: 100, option: '', periodYears: 10 }, 'comparison')).toBe(
      'Sin la opción: 100 personas como usted, en 10 años',
    );
    expect(messages.pairTitle({ denominator: 100, option: '', periodYears: null }, 'option')).toBe(
      'Con la opción: 100 personas como usted',
    );
  });

  it('labels the groups of an unwanted event with "se libran" and "debido a", agreeing with the count', () => {
    expect(messages.labels.event(label)).toBe('15 tienen un infarto de todos modos');
    expect(messages.labels.event({ ...label, count: 1, role: 'comparison' })).toBe('1 tiene un infarto');
    expect(messages.labels.prevented({ ...label, count: 5 })).toBe('5 se libran de un infarto gracias a la estatina');
    expect(messages.labels.prevented({ ...label, count: 1, option: 'el tratamiento' })).toBe(
      '1 se libra de un infarto gracias al tratamiento',
    );
    expect(messages.labels.caused({ ...label, count: 3, outcome: 'dolor muscular' })).toBe(
      '3 tienen dolor muscular debido a la estatina',
    );
    expect(messages.labels.free({ ...label, count: 80 })).toBe('80 no tienen un infarto');
  });

  it('gives an outcome named by an infinitive the verb "llegar a"', () => {
    const dying = { ...label, outcome: 'morir de cáncer de colon' };
    expect(messages.labels.event({ ...dying, count: 4, role: 'comparison' })).toBe('4 llegan a morir de cáncer de colon');
    expect(messages.labels.free({ ...dying, count: 96 })).toBe('96 no llegan a morir de cáncer de colon');
  });

  it('never calls a wanted event avoided or caused: people reach it "gracias a" the option', () => {
    const wanted = { ...label, outcome: 'que el dolor desaparezca', option: 'la pastilla B' };
    expect(messages.wantedLabels.caused({ ...wanted, count: 20 })).toBe(
      '20 logran que el dolor desaparezca gracias a la pastilla B',
    );
    expect(messages.wantedLabels.prevented({ ...wanted, count: 3 })).toBe(
      '3 no logran que el dolor desaparezca debido a la pastilla B',
    );
    expect(messages.wantedLabels.event({ ...wanted, count: 25, role: 'comparison' })).toBe('25 logran que el dolor desaparezca');
    expect(messages.wantedLabels.caused({ ...wanted, count: 1, outcome: 'alivio del dolor' })).toBe(
      '1 tiene alivio del dolor gracias a la pastilla B',
    );
    for (const text of Object.values(messages.wantedLabels).map((words) => words({ ...wanted, count: 2 }))) {
      expect(text).not.toMatch(/se libran|riesgo|causa|evita/);
    }
  });

  it('says "no difference" only as the same number with and without the option', () => {
    expect(messages.noDifference('un infarto', 'la estatina')).toBe(
      'Con la estatina, el número de personas que tienen un infarto es el mismo que sin esta opción.',
    );
  });

  it('writes a difference below one person with the words denominator grouped by a non-breaking space', () => {
    const values = { outcome: 'un infarto', option: 'la estatina', denominator: 1000, direction: 'fewer' as const };
    expect(messages.belowOnePerson({ ...values, count: 2, wordsDenominator: 10000 })).toBe(
      `Menos de 1 de cada 1000: con la estatina, alrededor de 2 de cada 10${nbsp}000 personas menos tienen un infarto; son demasiado pocas para verse aquí como una persona entera.`,
    );
    expect(messages.belowOnePerson({ ...values, direction: 'more', count: 0, wordsDenominator: null })).toBe(
      'Menos de 1 de cada 1000, y menos de 1 de cada millón: con la estatina, ligeramente más personas tienen un infarto; son demasiado pocas para verse aquí como una persona entera.',
    );
  });

  it('writes the range with its level as "intervalo del 95 %" (number, non-breaking space, sign)', () => {
    const values = { lower: 13, upper: 18, denominator: 100, outcome: 'un infarto', option: 'la estatina', level: 0.95 };
    expect(messages.range(values)).toBe(
      `Con la estatina, entre 13 y 18 de estas 100 personas podrían tener un infarto (rango: intervalo del 95${nbsp}%).`,
    );
    expect(messages.range({ ...values, level: null })).toBe(
      'Con la estatina, entre 13 y 18 de estas 100 personas podrían tener un infarto.',
    );
    expect(messages.narrowRange({ ...values, lower: 150, upper: 150, denominator: 1000, words: null })).toBe(
      `Con la estatina, el rango (intervalo del 95${nbsp}%) mide menos de una persona: en cualquiera de sus extremos, alrededor de 150 de estas 1000 personas podrían tener un infarto.`,
    );
    expect(messages.narrowRange({ ...values, denominator: 1000, words: { lower: 1502, upper: 1508, denominator: 10000 } })).toBe(
      `Con la estatina, el rango (intervalo del 95${nbsp}%) mide menos de una persona de estas 1000: entre 1502 y 1508 de cada 10${nbsp}000 podrían tener un infarto.`,
    );
  });

  it('explains the dashed ring and sums up an array with "y" or "e" before the last label', () => {
    expect(messages.rangeOutline('un infarto', 'la estatina')).toBe(
      'Círculo de trazos: personas que pueden tener un infarto con la estatina, o no, según dónde esté el valor real dentro de ese rango.',
    );
    expect(messages.summary('Estatina: 100 personas', ['15 tienen un infarto', '85 no tienen un infarto'])).toBe(
      'Estatina: 100 personas: 15 tienen un infarto y 85 no tienen un infarto.',
    );
  });

  it('names a bare pair and the option in a label in lower case, keeping acronyms', () => {
    expect(messages.causeName('Opción A', false)).toBe('opción A');
    expect(messages.causeName('IECA', false)).toBe('IECA');
    expect(messages.causeName('Opción A', true)).toBe('la opción');
    expect(messages.defaultOutcome).toBe('este resultado');
    expect(messages.illustrative).toBe('Ejemplo ilustrativo: números inventados, no de un estudio real.');
  });
});
