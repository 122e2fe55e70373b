/**
 * What the JSON and YAML list readers share: a version's list of parts (records), each with its
 * findings relative to its start, kept from one version to the next so that an edit re-reads
 * only the parts it touches (see `jsonParts.ts`, `yamlParts.ts`).
 */
import { sliceOf, type ChunkedText } from "./chunkedText";
import { moved } from "./tables/delimitedFindings";
import type { Finding } from "./types";

/** One version of a list of records, as far as its findings go. */
export interface ListVersion {
  /** The findings of the whole document, in document order. */
  findings(): readonly Finding[];
  /**
   * The same findings, worked out a few parts at a time: empty steps while parts are read, then
   * one step with them all. A caller that must stay responsive lets other work in between.
   */
  findingSteps(): Iterable<readonly Finding[]>;
  /** The findings that overlap `start`..`end`, reading only the parts there that are not read yet. */
  findingsAround(start: number, end: number): readonly Finding[];
  /**
   * The stretch of whole parts that overlaps `start`..`end` (it reads alone as it reads in
   * place), for reading the model of a few records; undefined outside the list's parts.
   */
  around(start: number, end: number): { readonly start: number; readonly end: number } | undefined;
  /** How many species mentions the document holds, once `findingSteps` has been read to the end. */
  speciesCount(): number;
  /**
   * Set while the findings wait on reading a large text whole (a part did not read cleanly: a
   * syntax error, mostly). The caller may do that reading elsewhere (see `wholeListReading`) and
   * hand it in; otherwise it is done here when the findings are asked for. Meanwhile the findings
   * and models around a place come from the parts there.
   */
  wholeReadWanted(): { readonly text: ChunkedText; settle(reading: WholeReading): void } | undefined;
}

/** Reads successive versions of one document. */
export type ListReader = (text: ChunkedText) => ListVersion;

/** What lies around the parts: findings before them (absolute) and after them (relative to `tail`). */
export interface ListFrame {
  readonly before: readonly Finding[];
  readonly after: readonly Finding[];
  /** How many species mentions lie around the parts. */
  readonly species: number;
}

/** What a run of parts reads as: each part's findings (relative to its start) and species count. */
export interface PartsReading {
  readonly findings: (readonly Finding[])[];
  readonly species: number[];
}

/** The remembered list of one version: part spans and their findings, relative to each start. */
export interface ListParts {
  readonly text: ChunkedText;
  /** Part `k` runs from `starts[k]` to `ends[k]` (its first and just past its last character). */
  readonly starts: Int32Array;
  readonly ends: Int32Array;
  /**
   * Each part's findings; undefined until the part is read. A file just opened is found out a
   * few parts at a time, and an edit meanwhile keeps what was read.
   */
  readonly partFindings: (readonly Finding[] | undefined)[];
  /** Each part's species mentions, set when its findings are. */
  readonly partSpecies: (number | undefined)[];
  /** The findings around the parts; undefined until read. */
  frame: ListFrame | undefined;
  /** Where the text after the last part starts. */
  readonly tail: number;
}

/** The plain reading of a text without a list of parts. */
export interface WholeReading {
  readonly findings: readonly Finding[];
  /** How many species mentions the text holds. */
  readonly species: number;
}

/** How one kind of document is read as a list of parts. */
export interface ListKind<State extends ListParts> {
  /** The state of an edited text from the last version's; undefined when it must be read afresh. */
  edited(last: State, text: ChunkedText): State | undefined;
  /** A text read afresh: its parts found by a quick pass (none read yet); undefined when the pass finds none. */
  opened(text: ChunkedText): State | undefined;
  /** A text its quick pass finds no list in, read whole: cut into its list's parts (all read) when it has one, or its findings. */
  openedWhole(text: ChunkedText): State | WholeReading;
  /** Parts `first`..`last` read in place, findings relative to each part's start; undefined when they do not read cleanly. */
  readParts(state: State, first: number, last: number): PartsReading | undefined;
  /** The text around the parts read; undefined when it does not read cleanly. */
  readFrame(state: State): ListFrame | undefined;
  /** The text read whole, the ordinary way: what a text whose parts do not read cleanly gives. */
  readWhole(text: ChunkedText): WholeReading;
}

/** Shared by every part without findings. */
export const NO_FINDINGS: readonly Finding[] = [];

/**
 * A broken text (one whose parts do not read cleanly) longer than this is not read whole on the
 * spot: that reading cannot be cut into steps, and a caller may do it elsewhere.
 */
export const READ_WHOLE_ELSEWHERE_FROM = 256 * 1024;

/**
 * A reader that keeps the last version's list: an edit re-reads what it touched, and a text read
 * afresh is read a few parts at a time as its findings are asked for, about `step` characters of
 * parts at a time. A broken text from `elsewhereFrom` characters is read whole only when its
 * findings are asked for (see `ListVersion.wholeReadWanted`).
 */
export function rememberingListReader<State extends ListParts>(
  kind: ListKind<State>,
  step: number,
  elsewhereFrom = READ_WHOLE_ELSEWHERE_FROM,
): ListReader {
  let last: State | undefined;
  // The last state whose parts all read cleanly: a text broken by a keystroke and mended by the
  // next is read from it, as an edit of the text before the break, not afresh.
  let trusted: State | undefined;
  const reading: StateReading<State> = {
    forget(state) {
      if (last === state) last = undefined;
      if (trusted === state) trusted = undefined;
    },
    verified(state) {
      trusted = state;
    },
  };
  return (text) => {
    const next = (last && kind.edited(last, text)) || (trusted && trusted !== last ? kind.edited(trusted, text) : undefined);
    if (next) {
      last = next;
      return versionOf(next, kind, reading, step, elsewhereFrom);
    }
    const opened = kind.opened(text);
    if (opened) {
      last = opened;
      return versionOf(opened, kind, reading, step, elsewhereFrom);
    }
    last = undefined;
    const readWhole = (): ListVersion => {
      const whole = kind.openedWhole(text);
      if (!("starts" in whole)) return wholeVersion(whole);
      last = whole;
      return versionOf(whole, kind, reading, step, elsewhereFrom);
    };
    // A large text with no list the quick pass can find (mostly one a keystroke broke) waits for
    // its whole reading, which may be done elsewhere, as a broken list's does.
    return text.length >= elsewhereFrom ? waitingVersion(text, readWhole) : readWhole();
  };
}

/** What a version tells its reader about its state once read. */
interface StateReading<State> {
  /** A part did not read cleanly: the state must not be edited further. */
  forget(state: State): void;
  /** Every part read cleanly. */
  verified(state: State): void;
}

function wholeVersion(reading: WholeReading): ListVersion {
  const { findings } = reading;
  return {
    findings: () => findings,
    *findingSteps() {
      yield findings;
    },
    findingsAround: (start, end) => overlapping(findings, start, end),
    around: () => undefined,
    speciesCount: () => reading.species,
    wholeReadWanted: () => undefined,
  };
}

/**
 * A version read whole only when its findings are asked for, unless a caller hands in that
 * reading first (see `ListVersion.wholeReadWanted`); meanwhile requests about a place find nothing.
 */
function waitingVersion(text: ChunkedText, readWhole: () => ListVersion): ListVersion {
  let settled: WholeReading | undefined;
  let read: ListVersion | undefined;
  const done = (): ListVersion => (read ??= settled ? wholeVersion(settled) : readWhole());
  return {
    findings: () => done().findings(),
    *findingSteps() {
      if (!settled && !read) yield NO_FINDINGS;
      yield* done().findingSteps();
    },
    findingsAround: (start, end) => (read || settled ? done().findingsAround(start, end) : []),
    around: (start, end) => read?.around(start, end),
    speciesCount: () => done().speciesCount(),
    wholeReadWanted() {
      if (settled || read) return undefined;
      return {
        text,
        settle(reading) {
          settled ??= reading;
        },
      };
    },
  };
}

function overlapping(findings: readonly Finding[], start: number, end: number): Finding[] {
  return findings.filter((finding) => finding.range.end >= start && finding.range.start <= end);
}

/**
 * A version of `state`, whose unread parts are read as they are needed. Should a part not read
 * cleanly, the state is forgotten (the next edit reads afresh too) and the text is read whole:
 * at once when it is short, otherwise when its findings are asked for, unless a caller did it
 * elsewhere first.
 */
function versionOf<State extends ListParts>(
  state: State,
  kind: ListKind<State>,
  reading: StateReading<State>,
  step: number,
  elsewhereFrom: number,
): ListVersion {
  const count = state.starts.length;
  // A short text is read whole before any request about a place is answered: only a clean text
  // (which a large one must be read through to know) answers from the parts there as it would whole.
  const large = state.text.length >= elsewhereFrom;
  let all: readonly Finding[] | undefined;
  /** Set once a part did not read cleanly. */
  let broken = false;
  /** The plain reading, once the text is broken and has been read whole. */
  let whole: WholeReading | undefined;
  const setAside = (): boolean => broken && !whole && large;
  const wholeReading = (): WholeReading => (whole ??= kind.readWhole(state.text));
  const fail = (): false => {
    reading.forget(state);
    broken = true;
    if (!setAside()) wholeReading();
    return false;
  };
  const frameRead = (): boolean => {
    if (broken) return false;
    if (state.frame) return true;
    const frame = kind.readFrame(state);
    if (!frame) return fail();
    state.frame = frame;
    return true;
  };
  /** Reads the unread parts from `first` to `last`, in runs; false once one did not read cleanly. */
  const partsRead = (first: number, last: number): boolean => {
    let from = first;
    while (from <= last) {
      if (broken) return false;
      if (state.partFindings[from] !== undefined) {
        from++;
        continue;
      }
      let to = from;
      while (to < last && state.partFindings[to + 1] === undefined) to++;
      if (!keep(from, to, kind.readParts(state, from, to))) return fail();
      from = to + 1;
    }
    return !broken;
  };
  /** Keeps what parts `first`..`last` read as; false when they did not read cleanly. */
  const keep = (first: number, last: number, found: PartsReading | undefined): boolean => {
    if (!found || found.findings.length !== last - first + 1) return false;
    for (let index = 0; index < found.findings.length; index++) {
      state.partFindings[first + index] = found.findings[index].length === 0 ? NO_FINDINGS : found.findings[index];
      state.partSpecies[first + index] = found.species[index];
    }
    return true;
  };
  /** Reads everything a step at a time. */
  function* steps(): Generator<void> {
    if (!frameRead()) return;
    let first = 0;
    while (first < count) {
      let last = first;
      while (last + 1 < count && state.ends[last + 1] - state.starts[first] <= step) last++;
      if (!partsRead(first, last)) return;
      first = last + 1;
      if (first < count) yield;
    }
  }
  const findings = (): readonly Finding[] => {
    if (all) return all;
    for (const _ of steps());
    if (broken) return wholeReading().findings;
    const placed: Finding[] = [...state.frame!.before];
    for (let index = 0; index < count; index++) {
      for (const finding of state.partFindings[index]!) placed.push(moved(finding, state.starts[index]));
    }
    for (const finding of state.frame!.after) placed.push(moved(finding, state.tail));
    all = placed;
    reading.verified(state);
    return all;
  };
  /** The findings of the parts `from`..`to` that read cleanly alone, and of the frame when it did: a broken text's, meanwhile. */
  const cleanFindingsOf = (from: number, to: number): Finding[] => {
    const found: Finding[] = state.frame ? [...state.frame.before] : [];
    for (let index = from; index <= to; index++) {
      if (state.partFindings[index] === undefined && !keep(index, index, kind.readParts(state, index, index))) continue;
      for (const finding of state.partFindings[index]!) found.push(moved(finding, state.starts[index]));
    }
    if (state.frame) for (const finding of state.frame.after) found.push(moved(finding, state.tail));
    return found;
  };
  return {
    findings,
    *findingSteps() {
      if (!all && !broken) {
        for (const _ of steps()) yield NO_FINDINGS;
      }
      // A step in which the caller may read the broken text elsewhere.
      if (setAside()) yield NO_FINDINGS;
      yield findings();
    },
    findingsAround(start, end) {
      if (!large) findings();
      if (all || whole) return overlapping(all ?? whole!.findings, start, end);
      const from = Math.max(0, lastAtOrBefore(state.starts, start));
      const to = Math.max(from, lastAtOrBefore(state.starts, end));
      // Reading the parts there may find the text broken (and set aside, being large): then the
      // records there that read cleanly alone answer meanwhile.
      if (!broken && frameRead()) partsRead(from, to);
      return overlapping(cleanFindingsOf(from, to), start, end);
    },
    around(start, end) {
      if (!large) findings();
      if (whole) return undefined;
      const first = lastAtOrBefore(state.starts, start);
      if (first < 0 || start > state.ends[first]) return undefined;
      const last = Math.max(first, lastAtOrBefore(state.starts, end));
      return { start: state.starts[first], end: state.ends[last] };
    },
    speciesCount() {
      if (!all) findings();
      if (broken) return wholeReading().species;
      let species = state.frame!.species;
      for (let index = 0; index < count; index++) species += state.partSpecies[index]!;
      return species;
    },
    wholeReadWanted() {
      if (!setAside()) return undefined;
      return {
        text: state.text,
        settle(reading) {
          whole ??= reading;
        },
      };
    },
  };
}

/**
 * Where two versions differ: from `start`, `oldEnd` in the old text and `newEnd` in the new one;
 * undefined when they are the same. Chunks both share are skipped without reading them.
 */
export function changedStretch(before: ChunkedText, after: ChunkedText): { start: number; oldEnd: number; newEnd: number } | undefined {
  const oldChunks = before.chunks;
  const newChunks = after.chunks;
  const shorter = Math.min(oldChunks.length, newChunks.length);
  let head = 0;
  while (head < shorter && oldChunks[head] === newChunks[head]) head++;
  let back = 0;
  while (back < shorter - head && oldChunks[oldChunks.length - 1 - back] === newChunks[newChunks.length - 1 - back]) back++;
  if (head === oldChunks.length && head === newChunks.length) return undefined;
  const from = before.starts[head];
  const oldText = sliceOf(before, from, before.starts[oldChunks.length - back]);
  const newText = sliceOf(after, from, after.starts[newChunks.length - back]);
  // Narrowed to the characters that differ.
  const common = Math.min(oldText.length, newText.length);
  let same = 0;
  while (same < common && oldText.charCodeAt(same) === newText.charCodeAt(same)) same++;
  let sameAtEnd = 0;
  while (
    sameAtEnd < common - same &&
    oldText.charCodeAt(oldText.length - 1 - sameAtEnd) === newText.charCodeAt(newText.length - 1 - sameAtEnd)
  ) {
    sameAtEnd++;
  }
  if (same === oldText.length && same === newText.length) return undefined;
  return { start: from + same, oldEnd: from + oldText.length - sameAtEnd, newEnd: from + newText.length - sameAtEnd };
}

/** The index of the last of the ascending `values` at or before `at`; -1 when none is. */
export function lastAtOrBefore(values: ArrayLike<number>, at: number): number {
  let low = 0;
  let high = values.length;
  while (low < high) {
    const middle = (low + high) >> 1;
    if (values[middle] <= at) low = middle + 1;
    else high = middle;
  }
  return low - 1;
}

/** How many of `mentions` fall in each part (by where they start), and how many around the parts. */
export function speciesPerPart(
  mentions: Iterable<{ readonly range: { readonly start: number } }>,
  starts: ArrayLike<number>,
  ends: ArrayLike<number>,
): { readonly inside: number[]; readonly around: number } {
  const inside = new Array<number>(starts.length).fill(0);
  let around = 0;
  for (const mention of mentions) {
    const index = lastAtOrBefore(starts, mention.range.start);
    if (index >= 0 && mention.range.start < ends[index]) inside[index]++;
    else around++;
  }
  return { inside, around };
}
