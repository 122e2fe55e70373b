/**
 * Site directions for atoms in three- and four-membered rings. VSEPR's ideal angles (109.5° or
 * 120°) cannot hold inside such a ring, and asking for them anyway leaves the ring's spring model
 * frustrated: cubane, prismane or tetrahedrane then relax into a lopsided shape of lower
 * symmetry, with the strain dumped unevenly on a few bonds. Here the two bonds of a ring of
 * three atoms are given 60° and those of a ring of four 90° (the angles of the regular polygon),
 * and the atom's other bonds and lone pairs are spread as far from those and from each other as
 * they can go. The targets are then consistent, so a cage can reach its symmetric shape with
 * every target met (cubane: 90° inside the cube, 125.3° to each hydrogen).
 */
import type { AtomSites } from "./atomSites";
import type { Vec3 } from "./vectors";

/** Penalty weight of a ring angle against the spreading of the other sites. */
const RING_ANGLE_WEIGHT = 20;
const STEP = 0.01;
const MAX_STEP = 0.05;
const MAX_ITERATIONS = 2000;
const MAX_ROUNDS = 30;
/** Converged when no direction feels a tangential force above this. */
const FORCE_TOLERANCE = 1e-8;
/** Ring cosines are met to this. */
const CONSTRAINT_TOLERANCE = 1e-9;

const COSINE_IN_THREE_RING = Math.cos(Math.PI / 3);
const COSINE_IN_FOUR_RING = 0;

/**
 * The sites of every atom, with new directions for tetrahedral and trigonal planar atoms whose
 * bonds close a three- or four-membered ring; other atoms keep theirs (the same objects).
 */
export function smallRingSites(sites: readonly AtomSites[], adjacency: readonly (readonly number[])[]): AtomSites[] {
  const neighbourSets = adjacency.map((neighbours) => new Set(neighbours));
  // Atoms alike round a ring (the eight of cubane) pose the same problem: solve it once.
  const solved = new Map<string, Vec3[]>();
  return sites.map((site, centre) => {
    if (!(site.tetrahedral || site.trigonalPlanar) || site.ligands.length < 2) return site;
    const targets = ringCosines(site, centre, adjacency, neighbourSets);
    if (targets.size === 0) return site;
    const start = [...site.ligands.map((ligand) => ligand.direction), ...site.loneDomains.map((domain) => domain.direction)];
    const key = `${[...targets].join(";")}|${start.join(";")}`;
    let directions = solved.get(key);
    if (!directions) {
      directions = spreadWithRingAngles(start, targets);
      solved.set(key, directions);
    }
    return {
      ...site,
      ligands: site.ligands.map((ligand, k) => ({ ...ligand, direction: directions[k] })),
      loneDomains: site.loneDomains.map((domain, k) => ({ ...domain, direction: directions[site.ligands.length + k] })),
    };
  });
}

/** Cosine targets keyed by `i * 64 + j` (i < j, ligand positions) for pairs that close a small ring. */
function ringCosines(
  site: AtomSites,
  centre: number,
  adjacency: readonly (readonly number[])[],
  neighbourSets: readonly Set<number>[],
): Map<number, number> {
  const targets = new Map<number, number>();
  site.ligands.forEach((first, i) => {
    for (let j = i + 1; j < site.ligands.length; j++) {
      const second = site.ligands[j].atom;
      if (neighbourSets[first.atom]?.has(second)) targets.set(i * 64 + j, COSINE_IN_THREE_RING);
      else if ((adjacency[first.atom] ?? []).some((shared) => shared !== centre && neighbourSets[shared]?.has(second))) {
        targets.set(i * 64 + j, COSINE_IN_FOUR_RING);
      }
    }
  });
  return targets;
}

/**
 * Unit vectors that meet the ring cosines exactly and otherwise keep apart: minimises
 * Σ (1 + cos)² over the pairs that close no small ring (which alone gives the VSEPR arrangement)
 * subject to the ring cosines, by gradient steps kept on the unit sphere, with the constraints
 * held by an augmented Lagrangian (a penalty plus a multiplier updated between rounds). Exact
 * ring angles matter: 89.3° instead of 90° in every face of cubane would leave its cube
 * frustrated again. Deterministic; a few thousand steps over at most a handful of vectors.
 */
function spreadWithRingAngles(start: readonly Vec3[], targets: ReadonlyMap<number, number>): Vec3[] {
  const count = start.length;
  const vectors = Float64Array.from(start.flat());
  // Per pair (i < j, row by row): the ring cosine, or NaN for a pair that only spreads.
  const pairTargets = new Float64Array(count * count).fill(Number.NaN);
  for (const [key, target] of targets) pairTargets[Math.floor(key / 64) * count + (key % 64)] = target;
  const multipliers = new Float64Array(count * count);
  for (let round = 0; round < MAX_ROUNDS; round++) {
    relaxOnSphere(vectors, count, pairTargets, multipliers);
    let worst = 0;
    for (let i = 0; i < count; i++) {
      for (let j = i + 1; j < count; j++) {
        const target = pairTargets[i * count + j];
        if (Number.isNaN(target)) continue;
        const error = cosineOf(vectors, i, j) - target;
        worst = Math.max(worst, Math.abs(error));
        multipliers[i * count + j] += 2 * RING_ANGLE_WEIGHT * error;
      }
    }
    if (worst < CONSTRAINT_TOLERANCE) break;
  }
  return start.map((_, i) => [vectors[3 * i], vectors[3 * i + 1], vectors[3 * i + 2]] as Vec3);
}

function cosineOf(vectors: Float64Array, i: number, j: number): number {
  return vectors[3 * i] * vectors[3 * j] + vectors[3 * i + 1] * vectors[3 * j + 1] + vectors[3 * i + 2] * vectors[3 * j + 2];
}

/**
 * Gradient steps on the sphere for one round of the augmented Lagrangian, each step kept only if
 * it lowers the energy (else halved), since how stiff the ring terms are depends on how many
 * small rings meet at the atom.
 */
function relaxOnSphere(vectors: Float64Array, count: number, pairTargets: Float64Array, multipliers: Float64Array): void {
  const force = new Float64Array(3 * count);
  const trial = new Float64Array(3 * count);
  const trialForce = new Float64Array(3 * count);
  let energy = energyAndForce(vectors, count, pairTargets, multipliers, force);
  let step = STEP;
  for (let iteration = 0; iteration < MAX_ITERATIONS; iteration++) {
    if (largestOf(force) < FORCE_TOLERANCE) return;
    for (let i = 0; i < count; i++) {
      for (let axis = 0; axis < 3; axis++) trial[3 * i + axis] = vectors[3 * i + axis] + step * force[3 * i + axis];
      normalizeAt(trial, i);
    }
    const trialEnergy = energyAndForce(trial, count, pairTargets, multipliers, trialForce);
    if (trialEnergy <= energy) {
      vectors.set(trial);
      force.set(trialForce);
      energy = trialEnergy;
      step = Math.min(MAX_STEP, step * 1.2);
    } else {
      step /= 2;
      if (step < 1e-9) return; // no lower energy within rounding
    }
  }
}

/** Augmented-Lagrangian energy of the directions, with the tangential force written into `force`. */
function energyAndForce(
  vectors: Float64Array,
  count: number,
  pairTargets: Float64Array,
  multipliers: Float64Array,
  force: Float64Array,
): number {
  force.fill(0);
  let energy = 0;
  for (let i = 0; i < count; i++) {
    for (let j = i + 1; j < count; j++) {
      const cosine = cosineOf(vectors, i, j);
      const target = pairTargets[i * count + j];
      let slope: number;
      if (Number.isNaN(target)) {
        energy += (1 + cosine) ** 2;
        slope = 2 * (1 + cosine);
      } else {
        const error = cosine - target;
        energy += RING_ANGLE_WEIGHT * error * error + multipliers[i * count + j] * error;
        slope = 2 * RING_ANGLE_WEIGHT * error + multipliers[i * count + j];
      }
      // The force on each vector is along the other one.
      for (let axis = 0; axis < 3; axis++) {
        force[3 * i + axis] -= slope * vectors[3 * j + axis];
        force[3 * j + axis] -= slope * vectors[3 * i + axis];
      }
    }
  }
  for (let i = 0; i < count; i++) {
    // Only the part of the force along the sphere moves a unit vector.
    const radial = force[3 * i] * vectors[3 * i] + force[3 * i + 1] * vectors[3 * i + 1] + force[3 * i + 2] * vectors[3 * i + 2];
    for (let axis = 0; axis < 3; axis++) force[3 * i + axis] -= radial * vectors[3 * i + axis];
  }
  return energy;
}

function largestOf(values: Float64Array): number {
  let largest = 0;
  for (const value of values) largest = Math.max(largest, Math.abs(value));
  return largest;
}

function normalizeAt(vectors: Float64Array, i: number): void {
  const length = Math.hypot(vectors[3 * i], vectors[3 * i + 1], vectors[3 * i + 2]);
  for (let axis = 0; axis < 3; axis++) vectors[3 * i + axis] /= length;
}
