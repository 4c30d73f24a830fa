/**
 * Word and sentence splitting for readability scores.
 *
 * Words: runs between spaces (and dashes or slashes between words) that contain a
 * letter or a digit. Numbers count as words, so "15 in 100" is three words and
 * "15%" one; hyphenated words and contractions are one word each ("long-term",
 * "don't"), as in Flesch's counting rules (from memory: Flesch 1949, The Art of
 * Readable Writing). Symbols standing alone ("&", "–") are not words.
 *
 * Sentences: a run of text ends at ".", "!" or "?" followed by a space or the end
 * (closing quotes and brackets may come between), and at a blank line. A full
 * stop inside a number ("2.5") or after a short title or Latin abbreviation
 * ("Dr.", "e.g.") does not end a sentence. Text without an end mark is one
 * sentence. Colons and semicolons do not end sentences.
 */

/** Short titles and Latin abbreviations whose full stop does not end an English sentence. */
export const ENGLISH_ABBREVIATIONS: ReadonlySet<string> = new Set([
  'dr',
  'mr',
  'mrs',
  'ms',
  'prof',
  'e.g',
  'i.e',
  'vs',
  'approx',
  'cf',
]);

/** Whether a token holds a letter or a digit, so counts as a word. */
const isWord = (token: string): boolean => /[\p{L}\p{N}]/u.test(token);

/**
 * The words of a text, in order, as written.
 *
 * @param text - any text
 * @returns the words
 * @example splitWords('About 15 in 100 people.') // => ['About', '15', 'in', '100', 'people.']
 */
export function splitWords(text: string): readonly string[] {
  return text.split(/\s+|\s*[–—]\s*|(?<=\p{L})\/(?=\p{L})/u).filter(isWord);
}

/**
 * The sentences of a text, each trimmed; pieces without a word are dropped.
 *
 * @param text - any text
 * @param abbreviations - lower-case abbreviations (without their last full stop) that do not end a sentence
 * @returns the sentences
 * @example splitSentences('The cat sat. Dr. Jones saw it!') // => ['The cat sat.', 'Dr. Jones saw it!']
 */
export function splitSentences(text: string, abbreviations: ReadonlySet<string> = ENGLISH_ABBREVIATIONS): readonly string[] {
  const sentences: string[] = [];
  for (const paragraph of text.split(/\n\s*\n/)) {
    let current = '';
    const pieces = paragraph.split(/(?<=[.!?]['"’”)\]]*)\s+/);
    for (const piece of pieces) {
      current = current === '' ? piece : `${current} ${piece}`;
      const lastWord = (piece.trim().split(/\s+/).pop() ?? '').replace(/^['"‘“([]+/, '').toLowerCase();
      const endsSentence = /[.!?]['"’”)\]]*$/.test(piece) && !abbreviations.has(lastWord.replace(/\.$/, ''));
      if (endsSentence) {
        sentences.push(current.trim());
        current = '';
      }
    }
    if (current.trim() !== '') sentences.push(current.trim());
  }
  return sentences.filter((sentence) => splitWords(sentence).length > 0);
}
