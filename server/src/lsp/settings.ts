/**
 * The `lonepair.*` settings the server reads, their defaults, and how a raw value from the
 * client becomes a checked settings object (anything malformed falls back to the default).
 */
import {
  DEFAULT_FIGURES_FOLDER,
  SUMMARY_COLUMNS,
  figuresFolderFrom,
  isNotesShownAs,
  isSummaryColumn,
  type NotesShownAs,
  type SummaryColumn,
} from "../../../shared/src/index";
import type { DocumentKind } from "./core";

/** Settings that apply to one document. */
export interface ServerSettings {
  /** Document kinds the server analyses. */
  readonly enabledLanguages: readonly DocumentKind[];
  readonly inlayHints: {
    /** Hints after species in markdown, plain text, LaTeX, AsciiDoc and reStructuredText. */
    readonly prose: boolean;
    /** Hints after species in CSV, TSV, JSON and YAML. */
    readonly dataFiles: boolean;
  };
  /** Digits after the decimal point for angles, 0-3. */
  readonly angleDecimals: number;
  readonly summaryTable: { readonly columns: readonly SummaryColumn[] };
  readonly diagnostics: {
    /** At most this many diagnostics per document; one more says how many were left out. */
    readonly maxPerDocument: number;
    /** Notes (findings of severity information) shown as information, as faint hints, or not at all. */
    readonly notesAs: NotesShownAs;
  };
  /** Folder, relative to the document, where inserted figures are written ("" for the document's own). */
  readonly figuresFolder: string;
}

/** Bounds of `diagnostics.maxPerDocument`: at least one shown, and never a message of tens of megabytes. */
export const MAX_DIAGNOSTICS_BOUNDS = { minimum: 1, maximum: 100_000 } as const;

const ALL_KINDS: readonly DocumentKind[] = ["markdown", "plaintext", "latex", "asciidoc", "restructuredtext", "csv", "tsv", "json", "yaml"];

export const DEFAULT_SETTINGS: ServerSettings = {
  enabledLanguages: ALL_KINDS,
  inlayHints: { prose: true, dataFiles: false },
  angleDecimals: 1,
  summaryTable: { columns: SUMMARY_COLUMNS },
  diagnostics: { maxPerDocument: 1000, notesAs: "information" },
  figuresFolder: DEFAULT_FIGURES_FOLDER,
};

/** Reads the `lonepair` section as the client sent it; never throws. */
export function settingsFrom(raw: unknown): ServerSettings {
  const section = isRecord(raw) ? raw : {};
  const hints = isRecord(section.inlayHints) ? section.inlayHints : {};
  const table = isRecord(section.summaryTable) ? section.summaryTable : {};
  const diagnostics = isRecord(section.diagnostics) ? section.diagnostics : {};
  return {
    enabledLanguages: kindList(section.enabledLanguages) ?? DEFAULT_SETTINGS.enabledLanguages,
    inlayHints: {
      prose: typeof hints.prose === "boolean" ? hints.prose : DEFAULT_SETTINGS.inlayHints.prose,
      dataFiles: typeof hints.dataFiles === "boolean" ? hints.dataFiles : DEFAULT_SETTINGS.inlayHints.dataFiles,
    },
    angleDecimals: decimals(section.angleDecimals),
    summaryTable: { columns: columnList(table.columns) ?? DEFAULT_SETTINGS.summaryTable.columns },
    diagnostics: {
      maxPerDocument: diagnosticLimit(diagnostics.maxPerDocument),
      notesAs: isNotesShownAs(diagnostics.notesAs) ? diagnostics.notesAs : DEFAULT_SETTINGS.diagnostics.notesAs,
    },
    figuresFolder: figuresFolderFrom(section.figuresFolder),
  };
}

/** A plain object (not null, not an array), as settings sections are. */
export function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === "object" && value !== null && !Array.isArray(value);
}

/** Editor language ids people may write instead of our kind names. */
const KIND_ALIASES: Readonly<Record<string, DocumentKind>> = {
  jsonc: "json",
  yml: "yaml",
  text: "plaintext",
  md: "markdown",
  tex: "latex",
  adoc: "asciidoc",
  rst: "restructuredtext",
};

function kindList(value: unknown): DocumentKind[] | undefined {
  if (!Array.isArray(value)) return undefined;
  const kinds = value
    .filter((item): item is string => typeof item === "string")
    .map((item) => KIND_ALIASES[item.toLowerCase()] ?? item.toLowerCase())
    .filter((item): item is DocumentKind => (ALL_KINDS as readonly string[]).includes(item));
  return [...new Set(kinds)];
}

function columnList(value: unknown): SummaryColumn[] | undefined {
  if (!Array.isArray(value)) return undefined;
  const columns = value.filter(isSummaryColumn);
  return columns.length > 0 ? columns : undefined;
}

function decimals(value: unknown): number {
  if (typeof value !== "number" || !Number.isFinite(value)) return DEFAULT_SETTINGS.angleDecimals;
  return Math.max(0, Math.min(3, Math.round(value)));
}

function diagnosticLimit(value: unknown): number {
  if (typeof value !== "number" || !Number.isFinite(value)) return DEFAULT_SETTINGS.diagnostics.maxPerDocument;
  return Math.max(MAX_DIAGNOSTICS_BOUNDS.minimum, Math.min(MAX_DIAGNOSTICS_BOUNDS.maximum, Math.floor(value)));
}
