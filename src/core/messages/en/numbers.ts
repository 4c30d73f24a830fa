import type { NumberMessages } from '../number-messages.ts';

/** English words for number summaries shared by the command line, the app and the handout. */
export const numberMessages: NumberMessages = {
  infinity: '∞',
  to: 'to',
  noDifference: 'No difference between the options, so no number needed to treat',
  noDifferenceWithin: (interval: string) => `No difference between the options, so no number needed to treat (${interval})`,
};
