/**
 * Checks of a topic's disclosures and screening section (version 5): texts within their
 * limits, a review-by date that is a real day written YYYY-MM-DD, and chances that read as risks.
 */
import { readCalendarDate } from '../calendar-date.ts';
import { parseRisk } from '../parse-risk.ts';
import { problem } from '../problems.ts';
import type { Problem } from '../problems.ts';
import { checkText, collect } from './check-text.ts';
import { TOPIC_LIMITS } from './topic.ts';
import type { TopicDisclosures, TopicScreening } from './topic.ts';

/** A date field: empty (not stated), or a real day written YYYY-MM-DD. */
function checkDate(problems: Problem[], value: string, field: string, what: string): void {
  if (value.trim() === '') return;
  const reading = readCalendarDate(value);
  if (reading.kind === 'not-written') problems.push(problem('date-not-written', field, { what, input: value.trim() }));
  if (reading.kind === 'not-real') problems.push(problem('date-not-real', field, { what, input: value.trim() }));
}

/** Every problem of the disclosures; each may be empty, which the handout prints as "not stated". */
export function checkDisclosures(problems: Problem[], about: TopicDisclosures): void {
  const limit = TOPIC_LIMITS.disclosureLength;
  checkText(problems, about.preparedBy, 'about.preparedBy', 'name of who prepared the topic', limit, false);
  checkText(problems, about.funding, 'about.funding', 'funding', limit, false);
  checkText(problems, about.interests, 'about.interests', 'statement of interests', limit, false);
  checkDate(problems, about.reviewBy, 'about.reviewBy', 'review-by date');
}

/** Every problem of the screening section: its text's length, and each chance given as a risk from 0% to 100%. */
export function checkScreening(problems: Problem[], screening: TopicScreening): void {
  const { positiveLeadsTo, missedCase, overdiagnosis } = screening;
  const limit = TOPIC_LIMITS.screeningTextLength;
  checkText(problems, positiveLeadsTo, 'screening.positiveLeadsTo', 'text on what a positive result leads to', limit, false);
  if (missedCase !== null) collect(problems, () => parseRisk(missedCase, 'screening.missedCase'));
  if (overdiagnosis !== null) collect(problems, () => parseRisk(overdiagnosis, 'screening.overdiagnosis'));
}
