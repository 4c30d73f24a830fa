/**
 * A pseudo locale of any words object: every string becomes `⟦…⟧` and every function's string
 * result is wrapped the same way, at any depth, so a test can strip the wrapped parts of an
 * output and see what was printed without going through the words. Pseudo-localisation is
 * common practice for finding text that bypasses a catalogue.
 */

/** Wrap one text the way the pseudo locale marks it. */
export const pseudoText = (text: string): string => `⟦${text}⟧`;

/**
 * The pseudo locale of `words`, with the same shape. Each string argument given to one of its
 * functions is also passed to `onArgument`, so a test can check that what the code hands the
 * words (names, numbers, paths) holds no words of its own: the wrap of the result would hide them.
 */
export function pseudoWrap<T>(words: T, onArgument: (text: string) => void = () => undefined): T {
  const wrap = (value: unknown): unknown => {
    if (typeof value === 'string') return pseudoText(value);
    if (typeof value === 'function') {
      const original = value as (...args: unknown[]) => unknown;
      return (...args: unknown[]) => {
        for (const argument of args) if (typeof argument === 'string') onArgument(argument);
        const result = original(...args);
        return typeof result === 'string' ? pseudoText(result) : result;
      };
    }
    if (Array.isArray(value)) return value.map(wrap);
    if (typeof value === 'object' && value !== null) {
      return Object.fromEntries(Object.entries(value).map(([key, inner]) => [key, wrap(inner)]));
    }
    return value;
  };
  return wrap(words) as T;
}

/** Remove every `⟦…⟧` segment, innermost first, so nested wraps go too. */
export function withoutPseudoText(text: string): string {
  let rest = text;
  for (let before = ''; before !== rest;) {
    before = rest;
    rest = rest.replace(/⟦[^⟦⟧]*⟧/g, '');
  }
  return rest;
}
