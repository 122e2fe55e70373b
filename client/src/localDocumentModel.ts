/**
 * The core's model of an open document, worked out in the extension host for the features the
 * server has no request for yet. A few recent (uri, version) pairs are kept, so cursor moves and
 * status-bar refreshes do not re-read an unchanged document.
 */
import type * as vscode from "vscode";
import { analyzeDocument, documentKindFor, type DocumentKind, type DocumentModel } from "./core";

const CAPACITY = 4;
/** Beyond this many characters the extension host leaves the work to the server. */
export const LOCAL_ANALYSIS_LIMIT = 2_000_000;

const cache = new Map<string, { version: number; model: DocumentModel }>();

/** The kind of document, by file name, language id and the first bytes. */
export function kindOfDocument(document: vscode.TextDocument): DocumentKind {
  return documentKindFor(document.fileName, document.languageId, document.getText().slice(0, 512)) ?? "plaintext";
}

/** The model of the document's current version, or undefined for a document too large to read here. */
export function localDocumentModel(document: vscode.TextDocument): DocumentModel | undefined {
  const key = document.uri.toString();
  const cached = cache.get(key);
  if (cached && cached.version === document.version) return cached.model;
  const text = document.getText();
  if (text.length > LOCAL_ANALYSIS_LIMIT) return undefined;
  const model = analyzeDocument(text, kindOfDocument(document));
  cache.delete(key);
  cache.set(key, { version: document.version, model });
  while (cache.size > CAPACITY) cache.delete(cache.keys().next().value as string);
  return model;
}

/** Forgets a closed document. */
export function forgetLocalModel(uri: vscode.Uri): void {
  cache.delete(uri.toString());
}
