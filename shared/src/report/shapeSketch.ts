/**
 * A small ball-and-stick sketch of a species' model shape as SVG, for hover cards. Pure: no
 * scripts, no fonts or images fetched, nothing from the document (only element symbols).
 */
import type { SpeciesAnalysis } from "../chemistry/types";
import type { DiagramTheme } from "./lewisDiagram";
import { NEUTRAL_THEME, shapeScene, sceneSvg, type SceneTheme } from "./shapeScene";
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
  return `data:image/svg+xml;base64,${base64Of(new TextEncoder().encode(svg))}`;
}

const BASE64_DIGITS = Array.from("ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789+/", (digit) => digit.charCodeAt(0));
const BASE64_PAD = "=".charCodeAt(0);
const ASCII = new TextDecoder();

/**
 * Standard base64 (RFC 4648) of `bytes`. Written out here since the core runs where Node's
 * Buffer is missing, and btoa wants a string of one character per byte built first, which is slow.
 */
function base64Of(bytes: Uint8Array): string {
  const codes = new Uint8Array(Math.ceil(bytes.length / 3) * 4);
  let out = 0;
  let index = 0;
  for (; index + 2 < bytes.length; index += 3) {
    const triple = (bytes[index] << 16) | (bytes[index + 1] << 8) | bytes[index + 2];
    codes[out++] = BASE64_DIGITS[triple >> 18];
    codes[out++] = BASE64_DIGITS[(triple >> 12) & 63];
    codes[out++] = BASE64_DIGITS[(triple >> 6) & 63];
    codes[out++] = BASE64_DIGITS[triple & 63];
  }
  const left = bytes.length - index;
  if (left > 0) {
    const triple = (bytes[index] << 16) | (left === 2 ? bytes[index + 1] << 8 : 0);
    codes[out++] = BASE64_DIGITS[triple >> 18];
    codes[out++] = BASE64_DIGITS[(triple >> 12) & 63];
    codes[out++] = left === 2 ? BASE64_DIGITS[(triple >> 6) & 63] : BASE64_PAD;
    codes[out] = BASE64_PAD;
  }
  // The digits are ASCII, which UTF-8 decoding leaves as they are.
  return ASCII.decode(codes);
}

/** Whole pixels within reason, so the markup never carries NaN or a runaway size. */
function pixelSize(asked: number | undefined, fallback: number, largest = 1000): number {
  return asked !== undefined && Number.isFinite(asked) ? Math.max(40, Math.min(largest, Math.round(asked))) : fallback;
}

/** Pixels on a side of a report picture at most. */
const LARGEST_PICTURE = 4000;

/** Size, view and backdrop of a full picture of a species' shape. */
export interface ShapePictureOptions {
  /** Pixels, 40 to 4000 (default 480 × 400). */
  readonly width?: number;
  readonly height?: number;
  /** Lone pairs as lobes (default) or as empty electron sites. */
  readonly mode?: "molecular" | "electron";
  /**
   * The page it goes on, as for Lewis diagrams: "plate" (default) a white card with dark text,
   * "light" or "dark" transparent for a page of that kind, "current" transparent with mid-grey
   * text that reads on either.
   */
  readonly theme?: DiagramTheme;
}

/** Angle-label ink, the colour far atoms fade towards, and the backdrop, for each kind of page. */
const PICTURE_THEMES: Readonly<Record<DiagramTheme, { readonly scene: SceneTheme; readonly backdrop?: string }>> = {
  plate: { scene: { foreground: "#333333", background: "#ffffff" }, backdrop: "#ffffff" },
  light: { scene: { foreground: "#333333", background: "#ffffff" } },
  dark: { scene: { foreground: "#d4d4d4", background: "#1e1e1e" } },
  current: { scene: NEUTRAL_THEME },
};

/**
 * The full ball-and-stick picture of a species (symbols, lone pairs, labelled angles) as a
 * standalone SVG document, from the 3D view's starting view; undefined when no model could be built.
 */
export function shapePictureSvg(analysis: SpeciesAnalysis, options: ShapePictureOptions = {}): string | undefined {
  const model = shapeViewModelOf(analysis);
  if (!model) return undefined;
  const look = PICTURE_THEMES[options.theme ?? "plate"] ?? PICTURE_THEMES.plate;
  const scene = shapeScene(model, {
    width: pixelSize(options.width, 480, LARGEST_PICTURE),
    height: pixelSize(options.height, 400, LARGEST_PICTURE),
    mode: options.mode ?? "molecular",
    theme: look.scene,
  });
  const geometries = [...new Set(model.centres.map((centre) => centre.molecularGeometry))].join(", ");
  return sceneSvg(scene, look.backdrop, {
    title: `Ball-and-stick model of ${model.formula}${geometries ? ` (${geometries})` : ""}`,
    description: model.caution,
  });
}
