/**
 * Reading candidate species text, once per distinct text, and placing the reading at the spot in
 * the document where the text was found.
 */
import type { ReadResult, SpeciesNotation, SpeciesReading } from "../chemistry/types";
import { readSpecies } from "../chemistry/reader/readSpecies";
import type { Reaction } from "./reactions/reactionTypes";
import type { SpeciesOccurrence, UnreadableSpecies } from "./types";

/** Reads one whole species string; the document code only ever asks through this. */
export type SpeciesReader = (text: string) => ReadResult;

/** Documents repeat the same few species; past this many distinct texts the memo starts afresh. */
const MEMO_LIMIT = 20_000;

/** A reader that remembers its answers, so a table of 10,000 SF6 rows reads SF6 once. */
export function memoisedReader(read: SpeciesReader = readSpecies): SpeciesReader {
  const memo = new Map<string, ReadResult>();
  return (text) => {
    const known = memo.get(text);
    if (known) return known;
    let result: ReadResult;
    try {
      result = read(text);
    } catch {
      // The reader promises not to throw; a document must survive even if it does.
      result = { ok: false, problem: { code: "malformed-formula", message: `Could not read "${text}".` } };
    }
    if (memo.size >= MEMO_LIMIT) memo.clear();
    memo.set(text, result);
    return result;
  };
}

/** An occurrence for `text` found at `start`, carrying `reading` moved to document offsets. */
export function occurrenceAt(
  reading: SpeciesReading,
  text: string,
  start: number,
  notation: SpeciesNotation = reading.notation,
): SpeciesOccurrence {
  const range = { start, end: start + text.length };
  return { range, text, reading: { ...reading, text, range, notation } };
}

/** An unreadable mention at `start`, its problem range moved to document offsets. */
export function unreadableAt(text: string, start: number, result: ReadResult & { ok: false }): UnreadableSpecies {
  const range = { start, end: start + text.length };
  const problem = result.problem.range
    ? { ...result.problem, range: { start: start + result.problem.range.start, end: start + result.problem.range.end } }
    : result.problem;
  return { range, text, problem };
}

/** Where a scanner puts what it finds. */
export interface ScanSink {
  readonly occurrences: SpeciesOccurrence[];
  readonly unreadable: UnreadableSpecies[];
  /** Where equations go, when the caller collects them. */
  readonly reactions?: Reaction[];
}

/**
 * A scan that pauses now and then (see `proseSteps`): each value is the offset the scan goes on
 * from, and nothing it adds to its sink afterwards starts before that offset.
 */
export type ScanSteps = Generator<number, void, void>;

export function emptySink(): ScanSink {
  return { occurrences: [], unreadable: [] };
}
