/**
 * Which kind of document a file is: by extension, then by the editor's language id, then by
 * sniffing the first bytes for a delimited table.
 */
import { sniffDelimiter } from "./tables/csv";
import { meaningOfHeader, namesSpecies } from "./tables/headers";
import type { DocumentKind, TextMarkup } from "./types";

/** Whether documents of `kind` are read as prose a paragraph at a time (see `TextMarkup`). */
export function isTextMarkup(kind: DocumentKind): kind is TextMarkup {
  return kind === "plaintext" || kind === "latex" || kind === "asciidoc" || kind === "restructuredtext";
}

const BY_EXTENSION: Readonly<Record<string, DocumentKind>> = {
  md: "markdown",
  markdown: "markdown",
  mdown: "markdown",
  mkd: "markdown",
  txt: "plaintext",
  text: "plaintext",
  csv: "csv",
  tsv: "tsv",
  tab: "tsv",
  json: "json",
  jsonc: "json",
  yaml: "yaml",
  yml: "yaml",
  tex: "latex",
  ltx: "latex",
  adoc: "asciidoc",
  asciidoc: "asciidoc",
  asc: "asciidoc",
  rst: "restructuredtext",
  rest: "restructuredtext",
};

const BY_LANGUAGE: Readonly<Record<string, DocumentKind>> = {
  markdown: "markdown",
  plaintext: "plaintext",
  csv: "csv",
  tsv: "tsv",
  json: "json",
  jsonc: "json",
  yaml: "yaml",
  latex: "latex",
  tex: "latex",
  asciidoc: "asciidoc",
  restructuredtext: "restructuredtext",
  rst: "restructuredtext",
};

/** Extensions whose content may well be a table saved under a vague name. */
const SNIFFABLE = new Set(["", "txt", "dat", "text", "log"]);

/**
 * The kind of the document named `fileName`, or undefined when lonepair has nothing to read in
 * it. `firstBytes` (the start of the text) lets a table saved as .txt or .dat be read as CSV/TSV.
 */
export function documentKindFor(fileName: string, languageId?: string, firstBytes?: string): DocumentKind | undefined {
  const base = fileName.slice(Math.max(fileName.lastIndexOf("/"), fileName.lastIndexOf("\\")) + 1);
  const dot = base.lastIndexOf(".");
  const extension = dot > 0 ? base.slice(dot + 1).toLowerCase() : "";
  if (SNIFFABLE.has(extension) && firstBytes !== undefined) {
    const sniffed = sniffTable(firstBytes);
    if (sniffed) return sniffed;
  }
  const byExtension = BY_EXTENSION[extension];
  if (byExtension) return byExtension;
  const byLanguage = languageId ? BY_LANGUAGE[languageId.toLowerCase()] : undefined;
  if (byLanguage) return byLanguage;
  return undefined;
}

/**
 * CSV or TSV when at least two lines split the same way, into two or more fields, on one delimiter,
 * and the first line names a species column.
 */
function sniffTable(firstBytes: string): "csv" | "tsv" | undefined {
  if (firstBytes.includes("\u0000")) return undefined;
  const lines = firstBytes
    .replace(/^\ufeff/, "")
    .split(/\r?\n/)
    .filter((line) => line.trim().length > 0);
  // The last line of a prefix may be cut short; judge on whole lines.
  const whole = lines.length > 2 ? lines.slice(0, -1) : lines;
  if (whole.length < 2) return undefined;
  const delimiter = sniffDelimiter(whole.join("\n"), "");
  if (delimiter !== "," && delimiter !== "\t") return undefined;
  const counts = whole.map((line) => line.split(delimiter).length);
  if (counts[0] < 2 || !counts.every((count) => count === counts[0])) return undefined;
  // Prose can have the same number of commas on two lines; a table names its species column.
  const header = whole[0].split(delimiter).map((cell) => cell.trim().replace(/^"|"$/g, ""));
  if (!header.some((cell) => namesSpecies(meaningOfHeader(cell)))) return undefined;
  return delimiter === "\t" ? "tsv" : "csv";
}
