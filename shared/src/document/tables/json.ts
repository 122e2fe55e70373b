/**
 * JSON (and JSON with comments) documents: every object with a key that names a species column
 * is a record; so is an object stored under a key that is itself a species ({"SF4": {...}}).
 * Offsets come from jsonc-parser's syntax tree; syntax errors become problems with ranges.
 */
// The ES module build: the package's default UMD build loads its parts with a dynamic require
// that bundlers cannot follow.
import { parseTree, printParseErrorCode, type Node, type ParseError } from "jsonc-parser/lib/esm/main.js";
import type { SpeciesReader } from "../speciesReader";
import type { Finding } from "../types";
import { columnUnder } from "./delimitedRecords";
import { readEquationCell } from "./equationCells";
import { equationKeyTest, namesSpecies } from "./headers";
import { jsonOutline, type JsonOutline, type OutlineObject, type OutlineProperty, type ValueKind } from "./jsonOutline";
import { addRecord, type RecordField, type RecordSink } from "./records";

const MESSAGES: Readonly<Record<string, string>> = {
  InvalidSymbol: "Unexpected character.",
  InvalidNumberFormat: "This number is not written the way JSON allows.",
  PropertyNameExpected: "A property name in double quotes belongs here.",
  ValueExpected: "A value belongs here.",
  ColonExpected: "A colon belongs here.",
  CommaExpected: "A comma belongs here.",
  CloseBraceExpected: "A closing } belongs here.",
  CloseBracketExpected: "A closing ] belongs here.",
  EndOfFileExpected: "Nothing more belongs after the end of the JSON value.",
  UnexpectedEndOfString: "This string is never closed.",
  InvalidEscapeCharacter: "This escape is not allowed in a JSON string.",
  InvalidCharacter: "This character is not allowed here.",
};

/** How JSON is parsed: with comments and trailing commas, as settings files are written. */
export const JSON_PARSE_OPTIONS = { allowTrailingComma: true, disallowComments: false } as const;

/** A JSON text parsed once: its syntax tree (undefined when it nests too deeply to read) and errors. */
export interface JsonTree {
  readonly root: Node | undefined;
  readonly errors: readonly ParseError[];
  /** Set when the parser exhausted the stack: nothing was read. */
  readonly tooDeep: boolean;
}

/** Parses `text` once, for callers that need both its records and its tree. */
export function parseJsonTree(text: string): JsonTree {
  const errors: ParseError[] = [];
  try {
    return { root: parseTree(text, errors, JSON_PARSE_OPTIONS), errors, tooDeep: false };
  } catch {
    // Nesting deep enough to exhaust the stack: say so rather than fail.
    return { root: undefined, errors: [], tooDeep: true };
  }
}

/** Reads a JSON document into `sink`; returns its syntax problems. */
export function readJsonRecords(text: string, read: SpeciesReader, sink: RecordSink): readonly Finding[] {
  const isEquationKey = equationKeyTest();
  // Clean JSON is read without a syntax tree; the tree gives the problems of the rest.
  const outline = jsonOutline(text, isEquationKey);
  if (outline) {
    readJsonOutline(outline, text, read, sink, isEquationKey);
    return [];
  }
  return readJsonTree(parseJsonTree(text), text, read, sink);
}

/** Reads the outline of a clean JSON `text` into `sink` (it has no syntax problems). */
export function readJsonOutline(
  outline: JsonOutline,
  text: string,
  read: SpeciesReader,
  sink: RecordSink,
  isEquationKey: (key: string) => boolean = equationKeyTest(),
): void {
  for (const object of outline.objects) objectRecord(object, text, read, sink, isEquationKey);
}

/** Reads the parsed `tree` of `text` into `sink`; returns its syntax problems. */
export function readJsonTree(tree: JsonTree, text: string, read: SpeciesReader, sink: RecordSink): readonly Finding[] {
  if (tree.tooDeep) {
    return [{ range: { start: 0, end: 0 }, severity: "error", code: "json-syntax", message: "This JSON is nested too deeply to read." }];
  }
  const problems = tree.errors.map((error): Finding => {
    const name = printParseErrorCode(error.error);
    return {
      // At least one character, but never past the end of the text.
      range: { start: Math.min(error.offset, text.length), end: Math.min(error.offset + Math.max(error.length, 1), text.length) },
      severity: "error",
      code: "json-syntax",
      message: MESSAGES[name] ?? `JSON syntax error (${name}).`,
    };
  });
  if (tree.root) walk(tree.root, text, read, sink);
  return problems;
}

/** Visits every object without recursion, so deep documents cannot exhaust the stack. */
function walk(root: Node, text: string, read: SpeciesReader, sink: RecordSink): void {
  const pending: Node[] = [root];
  const isEquationKey = equationKeyTest();
  while (pending.length > 0) {
    const node = pending.pop()!;
    if (node.type === "object") objectRecord(outlineOf(node, isEquationKey), text, read, sink, isEquationKey);
    const children = node.children ?? [];
    for (let index = children.length - 1; index >= 0; index--) {
      const child = children[index];
      if (child.type === "property") {
        const value = child.children?.[1];
        if (value && (value.type === "object" || value.type === "array")) pending.push(value);
      } else if (child.type === "object" || child.type === "array") pending.push(child);
    }
  }
}

/** An object of the syntax tree as the record reader sees it (what `jsonOutline` gives for clean JSON). */
function outlineOf(node: Node, isEquationKey: (key: string) => boolean): OutlineObject {
  const properties: OutlineProperty[] = [];
  for (const property of node.children ?? []) {
    const [key, value] = property.children ?? [];
    if (!key || !value || typeof key.value !== "string") continue;
    const kind: ValueKind =
      value.type === "string"
        ? "string"
        : value.type === "number" || value.type === "boolean"
          ? "written"
          : value.type === "array"
            ? "list"
            : "other";
    const strings =
      kind === "list" && isEquationKey(key.value)
        ? (value.children ?? [])
            .filter((item) => item.type === "string")
            .map((item) => [String(item.value), item.offset, item.length] as const)
        : undefined;
    properties.push({
      key: key.value,
      kind,
      offset: value.offset,
      length: value.length,
      value: kind === "string" ? String(value.value) : undefined,
      strings,
    });
  }
  const key = node.parent?.type === "property" ? node.parent.children?.[0] : undefined;
  return {
    properties,
    under: key && typeof key.value === "string" ? { key: key.value, offset: key.offset, length: key.length } : undefined,
  };
}

function objectRecord(
  object: OutlineObject,
  text: string,
  read: SpeciesReader,
  sink: RecordSink,
  isEquationKey: (key: string) => boolean,
): void {
  const fields: RecordField[] = [];
  for (const property of object.properties) {
    if (isEquationKey(property.key)) equationValues(property, text, read, sink);
    // Keys repeat in every record: their meaning is worked out once, as a table's headers are.
    const column = columnUnder(property.key);
    const field = column && valueField(property, text);
    if (column && field) fields.push({ meaning: column.meaning, formulaHeader: column.formulaHeader, language: column.language, ...field });
  }
  if (fields.length === 0) return;
  if (!fields.some((field) => namesSpecies(field.meaning))) {
    // {"SF4": {"lone pairs": 1}}: the key the object sits under names the species.
    const under = object.under;
    if (!under || !read(under.key).ok) return;
    fields.unshift({ meaning: "species", formulaHeader: true, ...stringField(under.key, under.offset, under.length) });
  }
  addRecord(fields, read, sink);
}

/** A string under an equation key, or each string of a list there, read as an equation. */
function equationValues(property: OutlineProperty, text: string, read: SpeciesReader, sink: RecordSink): void {
  const strings =
    property.kind === "list"
      ? (property.strings ?? [])
      : property.kind === "string"
        ? [[property.value!, property.offset, property.length] as const]
        : [];
  for (const [value, offset, length] of strings) {
    const field = stringField(value, offset, length);
    readEquationCell(text, field.range, field.text, read, sink);
  }
}

function valueField(property: OutlineProperty, text: string): { text: string; range: { start: number; end: number } } | undefined {
  if (property.kind === "string") return stringField(property.value!, property.offset, property.length);
  if (property.kind === "written") {
    return {
      text: text.slice(property.offset, property.offset + property.length),
      range: { start: property.offset, end: property.offset + property.length },
    };
  }
  return undefined;
}

/** A string's value and the range inside its quotes. */
function stringField(value: string, offset: number, length: number): { text: string; range: { start: number; end: number } } {
  return { text: value, range: { start: offset + 1, end: offset + length - 1 } };
}
