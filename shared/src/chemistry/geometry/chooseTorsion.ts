/**
 * The turn of a newly placed atom's frame about the bond to its parent. The site pointing back
 * at the parent is already aligned with the bond; what is left is the torsion, chosen from a few
 * candidates by these rules, in order:
 *
 * 1. a ring closes as well as it can: a neighbour already placed lands at bond length, and an
 *    atom placed two bonds away through an unplaced atom lands at the ideal 1,3 distance;
 * 2. round a ring, the next ring atom is cis to the previous one (rings curl shut, and planar
 *    rings stay planar);
 * 3. across a bond between two tetrahedral atoms that both carry lone pairs, as few lone pairs as
 *    possible are anti to each other: each lone pair prefers a bond anti to it, which gives the
 *    skew (gauche) forms of hydrazine and hydrogen peroxide;
 * 4. the least repulsion between atoms (and, more weakly, lone pairs) that are not bonded.
 *
 * Candidates: staggered for two tetrahedral atoms; eclipsed or anti (0° or 180°) for two
 * trigonal planar atoms, so their p orbitals stay parallel, and for a trigonal planar atom next
 * to a lone-pair-bearing tetrahedral one; every 15° otherwise.
 */
import type { AtomSites } from "./atomSites";
import {
  composeRotations,
  perpendicularTo,
  rotate,
  rotationAboutAxis,
  rotationAligning,
  signedAngleAbout,
  type Rotation,
} from "./rotation";
import { add, distance, dot, norm, normalize, scale, sub, type Vec3 } from "./vectors";

/** What the torsion rules read about the molecule placed so far. */
export interface PlacementState {
  readonly sites: readonly AtomSites[];
  readonly positions: readonly (Vec3 | undefined)[];
  readonly rotations: readonly (Rotation | undefined)[];
  readonly bondLength: (first: number, second: number) => number;
  readonly bonded: (first: number, second: number) => boolean;
  /** The parent's and the child's ring neighbours when the bond is on a ring. */
  readonly ringNeighbours: (parent: number, child: number) => { beforeParent: number; afterChild: number } | undefined;
  /** Placed atoms of the fragment being walked within `radius` of `point`, in index order. */
  readonly placedNear: (point: Vec3, radius: number) => readonly number[];
}

/**
 * Placed atoms farther than this from the child (ångströms) are left out of the repulsion: at
 * 1 / distance⁴ they weigh under a ten-thousandth of a neighbour's push, and leaving them out keeps
 * each torsion choice's cost independent of the molecule's size.
 */
export const REPULSION_REACH = 12;

/** How far a lone pair's stand-in point sits from its atom, in ångströms. */
const LONE_PAIR_REACH = 0.5;
const LONE_PAIR_WEIGHT = 0.3;
const ANTI_THRESHOLD = (150 * Math.PI) / 180;
const GRID_STEP = Math.PI / 12;

interface Candidate {
  readonly rotation: Rotation;
  readonly keys: readonly number[];
}

/** The child's rotation, given its parent's placement and the child's position. */
export function chooseChildRotation(state: PlacementState, parent: number, child: number): Rotation {
  const childPosition = state.positions[child]!;
  const parentPosition = state.positions[parent]!;
  const parentRotation = state.rotations[parent]!;
  const childSites = state.sites[child];
  const backSite = childSites.ligands.find((ligand) => ligand.atom === parent)!;
  const axis = normalize(sub(childPosition, parentPosition));
  // The smallest turn that points the back site at the parent keeps the rest of the frame predictable.
  const aligned = rotationAligning(backSite.direction, scale(axis, -1));

  const parentSites = state.sites[parent];
  const parentOthers = [
    ...parentSites.ligands.filter((l) => l.atom !== child).map((l) => rotate(parentRotation, l.direction)),
    ...parentSites.loneDomains.map((d) => rotate(parentRotation, d.direction)),
  ];
  const childOthers = [
    ...childSites.ligands.filter((l) => l.atom !== parent).map((l) => rotate(aligned, l.direction)),
    ...childSites.loneDomains.map((d) => rotate(aligned, d.direction)),
  ];
  const perpendicular = (v: Vec3) => sub(v, scale(axis, dot(v, axis)));
  const childReference = childOthers.map(perpendicular).find((v) => norm(v) > 1e-6);
  if (!childReference) return aligned; // nothing off the bond axis: the turn changes nothing
  const parentReference = parentOthers.map(perpendicular).find((v) => norm(v) > 1e-6) ?? perpendicularTo(axis);
  const eclipsed = signedAngleAbout(axis, childReference, parentReference);

  const bothTetrahedral = parentSites.tetrahedral && childSites.tetrahedral;
  const offsets = bothTetrahedral
    ? [Math.PI / 3, Math.PI, (5 * Math.PI) / 3]
    : keepsPlane(parentSites, childSites)
      ? [0, Math.PI]
      : Array.from({ length: 24 }, (_, k) => k * GRID_STEP);
  const countLoneAnti = bothTetrahedral && parentSites.loneDomains.length > 0 && childSites.loneDomains.length > 0;

  const surroundings = surroundingsOf(state, parent, child);
  let best: Candidate | undefined;
  for (const offset of offsets) {
    const rotation = composeRotations(rotationAboutAxis(axis, eclipsed + offset), aligned);
    const candidate = { rotation, keys: scoreKeys(state, surroundings, parent, child, axis, rotation, countLoneAnti) };
    if (!best || isBetter(candidate.keys, best.keys)) best = candidate;
  }
  return best!.rotation;
}

/**
 * How many torsions about a bond the walk chooses from, evenly spaced round a full turn: three
 * staggered ones between two tetrahedral atoms, two (eclipsed or anti) where the bond keeps its
 * substituents in one plane, every 15° otherwise.
 */
export function torsionChoices(parentSites: AtomSites, childSites: AtomSites): number {
  if (parentSites.tetrahedral && childSites.tetrahedral) return 3;
  return keepsPlane(parentSites, childSites) ? 2 : 24;
}

/**
 * Two trigonal planar atoms, or a trigonal planar atom next to a tetrahedral one with a lone pair
 * (the OH of an acid, an ester oxygen): the lone pair joins the π system, so the bond keeps its
 * substituents in one plane.
 */
function keepsPlane(first: AtomSites, second: AtomSites): boolean {
  const donor = (sites: AtomSites) => sites.tetrahedral && sites.loneDomains.length > 0;
  return (
    (first.trigonalPlanar && second.trigonalPlanar) || (first.trigonalPlanar && donor(second)) || (second.trigonalPlanar && donor(first))
  );
}

/**
 * What the candidates of one torsion are scored against, worked out once for all of them: the
 * atoms placed so far (the child aside) with their lone-pair stand-in points, and which of them
 * are bonded to each of the child's unplaced neighbours.
 */
interface Surroundings {
  /** The child's neighbours other than the parent that are not placed yet. */
  readonly fresh: readonly LocalLigandRef[];
  /** Coordinates of the placed atoms, three numbers each, in index order. */
  readonly atoms: Float64Array;
  /** Per placed atom, per fresh neighbour: 1 when the two are bonded (no repulsion then). */
  readonly bondedToFresh: Uint8Array;
  /** Lone-pair points of the placed atoms with a fixed frame, three numbers each. */
  readonly lonePairs: Float64Array;
  /** Placed atom k owns lone-pair points lonePairStart[k] .. lonePairStart[k + 1] - 1. */
  readonly lonePairStart: Int32Array;
}

interface LocalLigandRef {
  readonly atom: number;
  readonly direction: Vec3;
}

function surroundingsOf(state: PlacementState, parent: number, child: number): Surroundings {
  const fresh = state.sites[child].ligands.filter((ligand) => ligand.atom !== parent && !state.positions[ligand.atom]);
  const placed = state.placedNear(state.positions[child]!, REPULSION_REACH).filter((atom) => atom !== child);
  const atoms = new Float64Array(3 * placed.length);
  const bondedToFresh = new Uint8Array(placed.length * fresh.length);
  const lonePairStart = new Int32Array(placed.length + 1);
  const lonePairPoints: number[] = [];
  placed.forEach((atom, k) => {
    const position = state.positions[atom]!;
    atoms.set(position, 3 * k);
    fresh.forEach((ligand, f) => {
      bondedToFresh[k * fresh.length + f] = state.bonded(atom, ligand.atom) ? 1 : 0;
    });
    lonePairStart[k] = lonePairPoints.length / 3;
    const rotation = state.rotations[atom];
    if (rotation) {
      for (const domain of state.sites[atom].loneDomains) {
        lonePairPoints.push(...add(position, scale(rotate(rotation, domain.direction), LONE_PAIR_REACH)));
      }
    }
  });
  lonePairStart[placed.length] = lonePairPoints.length / 3;
  return { fresh, atoms, bondedToFresh, lonePairs: Float64Array.from(lonePairPoints), lonePairStart };
}

function scoreKeys(
  state: PlacementState,
  surroundings: Surroundings,
  parent: number,
  child: number,
  axis: Vec3,
  rotation: Rotation,
  countLoneAnti: boolean,
): number[] {
  const childPosition = state.positions[child]!;
  const childSites = state.sites[child];
  let closure = 0;
  const newAtoms: { atom: number; position: Vec3 }[] = [];
  for (const ligand of childSites.ligands) {
    if (ligand.atom === parent) continue;
    const position = add(childPosition, scale(rotate(rotation, ligand.direction), state.bondLength(child, ligand.atom)));
    const placed = state.positions[ligand.atom];
    if (placed) closure += distance(position, placed) ** 2;
    else newAtoms.push({ atom: ligand.atom, position });
  }
  for (const fresh of newAtoms) closure += oneAheadClosure(state, child, fresh.atom, fresh.position);
  const newLonePairs = childSites.loneDomains.map((d) => add(childPosition, scale(rotate(rotation, d.direction), LONE_PAIR_REACH)));

  // Summed in the same order as atom by atom: each placed atom against the new atoms, the new
  // lone pairs, then its own lone pairs against the new atoms.
  const { atoms, bondedToFresh, lonePairs, lonePairStart } = surroundings;
  const freshCount = newAtoms.length;
  const placedCount = atoms.length / 3;
  let repulsion = 0;
  for (let k = 0; k < placedCount; k++) {
    const x = atoms[3 * k];
    const y = atoms[3 * k + 1];
    const z = atoms[3 * k + 2];
    for (let f = 0; f < freshCount; f++) {
      if (bondedToFresh[k * freshCount + f] === 0) repulsion += pushAt(x, y, z, newAtoms[f].position);
    }
    for (const pair of newLonePairs) repulsion += LONE_PAIR_WEIGHT * pushAt(x, y, z, pair);
    for (let p = lonePairStart[k]; p < lonePairStart[k + 1]; p++) {
      for (let f = 0; f < freshCount; f++) {
        repulsion += LONE_PAIR_WEIGHT * pushAt(lonePairs[3 * p], lonePairs[3 * p + 1], lonePairs[3 * p + 2], newAtoms[f].position);
      }
    }
  }

  return [
    quantize(closure, 1e-3),
    quantize(ringTwist(state, parent, child, axis, rotation), 1e-3),
    countLoneAnti ? loneAntiCount(state, parent, child, axis, rotation) : 0,
    repulsion,
  ];
}

/**
 * Looks one bond ahead: where a new atom and an atom already placed share a neighbour not yet
 * placed, their distance should be the one the ideal angle at that neighbour gives. This is what
 * makes a six-membered ring of tetrahedral atoms close as a chair.
 */
function oneAheadClosure(state: PlacementState, child: number, atom: number, position: Vec3): number {
  let error = 0;
  for (const shared of state.sites[atom].ligands) {
    if (shared.atom === child || state.positions[shared.atom]) continue;
    const sharedSites = state.sites[shared.atom];
    for (const other of sharedSites.ligands) {
      const placed = state.positions[other.atom];
      if (other.atom === atom || other.atom === child || !placed) continue;
      const toAtom = sharedSites.ligands.find((l) => l.atom === atom)!.direction;
      const cosine = dot(toAtom, other.direction);
      const a = state.bondLength(shared.atom, atom);
      const b = state.bondLength(shared.atom, other.atom);
      const target = Math.sqrt(Math.max(0, a * a + b * b - 2 * a * b * cosine));
      error += (distance(position, placed) - target) ** 2;
    }
  }
  return error;
}

/** Soft repulsion between two points that are not bonded: 1 / distance⁴, capped at 0.1 Å. */
function pushAt(x: number, y: number, z: number, point: Vec3): number {
  const dx = x - point[0];
  const dy = y - point[1];
  const dz = z - point[2];
  const squared = Math.max(dx * dx + dy * dy + dz * dz, 0.01);
  return 1 / (squared * squared);
}

function quantize(value: number, step: number): number {
  return Math.round(value / step);
}

/** |dihedral| between the parent's previous ring atom and the child's next one; 0 off rings. */
function ringTwist(state: PlacementState, parent: number, child: number, axis: Vec3, rotation: Rotation): number {
  const ring = state.ringNeighbours(parent, child);
  if (!ring) return 0;
  const parentSite = state.sites[parent].ligands.find((l) => l.atom === ring.beforeParent);
  const childSite = state.sites[child].ligands.find((l) => l.atom === ring.afterChild);
  if (!parentSite || !childSite) return 0;
  const before = rotate(state.rotations[parent]!, parentSite.direction);
  const after = rotate(rotation, childSite.direction);
  const perpendicular = (v: Vec3) => sub(v, scale(axis, dot(v, axis)));
  const p = perpendicular(before);
  const c = perpendicular(after);
  if (norm(p) < 1e-6 || norm(c) < 1e-6) return 0;
  return Math.abs(signedAngleAbout(axis, p, c));
}

/** Lone pairs of the parent anti-periplanar to lone pairs of the child. */
function loneAntiCount(state: PlacementState, parent: number, child: number, axis: Vec3, rotation: Rotation): number {
  const perpendicular = (v: Vec3) => sub(v, scale(axis, dot(v, axis)));
  const parentPairs = state.sites[parent].loneDomains.map((d) => perpendicular(rotate(state.rotations[parent]!, d.direction)));
  const childPairs = state.sites[child].loneDomains.map((d) => perpendicular(rotate(rotation, d.direction)));
  let count = 0;
  for (const p of parentPairs) {
    for (const c of childPairs) {
      if (Math.abs(signedAngleAbout(axis, p, c)) > ANTI_THRESHOLD) count++;
    }
  }
  return count;
}

/** Lexicographic comparison; the last key (repulsion) counts as tied within a relative 1e-9. */
function isBetter(candidate: readonly number[], best: readonly number[]): boolean {
  const last = candidate.length - 1;
  for (let k = 0; k < last; k++) {
    if (candidate[k] !== best[k]) return candidate[k] < best[k];
  }
  return candidate[last] < best[last] * (1 - 1e-9) - 1e-12;
}
