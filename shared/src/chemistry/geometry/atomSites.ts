/**
 * Every atom's own VSEPR frame: a unit direction for each bond and each lone-pair domain, in
 * local coordinates. Centres (two or more neighbours) take their sites from the VSEPR analysis;
 * terminal and lone atoms get the electron geometry of their bond plus lone-pair domains, so
 * their lone pairs point somewhere sensible too.
 */
import { elementBySymbol } from "../elements";
import { analyzeCentre, type CentreDetail } from "../vsepr/analyzeCentre";
import { ELECTRON_GEOMETRY_BY_STERIC_NUMBER } from "../vsepr/shapeTables";
import type { MolecularGraph } from "../types";
import { idealDirections, lonePairSiteOrder } from "./idealDirections";
import type { Vec3 } from "./vectors";

/** A bond as seen from one of its atoms. */
export interface LocalLigand {
  readonly atom: number;
  readonly bondOrder: number;
  /** Unit vector towards the neighbour in the atom's local frame. */
  readonly direction: Vec3;
}

/** A lone-pair domain: two electrons, or the one odd electron of a radical. */
export interface LocalLoneDomain {
  readonly direction: Vec3;
  readonly electrons: 1 | 2;
}

export interface AtomSites {
  readonly ligands: readonly LocalLigand[];
  readonly loneDomains: readonly LocalLoneDomain[];
  /** Steric number 3 (trigonal planar electron geometry): the atom keeps a p orbital for π bonding. */
  readonly trigonalPlanar: boolean;
  /** Steric number 4 (tetrahedral electron geometry). */
  readonly tetrahedral: boolean;
}

const UP: Vec3 = [0, 0, 1];

/** A bonded neighbour as `atomSites` needs it. */
export interface BondedNeighbour {
  readonly atom: number;
  readonly bondOrder: number;
}

/** Every atom's neighbours in bond order, made once for all the atoms of a graph. */
export function bondedNeighbours(graph: MolecularGraph): BondedNeighbour[][] {
  const lists = graph.atoms.map(() => [] as BondedNeighbour[]);
  for (const bond of graph.bonds) {
    lists[bond.from]?.push({ atom: bond.to, bondOrder: bond.order });
    lists[bond.to]?.push({ atom: bond.from, bondOrder: bond.order });
  }
  return lists;
}

/**
 * The local sites of atom `index`; never throws, whatever the graph. Pass the graph's
 * `bondedNeighbours` when asking for many atoms: finding them afresh scans every bond.
 */
export function atomSites(
  graph: MolecularGraph,
  index: number,
  radical: boolean,
  neighbours: readonly BondedNeighbour[] = bondedNeighbours(graph)[index] ?? [],
): AtomSites {
  const atom = graph.atoms[index];
  const loneCount = atom.lonePairs + (atom.unpairedElectrons > 0 ? 1 : 0);
  const electronsOf = (k: number): 1 | 2 => (atom.unpairedElectrons > 0 && k === loneCount - 1 ? 1 : 2);

  if (neighbours.length >= 2) {
    const detail = centreDetail(graph, index, [index, ...neighbours.map((n) => n.atom)], radical);
    if (detail) {
      const geometry = detail.centre.electronGeometry;
      return {
        ligands: detail.ligands.map((ligand, k) => ({
          atom: ligand.atom,
          bondOrder: ligand.bondOrder,
          direction: detail.sites.ligandDirections[k],
        })),
        loneDomains: detail.sites.lonePairDirections.map((direction, k) => ({ direction, electrons: electronsOf(k) })),
        trigonalPlanar: geometry === "trigonal planar",
        tetrahedral: geometry === "tetrahedral",
      };
    }
    // More domains than VSEPR describes: spread the bonds evenly and leave the lone pairs out.
    const spread = spreadDirections(neighbours.length);
    return {
      ligands: neighbours.map((n, k) => ({ atom: n.atom, bondOrder: n.bondOrder, direction: spread[k] })),
      loneDomains: [],
      trigonalPlanar: false,
      tetrahedral: false,
    };
  }

  const stericNumber = neighbours.length + loneCount;
  const geometry = ELECTRON_GEOMETRY_BY_STERIC_NUMBER[stericNumber];
  if (!geometry) {
    return {
      ligands: neighbours.map((n) => ({ atom: n.atom, bondOrder: n.bondOrder, direction: UP })),
      loneDomains: [],
      trigonalPlanar: false,
      tetrahedral: false,
    };
  }
  const directions = idealDirections(geometry);
  const order = lonePairSiteOrder(geometry);
  return {
    ligands: neighbours.map((n) => ({ atom: n.atom, bondOrder: n.bondOrder, direction: directions[order[loneCount]] })),
    loneDomains: order.slice(0, loneCount).map((site, k) => ({ direction: directions[site], electrons: electronsOf(k) })),
    trigonalPlanar: geometry === "trigonal planar",
    tetrahedral: geometry === "tetrahedral",
  };
}

/** The VSEPR analysis of a centre, or undefined where it has none (unknown elements included). */
function centreDetail(graph: MolecularGraph, index: number, atoms: readonly number[], radical: boolean): CentreDetail | undefined {
  if (!atoms.every((atom) => elementBySymbol(graph.atoms[atom].symbol))) return undefined;
  try {
    return analyzeCentre(graph, index, radical);
  } catch {
    // The coordinate builder must not throw on a structure the analysis cannot describe.
    return undefined;
  }
}

/** `count` roughly even unit vectors (a Fibonacci spiral), for centres beyond seven domains. */
function spreadDirections(count: number): Vec3[] {
  const golden = Math.PI * (3 - Math.sqrt(5));
  return Array.from({ length: count }, (_, k) => {
    const z = 1 - (2 * (k + 0.5)) / count;
    const radius = Math.sqrt(1 - z * z);
    return [radius * Math.cos(golden * k), radius * Math.sin(golden * k), z] as Vec3;
  });
}
