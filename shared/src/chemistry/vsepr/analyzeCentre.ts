/**
 * The VSEPR description of one atom with two or more neighbours in a Lewis structure.
 */
import { graphIndex, ringAtoms } from "../graphIndex";
import { atomTraits } from "../lewis/electronBookkeeping";
import type { AngleExpectation, CentreAnalysis, MolecularGraph } from "../types";
import { lonePairJoinsPiSystem } from "./piSystems";
import { oddElectronSite, oddElectronTakesSite } from "./oddElectron";
import { assignSites, type Ligand, type SiteAssignment } from "./assignSites";
import { expectedAngles, idealAnglesFor, type AngleContext } from "./expectedAngles";
import { axeNotation, ELECTRON_GEOMETRY_BY_STERIC_NUMBER, HYBRIDIZATION_BY_STERIC_NUMBER, molecularGeometryFor } from "./shapeTables";

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
  const described = describeCentre(graph, index, radical);
  if (described === undefined) return undefined;
  const { alike, ligands, sites } = described;
  return { centre: alike.index === index ? alike : { ...alike, index }, ligands, sites };
}

/**
 * A centre's description as worked out, possibly shared with other centres alike in their
 * surroundings: `alike` says everything about this centre except, when shared, its `index`.
 */
export interface SharedCentreDetail {
  readonly alike: CentreAnalysis;
  readonly ligands: readonly Ligand[];
  readonly sites: SiteAssignment;
}

/**
 * Like analyzeCentre, without making this centre its own copy of a shared description: for
 * callers that keep only what differs (the index) until the centre itself is asked for.
 */
export function describeCentre(graph: MolecularGraph, index: number, radical: boolean): SharedCentreDetail | undefined {
  const atom = graph.atoms[index];
  const { neighbours } = graphIndex(graph);
  const ligands: readonly Ligand[] = neighbours[index];
  if (ligands.length < 2) return undefined;
  // A lone pair shared with a neighbouring pi system (amide N, pyrrole N, furan O) sits in a
  // p orbital, so it takes no site of its own: the atom is sp2 and planar.
  const delocalised = lonePairJoinsPiSystem(graph, index) ? 1 : 0;
  // An odd electron takes a (weak) site of its own beside lone pairs (NO2), on a two-neighbour
  // atom (HCO is bent) or among electronegative neighbours (CF3 is pyramidal); the methyl
  // radical keeps it in a p orbital and stays planar.
  const oddElectronDomain = oddElectronTakesSite(oddElectronSite(graph, index)) ? 1 : 0;
  const loneDomains = atom.lonePairs - delocalised + oddElectronDomain;
  const stericNumber = ligands.length + loneDomains;
  const electronGeometry = ELECTRON_GEOMETRY_BY_STERIC_NUMBER[stericNumber];
  const molecularGeometry = molecularGeometryFor(stericNumber, loneDomains);
  if (!electronGeometry || !molecularGeometry) return undefined;

  const traits = atomTraits(atom.symbol);
  const multipleBondCount = countMultipleBondsWithResonance(graph, ligands);
  // Heavier neighbours, or two groups with their own substituents (C-O-C in CH3OCH3).
  const centrePeriod = traits.element.period;
  let heavierNeighbour = false;
  let substitutedGroups = 0;
  for (let k = 0; k < ligands.length; k++) {
    const ligand = ligands[k];
    if (atomTraits(ligand.symbol).element.period > centrePeriod) heavierNeighbour = true;
    if (ligand.symbol !== "H" && neighbours[ligand.atom].length > 1) substitutedGroups++;
  }
  const bulkyNeighbours = heavierNeighbour || substitutedGroups >= 2;
  const ringSize = smallestRingThrough(graph, index, ligands);
  const equalByResonance = bondsEqualByResonance(graph, ligands, neighbours);

  // Everything below depends only on these facts, so centres alike in them (the many CH2 and
  // aromatic CH of a large molecule) share one worked-out description.
  // Small species have one or two centres: for them the bookkeeping costs more than it saves.
  let memoKey: CentreKey | undefined;
  if (graph.atoms.length >= SHARED_CENTRE_MIN_ATOMS) {
    memoKey = centreKey(
      traits.element.atomicNumber,
      atom.lonePairs,
      atom.unpairedElectrons,
      oddElectronDomain,
      delocalised,
      radical,
      multipleBondCount,
      bulkyNeighbours,
      ringSize,
      equalByResonance,
      ligands,
    );
    if (memoKey !== undefined) {
      const known = centreMemo.get(memoKey.facts)?.get(memoKey.ligands);
      if (known) return { alike: known.centre, ligands, sites: known.sites };
    }
  }

  const sites = assignSites(electronGeometry, loneDomains, ligands);
  const first = ligands[0];
  // Bonds resonance makes equal count as identical: NO3- has three equal N-O bonds, not one
  // double bond pushing two single ones together.
  const identicalNeighbours = equalByResonance || ligands.every((l) => l.symbol === first.symbol && l.bondOrder === first.bondOrder);
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
    hasMultipleBond: !equalByResonance && ligands.some((l) => l.bondOrder > 1),
    multipleBondCount,
    bulkyNeighbours,
    radical,
    loneDomainIsOddElectron: oddElectronDomain === 1 && loneDomains === 1,
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
    ...(stericNumber >= 5 ? { hybridizationNote: EXPANDED_NOTE } : delocalised ? { hybridizationNote: CONJUGATED_NOTE } : {}),
  };
  if (memoKey !== undefined) rememberCentre(memoKey, { centre, sites });
  return { alike: centre, ligands, sites };
}

const CENTRE_MEMO_LIMIT = 5_000;
const SHARED_CENTRE_MIN_ATOMS = 12;

interface KnownCentre {
  readonly centre: CentreAnalysis;
  readonly sites: SiteAssignment;
}

/**
 * A centre's surroundings as two small integers, so that looking up a shared description
 * builds no string: `facts` packs the centre's own facts, `ligands` the element and bond order
 * of each neighbour in order (through a small table of the pairs seen so far).
 */
interface CentreKey {
  readonly facts: number;
  readonly ligands: number;
}

// Remembered descriptions: by facts, then by the ligand list. Bound: CENTRE_MEMO_LIMIT entries,
// then it starts again empty; the ligand codes are at most MAX_LIGAND_CODES.
const centreMemo = new Map<number, Map<number, KnownCentre>>();
let centreMemoSize = 0;
// Element-and-bond-order pairs of ligands, numbered 1..MAX_LIGAND_CODES as they are first seen.
const ligandCodes = new Map<number, number>();
const MAX_LIGAND_CODES = 31;
// Five bits per ligand; six ligands keep the packed list inside a small integer.
const MAX_KEYED_LIGANDS = 6;

/** The key of a centre, or undefined when its facts do not fit (it is then worked out afresh). */
function centreKey(
  atomicNumber: number,
  lonePairs: number,
  unpairedElectrons: number,
  oddElectronDomain: number,
  delocalised: number,
  radical: boolean,
  multipleBondCount: number,
  bulkyNeighbours: boolean,
  ringSize: number | undefined,
  equalByResonance: boolean,
  ligands: readonly Ligand[],
): CentreKey | undefined {
  if (ligands.length > MAX_KEYED_LIGANDS || lonePairs > 7 || unpairedElectrons > 1 || multipleBondCount > 7) return undefined;
  if (atomicNumber < 1 || atomicNumber > 127) return undefined;
  const ring = ringSize === undefined ? 0 : ringSize - 2; // 3, 4, 5 -> 1, 2, 3
  if (ring < 0 || ring > 3) return undefined;
  let facts = atomicNumber;
  facts = facts * 8 + lonePairs;
  facts = facts * 2 + unpairedElectrons;
  // Whether the odd electron takes a site can turn on the neighbours' neighbours (a pi system).
  facts = facts * 2 + oddElectronDomain;
  facts = facts * 2 + delocalised;
  facts = facts * 2 + (radical ? 1 : 0);
  facts = facts * 8 + multipleBondCount;
  facts = facts * 2 + (bulkyNeighbours ? 1 : 0);
  facts = facts * 4 + ring;
  facts = facts * 2 + (equalByResonance ? 1 : 0);
  let packed = 0;
  for (let k = 0; k < ligands.length; k++) {
    const ligand = ligands[k];
    const order = ligand.bondOrder;
    if (order < 1 || order > 4) return undefined;
    const pair = atomTraits(ligand.symbol).element.atomicNumber * 4 + (order - 1);
    let code = ligandCodes.get(pair);
    if (code === undefined) {
      if (ligandCodes.size >= MAX_LIGAND_CODES) {
        // Full: start both tables afresh rather than stop sharing for good.
        ligandCodes.clear();
        centreMemo.clear();
        centreMemoSize = 0;
        return undefined;
      }
      code = ligandCodes.size + 1;
      ligandCodes.set(pair, code);
    }
    packed = packed * 32 + code;
  }
  return { facts, ligands: packed };
}

function rememberCentre(key: CentreKey, known: KnownCentre): void {
  if (centreMemoSize >= CENTRE_MEMO_LIMIT) {
    centreMemo.clear();
    centreMemoSize = 0;
  }
  let byLigands = centreMemo.get(key.facts);
  if (!byLigands) {
    byLigands = new Map();
    centreMemo.set(key.facts, byLigands);
  }
  byLigands.set(key.ligands, known);
  centreMemoSize++;
}

/**
 * Multiple bonds at a centre, counting a negatively charged single-bonded partner of a multiply
 * bonded element as one too: in NO2- or the NO2 group of HNO3 the two N-O bonds are resonance
 * partners and both open the angle between them.
 */
function countMultipleBondsWithResonance(graph: MolecularGraph, ligands: readonly Ligand[]): number {
  let multiple = 0;
  for (let k = 0; k < ligands.length; k++) if (ligands[k].bondOrder > 1) multiple++;
  if (multiple === 0) return 0;
  let count = 0;
  for (let k = 0; k < ligands.length; k++) {
    const ligand = ligands[k];
    if (ligand.bondOrder > 1) count++;
    else if (graph.atoms[ligand.atom].formalCharge < 0 && multiplyBondedElement(ligands, ligand.symbol)) count++;
  }
  return count;
}

/**
 * Whether resonance makes every bond of a centre alike: its neighbours are all one element, each
 * bonded to nothing else, and each is multiply bonded or a single-bonded anion beside a multiply
 * bonded one (the O atoms of NO3-, CO3^2-, SO4^2-, O3), so the structures shift the multiple bond
 * among them. Not when the bonds are already alike.
 */
function bondsEqualByResonance(graph: MolecularGraph, ligands: readonly Ligand[], neighbours: readonly (readonly Ligand[])[]): boolean {
  const first = ligands[0];
  let multiple = false;
  let single = false;
  for (let k = 0; k < ligands.length; k++) {
    const ligand = ligands[k];
    if (ligand.symbol !== first.symbol || neighbours[ligand.atom].length !== 1) return false;
    if (ligand.bondOrder > 1) multiple = true;
    else if (graph.atoms[ligand.atom].formalCharge < 0) single = true;
    else return false;
  }
  if (!multiple || !single) return false;
  // The multiple bonds must all be of one order (a double bond that moves, not a triple beside a double).
  const order = ligands.find((ligand) => ligand.bondOrder > 1)!.bondOrder;
  return ligands.every((ligand) => ligand.bondOrder === 1 || ligand.bondOrder === order);
}

function multiplyBondedElement(ligands: readonly Ligand[], symbol: string): boolean {
  for (let k = 0; k < ligands.length; k++) if (ligands[k].bondOrder > 1 && ligands[k].symbol === symbol) return true;
  return false;
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
  // Depth-limited search with reused stamp and queue arrays instead of a Map or new lists per
  // start: ring atoms are most atoms of a drug-sized molecule.
  const { stamp, depthOf, queue } = scratchFor(graph.atoms.length);
  const neighbours = index.neighbours;
  let best: number | undefined;
  for (let s = 0; s < ligands.length; s++) {
    const start = ligands[s].atom;
    if (neighbours[start].length < 2) continue; // a terminal atom closes no ring
    const mark = ++stampCounter;
    stamp[start] = mark;
    depthOf[start] = 0;
    queue[0] = start;
    let head = 0;
    let tail = 1;
    while (head < tail) {
      const atom = queue[head++];
      const depth = depthOf[atom] + 1;
      if (depth > STRAINED_RING_LIMIT - 2) break; // breadth first: every later atom is as deep
      const around = neighbours[atom];
      for (let k = 0; k < around.length; k++) {
        const other = around[k].atom;
        if (other === centre || stamp[other] === mark) continue;
        stamp[other] = mark;
        depthOf[other] = depth;
        queue[tail++] = other;
      }
    }
    for (let e = 0; e < ligands.length; e++) {
      const end = ligands[e].atom;
      if (end === start || stamp[end] !== mark) continue;
      const size = depthOf[end] + 2;
      if (best === undefined || size < best) best = size;
    }
  }
  return best;
}

let stampCounter = 0;
let scratch = { stamp: new Int32Array(64), depthOf: new Int8Array(64), queue: new Int32Array(64) };

function scratchFor(atomCount: number): { stamp: Int32Array; depthOf: Int8Array; queue: Int32Array } {
  if (scratch.stamp.length < atomCount || stampCounter > 2_000_000_000) {
    const size = Math.max(atomCount, 2 * scratch.stamp.length);
    scratch = { stamp: new Int32Array(size), depthOf: new Int8Array(size), queue: new Int32Array(size) };
    stampCounter = 0;
  }
  return scratch;
}

/** Add the interior angle of a small ring the centre sits in (60° in C3, about 88° in C4). */
function withRingAngle(angles: readonly AngleExpectation[], ringSize: number | undefined): readonly AngleExpectation[] {
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
