/**
 * A pseudo locale for tests: any message catalogue with every string it gives wrapped in
 * ⟦…⟧, so a test can tell words that came from the catalogue from words written elsewhere.
 * Strings are wrapped, functions that return a string return it wrapped, objects and arrays
 * are walked; numbers, booleans, null and functions that return anything else are kept.
 */

export const PSEUDO_OPEN = '⟦';
export const PSEUDO_CLOSE = '⟧';

/** The same shape as the catalogue given: every string it yields is wrapped. */
export type Pseudo<Messages> = Messages;

export const pseudoWrap = (text: string): string => `${PSEUDO_OPEN}${text}${PSEUDO_CLOSE}`;

function pseudoValue(value: unknown): unknown {
  if (typeof value === 'string') return pseudoWrap(value);
  if (typeof value === 'function') {
    const original = value as (...args: unknown[]) => unknown;
    return function pseudoFunction(this: unknown, ...args: unknown[]): unknown {
      const result: unknown = original.apply(this, args);
      return typeof result === 'string' ? pseudoWrap(result) : result;
    };
  }
  if (Array.isArray(value)) return value.map(pseudoValue);
  if (value !== null && typeof value === 'object') {
    return Object.fromEntries(Object.entries(value).map(([key, entry]) => [key, pseudoValue(entry)]));
  }
  return value;
}

/** The catalogue with every string wrapped as ⟦…⟧ (the given one is left as it was). */
export function pseudoLocale<Messages extends object>(messages: Messages): Pseudo<Messages> {
  return pseudoValue(messages) as Messages;
}

/**
 * The text with every ⟦…⟧ segment taken out, nested ones included (a wrapped sentence may hold
 * a wrapped word); an unmatched bracket is left in place, so a broken wrap shows.
 */
export function stripPseudo(text: string): string {
  let rest = text;
  for (;;) {
    // The innermost segments first: an opening bracket followed by no other bracket before its close.
    const next = rest.replace(/⟦[^⟦⟧]*⟧/g, '');
    if (next === rest) return rest;
    rest = next;
  }
}

/** Words that note each string handed to them (as an argument, or a field of an argument) before answering. */
export function noting<Words>(words: Words, note: (text: string) => void): Words {
  const walk = (value: unknown): unknown => {
    if (typeof value === 'function') {
      const original = value as (...args: unknown[]) => unknown;
      return (...args: unknown[]) => {
        for (const argument of args) {
          if (typeof argument === 'string') note(argument);
          else if (argument !== null && typeof argument === 'object' && !Array.isArray(argument) && !(argument instanceof Date))
            for (const inner of Object.values(argument)) if (typeof inner === 'string') note(inner);
        }
        return original(...args);
      };
    }
    if (Array.isArray(value)) return value.map(walk);
    if (value !== null && typeof value === 'object')
      return Object.fromEntries(Object.entries(value).map(([key, inner]) => [key, walk(inner)]));
    return value;
  };
  return walk(words) as Words;
}

/**
 * The values code hands to the words that are codes, not words: the words turn them into words
 * (a time unit, a direction, a frequency band, a role in a chart, a language tag, a scale). A
 * citation is kept as published, in any language (the readability scales' sources).
 */
export const HANDED_CODES = new Set([
  ...['days', 'weeks', 'months', 'years'],
  ...['fewer', 'more', 'same', 'reduce', 'increase', 'reduction', 'trivial'],
  ...['very-common', 'common', 'uncommon', 'rare', 'very-rare', 'not-known'],
  ...['comparison', 'option', 'benefit', 'harm', 'en', 'es'],
  ...['flesch-kincaid-grade', 'inflesz', 'Kincaid et al. 1975', 'Barrio-Cantalejo et al. 2008'],
]);
