/**
 * The custom requests the client sends to the lonepair language server, typed for the language
 * client. Their method names and shapes are the core's (`shared/src/editorRequests.ts`), shared
 * with the server that answers them. `speciesAt` and `checkText` are answered client-side with
 * the bundled core when the server does not handle them (see `serverOrLocal.ts`).
 */
import { RequestType } from "vscode-languageclient/node";
import {
  CHECK_TEXT_METHOD,
  SPECIES_AT_METHOD,
  SUMMARY_TABLE_METHOD,
  type CheckTextParams,
  type CheckTextResult,
  type SpeciesAtParams,
  type SpeciesAtResult,
  type SummaryTableParams,
  type SummaryTableResult,
} from "../../shared/src/index";

export type { CheckTextParams, CheckTextResult, SpeciesAtParams, SpeciesAtResult, SummaryTableParams, SummaryTableResult };

export const summaryTableRequest = new RequestType<SummaryTableParams, SummaryTableResult, void>(SUMMARY_TABLE_METHOD);
export const speciesAtRequest = new RequestType<SpeciesAtParams, SpeciesAtResult | null, void>(SPECIES_AT_METHOD);
export const checkTextRequest = new RequestType<CheckTextParams, CheckTextResult, void>(CHECK_TEXT_METHOD);
