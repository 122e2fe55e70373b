/**
 * Parsing a YAML stream whose long block lists hold one flow mapping of plain scalars a line
 * (`  - {id: KR-1, formula: SF6, valence electrons: 48}`), as record files are often written.
 * The `yaml` package spends almost all its time on such lines, and they are simple enough to
 * build directly. So the package parses the text with the middle lines of each run of such lines
 * blanked (turned into one line of spaces, so every offset stays), and the mappings of the
 * blanked lines are built here and put back into their list, between the run's first and last
 * lines, which the package read itself.
 *
 * Why the documents are the ones the package gives for the whole text:
 * - a line of the run holds a whole flow mapping that opens and closes on it, right after the
 *   list's dash, with nothing after it; so the line ends its item, the next line of the run (a
 *   dash in the same column) starts the next item, and when the run's first and last lines are
 *   neighbouring items of one block list in the blanked text, every line between them is an item
 *   of that list in the whole text, and nothing else reads differently (blank lines inside a block
 *   list are nothing);
 * - the mappings are built as the package builds a flow mapping of plain scalars: each scalar's
 *   value from the schema's own tags (tested in the package's order), its range, source, type and
 *   format; a line whose keys repeat, or whose scalars need anything else, is left to the package;
 * - directives (which change the schema), an error anywhere in the blanked text, or a run whose
 *   ends are not neighbouring items of one list: the whole text is parsed the ordinary way.
 */
import { isMap, isPair, isScalar, isSeq, Pair, Scalar, YAMLMap, type Document, type Node, type Schema, type YAMLSeq } from "yaml";

/** The documents of a YAML stream. */
type YamlDocuments = readonly Document.Parsed[];

/** Runs shorter than this are left to the package: there is nothing worth blanking. */
const SHORTEST_RUN = 3;

/** Longer lines are left to the package (it limits implicit keys to 1,024 characters). */
const LONGEST_LINE = 1000;

const SPACE = 0x20;
const DASH = 0x2d;
const PLUS = 0x2b;
const COLON = 0x3a;
const COMMA = 0x2c;
const OPEN_BRACE = 0x7b;
const CLOSE_BRACE = 0x7d;
const LINE_FEED = 0x0a;
const CARRIAGE_RETURN = 0x0d;

/** A run of item lines: where its first and last lines' braces open, and where its middle lies. */
interface Run {
  readonly firstBrace: number;
  readonly lastBrace: number;
  /** From the start of the second line to the start of the last. */
  readonly middleStart: number;
  readonly middleEnd: number;
}

/**
 * The documents of `text` as `parse` gives them, parsing only what the package must read
 * (`parse` is the package's ordinary parse; undefined when it throws).
 */
export function parseWithItemLines(text: string, parse: (text: string) => YamlDocuments | undefined): YamlDocuments | undefined {
  const runs = directivesIn(text) ? [] : itemLineRuns(text);
  if (runs.length === 0) return parse(text);
  const documents = parse(blanked(text, runs));
  if (!documents || documents.some((document) => document.errors.length > 0)) return parse(text);
  return filledIn(text, documents, runs) ? documents : parse(text);
}

/** Whether a line starts with `%` (a directive, or a stream the package may read as one). */
function directivesIn(text: string): boolean {
  return /(?:^|\n)%/.test(text);
}

/** The runs of consecutive item lines with their dashes in one column. */
function itemLineRuns(text: string): Run[] {
  const runs: Run[] = [];
  let runFirst = -1;
  let runIndent = -1;
  let runLines = 0;
  let lastLine = -1;
  let secondLine = -1;
  const close = (): void => {
    if (runLines >= SHORTEST_RUN) {
      runs.push({
        firstBrace: runFirst + runIndent + 2,
        lastBrace: lastLine + runIndent + 2,
        middleStart: secondLine,
        middleEnd: lastLine,
      });
    }
    runLines = 0;
  };
  for (let line = 0; line < text.length;) {
    let lineEnd = text.indexOf("\n", line);
    if (lineEnd < 0) lineEnd = text.length;
    const indent = itemLineIndent(text, line, lineEnd);
    if (indent < 0 || (runLines > 0 && indent !== runIndent)) close();
    if (indent >= 0) {
      if (runLines === 0) {
        runFirst = line;
        runIndent = indent;
      } else if (runLines === 1) secondLine = line;
      lastLine = line;
      runLines++;
    }
    line = lineEnd + 1;
  }
  close();
  return runs;
}

/** The column of the dash when `line` is an item line (see `pairsOf`), else -1. */
function itemLineIndent(text: string, line: number, lineEnd: number): number {
  const contentEnd = text.charCodeAt(lineEnd - 1) === CARRIAGE_RETURN ? lineEnd - 1 : lineEnd;
  if (contentEnd - line > LONGEST_LINE) return -1;
  let at = line;
  while (text.charCodeAt(at) === SPACE) at++;
  if (text.charCodeAt(at) !== DASH || text.charCodeAt(at + 1) !== SPACE || text.charCodeAt(at + 2) !== OPEN_BRACE) return -1;
  if (text.charCodeAt(contentEnd - 1) !== CLOSE_BRACE) return -1;
  return pairsOf(text, at + 3, contentEnd - 1) ? at - line : -1;
}

/**
 * The scalars' bounds (key start, key end, value start, value end, ...) of a flow mapping's
 * inside `from`..`to`: `key: value` pairs separated by `, `, each scalar plain (see `isPlainStart`,
 * `isPlainInside`), single spaces inside; undefined for anything else.
 */
function pairsOf(text: string, from: number, to: number): number[] | undefined {
  const bounds: number[] = [];
  let at = from;
  for (;;) {
    const keyEnd = scalarEnd(text, at, to);
    if (keyEnd < 0 || text.charCodeAt(keyEnd) !== COLON || text.charCodeAt(keyEnd + 1) !== SPACE) return undefined;
    const valueEnd = scalarEnd(text, keyEnd + 2, to);
    if (valueEnd < 0) return undefined;
    bounds.push(at, keyEnd, keyEnd + 2, valueEnd);
    if (valueEnd === to) return bounds;
    if (text.charCodeAt(valueEnd) !== COMMA || text.charCodeAt(valueEnd + 1) !== SPACE) return undefined;
    at = valueEnd + 2;
  }
}

/** Where the plain scalar starting at `start` ends (before `to`), or -1 when none starts there. */
function scalarEnd(text: string, start: number, to: number): number {
  if (start >= to) return -1;
  let at = start;
  const first = text.charCodeAt(at);
  // A sign only before a digit ("-1", "+2"): a dash before anything else may be an indicator.
  if (first === DASH || first === PLUS) {
    if (!isDigit(text.charCodeAt(at + 1)) || at + 1 >= to) return -1;
    at += 2;
  } else if (isPlainStart(first)) at += 1;
  else return -1;
  while (at < to) {
    const code = text.charCodeAt(at);
    if (code === SPACE) {
      // One space between words; a space before a separator or the end belongs to no scalar.
      if (at + 1 >= to || !isPlainInside(text.charCodeAt(at + 1))) return at;
      at += 2;
    } else if (isPlainInside(code)) at += 1;
    else return at;
  }
  return at;
}

function isDigit(code: number): boolean {
  return code >= 0x30 && code <= 0x39;
}

/** ASCII letters and digits: what a plain scalar here may start with. */
const LETTER_OR_DIGIT = 1;
/** Quiet punctuation (no indicator, quote, comma, colon, bracket or `#`): allowed after the first character. */
const QUIET_PUNCTUATION = 2;

/** The class of each ASCII character (0: not allowed in a plain scalar here). */
const ASCII_CLASS = (() => {
  const classes = new Uint8Array(128);
  for (const character of "ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789")
    classes[character.charCodeAt(0)] = LETTER_OR_DIGIT;
  for (const character of "._()+-/=<>^~;") classes[character.charCodeAt(0)] = QUIET_PUNCTUATION;
  return classes;
})();

function isPlainStart(code: number): boolean {
  return code < 0x80 && ASCII_CLASS[code] === LETTER_OR_DIGIT;
}

/**
 * Characters a plain scalar here may hold after its first: ASCII letters, digits and quiet
 * punctuation, and letters and symbols outside ASCII other than spaces, line separators, byte
 * order marks and surrogates.
 */
function isPlainInside(code: number): boolean {
  if (code < 0x80) return ASCII_CLASS[code] !== 0;
  return (
    code >= 0xa1 &&
    !(code >= 0xd800 && code <= 0xdfff) &&
    code !== 0x2028 &&
    code !== 0x2029 &&
    code !== 0xfeff &&
    code !== 0xfffe &&
    code !== 0xffff &&
    !(code >= 0x2000 && code <= 0x200b) &&
    code !== 0x3000
  );
}

/**
 * `text` with the middle lines of every run turned into one line of spaces (the last line break
 * kept): a blank line inside a block list, which the package passes over at little cost.
 */
function blanked(text: string, runs: readonly Run[]): string {
  const pieces: string[] = [];
  let from = 0;
  for (const run of runs) {
    pieces.push(text.slice(from, run.middleStart), " ".repeat(run.middleEnd - 1 - run.middleStart), "\n");
    from = run.middleEnd;
  }
  pieces.push(text.slice(from));
  return pieces.join("");
}

/**
 * Puts the mappings of each run's middle lines into the list that holds the run's first and last
 * lines; false when a run's ends are not neighbouring flow mappings of one block list, or a line
 * cannot be built as the package builds it.
 */
function filledIn(text: string, documents: YamlDocuments, runs: readonly Run[]): boolean {
  const wanted = new Set(runs.map((run) => run.firstBrace));
  const found = new Map<number, { readonly list: YAMLSeq; readonly index: number; readonly document: Document.Parsed }>();
  for (const document of documents) {
    const pending: unknown[] = [document.contents];
    while (pending.length > 0) {
      const node = pending.pop();
      if (isSeq(node)) {
        node.items.forEach((item, index) => {
          const at = (item as Node | null)?.range?.[0];
          if (!node.flow && at !== undefined && wanted.has(at)) found.set(at, { list: node, index, document });
          pending.push(item);
        });
      } else if (isMap(node)) {
        for (const pair of node.items) if (isPair(pair)) pending.push(pair.key, pair.value);
      }
    }
  }
  // From the last run back: filling a run moves the items after it, not those before.
  for (const run of [...runs].reverse()) {
    const place = found.get(run.firstBrace);
    if (!place) return false;
    const first = place.list.items[place.index];
    const last = place.list.items[place.index + 1];
    if (!isMap(first) || !first.flow || !isMap(last) || !last.flow || last.range?.[0] !== run.lastBrace) return false;
    const options = place.document.options;
    const schema = first.schema;
    if (!schema || schema.compat || options.stringKeys || options.uniqueKeys !== true) return false;
    const scalars = scalarReader(schema, options);
    const middle: YAMLMap[] = [];
    for (let line = run.middleStart; line < run.middleEnd;) {
      const lineEnd = text.indexOf("\n", line);
      const map = flowMapping(text, line, lineEnd + 1, schema, scalars);
      if (!map) return false;
      middle.push(map);
      line = lineEnd + 1;
    }
    // The blank line gave the run's last item a space before it that the whole text does not have.
    delete last.spaceBefore;
    place.list.items.splice(place.index + 1, 0, ...middle);
  }
  return true;
}

/** A plain scalar's value and format, as the schema resolves it. */
interface Resolved {
  readonly value: unknown;
  readonly format?: string;
}

/** Resolves plain scalars with the schema's tags, remembering each text (keys and values apart). */
function scalarReader(schema: Schema, options: Document.Parsed["options"]): (source: string, atKey: boolean) => Resolved | undefined {
  const keys = new Map<string, Resolved | undefined>();
  const values = new Map<string, Resolved | undefined>();
  return (source, atKey) => {
    const known = atKey ? keys : values;
    let resolved = known.get(source);
    if (resolved === undefined && !known.has(source)) {
      resolved = resolve(schema, options, source, atKey);
      known.set(source, resolved);
    }
    return resolved;
  };
}

/** Undefined when a tag reports a problem or gives anything but a plain value. */
function resolve(schema: Schema, options: Document.Parsed["options"], source: string, atKey: boolean): Resolved | undefined {
  // The tags in the schema's order, as the package tests a plain scalar without a tag.
  const tag = schema.tags.find(
    (candidate) =>
      (candidate.default === true || (atKey && candidate.default === "key")) && "test" in candidate && candidate.test?.test(source),
  );
  if (!tag || !("resolve" in tag)) return { value: source };
  let problem = false;
  let value: unknown;
  try {
    value = (tag.resolve as (value: string, onError: (message: string) => void, options: unknown) => unknown)(
      source,
      () => (problem = true),
      options,
    );
  } catch {
    return undefined;
  }
  // Some tags give a scalar node (`null`, `true`): the package keeps that node; its value is what counts.
  if (isScalar(value) && Object.keys(value).length === 1) value = value.value;
  if (problem || (typeof value === "object" && value !== null) || typeof value === "function") return undefined;
  return tag.format ? { value, format: tag.format } : { value };
}

/** The flow mapping of the item line from `line` to `next` (the next line's start), built as the package builds it. */
function flowMapping(
  text: string,
  line: number,
  next: number,
  schema: Schema,
  scalars: (source: string, atKey: boolean) => Resolved | undefined,
): YAMLMap | undefined {
  const contentEnd = text.charCodeAt(next - 2) === CARRIAGE_RETURN ? next - 2 : next - 1;
  let brace = line;
  while (text.charCodeAt(brace) !== OPEN_BRACE) brace++;
  const bounds = pairsOf(text, brace + 1, contentEnd - 1);
  if (!bounds || text.charCodeAt(next - 1) !== LINE_FEED) return undefined;
  const map = new YAMLMap(schema);
  map.flow = true;
  for (let index = 0; index < bounds.length; index += 4) {
    const key = scalarNode(text, bounds[index], bounds[index + 1], true, scalars);
    const value = scalarNode(text, bounds[index + 2], bounds[index + 3], false, scalars);
    if (!key || !value) return undefined;
    // Keys that repeat are an error the package reports: such a line is left to it.
    if (map.items.some((pair) => (pair.key as Scalar).value === key.value)) return undefined;
    map.items.push(new Pair(key, value));
  }
  map.range = [brace, contentEnd, next];
  return map;
}

function scalarNode(
  text: string,
  start: number,
  end: number,
  atKey: boolean,
  scalars: (source: string, atKey: boolean) => Resolved | undefined,
): Scalar | undefined {
  const source = text.slice(start, end);
  const resolved = scalars(source, atKey);
  if (!resolved) return undefined;
  const scalar = new Scalar(resolved.value);
  scalar.range = [start, end, end];
  scalar.source = source;
  scalar.type = Scalar.PLAIN;
  if (resolved.format) scalar.format = resolved.format;
  return scalar;
}
