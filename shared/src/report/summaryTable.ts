/**
 * Builds a geometry table (markdown or CSV) for a list of analysed species.
 * Pure: the caller decides which species and in which order; duplicates are dropped here.
 */
import type { AnalysisResult, CentreAnalysis, LatticeSite, SpeciesAnalysis, SpeciesPart, SpeciesReading } from "../chemistry/types";
import { partShapeText, resultShapeText } from "../chemistry/analysis/partShapes";
import { speciesTextOf } from "../document/analyzeOccurrence";
import { analyzeOccurrenceSafely } from "../document/speciesAt";
import type { SpeciesOccurrence } from "../document/types";
import { NETWORK_SOLID_NOUN, compositeKind, leafParts } from "./compositeParts";
import { HOVER_CAUTION, formatAngle } from "./hoverMarkdown";
import { vibrationsOf } from "../chemistry/vibrations/speciesVibrations";

/** A column the table can show. */
export type SummaryColumn =
  | "formula"
  | "name"
  | "valenceElectrons"
  | "axe"
  | "electronGeometry"
  | "molecularGeometry"
  | "idealAngles"
  | "hybridization"
  | "polarity"
  | "irBands"
  | "ramanBands";

export type SummaryFormat = "markdown" | "csv" | "tsv";

/** Every column, in the order the table shows them by default. */
export const SUMMARY_COLUMNS: readonly SummaryColumn[] = [
  "formula",
  "name",
  "valenceElectrons",
  "axe",
  "electronGeometry",
  "molecularGeometry",
  "idealAngles",
  "hybridization",
  "polarity",
];

/** Columns shown only when asked for: the IR and Raman band counts of the vibrational analysis. */
export const OPTIONAL_SUMMARY_COLUMNS: readonly SummaryColumn[] = ["irBands", "ramanBands"];

// The headers read back as the columns the table checks know, so a pasted table is checked too.
const COLUMN_HEADERS: Readonly<Record<SummaryColumn, string>> = {
  formula: "Formula",
  name: "Name",
  valenceElectrons: "Valence electrons",
  axe: "AXE",
  electronGeometry: "Electron geometry",
  molecularGeometry: "Molecular geometry",
  idealAngles: "Ideal angles",
  hybridization: "Hybridization",
  polarity: "Polarity",
  irBands: "IR bands",
  ramanBands: "Raman bands",
};

/** A species that could not be analysed, listed under a markdown table. */
export interface UnanalysedSpecies {
  readonly text: string;
  readonly message: string;
}

/** A species made of parts (a salt, a hydrate): one row whose cells list its parts. */
export interface SpeciesWithParts {
  readonly reading: SpeciesReading;
  readonly kind: string;
  readonly parts: readonly SpeciesPart[];
}

/** A network solid (SiO2): one row with each atom's surroundings, and no molecular values. */
export interface NetworkSolidRow {
  readonly reading: SpeciesReading;
  readonly kind: string;
  readonly lattice: readonly LatticeSite[];
}

/** One row of the table: an analysed species, a species made of parts, or a network solid. */
export type SummaryEntry = SpeciesAnalysis | SpeciesWithParts | NetworkSolidRow;

/** The table row a result gives, if any; the rest go under "Not analysed". */
export function summaryEntryOf(result: AnalysisResult): SummaryEntry | undefined {
  if (result.ok) return result.value;
  if (result.parts && result.reading)
    return { reading: result.reading, kind: compositeKind(result.problem.code).noun, parts: result.parts };
  if (result.lattice && result.reading) return { reading: result.reading, kind: NETWORK_SOLID_NOUN, lattice: result.lattice };
  return undefined;
}

export interface SummaryTableInput {
  /** Rows in order of first appearance; later duplicates (same formula) are skipped. */
  readonly analyses: readonly SummaryEntry[];
  readonly unanalysed?: readonly UnanalysedSpecies[];
  readonly columns?: readonly SummaryColumn[];
  readonly format: SummaryFormat;
  readonly angleDecimals: number;
}

/** True for a string that names a known column. */
export function isSummaryColumn(value: unknown): value is SummaryColumn {
  return (
    typeof value === "string" &&
    ((SUMMARY_COLUMNS as readonly string[]).includes(value) || (OPTIONAL_SUMMARY_COLUMNS as readonly string[]).includes(value))
  );
}

/** Builds the table text. An empty or unknown column list falls back to every column. */
export function summaryTable(input: SummaryTableInput): string {
  const requested = (input.columns ?? []).filter(isSummaryColumn);
  const columns = requested.length > 0 ? requested : SUMMARY_COLUMNS;
  const rows = uniqueByFormula(input.analyses).map((analysis) => columns.map((column) => cellText(analysis, column, input.angleDecimals)));
  const headers = columns.map((column) => COLUMN_HEADERS[column]);
  if (input.format === "csv") return csvTable(headers, rows);
  if (input.format === "tsv") return tsvTable(headers, rows);
  return markdownTable(headers, rows, uniqueUnanalysed(input.unanalysed ?? []));
}

function uniqueByFormula(analyses: readonly SummaryEntry[]): SummaryEntry[] {
  const seen = new Set<string>();
  return analyses.filter((analysis) => {
    if (seen.has(analysis.reading.formula)) return false;
    seen.add(analysis.reading.formula);
    return true;
  });
}

function uniqueUnanalysed(items: readonly UnanalysedSpecies[]): UnanalysedSpecies[] {
  const seen = new Set<string>();
  return items.filter((item) => !seen.has(item.text) && seen.add(item.text) !== undefined);
}

function cellText(entry: SummaryEntry, column: SummaryColumn, decimals: number): string {
  if ("parts" in entry) return partsCellText(entry, column, decimals);
  if ("lattice" in entry) return latticeCellText(entry, column);
  const analysis = entry;
  switch (column) {
    case "formula":
      return analysis.reading.formula;
    case "name":
      return analysis.reading.name ?? "";
    case "valenceElectrons":
      return String(analysis.valenceElectrons);
    case "axe":
      return perCentre(analysis.centres, (centre) => centre.axe);
    case "electronGeometry":
      return perCentre(analysis.centres, (centre) => centre.electronGeometry);
    case "molecularGeometry":
      // Two atoms and no centre: the one shape there is, worded as for a salt's two-atom part.
      if (analysis.centres.length === 0 && analysis.graph.atoms.length === 2) return resultShapeText({ ok: true, value: analysis });
      return perCentre(analysis.centres, (centre) => centre.molecularGeometry);
    case "idealAngles":
      return perCentre(analysis.centres, (centre) => centre.idealAngles.map((angle) => formatAngle(angle, decimals)).join(", "));
    case "hybridization":
      return perCentre(analysis.centres, (centre) => centre.hybridization);
    case "polarity":
      return analysis.polarity.undetermined ? "not judged" : analysis.polarity.polar ? "polar" : "nonpolar";
    case "irBands":
    case "ramanBands":
      return bandCount(analysis, column);
  }
}

/** The band count, or empty where the vibrations are not predicted. */
function bandCount(analysis: SpeciesAnalysis, column: "irBands" | "ramanBands"): string {
  const result = vibrationsOf(analysis);
  if (!result.ok) return "";
  return String(column === "irBands" ? result.value.irBands : result.value.ramanBands);
}

/**
 * A salt's or hydrate's row: each part's value after its formula ("NH4^+: tetrahedral; Cl^-:
 * monatomic ion"), the parts of a hydrate's salt listed in its place.
 */
function partsCellText(entry: SpeciesWithParts, column: SummaryColumn, decimals: number): string {
  if (column === "formula") return entry.reading.formula;
  if (column === "name") return entry.reading.name ?? "";
  if (column === "polarity") return entry.kind;
  if (column === "valenceElectrons") return "";
  const entries: string[] = [];
  for (const part of leafParts(entry.parts)) {
    const analysis = part.analysis?.ok ? part.analysis.value : undefined;
    let value: string;
    if (column === "irBands" || column === "ramanBands") {
      value = analysis === undefined ? "" : bandCount(analysis, column);
    } else if (column === "molecularGeometry" || analysis === undefined) {
      value = column === "molecularGeometry" ? partShapeText(part) : "";
    } else {
      value = perCentre(analysis.centres, (centre) => centreValue(centre, column, decimals), ", ", " ");
    }
    const item = value === "" ? "" : `${part.formula}: ${value}`;
    if (item !== "" && !entries.includes(item)) entries.push(item);
  }
  return entries.join("; ");
}

/** A network solid's row: its name and kind, and each atom's surroundings as its geometry ("Si: tetrahedral (4 O)"). */
function latticeCellText(entry: NetworkSolidRow, column: SummaryColumn): string {
  if (column === "formula") return entry.reading.formula;
  if (column === "name") return entry.reading.name ?? "";
  if (column === "polarity") return entry.kind;
  if (column !== "molecularGeometry") return "";
  return entry.lattice.map((site) => `${site.symbol}: ${site.geometry} (${site.neighbourCount} ${site.neighbour})`).join("; ");
}

function centreValue(centre: CentreAnalysis, column: SummaryColumn, decimals: number): string {
  switch (column) {
    case "axe":
      return centre.axe;
    case "electronGeometry":
      return centre.electronGeometry;
    case "idealAngles":
      return centre.idealAngles.map((angle) => formatAngle(angle, decimals)).join(", ");
    case "hybridization":
      return centre.hybridization;
    default:
      return centre.molecularGeometry;
  }
}

/**
 * One centre shows its value alone; several show "C: tetrahedral; O: bent", with identical
 * neighbours merged so that hexane's six carbons read as one entry.
 */
function perCentre(
  centres: readonly CentreAnalysis[],
  valueOf: (centre: CentreAnalysis) => string,
  separator = "; ",
  atomMark = ": ",
): string {
  if (centres.length === 0) return "";
  if (centres.length === 1) return valueOf(centres[0]);
  const entries: string[] = [];
  for (const centre of centres) {
    const entry = `${centre.atom}${atomMark}${valueOf(centre)}`;
    if (!entries.includes(entry)) entries.push(entry);
  }
  return entries.join(separator);
}

function markdownTable(headers: readonly string[], rows: readonly string[][], unanalysed: readonly UnanalysedSpecies[]): string {
  const lines = [markdownRow(headers), markdownRow(headers.map(() => "---")), ...rows.map((row) => markdownRow(row)), ""];
  if (unanalysed.length > 0) {
    // An HTML comment: the writer sees the list in the source, and the document's own checks skip
    // it, so inserting a table never adds problems for species the document already reports.
    const listed = unanalysed.map((item) => `${item.text} (${item.message})`).join("; ");
    lines.push(`<!-- lonepair could not analyse: ${commentSafe(listed)} -->`, "");
  }
  lines.push(`_${HOVER_CAUTION}_`, "");
  return lines.join("\n");
}

/** Text that cannot end an HTML comment early or span lines. */
function commentSafe(text: string): string {
  return text
    .replace(/-{2,}/g, (dashes) => dashes.split("").join(" "))
    .replace(/>/g, "&gt;")
    .replace(/\r?\n/g, " ");
}

function markdownRow(cells: readonly string[]): string {
  return `| ${cells.map(escapeCell).join(" | ")} |`;
}

/** A pipe or a line break inside a cell would split the markdown row. */
function escapeCell(text: string): string {
  return text.replace(/\\/g, "\\\\").replace(/\|/g, "\\|").replace(/\r?\n/g, " ");
}

function csvTable(headers: readonly string[], rows: readonly string[][]): string {
  return [headers, ...rows].map((row) => row.map(csvField).join(",")).join("\r\n") + "\r\n";
}

/** Tab-separated rows; a tab or line break inside a field becomes a space (TSV has no quoting). */
function tsvTable(headers: readonly string[], rows: readonly string[][]): string {
  return [headers, ...rows].map((row) => row.map((field) => field.replace(/[\t\r\n]+/g, " ")).join("\t")).join("\n") + "\n";
}

/** Quotes a field only when it has to (RFC 4180: comma, quote, CR or LF). */
function csvField(text: string): string {
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/**
 * Gathers the species of a table in order of first appearance: each formula once, each species
 * that could not be analysed once. The command line and the editor fill it the same way.
 */
export interface SummaryCollector {
  /** Adds a mention found in a document, analysed as the document's checks analyse it. */
  addOccurrence(occurrence: SpeciesOccurrence): void;
  /** Adds a species given as text with its analysis (a command-line argument). */
  addResult(text: string, result: AnalysisResult): void;
  readonly analyses: readonly SummaryEntry[];
  readonly unanalysed: readonly UnanalysedSpecies[];
}

export function createSummaryCollector(): SummaryCollector {
  const analyses: SummaryEntry[] = [];
  const unanalysed: UnanalysedSpecies[] = [];
  const formulas = new Set<string>();
  const failedTexts = new Set<string>();
  const addResult = (text: string, result: AnalysisResult): void => {
    // A salt or hydrate gets a row listing its parts, like an analysed species.
    const entry = summaryEntryOf(result);
    if (entry) {
      if (formulas.has(entry.reading.formula)) return;
      formulas.add(entry.reading.formula);
      analyses.push(entry);
    } else if (!result.ok && !failedTexts.has(text)) {
      failedTexts.add(text);
      unanalysed.push({ text, message: result.problem.message });
    }
  };
  return {
    addOccurrence: (occurrence) => addResult(speciesTextOf(occurrence), analyzeOccurrenceSafely(occurrence)),
    addResult,
    analyses,
    unanalysed,
  };
}
