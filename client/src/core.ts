/**
 * The one place the client reaches into the core (bundled into dist/client.js). Used for what
 * the server cannot answer yet: the species under the cursor, its 3D coordinates and the
 * workspace check.
 */
export { analyzeReading, analyzeSpecies } from "../../shared/src/chemistry/analyze";
export { analyzeDocument } from "../../shared/src/document/analyzeDocument";
export { checkDocument } from "../../shared/src/document/checkDocument";
export { documentKindFor } from "../../shared/src/document/documentKind";
export { shapeViewModel, type ShapeViewModel } from "../../shared/src/report/shapeViewModel";
export type { AnalysisResult, SpeciesAnalysis } from "../../shared/src/chemistry/types";
export type { DocumentKind, DocumentModel, Finding } from "../../shared/src/document/types";
