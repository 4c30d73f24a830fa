import type { NumberMessages } from '../number-messages.ts';

/**
 * Spanish words for number summaries: "a" between an interval's limits ("NNTB 13 a 100",
 * "NNTB 4 a ∞ a NNTH 20"), the labels NNTB and NNTH kept as Altman (1998) wrote them, and the
 * phrase for no difference ("número necesario a tratar", the usual Spanish name; from memory).
 */
export const numberMessagesEs: NumberMessages = {
  infinity: '∞',
  to: 'a',
  noDifference: 'No hay diferencia entre las opciones, así que no hay número necesario a tratar',
  noDifferenceWithin: (interval: string) =>
    `No hay diferencia entre las opciones, así que no hay número necesario a tratar (${interval})`,
};
