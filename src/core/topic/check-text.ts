/** Checks shared by the parts of topic validation: a text's presence and length, and collecting thrown problems. */
import { InputError, problem } from '../problems.ts';
import type { Problem } from '../problems.ts';

/** A text field: present when `required`, and at most `limit` characters. */
export function checkText(problems: Problem[], value: string, field: string, what: string, limit: number, required = true): void {
  if (required && value.trim() === '') problems.push(problem('topic-text-missing', field, { what }));
  if (value.length > limit) problems.push(problem('topic-text-too-long', field, { what, length: value.length, limit }));
}

/** Run a check that throws `InputError`, keeping its problem among the others. */
export function collect(problems: Problem[], attempt: () => void): void {
  try {
    attempt();
  } catch (error) {
    if (error instanceof InputError) problems.push(error.problem);
    else throw error;
  }
}
