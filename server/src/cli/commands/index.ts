/**
 * Every subcommand, in the order the help lists them. To add one, write
 * `commands/<name>.ts` exporting a `CliCommand` and add it here.
 */
import type { CliCommand } from "../cliCommand";
import { analyzeCommand } from "./analyze";
import { balanceCommand } from "./balance";
import { checkCommand } from "./check";
import { coordsCommand } from "./coords";
import { drawCommand } from "./draw";
import { listCommand } from "./list";
import { tableCommand } from "./table";

export const COMMANDS: readonly CliCommand[] = [
  analyzeCommand,
  balanceCommand,
  checkCommand,
  listCommand,
  tableCommand,
  coordsCommand,
  drawCommand,
];

/** The command with this name, if there is one. */
export function findCommand(name: string): CliCommand | undefined {
  return COMMANDS.find((command) => command.name === name);
}
