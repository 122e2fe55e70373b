/**
 * Plain text (and LaTeX, AsciiDoc, reStructuredText, cut by their own blocks) analysed version after version: the text is cut into the units of `plainTextUnits`
 * (paragraphs and literal blocks), and an edit cuts again only from a paragraph start before it to
 * the first paragraph start after it where the new cut meets the old one; the units before and
 * after are the last version's, moved. Each unit is read from its own text, with offsets from its
 * own start, and with the carry `plainTextSteps` hands it (an HTML comment still open from the
 * unit before; ids numbered 1 in the paragraphs near it). A reading is kept with the carry it was
 * read under and is used again while that carry is unchanged: an edit that opens or closes a
 * comment re-reads onward for as long as the comment state out of a unit changes.
 */
import { analyzeDocument, distinctReactions } from "./analyzeDocument";
import { documentChecker } from "./checkDocument";
import type { Reaction } from "./reactions/reactionTypes";
import { sliceOf, type ChunkedText } from "./chunkedText";
import type { DocumentAnalysis } from "./incrementalAnalysis";
import {
  hasSeriesNear,
  NO_IDS,
  plainTextUnits,
  plainTextUnitSteps,
  SERIES_REACH,
  seriesFirstIds,
  type PlainTextUnit,
  type UnitsNear,
} from "./scanPlainText";
import {
  changedStretch,
  cutUpTo,
  hasSegment,
  indexOf as indexOfStart,
  LARGE_CHANGE,
  lastIndexBefore,
  lineEndAt,
  lineStartAt,
  remember,
  segmentedAnalysis,
  windowEndAt,
  type SegmentCut,
  type SegmentReading,
} from "./segmentedAnalysis";
import { shiftedModel } from "./shiftedModel";
import type { SpeciesReader } from "./speciesReader";
import type { RecordSink } from "./tables/records";
import type { DocumentModel, Finding, SpeciesOccurrence, TextMarkup, UnreadableSpecies } from "./types";

/** A unit with offsets from its own start. The same object in the next version when an edit left it alone. */
interface Unit {
  readonly kind: PlainTextUnit["kind"];
  readonly length: number;
}

/** What one unit yields, with offsets from the unit's start, and the carry it was read under. */
interface UnitReading extends SegmentReading {
  readonly commentIn: boolean;
  /** The series lookups the reading made, and their answers. */
  readonly asked: ReadonlyMap<string, boolean>;
  readonly commentOut: boolean;
}

/** One version's units and where each starts. */
interface UnitList {
  readonly text: ChunkedText;
  readonly units: Unit[];
  readonly starts: number[];
  /** The cut still to be made, from a paragraph start to the end of the text. */
  rest?: RestToCut;
  /** Whether a comment is open where each unit ends, as far as worked out (a prefix of the units). */
  readonly commentOut: boolean[];
}

/** The cut still to be made: units cut from a window of the text and not yet taken, and where the next window starts. */
interface RestToCut {
  from: number;
  queue?: PlainTextUnit[];
}

/**
 * How many chunks of text the cut reads at a time (64 KB at the usual chunk size), so that a
 * request near the start does not copy the whole text.
 */
const CUT_WINDOW_CHUNKS = 4;

/** A request this far past where the reading in order has got to is answered from the lines around it. */
const FAR_AHEAD = 32 * 1024;
/** How much text around a position is read when the reading has not got there yet. */
const LOCAL_READ = 2048;
/**
 * A unit longer than this many chunks of text (64 KB at the usual chunk size; a log without blank
 * lines) hands out its findings a part at a time on its first reading, one part for as many
 * mentions as a chunk has characters over four (4,096, as `findingsInParts` does).
 */
const LONG_UNIT_CHUNKS = 4;

/** What readings are kept across versions. */
interface UnitCaches {
  /** The document's kind: plain text, or the markup whose blocks the cut knows. */
  readonly markup: TextMarkup;
  readonly read: SpeciesReader;
  readonly readings: WeakMap<Unit, UnitReading>;
  readonly ids: WeakMap<Unit, ReadonlySet<string>>;
  /** One occurrence of each distinct species text read so far, in any version (bounded). */
  readonly met: Map<string, SpeciesOccurrence>;
}

/** Analyses successive versions of one plain-text (or `markup`) document, reusing the units an edit left alone. */
export function plainTextAnalyser(read: SpeciesReader, markup: TextMarkup = "plaintext"): (text: ChunkedText) => DocumentAnalysis {
  const caches: UnitCaches = { markup, read, readings: new WeakMap(), ids: new WeakMap(), met: new Map() };
  let last: UnitList | undefined;
  return (text) => {
    const list: UnitList = (last && editedList(last, text, markup)) ?? {
      text,
      units: [],
      starts: [],
      rest: { from: 0 },
      commentOut: [],
    };
    last = list;
    return analysisOf(list, caches);
  };
}

function analysisOf(list: UnitList, caches: UnitCaches): DocumentAnalysis {
  const { units, starts } = list;
  const cut: SegmentCut = {
    starts,
    lengthOf: (index) => units[index].length,
    more: () => list.rest !== undefined,
    next: () => nextUnit(list, caches.markup),
  };
  const near: UnitsNear = {
    get count() {
      return units.length;
    },
    startOf: (index) => starts[index],
    endOf: (index) => starts[index] + units[index].length,
    idsOf: (index) => idsOf(list, index, caches),
  };
  /** The reading of unit `index` under the carry it has in this version. */
  const readingOf = (index: number): UnitReading => {
    const known = validReading(index);
    if (known) return known;
    const reading = unitReading(list, index, commentBefore(index), (symbol) => seriesNear(index, symbol), caches);
    caches.readings.set(units[index], reading);
    return reading;
  };
  /** The reading of unit `index` kept from before, if it was read under the carry it has now. */
  const validReading = (index: number): UnitReading | undefined => {
    const known = caches.readings.get(units[index]);
    return known && known.commentIn === commentBefore(index) && stillAnswers(known.asked, index) ? known : undefined;
  };
  const seriesNear = (index: number, symbol: string): boolean => {
    cutUpTo(cut, starts[index] + units[index].length + SERIES_REACH);
    return hasSeriesNear(near, index, symbol);
  };
  const stillAnswers = (asked: ReadonlyMap<string, boolean>, index: number): boolean => {
    for (const [symbol, answer] of asked) if (seriesNear(index, symbol) !== answer) return false;
    return true;
  };
  /** Whether a comment is open where unit `index` starts: the units before are read in order as far as needed. */
  const commentBefore = (index: number): boolean => {
    const outs = list.commentOut;
    while (outs.length < index) outs.push(readingOf(outs.length).commentOut);
    return index === 0 ? false : outs[index - 1];
  };
  /** Whether the reading in order has got near `offset`, or a request there is best answered from the lines around it. */
  const farAhead = (offset: number): boolean => {
    const reached = list.commentOut.length;
    const from =
      reached < units.length ? starts[reached] : list.rest ? (units.length > 0 ? starts[units.length - 1] : 0) : list.text.length;
    return offset - from > FAR_AHEAD && !cheaplyReached(offset);
  };
  /** Goes on reading in order while the units are already read under the same carry, up to `offset`. */
  const cheaplyReached = (offset: number): boolean => {
    for (;;) {
      const index = list.commentOut.length;
      if (!hasSegment(cut, index) || starts[index] > offset) return true;
      const known = caches.readings.get(units[index]);
      const commentIn = index === 0 ? false : list.commentOut[index - 1];
      if (!known || known.commentIn !== commentIn) return false;
      list.commentOut.push(readingOf(index).commentOut);
    }
  };
  return segmentedAnalysis(caches.markup, {
    cut,
    readingOf,
    farAhead,
    localModel: (start, end) => localModel(list.text, start, end, caches),
    distinctSpecies: () => [...caches.met.values()],
    partsOf(index) {
      // A long unit not read yet: its findings a part at a time, so the caller may stop early.
      if (units[index].length <= LONG_UNIT_CHUNKS * list.text.chunkTarget || validReading(index)) return undefined;
      return longUnitParts(index);
    },
  });
  function* longUnitParts(index: number): Generator<readonly Finding[]> {
    const partSize = Math.max(16, list.text.chunkTarget / 4);
    const parts = unitReadingInParts(list, index, commentBefore(index), (symbol) => seriesNear(index, symbol), caches, partSize);
    let step = parts.next();
    for (; !step.done; step = parts.next()) yield step.value;
    caches.readings.set(units[index], step.value);
  }
}

function idsOf(list: UnitList, index: number, caches: UnitCaches): ReadonlySet<string> {
  const unit = list.units[index];
  if (unit.kind !== "prose") return NO_IDS;
  let ids = caches.ids.get(unit);
  if (!ids) {
    ids = seriesFirstIds(sliceOf(list.text, list.starts[index], list.starts[index] + unit.length));
    caches.ids.set(unit, ids);
  }
  return ids;
}

/** Reads unit `index` from its own text under the carry given, with offsets from the unit's start. */
function unitReading(
  list: UnitList,
  index: number,
  commentIn: boolean,
  seriesNear: (symbol: string) => boolean,
  caches: UnitCaches,
): UnitReading {
  const parts = unitReadingInParts(list, index, commentIn, seriesNear, caches, Infinity);
  for (let step = parts.next(); ; step = parts.next()) if (step.done) return step.value;
}

/**
 * `unitReading` a part at a time: yields the findings of each stretch the scan has moved past
 * (every `partSize` mentions), and returns the whole reading when the unit is done. A long
 * paragraph (a log with no blank line) is so read only as far as the caller takes its findings.
 */
function* unitReadingInParts(
  list: UnitList,
  index: number,
  commentIn: boolean,
  seriesNear: (symbol: string) => boolean,
  caches: UnitCaches,
  partSize: number,
): Generator<readonly Finding[], UnitReading, void> {
  const start = list.starts[index];
  const unit = list.units[index];
  const source = sliceOf(list.text, start, start + unit.length);
  const asked = new Map<string, boolean>();
  const carry = {
    commentOpen: commentIn,
    seriesNearby: (symbol: string): boolean => {
      const answer = seriesNear(symbol);
      asked.set(symbol, answer);
      return answer;
    },
  };
  const sink: RecordSink = { occurrences: [], unreadable: [], records: [], reactions: [] };
  const occurrences: SpeciesOccurrence[] = [];
  const unreadable: UnreadableSpecies[] = [];
  const reactions: Reaction[] = [];
  const findings: Finding[] = [];
  const check = documentChecker();
  /** The findings of what the scan has found before `limit`, moved into the unit's model. */
  const partBefore = (limit: number): Finding[] => {
    const part: DocumentModel = {
      kind: caches.markup,
      occurrences: takenBefore(sink.occurrences, limit).sort((a, b) => a.range.start - b.range.start),
      records: [],
      problems: [],
      unreadable: takenBefore(sink.unreadable, limit).sort((a, b) => a.range.start - b.range.start),
      reactions: distinctReactions(takenBefore(sink.reactions!, limit)),
    };
    occurrences.push(...part.occurrences);
    unreadable.push(...(part.unreadable ?? []));
    reactions.push(...(part.reactions ?? []));
    remember(caches.met, part.occurrences);
    const found = check(part);
    findings.push(...found);
    return found;
  };
  for (const resumeAt of plainTextUnitSteps(source, unit.kind, caches.markup, caches.read, sink, partSize, carry)) {
    const part = partBefore(resumeAt);
    if (part.length > 0) yield part;
  }
  const rest = partBefore(Infinity);
  if (rest.length > 0) yield rest;
  const model: DocumentModel = { kind: caches.markup, occurrences, records: [], problems: [], unreadable, reactions };
  return { commentIn, asked, commentOut: carry.commentOpen, model, findings };
}

/** Removes from `items` and returns those that start before `limit` (the scan adds them mostly in order). */
function takenBefore<T extends { readonly range: { readonly start: number } }>(items: T[], limit: number): T[] {
  if (items.every((item) => item.range.start < limit)) return items.splice(0, items.length);
  const taken = items.filter((item) => item.range.start < limit);
  let kept = 0;
  for (const item of items) if (item.range.start >= limit) items[kept++] = item;
  items.length = kept;
  return taken;
}

/**
 * The model of the lines around `start`..`end`, read as plain text of their own: for a request
 * about a place the reading in order has not reached yet, the answer the lines there give.
 */
function localModel(text: ChunkedText, start: number, end: number, caches: UnitCaches): DocumentModel {
  const from = lineStartAt(text, Math.max(0, start - LOCAL_READ));
  const to = lineEndAt(text, Math.min(text.length, end + LOCAL_READ));
  return shiftedModel(analyzeDocument(sliceOf(text, from, to), caches.markup, caches.read), from);
}

// ---------------------------------------------------------------------------------------------
// The cut

function nextUnit(list: UnitList, markup: TextMarkup): void {
  const rest = list.rest;
  if (!rest) return;
  if (!rest.queue || rest.queue.length === 0) cutWindow(list.text, rest, markup);
  const next = rest.queue?.shift();
  if (!next) {
    list.rest = undefined;
    return;
  }
  list.units.push({ kind: next.kind, length: next.end - next.start });
  list.starts.push(next.start);
}

/**
 * Cuts the units from `rest.from` in a window of the text: the units before the last paragraph
 * that starts in the window with its first line whole (as far as the cut of the lines before it
 * looks), or all of them when the window reaches the end. A window with no such paragraph grows.
 */
function cutWindow(text: ChunkedText, rest: RestToCut, markup: TextMarkup): void {
  for (let span = CUT_WINDOW_CHUNKS * text.chunkTarget; ; span *= 2) {
    const reach = rest.from + span;
    const windowEnd = windowEndAt(text, reach);
    const window = sliceOf(text, rest.from, windowEnd);
    const units = [...plainTextUnits(window, markup)].map((unit) => ({
      ...unit,
      start: unit.start + rest.from,
      end: unit.end + rest.from,
    }));
    if (windowEnd >= text.length) {
      rest.queue = units;
      rest.from = text.length;
      return;
    }
    for (let index = units.length - 1; index > 0; index--) {
      const local = units[index].start - rest.from;
      if (units[index].kind === "prose" && window.indexOf("\n", local) >= 0) {
        rest.queue = units.slice(0, index);
        rest.from = units[index].start;
        return;
      }
    }
  }
}

/**
 * The next version's units after an edit, or undefined when it is best cut afresh. The cut
 * restarts at a paragraph start whose first line, line break included, lies before the edit (the
 * cut of the lines before it looks no further than that line), and stops at the first paragraph
 * start after the edit where the old version also had one: from a paragraph start the cut depends
 * only on the text after it, which the edit left alone.
 */
function editedList(old: UnitList, text: ChunkedText, markup: TextMarkup): UnitList | undefined {
  const change = changedStretch(old.text, text);
  if (!change) return old;
  if (change.oldEnd - change.start > LARGE_CHANGE || change.newEnd - change.start > LARGE_CHANGE) return undefined;
  let first = lastIndexBefore(old.starts, change.start + 1);
  while (first >= 0 && (old.units[first].kind !== "prose" || lineEndAt(old.text, old.starts[first]) >= change.start)) first--;
  const restart = first < 0 ? 0 : old.starts[first];
  const kept = Math.max(0, first);
  const units = old.units.slice(0, kept);
  const starts = old.starts.slice(0, kept);
  // A unit's comment state out depends on its text and the state in alone: the kept units' stand.
  const commentOut = old.commentOut.slice(0, kept);
  // An old version cut only part of the way, and edited past that part: cut on from the restart.
  const lastKnown = old.starts.length - 1;
  if (old.rest && (lastKnown < 0 || change.start >= old.starts[lastKnown]))
    return { text, units, starts, commentOut, rest: { from: restart } };
  const delta = text.length - old.text.length;
  // Half a chunk past the edit first (8 KB at the usual chunk size), then twice as far, and so on.
  for (let span = Math.max(64, text.chunkTarget / 2); ; span *= 2) {
    const reach = change.newEnd + span;
    const windowEnd = windowEndAt(text, reach);
    const complete = windowEnd >= text.length;
    const window = sliceOf(text, restart, windowEnd);
    const newUnits = [...units];
    const newStarts = [...starts];
    for (const unit of plainTextUnits(window, markup)) {
      const at = restart + unit.start;
      // The unit's first line is whole in the window: what decided that a paragraph starts here.
      if (unit.kind === "prose" && unit.start > 0 && at >= change.newEnd && (complete || window.indexOf("\n", unit.start) >= 0)) {
        const match = indexOfStart(old.starts, at - delta);
        if (match >= 0 && old.units[match].kind === "prose") {
          // The old units from here on, as far as the old cut had got: the cut goes on from its last paragraph.
          let end = old.units.length;
          if (old.rest) while (old.units[--end].kind !== "prose");
          for (let index = match; index < end; index++) {
            newUnits.push(old.units[index]);
            newStarts.push(old.starts[index] + delta);
          }
          const rest = old.rest ? { from: old.starts[end] + delta } : undefined;
          return { text, units: newUnits, starts: newStarts, commentOut, rest };
        }
        // Past where the old cut had got: nothing more to meet.
        if (old.rest && at - delta > old.starts[lastKnown])
          return { text, units: newUnits, starts: newStarts, commentOut, rest: { from: at } };
      }
      newUnits.push({ kind: unit.kind, length: unit.end - unit.start });
      newStarts.push(at);
    }
    if (complete) return { text, units: newUnits, starts: newStarts, commentOut };
  }
}
