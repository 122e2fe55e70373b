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
 *
 * A text read afresh is read the same way, a few elements at a time: a quick pass finds the list
 * and its elements (`scanJsonList`), the text around the list is read with the list left empty,
 * and the elements are read in runs as their findings are asked for, so that a large file just
 * opened does not hold up other requests. Should any of them not read cleanly, the text is read
 * whole after all.
 */
import type { Node } from "jsonc-parser/lib/esm/main.js";
import { analyzeJsonOutline, analyzeJsonTree } from "./analyzeDocument";
import { checkDocument, documentChecker } from "./checkDocument";
import { sliceOf, wholeText, type ChunkedText } from "./chunkedText";
import {
  changedStretch,
  lastAtOrBefore,
  NO_FINDINGS,
  rememberingListReader,
  speciesPerPart,
  type ListFrame,
  type ListParts,
  type ListReader,
  type PartsReading,
  type WholeReading,
} from "./listParts";
import type { SpeciesReader } from "./speciesReader";
import { parseJsonTree } from "./tables/json";
import { scanJsonList } from "./tables/jsonListScan";
import { jsonOutline } from "./tables/jsonOutline";
import { equationKeyTest } from "./tables/headers";
import { moved } from "./tables/delimitedFindings";
import type { DocumentModel, Finding, SpeciesOccurrence } from "./types";

/** How many characters of a file just opened are read at a time: a few milliseconds' work. */
const STEP_CHARACTERS = 8 * 1024;

/** A reader that keeps the last version's list; keep one per open document. */
export function jsonListReader(read: SpeciesReader, step = STEP_CHARACTERS, elsewhereFrom?: number): ListReader {
  const check = documentChecker();
  const isEquationKey = equationKeyTest();
  return rememberingListReader<JsonListState>(
    {
      edited: (last, text) => editedState(last, text, read, check),
      opened: (text) => openedState(text, read, isEquationKey),
      openedWhole: (text) => wholeState(text, read),
      readParts: (state, first, last) => partsInPlace(state, first, last, read, check),
      readFrame: (state) => frameOf(state, read, isEquationKey, check),
      readWhole: (text) => readOnce(wholeText(text), read),
    },
    step,
    elsewhereFrom,
  );
}

/** A JSON text read whole, the ordinary way: what a list version whose parts do not read cleanly gives. */
export function wholeJsonReading(text: string, read: SpeciesReader): WholeReading {
  const { findings, species } = readOnce(text, read);
  return { findings, species };
}

/** The remembered list of one version; `open` and `close` are its brackets (-1 when not known). */
interface JsonListState extends ListParts {
  readonly open: number;
  readonly close: number;
}

/** A text's list found by the quick pass, none of it read yet; undefined when the pass finds none. */
function openedState(text: ChunkedText, read: SpeciesReader, isEquationKey: (key: string) => boolean): JsonListState | undefined {
  const list = scanJsonList(text, isEquationKey);
  if (!list) return undefined;
  return {
    text,
    starts: list.starts,
    ends: list.ends,
    partFindings: new Array<readonly Finding[] | undefined>(list.starts.length),
    partSpecies: new Array<number | undefined>(list.starts.length),
    frame: undefined,
    tail: list.ends[list.ends.length - 1],
    open: list.open,
    close: list.close,
  };
}

/**
 * The text around the list, read with the list left empty: its findings before the list and
 * after it. Undefined unless it is clean JSON in which the emptied list is still the record list.
 */
function frameOf(
  state: JsonListState,
  read: SpeciesReader,
  isEquationKey: (key: string) => boolean,
  check: (model: DocumentModel) => Finding[],
): ListFrame | undefined {
  if (state.open < 0) return undefined;
  const head = sliceOf(state.text, 0, state.open + 1);
  const frame = head + sliceOf(state.text, state.close, state.text.length);
  const outline = jsonOutline(frame, isEquationKey);
  if (!outline) return undefined;
  const before: Finding[] = [];
  const after: Finding[] = [];
  const model = analyzeJsonOutline(frame, outline, read);
  for (const finding of findingsOf(model, check)) {
    if (finding.range.start >= head.length) after.push(moved(finding, state.close - head.length - state.tail));
    else if (finding.range.end <= head.length) before.push(finding);
    else return undefined;
  }
  return { before, after, species: model.occurrences.length };
}

/** Elements `first`..`last` of `state` read as a list of their own: each one's findings; undefined unless they read cleanly where they lie. */
function partsInPlace(
  state: JsonListState,
  first: number,
  last: number,
  read: SpeciesReader,
  check: (model: DocumentModel) => Finding[],
): PartsReading | undefined {
  const stretchStart = state.starts[first];
  const elements = elementsAlone(sliceOf(state.text, stretchStart, state.ends[last]), read, check);
  if (!elements || elements.starts.length !== last - first + 1) return undefined;
  for (let index = 0; index < elements.starts.length; index++) {
    if (
      elements.starts[index] + stretchStart !== state.starts[first + index] ||
      elements.ends[index] + stretchStart !== state.ends[first + index]
    ) {
      return undefined;
    }
  }
  return elements;
}

/**
 * The whole text read the ordinary way, and cut into its list's elements when it is clean JSON;
 * otherwise only its findings.
 */
function wholeState(text: ChunkedText, read: SpeciesReader): JsonListState | WholeReading {
  const whole = wholeText(text);
  const reading = readOnce(whole, read);
  const all = reading.findings;
  const plain = { findings: all, species: reading.species };
  if (all.some((finding) => finding.code === "json-syntax" || finding.code === "document-unreadable")) return plain;
  if (!reading.list || reading.list.starts.length === 0) return plain;
  const { starts, ends } = reading.list;
  const partFindings: Finding[][] = Array.from(starts, () => []);
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
      partFindings[index].push(moved(finding, -starts[index]));
    }
  }
  const species = speciesPerPart(reading.mentions, starts, ends);
  return {
    text,
    starts,
    ends,
    partFindings: partFindings.map((found) => (found.length === 0 ? NO_FINDINGS : found)),
    partSpecies: species.inside,
    frame: { before, after, species: species.around },
    tail,
    open: -1,
    close: -1,
  };
}

/** The reading of a whole JSON text: its findings, species mentions, and its list's element bounds when it is clean JSON. */
interface WholeJson {
  readonly findings: Finding[];
  readonly species: number;
  readonly mentions: readonly SpeciesOccurrence[];
  readonly list?: { readonly starts: Int32Array; readonly ends: Int32Array };
}

/**
 * The findings of `whole` and its list's element bounds (only when it is clean JSON), read once:
 * clean JSON through its outline, anything else through its syntax tree.
 */
function readOnce(whole: string, read: SpeciesReader): WholeJson {
  const outline = jsonOutline(whole, equationKeyTest());
  if (outline) {
    const model = analyzeJsonOutline(whole, outline, read);
    return { findings: findingsOf(model), species: model.occurrences.length, mentions: model.occurrences, list: outline.list };
  }
  const tree = parseJsonTree(whole);
  const model = analyzeJsonTree(whole, tree, read);
  const reading = { findings: findingsOf(model), species: model.occurrences.length, mentions: model.occurrences };
  if (!tree.root || tree.errors.length > 0) return reading;
  const list = recordList(tree.root);
  if (!list?.children) return reading;
  return {
    ...reading,
    list: {
      starts: Int32Array.from(list.children, (child) => child.offset),
      ends: Int32Array.from(list.children, (child) => child.offset + child.length),
    },
  };
}

/**
 * The list of records: the root array, or the longest array held directly under the root object
 * (not under an equation key, whose strings are read as equations only there).
 */
function recordList(root: Node): Node | undefined {
  if (root.type === "array") return root;
  if (root.type !== "object") return undefined;
  const isEquationKey = equationKeyTest();
  let longest: Node | undefined;
  for (const property of root.children ?? []) {
    const [key, value] = property.children ?? [];
    if (typeof key?.value === "string" && isEquationKey(key.value)) continue;
    if (value?.type === "array" && (value.children?.length ?? 0) > (longest?.children?.length ?? 0)) longest = value;
  }
  return longest;
}

/**
 * The state of `text` from the state of the version before, re-reading only the elements the
 * change touches; undefined when that cannot be done soundly (the caller reads the text whole).
 */
function editedState(
  previous: JsonListState,
  text: ChunkedText,
  read: SpeciesReader,
  check: (model: DocumentModel) => Finding[],
): JsonListState | undefined {
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
  const stretchEnd = previous.ends[lastIndex] + by;
  if (stretchEnd <= stretchStart) return undefined;
  // A stretch that does not read cleanly (a keystroke that broke a record) is kept as one part,
  // not read yet: reading it fails, and the version is read whole, without losing where the
  // records around it are.
  const elements = elementsAlone(sliceOf(text, stretchStart, stretchEnd), read, check) ?? unreadStretch(stretchEnd - stretchStart);
  const after = lastIndex + 1;
  // Typed arrays, copied whole: an edit costs a copy of a few hundred kilobytes at most, and the
  // version before keeps its own (a request about it may still be answered).
  const count = first + elements.starts.length + previous.starts.length - after;
  const starts = new Int32Array(count);
  const ends = new Int32Array(count);
  starts.set(previous.starts.subarray(0, first));
  ends.set(previous.ends.subarray(0, first));
  for (let index = 0; index < elements.starts.length; index++) {
    starts[first + index] = elements.starts[index] + stretchStart;
    ends[first + index] = elements.ends[index] + stretchStart;
  }
  for (let index = after, to = first + elements.starts.length; index < previous.starts.length; index++, to++) {
    starts[to] = previous.starts[index] + by;
    ends[to] = previous.ends[index] + by;
  }
  return {
    text,
    starts,
    ends,
    partFindings: previous.partFindings.slice(0, first).concat(elements.findings, previous.partFindings.slice(after)),
    partSpecies: previous.partSpecies.slice(0, first).concat(elements.species, previous.partSpecies.slice(after)),
    frame: previous.frame,
    tail: previous.tail + by,
    open: previous.open,
    close: previous.close < 0 ? previous.close : previous.close + by,
  };
}

/** A stretch of `length` characters taken as one element, not read yet. */
function unreadStretch(length: number): { starts: Int32Array; ends: Int32Array; findings: undefined[]; species: undefined[] } {
  return { starts: Int32Array.of(0), ends: Int32Array.of(length), findings: [undefined], species: [undefined] };
}

/**
 * The elements of `stretch` read as the inside of a list of their own, relative to its start,
 * with each one's findings relative to its own start: undefined unless it is clean JSON, one or
 * more values that begin at its first character and end at its last (so the separators around it
 * in the document are unchanged), each of whose findings lies inside its element.
 */
function elementsAlone(
  stretch: string,
  read: SpeciesReader,
  check: (model: DocumentModel) => Finding[],
): { starts: Int32Array; ends: Int32Array; findings: (readonly Finding[])[]; species: number[] } | undefined {
  const listed = `[${stretch}]`;
  const outline = jsonOutline(listed, equationKeyTest());
  const list = outline?.list;
  if (!outline || !list || list.starts.length === 0) return undefined;
  if (list.starts[0] !== 1 || list.ends[list.ends.length - 1] !== stretch.length + 1) return undefined;
  const findings: Finding[][] = Array.from(list.starts, () => []);
  const model = analyzeJsonOutline(listed, outline, read);
  for (const finding of findingsOf(model, check)) {
    const index = lastAtOrBefore(list.starts, finding.range.start);
    if (index < 0 || finding.range.end > list.ends[index]) return undefined;
    findings[index].push(moved(finding, -list.starts[index]));
  }
  return {
    starts: list.starts.map((offset) => offset - 1),
    ends: list.ends.map((offset) => offset - 1),
    findings: findings.map((found) => (found.length === 0 ? NO_FINDINGS : found)),
    species: speciesPerPart(model.occurrences, list.starts, list.ends).inside,
  };
}

/** The problems and checks' findings of a model, in document order. */
function findingsOf(model: DocumentModel, check: (model: DocumentModel) => Finding[] = checkDocument): Finding[] {
  return [...model.problems, ...check(model)].sort((a, b) => a.range.start - b.range.start || a.range.end - b.range.end);
}
