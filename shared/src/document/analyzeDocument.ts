/**
 * One document version to its model: the species mentioned, the table records and the problems
 * of the text itself. Linear in the length of the text and never throws.
 */
import { scanMarkdown } from "./scanMarkdown";
import { scanPlainText } from "./scanPlainText";
import { memoisedReader, type SpeciesReader } from "./speciesReader";
import { readDelimitedRecords } from "./tables/delimitedRecords";
import { readJsonOutline, readJsonRecords, readJsonTree, type JsonTree } from "./tables/json";
import type { JsonOutline } from "./tables/jsonOutline";
import type { RecordSink } from "./tables/records";
import { readYamlRecords, readYamlStream, type YamlStream } from "./tables/yaml";
import type { Reaction } from "./reactions/reactionTypes";
import type { DocumentKind, DocumentModel, Finding, SpeciesOccurrence } from "./types";

/** What a caller may already know about a document. */
export interface AnalyzeOptions {
  /**
   * The delimiter of a CSV, when the caller has already guessed it from the same start of the
   * document (a file read in batches guesses once, not once a batch).
   */
  readonly delimiter?: string;
}

/**
 * Reads `text` as a document of `kind`: CSV/TSV as a header row and records, JSON/YAML as
 * records, markdown as prose and tables, plain text as prose. Malformed JSON or YAML gives
 * `problems` with ranges, not an exception.
 */
export function analyzeDocument(
  text: string,
  kind: DocumentKind,
  read: SpeciesReader = memoisedReader(),
  options: AnalyzeOptions = {},
): DocumentModel {
  const source = typeof text === "string" ? text : "";
  return modelOf(kind, (sink) => readByKind(source, kind, read, sink, options));
}

/**
 * The model of a YAML stream `text` whose documents are already parsed: what `analyzeDocument`
 * gives for `text`, without parsing it again (the caller also needs the documents' nodes).
 */
export function analyzeYamlStream(text: string, documents: YamlStream, read: SpeciesReader): DocumentModel {
  return modelOf("yaml", (sink) => readYamlStream(documents, text, read, sink));
}

/**
 * The model of a JSON `text` already parsed into `tree`: what `analyzeDocument` gives for `text`,
 * without parsing it again (the caller also needs the tree).
 */
export function analyzeJsonTree(text: string, tree: JsonTree, read: SpeciesReader): DocumentModel {
  return modelOf("json", (sink) => readJsonTree(tree, text, read, sink));
}

/**
 * The model of a clean JSON `text` already read into `outline`: what `analyzeDocument` gives for
 * `text`, without reading it again (the caller also needs the outline's list).
 */
export function analyzeJsonOutline(text: string, outline: JsonOutline, read: SpeciesReader): DocumentModel {
  return modelOf("json", (sink) => {
    readJsonOutline(outline, text, read, sink);
    return [];
  });
}

function modelOf(kind: DocumentKind, reader: (sink: RecordSink) => readonly Finding[]): DocumentModel {
  const sink: RecordSink = { occurrences: [], unreadable: [], records: [], reactions: [] };
  let problems: readonly Finding[];
  try {
    problems = reader(sink);
  } catch (error) {
    // Every reader is written not to throw; this keeps a document usable if one still does.
    problems = [documentUnreadable(error)];
  }
  return {
    kind,
    occurrences: inDocumentOrder(sink.occurrences),
    records: sink.records,
    problems,
    unreadable: [...sink.unreadable].sort((a, b) => a.range.start - b.range.start),
    reactions: distinctReactions(sink.reactions ?? []),
  };
}

function readByKind(text: string, kind: DocumentKind, read: SpeciesReader, sink: RecordSink, options: AnalyzeOptions): readonly Finding[] {
  switch (kind) {
    case "csv":
    case "tsv":
      return readDelimitedRecords(text, kind, read, sink, options.delimiter);
    case "json":
      return readJsonRecords(text, read, sink);
    case "yaml":
      return readYamlRecords(text, read, sink);
    case "markdown":
      scanMarkdown(text, read, sink);
      return [];
    default:
      scanPlainText(text, read, sink, kind);
      return [];
  }
}

/** The one problem reported when a reader throws after all. */
export function documentUnreadable(error: unknown): Finding {
  return {
    range: { start: 0, end: 0 },
    severity: "error",
    code: "document-unreadable",
    message: `lonepair could not read this document: ${error instanceof Error ? error.message : String(error)}`,
  };
}

/** Sorted by start; scanners mostly emit in order already, so this is close to linear. */
export function inDocumentOrder(occurrences: SpeciesOccurrence[]): SpeciesOccurrence[] {
  for (let index = 1; index < occurrences.length; index++) {
    if (occurrences[index].range.start < occurrences[index - 1].range.start) {
      return [...occurrences].sort((a, b) => a.range.start - b.range.start);
    }
  }
  return occurrences;
}

/** In document order, one per arrow: a cell read as an equation is not read again as prose. */
export function distinctReactions(reactions: readonly Reaction[]): Reaction[] {
  const seen = new Set<number>();
  const distinct = reactions.filter((reaction) => {
    if (seen.has(reaction.arrow.range.start)) return false;
    seen.add(reaction.arrow.range.start);
    return true;
  });
  return distinct.sort((a, b) => a.range.start - b.range.start);
}
