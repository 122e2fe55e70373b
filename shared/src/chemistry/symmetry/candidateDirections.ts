/**
 * Directions that could be rotation axes or mirror-plane normals of a centred molecule. Every
 * true symmetry element is among them (see the reasoning by each source); most candidates are
 * not, and the search tests each one against the coordinates.
 */
import { add, cross, distance, norm, scale, sub, type Vec3 } from "../geometry/vectors";
import type { CentredMolecule } from "./centredMolecule";

/** A unit direction, with the length of the vector it came from: longer means better defined. */
export interface CandidateDirection {
  readonly direction: Vec3;
  readonly strength: number;
}

// A fixed, irrational-looking reference so that u and -u get one canonical sign.
const SIGN_REFERENCE: Vec3 = [0.2672612, 0.5345225, 0.8017837];

/** Collects directions, keeping one per direction (the best defined) and dropping the ill-defined. */
function directionCollector(minimumStrength: number) {
  const best = new Map<string, CandidateDirection>();
  return {
    add(vector: Vec3, strengthOverride?: number): void {
      const length = norm(vector);
      const strength = strengthOverride ?? length;
      // A vector shorter than the tolerance points nowhere in particular.
      if (!(length > (strengthOverride === undefined ? minimumStrength : 0))) return;
      let direction = scale(vector, 1 / length);
      const side = direction[0] * SIGN_REFERENCE[0] + direction[1] * SIGN_REFERENCE[1] + direction[2] * SIGN_REFERENCE[2];
      if (side < 0) direction = scale(direction, -1);
      // Near-equal directions share a key; ones that straddle a cell edge are just tested twice.
      const key = direction.map((value) => Math.round(value * 200)).join(",");
      const known = best.get(key);
      if (!known || known.strength < strength) best.set(key, { direction, strength });
    },
    /** Best-defined first, so a well-placed candidate claims an axis before a blurry copy of it. */
    list(): CandidateDirection[] {
      return [...best.values()].sort((a, b) => b.strength - a.strength);
    },
  };
}

/**
 * Candidate rotation axes:
 * - the principal axes of inertia (for a planar molecule the plane normal is one, and a C2 along
 *   it may pass through no atom and no midpoint);
 * - the direction of every atom off the centre (an axis through that atom);
 * - the midpoint of every pair of look-alike atoms (a C2 that swaps the pair passes through it);
 * - the normal of triangles of look-alike atoms with two equal sides, from the smallest group of
 *   three or more (any Cn with n ≥ 3 turns an off-axis atom of that group through a regular
 *   polygon that lies in such a plane).
 */
export function candidateAxes(molecule: CentredMolecule, tolerance: number): CandidateDirection[] {
  const collector = directionCollector(tolerance);
  addPrincipalAxes(molecule, collector, tolerance);
  for (const atom of molecule.atoms) collector.add(atom.position);
  forEachLookAlikePair(molecule, (a, b) => collector.add(scale(add(a, b), 0.5)));

  const offCentre = molecule.lookAlikeGroups
    .map((group) => group.filter((index) => norm(molecule.atoms[index].position) > tolerance))
    .filter((group) => group.length >= 3)
    .sort((a, b) => a.length - b.length);
  const smallest = offCentre[0] ?? [];
  const positions = smallest.map((index) => molecule.atoms[index].position);
  const sides = positions.map((from) => positions.map((to) => distance(from, to)));
  for (let apex = 0; apex < positions.length; apex++) {
    const fromApex = sides[apex];
    for (let first = 0; first < positions.length; first++) {
      if (first === apex) continue;
      for (let second = first + 1; second < positions.length; second++) {
        if (second === apex || Math.abs(fromApex[second] - fromApex[first]) > 2 * tolerance) continue;
        const normal = cross(sub(positions[first], positions[apex]), sub(positions[second], positions[apex]));
        // Scaled by 1/side so that the strength is a length, comparable with the other sources.
        collector.add(scale(normal, 1 / Math.max(fromApex[first], tolerance)));
      }
    }
  }
  return collector.list();
}

/**
 * Candidate mirror-plane normals: the principal axes of inertia (the plane of a planar molecule
 * fixes every atom) and the difference of every pair of look-alike atoms (a mirror that swaps
 * two atoms is the plane bisecting them).
 */
export function candidateMirrorNormals(molecule: CentredMolecule, tolerance: number): CandidateDirection[] {
  const collector = directionCollector(tolerance);
  addPrincipalAxes(molecule, collector, tolerance);
  forEachLookAlikePair(molecule, (a, b) => collector.add(sub(a, b)));
  return collector.list();
}

/**
 * Principal axes rank last: where two moments are equal the axes in that plane are arbitrary,
 * and an arbitrary one must not displace a well-defined candidate pointing almost the same way.
 */
function addPrincipalAxes(molecule: CentredMolecule, collector: ReturnType<typeof directionCollector>, tolerance: number): void {
  for (const axis of molecule.principalAxes) collector.add(axis, tolerance * (1 + 1e-9));
}

function forEachLookAlikePair(molecule: CentredMolecule, visit: (a: Vec3, b: Vec3) => void): void {
  for (const group of molecule.lookAlikeGroups) {
    for (let i = 0; i < group.length; i++) {
      for (let j = i + 1; j < group.length; j++) {
        visit(molecule.atoms[group[i]].position, molecule.atoms[group[j]].position);
      }
    }
  }
}
