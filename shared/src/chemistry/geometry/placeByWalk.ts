/**
 * First placement of every atom by a breadth-first walk over the bonds. The root sits at the
 * origin in its own VSEPR frame; every atom reached places all its neighbours along its site
 * directions at model bond lengths, and each newly placed atom's frame is turned so its site
 * back to the parent lies along the bond, with the torsion picked by `chooseChildRotation`.
 * Acyclic molecules come out with every angle exactly ideal; a ring bond is closed only as well
 * as the torsions allow, which `relaxRings` then repairs. Neighbours are placed as soon as their
 * atom's frame is fixed, so each torsion choice sees everything placed so far.
 */
import type { AtomSites } from "./atomSites";
import { REPULSION_REACH, chooseChildRotation, type PlacementState } from "./chooseTorsion";
import { createSpatialGrid } from "./spatialGrid";
import { IDENTITY_ROTATION, rotate, rotationAligning, type Rotation } from "./rotation";
import { add, scale, type Vec3 } from "./vectors";

export interface WalkInput {
  readonly sites: readonly AtomSites[];
  readonly bondLength: (first: number, second: number) => number;
  readonly bonded: (first: number, second: number) => boolean;
  readonly ringNeighbours: PlacementState["ringNeighbours"];
}

/** Places every atom; never throws for a well-formed graph. Linear in atoms: each torsion sees only placed atoms nearby. */

export interface WalkResult {
  readonly positions: readonly Vec3[];
  /** Each atom's local frame turned into the molecule's frame. */
  readonly rotations: readonly Rotation[];
  /** The atom whose frame placed each atom; -1 for the root of each fragment. */
  readonly parents: readonly number[];
  /** Atoms in the order their frames were fixed (each fragment from its root). */
  readonly order: readonly number[];
}

/** Gap in ångströms between separate fragments of one graph, beyond their extent. */
const FRAGMENT_GAP = 3;
const Z_AXIS: Vec3 = [0, 0, 1];

export function placeByWalk(input: WalkInput, firstRoot?: number): WalkResult {
  const count = input.sites.length;
  const positions: (Vec3 | undefined)[] = new Array(count).fill(undefined);
  const rotations: (Rotation | undefined)[] = new Array(count).fill(undefined);
  const placedBy: number[] = new Array(count).fill(-1);
  const order: number[] = [];
  // Only the fragment being walked is filed: earlier fragments are moved aside when done.
  const grid = createSpatialGrid(REPULSION_REACH);
  const state: PlacementState = { ...input, positions, rotations, placedNear: grid.near };
  const placeNeighbours = (atom: number) => {
    for (const ligand of input.sites[atom].ligands) {
      if (positions[ligand.atom]) continue;
      const direction = rotate(rotations[atom]!, ligand.direction);
      positions[ligand.atom] = add(positions[atom]!, scale(direction, input.bondLength(atom, ligand.atom)));
      grid.add(ligand.atom, positions[ligand.atom]!);
      placedBy[ligand.atom] = atom;
    }
  };

  const roots = rootsByNeighbourCount(input.sites);
  let nextRoot = 0;
  const pickRoot = (): number => {
    while (nextRoot < roots.length && positions[roots[nextRoot]]) nextRoot++;
    return nextRoot < roots.length ? roots[nextRoot] : -1;
  };
  let earlierExtent: number | undefined;
  const start = firstRoot !== undefined && firstRoot >= 0 && firstRoot < count ? firstRoot : pickRoot();
  for (let root = start; root >= 0; root = pickRoot()) {
    grid.clear();
    positions[root] = [0, 0, 0];
    grid.add(root, positions[root]!);
    // A terminal root points its one bond along +z, so a diatomic lies on the z axis.
    const ligands = input.sites[root].ligands;
    rotations[root] = ligands.length === 1 ? rotationAligning(ligands[0].direction, Z_AXIS) : IDENTITY_ROTATION;
    placeNeighbours(root);
    const queue = [root];
    for (let head = 0; head < queue.length; head++) {
      const parent = queue[head];
      for (const ligand of input.sites[parent].ligands) {
        const child = ligand.atom;
        if (placedBy[child] !== parent || rotations[child]) continue;
        rotations[child] = chooseChildRotation(state, parent, child);
        // Placing the grandchildren at once lets the next sibling's torsion see them.
        placeNeighbours(child);
        queue.push(child);
      }
    }
    for (const atom of queue) order.push(atom);
    // Later fragments of a disconnected graph go beside the earlier ones, not on top of them.
    let lowest = Infinity;
    for (const atom of queue) lowest = Math.min(lowest, positions[atom]![0]);
    const shift = earlierExtent === undefined ? 0 : earlierExtent + FRAGMENT_GAP - lowest;
    if (shift !== 0) for (const atom of queue) positions[atom] = add(positions[atom]!, [shift, 0, 0]);
    for (const atom of queue) earlierExtent = Math.max(earlierExtent ?? -Infinity, positions[atom]![0]);
  }
  return { positions: positions as Vec3[], rotations: rotations as Rotation[], parents: placedBy, order };
}

/**
 * Atoms in the order they become roots: most neighbours first, lowest index on ties (each
 * fragment's root is its first unplaced atom in this order).
 */
function rootsByNeighbourCount(sites: readonly AtomSites[]): number[] {
  const atoms = sites.map((_, atom) => atom);
  return atoms.sort((a, b) => sites[b].ligands.length - sites[a].ligands.length || a - b);
}
