/**
 * The benchmark's table: one row per measure, in milliseconds unless the label says otherwise.
 */

/**
 * @typedef {{ label: string, target: number | null, median: number | null, p25: number | null, p75: number | null, n: number, unit?: string }} Row
 */

/**
 * Rows as an aligned text table with a verdict against each target.
 * @param {readonly Row[]} rows
 * @returns {string}
 */
export function formatTable(rows) {
  const cell = (/** @type {number | null} */ value) => (value === null ? '—' : value.toFixed(1));
  const header = ['measure', 'median', 'p25', 'p75', 'n', 'target', ''];
  const body = rows.map((row) => [
    row.label,
    cell(row.median),
    cell(row.p25),
    cell(row.p75),
    String(row.n),
    row.target === null ? '' : `< ${row.target}${row.unit ?? ' ms'}`,
    row.target === null || row.median === null ? '' : row.median < row.target ? 'met' : 'MISSED',
  ]);
  const widths = header.map((title, column) => Math.max(title.length, ...body.map((line) => (line[column] ?? '').length)));
  const line = (/** @type {string[]} */ cells) =>
    cells
      .map((text, column) => (column === 0 ? text.padEnd(widths[column] ?? 0) : text.padStart(widths[column] ?? 0)))
      .join('  ')
      .trimEnd();
  return [line(header), widths.map((width) => '-'.repeat(width)).join('  '), ...body.map(line)].join('\n');
}
