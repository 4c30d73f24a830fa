import { measureNamesEn } from './measure-names.ts';

/**
 * English words for what a topic file should hold and what it holds instead, used inside
 * the `file-field-invalid` sentence ("expected a whole number, found the text "12"").
 */

/** Plain names of the fixed values a topic file may hold, shown beside the value itself. */
const choiceNames: Readonly<Record<string, string>> = { counts: 'trial counts', ...measureNamesEn };

/** "a, b or c" */
function listWithOr(items: readonly string[]): string {
  if (items.length <= 1) return items[0] ?? '';
  return `${items.slice(0, -1).join(', ')} or ${items[items.length - 1] ?? ''}`;
}

function choice(value: string | number): string {
  if (typeof value === 'number') return String(value);
  const name = choiceNames[value];
  return name === undefined ? `"${value}"` : `"${value}" (${name})`;
}

export const fileWords = {
  text: 'text',
  number: 'a number',
  wholeNumber: 'a whole number',
  trueOrFalse: 'true or false',
  list: 'a list',
  group: 'a group of fields',
  groupOf: (names: readonly string[]) => `a group of fields (${names.join(', ')})`,
  null: 'null',
  nothing: 'nothing',
  anyValue: 'a valid value',
  /** One of several fixed values: `"benefit" or "harm"`, `one of "rr" (risk ratio), …`. */
  choices: (values: readonly (string | number)[]): string =>
    values.length > 2 ? `one of ${listWithOr(values.map(choice))}` : listWithOr(values.map(choice)),
  /** Several kinds of value: "a number, text or null". */
  alternatives: (phrases: readonly string[]): string => listWithOr(phrases),
  receivedText: (value: string) => `the text ${JSON.stringify(value)}`,
  receivedNumber: (value: number) => (Number.isFinite(value) ? `the number ${String(value)}` : 'a number too large to use'),
  receivedBoolean: (value: boolean) => `the value ${String(value)}`,
  receivedOther: (kind: string) => `a value of type ${kind}`,
  wholeFile: '(the whole file)',
  noFormat: 'none',
} as const;
