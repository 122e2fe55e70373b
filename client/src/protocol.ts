/**
 * The custom requests the client sends to the lonepair language server. The summary table
 * request is the server's own; the other two are proposed here and answered client-side with
 * the bundled core until the server handles them (see `serverOrLocal.ts`).
 */
import { RequestType, type Diagnostic, type Position, type Range } from "vscode-languageclient/node";
import type { SummaryTableParams, SummaryTableResult } from "../../server/src/features/summaryTable";

export type { SummaryTableParams, SummaryTableResult };

/** `lonepair/summaryTable`: a geometry table of the species in a document or a range. */
export const summaryTableRequest = new RequestType<SummaryTableParams, SummaryTableResult, void>("lonepair/summaryTable");

/** Arguments of `lonepair/speciesAt`. */
export interface SpeciesAtParams {
  readonly uri: string;
  readonly position: Position;
}

/** The species mention under a position: its text exactly as written and where it is. */
export interface SpeciesAtResult {
  readonly text: string;
  readonly range: Range;
}

/** `lonepair/speciesAt`: the species mention covering a position in an open document, or null. */
export const speciesAtRequest = new RequestType<SpeciesAtParams, SpeciesAtResult | null, void>("lonepair/speciesAt");

/** Arguments of `lonepair/checkText`: a file that need not be open in the editor. */
export interface CheckTextParams {
  readonly uri: string;
  readonly languageId?: string;
  readonly text: string;
}

/** The same diagnostics the server would publish for the file were it open. */
export interface CheckTextResult {
  readonly diagnostics: Diagnostic[];
}

/** `lonepair/checkText`: check a file's text without opening it (the workspace check). */
export const checkTextRequest = new RequestType<CheckTextParams, CheckTextResult, void>("lonepair/checkText");
