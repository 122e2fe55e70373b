/**
 * A YAML document of records edited again and again: most such files hold one long block list of
 * records (at the root, or under a top-level key: `records:` then `- name: ...` items), and an
 * edit inside one item leaves the other items alone. So each version's items are remembered with
 * their findings, and an edit re-reads only the items it touches, as a YAML text of their own,
 * through the same reader and checks (`analyzeYamlStream`, `checkDocument`) as a whole-document
 * analysis.
 *
 * Items are whole lines: item `k` runs from the start of the line holding its `-` to the start of
 * the line holding the next item's `-`. Reading a run of items alone is reading them in place
 * because, in a stream that reads without errors:
 * - the list's parents are the root (or the root mapping), so the only context a run of items
 *   has is the column of its dashes, which it keeps when read alone;
 * - a run that reads alone without errors closes every flow collection and quoted scalar it
 *   opens, and block scalars and plain scalars end at a line indented no deeper than the dashes,
 *   so the text after the run reads as before and the run ends where the next item begins;
 * - the reader decides each mapping on its own keys, anchors and aliases are not followed (and
 *   the `yaml` package reports nothing about them across nodes), and items in a list have no key
 *   above them (a list under an equation key is read whole: its strings are equations).
 * So a version with a syntax error anywhere, directives (`%YAML`, `%TAG` change how every node
 * reads), an edit outside the list, re-read items that are not clean YAML on their own, or that
 * do not start with a dash in the list's column, or hold a document marker, is read whole.
 */
import { isMap, isPair, isScalar, isSeq, type Node, type YAMLSeq } from "yaml";
import { analyzeDocument, analyzeYamlStream } from "./analyzeDocument";
import { checkDocument } from "./checkDocument";
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
import { moved } from "./tables/delimitedFindings";
import { columnUnder } from "./tables/delimitedRecords";
import { scanYamlList } from "./tables/yamlListScan";
import { isEquationHeader } from "./tables/headers";
import { parseYamlStream, type YamlStream } from "./tables/yaml";
import type { DocumentModel, Finding } from "./types";

/** The remembered list of one version; items are whole lines, each ending where the next starts. */
interface ListState extends ListParts {
  /** The column of the items' dashes. */
  readonly indent: number;
}

/** A line that ends a document or holds a directive: never part of a list item. */
const DOCUMENT_LINE = /(?:^|\n)(?:(?:---|\.\.\.)(?:[ \t\r\n]|$)|%)/;

/** Re-read items that might nest deeper than this are read whole (the reader gives up near 1,000 levels). */
const MAX_NESTING = 200;

const DASH = 0x2d;
const SPACE = 0x20;
const LINE_FEED = 0x0a;

/** How many characters of a file just opened are read at a time: a few milliseconds' work. */
const STEP_CHARACTERS = 4 * 1024;

/** A reader that keeps the last version's list; keep one per open document. */
export function yamlListReader(read: SpeciesReader, step = STEP_CHARACTERS, elsewhereFrom?: number): ListReader {
  return rememberingListReader<ListState>(
    {
      edited: (last, text) => editedState(last, text, read),
      opened: (text) => openedState(text),
      openedWhole: (text) => wholeState(text, read),
      readParts: (state, first, last) => itemsInPlace(state, first, last, read),
      readFrame: (state) => frameOf(state, read),
      readWhole: (text) => wholeYamlReading(wholeText(text), read),
    },
    step,
    elsewhereFrom,
  );
}

/** A YAML text read whole, the ordinary way: what a list version whose items do not read cleanly gives. */
export function wholeYamlReading(text: string, read: SpeciesReader): WholeReading {
  const model = analyzeDocument(text, "yaml", read);
  return { findings: findingsOf(model), species: model.occurrences.length };
}

/**
 * A text's list found by the quick pass, none of it read yet; undefined when the pass finds none.
 * A list under an equation key is left to the whole reading (its strings are equations only
 * there), and so is one under a key that names a column (emptied, the key would read otherwise).
 */
function openedState(text: ChunkedText): ListState | undefined {
  const list = scanYamlList(text, (key) => !isEquationHeader(key) && columnUnder(key) === undefined);
  if (!list) return undefined;
  const { starts, tail } = list;
  const ends = Int32Array.from(starts, (_, index) => (index + 1 < starts.length ? starts[index + 1] : tail));
  return {
    text,
    starts,
    ends,
    partFindings: new Array<readonly Finding[] | undefined>(starts.length),
    partSpecies: new Array<number | undefined>(starts.length),
    indent: list.indent,
    frame: undefined,
    tail,
  };
}

/**
 * The text around the list, read with the list's lines left out: its findings before the list
 * and after it. Undefined unless it reads without errors.
 */
function frameOf(state: ListState, read: SpeciesReader): ListFrame | undefined {
  const head = state.starts[0];
  const frame = sliceOf(state.text, 0, head) + sliceOf(state.text, state.tail, state.text.length);
  const documents = parseYamlStream(frame);
  if (!documents || documents.some((document) => document.errors.length > 0)) return undefined;
  const before: Finding[] = [];
  const after: Finding[] = [];
  const model = analyzeYamlStream(frame, documents, read);
  for (const finding of findingsOf(model)) {
    if (finding.code === "yaml-syntax" || finding.code === "document-unreadable") return undefined;
    if (finding.range.start >= head) after.push(moved(finding, -head));
    else if (finding.range.end <= head) before.push(finding);
    else return undefined;
  }
  return { before, after, species: model.occurrences.length };
}

/** Items `first`..`last` of `state` read alone: each one's findings; undefined unless they read cleanly where they lie. */
function itemsInPlace(state: ListState, first: number, last: number, read: SpeciesReader): PartsReading | undefined {
  const stretchStart = state.starts[first];
  const items = itemsAlone(sliceOf(state.text, stretchStart, state.ends[last]), state.indent, read);
  if (!items || items.starts.length !== last - first + 1) return undefined;
  for (let index = 0; index < items.starts.length; index++) {
    if (items.starts[index] + stretchStart !== state.starts[first + index]) return undefined;
  }
  return items;
}

/**
 * The whole text read the ordinary way (parsed once), and cut into its list's items when it reads
 * without errors and has such a list; otherwise only its findings.
 */
function wholeState(text: ChunkedText, read: SpeciesReader): ListState | WholeReading {
  const whole = wholeText(text);
  const documents = parseYamlStream(whole);
  if (!documents) return wholeYamlReading(whole, read);
  const model = analyzeYamlStream(whole, documents, read);
  const all = findingsOf(model);
  const plain = { findings: all, species: model.occurrences.length };
  if (all.some((finding) => finding.code === "yaml-syntax" || finding.code === "document-unreadable")) return plain;
  // Directives change how every node reads: such a stream is always read whole.
  if (/(?:^|\n)%/.test(whole)) return plain;
  const list = recordList(documents);
  if (!list) return plain;
  const items = itemStarts(whole, list);
  if (!items) return plain;
  const seqEnd = list.range?.[1] ?? 0;
  let tail = seqEnd === 0 || whole.charCodeAt(seqEnd - 1) === LINE_FEED ? seqEnd : lineEndAfter(whole, seqEnd);
  // Comments after the list, and nothing else: the last item reaches the end, so records typed at
  // the end of the file are read on their own too.
  if (tail < whole.length && onlyBlankOrComments(whole, tail)) tail = whole.length;
  const starts = Int32Array.from(items.starts);
  const ends = new Int32Array(starts.length);
  for (let index = 0; index < starts.length; index++) ends[index] = index + 1 < starts.length ? starts[index + 1] : tail;
  const parts = partition(all, starts, ends);
  if (!parts) return plain;
  const species = speciesPerPart(model.occurrences, starts, ends);
  return {
    text,
    starts,
    ends,
    partFindings: parts.inside,
    partSpecies: species.inside,
    indent: items.indent,
    frame: { before: parts.before, after: parts.after, species: species.around },
    tail,
  };
}

/**
 * The list of records: the block list that spans the most text (where edits mostly fall), at the
 * root of a document or directly under a key of a root block mapping (not an equation key, whose
 * strings are read as equations).
 */
function recordList(documents: YamlStream): YAMLSeq | undefined {
  let longest: YAMLSeq | undefined;
  const span = (node: YAMLSeq): number => (node.range ? node.range[1] - node.range[0] : 0);
  const consider = (node: unknown): void => {
    if (isSeq(node) && !node.flow && node.range && node.items.length > 0 && (!longest || span(node) > span(longest))) longest = node;
  };
  for (const document of documents) {
    const root = document.contents as Node | null;
    if (isSeq(root)) consider(root);
    else if (isMap(root) && !root.flow) {
      for (const pair of root.items) {
        if (!isPair(pair) || !isSeq(pair.value)) continue;
        if (isScalar(pair.key) && isEquationHeader(String(pair.key.value))) continue;
        consider(pair.value);
      }
    }
  }
  return longest;
}

/**
 * Where each item's line starts (the line of its dash) and the column of the dashes; undefined
 * when an item's dash cannot be found where it must be.
 */
function itemStarts(text: string, list: YAMLSeq): { starts: number[]; indent: number } | undefined {
  const first = list.range?.[0];
  if (first === undefined || text.charCodeAt(first) !== DASH) return undefined;
  const firstLine = lineStartAt(text, first);
  const indent = first - firstLine;
  const starts: number[] = [];
  for (const item of list.items) {
    const at = (item as Node | null)?.range?.[0];
    if (at === undefined) return undefined;
    // The dash is on the line the item's node starts on, or on a line above it (after only
    // comments or properties): the nearest line above that opens with a dash in the list's column.
    const floor = starts.length > 0 ? starts[starts.length - 1] : firstLine;
    let line = lineStartAt(text, at);
    while (!isDashLine(text, line, indent)) {
      if (line <= floor) return undefined;
      line = lineStartAt(text, line - 1);
    }
    if (starts.length > 0 ? line <= starts[starts.length - 1] : line !== firstLine) return undefined;
    starts.push(line);
  }
  return starts.length > 0 ? { starts, indent } : undefined;
}

/** Whether the line starting at `line` opens with `indent` spaces and a dash that starts an item. */
function isDashLine(text: string, line: number, indent: number): boolean {
  for (let index = line; index < line + indent; index++) if (text.charCodeAt(index) !== SPACE) return false;
  if (text.charCodeAt(line + indent) !== DASH) return false;
  const after = line + indent + 1;
  return after >= text.length || /[ \t\r\n]/.test(text[after]);
}

/** Whether every line from `from` on is blank or a comment. */
function onlyBlankOrComments(text: string, from: number): boolean {
  for (let line = from; line < text.length; line = lineEndAfter(text, line)) {
    let index = line;
    while (text[index] === " " || text[index] === "\t") index++;
    if (index < text.length && text[index] !== "#" && text[index] !== "\n" && text[index] !== "\r") return false;
  }
  return true;
}

function lineStartAt(text: string, offset: number): number {
  return offset <= 0 ? 0 : text.lastIndexOf("\n", offset - 1) + 1;
}

function lineEndAfter(text: string, offset: number): number {
  const lineFeed = text.indexOf("\n", offset);
  return lineFeed < 0 ? text.length : lineFeed + 1;
}

/** `findings` split into those before the items, each item's (relative) and those after; undefined when one crosses an item's end. */
function partition(
  findings: readonly Finding[],
  starts: Int32Array,
  ends: Int32Array,
): { before: Finding[]; inside: (readonly Finding[])[]; after: Finding[] } | undefined {
  const before: Finding[] = [];
  const after: Finding[] = [];
  const inside: Finding[][] = Array.from(starts, () => []);
  const tail = ends[ends.length - 1];
  for (const finding of findings) {
    const start = finding.range.start;
    if (start < starts[0]) {
      // A finding before the list that reaches into it could not be kept in step with edits.
      if (finding.range.end > starts[0]) return undefined;
      before.push(finding);
    } else if (start >= tail) after.push(moved(finding, -tail));
    else {
      const index = lastAtOrBefore(starts, start);
      if (finding.range.end > ends[index]) return undefined;
      inside[index].push(moved(finding, -starts[index]));
    }
  }
  return { before, after, inside: inside.map((found) => (found.length === 0 ? NO_FINDINGS : found)) };
}

/**
 * The state of `text` from the state of the version before, re-reading only the items the change
 * touches; undefined when that cannot be done soundly (the caller reads the text whole).
 */
function editedState(previous: ListState, text: ChunkedText, read: SpeciesReader): ListState | undefined {
  const change = changedStretch(previous.text, text);
  if (!change) return { ...previous, text };
  const { start, oldEnd, newEnd } = change;
  const by = newEnd - oldEnd;
  const count = previous.starts.length;
  if (start < previous.starts[0]) return undefined;
  // A change at an item's first character may be a line typed above it: the item before is read
  // with it, so a comment or a blank line typed between two items needs no whole read.
  const first = start === previous.starts[0] ? 0 : lastAtOrBefore(previous.starts, start - 1);
  let lastIndex = first;
  while (lastIndex < count && previous.ends[lastIndex] < oldEnd) lastIndex++;
  if (lastIndex >= count) return undefined;
  // The re-read stretch ends on a line's end: a character typed at the start of the next item's
  // line brings that item in.
  const endsOnLine = (at: number): boolean => at === text.length || sliceOf(text, at - 1, at) === "\n";
  while (!endsOnLine(previous.ends[lastIndex] + by) && lastIndex + 1 < count) lastIndex++;
  const stretchStart = previous.starts[first];
  const stretchEnd = previous.ends[lastIndex] + by;
  if (!endsOnLine(stretchEnd) || stretchEnd < stretchStart) return undefined;
  const stretch = sliceOf(text, stretchStart, stretchEnd);
  // A stretch that does not read cleanly (a keystroke that broke an item) is kept as one item, not
  // read yet: reading it fails, and the version is read whole, without losing where the items
  // around it are. It must still open with a dash in the list's column to be taken for one.
  const items =
    stretch.length === 0
      ? { starts: [], findings: [], species: [] }
      : (itemsAlone(stretch, previous.indent, read) ??
        (isDashLine(stretch, 0, previous.indent) ? { starts: [0], findings: [undefined], species: [undefined] } : undefined));
  if (!items) return undefined;
  const after = lastIndex + 1;
  const total = first + items.starts.length + count - after;
  if (total === 0) return undefined;
  const starts = new Int32Array(total);
  const ends = new Int32Array(total);
  starts.set(previous.starts.subarray(0, first));
  ends.set(previous.ends.subarray(0, first));
  items.starts.forEach((itemStart, index) => {
    starts[first + index] = stretchStart + itemStart;
    ends[first + index] = index + 1 < items.starts.length ? stretchStart + items.starts[index + 1] : stretchEnd;
  });
  for (let index = after, to = first + items.starts.length; index < count; index++, to++) {
    starts[to] = previous.starts[index] + by;
    ends[to] = previous.ends[index] + by;
  }
  return {
    text,
    starts,
    ends,
    partFindings: previous.partFindings.slice(0, first).concat(items.findings, previous.partFindings.slice(after)),
    partSpecies: previous.partSpecies.slice(0, first).concat(items.species, previous.partSpecies.slice(after)),
    indent: previous.indent,
    frame: previous.frame,
    tail: previous.tail + by,
  };
}

/**
 * The items of `stretch` read as a YAML text of its own, with their findings relative to each
 * item's start; undefined unless it is clean YAML holding one block list whose first dash opens
 * the stretch in the column `indent`.
 */
function itemsAlone(
  stretch: string,
  indent: number,
  read: SpeciesReader,
): { starts: number[]; findings: (readonly Finding[])[]; species: number[] } | undefined {
  if (!isDashLine(stretch, 0, indent) || DOCUMENT_LINE.test(stretch) || nestingBound(stretch, indent) > MAX_NESTING) return undefined;
  const documents = parseYamlStream(stretch);
  if (!documents || documents.length !== 1 || documents[0].errors.length > 0) return undefined;
  const list = documents[0].contents as Node | null;
  if (!isSeq(list) || list.flow || list.range?.[0] !== indent) return undefined;
  const items = itemStarts(stretch, list);
  if (!items || items.indent !== indent) return undefined;
  const model = analyzeYamlStream(stretch, documents, read);
  const found = findingsOf(model);
  const starts = Int32Array.from(items.starts);
  const ends = Int32Array.from(items.starts, (_, index) => (index + 1 < items.starts.length ? items.starts[index + 1] : stretch.length));
  const parts = partition(found, starts, ends);
  if (!parts || parts.before.length > 0 || parts.after.length > 0) return undefined;
  return { starts: items.starts, findings: parts.inside, species: speciesPerPart(model.occurrences, starts, ends).inside };
}

/**
 * A bound on how deep nodes nest in `text`, a run of items whose dashes are in column `indent`:
 * in an item, each level opens with a bracket, or on its line with more indentation or an
 * indicator (`-`, `?`, `:`); an item that reads cleanly closes what it opens, so the deepest item
 * decides. The reader stops at a depth the stack allows; a stretch that could come near it is
 * read whole, where that limit decides as it always does.
 */
function nestingBound(text: string, indent: number): number {
  let deepest = 0;
  let opens = 0;
  let deepestLine = 0;
  let line = 0;
  let atIndent = true;
  for (let index = 0; index < text.length; index++) {
    const code = text.charCodeAt(index);
    if (code === LINE_FEED) {
      deepestLine = Math.max(deepestLine, line);
      line = 0;
      atIndent = true;
      // The next line opens an item: what this one opened is closed by now.
      if (isDashLine(text, index + 1, indent)) {
        deepest = Math.max(deepest, opens + deepestLine);
        opens = 0;
        deepestLine = 0;
      }
      continue;
    }
    if (code !== SPACE) atIndent = false;
    if (atIndent || code === DASH || code === 0x3f || code === 0x3a) line++;
    else if (code === 0x5b || code === 0x7b) opens++;
  }
  return Math.max(deepest, opens + Math.max(deepestLine, line));
}

/** The problems and checks' findings of a model, in document order (the plain path's order). */
function findingsOf(model: DocumentModel): Finding[] {
  return [...model.problems, ...checkDocument(model)].sort((a, b) => a.range.start - b.range.start || a.range.end - b.range.end);
}
