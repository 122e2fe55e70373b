/**
 * Markdown analysed version after version: the text is cut into the blocks of `markdownBlocks`,
 * and an edit splits again only from a block start before it to the first block start after it
 * where the new split meets the old one; the blocks before and after are the last version's,
 * moved. Each block is read once, with offsets from its own start, so a block that only moved
 * keeps its findings. The first split of a document is made as far as a request needs it, so a
 * request about one place is not kept waiting by a long document.
 */
import { distinctReactions } from "./analyzeDocument";
import { checkDocument } from "./checkDocument";
import { sliceOf, type ChunkedText } from "./chunkedText";
import type { DocumentAnalysis } from "./incrementalAnalysis";
import { markdownBlocks, markdownBlockStream, scanMarkdownBlock, type MarkdownBlock } from "./scanMarkdown";
import {
  changedStretch,
  indexOf,
  LARGE_CHANGE,
  lastIndexBefore,
  lineEndAt,
  lineStartAt,
  remember,
  segmentedAnalysis,
  windowEndAt,
  type SegmentReading,
} from "./segmentedAnalysis";
import { shiftedModel } from "./shiftedModel";
import type { SpeciesReader } from "./speciesReader";
import { moved } from "./tables/delimitedFindings";
import type { RecordSink } from "./tables/records";
import type { DocumentModel, SpeciesOccurrence } from "./types";

/** What one block yields, with offsets from the block's start. */
type BlockReading = SegmentReading;

/** One version's blocks, each with offsets from its own start, and where each starts. */
interface BlockList {
  readonly text: ChunkedText;
  readonly blocks: MarkdownBlock[];
  readonly starts: number[];
  /** The split still to be made, from a block start to the end of the text. */
  rest?: SplitRest;
  /** How much text a stretch of the split reads at first. */
  readonly stretch: number;
}

/**
 * Where the split goes on: a block start of this version (or the text's start), and the stretch
 * of text after it being split. The split reads a stretch at a time, never the whole rest.
 */
interface SplitRest {
  readonly from: number;
  /** How much text the next stretch reads (it grows when one block is longer). */
  readonly size: number;
  stretch?: SplitStretch;
}

/** Text from `SplitRest.from` being split; offsets of its blocks are from its start. */
interface SplitStretch {
  readonly source: string;
  /** Whether `source` runs to the end of the text. */
  readonly complete: boolean;
  readonly stream: Generator<MarkdownBlock, void, void>;
  /** The last block found, kept back until the block after it shows that it is finished. */
  pending?: MarkdownBlock;
}

/** How much text the split reads at a time, at first. */
const SPLIT_STRETCH = 64 * 1024;
/** A request this far past where the first split has got to is answered from the lines around it. */
const FAR_AHEAD = 256 * 1024;
/** How much text around a position is read when the split has not got there yet. */
const LOCAL_READ = 2048;
/** Readings remembered by their text, for blocks written again word for word (a repeated table row, a run's template). */
const READINGS_BY_TEXT_KEPT = 2048;
/** Only blocks shorter than this (with their lines) are remembered by text. */
const READING_BY_TEXT_LENGTH = 2048;

/**
 * Analyses successive versions of one markdown document, reusing the blocks an edit left alone;
 * the split reads `stretch` characters of text at a time (tests make it small).
 */
export function markdownAnalyser(read: SpeciesReader, stretch = SPLIT_STRETCH): (text: ChunkedText) => DocumentAnalysis {
  // Keyed by a block object: a block an edit left alone is the same object in the next version.
  const readings = new WeakMap<MarkdownBlock, BlockReading>();
  const byText = new Map<string, BlockReading>();
  const reader: BlockReader = { read, byText, met: new Map() };
  let last: BlockList | undefined;
  return (text) => {
    const list: BlockList = (last && editedList(last, text, stretch)) ?? {
      text,
      blocks: [],
      starts: [],
      rest: { from: 0, size: stretch },
      stretch,
    };
    last = list;
    return analysisOf(list, reader, readings);
  };
}

/** How blocks are read: the species reader, and readings remembered by the text read (bounded). */
interface BlockReader {
  readonly read: SpeciesReader;
  readonly byText: Map<string, BlockReading>;
  /** One occurrence of each distinct species text read so far, in any version (bounded). */
  readonly met: Map<string, SpeciesOccurrence>;
}

function analysisOf(list: BlockList, reader: BlockReader, readings: WeakMap<MarkdownBlock, BlockReading>): DocumentAnalysis {
  const read = reader.read;
  const { blocks } = list;
  return segmentedAnalysis("markdown", {
    cut: {
      starts: list.starts,
      lengthOf: (index) => blocks[index].end,
      more: () => list.rest !== undefined,
      next: () => nextBlock(list),
    },
    readingOf: (index) => {
      const block = blocks[index];
      let reading = readings.get(block);
      if (!reading) {
        reading = blockReading(list, index, reader);
        readings.set(block, reading);
      }
      return reading;
    },
    // The split must still go far to reach the offset: the lines around it are read instead.
    farAhead: (offset) => list.rest !== undefined && offset - splitReached(list) > FAR_AHEAD,
    localModel: (start, end) => localModel(list.text, start, end, read),
    distinctSpecies: () => [...reader.met.values()],
  });
}

// ---------------------------------------------------------------------------------------------
// The split

/** How far the split has got: every block starting before here is known. */
function splitReached(list: BlockList): number {
  const last = list.blocks.length - 1;
  return last < 0 ? 0 : list.starts[last];
}

/** Where the split stands: a block start (or the text's start) before which every block is known. */
function splitFrontier(rest: SplitRest): number {
  const pending = rest.stretch?.pending;
  return pending ? rest.from + pending.start : rest.from;
}

/**
 * Adds the next block to `list` (or finds there is none). The split reads a stretch of text at
 * a time; a block is taken once the block after it starts on lines the stretch holds whole, as
 * then the rest of the text cannot change it. Otherwise the split reads on from the block kept
 * back, with a longer stretch when that block is the stretch's first.
 */
function nextBlock(list: BlockList): void {
  for (;;) {
    const rest = list.rest;
    if (!rest) return;
    rest.stretch ??= splitStretch(list.text, rest);
    const stretch = rest.stretch;
    const next = stretch.stream.next();
    if (!next.done && (stretch.complete || isDecided(stretch.source, next.value.start))) {
      const taken = stretch.pending;
      stretch.pending = next.value;
      if (!taken) continue;
      list.blocks.push(movedBlock(taken, -taken.start));
      list.starts.push(rest.from + taken.start);
      return;
    }
    if (next.done && stretch.complete) {
      const last = stretch.pending;
      if (last) {
        list.blocks.push(movedBlock(last, -last.start));
        list.starts.push(rest.from + last.start);
      }
      list.rest = undefined;
      return;
    }
    // The stretch ends before its last block is settled: read on from that block.
    const restart = stretch.pending?.start ?? 0;
    list.rest = restart > 0 ? { from: rest.from + restart, size: list.stretch } : { from: rest.from, size: rest.size * 2 };
  }
}

/** The stretch of text the split reads next: from `rest.from`, about `rest.size` characters, whole lines. */
function splitStretch(text: ChunkedText, rest: SplitRest): SplitStretch {
  // Front matter ends wherever its closing line is: a document that opens with it is split whole.
  const whole = rest.from === 0 && opensWithFrontMatterLine(text);
  const reach = rest.from + rest.size;
  const end = whole ? text.length : windowEndAt(text, reach);
  const source = sliceOf(text, rest.from, end);
  return { source, complete: end >= text.length, stream: markdownBlockStream(source, { atDocumentStart: rest.from === 0 }) };
}

/** Whether a block starting at `start` of `source` is settled there: its line and the next end inside `source`. */
function isDecided(source: string, start: number): boolean {
  const lineEnd = source.indexOf("\n", start);
  return lineEnd >= 0 && source.indexOf("\n", lineEnd + 1) >= 0;
}

/**
 * The next version's blocks after an edit, or undefined when it is best split afresh. The split
 * restarts at a block start whose line and the line after it lie before the edit (the split
 * decides a line's block looking one line ahead), and stops at the first block start after the
 * edit, on a line start in both versions, where the old version also had a block start: from a
 * block start the split depends only on the text after it, which the edit left alone.
 */
function editedList(old: BlockList, text: ChunkedText, stretch: number): BlockList | undefined {
  const change = changedStretch(old.text, text);
  if (!change) return old;
  if (change.oldEnd - change.start > LARGE_CHANGE || change.newEnd - change.start > LARGE_CHANGE) return undefined;
  const lineStart = lineStartAt(text, change.start);
  const lineBefore = lineStart > 0 ? lineStartAt(text, lineStart - 1) : 0;
  const before = lastIndexBefore(old.starts, lineBefore);
  const first = Math.max(0, before);
  // Front matter ends wherever its closing line is: an edit to it, or to a document that opens
  // with "---" and has none yet, is split afresh.
  if ((first === 0 || old.blocks[0]?.kind !== "frontMatter") && opensWithFrontMatterLine(text)) return undefined;
  const restart = before < 0 ? 0 : old.starts[before];
  const kept = { blocks: old.blocks.slice(0, first), starts: old.starts.slice(0, first) };
  // An old version not split to its end yet: the blocks it has are kept where the edit left
  // them alone, and the split goes on from where it stood.
  const frontier = old.rest ? splitFrontier(old.rest) : undefined;
  if (frontier !== undefined && lineBefore > frontier) {
    return { text, blocks: old.blocks.slice(), starts: old.starts.slice(), rest: { from: frontier, size: stretch }, stretch };
  }
  const delta = text.length - old.text.length;
  for (let span = 8192; ; span *= 2) {
    const reach = change.newEnd + span;
    const windowEnd = windowEndAt(text, reach);
    const complete = windowEnd >= text.length;
    const window = sliceOf(text, restart, windowEnd);
    const blocks = [...kept.blocks];
    const starts = [...kept.starts];
    for (const block of markdownBlockStream(window, { atDocumentStart: restart === 0 })) {
      const at = restart + block.start;
      if (at >= change.newEnd && block.start > 0 && window.charCodeAt(block.start - 1) === 0x0a) {
        const lineEnd = window.indexOf("\n", block.start);
        const decided = complete || (lineEnd >= 0 && window.indexOf("\n", lineEnd + 1) >= 0);
        const match = decided ? indexOf(old.starts, at - delta) : -1;
        if (match >= 0 && sliceOf(old.text, at - delta - 1, at - delta) === "\n") {
          for (let index = match; index < old.blocks.length; index++) {
            blocks.push(old.blocks[index]);
            starts.push(old.starts[index] + delta);
          }
          return frontier === undefined
            ? { text, blocks, starts, stretch }
            : { text, blocks, starts, rest: { from: frontier + delta, size: stretch }, stretch };
        }
        // Past where the old split had got to: the split goes on from this block.
        if (decided && frontier !== undefined && at - delta >= frontier)
          return { text, blocks, starts, rest: { from: at, size: stretch }, stretch };
      }
      blocks.push(movedBlock(block, -block.start));
      starts.push(at);
    }
    if (complete) return { text, blocks, starts, stretch };
  }
}

/** Whether the first line is "---", which opens front matter if a closing line follows anywhere. */
function opensWithFrontMatterLine(text: ChunkedText): boolean {
  return /^\uFEFF?---\s*$/.test(sliceOf(text, 0, Math.min(lineEndAt(text, 0), 4096)));
}

// ---------------------------------------------------------------------------------------------
// Reading blocks

/** `block` with every offset moved `by` characters. */
function movedBlock(block: MarkdownBlock, by: number): MarkdownBlock {
  if (by === 0) return block;
  const range = (item: { readonly start: number; readonly end: number }) => ({ start: item.start + by, end: item.end + by });
  switch (block.kind) {
    case "prose":
      return { kind: "prose", ...range(block) };
    case "frontMatter":
      return { kind: "frontMatter", ...range(block), values: block.values.map(range) };
    case "fence":
      return { ...block, ...range(block), bodyStart: block.bodyStart + by, bodyEnd: block.bodyEnd + by };
    case "table":
      return { kind: "table", ...range(block), lines: block.lines.map(range) };
  }
}

/**
 * Reads block `index` of `list` in the lines it starts and ends on (all a block's reading depends
 * on), with offsets from the block's start.
 */
function blockReading(list: BlockList, index: number, reader: BlockReader): BlockReading {
  const start = list.starts[index];
  const block = list.blocks[index];
  const from = lineStartAt(list.text, start);
  const source = sliceOf(list.text, from, lineEndAt(list.text, start + block.end));
  // The split decides a block's shape from its text: kind, place and text are all a reading depends on.
  const key = source.length < READING_BY_TEXT_LENGTH ? `${block.kind}\u0000${start - from}\u0000${block.end}\u0000${source}` : undefined;
  const known = key === undefined ? undefined : reader.byText.get(key);
  if (known) {
    reader.byText.delete(key!);
    reader.byText.set(key!, known);
    return known;
  }
  const placed = movedBlock(block, start - from);
  const sink: RecordSink = { occurrences: [], unreadable: [], records: [], reactions: [] };
  scanMarkdownBlock(source, placed, reader.read, sink);
  const model = modelOf(sink);
  const findings = checkDocument(model, undefined);
  const by = from - start;
  const reading = { model: shiftedModel(model, by), findings: by === 0 ? findings : findings.map((finding) => moved(finding, by)) };
  remember(reader.met, model.occurrences);
  if (key !== undefined) {
    reader.byText.set(key, reading);
    if (reader.byText.size > READINGS_BY_TEXT_KEPT) reader.byText.delete(reader.byText.keys().next().value as string);
  }
  return reading;
}

function modelOf(sink: RecordSink): DocumentModel {
  return {
    kind: "markdown",
    occurrences: [...sink.occurrences].sort((a, b) => a.range.start - b.range.start),
    records: sink.records,
    problems: [],
    unreadable: [...sink.unreadable].sort((a, b) => a.range.start - b.range.start),
    reactions: distinctReactions(sink.reactions ?? []),
  };
}

/**
 * The model of the lines around `start`..`end`, read as markdown of their own: for a request
 * about a place the first split has not reached yet, the answer the lines there give.
 */
function localModel(text: ChunkedText, start: number, end: number, read: SpeciesReader): DocumentModel {
  const from = lineStartAt(text, Math.max(0, start - LOCAL_READ));
  const to = lineEndAt(text, Math.min(text.length, end + LOCAL_READ));
  const source = sliceOf(text, from, to);
  const sink: RecordSink = { occurrences: [], unreadable: [], records: [], reactions: [] };
  for (const block of markdownBlocks(source, { atDocumentStart: from === 0 })) {
    if (block.end >= start - from && block.start <= end - from) scanMarkdownBlock(source, block, read, sink);
  }
  return shiftedModel(modelOf(sink), from);
}
