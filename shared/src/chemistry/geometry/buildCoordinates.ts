/**
 * 3D model coordinates for a Lewis structure: ideal VSEPR directions at every atom, bond lengths
 * from covalent radii (double bonds ×0.87, triple ×0.78, in between interpolated for the
 * resonance-averaged orders of `resonanceBondOrders`, so benzene's ring bonds are ×0.935), placed
 * by a walk over the bonds with torsions chosen to keep π systems planar and to stagger
 * single bonds, then each ring system closed by a short relaxation of its own
 * (`relaxRingSystems`). Atoms in three- and four-membered rings
 * take 60° or 90° ring angles with their other bonds spread round them (`smallRingSites`), so
 * cages such as cubane reach their symmetric shape. Acyclic species, benzene-like rings, chairs
 * and strain-free cages keep every angle ideal; other rings carry a few degrees of strain. A model
 * geometry, not a measured or optimised one.
 */
import type { MolecularGraph } from "../types";
import { atomSites, bondedNeighbours, type AtomSites } from "./atomSites";
import { covalentRadiusAngstrom, modelBondLength } from "./bondLength";
import { placeByWalk } from "./placeByWalk";
import { relaxRingSystems } from "./relaxRingSystems";
import { resonanceBondOrders } from "./resonanceBondOrders";
import { MAX_RING_SYSTEM_ATOMS, adjacencyOf, bondKey, perceiveRings, ringNeighboursAcross } from "./ringPerception";
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
  /**
   * Set when the species is too large for a 3D model (see {@link MAX_MODEL_ATOMS} and
   * `MAX_RING_SYSTEM_ATOMS`): a sentence saying so; `atoms` and `lonePairs` are then empty.
   */
  readonly tooLarge?: string;
}

/**
 * Most atoms (hydrogens included) in a 3D model. The per-atom shapes of a larger species are still
 * analysed; only the model, and what needs it, is declined, quickly and with a reason.
 */
export const MAX_MODEL_ATOMS = 10_000;

/** Non-bonded atoms are pushed apart below this multiple of their summed covalent radii. */
const CONTACT_FACTOR = 1.5;

/**
 * Builds model coordinates for any molecular graph (chains, branches, rings, several fragments).
 * A single atom sits at the origin and a diatomic lies along z. Never throws: bonds that name
 * missing atoms are ignored.
 */
export function buildCoordinates(graph: MolecularGraph, radical = false): MolecularCoordinates {
  const clean = withValidBonds(graph);
  if (clean.atoms.length === 0) return { atoms: [], lonePairs: [] };
  if (clean.atoms.length > MAX_MODEL_ATOMS) {
    return tooLarge(`${grouped(clean.atoms.length)} atoms (the limit is ${grouped(MAX_MODEL_ATOMS)})`);
  }
  const neighbours = bondedNeighbours(clean);
  const sites = smallRingSites(
    clean.atoms.map((_, index) => atomSites(clean, index, radical, neighbours[index])),
    adjacencyOf(clean),
  );
  const rings = perceiveRings(clean, sites);
  if (rings.largestRingSystem > MAX_RING_SYSTEM_ATOMS) {
    return tooLarge(`a ring system of ${grouped(rings.largestRingSystem)} atoms (the limit is ${MAX_RING_SYSTEM_ATOMS})`);
  }
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
  const walk = placeByWalk(walkInput);
  let { positions, rotations } = walk;
  if (rings.smallestRingByBond.size > 0) {
    const ringBonds = clean.bonds.filter((bond) => rings.smallestRingByBond.has(bondKey(bond.from, bond.to)));
    const closed = relaxRingSystems(
      {
        ...walkInput,
        ringBonds: ringBonds.map((bond) => [bond.from, bond.to] as const),
        contactDistance: (a, b) =>
          CONTACT_FACTOR * (covalentRadiusAngstrom(clean.atoms[a].symbol) + covalentRadiusAngstrom(clean.atoms[b].symbol)),
      },
      walk,
    );
    positions = closed.positions;
    rotations = closed.rotations.map((rotation, atom) => refitRotation(sites[atom], atom, positions, rotation));
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

function tooLarge(what: string): MolecularCoordinates {
  return { atoms: [], lonePairs: [], tooLarge: `Too large for a 3D model: ${what}. The shape of each atom is still analysed.` };
}

function grouped(value: number): string {
  return value.toLocaleString("en-US");
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
