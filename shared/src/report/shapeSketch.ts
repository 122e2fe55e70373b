/**
 * A small ball-and-stick sketch of a species' model shape as SVG, for hover cards: an
 * orthographic projection from a fixed oblique view, painted back to front. Pure: no scripts,
 * no fonts or images fetched, nothing from the document (only element symbols from the core).
 */
import { shapeOf } from "../chemistry/analysis/shape3d";
import type { Vec3 } from "../chemistry/geometry/vectors";
import type { SpeciesAnalysis } from "../chemistry/types";

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

// The core builds shapes with their main axis along z and equatorial atoms in the xy plane, so a
// fixed view with z upright, turned about it and seen from a little above, shows every shape
// obliquely: no equatorial atom hides behind another and planar species are not seen edge-on.
const VIEW_TURN = (40 * Math.PI) / 180;
const VIEW_ELEVATION = (25 * Math.PI) / 180;

const MARGIN = 6;
/** Small molecules (H2, HCl) would otherwise fill the frame with two giant balls. */
const MAX_PIXELS_PER_ANGSTROM = 42;
const HYDROGEN_RADIUS = 0.24;
const ATOM_RADIUS = 0.36;
/** Lone-pair lobes sit this far from their atom (Å) and are this long and wide. */
const LOBE_OFFSET = 0.62;
const LOBE_LENGTH = 0.42;
const LOBE_WIDTH = 0.24;
/** Symbols are drawn only on balls at least this big (px), and only on small molecules. */
const MIN_LABEL_RADIUS = 6;
const MAX_LABELLED_ATOMS = 12;
const BOND_COLOUR = "#777";
const LOBE_COLOUR = "#a070d0";

/** Element colours, a small familiar palette (H white, C dark grey, N blue, O red, ...). */
const ELEMENT_COLOURS: Readonly<Record<string, string>> = {
  H: "#fff",
  C: "#444",
  N: "#3050f0",
  O: "#e02020",
  F: "#60c040",
  Cl: "#30b030",
  Br: "#902020",
  I: "#8020a0",
  S: "#e8d030",
  P: "#f08c10",
  He: "#40c8d8",
  Ne: "#40c8d8",
  Ar: "#40c8d8",
  Kr: "#40c8d8",
  Xe: "#40c8d8",
  Rn: "#40c8d8",
};
const OTHER_COLOUR = "#999";
const DARK_COLOURS = new Set(["#444", "#3050f0", "#e02020", "#902020", "#8020a0"]);
const SAFE_SYMBOL = /^[A-Z][a-z]?$/;

interface Painted {
  readonly depth: number;
  readonly markup: string;
}

/**
 * SVG markup of a sketch of the species' model shape; undefined for a single atom (nothing to
 * show) and for species of more than MAX_SKETCH_ATOMS atoms.
 */
export function shapeSketchSvg(analysis: SpeciesAnalysis, options: ShapeSketchOptions = {}): string | undefined {
  // Counted before the model is built: a species too big to sketch must not pay for its model here.
  if (analysis.graph.atoms.length > MAX_SKETCH_ATOMS) return undefined;
  const { atoms, lonePairs } = shapeOf(analysis).coordinates;
  if (atoms.length < 2 || atoms.length > MAX_SKETCH_ATOMS) return undefined;
  const width = pixelSize(options.width, 160);
  const height = pixelSize(options.height, 120);
  const viewed = atoms.map((atom) => view(atom.position));
  const centre = centroid(viewed);
  const points = viewed.map((point): Vec3 => [point[0] - centre[0], point[1] - centre[1], point[2] - centre[2]]);
  const symbols = atoms.map((atom) => (SAFE_SYMBOL.test(atom.symbol) ? atom.symbol : ""));
  const radii = symbols.map((symbol) => (symbol === "H" ? HYDROGEN_RADIUS : ATOM_RADIUS));
  const centres = new Set(analysis.centres.map((centreAnalysis) => centreAnalysis.index));
  const lobes = lonePairs
    .filter((pair) => centres.has(pair.atom) && points[pair.atom])
    .map((pair) => ({ pair, direction: view(pair.direction) }));

  let extentX = 0;
  let extentY = 0;
  points.forEach((point, index) => {
    extentX = Math.max(extentX, Math.abs(point[0]) + radii[index]);
    extentY = Math.max(extentY, Math.abs(point[1]) + radii[index]);
  });
  for (const { pair, direction } of lobes) {
    const reach = LOBE_OFFSET + LOBE_LENGTH;
    extentX = Math.max(extentX, Math.abs(points[pair.atom][0] + direction[0] * reach));
    extentY = Math.max(extentY, Math.abs(points[pair.atom][1] + direction[1] * reach));
  }
  const pixels = Math.min(
    MAX_PIXELS_PER_ANGSTROM,
    (width / 2 - MARGIN) / Math.max(extentX, 1e-6),
    (height / 2 - MARGIN) / Math.max(extentY, 1e-6),
  );
  // SVG's y axis points down; the model's points up.
  const screen = (point: Vec3): [number, number] => [width / 2 + point[0] * pixels, height / 2 - point[1] * pixels];

  const bondWidth = Math.max(1, Math.min(2.5, pixels * 0.06));
  const painted: Painted[] = [];
  for (const bond of analysis.graph.bonds) {
    const from = points[bond.from];
    const to = points[bond.to];
    if (!from || !to) continue;
    const middle = screen([(from[0] + to[0]) / 2, (from[1] + to[1]) / 2, 0]);
    // Each half is painted just behind its own atom, so a ball always covers the end of its
    // bonds and a bond running towards the viewer is never hidden by the atom it leaves.
    for (const [end, depth] of [
      [from, from[2]],
      [to, to[2]],
    ] as const) {
      painted.push({ depth: depth - 1e-3, markup: bondMarkup(screen(end), middle, bond.order, bondWidth) });
    }
  }
  const labelled = (options.labels ?? true) && atoms.length <= MAX_LABELLED_ATOMS;
  points.forEach((point, index) => {
    const radius = radii[index] * pixels;
    painted.push({ depth: point[2], markup: atomMarkup(screen(point), radius, symbols[index], labelled) });
  });
  for (const { pair, direction } of lobes) {
    const middle: Vec3 = [
      points[pair.atom][0] + direction[0] * LOBE_OFFSET,
      points[pair.atom][1] + direction[1] * LOBE_OFFSET,
      points[pair.atom][2] + direction[2] * LOBE_OFFSET,
    ];
    const size = pair.electrons === 2 ? 1 : 0.6;
    painted.push({
      depth: middle[2],
      markup: lobeMarkup(screen(middle), direction, LOBE_LENGTH * size * pixels, LOBE_WIDTH * size * pixels),
    });
  }
  painted.sort((a, b) => a.depth - b.depth);
  return (
    `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}" stroke="${BOND_COLOUR}" stroke-width="${round(bondWidth)}" stroke-linecap="round">` +
    painted.map((item) => item.markup).join("") +
    "</svg>"
  );
}

/** A `data:` URI of an SVG, as markdown images in editor hovers accept it. */
export function svgDataUri(svg: string): string {
  const bytes = new TextEncoder().encode(svg);
  let binary = "";
  for (const byte of bytes) binary += String.fromCharCode(byte);
  return `data:image/svg+xml;base64,${btoa(binary)}`;
}

/**
 * A model point in the sketch's view: x to the right, y up, z towards the viewer. The model is
 * turned about its z axis, then seen from VIEW_ELEVATION above its xy plane.
 */
function view(point: Vec3): Vec3 {
  const [x, y, z] = point;
  const across = x * Math.cos(VIEW_TURN) - y * Math.sin(VIEW_TURN);
  const away = x * Math.sin(VIEW_TURN) + y * Math.cos(VIEW_TURN);
  return [
    across,
    away * Math.sin(VIEW_ELEVATION) + z * Math.cos(VIEW_ELEVATION),
    -away * Math.cos(VIEW_ELEVATION) + z * Math.sin(VIEW_ELEVATION),
  ];
}

/** Whole pixels within reason, so the markup never carries NaN or a runaway size. */
function pixelSize(asked: number | undefined, fallback: number): number {
  return asked !== undefined && Number.isFinite(asked) ? Math.max(40, Math.min(1000, Math.round(asked))) : fallback;
}

function centroid(points: readonly Vec3[]): Vec3 {
  const sum = points.reduce<[number, number, number]>(
    (total, point) => [total[0] + point[0], total[1] + point[1], total[2] + point[2]],
    [0, 0, 0],
  );
  return [sum[0] / points.length, sum[1] / points.length, sum[2] / points.length];
}

/** One decimal is finer than a pixel needs and keeps the markup short. */
function round(value: number): string {
  return String(Math.round(value * 10) / 10);
}

/** Bonds take their colour and width from the root element; most sketches are mostly bonds. */
function bondMarkup(from: [number, number], to: [number, number], order: number, bondWidth: number): string {
  const dx = to[0] - from[0];
  const dy = to[1] - from[1];
  const length = Math.hypot(dx, dy);
  const lines = Math.max(1, Math.min(3, Math.round(order)));
  // Seen end-on a bond has no sideways direction for parallel lines; one thick line stands in.
  if (lines === 1 || length < 1) {
    const width = lines === 1 ? "" : ` stroke-width="${round(bondWidth * lines)}"`;
    return `<line x1="${round(from[0])}" y1="${round(from[1])}" x2="${round(to[0])}" y2="${round(to[1])}"${width}/>`;
  }
  const gap = bondWidth * 1.8;
  const normalX = (-dy / length) * gap;
  const normalY = (dx / length) * gap;
  let markup = "";
  for (let line = 0; line < lines; line++) {
    const offset = line - (lines - 1) / 2;
    markup += `<line x1="${round(from[0] + normalX * offset)}" y1="${round(from[1] + normalY * offset)}" x2="${round(to[0] + normalX * offset)}" y2="${round(to[1] + normalY * offset)}"/>`;
  }
  return markup;
}

function atomMarkup(at: [number, number], radius: number, symbol: string, labelled: boolean): string {
  const colour = ELEMENT_COLOURS[symbol] ?? OTHER_COLOUR;
  const circle = `<circle cx="${round(at[0])}" cy="${round(at[1])}" r="${round(radius)}" fill="${colour}" stroke="${symbol === "H" ? "#888" : "#222"}" stroke-width=".8"/>`;
  if (!labelled || !symbol || radius < MIN_LABEL_RADIUS) return circle;
  const size = Math.min(radius * (symbol.length > 1 ? 1 : 1.2), 14);
  const ink = DARK_COLOURS.has(colour) ? "#fff" : "#000";
  return `${circle}<text x="${round(at[0])}" y="${round(at[1] + size * 0.35)}" font-family="sans-serif" font-size="${round(size)}" text-anchor="middle" fill="${ink}" stroke="none">${symbol}</text>`;
}

function lobeMarkup(at: [number, number], direction: Vec3, length: number, width: number): string {
  // Foreshortening: a lobe pointing at the viewer looks round, one across the view looks long.
  const sideways = Math.hypot(direction[0], direction[1]);
  const along = Math.max(width, length * sideways);
  const angle = (Math.atan2(-direction[1], direction[0]) * 180) / Math.PI;
  return `<ellipse cx="${round(at[0])}" cy="${round(at[1])}" rx="${round(along)}" ry="${round(width)}" transform="rotate(${round(angle)} ${round(at[0])} ${round(at[1])})" fill="${LOBE_COLOUR}" fill-opacity=".45" stroke="${LOBE_COLOUR}" stroke-width=".6"/>`;
}
