/**
 * A JSON document of records edited again and again: most such files are one long list of
 * records (`[{...}, {...}]`, or `{"records": [...]}`), and an edit inside one record leaves the
 * rest of the list alone. So each version's list elements are remembered with their findings,
 * and an edit re-reads only the elements it touches, through the same reader and checks
 * (`analyzeDocument`, `checkDocument`) as a whole-document analysis.
 *
 * This is sound only while the text is valid JSON: then the characters around the re-read
 * elements are the same separators as before, and elements that read cleanly on their own read
 * the same inside the document. A version with a syntax error anywhere, an edit outside the list
 * (or to its brackets and the commas at its ends), or re-read elements that are not clean JSON
 * on their own are all read whole, the ordinary way.
 */
import { parseTree, type Node, type ParseError } from "jsonc-parser/lib/esm/main.js";
import { analyzeDocument } from "./analyzeDocument";
import { checkDocument } from "./checkDocument";
import { sliceOf, wholeText, type ChunkedText } from "./chunkedText";
import type { SpeciesReader } from "./speciesReader";
import { JSON_PARSE_OPTIONS } from "./tables/json";
import { moved } from "./tables/delimitedFindings";
import type { Finding } from "./types";

/** One version of a JSON list of records, as far as its findings go. */
export interface JsonListVersion {
  /** The findings of the whole document, in document order. */
  findings(): readonly Finding[];
  /**
   * The stretch of whole list elements that overlaps `start`..`end`, for reading the model of a
   * few records; undefined when that place lies outside the list's elements.
   */
  elementsAround(start: number, end: number): { readonly start: number; readonly end: number } | undefined;
}

/** Reads successive versions of one JSON document. */
export type JsonListReader = (text: ChunkedText) => JsonListVersion;

/** The remembered list of one version: element spans and their findings, relative to each start. */
interface ListState {
  readonly text: ChunkedText;
  /** Element `k` runs from `starts[k]` to `ends[k]` (its first and just past its last character). */
  readonly starts: Int32Array;
  readonly ends: Int32Array;
  readonly elementFindings: (readonly Finding[])[];
  /** Findings before the list's elements (absolute) and after them (relative to `tail`). */
  readonly before: readonly Finding[];
  readonly after: readonly Finding[];
  /** Where the text after the last element starts. */
  readonly tail: number;
}

const NO_FINDINGS: readonly Finding[] = [];

/** A reader that keeps the last version's list; keep one per open document. */
export function jsonListReader(read: SpeciesReader): JsonListReader {
  let last: ListState | undefined;
  return (text) => {
    const edited = last && editedState(last, text, read);
    if (edited) {
      last = edited;
      return versionOf(edited);
    }
    const whole = wholeState(text, read);
    last = "starts" in whole ? whole : undefined;
    return "starts" in whole ? versionOf(whole) : { findings: () => whole.findings, elementsAround: () => undefined };
  };
}

function versionOf(state: ListState): JsonListVersion {
  let findings: Finding[] | undefined;
  return {
    findings() {
      if (findings) return findings;
      findings = [...state.before];
      for (let index = 0; index < state.starts.length; index++) {
        const found = state.elementFindings[index];
        for (const finding of found) findings.push(moved(finding, state.starts[index]));
      }
      for (const finding of state.after) findings.push(moved(finding, state.tail));
      return findings;
    },
    elementsAround(start, end) {
      const first = lastAtOrBefore(state.starts, start);
      if (first < 0 || start > state.ends[first]) return undefined;
      const lastIndex = Math.max(first, lastAtOrBefore(state.starts, end));
      return { start: state.starts[first], end: state.ends[lastIndex] };
    },
  };
}

/**
 * The whole text read the ordinary way, and cut into its list's elements when it is clean JSON;
 * otherwise only its findings.
 */
function wholeState(text: ChunkedText, read: SpeciesReader): ListState | { readonly findings: readonly Finding[] } {
  const whole = wholeText(text);
  const all = documentFindings(whole, read);
  const plain = { findings: all };
  if (all.some((finding) => finding.code === "json-syntax" || finding.code === "document-unreadable")) return plain;
  const errors: ParseError[] = [];
  let root: Node | undefined;
  try {
    root = parseTree(whole, errors, JSON_PARSE_OPTIONS);
  } catch {
    return plain;
  }
  if (!root || errors.length > 0) return plain;
  const list = recordList(root);
  if (!list || !list.children || list.children.length === 0) return plain;
  const starts = Int32Array.from(list.children, (child) => child.offset);
  const ends = Int32Array.from(list.children, (child) => child.offset + child.length);
  const elementFindings: Finding[][] = list.children.map(() => []);
  const before: Finding[] = [];
  const after: Finding[] = [];
  const tail = ends[ends.length - 1];
  for (const finding of all) {
    const start = finding.range.start;
    if (start < starts[0]) before.push(finding);
    else if (start >= tail) after.push(moved(finding, -tail));
    else {
      const index = lastAtOrBefore(starts, start);
      // A finding between two elements could not be kept in step with edits: read such a text whole.
      if (finding.range.end > ends[index]) return plain;
      elementFindings[index].push(moved(finding, -starts[index]));
    }
  }
  return {
    text,
    starts,
    ends,
    elementFindings: elementFindings.map((found) => (found.length === 0 ? NO_FINDINGS : found)),
    before,
    after,
    tail,
  };
}

/** The list of records: the root array, or the longest array held directly under the root object. */
function recordList(root: Node): Node | undefined {
  if (root.type === "array") return root;
  if (root.type !== "object") return undefined;
  let longest: Node | undefined;
  for (const property of root.children ?? []) {
    const value = property.children?.[1];
    if (value?.type === "array" && (value.children?.length ?? 0) > (longest?.children?.length ?? 0)) longest = value;
  }
  return longest;
}

/**
 * The state of `text` from the state of the version before, re-reading only the elements the
 * change touches; undefined when that cannot be done soundly (the caller reads the text whole).
 */
function editedState(previous: ListState, text: ChunkedText, read: SpeciesReader): ListState | undefined {
  const change = changedStretch(previous.text, text);
  if (!change) return { ...previous, text };
  const { start, oldEnd, newEnd } = change;
  const by = newEnd - oldEnd;
  // The elements from the one holding the change's start to the one holding its end, inclusive.
  const first = lastAtOrBefore(previous.starts, start);
  let lastIndex = first;
  while (lastIndex < previous.ends.length && previous.ends[lastIndex] < oldEnd) lastIndex++;
  if (first < 0 || lastIndex >= previous.ends.length) return undefined;
  const stretchStart = previous.starts[first];
  const stretch = sliceOf(text, stretchStart, previous.ends[lastIndex] + by);
  const elements = cleanElements(stretch);
  if (!elements) return undefined;
  // Read as a list of its own: `[` in front, so offsets in it are one past the stretch's.
  const found = documentFindings(`[${stretch}]`, read);
  const newStarts = Int32Array.from(elements, (element) => element.start + stretchStart);
  const newEnds = Int32Array.from(elements, (element) => element.end + stretchStart);
  const newFindings: Finding[][] = elements.map(() => []);
  for (const finding of found) {
    const index = lastAtOrBefore(newStarts, finding.range.start + stretchStart - 1);
    if (index < 0 || finding.range.end + stretchStart - 1 > newEnds[index]) return undefined;
    newFindings[index].push(moved(finding, stretchStart - 1 - newStarts[index]));
  }
  const after = lastIndex + 1;
  // Typed arrays, copied whole: an edit costs a copy of a few hundred kilobytes at most, and the
  // version before keeps its own (a request about it may still be answered).
  const count = first + elements.length + previous.starts.length - after;
  const starts = new Int32Array(count);
  const ends = new Int32Array(count);
  starts.set(previous.starts.subarray(0, first));
  ends.set(previous.ends.subarray(0, first));
  starts.set(newStarts, first);
  ends.set(newEnds, first);
  for (let index = after, to = first + elements.length; index < previous.starts.length; index++, to++) {
    starts[to] = previous.starts[index] + by;
    ends[to] = previous.ends[index] + by;
  }
  return {
    text,
    starts,
    ends,
    elementFindings: previous.elementFindings.slice(0, first).concat(
      newFindings.map((list) => (list.length === 0 ? NO_FINDINGS : list)),
      previous.elementFindings.slice(after),
    ),
    before: previous.before,
    after: previous.after,
    tail: previous.tail + by,
  };
}

/**
 * The elements of `stretch` read as the inside of a list, relative to its start: undefined unless
 * it is clean JSON, one or more values that begin at its first character and end at its last
 * (so the separators around it in the document are unchanged).
 */
function cleanElements(stretch: string): { start: number; end: number }[] | undefined {
  const errors: ParseError[] = [];
  let root: Node | undefined;
  try {
    root = parseTree(`[${stretch}]`, errors, JSON_PARSE_OPTIONS);
  } catch {
    return undefined;
  }
  const children = root?.children;
  if (!root || errors.length > 0 || root.type !== "array" || !children || children.length === 0) return undefined;
  const first = children[0];
  const last = children[children.length - 1];
  if (first.offset !== 1 || last.offset + last.length !== stretch.length + 1) return undefined;
  return children.map((child) => ({ start: child.offset - 1, end: child.offset - 1 + child.length }));
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

/** The problems and checks' findings of `text` read as JSON, in document order (the plain path). */
function documentFindings(text: string, read: SpeciesReader): Finding[] {
  const model = analyzeDocument(text, "json", read);
  return [...model.problems, ...checkDocument(model)].sort((a, b) => a.range.start - b.range.start || a.range.end - b.range.end);
}
