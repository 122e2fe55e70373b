/**
 * What the core finds in a document: species mentioned in prose, and records in data tables.
 * Offsets are UTF-16 indices into the document text; editors turn them into positions.
 */
import type { Problem, SpeciesReading, TextRange } from "../chemistry/types";
import type { Reaction } from "./reactions/reactionTypes";

export type DocumentKind = "markdown" | TextMarkup | "csv" | "tsv" | "json" | "yaml";

/**
 * Prose documents read a paragraph at a time: plain text, and the markup languages whose
 * paragraphs are plain lines (LaTeX, AsciiDoc, reStructuredText); each skips its own code,
 * listing and comment blocks.
 */
export type TextMarkup = "plaintext" | "latex" | "asciidoc" | "restructuredtext";

/** One mention of a species, exactly as written. */
export interface SpeciesOccurrence {
  readonly range: TextRange;
  readonly text: string;
  readonly reading: SpeciesReading;
  /**
   * Set for a mention shown in hovers and tables but never the subject of a finding: one the
   * writer did not mark as chemistry (a code span that parses as SMILES), or one they call a
   * fragment, unit or radical ("CH3 radicals"), whose open valence is what they mean.
   */
  readonly inferred?: true;
  /**
   * The species text analysed, when the row says more than the cell: a formula cell "NH4" in a
   * row whose charge column says +1 is the species "NH4^+". Absent when the text as written is
   * the species. Analyses, hover cards and memos go by `speciesTextOf`, never by `text` alone.
   */
  readonly speciesText?: string;
}

/** What a table column (or a record key) holds, recognised from its header. */
export type ColumnMeaning =
  | "species"
  | "name"
  | "smiles"
  /** Another species the row's species is made of: its cation or anion. Spotted, never checked against the row. */
  | "constituent"
  /** The row species' net charge, written apart from its formula ("+1", "2-", "−2", "0"). */
  | "charge"
  | "valenceElectrons"
  | "lonePairs"
  | "axe"
  | "electronGeometry"
  | "molecularGeometry"
  | "bondAngle"
  | "hybridization"
  | "polarity"
  /** Fundamentals expected in the IR spectrum (one band per occurrence of an IR-active symmetry). */
  | "irBands"
  /** Fundamentals expected in the Raman spectrum. */
  | "ramanBands"
  /** IR-active fundamentals, written as bands or with degenerate modes counted singly. */
  | "irActiveModes"
  /** Normal modes: 3N − 6, or 3N − 5 for a linear molecule. */
  | "vibrationalModes";

/** A language other than English that a table's headers, and so its value cells, are written in. */
export type TableLanguage = "de" | "fr" | "es";

/** One value cell of a record, with the exact range of the value (without quotes). */
export interface TableCell {
  readonly meaning: ColumnMeaning;
  readonly range: TextRange;
  readonly text: string;
  /** The language of the cell's header, when not English: its words are read, and fixes written, in it. */
  readonly language?: TableLanguage;
}

/** A row of a CSV/TSV or markdown table, or an object in JSON/YAML, that names a species. */
export interface TableRecord {
  /** The cell that names the species (a formula, or failing that a name). */
  readonly species: SpeciesOccurrence;
  /** The other recognised cells of the same record. */
  readonly cells: readonly TableCell[];
  /** Further cells of the record that name a species too (a name beside the formula). */
  readonly otherNames?: readonly SpeciesOccurrence[];
  /** The record's name read beside its formula, when it has both: the two should name one species. */
  readonly nameBesideFormula?: NameBesideFormula;
}

/** A record's name cell and formula cell, each as read. */
export interface NameBesideFormula {
  /** The name as read: the whole cell, or the name it opens with ("Hydrochloric acid" of "Hydrochloric acid 2 M"). */
  readonly name: SpeciesOccurrence;
  /** The whole name cell (trimmed), so a check can see what follows the name. */
  readonly nameCell: TableCell;
  /** The formula cell's reading. */
  readonly formula: SpeciesOccurrence;
}

export type FindingSeverity = "error" | "warning" | "information" | "hint";

/** One replacement of a fix: `range` becomes `newText`. */
export interface FixEdit {
  readonly range: TextRange;
  readonly newText: string;
}

/** A replacement that fixes a finding: only the offending token or cell. */
export interface TextFix {
  /** The whole stretch the fix changes (from its first edit to its last). */
  readonly range: TextRange;
  /** What `range` holds after the fix. */
  readonly newText: string;
  /** Short title for the quick fix, e.g. "Change to 26". */
  readonly title: string;
  /**
   * The same change as the smallest separate edits (in order, not overlapping, inside `range`),
   * when it touches pieces apart from each other: an equation's coefficients. Edges that apply
   * a fix apply these, all together as one change.
   */
  readonly edits?: readonly FixEdit[];
}

/** A problem or note about a document: the core's diagnostic, free of protocol types. */
export interface Finding {
  readonly range: TextRange;
  readonly severity: FindingSeverity;
  /** Stable code such as "octet-exceeded" or "table-lone-pairs-mismatch". */
  readonly code: string;
  readonly message: string;
  readonly fix?: TextFix;
  /**
   * Fixes to choose between (change the name, or change the formula): each is offered as a quick
   * fix of its own, and none is ever applied by fix-all or `check --fix`.
   */
  readonly choices?: readonly TextFix[];
}

/** Everything read from one document version. */
export interface DocumentModel {
  readonly kind: DocumentKind;
  /** Every species mentioned, in document order (table species cells included). */
  readonly occurrences: readonly SpeciesOccurrence[];
  readonly records: readonly TableRecord[];
  /** Problems reading the document itself (malformed JSON, a CSV row with a stray quote). */
  readonly problems: readonly Finding[];
  /**
   * Text the scanner is confident names a species but that the reader rejects (a table's formula
   * cell "Sf4", a `\ce{Xy3}` span, a prose token like "CLF3" with a suggested spelling).
   */
  readonly unreadable?: readonly UnreadableSpecies[];
  /** Equations written in the document (mhchem, prose lines, equation columns), in document order. */
  readonly reactions?: readonly Reaction[];
}

/** A confident species mention that could not be read, with the reader's problem. */
export interface UnreadableSpecies {
  readonly range: TextRange;
  readonly text: string;
  readonly problem: Problem;
}
