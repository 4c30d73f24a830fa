/**
 * Spanish grammar helpers shared by every Spanish catalogue (core wording, pictures, handout,
 * teaching): the plural rule, a capital first letter, and whether an outcome name is a verb
 * phrase ("morir de un infarto") rather than a noun phrase ("un infarto").
 */

/** Spanish plural rule: the `one` form for exactly 1, the `other` form otherwise (0 and 1,5 take the plural). */
export function pluralEs(count: number, one: string, other: string): string {
  return count === 1 ? one : other;
}

/** A sentence starts with a capital, after any opening "¿" or "¡"; names typed with a capital are left as they are. */
export function capitaliseEs(text: string): string {
  const opening = /^[¿¡«"“]*/.exec(text)?.[0] ?? '';
  const rest = text.slice(opening.length);
  return opening + rest.charAt(0).toUpperCase() + rest.slice(1);
}

/** Nouns that end like an infinitive (-ar, -er, -ir) but are not verbs (common practice). */
const NOT_VERBS = new Set([
  'malestar',
  'mujer',
  'lugar',
  'hogar',
  'azúcar',
  'cáncer',
  'alfiler',
  'collar',
  'dolor',
  'placer',
  'poder',
  'deber',
  'taller',
  'militar',
  'familiar',
  'par',
  'mar',
  'bar',
  'ser',
]);

/**
 * True when an outcome name starts with an infinitive ("morir de cáncer", "necesitar diálisis",
 * "volver a fumar"), so that the sentence says "terminará por morir" rather than "tendrá morir".
 * Infinitives end in -ar, -er or -ir, with an enclitic pronoun allowed ("romperse la cadera").
 */
export function startsWithVerbEs(outcome: string): boolean {
  const first = (outcome.trim().split(/\s+/)[0] ?? '').toLowerCase();
  if (NOT_VERBS.has(first)) return false;
  return /^[a-zñáéíóú]{2,}(ar|er|ir|ír)(se|le|lo|la|les|los|las)?$/.test(first);
}

/** "a, b y c", with "e" before a word that starts with the sound /i/ ("a e hígado"), as Spanish spelling asks. */
export function joinListEs(items: readonly string[], conjunction: 'y' | 'o' = 'y'): string {
  if (items.length <= 1) return items.join('');
  const last = items[items.length - 1] ?? '';
  const word = conjunction === 'y' ? (/^h?i(?![aeou])/i.test(last) ? 'e' : 'y') : /^h?o/i.test(last) ? 'u' : 'o';
  return `${items.slice(0, -1).join(', ')} ${word} ${last}`;
}
