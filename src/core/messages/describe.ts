import type { Notice } from '../types.ts';
import type { Problem } from '../problems.ts';
import { english } from './en/index.ts';
import type { NoticeCode } from './en/notices.ts';

/** The catalogue shape every language provides. */
export type Catalogue = typeof english;

/** The sentence for a problem, from the catalogue (English unless another is given). */
export function describeProblem(found: Problem, catalogue: Catalogue = english): string {
  return catalogue.problems[found.code](found.values);
}

/** The sentence for a warning notice. Unknown codes fall back to the code itself. */
export function describeNotice(notice: Notice, catalogue: Catalogue = english): string {
  const render = catalogue.notices[notice.code as NoticeCode];
  return render === undefined ? notice.code : render(notice.values);
}

/**
 * The sentences of warnings, in order, each once: two notices whose values differ only in
 * what the sentence does not show would otherwise give the same line twice.
 */
export function noticeSentences(notices: readonly Notice[], catalogue: Catalogue = english): string[] {
  return [...new Set(notices.map((notice) => describeNotice(notice, catalogue)))];
}
