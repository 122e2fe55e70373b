/**
 * YAML documents: every mapping with a key that names a species column is a record; so is a
 * mapping stored under a key that is itself a species (`SF4: {lone pairs: 1}`). Ranges come from
 * the `yaml` package's node ranges; syntax errors become problems. Aliases are not followed, so
 * an alias bomb costs nothing.
 */
import { isMap, isPair, isScalar, isSeq, parseAllDocuments, Scalar, type Document, type Node, type Pair, type YAMLMap } from "yaml";
import type { SpeciesReader } from "../speciesReader";
import type { Finding } from "../types";
import { columnUnder } from "./delimitedRecords";
import { readEquationCell } from "./equationCells";
import { equationKeyTest, namesSpecies } from "./headers";
import { addRecord, type RecordField, type RecordSink } from "./records";
import { parseWithItemLines } from "./yamlItemLines";

/** The documents of a YAML stream, as `parseYamlStream` gives them. */
export type YamlStream = readonly Document.Parsed[];

/** The problem reported when the `yaml` package throws on a text. */
const UNREADABLE: Finding = {
  range: { start: 0, end: 0 },
  severity: "error",
  code: "yaml-syntax",
  message: "This YAML could not be read.",
};

/**
 * How deep a YAML text may nest before it is refused unread. The `yaml` package recurses once per
 * level and runs out of stack at about 900; after such an overflow the process can fail outright
 * on its next large allocation, so the text is never handed over. Real data nests a few dozen deep.
 */
export const MAX_YAML_NESTING = 256;

/** The problem reported for a text that nests deeper than `MAX_YAML_NESTING`. */
const TOO_DEEP: Finding = {
  range: { start: 0, end: 0 },
  severity: "error",
  code: "yaml-syntax",
  message: `This YAML nests deeper than ${MAX_YAML_NESTING} levels; it was not read.`,
};

/** Reads a YAML stream (one or more documents) into `sink`; returns its syntax problems. */
export function readYamlRecords(text: string, read: SpeciesReader, sink: RecordSink): readonly Finding[] {
  if (yamlNestingBound(text) > MAX_YAML_NESTING) return [TOO_DEEP];
  const documents = parseNested(text);
  return documents ? readYamlStream(documents, text, read, sink) : [UNREADABLE];
}

/**
 * An upper bound on how deep the nodes of `text` nest, in one pass: block levels open only with
 * more indentation than every level still open, or with indicators (`- `, `? `, `: `) at the
 * start of a line's content; flow levels open with `[` or `{`. Quotes and comments are not
 * skipped, so brackets inside them may only raise the bound.
 */
export function yamlNestingBound(text: string): number {
  const indents: number[] = [];
  let flow = 0;
  let deepest = 0;
  let index = 0;
  while (index < text.length) {
    let indent = 0;
    while (text.charCodeAt(index + indent) === SPACE) indent++;
    let position = index + indent;
    let code = text.charCodeAt(position);
    // Blank and comment lines close no levels.
    const blank = code === LINE_FEED || code === CARRIAGE_RETURN || code === HASH || Number.isNaN(code);
    let compact = 0;
    if (!blank && flow === 0) {
      while (indents.length > 0 && indents[indents.length - 1] >= indent) indents.pop();
      indents.push(indent);
      // "- - - x" and "? - x": each indicator followed by a space opens one more level.
      while ((code === DASH || code === QUESTION || code === COLON) && text.charCodeAt(position + 1) === SPACE) {
        compact++;
        position += 2;
        while (text.charCodeAt(position) === SPACE) position++;
        code = text.charCodeAt(position);
      }
    }
    let lineEnd = text.indexOf("\n", position);
    if (lineEnd < 0) lineEnd = text.length;
    let deepestFlow = flow;
    for (let at = position; at < lineEnd; at++) {
      const character = text.charCodeAt(at);
      if (character === OPEN_BRACKET || character === OPEN_BRACE) deepestFlow = Math.max(deepestFlow, ++flow);
      else if ((character === CLOSE_BRACKET || character === CLOSE_BRACE) && flow > 0) flow--;
    }
    deepest = Math.max(deepest, indents.length + compact + deepestFlow);
    index = lineEnd + 1;
  }
  return deepest;
}

const SPACE = 0x20;
const LINE_FEED = 0x0a;
const CARRIAGE_RETURN = 0x0d;
const DASH = 0x2d;
const QUESTION = 0x3f;
const HASH = 0x23;
const COLON = 0x3a;
const OPEN_BRACKET = 0x5b;
const CLOSE_BRACKET = 0x5d;
const OPEN_BRACE = 0x7b;
const CLOSE_BRACE = 0x7d;

/** The documents of `text` (undefined when the `yaml` package throws on it or it nests too deep). */
export function parseYamlStream(text: string): YamlStream | undefined {
  return yamlNestingBound(text) > MAX_YAML_NESTING ? undefined : parseNested(text);
}

function parseNested(text: string): YamlStream | undefined {
  // Long runs of one-line flow mappings are built without the package's full parse (see `parseWithItemLines`).
  return parseWithItemLines(text, parseWhole);
}

function parseWhole(text: string): YamlStream | undefined {
  try {
    const documents = parseAllDocuments(text, { prettyErrors: false, keepSourceTokens: false });
    return Array.isArray(documents) ? documents : [];
  } catch {
    return undefined;
  }
}

/** Reads the parsed `documents` of `text` into `sink`; returns their syntax problems. */
export function readYamlStream(documents: YamlStream, text: string, read: SpeciesReader, sink: RecordSink): readonly Finding[] {
  const problems: Finding[] = [];
  for (const document of documents) {
    for (const error of document.errors) {
      problems.push({
        range: { start: Math.min(error.pos[0], text.length), end: Math.min(Math.max(error.pos[1], error.pos[0] + 1), text.length) },
        severity: "error",
        code: "yaml-syntax",
        message: firstLine(error.message),
      });
    }
    if (document.contents) walk(document.contents as Node, text, read, sink);
  }
  return problems;
}

function firstLine(message: string): string {
  const line = message.split("\n")[0].trim();
  return line.length > 0 ? line : "YAML syntax error.";
}

interface Pending {
  readonly node: Node;
  /** The key this node is the value of, when it sits in a mapping. */
  readonly key?: Scalar;
}

/** Visits every mapping without recursion, so deep documents cannot exhaust the stack. */
function walk(root: Node, text: string, read: SpeciesReader, sink: RecordSink): void {
  const pending: Pending[] = [{ node: root }];
  const isEquationKey = equationKeyTest();
  while (pending.length > 0) {
    const { node, key } = pending.pop()!;
    if (isMap(node)) {
      mappingRecord(node, key, text, read, sink, isEquationKey);
      for (let index = node.items.length - 1; index >= 0; index--) {
        const pair = node.items[index];
        if (!isPair(pair)) continue;
        const value = pair.value as Node | null;
        if (value && (isMap(value) || isSeq(value))) pending.push({ node: value, key: isScalar(pair.key) ? pair.key : undefined });
      }
    } else if (isSeq(node)) {
      for (let index = node.items.length - 1; index >= 0; index--) {
        const item = node.items[index] as Node | null;
        if (item && (isMap(item) || isSeq(item))) pending.push({ node: item });
      }
    }
  }
}

function mappingRecord(
  node: YAMLMap,
  key: Scalar | undefined,
  text: string,
  read: SpeciesReader,
  sink: RecordSink,
  isEquationKey: (key: string) => boolean,
): void {
  const fields: RecordField[] = [];
  for (const pair of node.items as Pair[]) {
    if (isScalar(pair.key) && isEquationKey(String(pair.key.value))) equationValues(pair.value as Node | null, text, read, sink);
    if (!isScalar(pair.key) || !isScalar(pair.value)) continue;
    // Keys repeat in every record: their meaning is worked out once, as a table's headers are.
    const column = columnUnder(String(pair.key.value));
    const field = column && scalarField(pair.value, text);
    if (column && field) fields.push({ meaning: column.meaning, formulaHeader: column.formulaHeader, language: column.language, ...field });
  }
  if (fields.length === 0) return;
  if (!fields.some((field) => namesSpecies(field.meaning))) {
    // SF4: {lone pairs: 1}: the key the mapping sits under names the species.
    const keyField = key && scalarField(key, text);
    if (!keyField || !read(keyField.text).ok) return;
    fields.unshift({ meaning: "species", formulaHeader: true, ...keyField });
  }
  addRecord(fields, read, sink);
}

/** A scalar under an equation key, or each scalar of a list there, read as an equation. */
function equationValues(value: Node | null, text: string, read: SpeciesReader, sink: RecordSink): void {
  const items = isSeq(value) ? (value.items as (Node | null)[]) : [value];
  for (const item of items) {
    if (!isScalar(item) || typeof item.value !== "string") continue;
    const field = scalarField(item, text);
    if (field) readEquationCell(text, field.range, field.text, read, sink);
  }
}

/** A scalar's written value and the range of its characters (inside quotes when quoted). */
function scalarField(scalar: Scalar, text: string): { text: string; range: { start: number; end: number } } | undefined {
  const range = scalar.range;
  if (!range || scalar.value === null || scalar.value === undefined) return undefined;
  const [start, valueEnd] = range;
  if (scalar.type === Scalar.QUOTE_DOUBLE || scalar.type === Scalar.QUOTE_SINGLE) {
    return { text: String(scalar.value), range: { start: start + 1, end: valueEnd - 1 } };
  }
  if (scalar.type === Scalar.BLOCK_FOLDED || scalar.type === Scalar.BLOCK_LITERAL) return undefined;
  return { text: text.slice(start, valueEnd), range: { start, end: valueEnd } };
}
