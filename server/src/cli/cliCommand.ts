/**
 * What every command-line subcommand looks like. Each lives in its own file under
 * `commands/` and is listed once in `commands/index.ts`.
 */

/** Where a command writes, and how; passed in so commands stay testable without a terminal. */
export interface CliIo {
  readonly writeOut: (text: string) => void;
  readonly writeError: (text: string) => void;
  /**
   * Resolves once stdout has taken what was written (at once when nothing is backed up, or when
   * the reader has gone), so a huge report does not pile up in memory.
   */
  readonly outputDrained?: () => Promise<void>;
  /** Decided once by the entry point (stdout is a terminal and NO_COLOR is unset). */
  readonly colour: boolean;
}

/** Exit codes shared by every subcommand. */
export const EXIT_OK = 0;
/** Something the user asked about failed (a species was not analysed, a check found errors). */
export const EXIT_FAILURE = 1;
/** The command line itself was wrong: unknown command or option, missing argument. */
export const EXIT_USAGE = 2;

/** A subcommand such as `analyze`. */
export interface CliCommand {
  readonly name: string;
  /** One line for the top-level help. */
  readonly summary: string;
  /** Full help for `lonepair <name> --help`, ending in a newline. */
  readonly help: string;
  /** Runs with the arguments after the command name; resolves to an exit code. */
  readonly run: (args: readonly string[], io: CliIo) => number | Promise<number>;
}
