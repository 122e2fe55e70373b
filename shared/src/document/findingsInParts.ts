/**
 * A document's findings handed out a part at a time, so that a document with millions of them
 * never holds them all: markdown and plain text are scanned in steps, and each part is checked as
 * soon as the scan has moved past it. Joined, the parts are exactly the findings of the whole
 * document, `[...model.problems, ...checkDocument(model)]`, in the same order.
 */
import { analyzeDocument, distinctReactions, documentUnreadable, inDocumentOrder, type AnalyzeOptions } from "./analyzeDocument";
import type { Reaction } from "./reactions/reactionTypes";
import { documentChecker } from "./checkDocument";
import { markdownSteps } from "./scanMarkdown";
import { plainTextSteps } from "./scanPlainText";
import { isTextMarkup } from "./documentKind";
import { memoisedReader, type ScanSteps, type SpeciesReader } from "./speciesReader";
import type { RecordSink } from "./tables/records";
import type { DocumentKind, Finding, SpeciesOccurrence, TableRecord, UnreadableSpecies } from "./types";

/** How to read a document in parts. */
export interface FindingPartsOptions extends AnalyzeOptions {
  readonly read?: SpeciesReader;
  /**
   * Species mentions gathered before a part is checked and handed out (default 4,096). A part
   * holds about as many findings at most; tables, JSON and YAML come as one part.
   */
  readonly partSize?: number;
}

/** Mentions per part unless the caller says otherwise. */
export const DEFAULT_PART_SIZE = 4096;

/**
 * The findings of `text` read as a document of `kind`, in parts in document order; empty parts
 * are skipped. The consumer may stop early: nothing past what it took is worked out.
 */
export function* findingsInParts(
  text: string,
  kind: DocumentKind,
  options: FindingPartsOptions = {},
): Generator<readonly Finding[], void, void> {
  const read = options.read ?? memoisedReader();
  const check = documentChecker();
  if (kind !== "markdown" && !isTextMarkup(kind)) {
    const model = analyzeDocument(text, kind, read, options);
    const found = [...model.problems, ...check(model)];
    if (found.length > 0) yield found;
    return;
  }
  const sink: RecordSink = { occurrences: [], unreadable: [], records: [], reactions: [] };
  const partSize = Math.max(1, options.partSize ?? DEFAULT_PART_SIZE);
  const steps: ScanSteps =
    kind === "markdown" ? markdownSteps(text, read, sink, partSize) : plainTextSteps(text, read, sink, partSize, kind);
  const partBefore = (limit: number): Finding[] =>
    check({
      kind,
      occurrences: inDocumentOrder(takeBefore(sink.occurrences, limit)),
      records: takeBefore(sink.records, limit, (record) => record.species.range.start),
      problems: [],
      unreadable: takeBefore(sink.unreadable, limit).sort((a, b) => a.range.start - b.range.start),
      reactions: distinctReactions(takeBefore(sink.reactions ?? [], limit)),
    });
  let problem: Finding | undefined;
  try {
    for (const resumeAt of steps) {
      const part = partBefore(resumeAt);
      if (part.length > 0) yield part;
    }
  } catch (error) {
    // Every scanner is written not to throw; as for the whole document, what was found still counts.
    problem = documentUnreadable(error);
  }
  const rest = partBefore(Infinity);
  if (problem) rest.unshift(problem);
  if (rest.length > 0) yield rest;
}

/**
 * Removes from `items` and returns those that start before `limit`. Scanners add in document
 * order, so this is almost always the whole list.
 */
function takeBefore<T extends SpeciesOccurrence | UnreadableSpecies | TableRecord | Reaction>(
  items: T[],
  limit: number,
  startOf: (item: T) => number = (item) => (item as SpeciesOccurrence).range.start,
): T[] {
  if (items.every((item) => startOf(item) < limit)) return items.splice(0, items.length);
  const taken = items.filter((item) => startOf(item) < limit);
  let kept = 0;
  for (const item of items) if (startOf(item) >= limit) items[kept++] = item;
  items.length = kept;
  return taken;
}
