/**
 * The 3D side of a species for every edge: the view model the 3D page draws and the coordinate
 * files an export writes, both from the one model of the species (`shapeOf`, which keeps cis/trans
 * from the SMILES), so the view, the export and the hover's point group always agree.
 */
import { shapeOf, symmetrySearchOf } from "../chemistry/analysis/shape3d";
import { toMolfile } from "../chemistry/formats/molfile";
import { toXyz } from "../chemistry/formats/xyz";
import type { SpeciesAnalysis } from "../chemistry/types";
import { shapeViewModel, type ShapeViewModel } from "./shapeViewModel";

export type CoordinateFormat = "xyz" | "molfile";

/** A coordinate file ready to save. */
export interface CoordinateFile {
  readonly text: string;
  /** A file name without extension that is safe on every file system ("SO4_2-"). */
  readonly baseName: string;
  readonly extension: "xyz" | "mol";
}

export type CoordinateFileResult = { readonly ok: true; readonly value: CoordinateFile } | { readonly ok: false; readonly message: string };

/**
 * Why a species has no 3D model, in one sentence for every edge: the size limit with its numbers
 * when it is too large, a plain "could not be built" otherwise; undefined when it has one.
 */
export function missingModelReason(analysis: SpeciesAnalysis): string | undefined {
  const { coordinates } = shapeOf(analysis);
  if (coordinates.atoms.length > 0) return undefined;
  return coordinates.tooLarge ?? "No 3D model could be built for this species.";
}

/** The view model of an analysed species; undefined if no atoms could be placed (see `missingModelReason`). */
export function shapeViewModelOf(analysis: SpeciesAnalysis): ShapeViewModel | undefined {
  const known = viewModels.get(analysis);
  if (known) return known;
  const shape = shapeOf(analysis);
  if (shape.coordinates.atoms.length === 0) return undefined;
  // The point group search already found the axis (or its absence) when it named the group.
  const search = symmetrySearchOf(shape)?.result;
  const axis = search?.ok ? search.value.elements.principalAxis : undefined;
  const model = shapeViewModel(analysis, shape.coordinates, axis);
  viewModels.set(analysis, model);
  return model;
}

/** View models are kept per analysis, as the model itself is: hovers and the 3D view ask again and again. */
const viewModels = new WeakMap<SpeciesAnalysis, ShapeViewModel>();

/** The file for `analysis`, or why there is none (no atoms placed, too many for a V2000 molfile). */
export function coordinateFileOf(analysis: SpeciesAnalysis, format: CoordinateFormat): CoordinateFileResult {
  const { coordinates } = shapeOf(analysis);
  if (coordinates.atoms.length === 0) return { ok: false, message: missingModelReason(analysis)! };
  const title = `${analysis.reading.formula} (lonepair model geometry, not measured data)`;
  const baseName = analysis.reading.formula.replace(/[^A-Za-z0-9+-]+/g, "_").replace(/^_+|_+$/g, "") || "species";
  if (format === "xyz") return { ok: true, value: { text: toXyz(coordinates, title), baseName, extension: "xyz" } };
  const molfile = toMolfile(analysis.graph, coordinates, title);
  return molfile.ok
    ? { ok: true, value: { text: molfile.value, baseName, extension: "mol" } }
    : { ok: false, message: molfile.problem.message };
}
