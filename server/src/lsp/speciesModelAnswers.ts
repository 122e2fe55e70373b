/**
 * What the 3D view and coordinates requests answer about one analysed species, worked out the
 * same way on the server's thread and on the species worker.
 */
import {
  coordinateFileOf,
  lewisViewImages,
  missingModelReason,
  shapeOf,
  shapeViewModelOf,
  type CoordinateFile,
  type CoordinateFormat,
  type ShapeModelResult,
  type ShapeViewModel,
  type SpeciesAnalysis,
} from "../../../shared/src/index";

/** A species' 3D view model, or why there is none. */
export type ShapeModelAnswer =
  | { readonly model: ShapeViewModel; readonly lewis?: ShapeModelResult["lewis"] }
  | { readonly problem: { readonly code: "too-large-for-model" | "no-model"; readonly message: string } };

/** A species' coordinate file, or why there is none. */
export type CoordinatesAnswer =
  { readonly file: CoordinateFile } | { readonly problem: { readonly code: "no-coordinates"; readonly message: string } };

export function shapeModelAnswer(analysis: SpeciesAnalysis): ShapeModelAnswer {
  const model = shapeViewModelOf(analysis);
  const lewis = model ? lewisViewImages(analysis) : undefined;
  if (model) return { model, ...(lewis ? { lewis } : {}) };
  const tooLarge = shapeOf(analysis).coordinates.tooLarge;
  return { problem: { code: tooLarge ? "too-large-for-model" : "no-model", message: missingModelReason(analysis)! } };
}

export function coordinatesAnswer(analysis: SpeciesAnalysis, format: CoordinateFormat): CoordinatesAnswer {
  const file = coordinateFileOf(analysis, format);
  return file.ok ? { file: file.value } : { problem: { code: "no-coordinates", message: file.message } };
}
