/**
 * Closes the rings of a walked placement one ring system at a time. A ring system (rings joined by
 * shared bonds) is cut out with the atoms bonded to it, which keep the angles at its ring atoms
 * honest; that piece is relaxed on its own (`relaxRings`), and only when the walk left one of its
 * rings open or strained. The rest of the molecule hangs off the piece by single bonds that are on
 * no ring, so each branch is then turned and moved as one rigid body to follow the atom it hangs
 * from: the angles and torsions the walk chose along chains stay exactly as they were. A molecule
 * that is one ring system with terminal atoms (benzene, cubane, dioxane) is relaxed as a whole,
 * just as before; a drug-sized molecule relaxes a dozen or two atoms at a time instead of all of
 * them, with no floppy chains to slow the minimiser down.
 */
import type { AtomSites } from "./atomSites";
import { placeByWalk, type WalkInput, type WalkResult } from "./placeByWalk";
import { springModel, type SpringModel } from "./relaxRings";
import { torsionChoices } from "./chooseTorsion";
import { composeRotations, rotate, rotationAboutAxis, rotationAligning, rotationFromTwoDirections, type Rotation } from "./rotation";
import { add, normalize, sub, type Vec3 } from "./vectors";

export interface RingSystemsInput extends WalkInput {
  /** Closest two non-bonded atoms should come, in ångströms. */
  readonly contactDistance: (first: number, second: number) => number;
  /** Every bond on a ring, as its two atoms. */
  readonly ringBonds: readonly (readonly [number, number])[];
}

export interface RingSystemsResult {
  readonly positions: readonly Vec3[];
  readonly rotations: readonly Rotation[];
}

/** Strain (Å²) below which a relaxed ring system is kept without trying other starts. */
const ACCEPTED_STRAIN = 0.05;
/** Strain (Å²) of a placement whose bonds and angles are all ideal, up to rounding. */
const EXACT_STRAIN = 1e-12;
/** Further walks tried when the first does not close its rings exactly. */
const MAX_WALK_STARTS = 6;
/** Most starts relaxed, least strained first. */
const MAX_RELAXATIONS = 4;
/** Relative difference below which two relaxed strains count as the same minimum. */
const SAME_STRAIN = 1e-9;
/** Contact strain (Å²) left alone: a pair pressed about 0.01 Å too close. */
const ACCEPTED_OVERLAP = 1e-4;
/** The repair of bumping atoms: enough to push them apart, not to converge tightly. */
const REPAIR_BUDGET = { maxIterations: 200, gradientTolerance: 1e-3 };
/**
 * Most atoms the repair of bumping atoms takes on: its model holds a contact for every pair of
 * atoms, so its cost grows with the square of their number. A larger molecule keeps the walk's
 * placement of its chains (every angle and torsion ideal), with a bump here and there.
 */
export const MAX_REPAIRED_ATOMS = 1000;

/** The walk's placement with every ring system closed. */
export function relaxRingSystems(input: RingSystemsInput, walk: WalkResult): RingSystemsResult {
  const positions = [...walk.positions];
  const rotations = [...walk.rotations];
  const systems = ringSystems(input.sites.length, input.ringBonds, walk.order);
  let whole = false;
  for (const system of systems) whole = relaxOneSystem(input, walk.parents, system, positions, rotations) || whole;
  if (whole || input.sites.length > MAX_REPAIRED_ATOMS) return { positions, rotations };
  // Branches placed round relaxed rings, and chains the walk could not keep apart, may still
  // bump: a short relaxation of the whole molecule pushes such atoms apart.
  const model = springModel({ sites: input.sites, bondLength: input.bondLength, contactDistance: input.contactDistance });
  if (model.overlap(positions) <= ACCEPTED_OVERLAP) return { positions, rotations };
  return { positions: model.relax(positions, REPAIR_BUDGET).positions, rotations };
}

/**
 * Atoms of each ring system in index order; systems in the order the walk reached them, so a
 * system is placed before the systems on branches hanging from it.
 */
function ringSystems(atomCount: number, ringBonds: RingSystemsInput["ringBonds"], order: readonly number[]): number[][] {
  const root = Array.from({ length: atomCount }, (_, atom) => atom);
  const find = (atom: number): number => {
    while (root[atom] !== atom) atom = root[atom] = root[root[atom]];
    return atom;
  };
  for (const [a, b] of ringBonds) root[find(a)] = find(b);
  const onRing = new Set(ringBonds.flat());
  const byRoot = new Map<number, number[]>();
  for (const atom of order) {
    if (!onRing.has(atom)) continue;
    const key = find(atom);
    if (!byRoot.has(key)) byRoot.set(key, []);
    byRoot.get(key)!.push(atom);
  }
  return [...byRoot.values()].map((atoms) => atoms.sort((a, b) => a - b));
}

interface Placement {
  readonly positions: readonly Vec3[];
  readonly rotations: readonly Rotation[];
  readonly strain: number;
  /** Still in the molecule's frame (the walk's own placement, relaxed or not). */
  readonly inPlace: boolean;
}

/**
 * Relaxes one ring system and moves the branches hanging from it; updates the arrays in place.
 * True when the system with the atoms bonded to it is the whole molecule.
 */
function relaxOneSystem(
  input: RingSystemsInput,
  parents: readonly number[],
  ringAtoms: readonly number[],
  positions: Vec3[],
  rotations: Rotation[],
): boolean {
  const inSystem = new Set(ringAtoms);
  const memberSet = new Set(ringAtoms);
  for (const atom of ringAtoms) for (const ligand of input.sites[atom].ligands) memberSet.add(ligand.atom);
  // Index order, so a molecule that is all one piece keeps its own numbering.
  const members = [...memberSet].sort((a, b) => a - b);
  const local = new Map(members.map((atom, index) => [atom, index]));
  const whole = members.length === input.sites.length;
  // Atoms bonded to the system keep only their bond to it: angles are sprung at ring atoms only.
  const sites: AtomSites[] = whole
    ? [...input.sites]
    : members.map((atom) => {
        const site = input.sites[atom];
        const ligands = site.ligands.filter((ligand) => local.has(ligand.atom) && (inSystem.has(atom) || inSystem.has(ligand.atom)));
        return { ...site, ligands: ligands.map((ligand) => ({ ...ligand, atom: local.get(ligand.atom)! })) };
      });
  const walkInput: WalkInput = whole
    ? input
    : {
        sites,
        bondLength: (a, b) => input.bondLength(members[a], members[b]),
        bonded: (a, b) => input.bonded(members[a], members[b]),
        ringNeighbours: (parent, child) => {
          const ring = input.ringNeighbours(members[parent], members[child]);
          return ring && { beforeParent: local.get(ring.beforeParent)!, afterChild: local.get(ring.afterChild)! };
        },
      };
  const model = springModel({
    sites,
    bondLength: walkInput.bondLength,
    contactDistance: (a, b) => input.contactDistance(members[a], members[b]),
  });
  const walked = members.map((atom) => positions[atom]);
  const first: Placement = {
    positions: walked,
    rotations: members.map((atom) => rotations[atom]),
    strain: model.strain(walked),
    inPlace: true,
  };
  if (first.strain <= EXACT_STRAIN) return whole;
  const localRing = ringAtoms.map((atom) => local.get(atom)!);
  const best = leastStrained(model, first, () =>
    walkRoots(sites, localRing).map((root) => {
      const walk = placeByWalk(walkInput, root);
      return { positions: walk.positions, rotations: walk.rotations, strain: model.strain(walk.positions), inPlace: false };
    }),
  );
  placeSystem(input, parents, ringAtoms, members, local, best, positions, rotations);
  return whole;
}

/**
 * Puts the relaxed piece into the molecule. The ring atom the walk reached first stays joined to
 * the atom that placed it, along the same bond direction; every other atom bonded to the system
 * carries its branch along as a rigid body.
 */
function placeSystem(
  input: RingSystemsInput,
  parents: readonly number[],
  ringAtoms: readonly number[],
  members: readonly number[],
  local: ReadonlyMap<number, number>,
  best: Placement,
  positions: Vec3[],
  rotations: Rotation[],
): void {
  const inSystem = new Set(ringAtoms);
  const entry = ringAtoms.reduce((earliest, atom) => (walkDepth(parents, atom) < walkDepth(parents, earliest) ? atom : earliest));
  const anchor = parents[entry];
  const at = (atom: number) => best.positions[local.get(atom)!];
  const ringNeighbours = (atom: number) => input.sites[atom].ligands.map((l) => l.atom).filter((other) => inSystem.has(other));

  // The turn and shift taking the piece's frame into the molecule's.
  let turn: Rotation | undefined;
  let pivot: Vec3;
  let target: Vec3;
  if (anchor >= 0) {
    pivot = at(anchor);
    target = positions[anchor];
    turn = turnMatching(
      sub(at(entry), pivot),
      sub(positions[entry], target),
      ringNeighbours(entry).map((other) => [sub(at(other), at(entry)), sub(positions[other], positions[entry])] as const),
    );
  } else if (best.inPlace) {
    pivot = target = [0, 0, 0];
  } else {
    pivot = at(entry);
    target = positions[entry];
    const [firstNeighbour, ...others] = ringNeighbours(entry);
    turn = turnMatching(
      sub(at(firstNeighbour), pivot),
      sub(positions[firstNeighbour], target),
      others.map((other) => [sub(at(other), pivot), sub(positions[other], target)] as const),
    );
  }
  const moved = (point: Vec3): Vec3 => (turn ? add(rotate(turn, sub(point, pivot)), target) : add(sub(point, pivot), target));

  const before = new Map(members.map((atom) => [atom, positions[atom]]));
  for (const atom of members) {
    if (atom === anchor) continue;
    positions[atom] = moved(at(atom));
    if (inSystem.has(atom)) {
      const rotation = best.rotations[local.get(atom)!];
      rotations[atom] = turn ? composeRotations(turn, rotation) : rotation;
    }
  }
  for (const branch of members) {
    if (inSystem.has(branch) || branch === anchor) continue;
    const base = input.sites[branch].ligands.find((l) => inSystem.has(l.atom))!.atom;
    const follow = turnMatching(
      sub(before.get(branch)!, before.get(base)!),
      sub(positions[branch], positions[base]),
      ringNeighbours(base).map((other) => [sub(before.get(other)!, before.get(base)!), sub(positions[other], positions[base])] as const),
    );
    const from = before.get(branch)!;
    const beyond = atomsBeyond(input.sites, base, branch);
    // A terminal atom keeps the frame of the placement chosen; one with a branch turns with it.
    const rotation = beyond.length === 0 ? best.rotations[local.get(branch)!] : composeRotations(follow, rotations[branch]);
    rotations[branch] = beyond.length === 0 && turn ? composeRotations(turn, rotation) : rotation;
    for (const atom of beyond) {
      positions[atom] = add(rotate(follow, sub(positions[atom], from)), positions[branch]);
      rotations[atom] = composeRotations(follow, rotations[atom]);
    }
  }
  if (anchor >= 0) turnAboutAnchor(input.sites, anchor, entry, positions, rotations);
}

/**
 * The relaxed system may meet the rest of the molecule differently from the walked one, so the
 * torsion about the bond from the anchor to the system is chosen again, among the same evenly
 * spaced turns the walk chooses from, for the least repulsion between the system with everything
 * beyond it and the rest of the molecule.
 */
function turnAboutAnchor(sites: readonly AtomSites[], anchor: number, entry: number, positions: Vec3[], rotations: Rotation[]): void {
  const moving = new Set([entry, ...atomsBeyond(sites, anchor, entry)]);
  const movingAtoms = [...moving];
  const fixedAtoms = positions.map((_, atom) => atom).filter((atom) => !moving.has(atom));
  const choices = torsionChoices(sites[anchor], sites[entry]);
  const axis = normalize(sub(positions[entry], positions[anchor]));
  const origin = positions[anchor];
  let bestTurn: Rotation | undefined;
  let bestRepulsion = repulsionBetween(movingAtoms, fixedAtoms, positions, (atom) => positions[atom]);
  for (let k = 1; k < choices; k++) {
    const turn = rotationAboutAxis(axis, (2 * Math.PI * k) / choices);
    const turned = (atom: number) => add(rotate(turn, sub(positions[atom], origin)), origin);
    const repulsion = repulsionBetween(movingAtoms, fixedAtoms, positions, turned);
    if (repulsion < bestRepulsion * (1 - 1e-9) - 1e-12) [bestTurn, bestRepulsion] = [turn, repulsion];
  }
  if (!bestTurn) return;
  for (const atom of movingAtoms) {
    positions[atom] = add(rotate(bestTurn, sub(positions[atom], origin)), origin);
    rotations[atom] = composeRotations(bestTurn, rotations[atom]);
  }
}

/** Soft repulsion (as in the walk's torsion choice) between moving atoms and fixed ones. */
function repulsionBetween(
  movingAtoms: readonly number[],
  fixedAtoms: readonly number[],
  positions: readonly Vec3[],
  movedTo: (atom: number) => Vec3,
): number {
  let repulsion = 0;
  for (const atom of movingAtoms) {
    const [x, y, z] = movedTo(atom);
    for (const other of fixedAtoms) {
      const p = positions[other];
      const squared = Math.max((x - p[0]) ** 2 + (y - p[1]) ** 2 + (z - p[2]) ** 2, 0.01);
      repulsion += 1 / (squared * squared);
    }
  }
  return repulsion;
}

/** Bonds from an atom back to its fragment's root along the walk. */
function walkDepth(parents: readonly number[], atom: number): number {
  let depth = 0;
  for (let at = parents[atom]; at >= 0; at = parents[at]) depth++;
  return depth;
}

/**
 * The rotation taking `from` onto `to` exactly and the first usable pair of `others` as close as
 * that allows; the smallest turn of `from` onto `to` when no pair fixes the turn about it.
 */
function turnMatching(from: Vec3, to: Vec3, others: readonly (readonly [Vec3, Vec3])[]): Rotation {
  for (const [otherFrom, otherTo] of others) {
    const rotation = rotationFromTwoDirections(from, otherFrom, to, otherTo);
    if (rotation) return rotation;
  }
  return rotationAligning(from, to);
}

/** Atoms reached from `start` without crossing its bond to `base` (a bond on no ring). */
function atomsBeyond(sites: readonly AtomSites[], base: number, start: number): number[] {
  const seen = new Set([base, start]);
  const found: number[] = [];
  const queue = [start];
  for (let head = 0; head < queue.length; head++) {
    for (const ligand of sites[queue[head]].ligands) {
      if (seen.has(ligand.atom)) continue;
      seen.add(ligand.atom);
      found.push(ligand.atom);
      queue.push(ligand.atom);
    }
  }
  return found;
}

/**
 * The least strained relaxed placement. A walk that closes every ring exactly (benzene, a chair)
 * is kept as it is. Otherwise walks from other ring atoms are tried too: a cage or a ring with
 * unequal bonds may close badly from one root and exactly from another (1,4-dioxane closes as a
 * chair only from an oxygen), and relaxing a badly closed start can end in a twisted or tangled
 * shape. Starts are relaxed from the least strained up, until one relaxes well.
 */
function leastStrained(model: SpringModel, first: Placement, otherStarts: () => Placement[]): Placement {
  const starts = [first, ...otherStarts()].sort((a, b) => a.strain - b.strain);
  if (starts[0].strain <= EXACT_STRAIN) return starts[0];
  let best: Placement | undefined;
  for (const start of starts.slice(0, MAX_RELAXATIONS)) {
    const relaxed = { ...model.relax(start.positions), rotations: start.rotations, inPlace: start.inPlace };
    // Two starts that relax to the same strain have found the same shape: a strain the ring
    // system cannot shed (a five-membered ring's), not a tangle another start would undo.
    const agrees = best !== undefined && Math.abs(relaxed.strain - best.strain) <= SAME_STRAIN * best.strain + EXACT_STRAIN;
    if (!best || relaxed.strain < best.strain - EXACT_STRAIN) best = relaxed;
    if (best.strain <= ACCEPTED_STRAIN || agrees) break;
  }
  return best!;
}

/**
 * Ring atoms to root further walks at: one of each kind (element and number of neighbours) first,
 * so that different starts really differ, then the rest in index order.
 */
function walkRoots(sites: readonly AtomSites[], ringAtoms: readonly number[]): number[] {
  const kinds = new Set<string>();
  const firstOfKind: number[] = [];
  const rest: number[] = [];
  for (const atom of [...ringAtoms].sort((a, b) => a - b)) {
    const kind = `${sites[atom].ligands.length}/${sites[atom].loneDomains.length}/${sites[atom].ligands.map((l) => l.bondOrder).join()}`;
    if (kinds.has(kind)) rest.push(atom);
    else {
      kinds.add(kind);
      firstOfKind.push(atom);
    }
  }
  return [...firstOfKind, ...rest].slice(0, MAX_WALK_STARTS);
}
