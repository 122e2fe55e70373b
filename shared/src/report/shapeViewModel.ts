/**
 * The data a 3D shape view draws: atoms, bonds, lone pairs, labelled bond angles and a legend,
 * worked out from a species analysis and its 3D coordinates. Pure and JSON-safe, so the page
 * that draws it stays a thin renderer and this can be tested without an editor or a browser.
 */
import { elementBySymbol } from "../chemistry/elements";
import { angleDegrees, add, cross, distance, dot, norm, normalize, scale, sub, type Vec3 } from "../chemistry/geometry/vectors";
import type { SpeciesAnalysis } from "../chemistry/types";
import { atomPaint } from "./elementPalette";
import { HOVER_CAUTION } from "./hoverMarkdown";
import { startingOrientation, type ViewRotation } from "./viewOrientation";

/** 3D positions of a species' atoms (ångströms) and the direction of each lone pair. */
export interface ShapeCoordinates {
  readonly atoms: readonly { readonly symbol: string; readonly position: Vec3 }[];
  /** `electrons` is 1 for a radical's odd electron; absent means a lone pair. */
  readonly lonePairs: readonly { readonly atom: number; readonly direction: Vec3; readonly electrons?: 1 | 2 }[];
}

export interface ShapeViewAtom {
  readonly index: number;
  readonly symbol: string;
  /** Centred on the molecule's centroid, in ångströms. */
  readonly position: Vec3;
  /** Drawing radius in ångströms (ball-and-stick, not a space-filling radius). */
  readonly radius: number;
  /** `#rrggbb`, from the one element palette. */
  readonly colour: string;
  /** `#rrggbb`: the ball's edge, visible on light and dark backgrounds. */
  readonly outline: string;
  /** `#rrggbb`: the ink of the element symbol drawn on the ball. */
  readonly ink: string;
  readonly isCentre: boolean;
}

export interface ShapeViewBond {
  readonly from: number;
  readonly to: number;
  readonly order: number;
}

/**
 * A lone pair (or a radical's odd electron) on a centre atom: a lobe in the molecular view, a
 * ghost site in the electron view.
 */
export interface ShapeViewLonePair {
  readonly atom: number;
  /** 2 for a lone pair, 1 for an odd electron. */
  readonly electrons: 1 | 2;
  /** Unit vector from the atom. */
  readonly direction: Vec3;
  /** Where a bonded atom would sit on this site: the ghost site's centre. */
  readonly sitePosition: Vec3;
  /** How far the lobe reaches from the atom, in ångströms. */
  readonly lobeLength: number;
}

/** One labelled angle between two bonds at a centre. */
export interface ShapeViewAngle {
  readonly centre: number;
  readonly from: number;
  readonly to: number;
  readonly degrees: number;
  /** Points on a small arc from one bond to the other, for drawing. */
  readonly arc: readonly Vec3[];
  readonly labelPosition: Vec3;
}

/** The legend entry for one VSEPR centre. */
export interface ShapeViewCentre {
  readonly atom: number;
  readonly symbol: string;
  readonly axe: string;
  readonly stericNumber: number;
  readonly lonePairs: number;
  readonly electronGeometry: string;
  readonly molecularGeometry: string;
  readonly hybridization: string;
  readonly idealAngles: readonly number[];
}

/** Everything the page draws for one species. Plain JSON. */
export interface ShapeViewModel {
  /** The species as written in the document (untrusted text: render as text only). */
  readonly title: string;
  readonly formula: string;
  readonly name?: string;
  readonly charge: number;
  readonly atoms: readonly ShapeViewAtom[];
  readonly bonds: readonly ShapeViewBond[];
  readonly lonePairs: readonly ShapeViewLonePair[];
  readonly angles: readonly ShapeViewAngle[];
  readonly centres: readonly ShapeViewCentre[];
  readonly polarity: { readonly polar: boolean; readonly reason: string };
  readonly warnings: readonly string[];
  /** Distance from the origin that holds every atom, ghost site and lobe; the page scales to it. */
  readonly extent: number;
  /** The starting view, chosen from the model's symmetry: rows are screen right, up and towards the viewer. */
  readonly viewRotation: ViewRotation;
  readonly caution: string;
}

/** How far outside the centre atom's ball the arc runs, and its label beyond that (ångströms). */
const ARC_CLEARANCE = 0.22;
const LABEL_CLEARANCE = 0.3;
const ARC_STEPS = 12;
/** Directions tried when choosing the side a straight angle's arc bends to. */
const STRAIGHT_ARC_CANDIDATES = 36;
/** Angles closer than this (degrees) share one label. */
const SAME_ANGLE = 0.5;

/**
 * Builds the view model; mismatched or missing coordinates give fewer items, never an exception.
 * `principalAxis` (null: none) spares a second symmetry search when the caller has the point group.
 */
export function shapeViewModel(analysis: SpeciesAnalysis, coordinates: ShapeCoordinates, principalAxis?: Vec3 | null): ShapeViewModel {
  const atomCount = Math.min(analysis.graph.atoms.length, coordinates.atoms.length);
  const centroid = centroidOf(coordinates.atoms.slice(0, atomCount).map((atom) => atom.position));
  const centreIndices = new Set(analysis.centres.map((centre) => centre.index));
  const atoms: ShapeViewAtom[] = coordinates.atoms.slice(0, atomCount).map((atom, index) => ({
    index,
    symbol: atom.symbol,
    position: roundVector(sub(atom.position, centroid)),
    radius: drawingRadius(atom.symbol),
    colour: atomPaint(atom.symbol).fill,
    outline: atomPaint(atom.symbol).outline,
    ink: atomPaint(atom.symbol).ink,
    isCentre: centreIndices.has(index),
  }));
  const bonds = analysis.graph.bonds
    .filter((bond) => bond.from < atomCount && bond.to < atomCount)
    .map((bond) => ({ from: bond.from, to: bond.to, order: bond.order }));
  const neighbours = neighbourLists(bonds, atomCount);
  const lonePairs = centreLonePairs(analysis, coordinates, atoms, neighbours);
  const angles = analysis.centres.flatMap((centre) =>
    centre.index < atomCount
      ? labelledAngles(
          centre.index,
          atoms,
          neighbours[centre.index],
          lonePairs.filter((lonePair) => lonePair.atom === centre.index).map((lonePair) => lonePair.direction),
        )
      : [],
  );
  const reading = analysis.reading;
  return {
    title: reading.text,
    formula: reading.formula,
    ...(reading.name ? { name: reading.name } : {}),
    charge: reading.charge,
    atoms,
    bonds,
    lonePairs,
    angles,
    centres: analysis.centres.map((centre) => ({
      atom: centre.index,
      symbol: centre.atom,
      axe: centre.axe,
      stericNumber: centre.stericNumber,
      lonePairs: centre.lonePairs,
      electronGeometry: centre.electronGeometry,
      molecularGeometry: centre.molecularGeometry,
      hybridization: centre.hybridization,
      idealAngles: [...centre.idealAngles],
    })),
    polarity: { polar: analysis.polarity.polar, reason: analysis.polarity.reason },
    warnings: [...analysis.warnings],
    extent: extentOf(atoms, lonePairs, angles),
    viewRotation: startingOrientation({
      atoms,
      lonePairs,
      centres: [...centreIndices].filter((index) => index < atomCount),
      principalAxis,
    }),
    caution: HOVER_CAUTION,
  };
}

function centroidOf(positions: readonly Vec3[]): Vec3 {
  if (positions.length === 0) return [0, 0, 0];
  const sum = positions.reduce<Vec3>((total, position) => add(total, position), [0, 0, 0]);
  return scale(sum, 1 / positions.length);
}

/** Grows gently with the covalent radius so H stays visible next to Xe. */
function drawingRadius(symbol: string): number {
  const covalentPicometres = elementBySymbol(symbol)?.covalentRadius ?? 100;
  return round(0.16 + 0.24 * (covalentPicometres / 100));
}

function neighbourLists(bonds: readonly ShapeViewBond[], atomCount: number): number[][] {
  const lists: number[][] = Array.from({ length: atomCount }, () => []);
  for (const bond of bonds) {
    lists[bond.from].push(bond.to);
    lists[bond.to].push(bond.from);
  }
  return lists;
}

/**
 * Lone pairs (and odd electrons) of the VSEPR centres only: terminal atoms' lone pairs would hide
 * the shape the view is there to show. At most as many per atom as the analysis gives it.
 */
function centreLonePairs(
  analysis: SpeciesAnalysis,
  coordinates: ShapeCoordinates,
  atoms: readonly ShapeViewAtom[],
  neighbours: readonly number[][],
): ShapeViewLonePair[] {
  const centres = analysis.centres.filter((centre) => centre.index < atoms.length);
  const remaining = new Map(centres.map((centre) => [`${centre.index}:2`, centre.lonePairs]));
  for (const centre of centres) remaining.set(`${centre.index}:1`, centre.unpairedElectrons);
  const result: ShapeViewLonePair[] = [];
  for (const lonePair of coordinates.lonePairs) {
    const electrons = lonePair.electrons === 1 ? 1 : 2;
    const key = `${lonePair.atom}:${electrons}`;
    const left = remaining.get(key) ?? 0;
    if (left <= 0 || !isFiniteVector(lonePair.direction) || norm(lonePair.direction) === 0) continue;
    remaining.set(key, left - 1);
    const atom = atoms[lonePair.atom];
    const direction = normalize(lonePair.direction);
    const siteDistance = meanBondLength(atom, neighbours[lonePair.atom], atoms);
    result.push({
      atom: lonePair.atom,
      electrons,
      direction: roundVector(direction),
      sitePosition: roundVector(add(atom.position, scale(direction, siteDistance))),
      lobeLength: round(0.7 * siteDistance),
    });
  }
  return result;
}

function meanBondLength(atom: ShapeViewAtom, neighbourIndices: readonly number[], atoms: readonly ShapeViewAtom[]): number {
  if (neighbourIndices.length === 0) return 1;
  const total = neighbourIndices.reduce((sum, index) => sum + distance(atom.position, atoms[index].position), 0);
  return total / neighbourIndices.length;
}

/** One label per distinct angle at a centre (SF4: about 90, 120 and 180), the first pair found. */
function labelledAngles(
  centre: number,
  atoms: readonly ShapeViewAtom[],
  neighbourIndices: readonly number[],
  lonePairDirections: readonly Vec3[],
): ShapeViewAngle[] {
  const origin = atoms[centre].position;
  const arcRadius = atoms[centre].radius + ARC_CLEARANCE;
  const labelled: ShapeViewAngle[] = [];
  for (let first = 0; first < neighbourIndices.length; first++) {
    for (let second = first + 1; second < neighbourIndices.length; second++) {
      const from = neighbourIndices[first];
      const to = neighbourIndices[second];
      const a = sub(atoms[from].position, origin);
      const b = sub(atoms[to].position, origin);
      if (norm(a) === 0 || norm(b) === 0) continue;
      const degrees = angleDegrees(a, b);
      if (labelled.some((angle) => Math.abs(angle.degrees - degrees) < SAME_ANGLE)) continue;
      const otherDirections = [
        ...neighbourIndices.filter((index) => index !== from && index !== to).map((index) => normalize(sub(atoms[index].position, origin))),
        ...lonePairDirections,
      ];
      const arc = arcPoints(origin, normalize(a), normalize(b), otherDirections, arcRadius);
      labelled.push({ centre, from, to, degrees: round(degrees), arc: arc.points, labelPosition: arc.label });
    }
  }
  return labelled.sort((x, y) => x.degrees - y.degrees);
}

/**
 * A circular arc from unit vector `a` to `b` round `origin`; a straight angle bends towards the
 * emptiest side, away from the other bonds and lone pairs.
 */
function arcPoints(origin: Vec3, a: Vec3, b: Vec3, others: readonly Vec3[], radius: number): { points: Vec3[]; label: Vec3 } {
  let axis = cross(a, b);
  if (norm(axis) < 1e-6) axis = cross(a, emptiestPerpendicular(a, others));
  const normal = normalize(axis);
  // In-plane unit vector at 90° from a, towards b: rotating a about `normal` sweeps the arc.
  const towards = cross(normal, a);
  const sweep = Math.acos(Math.max(-1, Math.min(1, dot(a, b))));
  const pointAt = (fraction: number, radius: number): Vec3 => {
    const angle = sweep * fraction;
    return roundVector(add(origin, scale(add(scale(a, Math.cos(angle)), scale(towards, Math.sin(angle))), radius)));
  };
  const points = Array.from({ length: ARC_STEPS + 1 }, (_, step) => pointAt(step / ARC_STEPS, radius));
  return { points, label: pointAt(0.5, radius + LABEL_CLEARANCE) };
}

/** Of the directions at right angles to `a`, the one farthest (in angle) from every direction in `others`. */
function emptiestPerpendicular(a: Vec3, others: readonly Vec3[]): Vec3 {
  const helper: Vec3 = Math.abs(a[0]) < 0.9 ? [1, 0, 0] : [0, 1, 0];
  const first = normalize(cross(a, helper));
  const second = cross(a, first);
  let best = first;
  let bestClearance = -Infinity;
  for (let step = 0; step < STRAIGHT_ARC_CANDIDATES; step++) {
    const turn = (2 * Math.PI * step) / STRAIGHT_ARC_CANDIDATES;
    const candidate = add(scale(first, Math.cos(turn)), scale(second, Math.sin(turn)));
    const clearance = Math.min(Math.PI, ...others.map((other) => Math.acos(Math.max(-1, Math.min(1, dot(candidate, normalize(other)))))));
    if (clearance > bestClearance + 1e-9) {
      best = candidate;
      bestClearance = clearance;
    }
  }
  return best;
}

function extentOf(atoms: readonly ShapeViewAtom[], lonePairs: readonly ShapeViewLonePair[], angles: readonly ShapeViewAngle[]): number {
  let extent = 0.5;
  for (const angle of angles) extent = Math.max(extent, norm(angle.labelPosition) + 0.2, ...angle.arc.map((point) => norm(point)));
  for (const atom of atoms) extent = Math.max(extent, norm(atom.position) + atom.radius);
  for (const lonePair of lonePairs) extent = Math.max(extent, norm(lonePair.sitePosition) + 0.3);
  return round(extent);
}

function isFiniteVector(vector: Vec3): boolean {
  return vector.length === 3 && vector.every((component) => Number.isFinite(component));
}

/** Three decimals, and never -0 (JSON would write it as 0). */
function round(value: number): number {
  const rounded = Math.round(value * 1000) / 1000;
  return rounded === 0 ? 0 : rounded;
}

function roundVector(vector: Vec3): Vec3 {
  return [round(vector[0]), round(vector[1]), round(vector[2])];
}
