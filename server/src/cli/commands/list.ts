/**
 * `lonepair list [--json] <files or folders...>`: every species mention, in document order.
 * Exit 0 when every file was read, 2 on a usage or I/O error.
 */
import type { CliCommand, CliIo } from "../cliCommand";
import { EXIT_OK, EXIT_USAGE, parseCommandLine, usageError } from "../cliCommand";
import { speciesInFile } from "../documents/documentSpecies";
import { findDocuments, ioMessage } from "../../files/findDocuments";
import { jsonTerminalSafe, terminalSafe } from "../terminalText";

const HELP = `Usage: lonepair list [--json] <files or folders...>

Lists every species mentioned in the files (folders are searched as by \`lonepair check\`),
in document order: path:line:column, the text as written, the formula read and its charge.

Options:
  --json    print a JSON array of { file, line, column, length, text, formula, charge }
            (line and column 1-based; length and column in UTF-16 code units)
  --help    show this help

Exit status: 0 every file read, 2 usage or I/O error.
`;

export const listCommand: CliCommand = {
  name: "list",
  summary: "list every species mentioned in files or folders, in document order",
  help: HELP,
  run: runList,
};

async function runList(args: readonly string[], io: CliIo): Promise<number> {
  const parsed = parseCommandLine(listCommand, args, io, { json: { type: "boolean" } });
  if (parsed.exit !== undefined) return parsed.exit;
  if (parsed.positionals.length === 0) return usageError(listCommand, io, "give at least one file or folder.");
  const found = findDocuments(parsed.positionals);
  for (const unreadable of found.unreadable)
    io.writeError(`lonepair list: ${terminalSafe(unreadable.path)}: ${terminalSafe(unreadable.message)}\n`);
  for (const skipped of found.skipped) io.writeError(`lonepair list: ${terminalSafe(skipped.path)}: ${skipped.why}\n`);
  let failed = found.unreadable.length > 0;
  const json = parsed.values.json === true;
  let written = 0;
  for (const file of found.files) {
    try {
      for await (const batch of speciesInFile(file)) {
        if (batch.length === 0) continue;
        if (json) {
          const items = batch.map(
            (species) =>
              `  ${JSON.stringify({
                file: species.file,
                line: species.line,
                column: species.column,
                length: species.length,
                text: species.text,
                formula: species.occurrence.reading.formula,
                charge: species.occurrence.reading.charge,
              })}`,
          );
          io.writeOut(jsonTerminalSafe(`${written === 0 ? "[\n" : ",\n"}${items.join(",\n")}`));
        } else {
          io.writeOut(
            batch
              .map(
                (species) =>
                  terminalSafe(
                    `${species.file}:${species.line}:${species.column}: ${species.text} (${describe(species.occurrence.reading)})`,
                  ) + "\n",
              )
              .join(""),
          );
        }
        written += batch.length;
        await io.outputDrained?.();
      }
    } catch (error) {
      io.writeError(`lonepair list: ${terminalSafe(file.displayPath)}: ${terminalSafe(ioMessage(error))}\n`);
      failed = true;
    }
  }
  if (json) io.writeOut(written === 0 ? "[]\n" : "\n]\n");
  return failed ? EXIT_USAGE : EXIT_OK;
}

function describe(reading: { formula: string; charge: number }): string {
  const charge = reading.charge === 0 ? "neutral" : `charge ${reading.charge > 0 ? "+" : ""}${reading.charge}`;
  return `${reading.formula}, ${charge}`;
}
