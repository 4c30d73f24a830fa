import type { CliWords } from './messages/cli-messages.ts';
import { UsageError } from './usage-error.ts';

/** What a flag takes: a value (with an example for messages) or nothing. */
export interface FlagSpec {
  readonly takesValue: boolean;
  readonly example?: string;
}

/** Flags by name (without the leading dashes' prefix: "--rr"), and positional arguments. */
export interface ParsedArgs {
  readonly flags: ReadonlyMap<string, string | true>;
  readonly positionals: readonly string[];
}

/**
 * Split command-line arguments into flags and positionals. Unlike `util.parseArgs`, a value
 * that starts with a dash is taken as the flag's value (`--arr -2%`, `--ci -0.05,0.25`),
 * and `--flag=value` works too.
 *
 * @throws UsageError for unknown, repeated or incomplete flags, worded in `words`
 */
export function parseArgs(args: readonly string[], specs: Readonly<Record<string, FlagSpec>>, words: CliWords): ParsedArgs {
  const flags = new Map<string, string | true>();
  const positionals: string[] = [];
  for (let index = 0; index < args.length; index += 1) {
    const token = args[index] ?? '';
    if (!token.startsWith('--') || token === '--') {
      positionals.push(token);
      continue;
    }
    const equals = token.indexOf('=');
    const name = equals === -1 ? token : token.slice(0, equals);
    const spec = specs[name];
    if (spec === undefined) throw new UsageError(words.usage.unknownFlag(name));
    if (flags.has(name)) throw new UsageError(words.usage.repeatedFlag(name));
    if (!spec.takesValue) {
      if (equals !== -1) throw new UsageError(words.usage.flagTakesNoValue(name));
      flags.set(name, true);
      continue;
    }
    let value: string | undefined;
    if (equals !== -1) value = token.slice(equals + 1);
    else {
      value = args[index + 1];
      index += 1;
    }
    if (
      value === undefined ||
      value.trim() === '' ||
      (value.startsWith('--') && specs[value.split('=')[0] ?? ''] !== undefined)
    ) {
      throw new UsageError(words.usage.missingValue(name, spec.example ?? 'VALUE'));
    }
    flags.set(name, value);
  }
  return { flags, positionals };
}

/** The string value of a flag, or undefined when absent. */
export function valueOf(parsed: ParsedArgs, name: string): string | undefined {
  const value = parsed.flags.get(name);
  return typeof value === 'string' ? value : undefined;
}
