/**
 * The one place the server reaches into the core. Features import the core from here, so a
 * moved core file changes one line.
 */
export { analyzeSpecies } from "../../../shared/src/index";
export { analyzeDocument } from "../../../shared/src/index";
export { documentKindFor } from "../../../shared/src/index";
export { checkDocument } from "../../../shared/src/index";
export { editsOfFix } from "../../../shared/src/index";
export type { AnalysisResult, SpeciesAnalysis, TextRange } from "../../../shared/src/index";
export type {
  DocumentKind,
  DocumentModel,
  Finding,
  FindingSeverity,
  SpeciesOccurrence,
  TableRecord,
  FixEdit,
  TextFix,
} from "../../../shared/src/index";
