import { noticeMessages } from './notices.ts';
import { problemMessages } from './problems.ts';

/** The English message catalogue. A second language is a sibling folder with the same shape. */
export const english = { problems: problemMessages, notices: noticeMessages } as const;
