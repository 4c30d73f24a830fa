import { readdirSync, readFileSync } from 'node:fs';
import { join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { matchingHashes, sha256, wholeNumbers } from './whole-numbers.ts';

/**
 * The checks of this project must not use aspirin-trial tables: neither the 2×2 table of
 * myocardial infarctions on placebo and on aspirin from the Physicians' Health Study, nor the
 * table of ischaemic strokes in women on aspirin and on placebo from the Women's Health Study.
 * Their counts are held here only as SHA-256 hashes of their digits. The large counts (the two
 * arm totals, the two cells of people without the event, the grand total and the margin without
 * the event) each give a table away; the two event counts are ordinary numbers on their own, so a
 * file is refused only when it holds both of one table.
 */
interface ExcludedTable {
  readonly name: string;
  readonly large: ReadonlySet<string>;
  readonly events: ReadonlySet<string>;
}

const EXCLUDED: readonly ExcludedTable[] = [
  {
    name: "myocardial infarctions, Physicians' Health Study",
    large: new Set([
      '322142e016e988712de8c373dd1ede27b243aec64b61cd4aa5aa5137e3754b54',
      '690c4db056e43ca1024e4878a222d0851fd0784206d10f5107ac6553e434066f',
      '9ae07e2fab2603e3179c7ce2a7c49c18e90dfa3ae59edf48b8241125c39001ce',
      '66f27dc2a523e6a0adc2f8076e16eda993abbe92fc5b43e6466980c143b25381',
      '86f2a0c23daa83dc10b77df2be5d8532fee4b8af11a7dedc898cc656007108ca',
      '9f49651db931b862285dcac1f1e7596f568264433a447509f9b7528b5b6ca6f7',
    ]),
    events: new Set([
      '7045d16ae7f043ec25774a0a85d6f479e5bb019e9c5a1584bc76736d116b8f33',
      '5ef6fdf32513aa7cd11f72beccf132b9224d33f271471fff402742887a171edf',
    ]),
  },
  {
    name: "ischaemic strokes in women, Women's Health Study",
    large: new Set([
      '2c2907c96e5d5a9884921655c10efc0c83c9834e527ffeaf95abee4c83fa9102',
      '5256baf61d245bb9445d3786ffc7b187065d8d0ca3497c5c06defbb4a1d2e09d',
      '057b9b6e49d03958b3f38e812d2cfdd0f500e35e537b4fa9afedd2f3444db8a2',
      'd51d988389055b7fc7d9f803778a59ab1289c0338088e33d2b7e33ed6ba126c5',
      '7362677f99d8b79f43fceaee3d1c3de8f4ba31501b36f507cc5c6caf0834e25d',
      'f1db7c9ee79ec2bb0013a645feb356ef42fc8f92fc5fff347a788bdadfecea88',
    ]),
    events: new Set([
      'cba28b89eb859497f544956d64cf2ecf29b76fe2ef7175b33ea59e64293a4461',
      'a0eaec5a55dc2f5b2ba523018adc485ff620b9d83509b9f37186a7716e438d21',
    ]),
  },
];

const ROOT = fileURLToPath(new URL('../../', import.meta.url));
const FOLDERS = ['test', 'assets', 'src', 'bench', 'e2e', 'scripts', 'electron'];
const TEXT = /\.(ts|js|mjs|cjs|json|svelte|md|html|css|svg|txt|py|yml)$/;

function textFiles(folder: string): string[] {
  return readdirSync(folder, { withFileTypes: true }).flatMap((entry) => {
    const path = join(folder, entry.name);
    // Build outputs (dist/, never committed) hold minified libraries, whose digits are no data of ours.
    if (entry.isDirectory()) return entry.name === 'node_modules' || entry.name === 'dist' ? [] : textFiles(path);
    return TEXT.test(entry.name) ? [path] : [];
  });
}

/** Why a text gives the table away, or null when it does not. */
function giveaway(text: string, large: ReadonlySet<string>, events: ReadonlySet<string>): string | null {
  const found = matchingHashes(text, new Set([...large, ...events]));
  if ([...found].some((hash) => large.has(hash))) return 'a large count of the table';
  if ([...events].every((hash) => found.has(hash))) return 'both event counts of the table';
  return null;
}

describe('the provenance of the test data and assets', () => {
  const files = FOLDERS.flatMap((folder) => textFiles(join(ROOT, folder)));

  it('reads the source, test and asset files', () => {
    expect(files.length).toBeGreaterThan(300);
    expect(files.some((path) => path.endsWith(join('assets', 'demo', '01-kidney-stone.json')))).toBe(true);
  });

  it('finds none of the excluded tables’ counts in any of them', () => {
    const texts = files.map((path) => ({ path: relative(ROOT, path), text: readFileSync(path, 'utf8') }));
    const refused = EXCLUDED.flatMap((table) =>
      texts
        .map(({ path, text }) => ({ table: table.name, path, why: giveaway(text, table.large, table.events) }))
        .filter((found) => found.why !== null),
    );
    expect(refused).toEqual([]);
  });
});

describe('reading whole numbers for the provenance check', () => {
  it('finds a whole number however it is set off, but not the digits of a float or an exponent', () => {
    expect([...wholeNumbers('a 4242 b (4242) x4242y')]).toEqual(['4242']);
    expect(wholeNumbers('0.4242 .4242 4242.5 1e4242 2E-4242 3e+4242').has('4242')).toBe(false);
    // A seeded random draw such as 0.424218 holds the digits but not the number.
    expect(wholeNumbers('seed 7, draw 0.424218').has('4242')).toBe(false);
  });

  it('joins thousands separators and still sees the numbers of a list', () => {
    const found = wholeNumbers('12,345 and 67\u2009890 and 23_456, list [12,345]');
    for (const number of ['12345', '67890', '23456', '12', '345']) expect(found.has(number)).toBe(true);
  });

  it('refuses a text by the hash of one large count, or of both small ones together', () => {
    const large = new Set([sha256('54321')]);
    const events = new Set([sha256('77'), sha256('88')]);
    expect(giveaway('total 54,321 people', large, events)).toBe('a large count of the table');
    expect(giveaway('77 of them and 88 of the others', large, events)).toBe('both event counts of the table');
    expect(giveaway('77 of them, 0.88 of the others, 543210 more', large, events)).toBeNull();
  });
});
