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
}

/** Reads successive versions of one document. */
export type ListReader = (text: ChunkedText) => ListVersion;

/** What lies around the parts: findings before them (absolute) and after them (relative to `tail`). */
export interface ListFrame {
  readonly before: readonly Finding[];
  readonly after: readonly Finding[];
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
  /** The findings around the parts; undefined until read. */
  frame: ListFrame | undefined;
  /** Where the text after the last part starts. */
  readonly tail: number;
}

/** The plain reading of a text without a list of parts. */
export interface WholeReading {
  readonly findings: readonly Finding[];
}

/** How one kind of document is read as a list of parts. */
export interface ListKind<State extends ListParts> {
  /** The state of an edited text from the last version's; undefined when it must be read afresh. */
  edited(last: State, text: ChunkedText): State | undefined;
  /** A text read afresh: its parts found (none read yet), or its findings when it has no such list. */
  opened(text: ChunkedText): State | WholeReading;
  /** Parts `first`..`last` read in place, findings relative to each part's start; undefined when they do not read cleanly. */
  readParts(state: State, first: number, last: number): (readonly Finding[])[] | undefined;
  /** The text around the parts read; undefined when it does not read cleanly. */
  readFrame(state: State): ListFrame | undefined;
  /** The text read whole, the ordinary way: what a text whose parts do not read cleanly gives. */
  readWhole(text: ChunkedText): readonly Finding[];
}

/** Shared by every part without findings. */
export const NO_FINDINGS: readonly Finding[] = [];

/**
 * A reader that keeps the last version's list: an edit re-reads what it touched, and a text read
 * afresh is read a few parts at a time as its findings are asked for, about `step` characters of
 * parts at a time.
 */
export function rememberingListReader<State extends ListParts>(kind: ListKind<State>, step: number): ListReader {
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
      return versionOf(next, kind, reading, step);
    }
    const opened = kind.opened(text);
    if (!("starts" in opened)) {
      last = undefined;
      return wholeVersion(opened.findings);
    }
    last = opened;
    return versionOf(opened, kind, reading, step);
  };
}

/** What a version tells its reader about its state once read. */
interface StateReading<State> {
  /** A part did not read cleanly: the state must not be edited further. */
  forget(state: State): void;
  /** Every part read cleanly. */
  verified(state: State): void;
}

function wholeVersion(findings: readonly Finding[]): ListVersion {
  return {
    findings: () => findings,
    *findingSteps() {
      yield findings;
    },
    findingsAround: (start, end) => overlapping(findings, start, end),
    around: () => undefined,
  };
}

function overlapping(findings: readonly Finding[], start: number, end: number): Finding[] {
  return findings.filter((finding) => finding.range.end >= start && finding.range.start <= end);
}

/**
 * A version of `state`, whose unread parts are read as they are needed. Should a part not read
 * cleanly, the text is read whole and the state is forgotten (the next edit reads afresh too).
 */
function versionOf<State extends ListParts>(state: State, kind: ListKind<State>, reading: StateReading<State>, step: number): ListVersion {
  const count = state.starts.length;
  let all: readonly Finding[] | undefined;
  /** The plain reading, once a part did not read cleanly. */
  let whole: readonly Finding[] | undefined;
  const fail = (): false => {
    reading.forget(state);
    whole = kind.readWhole(state.text);
    return false;
  };
  const frameRead = (): boolean => {
    if (whole) return false;
    if (state.frame) return true;
    const frame = kind.readFrame(state);
    if (!frame) return fail();
    state.frame = frame;
    return true;
  };
  /** Reads the unread parts from `first` to `last`; false once the text is read whole. */
  const partsRead = (first: number, last: number): boolean => {
    let from = first;
    while (from <= last) {
      if (whole) return false;
      if (state.partFindings[from] !== undefined) {
        from++;
        continue;
      }
      let to = from;
      while (to < last && state.partFindings[to + 1] === undefined) to++;
      const found = kind.readParts(state, from, to);
      if (!found || found.length !== to - from + 1) return fail();
      for (let index = 0; index < found.length; index++)
        state.partFindings[from + index] = found[index].length === 0 ? NO_FINDINGS : found[index];
      from = to + 1;
    }
    return !whole;
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
    if (whole) return whole;
    const placed: Finding[] = [...state.frame!.before];
    for (let index = 0; index < count; index++) {
      for (const finding of state.partFindings[index]!) placed.push(moved(finding, state.starts[index]));
    }
    for (const finding of state.frame!.after) placed.push(moved(finding, state.tail));
    all = placed;
    reading.verified(state);
    return all;
  };
  const around = (start: number, end: number): { first: number; last: number } | undefined => {
    const first = lastAtOrBefore(state.starts, start);
    if (first < 0 || start > state.ends[first]) return undefined;
    return { first, last: Math.max(first, lastAtOrBefore(state.starts, end)) };
  };
  return {
    findings,
    *findingSteps() {
      if (!all && !whole) {
        for (const _ of steps()) yield NO_FINDINGS;
      }
      yield findings();
    },
    findingsAround(start, end) {
      if (all || whole) return overlapping(all ?? whole!, start, end);
      if (!frameRead()) return overlapping(whole!, start, end);
      const from = Math.max(0, lastAtOrBefore(state.starts, start));
      const to = Math.max(from, lastAtOrBefore(state.starts, end));
      if (!partsRead(from, to)) return overlapping(whole!, start, end);
      const found: Finding[] = [...state.frame!.before];
      for (let index = from; index <= to; index++) {
        for (const finding of state.partFindings[index]!) found.push(moved(finding, state.starts[index]));
      }
      for (const finding of state.frame!.after) found.push(moved(finding, state.tail));
      return overlapping(found, start, end);
    },
    around(start, end) {
      if (whole) return undefined;
      const parts = around(start, end);
      return parts && { start: state.starts[parts.first], end: state.ends[parts.last] };
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
