/**
 * 3D model coordinates for a Lewis structure: ideal VSEPR directions at every atom, bond lengths
 * from covalent radii (double bonds ×0.87, triple ×0.78, in between interpolated for the
 * resonance-averaged orders of `resonanceBondOrders`, so benzene's ring bonds are ×0.935), placed
 * by a walk over the bonds with torsions chosen to keep π systems planar and to stagger
 * single bonds, then rings closed by a short relaxation. Atoms in three- and four-membered rings
 * take 60° or 90° ring angles with their other bonds spread round them (`smallRingSites`), so
 * cages such as cubane reach their symmetric shape. Acyclic species, benzene-like rings, chairs
 * and strain-free cages keep every angle ideal; other rings carry a few degrees of strain. A model
 * geometry, not a measured or optimised one.
 */
import type { MolecularGraph } from "../types";
import { atomSites, type AtomSites } from "./atomSites";
import { covalentRadiusAngstrom, modelBondLength } from "./bondLength";
import { placeByWalk } from "./placeByWalk";
import { springModel, type SpringModel } from "./relaxRings";
import { resonanceBondOrders } from "./resonanceBondOrders";
import { adjacencyOf, bondKey, perceiveRings, ringNeighboursAcross } from "./ringPerception";
import { smallRingSites } from "./smallRingSites";
import { composeRotations, rotate, rotationAligning, rotationFromTwoDirections, type Rotation } from "./rotation";
import { angleDegrees, normalize, sub, type Vec3 } from "./vectors";

/** An atom of the model, in ångströms. */
export interface PlacedAtom {
  readonly symbol: string;
  readonly position: Vec3;
}

/** A lone-pair domain of an atom: unit direction in the molecule's frame. */
export interface PlacedLonePair {
  /** Index of the atom (same as in the graph and in `atoms`). */
  readonly atom: number;
  readonly direction: Vec3;
  /** 2 for a lone pair, 1 for the odd electron of a radical. */
  readonly electrons: 1 | 2;
}

/** Model coordinates of a whole species; atoms in the graph's order. */
export interface MolecularCoordinates {
  readonly atoms: readonly PlacedAtom[];
  readonly lonePairs: readonly PlacedLonePair[];
}

/** Non-bonded atoms are pushed apart below this multiple of their summed covalent radii. */
const CONTACT_FACTOR = 1.5;
/** Strain (Å²) below which a relaxed ring system is kept without trying other starts. */
const ACCEPTED_STRAIN = 0.05;
/** Strain (Å²) of a placement whose bonds and angles are all ideal, up to rounding. */
const EXACT_STRAIN = 1e-12;
/** Further walks tried when the first does not close its rings exactly. */
const MAX_WALK_STARTS = 6;
/** Most starts relaxed, least strained first. */
const MAX_RELAXATIONS = 4;

/**
 * Builds model coordinates for any molecular graph (chains, branches, rings, several fragments).
 * A single atom sits at the origin and a diatomic lies along z. Never throws: bonds that name
 * missing atoms are ignored.
 */
export function buildCoordinates(graph: MolecularGraph, radical = false): MolecularCoordinates {
  const clean = withValidBonds(graph);
  if (clean.atoms.length === 0) return { atoms: [], lonePairs: [] };
  const sites = smallRingSites(
    clean.atoms.map((_, index) => atomSites(clean, index, radical)),
    adjacencyOf(clean),
  );
  const rings = perceiveRings(clean, sites);
  const orders = resonanceBondOrders(clean, rings.aromaticBonds);
  const lengths = new Map(
    clean.bonds.map((bond) => {
      const key = bondKey(bond.from, bond.to);
      return [key, modelBondLength(clean.atoms[bond.from].symbol, clean.atoms[bond.to].symbol, orders.get(key)!)] as const;
    }),
  );
  const bondLength = (a: number, b: number) =>
    lengths.get(bondKey(a, b)) ?? modelBondLength(clean.atoms[a].symbol, clean.atoms[b].symbol, 1);

  const walkInput = {
    sites,
    bondLength,
    bonded: (a: number, b: number) => lengths.has(bondKey(a, b)),
    ringNeighbours: (parent: number, child: number) => ringNeighboursAcross(rings, parent, child),
  };
  let { positions, rotations } = placeByWalk(walkInput);
  if (rings.smallestRingByBond.size > 0) {
    const model = springModel({
      sites,
      bondLength,
      contactDistance: (a, b) =>
        CONTACT_FACTOR * (covalentRadiusAngstrom(clean.atoms[a].symbol) + covalentRadiusAngstrom(clean.atoms[b].symbol)),
    });
    const best = leastStrained(model, { positions, rotations, strain: model.strain(positions) }, () =>
      walkRoots(sites, [...rings.smallestRingByBond.values()]).map((root) => {
        const walk = placeByWalk(walkInput, root);
        return { ...walk, strain: model.strain(walk.positions) };
      }),
    );
    positions = best.positions;
    rotations = best.rotations.map((rotation, atom) => refitRotation(sites[atom], atom, positions, rotation));
  }

  return {
    atoms: clean.atoms.map((atom, index) => ({ symbol: atom.symbol, position: tidy(positions[index]) })),
    lonePairs: sites.flatMap((site, atom) =>
      site.loneDomains.map((domain) => ({
        atom,
        direction: tidy(rotate(rotations[atom], domain.direction)),
        electrons: domain.electrons,
      })),
    ),
  };
}

interface Placement {
  readonly positions: readonly Vec3[];
  readonly rotations: readonly Rotation[];
  readonly strain: number;
}

/**
 * The least strained relaxed placement. A walk that closes every ring exactly (benzene, a chair)
 * is kept as it is. Otherwise walks from other ring atoms are tried too: a cage or a ring with
 * unequal bonds may close badly from one root and exactly from another (1,4-dioxane closes as a
 * chair only from an oxygen), and relaxing a badly closed start can end in a twisted or tangled
 * shape. Starts are relaxed from the least strained up, until one relaxes well.
 */
function leastStrained(model: SpringModel, first: Placement, otherStarts: () => Placement[]): Placement {
  if (first.strain <= EXACT_STRAIN) return first;
  const starts = [first, ...otherStarts()].sort((a, b) => a.strain - b.strain);
  if (starts[0].strain <= EXACT_STRAIN) return starts[0];
  let best: Placement | undefined;
  for (const start of starts.slice(0, MAX_RELAXATIONS)) {
    const relaxed = { ...model.relax(start.positions), rotations: start.rotations };
    if (!best || relaxed.strain < best.strain - EXACT_STRAIN) best = relaxed;
    if (best.strain <= ACCEPTED_STRAIN) break;
  }
  return best!;
}

/**
 * Ring atoms to root further walks at: one of each kind (element and number of neighbours) first,
 * so that different starts really differ, then the rest in index order.
 */
function walkRoots(sites: readonly AtomSites[], rings: readonly (readonly number[])[]): number[] {
  const ringAtoms = [...new Set(rings.flat())].sort((a, b) => a - b);
  const kinds = new Set<string>();
  const firstOfKind: number[] = [];
  const rest: number[] = [];
  for (const atom of ringAtoms) {
    const kind = `${sites[atom].ligands.length}/${sites[atom].loneDomains.length}/${sites[atom].ligands.map((l) => l.bondOrder).join()}`;
    if (kinds.has(kind)) rest.push(atom);
    else {
      kinds.add(kind);
      firstOfKind.push(atom);
    }
  }
  return [...firstOfKind, ...rest].slice(0, MAX_WALK_STARTS);
}

function withValidBonds(graph: MolecularGraph): MolecularGraph {
  const atoms = Array.isArray(graph?.atoms) ? graph.atoms : [];
  const bonds = (Array.isArray(graph?.bonds) ? graph.bonds : []).filter(
    (bond) =>
      Number.isInteger(bond.from) &&
      Number.isInteger(bond.to) &&
      bond.from !== bond.to &&
      bond.from >= 0 &&
      bond.to >= 0 &&
      bond.from < atoms.length &&
      bond.to < atoms.length,
  );
  return bonds.length === graph.bonds?.length && atoms === graph.atoms ? graph : { atoms, bonds };
}

/** The frame that best matches where an atom's bonds ended up after relaxation. */
function refitRotation(site: AtomSites, atom: number, positions: readonly Vec3[], walked: Rotation): Rotation {
  if (site.ligands.length === 0) return walked;
  const world = site.ligands.map((ligand) => normalize(sub(positions[ligand.atom], positions[atom])));
  const first = site.ligands[0].direction;
  const secondIndex = site.ligands.findIndex((ligand) => {
    const angle = angleDegrees(first, ligand.direction);
    return angle > 1 && angle < 179;
  });
  if (secondIndex > 0) {
    const fitted = rotationFromTwoDirections(first, site.ligands[secondIndex].direction, world[0], world[secondIndex]);
    if (fitted) return fitted;
  }
  return composeRotations(rotationAligning(rotate(walked, first), world[0]), walked);
}

/** Rounds away floating-point dust so ideal zeros print as 0, not -0 or 1e-17. */
function tidy(vector: Vec3): Vec3 {
  return vector.map((value) => (Math.abs(value) < 1e-10 ? 0 : value)) as unknown as Vec3;
}
