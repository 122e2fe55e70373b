/**
 * 3D model coordinates for a Lewis structure: ideal VSEPR directions at every atom, bond lengths
 * from covalent radii (double bonds ×0.87, triple ×0.78, in between interpolated for the
 * resonance-averaged orders of `resonanceBondOrders`, so benzene's ring bonds are ×0.935), placed
 * by a walk over the bonds with torsions chosen to keep π systems planar and to stagger
 * single bonds, then rings closed by a short relaxation. Acyclic species and benzene-like rings
 * keep every angle ideal; other rings carry a few degrees of strain. A model geometry, not a
 * measured or optimised one.
 */
import type { MolecularGraph } from "../types";
import { atomSites, type AtomSites } from "./atomSites";
import { covalentRadiusAngstrom, modelBondLength } from "./bondLength";
import { placeByWalk } from "./placeByWalk";
import { relaxRings } from "./relaxRings";
import { resonanceBondOrders } from "./resonanceBondOrders";
import { bondKey, perceiveRings, ringNeighboursAcross } from "./ringPerception";
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
const MAX_RING_RESTARTS = 4;

/**
 * Builds model coordinates for any molecular graph (chains, branches, rings, several fragments).
 * A single atom sits at the origin and a diatomic lies along z. Never throws: bonds that name
 * missing atoms are ignored.
 */
export function buildCoordinates(graph: MolecularGraph, radical = false): MolecularCoordinates {
  const clean = withValidBonds(graph);
  if (clean.atoms.length === 0) return { atoms: [], lonePairs: [] };
  const sites = clean.atoms.map((_, index) => atomSites(clean, index, radical));
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
    const relaxFrom = (start: readonly Vec3[]) =>
      relaxRings({
        sites,
        positions: start,
        bondLength,
        contactDistance: (a, b) =>
          CONTACT_FACTOR * (covalentRadiusAngstrom(clean.atoms[a].symbol) + covalentRadiusAngstrom(clean.atoms[b].symbol)),
      });
    let best = relaxFrom(positions);
    // Cages and bridged rings can relax into a tangle from one walk; other ring atoms as the
    // walk's root give other starts, and the least strained result is kept.
    const ringAtoms = [...new Set([...rings.smallestRingByBond.values()].flat())];
    for (const root of ringAtoms.slice(0, MAX_RING_RESTARTS)) {
      if (best.strain <= ACCEPTED_STRAIN) break;
      const retry = relaxFrom(placeByWalk(walkInput, root).positions);
      if (retry.strain < best.strain) best = retry;
    }
    positions = best.positions;
    rotations = rotations.map((rotation, atom) => refitRotation(sites[atom], atom, positions, rotation));
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
