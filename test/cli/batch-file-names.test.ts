/**
 * The names of a batch's files: the stem of each input's name, with -2, -3… for the later
 * inputs that would take a name already taken in the same call (common practice for saving
 * many files into one folder), compared without case so the files are the same on every system.
 */
import { describe, expect, it } from 'vitest';
import { batchFileNames, fileStem } from '../../src/cli/batch-file-names.ts';

describe('fileStem', () => {
  it.each([
    ['clinic/Sore throat.cwtopic', 'Sore throat'],
    ['stones.chancewise.json', 'stones'],
    ['/a/b/screening.v3.json', 'screening.v3'],
    ['no-ending', 'no-ending'],
    ['.hidden', '.hidden'],
  ])('%s → %s', (path, stem) => {
    expect(fileStem(path)).toBe(stem);
  });
});

describe('batchFileNames', () => {
  it('keeps each stem when no two inputs share one', () => {
    expect(batchFileNames(['a.cwtopic', 'dir/b.json'], '.pdf')).toEqual(['a.pdf', 'b.pdf']);
  });

  it('adds -2 and -3 to the second and third input of the same stem, in input order', () => {
    expect(batchFileNames(['one/x.cwtopic', 'two/x.json', 'three/x.cwtopic', 'y.json'], '.pdf')).toEqual([
      'x.pdf',
      'x-2.pdf',
      'x-3.pdf',
      'y.pdf',
    ]);
  });

  it('tells names apart without regard to case, and never reuses a name an added number made', () => {
    expect(batchFileNames(['x.json', 'b/x.json', 'X.cwtopic', 'x-2.json'], '.pdf')).toEqual([
      'x.pdf',
      'x-2.pdf',
      'X-3.pdf',
      'x-2-2.pdf',
    ]);
  });

  it('gives the same file twice two names', () => {
    expect(batchFileNames(['a.json', 'a.json'], '.pdf')).toEqual(['a.pdf', 'a-2.pdf']);
  });
});
