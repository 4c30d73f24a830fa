import { describe, expect, it } from 'vitest';
import { yearsFrom } from '../../../src/core/time-unit.ts';
import { teachingPatientSlideMessagesEs as es } from '../../../src/teaching/messages/es.ts';

// The Spanish a patient reads on a teaching slide. Numbers: decimal comma, digits grouped by a
// non-breaking space from 10 000 and "15 %" (RAE & ASALE 2010, Ortografía de la lengua española,
// chapter on numerals; from memory). Plural for every amount but exactly 1 (RAE & ASALE 2009,
// Nueva gramática; from memory). Usted form, natural frequencies "de cada 100" (common practice).

const NBSP = '\u00a0';
const years = (amount: number) => ({ years: amount, unit: 'years' as const });

describe('the Spanish story headings', () => {
  it('names every story step', () => {
    expect(es.stepNames).toEqual({
      title: 'La decisión',
      baseline: 'Sin la opción',
      'with-option': 'Con la opción',
      helped: 'A quién ayuda',
      harmed: 'A quién perjudica',
      uncertainty: '¿Hasta qué punto lo sabemos?',
      'patient-words': 'Lo que oye el paciente',
    });
  });

  it('numbers a step of several slides', () => {
    expect(es.story.partOf('A quién perjudica', 1, 2)).toBe('A quién perjudica (1 de 2)');
    expect(es.story.partOf('A quién perjudica', 1, 1)).toBe('A quién perjudica');
  });
});

describe('Spanish numbers and capitals on a slide', () => {
  it('writes decimals with a comma and at most two places', () => {
    expect(es.decimal(2.5)).toBe('2,5');
    expect(es.decimal(11.25)).toBe('11,25');
    expect(es.decimal(26.666)).toBe('26,67');
    expect(es.decimal(4)).toBe('4');
  });

  it('capitalises a name after an opening question mark', () => {
    expect(es.capitalise('no tomar nada')).toBe('No tomar nada');
    expect(es.capitalise('¿cuándo?')).toBe('¿Cuándo?');
    expect(es.capitalise('ácido acetilsalicílico')).toBe('Ácido acetilsalicílico');
  });
});

describe('the Spanish title slide', () => {
  it('says who the numbers are for and what is compared', () => {
    expect(es.title.who('adultos con la tensión alta')).toBe('Para adultos con la tensión alta.');
    expect(es.title.comparing('la pastilla', 'no tomar nada')).toBe('Se compara la pastilla con no tomar nada.');
    expect(es.title.illustrative).toBe(
      'Ejemplo ilustrativo: todas las cifras son inventadas, para enseñar. No sirve para decisiones reales.',
    );
  });

  it('gives the period in each unit, with its gender and number', () => {
    expect(es.title.period(years(10))).toBe('Todas las cifras cuentan lo que pasa durante 10 años.');
    expect(es.title.period(years(1))).toBe('Todas las cifras cuentan lo que pasa durante 1 año.');
    expect(es.title.period(years(2.5))).toBe('Todas las cifras cuentan lo que pasa durante 2,5 años.');
    expect(es.title.period({ years: yearsFrom(6, 'months'), unit: 'months' })).toBe(
      'Todas las cifras cuentan lo que pasa en los próximos 6 meses.',
    );
    expect(es.title.period({ years: yearsFrom(1, 'months'), unit: 'months' })).toBe(
      'Todas las cifras cuentan lo que pasa en el próximo mes.',
    );
    expect(es.title.period({ years: yearsFrom(2, 'weeks'), unit: 'weeks' })).toBe(
      'Todas las cifras cuentan lo que pasa en las próximas 2 semanas.',
    );
    expect(es.title.period({ years: yearsFrom(1, 'weeks'), unit: 'weeks' })).toBe(
      'Todas las cifras cuentan lo que pasa en la próxima semana.',
    );
    expect(es.title.period({ years: yearsFrom(3, 'days'), unit: 'days' })).toBe(
      'Todas las cifras cuentan lo que pasa en los primeros 3 días.',
    );
    expect(es.title.period({ years: yearsFrom(1, 'days'), unit: 'days' })).toBe(
      'Todas las cifras cuentan lo que pasa en un día.',
    );
  });
});

describe('the Spanish call-outs', () => {
  it('counts in natural frequencies, of 100 and of 1000 people', () => {
    expect(es.callouts.countIn(15, 100)).toBe('15 de cada 100');
    expect(es.callouts.countIn(150, 1000)).toBe('150 de cada 1000');
    expect(es.callouts.countIn(1, 1000)).toBe('1 de cada 1000');
  });

  it('puts the right verb before a noun, an infinitive or a clause', () => {
    expect(es.callouts.have(15, 'un infarto', years(10))).toBe('tienen un infarto durante 10 años');
    expect(es.callouts.have(1, 'un infarto', years(10))).toBe('tiene un infarto durante 10 años');
    expect(es.callouts.have(3, 'morir de cáncer de colon', years(10))).toBe('llegan a morir de cáncer de colon durante 10 años');
    expect(es.callouts.have(40, 'que el dolor desaparezca', { years: yearsFrom(3, 'days'), unit: 'days' })).toBe(
      'consiguen que el dolor desaparezca en los primeros 3 días',
    );
    // "dolor" ends like an infinitive but is a noun.
    expect(es.callouts.have(20, 'dolor de garganta', years(1))).toBe('tienen dolor de garganta durante 1 año');
  });

  it('says who it does not happen to without the gender of the name', () => {
    expect(es.callouts.doNot(85, 'un infarto')).toBe('no tienen un infarto');
    expect(es.callouts.doNot(1, 'morir de cáncer de colon')).toBe('no llega a morir de cáncer de colon');
    expect(es.callouts.doNot(40, 'que el dolor desaparezca')).toBe('no consiguen que el dolor desaparezca');
    expect(es.callouts.anyway(11, 'un infarto')).toBe('tienen un infarto de todos modos');
    expect(es.callouts.anyway(1, 'un infarto')).toBe('tiene un infarto de todos modos');
  });

  it('says what happens with and without the option', () => {
    expect(es.callouts.haveWith(11, 'un infarto', 'la pastilla')).toBe('tienen un infarto con la pastilla');
    expect(es.callouts.without('no tomar nada')).toBe('sin la opción (no tomar nada)');
    expect(es.callouts.peopleLikeYou(1000, 'adultos de 60 años')).toBe(
      'Cada figura es una de 1000 personas como usted: adultos de 60 años.',
    );
    expect(es.callouts.outlined).toBe(
      'Solo el contorno: personas a las que puede pasarles o no, según dónde esté el valor real dentro del margen.',
    );
  });

  it('says an unwanted event is avoided thanks to the option or had because of it', () => {
    expect(es.callouts.changedBecause('prevented', false, 4, 'un infarto', 'la pastilla')).toBe(
      'evitan un infarto gracias a la pastilla',
    );
    expect(es.callouts.changedBecause('prevented', false, 1, 'morir de cáncer de colon', 'el cribado')).toBe(
      'evita morir de cáncer de colon gracias al cribado',
    );
    expect(es.callouts.changedBecause('caused', false, 3, 'mareos', 'el tratamiento')).toBe(
      'tienen mareos a causa del tratamiento',
    );
  });

  it('never says a wanted event is avoided or caused', () => {
    expect(es.callouts.changedBecause('caused', true, 20, 'alivio del dolor', 'la crema')).toBe(
      'tienen alivio del dolor gracias a la crema',
    );
    expect(es.callouts.changedBecause('caused', true, 20, 'que el dolor desaparezca', 'la crema')).toBe(
      'consiguen que el dolor desaparezca gracias a la crema',
    );
    expect(es.callouts.changedBecause('prevented', true, 5, 'alivio del dolor', 'el reposo')).toBe(
      'se quedan sin alivio del dolor a causa del reposo',
    );
    expect(es.callouts.changedBecause('prevented', true, 1, 'dormir bien', 'la crema')).toBe(
      'se queda sin dormir bien a causa de la crema',
    );
    for (const group of ['prevented', 'caused'] as const) {
      expect(es.callouts.changedBecause(group, true, 2, 'alivio del dolor', 'la crema')).not.toMatch(/evita|causa[^ ]|riesgo/);
    }
  });
});

describe('the Spanish counts under the people', () => {
  it('says each count in words', () => {
    expect(es.chips.event(15, 'un infarto')).toBe('15 tienen un infarto');
    expect(es.chips.event(1, 'un infarto')).toBe('1 tiene un infarto');
    expect(es.chips.free(85, 'un infarto')).toBe('85 no tienen un infarto');
    expect(es.chips.free(997, 'morir de cáncer de colon')).toBe('997 no llegan a morir de cáncer de colon');
    expect(es.chips.uncertain(3, 'un infarto')).toBe('3 pueden o no tener un infarto');
    expect(es.chips.uncertain(1, 'morir de cáncer de colon')).toBe('1 puede o no morir de cáncer de colon');
    expect(es.chips.changed('prevented', false, 4, 'un infarto', 'la pastilla')).toBe(
      '4 evitan un infarto gracias a la pastilla',
    );
    expect(es.chips.changed('caused', true, 12, 'alivio del dolor', 'la crema')).toBe(
      '12 tienen alivio del dolor gracias a la crema',
    );
  });

  it('groups a count from 10 000 with a non-breaking space', () => {
    expect(es.chips.free(10000, 'un infarto')).toBe(`10${NBSP}000 no tienen un infarto`);
  });

  it('describes a people array for assistive technology', () => {
    expect(es.panels.description('La pastilla', ['11 tienen un infarto', '4 evitan un infarto', '85 no tienen un infarto'])).toBe(
      'La pastilla: 11 tienen un infarto, 4 evitan un infarto y 85 no tienen un infarto.',
    );
  });
});

describe('the Spanish story lines', () => {
  it('says the total without the option', () => {
    expect(es.story.totalWithout(15, 100, 'no tomar nada')).toBe('Sin la opción (no tomar nada): 15 de cada 100.');
  });

  it('says when an option changes no one, and whom it changes the other way', () => {
    expect(es.story.noOneChanged('prevented', false, 1000, 'un infarto', 'la pastilla')).toBe(
      'Con estas cifras, ninguna de las 1000 personas evita un infarto gracias a la pastilla.',
    );
    expect(es.story.noOneChanged('caused', true, 100, 'alivio del dolor', 'la crema')).toBe(
      'Con estas cifras, ninguna de las 100 personas tiene alivio del dolor gracias a la crema.',
    );
    expect(es.story.instead('10 de cada 100', 'se quedan sin alivio del dolor a causa de la crema')).toBe(
      'En cambio, 10 de cada 100 se quedan sin alivio del dolor a causa de la crema.',
    );
  });

  it('names the certainty and the level of the range', () => {
    expect(es.story.certaintyLabel).toBe('Certeza de la evidencia');
    expect(es.story.certaintyNames).toEqual({ high: 'alta', moderate: 'moderada', low: 'baja', 'very-low': 'muy baja' });
    expect(es.story.intervalLevel(95)).toBe(`El margen es el intervalo del 95${NBSP}% que da la investigación.`);
    expect(es.story.intervalLevel(97.5)).toBe(`El margen es el intervalo del 97,5${NBSP}% que da la investigación.`);
    expect(es.story.patientTopics('un infarto')).toBe('Sobre un infarto');
  });
});

describe('the Spanish figure cards', () => {
  it('says a relative change as a risk for an unwanted event, as people for a wanted one', () => {
    expect(es.framing.relativeLabel).toBe('Relativo');
    expect(es.framing.relativeValue(25, 'lower', false)).toBe(`Riesgo un 25${NBSP}% menor`);
    expect(es.framing.relativeValue(50, 'higher', false)).toBe(`Riesgo un 50${NBSP}% mayor`);
    expect(es.framing.relativeValue(40, 'higher', true)).toBe(`Un 40${NBSP}% más de personas`);
    expect(es.framing.relativeValue(10, 'lower', true)).not.toContain('Riesgo');
    expect(es.framing.relativeDetail('15', '11,25', 100)).toBe('De 15 a 11,25 de cada 100');
    expect(es.framing.relativeNone).toBe('Sin cambio relativo con estas cifras');
  });

  it('says an absolute change with its subtraction', () => {
    expect(es.framing.absoluteLabel).toBe('Absoluto');
    expect(es.framing.absoluteValue(4, 100, 'fewer')).toBe('4 menos de cada 100');
    expect(es.framing.absoluteValue(25, 1000, 'more')).toBe('25 más de cada 1000');
    expect(es.framing.absoluteDetail('15', '11,25', '3,75', 100, 'fewer')).toBe('15 − 11,25 = 3,75 menos de cada 100');
    expect(es.framing.absoluteNone(1000)).toBe('Sin diferencia en 1000 personas');
  });

  it('says a number needed to treat, rounded as the core rounds it', () => {
    expect(es.framing.nntLabel).toBe('NNT');
    expect(es.framing.nntValue(27, 'helps', false)).toBe('Tratar a 27 para evitar 1');
    expect(es.framing.nntValue(40, 'harms', false)).toBe('Tratar a 40 para causar 1');
    expect(es.framing.nntValue(5, 'helps', true)).toBe('Tratar a 5 para 1 más');
    expect(es.framing.nntValue(8, 'harms', true)).toBe('Tratar a 8 para 1 menos');
    expect(es.framing.nntDetail(100, '3,75', '26,67', 27, 'up')).toBe('100 ÷ 3,75 = 26,67, redondeado hacia arriba: 27');
    expect(es.framing.nntDetail(100, '2,5', '40', 40, 'down')).toBe('100 ÷ 2,5 = 40, redondeado hacia abajo: 40');
    expect(es.framing.nntNone).toBe('Sin número necesario a tratar');
  });

  it('keeps a rare outcome readable in 1000 people', () => {
    // 0.3% of 1000 people is 3; a tenth of them avoided is 0.3, shown as "0,3".
    expect(es.callouts.countIn(3, 1000)).toBe('3 de cada 1000');
    expect(es.framing.absoluteDetail(es.decimal(3), es.decimal(2.7), es.decimal(0.3), 1000, 'fewer')).toBe(
      '3 − 2,7 = 0,3 menos de cada 1000',
    );
    expect(es.framing.nntDetail(1000, es.decimal(0.3), es.decimal(3333.333), 3334, 'up')).toBe(
      '1000 ÷ 0,3 = 3333,33, redondeado hacia arriba: 3334',
    );
  });
});
