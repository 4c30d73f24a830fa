/**
 * The sentence a clinician reads when a handout does not fit on its one page. It is in the
 * clinician's language, not the sheet's: a Spanish handout that is refused is explained in the
 * interface's words, since the patient never sees a sheet that was not made.
 */
import type { HandoutPart } from './handout-messages.ts';

export interface HandoutRefusalMessages {
  /** The one line telling the clinician what to shorten, in whole millimetres. */
  readonly doesNotFit: (part: HandoutPart, overMillimetres: number) => string;
}

const shortenWhat: Readonly<Record<HandoutPart, string>> = {
  header: 'the decision or the description of who the numbers are for',
  options: 'the option names, or compare fewer options',
  outcomes: 'the outcome names, or show fewer outcomes',
  evidence: 'the evidence summary, the sources, or the entries about who prepared the topic',
  screening: 'what a positive result leads to',
  questions: 'the questions, or give fewer of them',
};

export const handoutRefusalMessagesEn: HandoutRefusalMessages = {
  doesNotFit: (part, overMillimetres) =>
    `The handout does not fit on one page (about ${Math.max(1, Math.ceil(overMillimetres))} mm too long): shorten ${shortenWhat[part]}.`,
};
