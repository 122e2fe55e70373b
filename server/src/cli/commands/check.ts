/**
 * `lonepair check [options] <files or folders...>`: every finding the editor would show, for CI.
 * Exit 0 clean, 1 errors found (or warnings with --strict), 2 usage or I/O error.
 */
import { version } from "../../../../package.json";
import { NOTES_SHOWN_AS, isNotesShownAs } from "../../../../shared/src/index";
import { checkFile } from "../check/checkFile";
import type { CheckReporter } from "../check/checkReporter";
import { emptySummary, fixedLine, summaryLine } from "../check/checkSummary";
import { jsonReporter } from "../check/jsonReporter";
import { progressIndicator, wantsProgress } from "../check/progressIndicator";
import { sarifReporter } from "../check/sarifReporter";
import { removeOnSignals, temporaryFiles } from "../check/temporaryFiles";
import { textReporter } from "../check/textReporter";
import type { CliCommand, CliIo } from "../cliCommand";
import { EXIT_FAILURE, EXIT_OK, EXIT_USAGE, parseCommandLine, usageError } from "../cliCommand";
import { findDocuments, ioMessage } from "../../files/findDocuments";
import { terminalSafe, terminalSafeLines } from "../terminalText";

const HELP = `Usage: lonepair check [options] <files or folders...>

Finds the markdown, text, LaTeX, AsciiDoc, reStructuredText, CSV/TSV, JSON and YAML files
given (folders are searched; inside a git work tree, files that git ignores are left out) and
reports every finding the editor shows: species that cannot be analysed, radicals, and table
cells that disagree with the VSEPR model.

Options:
  --format <text|json|sarif>  output format (default text: path:line:column: severity: message [code])
  --strict                    warnings fail the check too (exit status 1)
  --notes <information|hint|off>
                              report notes (species outside what VSEPR is meant for, radicals,
                              names not known) as they are (default), as hints, or not at all;
                              the editor's setting lonepair.diagnostics.notesAs does the same
  --fix                       apply the fixes the editor offers, writing each changed file atomically
                              (through symbolic links to their targets; mode, owner, group and
                              hard links kept; a file changed meanwhile is left alone)
  --dry-run                   with --fix: print the fixes as a unified diff, change no file
  --help                      show this help

Exit status: 0 no errors, 1 errors found (or warnings with --strict), 2 usage error, or a file
that could not be read or fixed (each is named on stderr).
Lines and columns are 1-based; columns count UTF-16 code units.
`;

const FORMATS = ["text", "json", "sarif"] as const;
type Format = (typeof FORMATS)[number];

export const checkCommand: CliCommand = {
  name: "check",
  summary: "check files or folders for species and table values that disagree with the model",
  help: HELP,
  run: runCheck,
};

async function runCheck(args: readonly string[], io: CliIo): Promise<number> {
  const parsed = parseCommandLine(checkCommand, args, io, {
    format: { type: "string" },
    strict: { type: "boolean" },
    notes: { type: "string" },
    fix: { type: "boolean" },
    "dry-run": { type: "boolean" },
  });
  if (parsed.exit !== undefined) return parsed.exit;
  const { values, positionals } = parsed;
  const format = (values.format ?? "text") as Format;
  if (!FORMATS.includes(format)) return usageError(checkCommand, io, `unknown format '${values.format}' (use text, json or sarif)`);
  const notesAs = values.notes ?? "information";
  if (!isNotesShownAs(notesAs))
    return usageError(checkCommand, io, `unknown --notes '${terminalSafe(values.notes ?? "")}' (use ${NOTES_SHOWN_AS.join(", ")})`);
  if (values["dry-run"] && !values.fix) return usageError(checkCommand, io, "--dry-run goes with --fix");
  if (positionals.length === 0) return usageError(checkCommand, io, "give at least one file or folder");

  const found = findDocuments(positionals);
  for (const unreadable of found.unreadable)
    io.writeError(`lonepair check: ${terminalSafe(unreadable.path)}: ${terminalSafe(unreadable.message)}\n`);
  for (const skipped of found.skipped) io.writeError(`lonepair check: ${terminalSafe(skipped.path)}: ${skipped.why}\n`);

  const fixing = values.fix === true;
  const dryRun = values["dry-run"] === true;
  const reporter = reporterFor(format, io, dryRun);
  const summary = emptySummary();
  summary.unreadable = found.unreadable.length;
  const temporaries = temporaryFiles();
  const stopCleaning = fixing && !dryRun ? removeOnSignals(temporaries) : () => undefined;
  const totalBytes = found.files.reduce((total, file) => total + file.size, 0);
  const progress = progressIndicator(
    wantsProgress(process.stderr.isTTY === true, process.env, totalBytes, found.files.length),
    io.writeError,
    "lonepair check",
  );
  let bytesBefore = 0;
  try {
    for (const file of found.files) {
      try {
        await checkFile(
          file,
          { fix: fixing, dryRun, temporaries, notesAs },
          {
            reporter,
            summary,
            // A diff piped on is data for patch and must keep the file's bytes; a terminal sees them escaped.
            writeDiff: process.stdout.isTTY === true ? (text) => io.writeOut(terminalSafeLines(text)) : io.writeOut,
            progress: (done) => progress.update(bytesBefore + done, totalBytes, terminalSafe(file.displayPath)),
            note: (message) => io.writeError(`lonepair check: ${terminalSafe(message)}\n`),
            drain: io.outputDrained,
          },
        );
      } catch (error) {
        progress.finish();
        io.writeError(`lonepair check: ${terminalSafe(file.displayPath)}: ${terminalSafe(ioMessage(error))}\n`);
        summary.unreadable++;
      }
      bytesBefore += file.size;
    }
  } finally {
    stopCleaning();
  }
  progress.finish();
  reporter.end(summary, fixing);
  if (fixing && !dryRun && format !== "text") io.writeError(`${fixedLine(summary, dryRun)}\n`);

  if (summary.unreadable > 0) return EXIT_USAGE;
  const failed = summary.errors > 0 || (values.strict === true && summary.warnings > 0);
  return failed ? EXIT_FAILURE : EXIT_OK;
}

/**
 * The reporter for `format`. A dry run prints the diff on stdout, so it reports only counts, on
 * stderr, whatever the format.
 */
function reporterFor(format: Format, io: CliIo, dryRun: boolean): CheckReporter {
  if (dryRun) {
    return {
      findings: () => undefined,
      end: (summary) => io.writeError(`${fixedLine(summary, true)}\nAfter the fixes: ${summaryLine(summary)}\n`),
    };
  }
  if (format === "json") return jsonReporter(io.writeOut);
  if (format === "sarif") return sarifReporter(io.writeOut, version);
  return textReporter(io.writeOut, io.colour);
}
