/**
 * What the prose readers that work version after version (markdown blocks, plain-text units)
 * share: a version's text cut into consecutive segments, each read once with offsets from its own
 * start and placed where it now lies; the cut made only as far as a request needs; and where two
 * versions of a chunked text differ.
 */
import { speciesTextOf } from "./analyzeOccurrence";
import { checkDocument } from "./checkDocument";
import { chunkIndexAt, sliceOf, type ChunkedText } from "./chunkedText";
import { placedParts, type FindingPart } from "./findingPart";
import type { DocumentAnalysis } from "./incrementalAnalysis";
import { joinedModels, shiftedModel } from "./shiftedModel";
import { speciesAtOffset } from "./speciesAt";
import { moved } from "./tables/delimitedFindings";
import type { DocumentKind, DocumentModel, Finding, SpeciesOccurrence } from "./types";

/** What one segment yields, with offsets from the segment's start. */
export interface SegmentReading {
  readonly model: DocumentModel;
  readonly findings: readonly Finding[];
}

/** One version's segments as far as they are cut, and how to cut on. */
export interface SegmentCut {
  /** Where each segment cut so far starts. */
  readonly starts: readonly number[];
  /** The length of segment `index`. */
  lengthOf(index: number): number;
  /** Whether text is left to cut. */
  more(): boolean;
  /** Cuts one more segment (or finds there is none, after which `more` is false). */
  next(): void;
}

/** Whether segment `index` exists, cutting further if needed. */
export function hasSegment(cut: SegmentCut, index: number): boolean {
  while (index >= cut.starts.length && cut.more()) cut.next();
  return index < cut.starts.length;
}

/** Cuts until every segment starting at or before `offset` is known. */
export function cutUpTo(cut: SegmentCut, offset: number): void {
  while (cut.more() && (cut.starts.length === 0 || cut.starts[cut.starts.length - 1] <= offset)) cut.next();
}

/** How a segmented analysis reads its segments and answers requests far from where the cut has got. */
export interface SegmentSource {
  readonly cut: SegmentCut;
  /** The reading of segment `index` (kept by the caller across versions). */
  readingOf(index: number): SegmentReading;
  /** Whether a request about `offset` is best answered from the lines around it. */
  farAhead(offset: number): boolean;
  /** The model of the lines around `start`..`end`, read on their own. */
  localModel(start: number, end: number): DocumentModel;
  /** One occurrence of each distinct species text met so far. */
  distinctSpecies(): readonly SpeciesOccurrence[];
  /**
   * The findings of segment `index` a part at a time, when it is not read yet and worth handing
   * out in parts (a long paragraph); undefined to read it whole.
   */
  partsOf?(index: number): Iterable<readonly Finding[]> | undefined;
}

/** Placed segment models kept per version, for requests about one place. */
const PLACED_MODELS_KEPT = 16;

/** One version's analysis over its segments, each placed at its start. */
export function segmentedAnalysis(kind: DocumentKind, source: SegmentSource): DocumentAnalysis {
  const { cut } = source;
  const starts = cut.starts;
  const placedFindings = (index: number): readonly Finding[] => {
    const findings = source.readingOf(index).findings;
    const start = starts[index];
    return start === 0 ? findings : findings.map((finding) => moved(finding, start));
  };
  const placed = new Map<number, DocumentModel>();
  const placedModel = (index: number): DocumentModel => {
    let model = placed.get(index);
    if (!model) {
      model = shiftedModel(source.readingOf(index).model, starts[index]);
      placed.set(index, model);
      if (placed.size > PLACED_MODELS_KEPT) placed.delete(placed.keys().next().value as number);
    }
    return model;
  };
  /** The indexes of the segments that overlap `start`..`end`, ends included (the cut made that far). */
  const indexesAround = (start: number, end: number): number[] => {
    cutUpTo(cut, end);
    let low = 0;
    let high = starts.length;
    while (low < high) {
      const middle = (low + high) >> 1;
      if (starts[middle] + cut.lengthOf(middle) < start) low = middle + 1;
      else high = middle;
    }
    const indexes: number[] = [];
    for (let index = low; index < starts.length && starts[index] <= end; index++) indexes.push(index);
    return indexes;
  };
  const joined = (models: readonly DocumentModel[]): DocumentModel => (models.length === 0 ? emptyModel(kind) : joinedModels(kind, models));
  const modelAround = (start: number, end: number): DocumentModel =>
    source.farAhead(end) ? source.localModel(start, end) : joined(indexesAround(start, end).map(placedModel));
  let findings: readonly Finding[] | undefined;
  const allFindings = (): readonly Finding[] => {
    if (findings) return findings;
    const all: Finding[] = [];
    for (let index = 0; hasSegment(cut, index); index++) for (const finding of placedFindings(index)) all.push(finding);
    findings = all;
    return findings;
  };
  return {
    kind,
    binary: false,
    findings: allFindings,
    findingParts() {
      return placedParts(this.findingPartsAt());
    },
    *findingPartsAt(): Generator<FindingPart> {
      if (findings) {
        yield { findings, offset: 0 };
        return;
      }
      for (let index = 0; hasSegment(cut, index); index++) {
        const offset = starts[index];
        const parts = source.partsOf?.(index);
        if (parts) for (const part of parts) yield { findings: part, offset };
        else yield { findings: source.readingOf(index).findings, offset };
      }
    },
    findingsAround: (start, end) =>
      source.farAhead(end) ? checkDocument(source.localModel(start, end), undefined) : indexesAround(start, end).flatMap(placedFindings),
    model: () => {
      const models: DocumentModel[] = [];
      for (let index = 0; hasSegment(cut, index); index++) models.push(placedModel(index));
      return joined(models);
    },
    modelAround,
    speciesAt: (offset) => speciesAtOffset(modelAround(offset, offset), offset),
    // Gathered as segments are read, so a long document is not walked again on every version.
    distinctSpecies: source.distinctSpecies,
    *speciesCount() {
      let species = 0;
      for (let index = 0; hasSegment(cut, index); index++) {
        species += source.readingOf(index).model.occurrences.length;
        yield;
      }
      return species;
    },
    wholeReadWanted: () => undefined,
  };
}

/** A model with nothing in it. */
export function emptyModel(kind: DocumentKind): DocumentModel {
  return { kind, occurrences: [], records: [], problems: [], unreadable: [], reactions: [] };
}

/** Distinct species texts remembered for preparing hovers. */
const DISTINCT_SPECIES_KEPT = 4096;

/** Adds to `met` the first occurrence of each species text not met yet, up to a bound. */
export function remember(met: Map<string, SpeciesOccurrence>, occurrences: readonly SpeciesOccurrence[]): void {
  for (const occurrence of occurrences) {
    if (met.size >= DISTINCT_SPECIES_KEPT) break;
    const key = speciesTextOf(occurrence);
    if (!met.has(key)) met.set(key, occurrence);
  }
}

// ---------------------------------------------------------------------------------------------
// Places in chunked text

/** An edit that changes more text than this is cut afresh. */
export const LARGE_CHANGE = 1024 * 1024;

/** Where two versions differ: from `start` to `oldEnd` in the old one, to `newEnd` in the new. */
export function changedStretch(old: ChunkedText, text: ChunkedText): { start: number; oldEnd: number; newEnd: number } | undefined {
  const shorter = Math.min(old.chunks.length, text.chunks.length);
  let same = 0;
  while (same < shorter && old.chunks[same] === text.chunks[same]) same++;
  if (same === old.chunks.length && same === text.chunks.length) return undefined;
  let sameAtEnd = 0;
  while (sameAtEnd < shorter - same && old.chunks[old.chunks.length - 1 - sameAtEnd] === text.chunks[text.chunks.length - 1 - sameAtEnd])
    sameAtEnd++;
  const from = old.starts[same];
  const oldTo = old.starts[old.chunks.length - sameAtEnd];
  const newTo = text.starts[text.chunks.length - sameAtEnd];
  if (oldTo - from > LARGE_CHANGE || newTo - from > LARGE_CHANGE) return { start: from, oldEnd: oldTo, newEnd: newTo };
  // Chunks are a few kilobytes: narrow the change down to the characters that differ.
  const before = sliceOf(old, from, oldTo);
  const after = sliceOf(text, from, newTo);
  let prefix = 0;
  while (prefix < before.length && prefix < after.length && before.charCodeAt(prefix) === after.charCodeAt(prefix)) prefix++;
  let suffix = 0;
  while (
    suffix < before.length - prefix &&
    suffix < after.length - prefix &&
    before.charCodeAt(before.length - 1 - suffix) === after.charCodeAt(after.length - 1 - suffix)
  )
    suffix++;
  return { start: from + prefix, oldEnd: oldTo - suffix, newEnd: newTo - suffix };
}

/** The index of the last of the ascending `starts` below `limit`, or -1. */
export function lastIndexBefore(starts: readonly number[], limit: number): number {
  let low = 0;
  let high = starts.length;
  while (low < high) {
    const middle = (low + high) >> 1;
    if (starts[middle] < limit) low = middle + 1;
    else high = middle;
  }
  return low - 1;
}

/** The index of `value` in the ascending `starts`, or -1. */
export function indexOf(starts: readonly number[], value: number): number {
  const index = lastIndexBefore(starts, value + 1);
  return index >= 0 && starts[index] === value ? index : -1;
}

/** The start of the line holding `offset`. */
export function lineStartAt(text: ChunkedText, offset: number): number {
  if (offset <= 0 || text.chunks.length === 0) return 0;
  const index = chunkIndexAt(text, offset);
  const local = offset - text.starts[index];
  if (local === 0) return text.starts[index];
  const lineFeed = text.chunks[index].text.lastIndexOf("\n", local - 1);
  return lineFeed < 0 ? text.starts[index] : text.starts[index] + lineFeed + 1;
}

/** The offset of the line feed at or after `offset`, or the text's length. */
export function lineEndAt(text: ChunkedText, offset: number): number {
  if (offset >= text.length) return text.length;
  const index = chunkIndexAt(text, offset);
  const lineFeed = text.chunks[index].text.indexOf("\n", offset - text.starts[index]);
  return lineFeed < 0 ? text.length : text.starts[index] + lineFeed;
}

/** The end of the window of whole lines that reaches `reach`, or the text's length. */
export function windowEndAt(text: ChunkedText, reach: number): number {
  return reach >= text.length ? text.length : Math.min(text.length, lineEndAt(text, reach) + 1);
}
