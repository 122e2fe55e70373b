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
import { chooseChildRotation, type PlacementState } from "./chooseTorsion";
import { IDENTITY_ROTATION, rotate, rotationAligning, type Rotation } from "./rotation";
import { add, scale, type Vec3 } from "./vectors";

export interface WalkInput {
  readonly sites: readonly AtomSites[];
  readonly bondLength: (first: number, second: number) => number;
  readonly bonded: (first: number, second: number) => boolean;
  readonly ringNeighbours: PlacementState["ringNeighbours"];
}

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

/** Places every atom; never throws for a well-formed graph. */
export function placeByWalk(input: WalkInput, firstRoot?: number): WalkResult {
  const count = input.sites.length;
  const positions: (Vec3 | undefined)[] = new Array(count).fill(undefined);
  const rotations: (Rotation | undefined)[] = new Array(count).fill(undefined);
  const placedBy: number[] = new Array(count).fill(-1);
  const order: number[] = [];
  const state: PlacementState = { ...input, positions, rotations };
  const placeNeighbours = (atom: number) => {
    for (const ligand of input.sites[atom].ligands) {
      if (positions[ligand.atom]) continue;
      const direction = rotate(rotations[atom]!, ligand.direction);
      positions[ligand.atom] = add(positions[atom]!, scale(direction, input.bondLength(atom, ligand.atom)));
      placedBy[ligand.atom] = atom;
    }
  };

  const start = firstRoot !== undefined && firstRoot >= 0 && firstRoot < count ? firstRoot : pickRoot(input.sites, positions);
  for (let root = start; root >= 0; root = pickRoot(input.sites, positions)) {
    const earlierExtent = maxX(positions);
    positions[root] = [0, 0, 0];
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
    order.push(...queue);
    // Later fragments of a disconnected graph go beside the earlier ones, not on top of them.
    if (earlierExtent !== undefined) {
      const shift = earlierExtent + FRAGMENT_GAP - Math.min(...queue.map((atom) => positions[atom]![0]));
      for (const atom of queue) positions[atom] = add(positions[atom]!, [shift, 0, 0]);
    }
  }
  return { positions: positions as Vec3[], rotations: rotations as Rotation[], parents: placedBy, order };
}

/** The unplaced atom with the most neighbours (lowest index on ties), or -1 when all are placed. */
function pickRoot(sites: readonly AtomSites[], positions: readonly (Vec3 | undefined)[]): number {
  let best = -1;
  sites.forEach((site, atom) => {
    if (positions[atom]) return;
    if (best < 0 || site.ligands.length > sites[best].ligands.length) best = atom;
  });
  return best;
}

/** Largest x of the atoms placed so far, or undefined before the first fragment. */
function maxX(positions: readonly (Vec3 | undefined)[]): number | undefined {
  const placed = positions.filter((p): p is Vec3 => p !== undefined);
  return placed.length === 0 ? undefined : Math.max(...placed.map((p) => p[0]));
}
