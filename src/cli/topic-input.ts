import { readFileSync, readdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describeProblem } from '../core/messages/describe.ts';
import type { Topic } from '../core/topic/topic.ts';
import { readTopicFile } from '../core/topic/topic-file.ts';
import type { ParsedArgs } from './parse-args.ts';
import type { CliWords } from './messages/cli-messages.ts';
import { UsageError } from './usage-error.ts';

/** The folder of the built-in demo topics. */
export const DEMO_FOLDER = fileURLToPath(new URL('../../assets/demo/', import.meta.url));

/** The demo topic files, in the order they are offered (the first is the default demo). */
export function demoFiles(): string[] {
  return readdirSync(DEMO_FOLDER)
    .filter((name) => name.endsWith('.json'))
    .sort()
    .map((name) => `${DEMO_FOLDER}${name}`);
}

/** Read and check a topic file from disk; a refusal is worded in `words`. */
export function loadTopic(path: string, words: CliWords): Topic {
  let contents: string;
  try {
    contents = readFileSync(path, 'utf8');
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    const reason =
      code === 'ENOENT'
        ? words.reasons.noSuchFile
        : code === 'EISDIR'
          ? words.reasons.isFolder
          : (code ?? words.reasons.unreadable);
    throw new UsageError(words.usage.fileUnreadable(path, reason));
  }
  const reading = readTopicFile(contents);
  if (!reading.ok) throw new UsageError(`${path}: ${describeProblem(reading.problem, words.catalogue)}`);
  return reading.topic;
}

/** The topic named on the command line (a file or --demo), or null when none was given. */
export function topicFromArgs(parsed: ParsedArgs, words: CliWords): Topic | null {
  const demo = parsed.flags.has('--demo');
  const [file, extra] = parsed.positionals;
  if (extra !== undefined) throw new UsageError(words.usage.extraArgument(extra));
  if (demo && file !== undefined) throw new UsageError(words.usage.topicAndDemo());
  if (demo) {
    const first = demoFiles()[0];
    if (first === undefined) throw new Error('no demo topics found in assets/demo');
    return loadTopic(first, words);
  }
  return file === undefined ? null : loadTopic(file, words);
}
