/**
 * Every subcommand, in the order the help lists them. To add one, write
 * `commands/<name>.ts` exporting a `CliCommand` and add it here.
 */
import type { CliCommand } from "../cliCommand";
import { analyzeCommand } from "./analyze";
import { coordsCommand } from "./coords";

export const COMMANDS: readonly CliCommand[] = [analyzeCommand, coordsCommand];

/** The command with this name, if there is one. */
export function findCommand(name: string): CliCommand | undefined {
  return COMMANDS.find((command) => command.name === name);
}
