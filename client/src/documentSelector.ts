/**
 * Which open documents the client hands to the language server. (Which files on disk the
 * workspace check reads is the server's decision, the same as `lonepair check`'s.)
 */
/** A filter both the editor API and the protocol accept. */
export type LonepairDocumentFilter = { readonly language: string } | { readonly scheme: string; readonly pattern: string };

/**
 * Languages the server is started for, plus CSV/TSV files by pattern (no built-in language id),
 * and LaTeX, AsciiDoc and reStructuredText files by pattern too, whatever language an installed
 * extension gives them.
 */
export const DOCUMENT_SELECTOR: readonly LonepairDocumentFilter[] = [
  { language: "markdown" },
  { language: "plaintext" },
  { language: "latex" },
  { language: "tex" },
  { language: "asciidoc" },
  { language: "restructuredtext" },
  { language: "json" },
  { language: "jsonc" },
  { language: "yaml" },
  { scheme: "file", pattern: "**/*.{csv,tsv}" },
  { scheme: "file", pattern: "**/*.{tex,ltx,adoc,asciidoc,asc,rst,rest}" },
];
