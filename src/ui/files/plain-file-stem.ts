/**
 * A title in plain letters for a file name: lower case, accents dropped, words joined by
 * hyphens, the "(illustrative example)" tag left out, at most `maxWords` words, and
 * `fallback` when nothing is left.
 *
 * @example plainFileStem('Taking a tablet (illustrative example)', 8, 'topic') // => 'taking-a-tablet'
 */
export function plainFileStem(title: string, maxWords: number, fallback: string): string {
  const words = title
    .toLowerCase()
    .replace(/\(illustrative example\)/g, '')
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .split('-')
    .slice(0, maxWords)
    .join('-');
  return words === '' ? fallback : words;
}
