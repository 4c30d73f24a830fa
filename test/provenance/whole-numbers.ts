/**
 * The whole numbers written in a text, for checking where test data came from. A float's
 * digits are not whole numbers: in "0.4242" or "1e-4242" there is no 4242. A number written
 * with thousands separators ("12,345", "12 345" with a thin space, "12_345") is read both as
 * its groups and as the joined number, so a list such as "[12,345]" still yields 12 and 345.
 */
import { createHash } from 'node:crypto';

/** A digit run that is not part of a decimal or an exponent. */
const PLAIN = /(?<![\d.]|\d[eE][+-]?)\d+(?!\d|\.\d)/g;
/** Digits in groups of three after the first group, joined by one separator each. */
const GROUPED = /(?<![\d.]|\d[eE][+-]?)\d{1,3}(?:[,_\u2009\u202f]\d{3})+(?!\d|\.\d)/g;

/** Every whole number of `text`, as written without separators. */
export function wholeNumbers(text: string): Set<string> {
  const found = new Set<string>();
  for (const match of text.matchAll(PLAIN)) found.add(match[0]);
  for (const match of text.matchAll(GROUPED)) found.add(match[0].replace(/[,_\u2009\u202f]/g, ''));
  return found;
}

/** The SHA-256 of a number's digits, in hex. */
export const sha256 = (digits: string): string => createHash('sha256').update(digits).digest('hex');

/** The hashes in `hashes` that some whole number of `text` has. */
export function matchingHashes(text: string, hashes: ReadonlySet<string>): Set<string> {
  return new Set([...wholeNumbers(text)].map(sha256).filter((hash) => hashes.has(hash)));
}
