/**
 * Closes the rings the walk left open. A walk sets every bond and angle from its parent side, so
 * the last bond of a ring is usually too long or too short. This spreads that strain: it
 * minimises a small spring model (bond lengths; 1,3 distances that encode the ideal angles of
 * each atom's sites; a push apart for non-bonded atoms that come too close) from the walk's
 * placement. Benzene-like rings and chairs already close exactly and come back unchanged; rings
 * whose angles cannot all be met (cyclopentane, bicyclo[1.1.1]pentane) end with the strain
 * shared round the ring.
 */
import type { AtomSites } from "./atomSites";
import { angleDegrees, type Vec3 } from "./vectors";

/** One bond or angle distance the model wants: atoms, target length in ångströms, stiffness. */
interface Spring {
  readonly first: number;
  readonly second: number;
  readonly length: number;
  readonly weight: number;
}

export interface SpringModelInput {
  readonly sites: readonly AtomSites[];
  readonly bondLength: (first: number, second: number) => number;
  /** Closest two non-bonded atoms should come, in ångströms. */
  readonly contactDistance: (first: number, second: number) => number;
}

const BOND_WEIGHT = 1;
const ANGLE_WEIGHT = 0.5;
const CONTACT_WEIGHT = 0.5;
/** Work budget: iterations × springs stays below this, so large molecules stay quick. */
const WORK_BUDGET = 2e7;
const MAX_ITERATIONS = 2000;
/** Steps remembered by the quasi-Newton update. */
const HISTORY = 8;
/** Converged when no coordinate feels a force above this (Å² per Å): atoms then sit within about
 * 1e-6 Å of the minimum, far below what shows in a model or in the symmetry search. */
const GRADIENT_TOLERANCE = 1e-7;

export interface RelaxResult {
  readonly positions: Vec3[];
  /** Strain left in the spring model, in Å²: 0 when every bond and angle is ideal. */
  readonly strain: number;
}

/** The spring model of one molecule, built once and used on several starting placements. */
export interface SpringModel {
  /** Strain of a placement in Å²: 0 when every bond and angle is ideal. */
  strain(positions: readonly Vec3[]): number;
  /** Strain of the contacts alone, in Å²: 0 when no two non-bonded atoms come too close. */
  overlap(positions: readonly Vec3[]): number;
  /**
   * Positions after relaxation from `positions`; the input when nothing needs to move. A budget
   * stops early, for a quick repair where exact convergence is not needed.
   */
  relax(positions: readonly Vec3[], budget?: RelaxBudget): RelaxResult;
}

/** Limits of one relaxation. */
export interface RelaxBudget {
  readonly maxIterations: number;
  /** Stop once no coordinate feels a force above this (Å² per Å). */
  readonly gradientTolerance: number;
}

/**
 * The spring model of a molecule. The minimiser is a limited-
 * memory quasi-Newton method (L-BFGS) with a backtracking line search: it converges to a tight
 * force tolerance in a few hundred steps, where plain gradient descent crawls along the soft
 * directions of a cage and stops short of its symmetric shape. Every step is a linear
 * combination of forces, so a start that is symmetric stays exactly symmetric.
 */
export function springModel(input: SpringModelInput): SpringModel {
  const springs = packSprings(input);
  const iterations = Math.min(MAX_ITERATIONS, Math.floor(WORK_BUDGET / Math.max(1, springs.count)));
  return {
    strain: (start) => energyAndGradient(springs, Float64Array.from(start.flat()), new Float64Array(3 * start.length)),
    overlap(start) {
      const positions = Float64Array.from(start.flat());
      refreshContacts(springs, positions);
      let overlap = 0;
      const near = springs.contacts.near;
      const scratch = new Float64Array(positions.length);
      for (let n = 0; n < springs.contacts.nearCount; n++) overlap += addSpring(springs, near[n], positions, scratch, true);
      return overlap;
    },
    relax(start, budget) {
      const positions = Float64Array.from(start.flat());
      const strain = budget
        ? minimise(springs, positions, Math.min(iterations, budget.maxIterations), budget.gradientTolerance)
        : minimise(springs, positions, iterations, GRADIENT_TOLERANCE);
      const result: Vec3[] = start.map((_, atom) => [positions[3 * atom], positions[3 * atom + 1], positions[3 * atom + 2]]);
      return { positions: result, strain };
    },
  };
}

/** Minimises the spring energy in place; returns the energy reached. */
function minimise(springs: PackedSprings, positions: Float64Array, iterations: number, tolerance: number): number {
  const size = positions.length;
  const gradient = new Float64Array(size);
  const nextGradient = new Float64Array(size);
  const direction = new Float64Array(size);
  const trial = new Float64Array(size);
  const steps: Float64Array[] = [];
  const changes: Float64Array[] = [];
  const curvatures: number[] = [];
  const alphas = new Float64Array(HISTORY);
  let energy = energyAndGradient(springs, positions, gradient);
  for (let k = 0; k < iterations && energy > 1e-14; k++) {
    if (largest(gradient) < tolerance) break;
    searchDirection(gradient, steps, changes, curvatures, alphas, direction);
    let slope = dotOf(direction, gradient);
    if (!(slope < 0)) {
      // The remembered curvature misleads here: forget it and go downhill.
      steps.length = changes.length = curvatures.length = 0;
      for (let i = 0; i < size; i++) direction[i] = -gradient[i];
      slope = -dotOf(gradient, gradient);
    }
    // Never move an atom more than a few tenths of an ångström in one step.
    let length = Math.min(1, 0.3 / Math.max(1e-12, largest(direction)));
    let trialEnergy = Infinity;
    for (let tries = 0; tries < 40; tries++) {
      for (let i = 0; i < size; i++) trial[i] = positions[i] + length * direction[i];
      trialEnergy = energyAndGradient(springs, trial, nextGradient);
      if (trialEnergy <= energy + 1e-4 * length * slope) break;
      length /= 2;
    }
    if (!(trialEnergy < energy)) break; // no step lowers the strain any more: converged to rounding
    const step = new Float64Array(size);
    const change = new Float64Array(size);
    for (let i = 0; i < size; i++) {
      step[i] = trial[i] - positions[i];
      change[i] = nextGradient[i] - gradient[i];
    }
    const curvature = dotOf(step, change);
    if (curvature > 1e-16) {
      if (steps.length === HISTORY) {
        steps.shift();
        changes.shift();
        curvatures.shift();
      }
      steps.push(step);
      changes.push(change);
      curvatures.push(curvature);
    }
    positions.set(trial);
    gradient.set(nextGradient);
    energy = trialEnergy;
  }
  return energy;
}

/** The L-BFGS two-loop recursion: an approximate Newton step -H·g from the remembered steps. */
function searchDirection(
  gradient: Float64Array,
  steps: readonly Float64Array[],
  changes: readonly Float64Array[],
  curvatures: readonly number[],
  alphas: Float64Array,
  direction: Float64Array,
): void {
  for (let i = 0; i < gradient.length; i++) direction[i] = -gradient[i];
  for (let m = steps.length - 1; m >= 0; m--) {
    alphas[m] = dotOf(steps[m], direction) / curvatures[m];
    axpy(-alphas[m], changes[m], direction);
  }
  if (steps.length > 0) {
    const last = steps.length - 1;
    const gamma = curvatures[last] / dotOf(changes[last], changes[last]);
    for (let i = 0; i < direction.length; i++) direction[i] *= gamma;
  } else {
    // First step: a small plain descent step, scaled to the force.
    const scaleBy = 0.1 / Math.max(1e-12, largest(gradient));
    for (let i = 0; i < direction.length; i++) direction[i] *= Math.min(1, scaleBy);
  }
  for (let m = 0; m < steps.length; m++) {
    const beta = dotOf(changes[m], direction) / curvatures[m];
    axpy(alphas[m] - beta, steps[m], direction);
  }
}

function dotOf(a: Float64Array, b: Float64Array): number {
  let sum = 0;
  for (let i = 0; i < a.length; i++) sum += a[i] * b[i];
  return sum;
}

/** target += factor · source */
function axpy(factor: number, source: Float64Array, target: Float64Array): void {
  for (let i = 0; i < target.length; i++) target[i] += factor * source[i];
}

function largest(values: Float64Array): number {
  let max = 0;
  for (let i = 0; i < values.length; i++) max = Math.max(max, Math.abs(values[i]));
  return max;
}

/**
 * Springs in flat typed arrays: the inner loops run thousands of times. Bonds and angles always
 * pull or push; contacts only push, and only between atoms closer than the contact distance, so
 * each evaluation visits just the contacts on a neighbour list (pairs within the contact distance
 * plus {@link CONTACT_SKIN}), rebuilt whenever some atom has moved half the skin since the last
 * build. A contact left off the list is then surely out of reach and would add nothing, so the
 * energy and gradient are exactly those of the full model, summed in the same order.
 */
interface PackedSprings {
  /** Every spring of the model, contacts included (the work budget counts them all). */
  readonly count: number;
  /** Bonds and angles, then contacts. */
  readonly fixedCount: number;
  readonly first: Int32Array;
  readonly second: Int32Array;
  readonly length: Float64Array;
  readonly weight: Float64Array;
  readonly contacts: ContactList;
}

/** The contact springs with the neighbour list over them. */
interface ContactList {
  /** Indices into the packed springs of the contacts that may be in reach, in spring order. */
  readonly near: Int32Array;
  nearCount: number;
  /** Positions at the last build; NaN before the first. */
  readonly builtAt: Float64Array;
}

/** Extra reach (Å) of the contact neighbour list beyond each contact distance. */
const CONTACT_SKIN = 1;
/** Rebuild the list once an atom has moved this far (Å); a little under half the skin. */
const REBUILD_DISPLACEMENT = CONTACT_SKIN / 2 - 1e-6;

function packSprings(input: SpringModelInput): PackedSprings {
  const atomCount = input.sites.length;
  const { fixed, near } = bondAndAngleSprings(input);
  // Every pair that is neither bonded nor 1,3 gets a contact spring, in pair order.
  const contactCount = (atomCount * (atomCount - 1)) / 2 - near.size;
  const count = fixed.length + contactCount;
  const first = new Int32Array(count);
  const second = new Int32Array(count);
  const length = new Float64Array(count);
  const weight = new Float64Array(count);
  fixed.forEach((spring, k) => {
    first[k] = 3 * spring.first;
    second[k] = 3 * spring.second;
    length[k] = spring.length;
    weight[k] = spring.weight;
  });
  let k = fixed.length;
  for (let a = 0; a < atomCount; a++) {
    for (let b = a + 1; b < atomCount; b++) {
      if (near.has(a * atomCount + b)) continue;
      first[k] = 3 * a;
      second[k] = 3 * b;
      length[k] = input.contactDistance(a, b);
      weight[k] = CONTACT_WEIGHT;
      k++;
    }
  }
  const builtAt = new Float64Array(3 * atomCount).fill(Number.NaN);
  return {
    count,
    fixedCount: fixed.length,
    first,
    second,
    length,
    weight,
    contacts: { near: new Int32Array(contactCount), nearCount: 0, builtAt },
  };
}

/** Makes sure the contact neighbour list holds every contact that can be in reach at `positions`. */
function refreshContacts(springs: PackedSprings, positions: Float64Array): void {
  const contacts = springs.contacts;
  const builtAt = contacts.builtAt;
  const limit = REBUILD_DISPLACEMENT * REBUILD_DISPLACEMENT;
  let fresh = true;
  for (let i = 0; i < positions.length; i += 3) {
    const dx = positions[i] - builtAt[i];
    const dy = positions[i + 1] - builtAt[i + 1];
    const dz = positions[i + 2] - builtAt[i + 2];
    // NaN (never built) fails this test too.
    if (!(dx * dx + dy * dy + dz * dz <= limit)) {
      fresh = false;
      break;
    }
  }
  if (fresh) return;
  builtAt.set(positions);
  let count = 0;
  for (let k = springs.fixedCount; k < springs.count; k++) {
    const a = springs.first[k];
    const b = springs.second[k];
    const dx = positions[a] - positions[b];
    const dy = positions[a + 1] - positions[b + 1];
    const dz = positions[a + 2] - positions[b + 2];
    const reach = springs.length[k] + CONTACT_SKIN;
    if (dx * dx + dy * dy + dz * dz < reach * reach) contacts.near[count++] = k;
  }
  contacts.nearCount = count;
}

/** Bond and angle springs, and the pairs they join (as `lower * atomCount + higher`). */
function bondAndAngleSprings(input: SpringModelInput): { fixed: Spring[]; near: Set<number> } {
  const atomCount = input.sites.length;
  const fixed: Spring[] = [];
  const near = new Set<number>();
  const key = (a: number, b: number) => (a < b ? a * atomCount + b : b * atomCount + a);
  input.sites.forEach((site, atom) => {
    for (const ligand of site.ligands) {
      near.add(key(atom, ligand.atom));
      if (atom < ligand.atom) {
        fixed.push({ first: atom, second: ligand.atom, length: input.bondLength(atom, ligand.atom), weight: BOND_WEIGHT });
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
        fixed.push({ first: a.atom, second: b.atom, length, weight: ANGLE_WEIGHT });
      }
    });
  });
  return { fixed, near };
}

/** Energy of the springs, with its gradient written into `gradient`. */
function energyAndGradient(springs: PackedSprings, positions: Float64Array, gradient: Float64Array): number {
  gradient.fill(0);
  refreshContacts(springs, positions);
  let energy = 0;
  for (let k = 0; k < springs.fixedCount; k++) energy += addSpring(springs, k, positions, gradient, false);
  const near = springs.contacts.near;
  for (let n = 0; n < springs.contacts.nearCount; n++) energy += addSpring(springs, near[n], positions, gradient, true);
  return energy;
}

/** Adds one spring's pull to `gradient` and returns its energy. */
function addSpring(springs: PackedSprings, k: number, positions: Float64Array, gradient: Float64Array, pushOnly: boolean): number {
  const a = springs.first[k];
  const b = springs.second[k];
  const dx = positions[a] - positions[b];
  const dy = positions[a + 1] - positions[b + 1];
  const dz = positions[a + 2] - positions[b + 2];
  const length = Math.max(1e-9, Math.sqrt(dx * dx + dy * dy + dz * dz));
  const stretch = length - springs.length[k];
  if (pushOnly && stretch >= 0) return 0;
  const energy = springs.weight[k] * stretch * stretch;
  const factor = (2 * springs.weight[k] * stretch) / length;
  gradient[a] += factor * dx;
  gradient[a + 1] += factor * dy;
  gradient[a + 2] += factor * dz;
  gradient[b] -= factor * dx;
  gradient[b + 1] -= factor * dy;
  gradient[b + 2] -= factor * dz;
  return energy;
}
