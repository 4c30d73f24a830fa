/**
 * What makes two builds of the same handout byte-identical: a creation date
 * written from the printed date alone (no clock, no time zone) and a file
 * identifier derived from the content.
 */

/** The PDF date string (ISO 32000-1, 7.9.4) for midnight UTC of a YYYY-MM-DD date. */
export function pdfDate(isoDate: string): string {
  const found = /^(\d{4})-(\d{2})-(\d{2})$/.exec(isoDate);
  if (found === null) throw new RangeError(`pdfDate requires a YYYY-MM-DD date (got ${isoDate})`);
  return `D:${found[1]}${found[2]}${found[3]}000000+00'00'`;
}

/** FNV-1a, 32 bits (Fowler, Noll and Vo), from a given offset basis. */
function fnv1a(text: string, basis: number): number {
  let hash = basis >>> 0;
  for (let index = 0; index < text.length; index += 1) {
    hash ^= text.charCodeAt(index);
    hash = Math.imul(hash, 0x01000193) >>> 0;
  }
  return hash;
}

/**
 * A 32-hex-digit file identifier from `text`: four FNV-1a hashes with different
 * starting values. Stable for the same text; not a security measure.
 *
 * @example fileIdentifier('abc').length // => 32
 */
export function fileIdentifier(text: string): string {
  const bases = [0x811c9dc5, 0x01000193, 0x9e3779b9, 0x7f4a7c15];
  return bases.map((basis) => fnv1a(text, basis).toString(16).toUpperCase().padStart(8, '0')).join('');
}
