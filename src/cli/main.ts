import { describeProblem } from '../core/messages/describe.ts';
import { InputError } from '../core/problems.ts';
import type { CommandIo, CommandOutput } from './command-output.ts';
import { runCompute } from './compute-command.ts';
import { flagForField } from './flag-for-field.ts';
import type { CliWords } from './messages/cli-messages.ts';
import { cliWordsEn } from './messages/en.ts';
import { UsageError } from './usage-error.ts';

type Command = (args: readonly string[], words: CliWords) => CommandOutput | Promise<CommandOutput>;

const COMMANDS: Readonly<Record<string, () => Promise<Command>>> = {
  compute: async () => runCompute,
  chart: async () => (await import('./chart-command.ts')).runChart,
  handout: async () => (await import('./handout-command.ts')).runHandout,
};

function oneLine(text: string): string {
  return text.replace(/\s*\n\s*/g, ' ').trim();
}

/**
 * Run the command line: exit status 0 on success, 2 for input the user must fix (one line on
 * stderr, nothing on stdout), 1 for any other failure. Everything printed is worded in
 * `words` (English unless given), which every command receives; JSON output is data and
 * keeps its English fields and sentences.
 */
export async function main(args: readonly string[], io: CommandIo, words: CliWords = cliWordsEn): Promise<number> {
  const [name, ...rest] = args;
  if (name === undefined || name === '--help' || name === '-h' || name === 'help') {
    if (name === undefined) {
      io.stderr(`${words.usage.noCommand()}\n`);
      return 2;
    }
    io.stdout(words.help);
    return 0;
  }
  const load = COMMANDS[name];
  if (load === undefined) {
    io.stderr(`${words.usage.unknownCommand(name)}\n`);
    return 2;
  }
  if (rest.includes('--help')) {
    io.stdout(words.help);
    return 0;
  }
  try {
    const command = await load();
    const output = await command(rest, words);
    io.stdout(output.stdout);
    if (output.stderr !== undefined && output.stderr !== '') io.stderr(output.stderr);
    return output.exitCode ?? 0;
  } catch (error) {
    if (error instanceof InputError) {
      const flag = flagForField(error.problem.field);
      const sentence = describeProblem(error.problem, words.catalogue);
      io.stderr(`${oneLine(flag === null ? sentence : `${flag}: ${sentence}`)}\n`);
      return 2;
    }
    if (error instanceof UsageError) {
      io.stderr(`${oneLine(error.message)}\n`);
      return 2;
    }
    const detail = error instanceof Error ? error.message : String(error);
    io.stderr(`${oneLine(words.usage.internal(detail))}\n`);
    return 1;
  }
}
