/**
 * What every command-line subcommand looks like. Each lives in its own file under
 * `commands/` and is listed once in `commands/index.ts`.
 */
import { parseArgs, type ParseArgsConfig } from "node:util";

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

/** What a command needs to report a usage error: its name and its help. */
export interface CommandIdentity {
  readonly name: string;
  readonly help: string;
}

/** Prints "lonepair <name>: <message>" and the command's help to stderr; answers the usage exit code. */
export function usageError(command: CommandIdentity, io: CliIo, message: string): number {
  io.writeError(`lonepair ${command.name}: ${message}\n\n${command.help}`);
  return EXIT_USAGE;
}

/**
 * The one way every subcommand reads its arguments: strict options plus `--help`, positionals
 * allowed. Answers the parsed values, or the exit code when the command is already done (help
 * printed, or a usage error reported).
 */
export function parseCommandLine<const Options extends OptionTypes>(
  command: CommandIdentity,
  args: readonly string[],
  io: CliIo,
  options: Options,
): ParsedCommandLine<Options> {
  let parsed;
  try {
    const withHelp: NonNullable<ParseArgsConfig["options"]> = { ...options, help: { type: "boolean" } };
    parsed = parseArgs({ args: [...args], options: withHelp, allowPositionals: true, strict: true });
  } catch (error) {
    return { exit: usageError(command, io, (error as Error).message) };
  }
  if (parsed.values.help) {
    io.writeOut(command.help);
    return { exit: EXIT_OK };
  }
  return { exit: undefined, values: parsed.values as OptionValues<Options>, positionals: parsed.positionals };
}

/** Options as `parseArgs` takes them: strings or switches, never repeated. */
type OptionTypes = Readonly<Record<string, { readonly type: "string" | "boolean" }>>;

/** The values of parsed options: text for string options, true for switches given. */
export type OptionValues<Options extends OptionTypes> = {
  readonly [Name in keyof Options]?: Options[Name]["type"] extends "string" ? string : boolean;
};

/** Parsed arguments, or the exit code of a command already done. */
export type ParsedCommandLine<Options extends OptionTypes> =
  { readonly exit: number } | { readonly exit: undefined; readonly values: OptionValues<Options>; readonly positionals: readonly string[] };
