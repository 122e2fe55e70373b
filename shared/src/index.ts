/**
 * The core's one facade: everything the server, the command line and the tests use.
 * Pure functions over strings and plain data; no editor, protocol or I/O.
 */
export * from "./chemistry/types";
export { ELEMENTS, elementBySymbol, elementByName } from "./chemistry/elements";
export { readSpecies } from "./chemistry/reader/readSpecies";
export { listedNames as knownSpeciesNames } from "./chemistry/reader/names/nameLookup";
export { analyzeSpecies, analyzeReading, analyzeSmiles, analyzeTyped, SMILES_MARKER } from "./chemistry/analyze";
export { parseSmiles, kekulize, writeSmiles, smilesFormula, smilesNetCharge } from "./chemistry/smiles";
export type { SmilesAtom, SmilesBond, SmilesMolecule, SmilesResult } from "./chemistry/smiles";
export { findPointGroup } from "./chemistry/symmetry/pointGroup";
export { characterTable, reduceRepresentation } from "./chemistry/vibrations/characterTables";
export type { CharacterTable, IrreducibleRepresentation, SymmetryClass } from "./chemistry/vibrations/characterTables";
export { vibrationalModes } from "./chemistry/vibrations/normalModes";
export type { ModeSymmetry, VibrationalModes, VibrationalModesOptions, VibrationalModesResult } from "./chemistry/vibrations/normalModes";
export { measuredFundamentalsOf, vibrationsOf } from "./chemistry/vibrations/speciesVibrations";
export type { MeasuredFundamental, MeasuredFundamentals } from "./chemistry/vibrations/measuredFundamentals";
export { idealDirections, siteKind, lonePairSiteOrder } from "./chemistry/geometry/idealDirections";
export type { Vec3 } from "./chemistry/geometry/vectors";
export { shapeOf, pointGroupAllowsDipole } from "./chemistry/analysis/shape3d";
export type { SpeciesShape } from "./chemistry/analysis/shape3d";
export { buildCoordinates, MAX_MODEL_ATOMS } from "./chemistry/geometry/buildCoordinates";
export { MAX_RING_SYSTEM_ATOMS } from "./chemistry/geometry/ringPerception";
export type { MolecularCoordinates, PlacedAtom, PlacedLonePair } from "./chemistry/geometry/buildCoordinates";
export { toXyz } from "./chemistry/formats/xyz";
export { toMolfile, MOLFILE_V2000_LIMIT } from "./chemistry/formats/molfile";
export type { MolfileResult } from "./chemistry/formats/molfile";

// Documents: finding species in text and tables, and checking what they claim.
export { analyzeDocument } from "./document/analyzeDocument";
export { analyzeOccurrence, speciesTextOf } from "./document/analyzeOccurrence";
export { analyzeOccurrenceSafely, internalErrorProblem, occurrenceAt, speciesAtOffset } from "./document/speciesAt";
export type { SpeciesAtOffset } from "./document/speciesAt";
export { checkDocument } from "./document/checkDocument";
export { findingsInParts } from "./document/findingsInParts";
export type { FindingPartsOptions } from "./document/findingsInParts";
export { documentKindFor, isTextMarkup } from "./document/documentKind";
export { memoisedReader } from "./document/speciesReader";
export type { SpeciesReader } from "./document/speciesReader";
export { sniffDelimiter } from "./document/tables/csv";
export {
  checkDelimitedText,
  delimitedRowMemo,
  findHeader,
  moved,
  recognisedColumns,
  workOutRow,
} from "./document/tables/delimitedFindings";
export type { DelimitedRowMemo } from "./document/tables/delimitedFindings";
export type * from "./document/types";
export { editsOfFix, movedFix, shiftedFix } from "./document/fixEdits";
export { tableValueFixes, tableValueFixesInParts } from "./document/tableFixes";

// Equations: reading them, balancing them, and what the checks say about them.
export type * from "./document/reactions/reactionTypes";
export { readWholeEquation, equationsInLine } from "./document/reactions/readEquation";
export { equationsInProse } from "./document/reactions/proseEquations";
export { judgeReaction, rewrittenWithCoefficients, coefficientEdits, imbalanceText, termsOf } from "./document/reactions/judgeReaction";
export { reactionFinding, reactionFindings, REACTION_CODES } from "./document/reactions/reactionFindings";
export { oxidationStatesOf, oxidationStatesText, formatOxidationState } from "./chemistry/redox/oxidationStates";
export type { ElementOxidationStates, OxidationStates } from "./chemistry/redox/oxidationStates";
export { balanceText, NOT_AN_EQUATION } from "./document/reactions/balanceText";
export type { BalanceAnswer } from "./document/reactions/balanceText";
export { balanceEquation, CHARGE_LABEL } from "./chemistry/reactions/balance";
export type { BalanceLine, BalanceTerm, BalanceVerdict } from "./chemistry/reactions/balance";
export { formatFraction, fraction } from "./chemistry/reactions/rational";
export type { Fraction } from "./chemistry/reactions/rational";

// Redox in solution: completing half-reactions with H+/OH-, H2O and e-, and combining two halves.
export { completeReaction, completionsOf } from "./document/reactions/completeEquation";
export type { AddedTerm, Completion, SolutionMedium } from "./document/reactions/completeEquation";
export { combinedEquations } from "./document/reactions/combineHalfReactions";
export type { CombinedEquation } from "./document/reactions/combineHalfReactions";
export { equationActions } from "./document/reactions/equationActions";
export type { EquationAction } from "./document/reactions/equationActions";
export { balanceInSolution } from "./document/reactions/balanceInSolution";
export type { SolutionBalanceAnswer } from "./document/reactions/balanceInSolution";

// Reports: cards, JSON, hovers, summary tables and the 3D view model.
export { MODEL_CAUTION, PLAIN_CARD_STYLE, formatAnalysisCard } from "./report/analysisCard";
export type { CardStyle } from "./report/analysisCard";
export { toAnalysisJson } from "./report/analysisJson";
export { HOVER_CAUTION, hoverMarkdown, problemMarkdown, resultMarkdown } from "./report/hoverMarkdown";
export type { HoverFormat, HoverMarkdownOptions, ProblemCardOptions } from "./report/hoverMarkdown";
export { HOVER_CARD_MEMO_CHARACTERS, createHoverCardMemo } from "./report/hoverCards";
export type { HoverCardMemo } from "./report/hoverCards";
export { reactionAtOffset, reactionCard, redoxSummary } from "./report/reactionCard";
export type { OxidationChange, RedoxSummary } from "./report/reactionCard";
export { shapeViewModel } from "./report/shapeViewModel";
export {
  DIAGRAM_THEMES,
  MAX_DIAGRAM_ATOMS,
  MAX_VIEW_DIAGRAM_ATOMS,
  chargeLabel,
  lewisDiagram,
  lewisViewImages,
} from "./report/lewisDiagram";
export type { DiagramTheme, LewisDiagram, LewisDiagramOptions, LewisDiagramResult, LewisViewImages } from "./report/lewisDiagram";
export {
  DEFAULT_FIGURES_FOLDER,
  figureFileName,
  figureLinkOffset,
  figuresFolderFrom,
  lewisFigureOf,
  markdownImage,
} from "./report/lewisFigure";
export type { LewisFigure, LewisFigureOptions, LewisFigureResult } from "./report/lewisFigure";
export type { ShapeViewModel } from "./report/shapeViewModel";
export { coordinateFileOf, missingModelReason, shapeViewModelOf } from "./report/speciesModel";
export { MAX_SKETCH_ATOMS, shapePictureSvg, shapeSketchSvg, svgDataUri } from "./report/shapeSketch";
export type { ShapePictureOptions, ShapeSketchOptions } from "./report/shapeSketch";
export { NEUTRAL_THEME, sceneSvg, shapeScene } from "./report/shapeScene";
export type { PlacedBox, PlacedCircle, SceneFrame, SceneNode, SceneOptions, SceneTheme, ShapeScene } from "./report/shapeScene";
export { startingOrientation } from "./report/viewOrientation";
export type { ViewRotation } from "./report/viewOrientation";
export { DARK_BACKGROUND, LIGHT_BACKGROUND, atomPaint, elementColour, isConventionColour } from "./report/elementPalette";
export type { AtomPaint } from "./report/elementPalette";
export { contrastRatio, relativeLuminance } from "./report/colourMath";
export { geometryHints, geometryLabel, isProseKind } from "./report/geometryHints";
export type { GeometryHint } from "./report/geometryHints";
export type { CoordinateFile, CoordinateFileResult, CoordinateFormat } from "./report/speciesModel";
export {
  OPTIONAL_SUMMARY_COLUMNS,
  SUMMARY_COLUMNS,
  createSummaryCollector,
  isSummaryColumn,
  summaryEntryOf,
  summaryTable,
} from "./report/summaryTable";
export type {
  SpeciesWithParts,
  NetworkSolidRow,
  SummaryCollector,
  SummaryColumn,
  SummaryEntry,
  SummaryFormat,
  UnanalysedSpecies,
} from "./report/summaryTable";

// Editors: the custom requests of the language server, as plain data.
export {
  CHECK_TEXT_METHOD,
  COORDINATES_METHOD,
  DOCUMENT_SUMMARY_METHOD,
  LEWIS_FIGURE_METHOD,
  SHAPE_MODEL_METHOD,
  SPECIES_AT_METHOD,
  SUMMARY_TABLE_METHOD,
  WORKSPACE_CHECK_COMMAND,
} from "./editorRequests";
export type * from "./editorRequests";
export { analysedTextOf, MAX_ANALYSED_LENGTH } from "./document/analysedText";
export type { AnalysedText } from "./document/analysedText";

// Workspaces: running git in a folder that may not be trusted.
export { gitCommandForUntrustedFolder } from "./workspace/gitCommand";
export type { GitCommand } from "./workspace/gitCommand";

// Documents edited in place: chunked text and analysis that reuses what an edit left alone.
export {
  chunkIndexAt,
  chunkedTextOf,
  createChunkedTextBuilder,
  editChunkedText,
  offsetOf,
  positionOf,
  sliceOf,
  wholeText,
} from "./document/chunkedText";
export type { ChunkedText, ChunkedTextBuilder, LineAndCharacter, TextChunk } from "./document/chunkedText";
export { createDocumentAnalyser, wholeReadingOf } from "./document/incrementalAnalysis";
export { READ_WHOLE_ELSEWHERE_FROM } from "./document/listParts";
export type { WholeReading } from "./document/listParts";
export type { DocumentAnalyser, DocumentAnalysis } from "./document/incrementalAnalysis";
export type { FindingPart } from "./document/findingPart";
export { NOTES_SHOWN_AS, isNotesShownAs, shownFindings, shownParts, shownSeverity } from "./document/notesShownAs";
export type { NotesShownAs } from "./document/notesShownAs";
