/**
 * The core's reading of one batch: the document model and findings of the batch's own text,
 * with ranges as offsets into that text. What the prefix (the start of the document, read ahead
 * of the batch for its header) yields is dropped: it was reported with the first batch.
 */
import { analyzeDocument } from "../../../../shared/src/index";
import { checkDocument, findingsInParts } from "../../../../shared/src/index";
import type { SpeciesReader } from "../../../../shared/src/index";
import { checkDelimitedText, moved, type DelimitedRowMemo } from "../../../../shared/src/index";
import type { DocumentKind, DocumentModel, Finding, SpeciesOccurrence } from "../../../../shared/src/index";
import type { DocumentBatch } from "./documentBatches";

/** What one batch holds, in offsets local to `batch.text`. */
export interface BatchModel {
  readonly occurrences: readonly SpeciesOccurrence[];
  /** Problems of the text itself and the checks' findings, in document order. */
  findings(): Finding[];
  /**
   * The same findings a part at a time, in document order: a document with millions of them is
   * never held whole. A table batch comes as one part (a batch is small already).
   */
  findingParts(): Iterable<readonly Finding[]>;
}

/** What a file's batches share. */
export interface BatchContext {
  readonly read?: SpeciesReader;
  /** The findings of table rows seen before, for CSV and TSV. */
  readonly rows?: DelimitedRowMemo;
}

/** Analyses `batch` as part of a document of `kind`. */
export function batchModel(batch: DocumentBatch, kind: DocumentKind, context: BatchContext = {}): BatchModel {
  const shift = batch.prefix.length;
  const text = shift === 0 ? batch.text : batch.prefix + batch.text;
  let model: DocumentModel | undefined;
  const modelOf = (): DocumentModel => (model ??= analyzeDocument(text, kind, context.read, { delimiter: batch.delimiter }));
  const local = <T extends { range: { start: number; end: number } }>(item: T): T =>
    shift === 0 ? item : { ...item, range: { start: item.range.start - shift, end: item.range.end - shift } };
  const own = (item: { range: { start: number } }): boolean => item.range.start >= shift;
  let occurrences: readonly SpeciesOccurrence[] | undefined;
  return {
    // Worked out only when asked: checking a file needs the findings alone.
    get occurrences() {
      return (occurrences ??= modelOf()
        .occurrences.filter(own)
        .map((occurrence) => local(occurrence)));
    },
    findings() {
      if (kind === "csv" || kind === "tsv") return delimitedFindings();
      const current = modelOf();
      return inDocumentOrder([...current.problems, ...checkDocument(current)]);
    },
    *findingParts() {
      if (kind === "csv" || kind === "tsv") {
        yield delimitedFindings();
        return;
      }
      // Markdown and plain text come in parts that follow one another through the text, so
      // sorting each part sorts the whole.
      for (const part of findingsInParts(text, kind, { read: context.read, delimiter: batch.delimiter })) yield inDocumentOrder(part);
    },
  };

  function delimitedFindings(): Finding[] {
    // Rows are checked once per distinct content; the result is the same as the whole reading's.
    const found = checkDelimitedText(text, kind as "csv" | "tsv", {
      delimiter: batch.delimiter,
      from: shift,
      memo: context.rows,
      read: context.read,
    });
    return shift === 0 ? found : found.map((finding) => moved(finding, -shift));
  }

  /** Own findings only, in offsets of the batch's text, in document order. */
  function inDocumentOrder(findings: readonly Finding[]): Finding[] {
    const local = findings.filter(own).map((finding) => moved(finding, -shift));
    // Problems of the text and the checks' findings come in two lists; report them in document order.
    return local.sort((a, b) => a.range.start - b.range.start || a.range.end - b.range.end);
  }
}
