/**
 * The custom requests between an editor and the lonepair language server, as plain data: method
 * names and the shapes of their parameters and answers. Both edges (the server that answers and
 * the VS Code client that asks) read them from here, so they cannot drift apart. Positions are
 * the protocol's zero-based line and UTF-16 character, written out structurally so the core needs
 * no protocol library.
 */
import type { SummaryFormat } from "./report/summaryTable";
import type { ShapeViewModel } from "./report/shapeViewModel";
import type { CoordinateFile, CoordinateFormat } from "./report/speciesModel";
import type { DiagramTheme, LewisViewImages } from "./report/lewisDiagram";
import type { LewisFigure } from "./report/lewisFigure";

/** A zero-based line and UTF-16 character offset in that line. */
export interface EditorPosition {
  readonly line: number;
  readonly character: number;
}

/** A span between two positions, end exclusive. */
export interface EditorRange {
  readonly start: EditorPosition;
  readonly end: EditorPosition;
}

/** `lonepair/summaryTable`: a geometry table of the species in a document or a range. */
export const SUMMARY_TABLE_METHOD = "lonepair/summaryTable";

/** Arguments of the summary table request and of the command of the same purpose. */
export interface SummaryTableParams {
  readonly uri: string;
  readonly range?: EditorRange;
  readonly format?: SummaryFormat;
}

/** The answer: the table text (markdown tables end with the caution line) and its format. */
export interface SummaryTableResult {
  readonly text: string;
  /** The format written: the one asked for, else the document's own (CSV for CSV, TSV for TSV). */
  readonly format?: SummaryFormat;
}

/** `lonepair/speciesAt`: the species mention covering a position in an open document, or null. */
export const SPECIES_AT_METHOD = "lonepair/speciesAt";

/** The document may also be named as `textDocument: { uri }`, as the protocol's own requests do. */
export interface SpeciesAtParams {
  readonly uri: string;
  readonly position: EditorPosition;
}

/** The species mention under a position: its text exactly as written, where it is, and its reading. */
export interface SpeciesAtResult {
  readonly text: string;
  readonly range: EditorRange;
  /** The formula as read (with charge), when the species could be analysed. */
  readonly formula?: string;
  /** Why the species could not be analysed, in the user's terms. */
  readonly problem?: { readonly code: string; readonly message: string };
}

/** `lonepair/shapeModel`: the 3D view model of the species at a position, or null where there is none. */
export const SHAPE_MODEL_METHOD = "lonepair/shapeModel";

export type ShapeModelParams = SpeciesAtParams;

export interface ShapeModelResult extends SpeciesAtResult {
  /** What the 3D view draws; absent when the species has no model (see `problem`). */
  readonly model?: ShapeViewModel;
  /** The species' Lewis diagram for the view's side panel; absent when it has none to show. */
  readonly lewis?: LewisViewImages;
}

/** `lonepair/coordinates`: model coordinates of the species at a position as a file's text, or null. */
export const COORDINATES_METHOD = "lonepair/coordinates";

export interface CoordinatesParams extends SpeciesAtParams {
  readonly format: CoordinateFormat;
}

export interface CoordinatesResult extends SpeciesAtResult {
  /** The file to save; absent when there is none (see `problem`). */
  readonly file?: CoordinateFile;
}

/**
 * `lonepair/lewisFigure`: a Lewis diagram to save beside a document and link from it, for the
 * species at a position or for a species typed by the user; null when there is neither. The
 * figures folder comes from the `lonepair.figuresFolder` setting of the document.
 */
export const LEWIS_FIGURE_METHOD = "lonepair/lewisFigure";

export interface LewisFigureParams {
  readonly uri: string;
  /** The position whose species is drawn; ignored when `species` is given. */
  readonly position?: EditorPosition;
  /** A species typed by the user (a formula, a name, or SMILES after "smiles:"). */
  readonly species?: string;
  /** Which equivalent structure, counting from 1 (default 1). */
  readonly form?: number;
  readonly theme?: DiagramTheme;
}

export interface LewisFigureRequestResult {
  /** The species as written: in the document (with its range) or as typed. */
  readonly text: string;
  readonly range?: EditorRange;
  /** Where the link goes when the cursor is on the mention: after it and any markup round it (a `\ce{...}`). */
  readonly linkPosition?: EditorPosition;
  readonly formula?: string;
  /** The figure; absent when the species cannot be analysed or drawn (see `problem`). */
  readonly figure?: LewisFigure;
  readonly problem?: { readonly code: string; readonly message: string };
}

/** `lonepair/documentSummary`: how many species mentions and problems an open document has, or null. */
export const DOCUMENT_SUMMARY_METHOD = "lonepair/documentSummary";

export interface DocumentSummaryParams {
  readonly uri: string;
}

export interface DocumentSummaryResult {
  /** The document's version the counts belong to. */
  readonly version: number;
  readonly species: number;
  /** The diagnostics the server reports for this version. */
  readonly problems: number;
  /** Set when only the start of the document was checked: the characters checked. */
  readonly checkedLength?: number;
}

/** `lonepair/checkText`: check a file's text without opening it (the workspace check). */
export const CHECK_TEXT_METHOD = "lonepair/checkText";

export interface CheckTextParams {
  readonly uri: string;
  readonly languageId?: string;
  readonly text: string;
}

/** One finding of a checked text, shaped as the protocol's diagnostic. */
export interface CheckedTextDiagnostic {
  readonly range: EditorRange;
  /** 1 error, 2 warning, 3 information, 4 hint, as the protocol numbers them. */
  readonly severity?: 1 | 2 | 3 | 4;
  readonly code?: string | number;
  readonly source?: string;
  readonly message: string;
}

/** The same diagnostics the server would publish for the file were it open. */
export interface CheckTextResult {
  readonly diagnostics: CheckedTextDiagnostic[];
}

/**
 * `lonepair.checkWorkspaceFolders`, run with `workspace/executeCommand`: checks every file lonepair
 * reads in the workspace folders (as `lonepair check` finds them: .gitignore honoured, binary files
 * left out), with work-done progress that can be cancelled. A client that does not pull
 * diagnostics gets them published for each file that is not open; open files keep their own.
 */
export const WORKSPACE_CHECK_COMMAND = "lonepair.checkWorkspaceFolders";

/** What one run of the workspace check found. */
export interface WorkspaceCheckResult {
  /** Files found to check. */
  readonly files: number;
  readonly checked: number;
  readonly filesWithProblems: number;
  readonly problems: number;
  /** Files and folders that could not be read, each named in the server's log. */
  readonly unreadable: number;
  readonly cancelled: boolean;
  /** Set when the search stopped at this many files; the rest were not checked. */
  readonly stoppedAt?: number;
}
