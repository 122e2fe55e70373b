/**
 * The command line without the process: takes arguments and an output sink, returns an exit
 * code. `main.ts` wires it to the real process.
 */
import { version } from "../../../package.json";
import type { CliIo } from "./cliCommand";
import { EXIT_FAILURE, EXIT_OK, EXIT_USAGE } from "./cliCommand";
import { COMMANDS, findCommand } from "./commands/index";
import { MODEL_CAUTION } from "../../../shared/src/index";

function topLevelHelp(): string {
  const width = Math.max(...COMMANDS.map((command) => command.name.length)) + 2;
  const commandLines = COMMANDS.map((command) => `  ${command.name.padEnd(width)}${command.summary}`);
  return [
    "Usage: lonepair <command> [options] [arguments]",
    "",
    "Lewis structures and VSEPR shapes for the chemical species in lab notes and data tables.",
    "",
    "Commands:",
    ...commandLines,
    "",
    "Options:",
    "  --help     show this help (or `lonepair <command> --help` for one command)",
    "  --version  print the version",
    "",
    MODEL_CAUTION,
    "",
  ].join("\n");
}

/** Runs one invocation; never throws. */
export async function runCli(args: readonly string[], io: CliIo): Promise<number> {
  const [first, ...rest] = args;
  if (first === undefined) {
    io.writeError(topLevelHelp());
    return EXIT_USAGE;
  }
  if (first === "--help" || first === "-h" || first === "help") {
    io.writeOut(topLevelHelp());
    return EXIT_OK;
  }
  if (first === "--version" || first === "-v") {
    io.writeOut(`${version}\n`);
    return EXIT_OK;
  }
  const command = findCommand(first);
  if (command === undefined) {
    const what = first.startsWith("-") ? `unknown option '${first}'` : `unknown command '${first}'`;
    io.writeError(`lonepair: ${what}\n\n${topLevelHelp()}`);
    return EXIT_USAGE;
  }
  try {
    return await command.run(rest, io);
  } catch (error) {
    // A bug in the core must not look like a crash with a stack trace to a chemist.
    io.writeError(`lonepair ${command.name}: internal error: ${(error as Error).message ?? String(error)}\n`);
    return EXIT_FAILURE;
  }
}
