/**
 * `chancewise handout FILE... --out-dir DIR`: one handout per topic file in one process. A
 * file that cannot be read or made into a handout gets its one line on stderr and the others
 * are still written; each PDF replaces any file of its name in one step (written beside it,
 * then renamed over it). Exit status 0 when all were written, 2 when an input was refused, 1
 * when a file could not be written (this outranks 2).
 */
import { mkdirSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { english } from '../core/messages/en/index.ts';
import type { Topic } from '../core/topic/topic.ts';
import { batchFileNames } from './batch-file-names.ts';
import type { CommandOutput } from './command-output.ts';
import { loadTopic } from './topic-input.ts';
import { UsageError } from './usage-error.ts';

const words = english.cli;

/** One handout made: its bytes and the line that reports it once written to `path`. */
export interface MadeHandout {
  readonly pdf: Uint8Array;
  readonly report: (path: string) => string;
  /** Warnings for stderr (a typed text that reads above the grade target); the handout is still written. */
  readonly warnings: readonly string[];
}

/** Why a write failed, in words. */
function writeReason(error: unknown): string {
  const code = (error as NodeJS.ErrnoException).code;
  if (code === 'ENOENT') return 'the folder does not exist';
  if (code === 'EACCES' || code === 'EPERM') return 'permission denied';
  if (code === 'EEXIST' || code === 'ENOTDIR') return 'a file of that name is in the way';
  if (code === 'EISDIR') return 'a folder of that name is in the way';
  return code ?? 'write failed';
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
 * of the call already read). Refusals go to stderr, one line each, naming the file.
 */
export function runHandoutBatch(inputs: readonly string[], folder: string, make: (topic: Topic) => MadeHandout): CommandOutput {
  try {
    mkdirSync(folder, { recursive: true });
  } catch (error) {
    return { stdout: '', stderr: `${words.folderUnusable(folder, writeReason(error))}\n`, exitCode: 1 };
  }
  const names = batchFileNames(inputs, '.pdf');
  let stdout = '';
  let stderr = '';
  let [written, refused, unwritable] = [0, 0, 0];
  inputs.forEach((input, index) => {
    let made: MadeHandout;
    try {
      const topic = loadTopic(input);
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
      stderr += `${words.fileUnwritable(path, writeReason(error))}\n`;
      unwritable += 1;
      return;
    }
    stdout += `${made.report(path)}\n`;
    stderr += made.warnings.map((line) => `${input}: ${line}\n`).join('');
    written += 1;
  });
  stdout += `${words.batchWritten(written, inputs.length, folder)}\n`;
  return { stdout, stderr, exitCode: unwritable > 0 ? 1 : refused > 0 ? 2 : 0 };
}
