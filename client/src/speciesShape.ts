/**
 * From a species analysis to the 3D view's data: model coordinates from the core, then the
 * view model the page draws.
 */
import { buildCoordinates } from "../../shared/src/index";
import { shapeViewModel, type ShapeViewModel, type SpeciesAnalysis } from "./core";

/** The view model of an analysed species; undefined if the core could not place its atoms. */
export function shapeOf(analysis: SpeciesAnalysis): ShapeViewModel | undefined {
  try {
    const coordinates = buildCoordinates(analysis.graph, analysis.radical);
    return coordinates.atoms.length > 0 ? shapeViewModel(analysis, coordinates) : undefined;
  } catch {
    // The coordinate builder promises not to throw; the panel shows "no shape" rather than fail.
    return undefined;
  }
}
