/**
 * The one place the client reaches into the core (bundled into dist/client.js). Used for what
 * the server cannot answer yet: the species under the cursor, its 3D coordinates and the
 * workspace check.
 */
export { analyzeReading, analyzeSpecies } from "../../shared/src/index";
export { analyzeDocument } from "../../shared/src/index";
export { checkDocument } from "../../shared/src/index";
export { documentKindFor } from "../../shared/src/index";
export { shapeViewModel, type ShapeViewModel } from "../../shared/src/index";
export type { AnalysisResult, SpeciesAnalysis } from "../../shared/src/index";
export type { DocumentKind, DocumentModel, Finding } from "../../shared/src/index";
