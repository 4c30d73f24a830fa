/** A command-line input the user must fix: exit status 2 with one line on stderr. */
export class UsageError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'UsageError';
  }
}
