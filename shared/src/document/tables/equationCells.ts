/**
 * Values under a header or key that means "reaction" or "equation" (a CSV/TSV column, a JSON or
 * YAML key): each is read as one equation, as a markdown table's equation cell is, and scanned for
 * species as prose, so its species keep their own findings. Other cells are not touched.
 */
import type { TextRange } from "../../chemistry/types";
import { readWholeEquation } from "../reactions/readEquation";
import { scanProse } from "../scanProse";
import type { ScanSink, SpeciesReader } from "../speciesReader";

/** Longest value read as an equation: longer ones are notes, not one written equation. */
const MAX_EQUATION_CELL = 600;

/**
 * Reads the value `value`, written at `range` of `text`, as an equation cell. A value whose
 * written text differs from it (escapes, a folded line) is left alone: its offsets would not map.
 */
export function readEquationCell(text: string, range: TextRange, value: string, read: SpeciesReader, sink: ScanSink): void {
  const length = range.end - range.start;
  if (length === 0 || length > MAX_EQUATION_CELL || length !== value.length || text.slice(range.start, range.end) !== value) return;
  if (sink.reactions) {
    const reaction = readWholeEquation(text, range.start, range.end, "table", read);
    // Pushed before the prose scan, which may read the same arrow again: the first reading is kept.
    if (reaction) sink.reactions.push(reaction);
  }
  scanProse(text, range.start, range.end, sink, read);
}
