/**
 * A problem with the command line or the input file that stops the whole run (as opposed to a
 * per-series engine error, which is reported in that series' `error` field). main.ts prints the
 * message to standard error and exits with status 1.
 */
export class CliError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "CliError";
  }
}
