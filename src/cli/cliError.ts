/** A bad input: the CLI prints the message on one line to stderr and exits 2. */
export class CliError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "CliError";
  }
}
