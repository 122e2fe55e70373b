/**
 * A species' model coordinates as file text: XYZ or MDL molfile, with a file name made from
 * the formula.
 */
import { buildCoordinates } from "../../shared/src/index";
import { toMolfile } from "../../shared/src/index";
import { toXyz } from "../../shared/src/index";
import type { SpeciesAnalysis } from "./core";

export type CoordinateFormat = "xyz" | "molfile";

export interface CoordinateFile {
  readonly text: string;
  /** A file name without extension that is safe on every file system ("SO4_2-"). */
  readonly baseName: string;
  readonly extension: "xyz" | "mol";
}

export type CoordinateFileResult = { readonly ok: true; readonly value: CoordinateFile } | { readonly ok: false; readonly message: string };

/** The file for `analysis`, or why there is none (no atoms placed, too many for a V2000 molfile). */
export function coordinateFile(analysis: SpeciesAnalysis, format: CoordinateFormat): CoordinateFileResult {
  const coordinates = buildCoordinates(analysis.graph, analysis.radical);
  if (coordinates.atoms.length === 0) return { ok: false, message: "no 3D model could be built for this species." };
  const title = `${analysis.reading.formula} (lonepair model geometry, not measured data)`;
  const baseName = analysis.reading.formula.replace(/[^A-Za-z0-9+-]+/g, "_").replace(/^_+|_+$/g, "") || "species";
  if (format === "xyz") return { ok: true, value: { text: toXyz(coordinates, title), baseName, extension: "xyz" } };
  const molfile = toMolfile(analysis.graph, coordinates, title);
  return molfile.ok ? { ok: true, value: { text: molfile.value, baseName, extension: "mol" } } : { ok: false, message: molfile.problem.message };
}
