/**
 * The one place the server reaches into the core. Features import the core from here, so a
 * moved core file changes one line.
 */
export { analyzeSpecies } from "../../shared/src/chemistry/analyze";
export { analyzeDocument } from "../../shared/src/document/analyzeDocument";
export { documentKindFor } from "../../shared/src/document/documentKind";
export { checkDocument } from "../../shared/src/document/checkDocument";
export type { AnalysisResult, SpeciesAnalysis, TextRange } from "../../shared/src/chemistry/types";
export type {
  DocumentKind,
  DocumentModel,
  Finding,
  FindingSeverity,
  SpeciesOccurrence,
  TableRecord,
  TextFix,
} from "../../shared/src/document/types";
