/**
 * The starting view of a model, chosen from its symmetry so the shape reads at a glance: a flat
 * species is seen face-on; otherwise the principal axis stands upright and the view looks
 * straight at the mirror-like plane through that axis that holds the most atoms (SF4's axial
 * F-S-F board over its two equatorial legs, NH3's pyramid from the side). Lone pairs point up,
 * so a T stands on its stem. A small turn then clears any atom hidden behind another.
 */
import { findPointGroup } from "../chemistry/symmetry/pointGroup";
import { symmetricEigen } from "../chemistry/geometry/symmetricEigen";
import { smallestScreenGap } from "./screenGap";
import { bestPlaneNormalThrough } from "./viewPlanes";
import { add, cross, dot, norm, normalize, scale, sub, type Vec3 } from "../chemistry/geometry/vectors";

/** A rotation as three rows: the model-frame directions of screen right, screen up and towards the viewer. */
export type ViewRotation = readonly [number, number, number, number, number, number, number, number, number];

/** What the choice reads from a model: centred positions and drawing radii, lone-pair directions. */
export interface OrientationInput {
  readonly atoms: readonly { readonly symbol: string; readonly position: Vec3; readonly radius: number }[];
  readonly lonePairs: readonly { readonly atom: number; readonly direction: Vec3 }[];
  /** Atoms that are VSEPR centres, heaviest weight when deciding which way is up. */
  readonly centres: readonly number[];
  /** The principal axis when the caller has already found the point group; searched for otherwise. */
  readonly principalAxis?: Vec3 | null;
}

/** Atoms this far (Å) from a plane or line still count as on it. */
const ON_PLANE = 0.12;
/** Above this many atoms the symmetry search is skipped: the spread of the atoms decides. */
const MAX_SYMMETRY_SEARCH_ATOMS = 60;
/** Clear gap (Å) wanted between two balls on screen, after the renderer's depth scaling. */
const WANTED_GAP = 0.12;
/** The renderer draws near atoms up to this much larger. */
const NEAREST_RADIUS_FACTOR = 1.12;
/** Turns tried to clear hidden atoms (degrees), smallest first. */
const TURNS = [0, 10, -10, 15, -15, 20, -20, 25, -25, 30, -30, 35, -35, 40, -40, 45, -45];
/** Longer than this along the principal axis (against across it), a molecule lies down. */
const LIE_DOWN_RATIO = 1.25;

/** The starting rotation of the model. */
export function startingOrientation(input: OrientationInput): ViewRotation {
  const positions = input.atoms.map((atom) => atom.position);
  if (positions.length < 2) return [1, 0, 0, 0, 1, 0, 0, 0, 1];
  const base = baseFrame(input, positions);
  return clearHiddenAtoms(input, base);
}

interface Frame {
  readonly right: Vec3;
  readonly up: Vec3;
  readonly towards: Vec3;
}

function baseFrame(input: OrientationInput, positions: readonly Vec3[]): Frame {
  const spread = symmetricEigen(covarianceOf(positions));
  const [thinnest, middle, longest] = spread.vectors;
  // Collinear: the axis lies across the screen.
  if (spread.values[1] < ON_PLANE ** 2) return frameFrom(longest, perpendicularTo(longest));
  // Flat: seen face-on, the in-plane axis that orders the atoms best standing upright.
  if (maxDistanceFromPlane(positions, thinnest) < ON_PLANE) {
    const upright = uprightInPlane(input, positions, thinnest) ?? middle;
    return orientUp(frameFrom(cross(upright, thinnest), upright), input);
  }
  const axis = principalAxisOf(input) ?? uniqueSpreadAxis(spread) ?? longest;
  const viewDirection = bestPlaneNormalThrough(axis, positions, ON_PLANE);
  const upright = lengthAlong(positions, axis) > LIE_DOWN_RATIO * lengthAcross(positions, axis) ? cross(viewDirection, axis) : axis;
  return orientUp(frameFrom(cross(upright, viewDirection), upright), input);
}

/** A right-handed frame from a wanted right and up direction (up kept, right made perpendicular). */
function frameFrom(right: Vec3, up: Vec3): Frame {
  const upright = normalize(up);
  const towards = normalize(cross(right, upright));
  return { right: normalize(cross(upright, towards)), up: upright, towards };
}

/** Turns the frame half round about the view direction when lone pairs (or the lighter side) point down. */
function orientUp(frame: Frame, input: OrientationInput): Frame {
  let lean = 0;
  for (const lonePair of input.lonePairs) lean += dot(normalize(lonePair.direction), frame.up);
  if (Math.abs(lean) < 1e-3) {
    // No lone pair to go by: the centres above the other atoms, like a stand on its feet.
    const centres = input.centres.length > 0 ? input.centres : [];
    const height = (index: number): number => dot(input.atoms[index].position, frame.up);
    const centreHeight = centres.reduce((sum, index) => sum + height(index), 0) / Math.max(1, centres.length);
    const allHeight = input.atoms.reduce((sum, _atom, index) => sum + height(index), 0) / input.atoms.length;
    lean = centres.length > 0 ? centreHeight - allHeight : 0;
  }
  if (lean < -1e-3) return { right: scale(frame.right, -1), up: scale(frame.up, -1), towards: frame.towards };
  return frame;
}

/**
 * The upright direction in a flat species' plane: its in-plane symmetry axis through a centre
 * (the stem of a T, the bisector of a bent molecule), else the direction of the first outer atom.
 */
function uprightInPlane(input: OrientationInput, positions: readonly Vec3[], normal: Vec3): Vec3 | undefined {
  const pointGroupAxis = principalAxisOf(input);
  if (pointGroupAxis && Math.abs(dot(pointGroupAxis, normal)) < 0.5)
    return normalize(sub(pointGroupAxis, scale(normal, dot(pointGroupAxis, normal))));
  // The axis is the plane's normal (XeF4, BF3, benzene): stand the first bond upright.
  const centre = input.centres[0] ?? 0;
  for (let index = 0; index < positions.length; index++) {
    if (index === centre) continue;
    const along = sub(positions[index], positions[centre]);
    if (norm(along) > 0.3) return normalize(sub(along, scale(normal, dot(along, normal))));
  }
  return undefined;
}

function principalAxisOf(input: OrientationInput): Vec3 | undefined {
  if (input.principalAxis !== undefined)
    return input.principalAxis && norm(input.principalAxis) > 0 ? normalize(input.principalAxis) : undefined;
  if (input.atoms.length > MAX_SYMMETRY_SEARCH_ATOMS) return undefined;
  const found = findPointGroup(
    input.atoms.map((atom) => ({ element: atom.symbol, position: atom.position })),
    0.05,
  );
  const axis = found.ok ? found.value.elements.principalAxis : null;
  return axis && norm(axis) > 0 ? normalize(axis) : undefined;
}

/** For a symmetric top, the axis whose spread differs from the other two. */
function uniqueSpreadAxis(spread: ReturnType<typeof symmetricEigen>): Vec3 | undefined {
  const [a, b, c] = spread.values;
  const scaleOf = Math.max(c, 1e-9);
  if (Math.abs(a - b) / scaleOf < 0.05 && Math.abs(b - c) / scaleOf > 0.1) return spread.vectors[2];
  if (Math.abs(b - c) / scaleOf < 0.05 && Math.abs(a - b) / scaleOf > 0.1) return spread.vectors[0];
  return undefined;
}

/** Turns the view a little (about screen up first, then screen right) until no ball hides another. */
function clearHiddenAtoms(input: OrientationInput, frame: Frame): ViewRotation {
  let best = frame;
  let bestGap = -Infinity;
  const radii = input.atoms.map((atom) => atom.radius);
  for (const [index, first] of TURNS.entries()) {
    for (const second of TURNS.slice(0, index + 1)) {
      for (const [aboutUp, aboutRight] of [
        [first, second],
        [second, first],
      ]) {
        const turned = turnFrame(frame, aboutUp, aboutRight);
        const gap = smallestGap(input, radii, turned, bestGap);
        if (gap >= WANTED_GAP) return rotationOf(turned);
        if (gap > bestGap + 1e-9) {
          best = turned;
          bestGap = gap;
        }
      }
    }
  }
  return rotationOf(best);
}

function turnFrame(frame: Frame, aboutUpDegrees: number, aboutRightDegrees: number): Frame {
  const first = rotateFrame(frame, frame.up, aboutUpDegrees);
  return rotateFrame(first, first.right, aboutRightDegrees);
}

function rotateFrame(frame: Frame, axis: Vec3, degrees: number): Frame {
  if (degrees === 0) return frame;
  const turn = (vector: Vec3): Vec3 => rotateAbout(vector, axis, (degrees * Math.PI) / 180);
  return { right: turn(frame.right), up: turn(frame.up), towards: turn(frame.towards) };
}

/** Rodrigues' rotation of `vector` about the unit `axis`. */
function rotateAbout(vector: Vec3, axis: Vec3, angle: number): Vec3 {
  const cosine = Math.cos(angle);
  return add(add(scale(vector, cosine), scale(cross(axis, vector), Math.sin(angle))), scale(axis, dot(axis, vector) * (1 - cosine)));
}

/**
 * The smallest on-screen gap between two balls (Å), radii grown as the renderer grows near atoms.
 * Stops early once the gap is no better than `toBeat`: that view has already lost.
 */
function smallestGap(input: OrientationInput, radii: readonly number[], frame: Frame, toBeat: number): number {
  const xs = new Float64Array(input.atoms.length);
  const ys = new Float64Array(input.atoms.length);
  input.atoms.forEach((atom, index) => {
    xs[index] = dot(atom.position, frame.right);
    ys[index] = dot(atom.position, frame.up);
  });
  return smallestScreenGap({ xs, ys, radii, growth: NEAREST_RADIUS_FACTOR }, toBeat);
}

function rotationOf(frame: Frame): ViewRotation {
  const clean = (value: number): number => {
    const rounded = Math.round(value * 1e6) / 1e6;
    return rounded === 0 ? 0 : rounded;
  };
  return [...frame.right, ...frame.up, ...frame.towards].map(clean) as unknown as ViewRotation;
}

function covarianceOf(positions: readonly Vec3[]): readonly [Vec3, Vec3, Vec3] {
  const sums = [0, 0, 0, 0, 0, 0];
  for (const [x, y, z] of positions) {
    sums[0] += x * x;
    sums[1] += x * y;
    sums[2] += x * z;
    sums[3] += y * y;
    sums[4] += y * z;
    sums[5] += z * z;
  }
  const n = positions.length;
  return [
    [sums[0] / n, sums[1] / n, sums[2] / n],
    [sums[1] / n, sums[3] / n, sums[4] / n],
    [sums[2] / n, sums[4] / n, sums[5] / n],
  ];
}

function maxDistanceFromPlane(positions: readonly Vec3[], normal: Vec3): number {
  return Math.max(...positions.map((position) => Math.abs(dot(position, normal))));
}

function lengthAlong(positions: readonly Vec3[], axis: Vec3): number {
  const along = positions.map((position) => dot(position, axis));
  return Math.max(...along) - Math.min(...along);
}

function lengthAcross(positions: readonly Vec3[], axis: Vec3): number {
  return 2 * Math.max(...positions.map((position) => norm(sub(position, scale(axis, dot(position, axis))))));
}

function perpendicularTo(vector: Vec3): Vec3 {
  const helper: Vec3 = Math.abs(vector[0]) < 0.9 ? [1, 0, 0] : [0, 1, 0];
  return normalize(cross(vector, helper));
}
