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
   * The stretch of whole parts that overlaps `start`..`end` (it reads alone as it reads in
   * place), for reading the model of a few records; undefined outside the list's parts.
   */
  around(start: number, end: number): { readonly start: number; readonly end: number } | undefined;
}

/** Reads successive versions of one document. */
export type ListReader = (text: ChunkedText) => ListVersion;

/** The remembered list of one version: part spans and their findings, relative to each start. */
export interface ListParts {
  readonly text: ChunkedText;
  /** Part `k` runs from `starts[k]` to `ends[k]` (its first and just past its last character). */
  readonly starts: Int32Array;
  readonly ends: Int32Array;
  readonly partFindings: (readonly Finding[])[];
  /** Findings before the list's parts (absolute) and after them (relative to `tail`). */
  readonly before: readonly Finding[];
  readonly after: readonly Finding[];
  /** Where the text after the last part starts. */
  readonly tail: number;
}

/** Shared by every part without findings. */
export const NO_FINDINGS: readonly Finding[] = [];

/**
 * A reader that keeps the last version's list: `edited` re-reads what an edit touched (undefined
 * when it cannot), `whole` reads the text the ordinary way, cut into parts when it can be.
 */
export function rememberingListReader<State extends ListParts>(
  edited: (last: State, text: ChunkedText) => State | undefined,
  whole: (text: ChunkedText) => State | { readonly findings: readonly Finding[] },
): ListReader {
  let last: State | undefined;
  return (text) => {
    const next = last && edited(last, text);
    if (next) {
      last = next;
      return versionOf(next);
    }
    const read = whole(text);
    last = "starts" in read ? read : undefined;
    return "starts" in read ? versionOf(read) : { findings: () => read.findings, around: () => undefined };
  };
}

function versionOf(state: ListParts): ListVersion {
  let findings: Finding[] | undefined;
  return {
    findings() {
      if (findings) return findings;
      findings = [...state.before];
      for (let index = 0; index < state.starts.length; index++) {
        for (const finding of state.partFindings[index]) findings.push(moved(finding, state.starts[index]));
      }
      for (const finding of state.after) findings.push(moved(finding, state.tail));
      return findings;
    },
    around(start, end) {
      const first = lastAtOrBefore(state.starts, start);
      if (first < 0 || start > state.ends[first]) return undefined;
      const lastIndex = Math.max(first, lastAtOrBefore(state.starts, end));
      return { start: state.starts[first], end: state.ends[lastIndex] };
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
