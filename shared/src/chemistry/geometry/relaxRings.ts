/**
 * Closes the rings the walk left open. A walk sets every bond and angle from its parent side, so
 * the last bond of a ring is usually too long or too short. This spreads that strain: it
 * minimises a small spring model (bond lengths; 1,3 distances that encode the ideal VSEPR angles;
 * a push apart for non-bonded atoms that come too close) by gradient descent from the walk's
 * placement. Benzene-like rings already close exactly and come back unchanged; saturated rings
 * whose ideal angles cannot all be met (cyclopropane, cyclobutane, chairs built from 109.47°
 * torsion choices) end with angles a few degrees off ideal, shared round the ring.
 */
import type { AtomSites } from "./atomSites";
import { angleDegrees, type Vec3 } from "./vectors";

/** One distance the model wants: atoms, target length in ångströms, stiffness. */
interface Spring {
  readonly first: number;
  readonly second: number;
  readonly length: number;
  readonly weight: number;
  /** Push only: counts only while the atoms are closer than `length`. */
  readonly repulsiveOnly: boolean;
}

export interface RelaxInput {
  readonly sites: readonly AtomSites[];
  readonly positions: readonly Vec3[];
  readonly bondLength: (first: number, second: number) => number;
  /** Closest two non-bonded atoms should come, in ångströms. */
  readonly contactDistance: (first: number, second: number) => number;
}

const BOND_WEIGHT = 1;
const ANGLE_WEIGHT = 0.5;
const CONTACT_WEIGHT = 0.5;
/** Work budget: iterations × springs stays below this, so large molecules stay quick. */
const WORK_BUDGET = 2e7;
const MAX_ITERATIONS = 5000;

export interface RelaxResult {
  readonly positions: Vec3[];
  /** Strain left in the spring model, in Å²: 0 when every bond and angle is ideal. */
  readonly strain: number;
}

/** Positions after relaxation; the input when nothing needs to move. */
export function relaxRings(input: RelaxInput): RelaxResult {
  const springs = packSprings(springsOf(input));
  let positions = Float64Array.from(input.positions.flat());
  let energy = energyOf(springs, positions);
  let step = 0.02;
  const gradient = new Float64Array(positions.length);
  let trial = new Float64Array(positions.length);
  const iterations = Math.min(MAX_ITERATIONS, Math.floor(WORK_BUDGET / Math.max(1, springs.count)));
  for (let k = 0; k < iterations && energy > 1e-14; k++) {
    gradientOf(springs, positions, gradient);
    for (let i = 0; i < positions.length; i++) trial[i] = positions[i] - step * gradient[i];
    const trialEnergy = energyOf(springs, trial);
    if (trialEnergy < energy) {
      // Converged once a step gains next to nothing relative to the strain left.
      if (energy - trialEnergy < 1e-13 + 1e-10 * energy) break;
      const previous = positions;
      positions = trial;
      trial = previous;
      energy = trialEnergy;
      step *= 1.2;
    } else {
      step /= 2;
      if (step < 1e-12) break;
    }
  }
  const result: Vec3[] = input.positions.map((_, atom) => [positions[3 * atom], positions[3 * atom + 1], positions[3 * atom + 2]]);
  return { positions: result, strain: energy };
}

/** Springs in flat typed arrays: the inner loops run thousands of times. */
interface PackedSprings {
  readonly count: number;
  readonly first: Int32Array;
  readonly second: Int32Array;
  readonly length: Float64Array;
  readonly weight: Float64Array;
  readonly repulsiveOnly: Uint8Array;
}

function packSprings(springs: readonly Spring[]): PackedSprings {
  return {
    count: springs.length,
    first: Int32Array.from(springs, (s) => 3 * s.first),
    second: Int32Array.from(springs, (s) => 3 * s.second),
    length: Float64Array.from(springs, (s) => s.length),
    weight: Float64Array.from(springs, (s) => s.weight),
    repulsiveOnly: Uint8Array.from(springs, (s) => (s.repulsiveOnly ? 1 : 0)),
  };
}

function springsOf(input: RelaxInput): Spring[] {
  const springs: Spring[] = [];
  const near = new Set<string>();
  const key = (a: number, b: number) => (a < b ? `${a}-${b}` : `${b}-${a}`);
  input.sites.forEach((site, atom) => {
    for (const ligand of site.ligands) {
      near.add(key(atom, ligand.atom));
      if (atom < ligand.atom) {
        springs.push({ first: atom, second: ligand.atom, length: input.bondLength(atom, ligand.atom), weight: BOND_WEIGHT, repulsiveOnly: false });
      }
    }
  });
  const bondedPairs = new Set(near);
  input.sites.forEach((site, centre) => {
    site.ligands.forEach((a, i) => {
      for (const b of site.ligands.slice(i + 1)) {
        // In a three-membered ring the two neighbours are bonded: their bond length rules.
        if (bondedPairs.has(key(a.atom, b.atom))) continue;
        near.add(key(a.atom, b.atom));
        const la = input.bondLength(centre, a.atom);
        const lb = input.bondLength(centre, b.atom);
        const cosine = Math.cos((angleDegrees(a.direction, b.direction) * Math.PI) / 180);
        const length = Math.sqrt(Math.max(0, la * la + lb * lb - 2 * la * lb * cosine));
        springs.push({ first: a.atom, second: b.atom, length, weight: ANGLE_WEIGHT, repulsiveOnly: false });
      }
    });
  });
  for (let a = 0; a < input.sites.length; a++) {
    for (let b = a + 1; b < input.sites.length; b++) {
      if (near.has(key(a, b))) continue;
      springs.push({ first: a, second: b, length: input.contactDistance(a, b), weight: CONTACT_WEIGHT, repulsiveOnly: true });
    }
  }
  return springs;
}

function energyOf(springs: PackedSprings, positions: Float64Array): number {
  let energy = 0;
  for (let k = 0; k < springs.count; k++) {
    const a = springs.first[k];
    const b = springs.second[k];
    const dx = positions[a] - positions[b];
    const dy = positions[a + 1] - positions[b + 1];
    const dz = positions[a + 2] - positions[b + 2];
    const stretch = Math.sqrt(dx * dx + dy * dy + dz * dz) - springs.length[k];
    if (springs.repulsiveOnly[k] && stretch >= 0) continue;
    energy += springs.weight[k] * stretch * stretch;
  }
  return energy;
}

function gradientOf(springs: PackedSprings, positions: Float64Array, gradient: Float64Array): void {
  gradient.fill(0);
  for (let k = 0; k < springs.count; k++) {
    const a = springs.first[k];
    const b = springs.second[k];
    const dx = positions[a] - positions[b];
    const dy = positions[a + 1] - positions[b + 1];
    const dz = positions[a + 2] - positions[b + 2];
    const length = Math.max(1e-9, Math.sqrt(dx * dx + dy * dy + dz * dz));
    const stretch = length - springs.length[k];
    if (springs.repulsiveOnly[k] && stretch >= 0) continue;
    const factor = (2 * springs.weight[k] * stretch) / length;
    gradient[a] += factor * dx;
    gradient[a + 1] += factor * dy;
    gradient[a + 2] += factor * dz;
    gradient[b] -= factor * dx;
    gradient[b + 1] -= factor * dy;
    gradient[b + 2] -= factor * dz;
  }
}
