/**
 * A small ball-and-stick sketch of a species' model shape as SVG, for hover cards. Pure: no
 * scripts, no fonts or images fetched, nothing from the document (only element symbols).
 */
import type { SpeciesAnalysis } from "../chemistry/types";
import { shapeScene, sceneSvg } from "./shapeScene";
import { shapeViewModelOf } from "./speciesModel";

/** Size and labelling of a sketch. */
export interface ShapeSketchOptions {
  /** Width in pixels (default 160). */
  readonly width?: number;
  /** Height in pixels (default 120). */
  readonly height?: number;
  /** Draw element symbols on atoms where they stay legible (default true). */
  readonly labels?: boolean;
}

/**
 * Past this many atoms the balls shrink below a few pixels at hover size, and the data URI
 * grows with every atom and bond, eating the editor's hover budget for an unreadable picture.
 */
export const MAX_SKETCH_ATOMS = 40;

/** Symbols only on small molecules: on bigger ones they crowd the balls. */
const MAX_LABELLED_ATOMS = 12;

const SKETCH_MARGIN = 6;

/**
 * SVG markup of a sketch of the species' model shape; undefined for a single atom (nothing to
 * show) and for species of more than MAX_SKETCH_ATOMS atoms. Drawn by the same renderer and
 * from the same starting view as the 3D view, in its short form.
 */
export function shapeSketchSvg(analysis: SpeciesAnalysis, options: ShapeSketchOptions = {}): string | undefined {
  // Counted before the model is built: a species too big to sketch must not pay for its model here.
  if (analysis.graph.atoms.length > MAX_SKETCH_ATOMS) return undefined;
  const model = shapeViewModelOf(analysis);
  if (!model || model.atoms.length < 2 || model.atoms.length > MAX_SKETCH_ATOMS) return undefined;
  const scene = shapeScene(model, {
    width: pixelSize(options.width, 160),
    height: pixelSize(options.height, 120),
    compact: true,
    angleLabels: false,
    atomLabels: (options.labels ?? true) && model.atoms.length <= MAX_LABELLED_ATOMS,
    margin: SKETCH_MARGIN,
  });
  return sceneSvg(scene);
}

/** A `data:` URI of an SVG, as markdown images in editor hovers accept it. */
export function svgDataUri(svg: string): string {
  const bytes = new TextEncoder().encode(svg);
  let binary = "";
  for (const byte of bytes) binary += String.fromCharCode(byte);
  return `data:image/svg+xml;base64,${btoa(binary)}`;
}

/** Whole pixels within reason, so the markup never carries NaN or a runaway size. */
function pixelSize(asked: number | undefined, fallback: number): number {
  return asked !== undefined && Number.isFinite(asked) ? Math.max(40, Math.min(1000, Math.round(asked))) : fallback;
}

/** Size, view and backdrop of a full picture of a species' shape. */
export interface ShapePictureOptions {
  /** Pixels (default 480 × 400). */
  readonly width?: number;
  readonly height?: number;
  /** Lone pairs as lobes (default) or as empty electron sites. */
  readonly mode?: "molecular" | "electron";
  /** A `#rrggbb` backdrop; none (transparent) by default. */
  readonly background?: string;
}

/**
 * The full ball-and-stick picture of a species (symbols, lone pairs, labelled angles) as a
 * standalone SVG document, from the 3D view's starting view; undefined when no model could be built.
 */
export function shapePictureSvg(analysis: SpeciesAnalysis, options: ShapePictureOptions = {}): string | undefined {
  const model = shapeViewModelOf(analysis);
  if (!model) return undefined;
  const scene = shapeScene(model, {
    width: pixelSize(options.width, 480),
    height: pixelSize(options.height, 400),
    mode: options.mode ?? "molecular",
  });
  return sceneSvg(scene, options.background);
}
