/**
 * Analysis of a document that is edited again and again: each version is cut into segments
 * (runs of table rows, markdown blocks), and a segment whose text did not change keeps its
 * findings from the version before, moved to where it now lies. Only the segments an edit
 * touches are read again, through the same readers and checks as a whole-document analysis
 * (`analyzeDocument`, `checkDocument`, `checkDelimitedText`), so both give the same findings.
 *
 * Tables: segments are whole chunks of the chunked text (records never cross a segment's end);
 * each is read under the document's header, as the command line reads a file in batches, with
 * one row memo for the document. A changed header or delimiter reads every segment again.
 * Markdown: segments are the blocks of `markdownBlocks`, remembered by their text. Other kinds
 * (plain text, JSON, YAML) are read whole on every version.
 */
import { analysedTextOf, MAX_ANALYSED_LENGTH } from "./analysedText";
import { analyzeDocument, distinctReactions } from "./analyzeDocument";
import { shiftedReaction } from "./reactions/proseEquations";
import { checkDocument } from "./checkDocument";
import { findingsInParts } from "./findingsInParts";
import { sliceOf, wholeText, type ChunkedText, type TextChunk } from "./chunkedText";
import { markdownBlocks, scanMarkdownBlock, type MarkdownBlock } from "./scanMarkdown";
import { memoisedReader, type SpeciesReader } from "./speciesReader";
import { speciesAtOffset, type SpeciesAtOffset } from "./speciesAt";
import { delimitedRowExtent, sniffDelimiter } from "./tables/csv";
import { checkDelimitedText, delimitedRowMemo, findHeader, moved } from "./tables/delimitedFindings";
import type { RecordSink } from "./tables/records";
import type { DocumentKind, DocumentModel, Finding, SpeciesOccurrence, TableCell, TableRecord, UnreadableSpecies } from "./types";

/** One analysed version of a document. Everything is worked out on first use. */
export interface DocumentAnalysis {
  readonly kind: DocumentKind;
  /** Set when only the first `truncatedAt` characters were analysed (see `MAX_ANALYSED_LENGTH`). */
  readonly truncatedAt?: number;
  /** True when the content looks binary: nothing is analysed. */
  readonly binary: boolean;
  /** The problems of the text and the checks' findings, in document order. */
  findings(): readonly Finding[];
  /**
   * The same findings a part at a time (a segment or block each), in document order; where they
   * are not worked out yet, only as far as the caller reads (see `findingsInParts`). A caller that
   * must stay responsive reads a few parts, answers other requests, and goes on, or gives up when
   * the text has changed: the segments done are kept for the next version.
   */
  findingParts(): Iterable<readonly Finding[]>;
  /** The findings of the segments that overlap `start`..`end` (what a request about that stretch needs). */
  findingsAround(start: number, end: number): readonly Finding[];
  /** The whole document's model (for a large table this reads every row: prefer the two below). */
  model(): DocumentModel;
  /** The model of the segments that overlap `start`..`end`: what a request about that stretch needs. */
  modelAround(start: number, end: number): DocumentModel;
  /** The species at `offset`, decided as `speciesAtOffset` decides it on the whole model. */
  speciesAt(offset: number): SpeciesAtOffset | undefined;
  /**
   * One occurrence of each distinct species text met so far (for a table: none, its rows are
   * read only where asked); ranges may be those of an earlier version. For preparing hovers.
   */
  distinctSpecies(): readonly SpeciesOccurrence[];
}

/** Analyses successive versions of one document, reusing what an edit left alone. */
export interface DocumentAnalyser {
  analyse(text: ChunkedText): DocumentAnalysis;
}

/** Table segment models kept for hovers and hints; each is a few hundred rows. */
const SEGMENT_MODELS_KEPT = 16;

/** How much of the start is checked for NUL characters (as `analysedTextOf` does). */
const BINARY_PROBE_LENGTH = 8 * 1024;

/** An analyser for a document of `kind`; keep one per open document, across its edits. */
export function createDocumentAnalyser(kind: DocumentKind, limit = MAX_ANALYSED_LENGTH): DocumentAnalyser {
  const read = memoisedReader();
  const table = kind === "csv" || kind === "tsv" ? tableSegments(kind, read) : undefined;
  const markdown = kind === "markdown" ? markdownSegments(read) : undefined;
  return {
    analyse(text) {
      if (sliceOf(text, 0, BINARY_PROBE_LENGTH).includes("\u0000")) return wholeAnalysis(kind, "", read, { binary: true });
      if (text.length > limit) {
        const analysed = analysedTextOf(wholeText(text), limit);
        return wholeAnalysis(kind, analysed.text, read, { truncatedAt: analysed.truncatedAt });
      }
      if (table) return table(text);
      if (markdown) return markdown(wholeText(text));
      return wholeAnalysis(kind, wholeText(text), read, {});
    },
  };
}

/** The plain path: the whole text read and checked at once. */
function wholeAnalysis(
  kind: DocumentKind,
  text: string,
  read: SpeciesReader,
  flags: { readonly binary?: boolean; readonly truncatedAt?: number },
): DocumentAnalysis {
  let model: DocumentModel | undefined;
  let findings: readonly Finding[] | undefined;
  const modelOf = (): DocumentModel => (model ??= analyzeDocument(text, kind, read));
  return {
    kind,
    binary: flags.binary ?? false,
    truncatedAt: flags.truncatedAt,
    findings: () => (findings ??= sortedFindings([...modelOf().problems, ...checkDocument(modelOf())])),
    *findingParts() {
      if (findings || model || flags.binary) {
        yield this.findings();
        return;
      }
      // Markdown and plain text parts follow one another through the text: sorting each sorts the whole.
      for (const part of findingsInParts(text, kind, { read })) yield sortedFindings([...part]);
    },
    findingsAround: () => (findings ??= sortedFindings([...modelOf().problems, ...checkDocument(modelOf())])),
    model: modelOf,
    modelAround: modelOf,
    speciesAt: (offset) => speciesAtOffset(modelOf(), offset),
    distinctSpecies: () => distinct(modelOf().occurrences),
  };
}

function distinct(occurrences: Iterable<SpeciesOccurrence>): SpeciesOccurrence[] {
  const byText = new Map<string, SpeciesOccurrence>();
  for (const occurrence of occurrences) if (!byText.has(occurrence.text)) byText.set(occurrence.text, occurrence);
  return [...byText.values()];
}

function sortedFindings(findings: Finding[]): Finding[] {
  return findings.sort((a, b) => a.range.start - b.range.start || a.range.end - b.range.end);
}

// ---------------------------------------------------------------------------------------------
// Tables

/** A run of chunks that starts and ends on a record boundary. */
interface TableSegment {
  readonly start: number;
  readonly end: number;
  readonly chunks: readonly TextChunk[];
}

/** What a segment's rows yield, with offsets relative to the segment's start. */
interface SegmentFindings {
  readonly chunks: readonly TextChunk[];
  readonly findings: readonly Finding[];
}

function tableSegments(kind: "csv" | "tsv", read: SpeciesReader): (text: ChunkedText) => DocumentAnalysis {
  const memo = delimitedRowMemo();
  let tableKey: string | undefined;
  // Keyed by a segment's first chunk: chunks an edit left alone are the same objects in the new version.
  let remembered = new WeakMap<TextChunk, SegmentFindings>();
  const models = new Map<TextChunk, { readonly chunks: readonly TextChunk[]; readonly model: DocumentModel }>();

  return (text) => {
    const start = sliceOf(text, 0, 65_536);
    const delimiter = kind === "tsv" ? "\t" : sniffDelimiter(start, ",");
    const header = headerOf(text, delimiter);
    if (!header) return wholeAnalysis(kind, wholeText(text), read, {});
    // Everything before the first record: the part each segment is read after.
    const prefix = sliceOf(text, 0, header.next);
    const key = `${delimiter}${prefix}`;
    if (key !== tableKey) {
      tableKey = key;
      remembered = new WeakMap();
      models.clear();
    }
    const segments = recordSegments(text, header.next, delimiter);
    const segmentText = (segment: TableSegment): string => segment.chunks.map((chunk) => chunk.text).join("");
    // The segment holding the header is read on its own; the others after the header's text.
    const readAfterHeader = (segment: TableSegment): { text: string; shift: number; from: number } =>
      segment.start === 0
        ? { text: segmentText(segment), shift: 0, from: 0 }
        : { text: prefix + segmentText(segment), shift: segment.start - prefix.length, from: prefix.length };

    const findingsOf = (segment: TableSegment): readonly Finding[] => {
      const known = remembered.get(segment.chunks[0]);
      if (known && sameChunks(known.chunks, segment.chunks)) return known.findings;
      const source = readAfterHeader(segment);
      const found = checkDelimitedText(source.text, kind, { delimiter, from: source.from, memo, read });
      const relative = found.map((finding) => moved(finding, source.shift - segment.start));
      remembered.set(segment.chunks[0], { chunks: segment.chunks, findings: relative });
      return relative;
    };

    const modelOf = (segment: TableSegment): DocumentModel => {
      const known = models.get(segment.chunks[0]);
      if (known && sameChunks(known.chunks, segment.chunks)) return shiftedModel(known.model, segment.start);
      const source = readAfterHeader(segment);
      const whole = analyzeDocument(source.text, kind, read, { delimiter });
      const own = <T extends { readonly range: { readonly start: number } }>(item: T): boolean => item.range.start >= source.from;
      const local: DocumentModel = shiftedModel(
        {
          kind,
          occurrences: whole.occurrences.filter(own),
          records: whole.records.filter((record) => own(record.species)),
          problems: whole.problems.filter(own),
          unreadable: (whole.unreadable ?? []).filter(own),
        },
        source.shift - segment.start,
      );
      models.delete(segment.chunks[0]);
      models.set(segment.chunks[0], { chunks: segment.chunks, model: local });
      while (models.size > SEGMENT_MODELS_KEPT) models.delete(models.keys().next().value as TextChunk);
      return shiftedModel(local, segment.start);
    };

    let findings: readonly Finding[] | undefined;
    let model: DocumentModel | undefined;
    const around = (from: number, to: number): DocumentModel =>
      joinedModels(kind, segments.filter((segment) => segment.end >= from && segment.start <= to).map(modelOf));
    return {
      kind,
      binary: false,
      findings() {
        if (findings) return findings;
        const all: Finding[] = [];
        for (const segment of segments) for (const finding of findingsOf(segment)) all.push(moved(finding, segment.start));
        findings = all;
        return findings;
      },
      *findingParts() {
        if (findings) {
          yield findings;
          return;
        }
        for (const segment of segments) yield findingsOf(segment).map((finding) => moved(finding, segment.start));
      },
      findingsAround: (from, to) =>
        segments
          .filter((segment) => segment.end >= from && segment.start <= to)
          .flatMap((segment) => findingsOf(segment).map((finding) => moved(finding, segment.start))),
      model: () => (model ??= joinedModels(kind, segments.map(modelOf))),
      modelAround: around,
      distinctSpecies: () => [],
      speciesAt(offset) {
        const segment = segments.find((candidate) => offset < candidate.end) ?? segments[segments.length - 1];
        return segment ? speciesAtOffset(modelOf(segment), offset) : undefined;
      },
    };
  };
}

/** Past this many characters without a header row, a table is read whole. */
const HEADER_SEARCH_LIMIT = 1024 * 1024;

/** The header row, found in the first chunks (undefined when the table must be read whole). */
function headerOf(text: ChunkedText, delimiter: string): { next: number } | undefined {
  for (let index = 0; index < text.chunks.length && text.starts[index] < HEADER_SEARCH_LIMIT; index++) {
    const end = text.starts[index + 1];
    const start = sliceOf(text, 0, end);
    const header = findHeader(start, delimiter);
    if (header) return header.next <= end ? header : undefined;
    // Quotes before the first record: the whole text is read the ordinary way.
    if (start.includes('"')) return undefined;
  }
  return undefined;
}

/**
 * The chunks cut into segments that start and end on record boundaries: a chunk ends at a line
 * feed, which ends a record unless a quoted field is open there, and then the next chunk joins.
 */
function recordSegments(text: ChunkedText, firstRecord: number, delimiter: string): TableSegment[] {
  const segments: TableSegment[] = [];
  let index = 0;
  while (index < text.chunks.length) {
    const first = index;
    const chunks: TextChunk[] = [text.chunks[index]];
    index += 1;
    // The header's own chunk must reach past the header line.
    while (index < text.chunks.length && text.starts[index] < firstRecord) chunks.push(text.chunks[index++]);
    while (index < text.chunks.length && !endsOnRecordBoundary(chunks, delimiter)) chunks.push(text.chunks[index++]);
    segments.push({ start: text.starts[first], end: text.starts[index], chunks });
  }
  return segments;
}

function endsOnRecordBoundary(chunks: readonly TextChunk[], delimiter: string): boolean {
  if (!chunks.some((chunk) => chunk.text.includes('"'))) return true;
  const joined = chunks.map((chunk) => chunk.text).join("");
  let position = 0;
  while (position < joined.length) {
    const row = delimitedRowExtent(joined, position, delimiter);
    // A record that runs to the very end without a line break holds an open quote.
    if (row.end >= joined.length) return false;
    position = row.next;
  }
  return true;
}

function sameChunks(a: readonly TextChunk[], b: readonly TextChunk[]): boolean {
  return a.length === b.length && a.every((chunk, index) => chunk === b[index]);
}

// ---------------------------------------------------------------------------------------------
// Markdown

/** What one block yields, with offsets into the text it was read in. */
interface BlockPart {
  readonly start: number;
  /** The block's model, moved to `start` when first asked for (findings need no model). */
  model(): DocumentModel;
  /** The model as first read, wherever the block then was. */
  readonly unplaced: DocumentModel;
  readonly findings: readonly Finding[];
}

function markdownSegments(read: SpeciesReader): (text: string) => DocumentAnalysis {
  let remembered = new Map<string, BlockPart>();
  return (text) => {
    const blocks = markdownBlocks(text);
    // Each block is read (or found among the last version's) when first needed.
    const known = new Map<string, BlockPart>();
    const previous = remembered;
    remembered = known;
    const parts: (BlockPart | undefined)[] = new Array(blocks.length);
    const partOf = (index: number): BlockPart => {
      let part = parts[index];
      if (part) return part;
      const block = blocks[index];
      const key = blockKey(text, block);
      const before = known.get(key) ?? previous.get(key);
      part = before ? shiftedPart(before, block.start) : blockPart(text, block, read);
      known.set(key, part);
      parts[index] = part;
      return part;
    };
    /** The indexes of the blocks that overlap `start`..`end`, ends included. */
    const indexesAround = (start: number, end: number): number[] => {
      const indexes: number[] = [];
      let low = 0;
      let high = blocks.length;
      while (low < high) {
        const middle = (low + high) >> 1;
        if (blocks[middle].end < start) low = middle + 1;
        else high = middle;
      }
      for (let index = low; index < blocks.length && blocks[index].start <= end; index++) indexes.push(index);
      return indexes;
    };
    let model: DocumentModel | undefined;
    let findings: readonly Finding[] | undefined;
    const modelOf = (): DocumentModel =>
      (model ??= joinedModels(
        "markdown",
        blocks.map((_, index) => partOf(index).model()),
      ));
    const modelAround = (start: number, end: number): DocumentModel =>
      joinedModels(
        "markdown",
        indexesAround(start, end).map((index) => partOf(index).model()),
      );
    return {
      kind: "markdown",
      binary: false,
      findings: () => (findings ??= blocks.flatMap((_, index) => partOf(index).findings)),
      *findingParts() {
        if (findings) {
          yield findings;
          return;
        }
        for (let index = 0; index < blocks.length; index++) yield partOf(index).findings;
      },
      findingsAround: (start, end) => indexesAround(start, end).flatMap((index) => partOf(index).findings),
      model: modelOf,
      modelAround,
      speciesAt: (offset) => speciesAtOffset(modelAround(offset, offset), offset),
      distinctSpecies: () => distinct(blocks.flatMap((_, index) => partOf(index).unplaced.occurrences)),
    };
  };
}

/** What a block's reading depends on: its kind, its text, and the rest of the lines it starts and ends on. */
function blockKey(text: string, block: MarkdownBlock): string {
  const lineStart = text.lastIndexOf("\n", block.start - 1) + 1;
  let lineEnd = text.indexOf("\n", block.end);
  if (lineEnd < 0) lineEnd = text.length;
  return `${block.kind}\u0000${text.slice(lineStart, block.start)}\u0000${text.slice(block.start, block.end)}\u0000${text.slice(block.end, lineEnd)}`;
}

function blockPart(text: string, block: MarkdownBlock, read: SpeciesReader): BlockPart {
  const sink: RecordSink = { occurrences: [], unreadable: [], records: [], reactions: [] };
  scanMarkdownBlock(text, block, read, sink);
  const model: DocumentModel = {
    kind: "markdown",
    occurrences: [...sink.occurrences].sort((a, b) => a.range.start - b.range.start),
    records: sink.records,
    problems: [],
    unreadable: [...sink.unreadable].sort((a, b) => a.range.start - b.range.start),
    reactions: distinctReactions(sink.reactions ?? []),
  };
  return { start: block.start, model: () => model, unplaced: model, findings: checkDocument(model, undefined) };
}

function shiftedPart(part: BlockPart, start: number): BlockPart {
  const by = start - part.start;
  if (by === 0) return part;
  let model: DocumentModel | undefined;
  return {
    start,
    model: () => (model ??= shiftedModel(part.model(), by)),
    unplaced: part.unplaced,
    findings: part.findings.map((finding) => moved(finding, by)),
  };
}

// ---------------------------------------------------------------------------------------------
// Models

function joinedModels(kind: DocumentKind, models: readonly DocumentModel[]): DocumentModel {
  if (models.length === 1) return models[0];
  return {
    kind,
    occurrences: models.flatMap((model) => model.occurrences),
    records: models.flatMap((model) => model.records),
    problems: models.flatMap((model) => model.problems),
    unreadable: models.flatMap((model) => model.unreadable ?? []),
    reactions: models.flatMap((model) => model.reactions ?? []),
  };
}

/** `model` with every range moved `by` characters; a record still shares its occurrences with the list. */
function shiftedModel(model: DocumentModel, by: number): DocumentModel {
  if (by === 0) return model;
  const occurrences = new Map<SpeciesOccurrence, SpeciesOccurrence>();
  const occurrence = (item: SpeciesOccurrence): SpeciesOccurrence => {
    let shifted = occurrences.get(item);
    if (!shifted) {
      shifted = shiftedOccurrence(item, by);
      occurrences.set(item, shifted);
    }
    return shifted;
  };
  const cell = (item: TableCell): TableCell => ({ ...item, range: shiftedRange(item.range, by) });
  const record = (item: TableRecord): TableRecord => ({
    ...item,
    species: occurrence(item.species),
    cells: item.cells.map(cell),
    ...(item.otherNames ? { otherNames: item.otherNames.map(occurrence) } : {}),
  });
  const unreadable = (item: UnreadableSpecies): UnreadableSpecies => ({
    ...item,
    range: shiftedRange(item.range, by),
    problem: item.problem.range ? { ...item.problem, range: shiftedRange(item.problem.range, by) } : item.problem,
  });
  return {
    kind: model.kind,
    occurrences: model.occurrences.map(occurrence),
    records: model.records.map(record),
    problems: model.problems.map((finding) => moved(finding, by)),
    unreadable: (model.unreadable ?? []).map(unreadable),
    reactions: (model.reactions ?? []).map((reaction) => shiftedReaction(reaction, by)),
  };
}

function shiftedRange(range: { readonly start: number; readonly end: number }, by: number): { start: number; end: number } {
  return { start: range.start + by, end: range.end + by };
}

function shiftedOccurrence(occurrence: SpeciesOccurrence, by: number): SpeciesOccurrence {
  const range = shiftedRange(occurrence.range, by);
  // A reading placed in the document carries the same range as its occurrence.
  const readingRange = occurrence.reading.range === occurrence.range ? range : shiftedRange(occurrence.reading.range, by);
  return { ...occurrence, range, reading: { ...occurrence.reading, range: readingRange } };
}
