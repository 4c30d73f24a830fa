/**
 * `chancewise handout FILE... --out-dir DIR`: one handout per topic file in one process. A
 * file that cannot be read or made into a handout gets its one line on stderr and the others
 * are still written; each PDF replaces any file of its name in one step (written beside it,
 * then renamed over it). Exit status 0 when all were written, 2 when an input was refused, 1
 * when a file could not be written (this outranks 2).
 */
import { mkdirSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Topic } from '../core/topic/topic.ts';
import { batchFileNames } from './batch-file-names.ts';
import type { CommandOutput } from './command-output.ts';
import type { CliWords } from './messages/cli-messages.ts';
import { loadTopic } from './topic-input.ts';
import { UsageError } from './usage-error.ts';

/** One handout made: its bytes and the line that reports it once written to `path`. */
export interface MadeHandout {
  readonly pdf: Uint8Array;
  readonly report: (path: string) => string;
  /** Warnings for stderr (a typed text that reads above the grade target); the handout is still written. */
  readonly warnings: readonly string[];
}

/** Why a write failed, in words. */
function writeReason(error: unknown, words: CliWords): string {
  const code = (error as NodeJS.ErrnoException).code;
  if (code === 'ENOENT') return words.reasons.folderMissing;
  if (code === 'EACCES' || code === 'EPERM') return words.reasons.permissionDenied;
  if (code === 'EEXIST' || code === 'ENOTDIR') return words.reasons.fileInTheWay;
  if (code === 'EISDIR') return words.reasons.folderInTheWay;
  return code ?? words.reasons.writeFailed;
}

/** Replace `path` with `contents` in one step: no reader sees half a file, and a failed write leaves the old one. */
function replaceFile(path: string, contents: Uint8Array): void {
  const partial = `${path}.${process.pid}.partial`;
  try {
    writeFileSync(partial, contents);
    renameSync(partial, path);
  } catch (error) {
    rmSync(partial, { force: true });
    throw error;
  }
}

/** The one-line message of a refused input. */
function messageOf(error: unknown): string {
  if (error instanceof UsageError) return error.message;
  throw error;
}

/**
 * Make and write the handout of every file in `inputs` into `folder`, with `make` (the flags
 * of the call already read). Refusals go to stderr, one line each, naming the file, in `words`.
 */
export function runHandoutBatch(
  inputs: readonly string[],
  folder: string,
  make: (topic: Topic) => MadeHandout,
  words: CliWords,
): CommandOutput {
  try {
    mkdirSync(folder, { recursive: true });
  } catch (error) {
    return { stdout: '', stderr: `${words.usage.folderUnusable(folder, writeReason(error, words))}\n`, exitCode: 1 };
  }
  const names = batchFileNames(inputs, '.pdf');
  let stdout = '';
  let stderr = '';
  let [written, refused, unwritable] = [0, 0, 0];
  inputs.forEach((input, index) => {
    let made: MadeHandout;
    try {
      const topic = loadTopic(input, words);
      try {
        made = make(topic);
      } catch (error) {
        throw new UsageError(`${input}: ${messageOf(error)}`);
      }
    } catch (error) {
      stderr += `${messageOf(error)}\n`;
      refused += 1;
      return;
    }
    const path = join(folder, names[index] ?? '');
    try {
      replaceFile(path, made.pdf);
    } catch (error) {
      stderr += `${words.usage.fileUnwritable(path, writeReason(error, words))}\n`;
      unwritable += 1;
      return;
    }
    stdout += `${made.report(path)}\n`;
    stderr += made.warnings.map((line) => `${input}: ${line}\n`).join('');
    written += 1;
  });
  stdout += `${words.reports.batchWritten(written, inputs.length, folder)}\n`;
  return { stdout, stderr, exitCode: unwritable > 0 ? 1 : refused > 0 ? 2 : 0 };
}
