import { noticeMessages } from './notices.ts';
import { numberMessages } from './numbers.ts';
import { problemMessages } from './problems.ts';
import { wordingMessages } from './wording.ts';

/** The English message catalogue. A second language is a sibling folder with the same shape. */
export const english = {
  problems: problemMessages,
  notices: noticeMessages,
  numbers: numberMessages,
  wording: wordingMessages,
} as const;
