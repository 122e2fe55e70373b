/**
 * Ideal bond angles of a centre and how far the real ones are expected to move: lone pairs
 * squeeze the bonds together, multiple bonds take more room than single ones, unlike neighbours
 * break the symmetry, and an odd electron repels less than a pair. The ranges are deliberately
 * generous model bounds, not predictions of a single number.
 */
import { angleDegrees, type Vec3 } from "../geometry/vectors";
import type { SiteKind } from "../geometry/idealDirections";
import type { AngleExpectation, ElectronGeometry } from "../types";

export interface AngleContext {
  readonly electronGeometry: ElectronGeometry;
  readonly stericNumber: number;
  readonly loneDomains: number;
  /** True when the lone pairs sit symmetrically (XeF2, XeF4, I3-), so they push equally. */
  readonly lonePairsBalanced: boolean;
  readonly centrePeriod: number;
  /** All neighbours the same element with the same bond order. */
  readonly identicalNeighbours: boolean;
  readonly hasMultipleBond: boolean;
  /** Two or more multiple bonds: the angle between them opens wide (O-S-O in SO2Cl2). */
  readonly multipleBondCount: number;
  /** Some neighbour is from a later period than the centre (Cl on O in Cl2O). */
  readonly bulkyNeighbours: boolean;
  readonly radical: boolean;
  /** The one non-bonding domain is a single electron, not a pair (HCO, BH2). */
  readonly loneDomainIsOddElectron: boolean;
  readonly ligandDirections: readonly Vec3[];
  readonly ligandSiteKinds: readonly SiteKind[];
}

const round1 = (value: number) => Math.round(value * 10) / 10;

function pairLabel(context: AngleContext, i: number, j: number, ideal: number): string | undefined {
  const g = context.electronGeometry;
  if (g === "trigonal bipyramidal" || g === "pentagonal bipyramidal") {
    const kinds = [context.ligandSiteKinds[i], context.ligandSiteKinds[j]].sort();
    return kinds.join("-");
  }
  if (g === "octahedral") return ideal > 135 ? "trans" : "cis";
  return undefined;
}

/**
 * The expected angles of a centre. The list depends only on a handful of small facts of the
 * context, so it is worked out once per combination of them and then shared, read-only, by every
 * centre alike in those facts (the many species of a table share a few dozen lists).
 */
export function expectedAngles(context: AngleContext): readonly AngleExpectation[] {
  const key = expectationKey(context);
  if (key < 0) return workOutExpectedAngles(context);
  let byKey = expectationMemo.get(context.electronGeometry);
  if (byKey === undefined) {
    byKey = new Map();
    expectationMemo.set(context.electronGeometry, byKey);
  }
  let known = byKey.get(key);
  if (known === undefined) {
    known = workOutExpectedAngles(context);
    byKey.set(key, known);
  }
  return known;
}

function workOutExpectedAngles(context: AngleContext): AngleExpectation[] {
  return angleGroups(context).map(({ ideal, between }) => {
    const { min, max, note } = rangeFor(context, ideal, between);
    return between ? { ideal, min, max, note, between } : { ideal, min, max, note };
  });
}

// Remembered lists: by electron geometry, then by the packed facts below. Bound: the packed facts
// are a few small counts, so there are at most a few thousand lists for each of the geometries.
const expectationMemo = new Map<string, Map<number, readonly AngleExpectation[]>>();

/**
 * Every fact of the context that angleGroups and rangeFor read, packed into one small integer
 * (the electron geometry is the outer key); -1 when some fact is out of the packed range.
 */
function expectationKey(context: AngleContext): number {
  const { stericNumber, loneDomains, centrePeriod } = context;
  if (stericNumber < 0 || stericNumber > 15 || loneDomains < 0 || loneDomains > 15) return -1;
  if (centrePeriod < 0 || centrePeriod > 15) return -1;
  let key = stericNumber;
  key = key * 16 + loneDomains;
  key = key * 16 + centrePeriod;
  key = key * 2 + (context.lonePairsBalanced ? 1 : 0);
  key = key * 2 + (context.identicalNeighbours ? 1 : 0);
  key = key * 2 + (context.hasMultipleBond ? 1 : 0);
  key = key * 2 + (context.multipleBondCount >= 2 ? 1 : 0);
  key = key * 2 + (context.bulkyNeighbours ? 1 : 0);
  key = key * 2 + (context.radical ? 1 : 0);
  key = key * 2 + (context.loneDomainIsOddElectron ? 1 : 0);
  return key;
}

interface AngleGroup {
  readonly ideal: number;
  readonly between?: string;
}

// The set of bonded sites depends only on the electron geometry and the number of lone-pair
// domains, so the kinds of angle a centre has are worked out once per pair of those (bound: the
// geometries times at most seven lone-pair counts).
const angleGroupCache = new Map<string, readonly AngleGroup[]>();

function angleGroups(context: AngleContext): readonly AngleGroup[] {
  const key = `${context.electronGeometry}|${context.loneDomains}`;
  const cached = angleGroupCache.get(key);
  if (cached) return cached;
  const groups = new Map<string, AngleGroup>();
  const directions = context.ligandDirections;
  for (let i = 0; i < directions.length; i++) {
    for (let j = i + 1; j < directions.length; j++) {
      const ideal = round1(angleDegrees(directions[i], directions[j]));
      const between = pairLabel(context, i, j, ideal);
      groups.set(`${ideal}|${between ?? ""}`, between ? { ideal, between } : { ideal });
    }
  }
  const sorted = [...groups.values()].sort((a, b) => a.ideal - b.ideal);
  angleGroupCache.set(key, sorted);
  return sorted;
}

/**
 * Distinct ideal angles of a centre, ascending, from its cached angle groups; one shared,
 * read-only list per electron geometry and number of lone-pair domains.
 */
export function idealAnglesFor(context: AngleContext): readonly number[] {
  let byLoneDomains = idealAnglesMemo.get(context.electronGeometry);
  if (byLoneDomains === undefined) {
    byLoneDomains = [];
    idealAnglesMemo.set(context.electronGeometry, byLoneDomains);
  }
  const small = context.loneDomains >= 0 && context.loneDomains < 16;
  const known = small ? byLoneDomains[context.loneDomains] : undefined;
  if (known !== undefined) return known;
  const angles = [...new Set(angleGroups(context).map((group) => group.ideal))];
  if (small) byLoneDomains[context.loneDomains] = angles;
  return angles;
}

// Bound: one list per electron geometry and number of lone-pair domains.
const idealAnglesMemo = new Map<string, (readonly number[] | undefined)[]>();

function rangeFor(context: AngleContext, ideal: number, between: string | undefined): { min: number; max: number; note: string } {
  const symmetric = context.identicalNeighbours && (context.loneDomains === 0 || context.lonePairsBalanced) && !context.radical;
  if (symmetric) return { min: ideal, max: ideal, note: "fixed by symmetry" };

  let min = ideal;
  let max = ideal;
  // Which of the notes apply, in order; the joined text is made once per combination and then
  // shared, since every centre with the same reasons gets the same words.
  let lonePairNote = 0; // 0 none, 1 bent axis, 2 squeezed angles
  let bulkyNote = 0;
  let neighbourNote = 0; // 0 none, 1 multiple bond, 2 unlike neighbours
  let radicalNote = 0;
  if (context.loneDomains > 0 && !context.lonePairsBalanced) {
    const squeeze = lonePairSqueeze(context, ideal, between);
    min = ideal - squeeze.down;
    max = Math.min(180, ideal + squeeze.up);
    // A lone single electron has the radical note below instead.
    lonePairNote = context.loneDomainIsOddElectron ? 0 : ideal >= 170 ? 1 : 2;
    if (context.bulkyNeighbours && ideal < 170) {
      max += 4;
      bulkyNote = 1;
    }
  }
  if (!context.identicalNeighbours || context.hasMultipleBond) {
    const spread = ideal >= 170 ? 10 : ideal <= 90 ? 6 : ideal >= 120 ? 14 : 10;
    min = Math.min(min, ideal - spread);
    const opening = context.multipleBondCount >= 2 ? 18 : context.hasMultipleBond ? 6 : 5;
    if (ideal < 170) max = Math.max(max, ideal + opening);
    neighbourNote = context.hasMultipleBond ? 1 : 2;
  }
  if (context.radical) {
    max = Math.min(180, max + 15);
    min -= 5;
    radicalNote = 1;
  }
  const note = joinedNote(lonePairNote, bulkyNote, neighbourNote, radicalNote);
  return { min: round1(min), max: round1(Math.min(180, max)), note };
}

// Bound: one note per combination of four small counts (the key packs them).
const joinedNotes: string[] = [];

function joinedNote(lonePair: number, bulky: number, neighbour: number, radical: number): string {
  const key = ((lonePair * 2 + bulky) * 3 + neighbour) * 2 + radical;
  const known = joinedNotes[key];
  if (known !== undefined) return known;
  const notes: string[] = [];
  if (lonePair === 1) notes.push("lone pairs bend the axis slightly");
  if (lonePair === 2) notes.push("lone pairs repel more than bonds and squeeze the bond angles below ideal");
  if (bulky === 1) notes.push("large neighbours can hold the angle open a little");
  if (neighbour === 1) notes.push("a multiple bond takes more room and pushes the other bonds together");
  if (neighbour === 2) notes.push("unlike neighbours make the angles unequal");
  if (radical === 1) notes.push("a single electron repels less than a pair, so the angle can open past the ideal");
  const note = notes.join("; ") || "close to ideal";
  joinedNotes[key] = note;
  return note;
}

function lonePairSqueeze(context: AngleContext, ideal: number, between: string | undefined): { down: number; up: number } {
  if (ideal >= 170) return { down: between === "axial-axial" ? 20 : 30, up: 0 };
  switch (context.stericNumber) {
    case 3:
      return { down: context.centrePeriod >= 4 ? 30 : 12, up: 0 };
    case 4:
      // Heavier centres barely hybridise: PH3 and H2S sit near 90°. Two lone pairs on a small
      // centre squeeze harder (H-O-O in H2O2 is under 95°).
      return { down: context.centrePeriod >= 3 ? 22 : context.loneDomains >= 2 ? 15 : 10, up: 0 };
    case 5:
      return ideal > 100 ? { down: 25, up: 0 } : { down: 10, up: 0 };
    case 6:
      return { down: 12, up: 0 };
    default:
      return { down: 8, up: 2 };
  }
}
