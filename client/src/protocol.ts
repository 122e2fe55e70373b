/**
 * The custom requests the client sends to the lonepair language server, typed for the language
 * client. Their method names and shapes are the core's (`shared/src/editorRequests.ts`), shared
 * with the server that answers them; the client itself bundles no chemistry.
 */
import { RequestType } from "vscode-languageclient/node";
import {
  COORDINATES_METHOD,
  DOCUMENT_SUMMARY_METHOD,
  LEWIS_FIGURE_METHOD,
  SHAPE_MODEL_METHOD,
  SPECIES_AT_METHOD,
  SUMMARY_TABLE_METHOD,
  type CoordinatesParams,
  type CoordinatesResult,
  type DocumentSummaryParams,
  type DocumentSummaryResult,
  type LewisFigureParams,
  type LewisFigureRequestResult,
  type ShapeModelParams,
  type ShapeModelResult,
  type SpeciesAtParams,
  type SpeciesAtResult,
  type SummaryTableParams,
  type SummaryTableResult,
} from "../../shared/src/editorRequests";

export type { CoordinatesResult, ShapeModelResult, SpeciesAtResult, SummaryTableParams, SummaryTableResult };

export const summaryTableRequest = new RequestType<SummaryTableParams, SummaryTableResult, void>(SUMMARY_TABLE_METHOD);
export const speciesAtRequest = new RequestType<SpeciesAtParams, SpeciesAtResult | null, void>(SPECIES_AT_METHOD);
export const shapeModelRequest = new RequestType<ShapeModelParams, ShapeModelResult | null, void>(SHAPE_MODEL_METHOD);
export const coordinatesRequest = new RequestType<CoordinatesParams, CoordinatesResult | null, void>(COORDINATES_METHOD);
export const documentSummaryRequest = new RequestType<DocumentSummaryParams, DocumentSummaryResult | null, void>(DOCUMENT_SUMMARY_METHOD);
export const lewisFigureRequest = new RequestType<LewisFigureParams, LewisFigureRequestResult | null, void>(LEWIS_FIGURE_METHOD);
