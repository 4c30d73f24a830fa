import { describeProblem } from '../core/messages/describe.ts';
import { english } from '../core/messages/en/index.ts';
import { InputError } from '../core/problems.ts';
import type { CommandIo, CommandOutput } from './command-output.ts';
import { runCompute } from './compute-command.ts';
import { flagForField } from './flag-for-field.ts';
import { HELP_TEXT } from './help-text.ts';
import { UsageError } from './usage-error.ts';

const words = english.cli;

type Command = (args: readonly string[]) => CommandOutput | Promise<CommandOutput>;

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
 * stderr, nothing on stdout), 1 for any other failure.
 */
export async function main(args: readonly string[], io: CommandIo): Promise<number> {
  const [name, ...rest] = args;
  if (name === undefined || name === '--help' || name === '-h' || name === 'help') {
    if (name === undefined) {
      io.stderr(`${words.noCommand()}\n`);
      return 2;
    }
    io.stdout(HELP_TEXT);
    return 0;
  }
  const load = COMMANDS[name];
  if (load === undefined) {
    io.stderr(`${words.unknownCommand(name)}\n`);
    return 2;
  }
  if (rest.includes('--help')) {
    io.stdout(HELP_TEXT);
    return 0;
  }
  try {
    const command = await load();
    const output = await command(rest);
    io.stdout(output.stdout);
    if (output.stderr !== undefined && output.stderr !== '') io.stderr(output.stderr);
    return output.exitCode ?? 0;
  } catch (error) {
    if (error instanceof InputError) {
      const flag = flagForField(error.problem.field);
      const sentence = describeProblem(error.problem);
      io.stderr(`${oneLine(flag === null ? sentence : `${flag}: ${sentence}`)}\n`);
      return 2;
    }
    if (error instanceof UsageError) {
      io.stderr(`${oneLine(error.message)}\n`);
      return 2;
    }
    const detail = error instanceof Error ? error.message : String(error);
    io.stderr(`${oneLine(words.internal(detail))}\n`);
    return 1;
  }
}
