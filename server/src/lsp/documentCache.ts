/**
 * Parse once per text: a bounded cache of document models that every feature reads, keyed by
 * a revision that changes with every open and every edit. Version numbers are the client's and
 * may repeat (a document closed and reopened, a change that keeps its version), so they are
 * never trusted to tell texts apart. Findings are worked out lazily, once per revision.
 */
import type { TextDocument } from "vscode-languageserver-textdocument";
import {
  chunkedTextOf,
  createDocumentAnalyser,
  type DocumentAnalyser,
  type DocumentAnalysis,
  type FindingPart,
  type SpeciesAtOffset,
  type SpeciesOccurrence,
} from "../../../shared/src/index";
import { isChunkedDocument } from "./chunkedDocument";
import { documentKindFor, type DocumentKind, type DocumentModel, type Finding } from "./core";

/** One analysed version of a document. */
export interface AnalysedDocument {
  readonly uri: string;
  readonly version: number;
  /** The text's revision (see `DocumentCache.revisionOf`). */
  readonly revision: number;
  readonly kind: DocumentKind;
  /** The whole document's model: for a large table this reads every row, so prefer the two below. */
  readonly model: DocumentModel;
  /** The model of the stretch from `start` to `end` (at least), for requests about a range. */
  modelAround(start: number, end: number): DocumentModel;
  /** The species at `offset`, read from the part of the document around it. */
  speciesAt(offset: number): SpeciesAtOffset | undefined;
  /** One occurrence per distinct species text (none for tables); ranges may be out of date. */
  distinctSpecies(): readonly SpeciesOccurrence[];
  /** Set when only a prefix was analysed. */
  readonly truncatedAt?: number;
  readonly binary: boolean;
  /** The core's findings for this version, plus a note when the document was cut. */
  findings(): readonly Finding[];
  /**
   * The same findings a part at a time, worked out only as far as the caller reads: diagnostics
   * that show a capped number never build the rest of a document full of findings, and a caller
   * may answer other requests between parts. Each part's ranges count from its `offset`: the
   * caller moves into place only the findings it keeps.
   */
  findingParts(): Iterable<FindingPart>;
  /** The findings of the part of the document around `start`..`end`. */
  findingsAround(start: number, end: number): readonly Finding[];
  /** How many species mentions the document holds, a part at a time (see `DocumentAnalysis.speciesCount`). */
  speciesCount(): Generator<void, number, undefined>;
  /** Set while the findings wait on a whole reading that may be done elsewhere (see `DocumentAnalysis.wholeReadWanted`). */
  wholeReadWanted(): ReturnType<DocumentAnalysis["wholeReadWanted"]>;
}

export interface DocumentCache {
  /** The model of the document's current text, analysing it as `kind` if needed. */
  get(document: TextDocument, kind: DocumentKind): AnalysedDocument;
  /** Call on every open and every change of `uri`: its text gets a new revision. */
  contentChanged(uri: string): void;
  /**
   * A number that differs for every text a document has had while the server ran, across
   * closes and reopens: results built from one text are told apart from another's by it.
   */
  revisionOf(uri: string): number;
  /** The kind of document, or undefined when lonepair has nothing to read in it. Cheap. */
  kindOf(document: TextDocument): DocumentKind | undefined;
  /** Forgets a closed document: its model and its revision. */
  delete(uri: string): void;
}

/** Enough of the start of a document to tell a table saved as .txt from prose. */
export const SNIFF_LENGTH = 4096;

/** Creates a cache holding at most `capacity` documents, least recently used dropped first. */
export function createDocumentCache(capacity = 32): DocumentCache {
  const entries = new Map<string, AnalysedDocument>();
  const revisions = new Map<string, number>();
  // One analyser per open document, kept from edit to edit: it re-reads only what an edit changed.
  const analysers = new Map<string, { readonly kind: DocumentKind; readonly analyser: DocumentAnalyser }>();
  let lastRevision = 0;
  const revisionOf = (uri: string): number => {
    let revision = revisions.get(uri);
    if (revision === undefined) {
      lastRevision += 1;
      revision = lastRevision;
      revisions.set(uri, revision);
    }
    return revision;
  };
  const analyserFor = (uri: string, kind: DocumentKind): DocumentAnalyser => {
    const known = analysers.get(uri);
    if (known && known.kind === kind) return known.analyser;
    const analyser = createDocumentAnalyser(kind);
    analysers.set(uri, { kind, analyser });
    return analyser;
  };
  return {
    get(document, kind) {
      const revision = revisionOf(document.uri);
      const cached = entries.get(document.uri);
      if (cached && cached.revision === revision && cached.version === document.version && cached.kind === kind) {
        // Re-insert so the map's order stays least-recently-used first.
        entries.delete(document.uri);
        entries.set(document.uri, cached);
        return cached;
      }
      const entry = analyseDocument(document, kind, revision, analyserFor(document.uri, kind));
      entries.delete(document.uri);
      entries.set(document.uri, entry);
      while (entries.size > capacity) {
        const oldest = entries.keys().next().value as string;
        entries.delete(oldest);
        analysers.delete(oldest);
      }
      return entry;
    },
    kindOf(document) {
      // Recomputed per call: a header typed into a new .txt file can turn it into a table.
      return documentKindFor(fileNameOf(document.uri), document.languageId, document.getText(firstBytesRange(document)));
    },
    contentChanged(uri) {
      lastRevision += 1;
      revisions.set(uri, lastRevision);
    },
    revisionOf,
    delete(uri) {
      entries.delete(uri);
      revisions.delete(uri);
      analysers.delete(uri);
    },
  };
}

function firstBytesRange(document: TextDocument) {
  return { start: { line: 0, character: 0 }, end: document.positionAt(SNIFF_LENGTH) };
}

/**
 * Analyses one version of a document as `kind` (also for text that is not open). With the
 * analyser kept for an open document, only the parts an edit changed are read again; everything
 * is worked out the first time a feature asks for it. `readUpTo` says that `document` holds only
 * the start of a file, up to there.
 */
export function analyseDocument(
  document: TextDocument,
  kind: DocumentKind,
  revision: number,
  analyser: DocumentAnalyser = createDocumentAnalyser(kind),
  readUpTo?: number,
): AnalysedDocument {
  const text = isChunkedDocument(document) ? document.chunked : chunkedTextOf(document.getText());
  const analysis: DocumentAnalysis = analyser.analyse(text);
  // A file read only up to `readUpTo` (the workspace check's bound) is as cut as a huge open document.
  const truncatedAt = analysis.truncatedAt ?? readUpTo;
  let findings: readonly Finding[] | undefined;
  return {
    uri: document.uri,
    version: document.version,
    revision,
    kind,
    get model() {
      return analysis.model();
    },
    modelAround: (start, end) => analysis.modelAround(start, end),
    speciesAt: (offset) => analysis.speciesAt(offset),
    distinctSpecies: () => analysis.distinctSpecies(),
    truncatedAt,
    binary: analysis.binary,
    findings() {
      findings ??= [...truncationNote(truncatedAt), ...analysis.findings()];
      return findings;
    },
    *findingParts() {
      if (findings) {
        yield { findings, offset: 0 };
        return;
      }
      const note = truncationNote(truncatedAt);
      if (note.length > 0) yield { findings: note, offset: 0 };
      yield* analysis.findingPartsAt();
    },
    findingsAround: (start, end) => analysis.findingsAround(start, end),
    speciesCount: () => analysis.speciesCount(),
    wholeReadWanted: () => analysis.wholeReadWanted(),
  };
}

/** One warning on the first line of a document that was only partly analysed, saying how much was. */
function truncationNote(truncatedAt: number | undefined): Finding[] {
  if (truncatedAt === undefined) return [];
  const millions = (truncatedAt / (1024 * 1024)).toFixed(1);
  return [
    {
      range: { start: 0, end: 0 },
      severity: "warning",
      code: "document-partly-analysed",
      message: `This document is very large: lonepair checked only its first ${millions} Mi characters; nothing after that is checked. The command line (lonepair check) reads files of any size.`,
    },
  ];
}

/** The last path segment of a URI, decoded, for recognising `.csv` and friends. */
export function fileNameOf(uri: string): string {
  const path = uri.split(/[?#]/)[0];
  const last = path.slice(path.lastIndexOf("/") + 1);
  try {
    return decodeURIComponent(last);
  } catch {
    return last;
  }
}
