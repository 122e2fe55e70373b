/**
 * The VSEPR description of one atom with two or more neighbours in a Lewis structure.
 */
import { graphIndex, ringAtoms } from "../graphIndex";
import { atomTraits } from "../lewis/electronBookkeeping";
import type { AngleExpectation, CentreAnalysis, MolecularGraph } from "../types";
import { lonePairJoinsPiSystem } from "./piSystems";
import { assignSites, type Ligand, type SiteAssignment } from "./assignSites";
import { expectedAngles, idealAnglesFor, type AngleContext } from "./expectedAngles";
import {
  axeNotation,
  ELECTRON_GEOMETRY_BY_STERIC_NUMBER,
  HYBRIDIZATION_BY_STERIC_NUMBER,
  molecularGeometryFor,
} from "./shapeTables";

export interface CentreDetail {
  readonly centre: CentreAnalysis;
  readonly ligands: readonly Ligand[];
  readonly sites: SiteAssignment;
}

const EXPANDED_NOTE =
  "sp3d/sp3d2 labels are bookkeeping for five or more domains: d orbitals contribute little, and " +
  "the bonding is better described with three-centre four-electron bonds.";

const CONJUGATED_NOTE =
  "one lone pair is shared with the neighbouring pi system (conjugation), so this atom is sp2 and planar rather than sp3.";

export function neighboursOf(graph: MolecularGraph, atom: number): readonly Ligand[] {
  // The graph index already holds each neighbour in ligand shape; shared, never copied.
  return graphIndex(graph).neighbours[atom];
}

/** Undefined when the atom has fewer than two neighbours or an unsupported domain count. */
export function analyzeCentre(graph: MolecularGraph, index: number, radical: boolean): CentreDetail | undefined {
  const atom = graph.atoms[index];
  if (graphIndex(graph).neighbours[index].length < 2) return undefined;
  const ligands = neighboursOf(graph, index);
  // A lone pair shared with a neighbouring pi system (amide N, pyrrole N, furan O) sits in a
  // p orbital, so it takes no site of its own: the atom is sp2 and planar.
  const delocalised = lonePairJoinsPiSystem(graph, index) ? 1 : 0;
  // An odd electron on an atom with no lone pair sits in a p orbital and takes no site: the
  // methyl radical is planar. Next to lone pairs it does count as a (weak) domain: NO2, ClO2.
  const oddElectronDomain = atom.unpairedElectrons > 0 && atom.lonePairs > 0 ? 1 : 0;
  const loneDomains = atom.lonePairs - delocalised + oddElectronDomain;
  const stericNumber = ligands.length + loneDomains;
  const electronGeometry = ELECTRON_GEOMETRY_BY_STERIC_NUMBER[stericNumber];
  const molecularGeometry = molecularGeometryFor(stericNumber, loneDomains);
  if (!electronGeometry || !molecularGeometry) return undefined;

  const traits = atomTraits(atom.symbol);
  const multipleBondCount = countMultipleBondsWithResonance(graph, ligands);
  // Heavier neighbours, or two groups with their own substituents (C-O-C in CH3OCH3).
  const bulkyNeighbours =
    ligands.some((l) => atomTraits(l.symbol).element.period > traits.element.period) ||
    ligands.filter((l) => l.symbol !== "H" && graphIndex(graph).neighbours[l.atom].length > 1).length >= 2;
  const ringSize = smallestRingThrough(graph, index, ligands);

  // Everything below depends only on these facts, so centres alike in them (the many CH2 and
  // aromatic CH of a large molecule) share one worked-out description.
  // Small species have one or two centres: for them the bookkeeping costs more than it saves.
  let signature: string | undefined;
  if (graph.atoms.length >= SHARED_CENTRE_MIN_ATOMS) {
    signature = `${atom.symbol}|${atom.lonePairs}|${atom.unpairedElectrons}|${delocalised}|${radical}|${multipleBondCount}|${bulkyNeighbours}|${ringSize}|`;
    for (const ligand of ligands) signature += `${ligand.symbol}${ligand.bondOrder},`;
    const known = centreMemo.get(signature);
    if (known) return { centre: { ...known.centre, index }, ligands, sites: known.sites };
  }

  const sites = assignSites(electronGeometry, loneDomains, ligands);
  const first = ligands[0];
  const identicalNeighbours = ligands.every((l) => l.symbol === first.symbol && l.bondOrder === first.bondOrder);
  let loneX = 0;
  let loneY = 0;
  let loneZ = 0;
  for (const [x, y, z] of sites.lonePairDirections) {
    loneX += x;
    loneY += y;
    loneZ += z;
  }
  const hybridization = HYBRIDIZATION_BY_STERIC_NUMBER[stericNumber];

  const angleContext: AngleContext = {
    electronGeometry,
    stericNumber,
    loneDomains,
    lonePairsBalanced: loneDomains > 0 && Math.hypot(loneX, loneY, loneZ) < 1e-9 && atom.unpairedElectrons === 0,
    centrePeriod: traits.element.period,
    identicalNeighbours,
    hasMultipleBond: ligands.some((l) => l.bondOrder > 1),
    multipleBondCount,
    bulkyNeighbours,
    radical,
    ligandDirections: sites.ligandDirections,
    ligandSiteKinds: sites.ligandSiteKinds,
  };

  const centre: CentreAnalysis = {
    index,
    atom: atom.symbol,
    axe: axeNotation(ligands.length, loneDomains),
    stericNumber,
    bondingDomains: ligands.length,
    // Lone pairs that take a site; a delocalised pair is named in the hybridization note.
    lonePairs: atom.lonePairs - delocalised,
    unpairedElectrons: atom.unpairedElectrons,
    electronGeometry,
    molecularGeometry,
    idealAngles: idealAnglesFor(angleContext),
    expectedAngles: withRingAngle(expectedAngles(angleContext), ringSize),
    hybridization,
    ...(stericNumber >= 5
      ? { hybridizationNote: EXPANDED_NOTE }
      : delocalised
        ? { hybridizationNote: CONJUGATED_NOTE }
        : {}),
  };
  if (signature !== undefined) {
    if (centreMemo.size >= CENTRE_MEMO_LIMIT) centreMemo.clear();
    centreMemo.set(signature, { centre, sites });
  }
  return { centre, ligands, sites };
}

const CENTRE_MEMO_LIMIT = 5_000;
const SHARED_CENTRE_MIN_ATOMS = 12;
const centreMemo = new Map<string, { readonly centre: CentreAnalysis; readonly sites: SiteAssignment }>();

/**
 * Multiple bonds at a centre, counting a negatively charged single-bonded partner of a multiply
 * bonded element as one too: in NO2- or the NO2 group of HNO3 the two N-O bonds are resonance
 * partners and both open the angle between them.
 */
function countMultipleBondsWithResonance(graph: MolecularGraph, ligands: readonly Ligand[]): number {
  const multiplyBonded = new Set(ligands.filter((l) => l.bondOrder > 1).map((l) => l.symbol));
  return ligands.filter(
    (l) => l.bondOrder > 1 || (multiplyBonded.has(l.symbol) && graph.atoms[l.atom].formalCharge < 0),
  ).length;
}

/** Rings this small force their interior angle on the atom, whatever its hybridization. */
const STRAINED_RING_LIMIT = 5;

/**
 * Size of the smallest ring through the centre (3 to 5), found by a breadth-first search from
 * each neighbour back to another neighbour without passing the centre; undefined otherwise.
 */
function smallestRingThrough(graph: MolecularGraph, centre: number, ligands: readonly Ligand[]): number | undefined {
  const index = graphIndex(graph);
  if (!index.mayHaveRings || ligands.length < 2 || ringAtoms(graph)[centre] === 0) return undefined;
  // Depth-limited search with a reused stamp array instead of a Map per start: ring atoms are
  // most atoms of a drug-sized molecule.
  const { stamp, depthOf } = scratchFor(graph.atoms.length);
  let best: number | undefined;
  for (const start of ligands) {
    if (index.neighbours[start.atom].length < 2) continue; // a terminal atom closes no ring
    const mark = ++stampCounter;
    stamp[start.atom] = mark;
    depthOf[start.atom] = 0;
    let frontier = [start.atom];
    for (let depth = 1; depth <= STRAINED_RING_LIMIT - 2 && frontier.length > 0; depth++) {
      const next: number[] = [];
      for (const atom of frontier) {
        for (const { atom: other } of index.neighbours[atom]) {
          if (other === centre || stamp[other] === mark) continue;
          stamp[other] = mark;
          depthOf[other] = depth;
          next.push(other);
        }
      }
      frontier = next;
    }
    for (const end of ligands) {
      if (end.atom === start.atom || stamp[end.atom] !== mark) continue;
      const size = depthOf[end.atom] + 2;
      if (best === undefined || size < best) best = size;
    }
  }
  return best;
}

let stampCounter = 0;
let scratch = { stamp: new Int32Array(64), depthOf: new Int8Array(64) };

function scratchFor(atomCount: number): { stamp: Int32Array; depthOf: Int8Array } {
  if (scratch.stamp.length < atomCount || stampCounter > 2_000_000_000) {
    scratch = { stamp: new Int32Array(Math.max(atomCount, 2 * scratch.stamp.length)), depthOf: new Int8Array(Math.max(atomCount, 2 * scratch.stamp.length)) };
    stampCounter = 0;
  }
  return scratch;
}

/** Add the interior angle of a small ring the centre sits in (60° in C3, about 88° in C4). */
function withRingAngle(angles: AngleExpectation[], ringSize: number | undefined): AngleExpectation[] {
  if (ringSize === undefined || angles.length === 0) return angles;
  const polygon = 180 - 360 / ringSize;
  return [
    ...angles,
    {
      // Still measured against the electron geometry's ideal; the ring pulls it far below.
      ideal: angles[0].ideal,
      min: Math.round((polygon - 4) * 10) / 10,
      max: Math.round((polygon + 4) * 10) / 10,
      note: `held near the interior angle of its ${ringSize}-membered ring (ring strain)`,
      between: `in ${ringSize}-membered ring`,
    },
  ];
}
