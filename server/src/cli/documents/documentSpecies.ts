/**
 * Every species mention in a file, in document order, batch by batch, with the exact span as
 * written and its 1-based line and column.
 */
import { memoisedReader } from "../../../../shared/src/index";
import type { SpeciesOccurrence } from "../../../../shared/src/index";
import { batchModel } from "./batchModel";
import { readDocument } from "./documentBatches";
import type { DocumentFile } from "../../files/findDocuments";

/** One mention, placed in its file. */
export interface PlacedSpecies {
  readonly file: string;
  readonly line: number;
  readonly column: number;
  /** UTF-16 code units of the span as written. */
  readonly length: number;
  /** The span exactly as written in the file. */
  readonly text: string;
  readonly occurrence: SpeciesOccurrence;
}

/** The species of `file`, a batch at a time (I/O errors are thrown). */
export async function* speciesInFile(file: DocumentFile): AsyncGenerator<readonly PlacedSpecies[]> {
  const read = memoisedReader();
  for await (const batch of readDocument(file.path, file.kind, undefined, undefined, file.encoding).batches) {
    const { occurrences } = batchModel(batch, file.kind, { read });
    yield occurrences.map((occurrence) => {
      const { line, column } = batch.lines.position(occurrence.range.start);
      return {
        file: file.displayPath,
        line,
        column,
        length: occurrence.range.end - occurrence.range.start,
        text: batch.text.slice(occurrence.range.start, occurrence.range.end),
        occurrence,
      };
    });
  }
}
