/**
 * `lonepair table [--format md|csv] <files, folders or species...>`: the geometry summary table
 * of the species in the files and of species given by name or formula, each species once, in
 * order of first appearance. Exit 0 when the table has a row, 1 when no species could be
 * analysed, 2 on a usage or I/O error.
 */
import { statSync } from "node:fs";
import {
  MODEL_CAUTION,
  OPTIONAL_SUMMARY_COLUMNS,
  SUMMARY_COLUMNS,
  analyzeTyped,
  createSummaryCollector,
  isSummaryColumn,
  summaryTable,
  type SummaryColumn,
} from "../../../../shared/src/index";
import type { CliCommand, CliIo } from "../cliCommand";
import { EXIT_FAILURE, EXIT_OK, EXIT_USAGE, parseCommandLine, usageError } from "../cliCommand";
import { speciesInFile } from "../documents/documentSpecies";
import { findDocuments, ioMessage } from "../../files/findDocuments";
import { terminalSafe, terminalSafeLines } from "../terminalText";

const HELP = `Usage: lonepair table [--format md|csv] [--columns <list>] <files, folders or species...>

Prints the geometry summary table (formula, name, valence electrons, AXE class, electron and
molecular geometry, ideal angles, hybridization, polarity) of every species in the files, and
of each other argument read as a species (SF4, "NH4+", "sulfur tetrafluoride"). Each species
appears once, in order of first appearance; species that cannot be analysed are listed under
a markdown table (on stderr with --format csv).

Options:
  --format <md|csv>  markdown table (default) or CSV
  --columns <list>   the columns to show, comma-separated, in order: formula, name,
                     valenceElectrons, axe, electronGeometry, molecularGeometry, idealAngles,
                     hybridization, polarity (the default set), and irBands and ramanBands (the
                     IR and Raman bands expected from the symmetry of the model)
  --help             show this help

Exit status: 0 a table with at least one row, 1 no species could be analysed, 2 usage or I/O error.
`;

/** Bond angles in the table: one decimal, as the editor shows them by default. */
const ANGLE_DECIMALS = 1;

export const tableCommand: CliCommand = {
  name: "table",
  summary: "geometry summary table of the species in files or given as arguments",
  help: HELP,
  run: runTable,
};

async function runTable(args: readonly string[], io: CliIo): Promise<number> {
  const parsed = parseCommandLine(tableCommand, args, io, { format: { type: "string" }, columns: { type: "string" } });
  if (parsed.exit !== undefined) return parsed.exit;
  const columns = parsed.values.columns === undefined ? undefined : parsed.values.columns.split(",").map((column) => column.trim());
  const unknown = columns?.find((column) => !isSummaryColumn(column));
  if (unknown !== undefined) {
    return usageError(
      tableCommand,
      io,
      `unknown column '${unknown}' (use ${[...SUMMARY_COLUMNS, ...OPTIONAL_SUMMARY_COLUMNS].join(", ")})`,
    );
  }
  const requested = parsed.values.format ?? "md";
  if (!["md", "markdown", "csv"].includes(requested)) return usageError(tableCommand, io, `unknown format '${requested}' (use md or csv)`);
  if (parsed.positionals.length === 0) return usageError(tableCommand, io, "give at least one file, folder or species");

  const collected = createSummaryCollector();
  let failed = false;
  for (const argument of parsed.positionals) {
    if (!isOnDisk(argument)) {
      collected.addResult(argument, analyzeTyped(argument));
      continue;
    }
    const found = findDocuments([argument]);
    for (const unreadable of found.unreadable)
      io.writeError(`lonepair table: ${terminalSafe(unreadable.path)}: ${terminalSafe(unreadable.message)}\n`);
    failed ||= found.unreadable.length > 0;
    for (const file of found.files) {
      try {
        for await (const batch of speciesInFile(file)) for (const species of batch) collected.addOccurrence(species.occurrence);
      } catch (error) {
        io.writeError(`lonepair table: ${terminalSafe(file.displayPath)}: ${terminalSafe(ioMessage(error))}\n`);
        failed = true;
      }
    }
  }

  const format = requested === "csv" ? "csv" : "markdown";
  const analyses = collected.analyses;
  if (analyses.length > 0) {
    io.writeOut(
      terminalSafeLines(
        summaryTable({
          analyses,
          unanalysed: collected.unanalysed,
          format,
          angleDecimals: ANGLE_DECIMALS,
          columns: columns as SummaryColumn[] | undefined,
        }),
      ),
    );
  }
  if (format === "csv" || analyses.length === 0) {
    for (const item of collected.unanalysed)
      io.writeError(`lonepair table: not analysed: ${terminalSafe(item.text)}: ${terminalSafe(item.message)}\n`);
    if (analyses.length > 0) io.writeError(`${MODEL_CAUTION}\n`);
  }
  if (failed) return EXIT_USAGE;
  return analyses.length > 0 ? EXIT_OK : EXIT_FAILURE;
}

function isOnDisk(argument: string): boolean {
  try {
    statSync(argument);
    return true;
  } catch {
    return false;
  }
}
