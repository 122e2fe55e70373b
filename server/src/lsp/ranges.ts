/**
 * The only place where the core's UTF-16 offsets become protocol positions and back.
 */
import type { Range } from "vscode-languageserver";
import type { TextDocument } from "vscode-languageserver-textdocument";
import type { TextRange } from "./core";

/** A core range as a protocol range in `document`. */
export function lspRange(document: TextDocument, range: TextRange): Range {
  return { start: document.positionAt(range.start), end: document.positionAt(range.end) };
}

/** A protocol range as offsets; positions past the end are clamped by the document. */
export function offsetRange(document: TextDocument, range: Range): TextRange {
  return { start: document.offsetAt(range.start), end: document.offsetAt(range.end) };
}

/** True when two half-open ranges share a character, or an empty one touches the other. */
export function rangesTouch(a: TextRange, b: TextRange): boolean {
  return a.start <= b.end && b.start <= a.end;
}

/** True when `inner` lies within `outer`. */
export function rangeWithin(inner: TextRange, outer: TextRange): boolean {
  return inner.start >= outer.start && inner.end <= outer.end;
}
