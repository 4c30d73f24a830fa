/**
 * The names of the files a batch writes: one per input, from the input's stem, with `-2`,
 * `-3`… added when an earlier input of the same call already took the name. Names are told
 * apart without regard to case, so a batch writes the same files on every file system.
 */
import { basename } from 'node:path';

/** Endings a topic file's name may carry, longest first; the stem is what comes before. */
const TOPIC_ENDINGS: readonly RegExp[] = [/\.chancewise\.json$/i, /\.[^.]+$/];

/**
 * The stem of a topic file's name: without its folder and its ending.
 *
 * @example fileStem('clinic/Sore throat.cwtopic') // => 'Sore throat'
 * @example fileStem('stones.chancewise.json') // => 'stones'
 */
export function fileStem(path: string): string {
  const name = basename(path);
  for (const ending of TOPIC_ENDINGS) {
    const stem = name.replace(ending, '');
    if (stem !== name && stem !== '') return stem;
  }
  return name;
}

/**
 * One output name per input, in input order, each ending in `extension`.
 *
 * @example batchFileNames(['a/x.cwtopic', 'b/x.cwtopic', 'y.json'], '.pdf') // => ['x.pdf', 'x-2.pdf', 'y.pdf']
 */
export function batchFileNames(inputs: readonly string[], extension: string): string[] {
  const taken = new Set<string>();
  return inputs.map((input) => {
    const stem = fileStem(input);
    let name = `${stem}${extension}`;
    for (let count = 2; taken.has(name.toLowerCase()); count += 1) name = `${stem}-${count}${extension}`;
    taken.add(name.toLowerCase());
    return name;
  });
}
