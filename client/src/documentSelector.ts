/**
 * Which documents lonepair reads: the language selector for the client and the file globs for
 * the workspace check, kept side by side so they cannot drift apart.
 */
/** A filter both the editor API and the protocol accept. */
export type LonepairDocumentFilter = { readonly language: string } | { readonly scheme: string; readonly pattern: string };

/** Languages the server is started for, plus CSV/TSV files by pattern (no built-in language id). */
export const DOCUMENT_SELECTOR: readonly LonepairDocumentFilter[] = [
  { language: "markdown" },
  { language: "plaintext" },
  { language: "json" },
  { language: "jsonc" },
  { language: "yaml" },
  { scheme: "file", pattern: "**/*.{csv,tsv}" },
];

/** Files the workspace check looks at: the selector's languages by their usual extensions. */
export const WORKSPACE_GLOB = "**/*.{md,markdown,txt,json,jsonc,yaml,yml,csv,tsv}";
