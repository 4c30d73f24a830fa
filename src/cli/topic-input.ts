import { readFileSync, readdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { english } from '../core/messages/en/index.ts';
import { describeProblem } from '../core/messages/describe.ts';
import type { Topic } from '../core/topic/topic.ts';
import { readTopicFile } from '../core/topic/topic-file.ts';
import type { ParsedArgs } from './parse-args.ts';
import { UsageError } from './usage-error.ts';

const words = english.cli;

/** The folder of the built-in demo topics. */
export const DEMO_FOLDER = fileURLToPath(new URL('../../assets/demo/', import.meta.url));

/** The demo topic files, in the order they are offered (the first is the default demo). */
export function demoFiles(): string[] {
  return readdirSync(DEMO_FOLDER)
    .filter((name) => name.endsWith('.json'))
    .sort()
    .map((name) => `${DEMO_FOLDER}${name}`);
}

/** Read and check a topic file from disk. */
export function loadTopic(path: string): Topic {
  let contents: string;
  try {
    contents = readFileSync(path, 'utf8');
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    const reason = code === 'ENOENT' ? 'no such file' : code === 'EISDIR' ? 'it is a folder' : (code ?? 'unreadable');
    throw new UsageError(words.fileUnreadable(path, reason));
  }
  const reading = readTopicFile(contents);
  if (!reading.ok) throw new UsageError(`${path}: ${describeProblem(reading.problem)}`);
  return reading.topic;
}

/** The topic named on the command line (a file or --demo), or null when none was given. */
export function topicFromArgs(parsed: ParsedArgs): Topic | null {
  const demo = parsed.flags.has('--demo');
  const [file, extra] = parsed.positionals;
  if (extra !== undefined) throw new UsageError(words.extraArgument(extra));
  if (demo && file !== undefined) throw new UsageError(words.topicAndDemo());
  if (demo) {
    const first = demoFiles()[0];
    if (first === undefined) throw new Error('no demo topics found in assets/demo');
    return loadTopic(first);
  }
  return file === undefined ? null : loadTopic(file);
}
