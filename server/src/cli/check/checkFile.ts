/**
 * Checks one file batch by batch: reports its findings and, with fixing on, applies the fixes
 * (written atomically, or shown as a diff in a dry run). Findings that remain after fixing are
 * placed in the fixed text.
 */
import { editsOfFix, memoisedReader, movedFix } from "../../../../shared/src/index";
import { delimitedRowMemo } from "../../../../shared/src/index";
import { shownFindings, type Finding, type NotesShownAs } from "../../../../shared/src/index";
import { batchModel } from "../documents/batchModel";
import { readDocument, type DocumentBatch, type ResumeAt } from "../documents/documentBatches";
import type { DocumentFile } from "../../files/findDocuments";
import { lineIndexOf, type LineIndex } from "../documents/lineIndex";
import { checkDelimitedBytes } from "./checkDelimitedBytes";
import type { CheckReporter } from "./checkReporter";
import { countFinding, type CheckSummary } from "./checkSummary";
import { applyFixes, chooseFixes, fixedOffsets } from "./chooseFixes";
import { fixedFileWriter } from "./fixedFileWriter";
import { locateFinding } from "./locatedFinding";
import { temporaryFiles, type TemporaryFiles } from "./temporaryFiles";
import { terminalSafe } from "../terminalText";
import { diffHeader, diffHunks } from "./unifiedDiff";

/** How to check. */
export interface CheckOptions {
  readonly fix: boolean;
  readonly dryRun: boolean;
  readonly batchCharacters?: number;
  /** Reads tables in batches only, never as bytes (for tests comparing the two readings). */
  readonly ordinaryReading?: boolean;
  /** Bytes of table rows held at a time when reading as bytes (tests make it small). */
  readonly rowBufferBytes?: number;
  /** Where fixing lists its temporary files, so that a signal can remove them. */
  readonly temporaries?: TemporaryFiles;
  /** What notes are shown as (default: as they are); fixes are applied whatever it says, as the editor offers them. */
  readonly notesAs?: NotesShownAs;
}

/** Findings handed to the reporter at a time: a document with millions never makes one huge string. */
const REPORT_CHUNK = 4096;

/** Where a file's results go. */
export interface CheckOutputs {
  readonly reporter: CheckReporter;
  readonly summary: CheckSummary;
  /** The unified diff of a dry run. */
  readonly writeDiff: (text: string) => void;
  /** Bytes of the file read so far, for the progress indicator. */
  readonly progress: (bytesDone: number) => void;
  /** A note about this file that is not a finding (not fixed because ...). */
  readonly note: (message: string) => void;
  /** Waits while the output is backed up, so a huge report does not pile up in memory. */
  readonly drain?: () => Promise<void>;
}

/** Checks `file`; I/O errors are thrown for the caller to report. */
export async function checkFile(file: DocumentFile, options: CheckOptions, outputs: CheckOutputs): Promise<void> {
  const context = { read: memoisedReader(), rows: delimitedRowMemo() };
  let foundHere = 0;
  let resume: ResumeAt | undefined;
  const utf8 = (file.encoding ?? "utf-8") === "utf-8";
  if (!options.fix && !options.ordinaryReading && utf8 && (file.kind === "csv" || file.kind === "tsv")) {
    // Without fixing, a table is read as bytes as far as that goes; the batches read on from there.
    const quick = await checkDelimitedBytes(file, outputs, { ...context, bufferBytes: options.rowBufferBytes, notesAs: options.notesAs });
    foundHere = quick.found;
    if (!quick.resume) {
      finishFile(outputs, foundHere, false, 0);
      return;
    }
    if (quick.resume !== "start") resume = quick.resume;
  }
  const reading = readDocument(file.path, file.kind, options.batchCharacters, resume, file.encoding);
  const writer = options.fix && !options.dryRun ? await fixedFileWriter(file.path, options.temporaries ?? temporaryFiles()) : undefined;
  const notesAs = options.notesAs ?? "information";
  let fixing = options.fix;
  let fixedHere = 0;
  let lineShift = 0;
  let headerWritten = false;
  try {
    for await (const batch of reading.batches) {
      if (fixing && !reading.exactUtf8()) {
        // Writing decoded text back would change the bytes that are not UTF-8.
        fixing = false;
        await writer?.abort();
        outputs.note(
          utf8
            ? `${file.displayPath}: not fixed: the file is not valid UTF-8`
            : `${file.displayPath}: not fixed: the file is UTF-16, and fixes are written into UTF-8 files only`,
        );
      }
      const model = batchModel(batch, file.kind, context);
      if (!fixing) {
        // Findings go out as the core hands them over: millions of them are never held at once.
        for (const part of model.findingParts())
          foundHere += await report(outputs, file.displayPath, batch.lines, shownFindings(part, notesAs));
      } else {
        const findings = model.findings();
        const { fixed, remaining } = chooseFixes(batch.text, findings);
        // A fix of several edits (an equation's coefficients) is applied edit by edit.
        const fixes = fixed.flatMap((finding) => editsOfFix(finding.fix).map((edit) => ({ ...edit, title: finding.fix.title })));
        const fixedText = applyFixes(batch.text, fixes);
        if (options.dryRun && fixes.length > 0) {
          if (!headerWritten) outputs.writeDiff(diffHeader(terminalSafe(file.displayPath)));
          headerWritten = true;
          outputs.writeDiff(diffHunks(batch.text, batch.lines, fixes, lineShift).text);
        }
        await writer?.add(batch.byteOffset, batch.text, fixedText, fixes.length > 0);
        fixedHere += fixed.length;
        let lines: LineIndex = batch.lines;
        let reported: readonly Finding[] = remaining;
        if (fixes.length > 0) {
          const moved = movedLines(batch, fixedText, lineShift);
          lines = moved.lines;
          lineShift = moved.lineShift;
          const moveOffset = fixedOffsets(fixes);
          reported = remaining.map((finding) => movedFinding(finding, moveOffset));
        }
        foundHere += await report(outputs, file.displayPath, lines, shownFindings(reported, notesAs));
      }
      outputs.progress(batch.byteOffset + (utf8 ? Buffer.byteLength(batch.text) : 2 * batch.text.length));
      await outputs.drain?.();
    }
    if (writer) await writer.finish();
  } catch (error) {
    await writer?.abort();
    throw error;
  }
  finishFile(outputs, foundHere, fixing, fixedHere);
}

/** Counts and reports `findings`, a chunk at a time, waiting while the output is backed up. */
async function report(outputs: CheckOutputs, displayPath: string, lines: LineIndex, findings: readonly Finding[]): Promise<number> {
  for (let start = 0; start < findings.length; start += REPORT_CHUNK) {
    const chunk = findings.length <= REPORT_CHUNK ? findings : findings.slice(start, start + REPORT_CHUNK);
    for (const finding of chunk) countFinding(outputs.summary, finding.severity);
    outputs.reporter.findings(chunk.map((finding) => locateFinding(displayPath, lines, finding)));
    await outputs.drain?.();
  }
  return findings.length;
}

function finishFile(outputs: CheckOutputs, found: number, fixing: boolean, fixed: number): void {
  outputs.summary.filesChecked++;
  if (found > 0) outputs.summary.filesWithFindings++;
  if (fixing && fixed > 0) {
    outputs.summary.fixedFindings += fixed;
    outputs.summary.fixedFiles++;
  }
}

/** Lines of the fixed text, numbered as the fixed file numbers them. */
function movedLines(batch: DocumentBatch, fixedText: string, lineShift: number): { lines: LineIndex; lineShift: number } {
  const firstLine = batch.lines.position(0).line - 1 + lineShift;
  const lines = lineIndexOf(fixedText, firstLine, batch.offset === 0);
  return { lines, lineShift: lineShift + lines.lineBreaks - batch.lines.lineBreaks };
}

function movedFinding(finding: Finding, moved: (offset: number) => number): Finding {
  const range = { start: moved(finding.range.start), end: moved(finding.range.end) };
  const fixed = finding.fix ? { ...finding, range, fix: movedFix(finding.fix, moved) } : { ...finding, range };
  return finding.choices ? { ...fixed, choices: finding.choices.map((choice) => movedFix(choice, moved)) } : fixed;
}
