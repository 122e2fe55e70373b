/**
 * Scores species spotting on the real-style corpus (tests/fixtures/real-style): documents written
 * the way other people write (course pages with HTML sub- and superscripts, a reStructuredText
 * README, student reports, field notes, encyclopedia pages, an inventory CSV, a handbook TSV of
 * aqueous ions, LaTeX and mhchem notes), each species mention marked with ⟦ and ⟧.
 *
 * The engine is passed in, so the unit test scores the TypeScript sources and the benchmark scores
 * the bundle (dist/core.js) with the same rules.
 */
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import type { DocumentKind, DocumentModel, ReadResult } from "../../shared/src/index";
import { lineAndColumn, stripLabels } from "./labelledText";

/** The facade functions the score needs; the reader only says why a label was missed. */
export interface SpottingEngine {
  readonly analyzeDocument: (text: string, kind: DocumentKind) => DocumentModel;
  readonly documentKindFor: (fileName: string, languageId?: string, firstBytes?: string) => DocumentKind | undefined;
  readonly readSpecies: (text: string) => ReadResult;
}

/** One labelled span or one reported span, placed for a reader of the test output. */
export interface Mention {
  readonly file: string;
  readonly where: string;
  readonly text: string;
  /** Why it is listed, in plain words (see `missCause` and `falseReportCause`). */
  readonly cause: string;
  /** How the span is written (`writtenForm`), to group misses by what the engine must learn. */
  readonly form: string;
  /** More about the cause: the span found instead, or the label a wrong span overlaps. */
  readonly detail?: string;
}

/** Counts for a set of documents; precision and recall are NaN when there is nothing to divide. */
export interface SpottingScore {
  readonly documents: number;
  readonly labels: number;
  /** Labels found as read species with exactly the labelled span. */
  readonly found: number;
  /** Distinct spans reported: read species and confident mentions the reader refused. */
  readonly reported: number;
  /** Reported spans that are exactly a labelled span. */
  readonly correctReports: number;
  readonly precision: number;
  readonly recall: number;
  readonly misses: readonly Mention[];
  readonly falseReports: readonly Mention[];
}

/** A style (one folder of the corpus) and its score. */
export interface StyleScore extends SpottingScore {
  readonly style: string;
}

export interface CorpusScore {
  readonly styles: readonly StyleScore[];
  readonly overall: SpottingScore;
}

export const REAL_STYLE_CORPUS = join(__dirname, "..", "fixtures", "real-style");

/** The aims: what the scanner must reach on documents written by others. */
export const PRECISION_AIM = 0.97;
export const RECALL_AIM = 0.92;

interface Span {
  readonly start: number;
  readonly end: number;
  readonly text: string;
}

const keyOf = (span: { start: number; end: number }): string => `${span.start}:${span.end}`;

/**
 * The document kind the product gives the file; a file it has no kind for is read as plain text,
 * which is what a user gets by opening it as such.
 */
function kindOf(engine: SpottingEngine, file: string, text: string): DocumentKind {
  return engine.documentKindFor(file, undefined, text.slice(0, 4096)) ?? "plaintext";
}

/**
 * Why a labelled span was not found: spotted but refused by the reader, found with another span,
 * or not seen at all, and then whether the reader alone would read the text (a spotting gap) or
 * not (a notation or vocabulary gap too).
 */
function missCause(engine: SpottingEngine, label: Span, refused: ReadonlyMap<string, string>, reportedSpans: readonly Span[]): string {
  const refusal = refused.get(keyOf(label));
  if (refusal !== undefined) return `spotted but refused by the reader (${refusal})`;
  if (reportedSpans.some((span) => span.start < label.end && label.start < span.end)) return "found with another span";
  const reading = engine.readSpecies(label.text);
  return reading.ok ? "not spotted, though the reader reads it" : `not spotted, and the reader refuses it (${reading.problem.code})`;
}

/**
 * How a span is written, the first that applies: HTML tags, a hydrate or adduct, an isotope label,
 * a state symbol, a charge written sign first, LaTeX sub- and superscripts, a name or lab
 * abbreviation in mixed case, or else a plain formula or an abbreviation in capitals (DCM, KHP).
 */
export function writtenForm(text: string): string {
  if (/<su[bp]>/i.test(text)) return "HTML sub/superscript";
  if (/[A-Za-z0-9)\]]\s*[.·•*]\s*\d*\s*[A-Z]/.test(text) && !/\s[a-z]/.test(text)) return "hydrate or adduct";
  if (/^(?:\^\{?\d|\d+[A-Z]|[¹²³⁰-⁹]+[A-Z])|[a-z]H[¹²³⁰-⁹]/.test(text)) return "isotope";
  if (/\((?:aq|s|l|g)\)|_\{\((?:aq|s|l|g)\)\}/.test(text)) return "state symbol";
  if (/[A-Za-z0-9)\]][+-]\d$/.test(text)) return "sign-first charge";
  if (/[_^]|\\mathrm/.test(text)) return "LaTeX or mhchem notation";
  if (/[a-z]{3}/.test(text) || /^(?:Et|Me|Ph|Bu|Ac|i?Pr)[A-Z0-9]/.test(text)) return "name or abbreviation";
  return "formula or capitals";
}

/**
 * Why a reported span is wrong: part of (or more than) a labelled span, or no species at all; with
 * the labels it overlaps, whose written form says more than its own.
 */
function falseReport(file: string, where: string, span: Span, labels: readonly Span[], refused: boolean): Mention {
  const overlapping = labels.filter((label) => label.start < span.end && span.start < label.end);
  const what = refused ? "refused mention" : "species";
  if (overlapping.length === 0)
    return { file, where, text: span.text, cause: `${what} where nothing is labelled`, form: writtenForm(span.text) };
  return {
    file,
    where,
    text: span.text,
    cause: `${what} with the wrong span`,
    form: writtenForm(overlapping[0].text),
    detail: `labelled ${overlapping.map((label) => JSON.stringify(label.text)).join(", ")}`,
  };
}

function scoreDocument(engine: SpottingEngine, directory: string, file: string): SpottingScore {
  const marked = readFileSync(join(directory, file), "utf8");
  const { text, labels } = stripLabels(marked);
  const model = engine.analyzeDocument(text, kindOf(engine, file, text));
  const read = new Map<string, Span>();
  for (const occurrence of model.occurrences) read.set(keyOf(occurrence.range), { ...occurrence.range, text: occurrence.text });
  const refused = new Map<string, Span>();
  const refusals = new Map<string, string>();
  for (const unreadable of model.unreadable ?? []) {
    const key = keyOf(unreadable.range);
    if (read.has(key)) continue;
    refused.set(key, { ...unreadable.range, text: unreadable.text });
    refusals.set(key, unreadable.problem.code);
  }
  const labelKeys = new Set(labels.map(keyOf));
  const reportedSpans = [...read.values(), ...refused.values()];
  const refusedKeys = new Set(refused.keys());
  const place = (span: Span): string => lineAndColumn(text, span.start);
  const misses = labels
    .filter((label) => !read.has(keyOf(label)))
    .map((label): Mention => {
      const instead = reportedSpans.filter((span) => span.start < label.end && label.start < span.end);
      return {
        file,
        where: place(label),
        text: label.text,
        cause: missCause(engine, label, refusals, reportedSpans),
        form: writtenForm(label.text),
        ...(instead.length > 0 ? { detail: `found ${instead.map((span) => JSON.stringify(span.text)).join(", ")}` } : {}),
      };
    });
  const falseReports = reportedSpans
    .filter((span) => !labelKeys.has(keyOf(span)))
    .sort((a, b) => a.start - b.start)
    .map((span) => falseReport(file, place(span), span, labels, refusedKeys.has(keyOf(span))));
  return totals(1, labels.length, labels.length - misses.length, reportedSpans.length, misses, falseReports);
}

function totals(
  documents: number,
  labels: number,
  found: number,
  reported: number,
  misses: readonly Mention[],
  falseReports: readonly Mention[],
): SpottingScore {
  const correctReports = reported - falseReports.length;
  return {
    documents,
    labels,
    found,
    reported,
    correctReports,
    precision: correctReports / reported,
    recall: found / labels,
    misses,
    falseReports,
  };
}

function combined(scores: readonly SpottingScore[]): SpottingScore {
  const sum = (pick: (score: SpottingScore) => number): number => scores.reduce((total, score) => total + pick(score), 0);
  return totals(
    sum((score) => score.documents),
    sum((score) => score.labels),
    sum((score) => score.found),
    sum((score) => score.reported),
    scores.flatMap((score) => score.misses),
    scores.flatMap((score) => score.falseReports),
  );
}

/** Scores every document of every style folder under `root`. */
export function scoreRealStyleCorpus(engine: SpottingEngine, root: string = REAL_STYLE_CORPUS): CorpusScore {
  const styles = readdirSync(root, { withFileTypes: true })
    .filter((entry) => entry.isDirectory())
    .map((entry) => entry.name)
    .sort()
    .map((style): StyleScore => {
      const directory = join(root, style);
      const files = readdirSync(directory)
        .filter((file) => !file.startsWith("."))
        .sort();
      return { style, ...combined(files.map((file) => scoreDocument(engine, directory, file))) };
    });
  return { styles, overall: combined(styles) };
}

/** A fixed-width table of the scores, one line a style and one for the whole corpus. */
export function formatScoreTable(score: CorpusScore): string {
  const row = (name: string, each: SpottingScore): string =>
    `${name.padEnd(18)} ${String(each.documents).padStart(4)} ${String(each.labels).padStart(7)} ` +
    `${String(each.found).padStart(6)} ${String(each.reported).padStart(9)} ` +
    `${each.precision.toFixed(3).padStart(10)} ${each.recall.toFixed(3).padStart(7)}`;
  return [
    `${"style".padEnd(18)} docs  labels  found  reported  precision  recall`,
    ...score.styles.map((style) => row(style.style, style)),
    row("all", score.overall),
  ].join("\n");
}
