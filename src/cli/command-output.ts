/** What a command produced: text for stdout (files are written by the command itself). */
export interface CommandOutput {
  readonly stdout: string;
}

/** Where a command writes. */
export interface CommandIo {
  readonly stdout: (text: string) => void;
  readonly stderr: (text: string) => void;
}
