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
import { analyzeDocument, analyzeJsonOutline, analyzeJsonTree } from "./analyzeDocument";
import { checkDocument } from "./checkDocument";
import { sliceOf, wholeText, type ChunkedText } from "./chunkedText";
import { changedStretch, lastAtOrBefore, NO_FINDINGS, rememberingListReader, type ListParts, type ListReader } from "./listParts";
import type { SpeciesReader } from "./speciesReader";
import { JSON_PARSE_OPTIONS, parseJsonTree } from "./tables/json";
import { jsonOutline } from "./tables/jsonOutline";
import { equationKeyTest } from "./tables/headers";
import { moved } from "./tables/delimitedFindings";
import type { DocumentModel, Finding } from "./types";

/** A reader that keeps the last version's list; keep one per open document. */
export function jsonListReader(read: SpeciesReader): ListReader {
  return rememberingListReader<ListParts>(
    (last, text) => editedState(last, text, read),
    (text) => wholeState(text, read),
  );
}

/**
 * The whole text read the ordinary way, and cut into its list's elements when it is clean JSON;
 * otherwise only its findings.
 */
function wholeState(text: ChunkedText, read: SpeciesReader): ListParts | { readonly findings: readonly Finding[] } {
  const whole = wholeText(text);
  const reading = readOnce(whole, read);
  const all = reading.findings;
  const plain = { findings: all };
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
  return {
    text,
    starts,
    ends,
    partFindings: partFindings.map((found) => (found.length === 0 ? NO_FINDINGS : found)),
    before,
    after,
    tail,
  };
}

/**
 * The findings of `whole` and its list's element bounds (only when it is clean JSON), read once:
 * clean JSON through its outline, anything else through its syntax tree.
 */
function readOnce(whole: string, read: SpeciesReader): { findings: Finding[]; list?: { starts: Int32Array; ends: Int32Array } } {
  const outline = jsonOutline(whole, equationKeyTest());
  if (outline) return { findings: findingsOf(analyzeJsonOutline(whole, outline, read)), list: outline.list };
  const tree = parseJsonTree(whole);
  const findings = findingsOf(analyzeJsonTree(whole, tree, read));
  if (!tree.root || tree.errors.length > 0) return { findings };
  const list = recordList(tree.root);
  if (!list?.children) return { findings };
  return {
    findings,
    list: {
      starts: Int32Array.from(list.children, (child) => child.offset),
      ends: Int32Array.from(list.children, (child) => child.offset + child.length),
    },
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
function editedState(previous: ListParts, text: ChunkedText, read: SpeciesReader): ListParts | undefined {
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
    partFindings: previous.partFindings.slice(0, first).concat(
      newFindings.map((list) => (list.length === 0 ? NO_FINDINGS : list)),
      previous.partFindings.slice(after),
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

/** The problems and checks' findings of `text` read as JSON, in document order (the plain path). */
function documentFindings(text: string, read: SpeciesReader): Finding[] {
  return findingsOf(analyzeDocument(text, "json", read));
}

/** The problems and checks' findings of a model, in document order. */
function findingsOf(model: DocumentModel): Finding[] {
  return [...model.problems, ...checkDocument(model)].sort((a, b) => a.range.start - b.range.start || a.range.end - b.range.end);
}
