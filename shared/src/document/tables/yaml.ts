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
import { isEquationHeader, namesSpecies } from "./headers";
import { addRecord, type RecordField, type RecordSink } from "./records";

/** The documents of a YAML stream, as `parseYamlStream` gives them. */
export type YamlStream = readonly Document.Parsed[];

/** The problem reported when the `yaml` package throws on a text. */
const UNREADABLE: Finding = {
  range: { start: 0, end: 0 },
  severity: "error",
  code: "yaml-syntax",
  message: "This YAML could not be read.",
};

/** Reads a YAML stream (one or more documents) into `sink`; returns its syntax problems. */
export function readYamlRecords(text: string, read: SpeciesReader, sink: RecordSink): readonly Finding[] {
  const documents = parseYamlStream(text);
  return documents ? readYamlStream(documents, text, read, sink) : [UNREADABLE];
}

/** The documents of `text` (undefined when the `yaml` package throws on it). */
export function parseYamlStream(text: string): YamlStream | undefined {
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
  while (pending.length > 0) {
    const { node, key } = pending.pop()!;
    if (isMap(node)) {
      mappingRecord(node, key, text, read, sink);
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

function mappingRecord(node: YAMLMap, key: Scalar | undefined, text: string, read: SpeciesReader, sink: RecordSink): void {
  const fields: RecordField[] = [];
  for (const pair of node.items as Pair[]) {
    if (isScalar(pair.key) && isEquationHeader(String(pair.key.value))) equationValues(pair.value as Node | null, text, read, sink);
    if (!isScalar(pair.key) || !isScalar(pair.value)) continue;
    // Keys repeat in every record: their meaning is worked out once, as a table's headers are.
    const column = columnUnder(String(pair.key.value));
    const field = column && scalarField(pair.value, text);
    if (column && field) fields.push({ meaning: column.meaning, formulaHeader: column.formulaHeader, ...field });
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
