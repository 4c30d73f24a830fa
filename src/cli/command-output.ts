/** What a command produced: text for stdout (files are written by the command itself). */
export interface CommandOutput {
  readonly stdout: string;
  /** Lines for stderr from a command that goes on past a refused part (a batch); none by default. */
  readonly stderr?: string;
  /** The exit status; 0 by default. */
  readonly exitCode?: number;
}

/** Where a command writes. */
export interface CommandIo {
  readonly stdout: (text: string) => void;
  readonly stderr: (text: string) => void;
}
