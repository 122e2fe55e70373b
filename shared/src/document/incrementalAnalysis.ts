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
 * Markdown: segments are the blocks of `markdownBlocks`, split again only around an edit (see
 * `markdownAnalyser`). Plain text: its paragraphs and literal blocks (`plainTextUnits`), each read
 * with the little it carries from the paragraphs around it (see `plainTextAnalyser`). JSON: the
 * elements of its list of records (see `jsonListReader`). YAML: the items of its block list of
 * records (see `yamlListReader`). JSON or YAML without such a list (or with a syntax error) is
 * read whole on every version.
 */
import { analysedTextOf, MAX_ANALYSED_LENGTH } from "./analysedText";
import { analyzeDocument } from "./analyzeDocument";
import { speciesTextOf } from "./analyzeOccurrence";
import { checkDocument } from "./checkDocument";
import { placedParts, type FindingPart } from "./findingPart";
import { findingsInParts } from "./findingsInParts";
import { jsonListReader, wholeJsonReading } from "./jsonParts";
import type { ListVersion, WholeReading } from "./listParts";
import { wholeYamlReading, yamlListReader } from "./yamlParts";
import { sliceOf, wholeText, type ChunkedText, type TextChunk } from "./chunkedText";
import { isTextMarkup } from "./documentKind";
import { markdownAnalyser } from "./markdownAnalysis";
import { plainTextAnalyser } from "./plainTextAnalysis";
import { emptyModel } from "./segmentedAnalysis";
import { joinedModels, shiftedModel } from "./shiftedModel";
import { memoisedReader, type SpeciesReader } from "./speciesReader";
import { speciesAtOffset, type SpeciesAtOffset } from "./speciesAt";
import { delimitedRowExtent, sniffDelimiter } from "./tables/csv";
import { checkDelimitedText, delimitedRowMemo, findHeader, moved } from "./tables/delimitedFindings";
import type { DocumentKind, DocumentModel, Finding, SpeciesOccurrence } from "./types";

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
  /**
   * The parts of `findingParts`, each with its findings' ranges counted from `offset` rather than
   * placed in the document: a caller that keeps few of many findings (diagnostics show a capped
   * number) moves only those it keeps, with `moved(finding, offset)`.
   */
  findingPartsAt(): Iterable<FindingPart>;
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
  /**
   * How many species mentions the document holds (its model's occurrences), worked out a part
   * at a time without building the whole model: the generator yields between parts, so a caller
   * can answer other requests, and returns the count. Parts an edit left alone are not counted again.
   */
  speciesCount(): Generator<void, number, undefined>;
  /**
   * Set while this version's findings wait on reading a large text whole (a JSON or YAML list
   * with a syntax error): a caller may do that reading elsewhere, with `wholeReadingOf`, and hand
   * it to `settle`; otherwise it is done here when the findings are asked for.
   */
  wholeReadWanted(): { readonly text: ChunkedText; settle(reading: WholeReading): void } | undefined;
}

/** Analyses successive versions of one document, reusing what an edit left alone. */
export interface DocumentAnalyser {
  analyse(text: ChunkedText): DocumentAnalysis;
}

/** Table segment models kept for hovers and hints; each is a few hundred rows. */
const SEGMENT_MODELS_KEPT = 16;

/** How much of the start is checked for NUL characters (as `analysedTextOf` does). */
const BINARY_PROBE_LENGTH = 8 * 1024;

/** Sizes an analyser works in; the defaults suit editors, tests make them small. */
export interface AnalyserTuning {
  /** How many characters of markdown the split into blocks reads at a time. */
  readonly markdownStretch?: number;
  /** About how many characters of a JSON or YAML list a file just opened is read in at a time. */
  readonly listStep?: number;
  /** From how many characters a broken JSON or YAML list is offered to be read whole elsewhere. */
  readonly readWholeElsewhereFrom?: number;
}

/** An analyser for a document of `kind`; keep one per open document, across its edits. */
export function createDocumentAnalyser(kind: DocumentKind, limit = MAX_ANALYSED_LENGTH, tuning: AnalyserTuning = {}): DocumentAnalyser {
  const read = memoisedReader();
  const table = kind === "csv" || kind === "tsv" ? tableSegments(kind, read) : undefined;
  const markdown = kind === "markdown" ? markdownAnalyser(read, tuning.markdownStretch) : undefined;
  const list =
    kind === "json"
      ? jsonSegments(read, tuning.listStep, tuning.readWholeElsewhereFrom)
      : kind === "yaml"
        ? yamlSegments(read, tuning.listStep, tuning.readWholeElsewhereFrom)
        : undefined;
  const plain = isTextMarkup(kind) ? plainTextAnalyser(read, kind) : undefined;
  return {
    analyse(text) {
      if (sliceOf(text, 0, BINARY_PROBE_LENGTH).includes("\u0000")) return wholeAnalysis(kind, "", read, { binary: true });
      if (text.length > limit) {
        const analysed = analysedTextOf(wholeText(text), limit);
        return wholeAnalysis(kind, analysed.text, read, { truncatedAt: analysed.truncatedAt });
      }
      if (table) return table(text);
      if (markdown) return markdown(text);
      if (list) return list(text);
      if (plain) return plain(text);
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
    *findingPartsAt() {
      for (const findings of this.findingParts()) yield { findings, offset: 0 };
    },
    findingsAround: () => (findings ??= sortedFindings([...modelOf().problems, ...checkDocument(modelOf())])),
    model: modelOf,
    modelAround: modelOf,
    speciesAt: (offset) => speciesAtOffset(modelOf(), offset),
    distinctSpecies: () => distinct(modelOf().occurrences),
    // eslint-disable-next-line require-yield -- one step: the plain path is read at once
    *speciesCount() {
      return modelOf().occurrences.length;
    },
    wholeReadWanted: () => undefined,
  };
}

/**
 * A JSON or YAML text read whole, the ordinary way: what a list version that did not read cleanly
 * gives, worked out wherever the caller likes (see `DocumentAnalysis.wholeReadWanted`).
 */
export function wholeReadingOf(kind: "json" | "yaml", text: string): WholeReading {
  return kind === "json" ? wholeJsonReading(text, memoisedReader()) : wholeYamlReading(text, memoisedReader());
}

function distinct(occurrences: Iterable<SpeciesOccurrence>): SpeciesOccurrence[] {
  const byText = new Map<string, SpeciesOccurrence>();
  for (const occurrence of occurrences) {
    const key = speciesTextOf(occurrence);
    if (!byText.has(key)) byText.set(key, occurrence);
  }
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
  let counted = new WeakMap<TextChunk, { readonly chunks: readonly TextChunk[]; readonly species: number }>();
  const models = new Map<TextChunk, { readonly chunks: readonly TextChunk[]; readonly model: DocumentModel }>();
  // Whether a chunk read from a record's start ends on a record's end, worked out once per chunk
  // (and delimiter) rather than once per version: a table full of quoted cells is not re-read per edit.
  let boundaries = { delimiter: "", endsOnRecord: chunkFlag(() => true) };

  // The delimiter and header as last read, with the chunks they were read from.
  let tableStart:
    { readonly chunks: readonly TextChunk[]; readonly delimiter: string; readonly header: { text: string; next: number } } | undefined;

  return (text) => {
    const known = tableStart;
    const sameStart = known !== undefined && known.chunks.every((chunk, index) => text.chunks[index] === chunk);
    const delimiter = sameStart ? known.delimiter : kind === "tsv" ? "\t" : sniffDelimiter(sliceOf(text, 0, DELIMITER_SNIFF_LENGTH), ",");
    const header = sameStart ? known.header : headerOf(text, delimiter);
    if (!header) return wholeAnalysis(kind, wholeText(text), read, {});
    if (!sameStart) {
      const readTo = Math.max(DELIMITER_SNIFF_LENGTH, header.next + 1);
      tableStart = { chunks: text.chunks.filter((_, index) => text.starts[index] < readTo), delimiter, header };
    }
    // Everything before the first record: the part each segment is read after.
    const prefix = sliceOf(text, 0, header.next);
    const key = `${delimiter}${prefix}`;
    if (key !== tableKey) {
      tableKey = key;
      remembered = new WeakMap();
      counted = new WeakMap();
      models.clear();
    }
    if (boundaries.delimiter !== delimiter) {
      boundaries = { delimiter, endsOnRecord: chunkFlag((chunk) => endsOnRecordBoundary([chunk], delimiter)) };
    }
    const segments = recordSegments(text, header.next, delimiter, boundaries.endsOnRecord);
    const segmentText = (segment: TableSegment): string =>
      segment.chunks.length === 1 ? segment.chunks[0].text : segment.chunks.map((chunk) => chunk.text).join("");
    // The segment holding the header is read on its own; the others after the header's text.
    const readAfterHeader = (segment: TableSegment): { text: string; shift: number; from: number } =>
      segment.start === 0
        ? { text: segmentText(segment), shift: 0, from: 0 }
        : { text: prefix + segmentText(segment), shift: segment.start - prefix.length, from: prefix.length };

    const findingsOf = (segment: TableSegment): readonly Finding[] => {
      const known = remembered.get(segment.chunks[0]);
      if (known && sameChunks(known.chunks, segment.chunks)) return known.findings;
      // Rows after the header's segment are read under the header row, without a copy of the document's start.
      const found =
        segment.start === 0
          ? checkDelimitedText(segmentText(segment), kind, { delimiter, memo, read })
          : checkDelimitedText(segmentText(segment), kind, { delimiter, header: header.text, memo, read });
      remembered.set(segment.chunks[0], { chunks: segment.chunks, findings: found });
      return found;
    };

    /** A segment's rows read after the header's text; `own` tells what lies in the segment itself. */
    const readSegment = (segment: TableSegment) => {
      const source = readAfterHeader(segment);
      const whole = analyzeDocument(source.text, kind, read, { delimiter });
      const own = <T extends { readonly range: { readonly start: number } }>(item: T): boolean => item.range.start >= source.from;
      return { source, whole, own };
    };

    const modelOf = (segment: TableSegment): DocumentModel => {
      const known = models.get(segment.chunks[0]);
      if (known && sameChunks(known.chunks, segment.chunks)) return shiftedModel(known.model, segment.start);
      const { source, whole, own } = readSegment(segment);
      const local: DocumentModel = shiftedModel(
        {
          kind,
          occurrences: whole.occurrences.filter(own),
          records: whole.records.filter((record) => own(record.species)),
          problems: whole.problems.filter(own),
          unreadable: (whole.unreadable ?? []).filter(own),
          // Equation cells too: the fix-all action and half-reaction completion read them here.
          reactions: (whole.reactions ?? []).filter(own),
        },
        source.shift - segment.start,
      );
      models.delete(segment.chunks[0]);
      models.set(segment.chunks[0], { chunks: segment.chunks, model: local });
      while (models.size > SEGMENT_MODELS_KEPT) models.delete(models.keys().next().value as TextChunk);
      return shiftedModel(local, segment.start);
    };

    /** The species mentions of a segment's rows, read as `modelOf` reads them, without keeping the model. */
    const speciesOf = (segment: TableSegment): number => {
      const known = counted.get(segment.chunks[0]) ?? models.get(segment.chunks[0]);
      if (known && sameChunks(known.chunks, segment.chunks)) return "species" in known ? known.species : known.model.occurrences.length;
      const { whole, own } = readSegment(segment);
      const species = whole.occurrences.filter(own).length;
      counted.set(segment.chunks[0], { chunks: segment.chunks, species });
      return species;
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
      findingParts() {
        return placedParts(this.findingPartsAt());
      },
      *findingPartsAt() {
        if (findings) {
          yield { findings, offset: 0 };
          return;
        }
        for (const segment of segments) yield { findings: findingsOf(segment), offset: segment.start };
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
      *speciesCount() {
        if (model) return model.occurrences.length;
        let species = 0;
        for (const segment of segments) {
          species += speciesOf(segment);
          yield;
        }
        return species;
      },
      wholeReadWanted: () => undefined,
    };
  };
}

/** How much of a table's start its delimiter is guessed from. */
const DELIMITER_SNIFF_LENGTH = 65_536;

/** Past this many characters without a header row, a table is read whole. */
const HEADER_SEARCH_LIMIT = 1024 * 1024;

/** The header row, found in the first chunks (undefined when the table must be read whole). */
function headerOf(text: ChunkedText, delimiter: string): { text: string; next: number } | undefined {
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
function recordSegments(
  text: ChunkedText,
  firstRecord: number,
  delimiter: string,
  endsOnRecord: (chunk: TextChunk) => boolean,
): TableSegment[] {
  const segments: TableSegment[] = [];
  let index = 0;
  while (index < text.chunks.length) {
    const first = index;
    const chunks: TextChunk[] = [text.chunks[index]];
    index += 1;
    // The header's own chunk must reach past the header line.
    while (index < text.chunks.length && text.starts[index] < firstRecord) chunks.push(text.chunks[index++]);
    while (index < text.chunks.length && !(chunks.length === 1 ? endsOnRecord(chunks[0]) : endsOnRecordBoundary(chunks, delimiter))) {
      chunks.push(text.chunks[index++]);
    }
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

/** A property of a chunk worked out once: chunks an edit left alone are the same objects in the next version. */
function chunkFlag(work: (chunk: TextChunk) => boolean): (chunk: TextChunk) => boolean {
  const known = new WeakMap<TextChunk, boolean>();
  return (chunk) => {
    let flag = known.get(chunk);
    if (flag === undefined) {
      flag = work(chunk);
      known.set(chunk, flag);
    }
    return flag;
  };
}

function sameChunks(a: readonly TextChunk[], b: readonly TextChunk[]): boolean {
  return a.length === b.length && a.every((chunk, index) => chunk === b[index]);
}

// ---------------------------------------------------------------------------------------------
// JSON and YAML lists of records

/** Below this length a JSON or YAML document's species are all listed for preparing hovers. */
const LIST_SPECIES_LISTED_UP_TO = 256 * 1024;

function jsonSegments(read: SpeciesReader, step?: number, elsewhereFrom?: number): (text: ChunkedText) => DocumentAnalysis {
  const list = jsonListReader(read, step, elsewhereFrom);
  return listSegments(
    "json",
    read,
    list,
    // The elements read as a list of their own, as the list reader reads them.
    (stretch) => shiftedModel(analyzeDocument(`[${stretch}]`, "json", read), -1),
  );
}

function yamlSegments(read: SpeciesReader, step?: number, elsewhereFrom?: number): (text: ChunkedText) => DocumentAnalysis {
  const list = yamlListReader(read, step, elsewhereFrom);
  return listSegments(
    "yaml",
    read,
    list,
    // Whole items read alone read as they do in place (see `yamlListReader`).
    (stretch) => analyzeDocument(stretch, "yaml", read),
  );
}

/** A document whose list elements keep their findings from version to version; models are read around a place. */
function listSegments(
  kind: "json" | "yaml",
  read: SpeciesReader,
  versionOf: (text: ChunkedText) => ListVersion,
  readStretch: (stretch: string) => DocumentModel,
): (text: ChunkedText) => DocumentAnalysis {
  return (text) => {
    const version = versionOf(text);
    let whole: DocumentAnalysis | undefined;
    const plain = (): DocumentAnalysis => (whole ??= wholeAnalysis(kind, wholeText(text), read, {}));
    const around = (start: number, end: number): DocumentModel => {
      const stretch = version.around(start, end);
      // While the text waits to be read whole (elsewhere, perhaps), a request about a place is not the one to read it.
      if (!stretch) return version.wholeReadWanted() ? emptyModel(kind) : plain().model();
      return shiftedModel(readStretch(sliceOf(text, stretch.start, stretch.end)), stretch.start);
    };
    return {
      kind,
      binary: false,
      findings: () => version.findings(),
      // A file just opened is read a few records at a time: empty parts until the last.
      findingParts: () => version.findingSteps(),
      *findingPartsAt() {
        for (const findings of version.findingSteps()) yield { findings, offset: 0 };
      },
      findingsAround: (start, end) => version.findingsAround(start, end),
      model: () => plain().model(),
      modelAround: around,
      speciesAt: (offset) => speciesAtOffset(around(offset, offset), offset),
      distinctSpecies: () => (text.length <= LIST_SPECIES_LISTED_UP_TO ? plain().distinctSpecies() : []),
      *speciesCount() {
        for (const _ of version.findingSteps()) yield;
        return version.speciesCount();
      },
      wholeReadWanted: () => version.wholeReadWanted(),
    };
  };
}
