/**
 * Reading the topic files a teaching set names by path, in Node: each path is taken
 * relative to the folder of the set's own file. Used by the tests of teaching sets; the
 * browser bundle never imports it (the layer test checks that nothing it bundles reaches node:).
 */
import { readFile } from 'node:fs/promises';
import { dirname, resolve } from 'node:path';
import type { ReadTopicText } from './resolve-teaching-set.ts';

/** A reader of topic files relative to the teaching set at `setFilePath`. */
export function nodeTopicReader(setFilePath: string): ReadTopicText {
  const folder = dirname(resolve(setFilePath));
  return (path) => readFile(resolve(folder, path), 'utf8');
}
