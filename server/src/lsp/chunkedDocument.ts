/**
 * The open documents' text, kept as the core's chunked text: an edit copies only the chunks it
 * touches, never the whole document, and each version's text is an immutable value the analysis
 * can keep. The full string is built only when a feature asks for it, once per version.
 */
import type { TextDocumentContentChangeEvent, TextDocumentsConfiguration } from "vscode-languageserver";
import type { Position, Range, TextDocument } from "vscode-languageserver-textdocument";
import { takeChunked } from "./longStringChunks";
import { chunkedTextOf, editChunkedText, offsetOf, positionOf, sliceOf, wholeText, type ChunkedText } from "../../../shared/src/index";

/** A text document whose current text is a `ChunkedText`. */
export interface ChunkedTextDocument extends TextDocument {
  /** This version's text, shared with the analysis. */
  readonly chunked: ChunkedText;
}

/** Whether `document` keeps its text in chunks (documents made elsewhere, e.g. in tests, may not). */
export function isChunkedDocument(document: TextDocument): document is ChunkedTextDocument {
  return (document as Partial<ChunkedTextDocument>).chunked !== undefined;
}

/** A document at `version` holding `text`. */
export function createChunkedDocument(uri: string, languageId: string, version: number, text: ChunkedText): ChunkedTextDocument {
  let flat: string | undefined;
  return {
    uri,
    languageId,
    version,
    chunked: text,
    lineCount: text.lineCount,
    getText(range?: Range): string {
      if (range) return sliceOf(text, offsetOf(text, range.start), offsetOf(text, range.end));
      flat ??= wholeText(text);
      return flat;
    },
    positionAt: (offset: number): Position => positionOf(text, offset),
    offsetAt: (position: Position): number => offsetOf(text, position),
    getLineRange(line: number): Range {
      const start = offsetOf(text, { line, character: 0 });
      const end = offsetOf(text, { line, character: Number.MAX_SAFE_INTEGER });
      return { start: positionOf(text, start), end: positionOf(text, end) };
    },
    getEOLCharacters(line: number): string {
      const end = offsetOf(text, { line, character: Number.MAX_SAFE_INTEGER });
      const next = offsetOf(text, { line: line + 1, character: 0 });
      return line + 1 >= text.lineCount ? "" : sliceOf(text, end, next);
    },
  };
}

/** `document` with `changes` applied in order, as a new document at `version`. */
export function updateChunkedDocument(
  document: ChunkedTextDocument,
  changes: readonly TextDocumentContentChangeEvent[],
  version: number,
): ChunkedTextDocument {
  let text = document.chunked;
  for (const change of changes) {
    if ("range" in change && change.range) {
      // Ranges are read against the text as the earlier changes left it, as the protocol says.
      text = editChunkedText(text, offsetOf(text, change.range.start), offsetOf(text, change.range.end), change.text);
    } else {
      text = takeChunked(change.text) ?? chunkedTextOf(change.text);
    }
  }
  return createChunkedDocument(document.uri, document.languageId, version, text);
}

/** What `TextDocuments` needs to keep chunked documents. */
export const CHUNKED_DOCUMENTS: TextDocumentsConfiguration<ChunkedTextDocument> = {
  create: (uri, languageId, version, content) =>
    createChunkedDocument(uri, languageId, version, takeChunked(content) ?? chunkedTextOf(content)),
  update: (document, changes, version) => updateChunkedDocument(document, changes, version),
};
