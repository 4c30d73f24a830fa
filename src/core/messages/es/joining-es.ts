/**
 * Joining our words to a name the clinician typed in Spanish: the prepositions "de" and "a"
 * contract with a following article "el" ("del", "al"; RAE & ASALE 2010, Ortografía de la
 * lengua española, on the contractions, from memory), and an outcome may be typed as a clause
 * led by "que" ("que el dolor desaparezca"), which takes a verb such as "lograr" before it.
 */

/** "de" before a typed phrase: "de un infarto", but "del tratamiento" for "el tratamiento". */
export function deEs(phrase: string): string {
  return contracted('de', 'del', phrase);
}

/** "a" before a typed phrase: "a la estatina", but "al tratamiento" for "el tratamiento". */
export function aEs(phrase: string): string {
  return contracted('a', 'al', phrase);
}

/** True when an outcome is a clause led by "que": "que el dolor desaparezca". */
export function startsWithQueEs(outcome: string): boolean {
  return /^que\s/i.test(outcome.trim());
}

/** Only a lower-case article contracts: "El Salvador", a name, keeps "de El Salvador". */
function contracted(preposition: string, contraction: string, phrase: string): string {
  const trimmed = phrase.trim();
  return /^el\s/.test(trimmed) ? `${contraction} ${trimmed.slice(3)}` : `${preposition} ${trimmed}`;
}
