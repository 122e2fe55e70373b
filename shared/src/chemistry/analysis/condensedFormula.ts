/**
 * Condensed structural formulas (CH3COOH, (CH3)2CO, C(CH3)4, CH2=CH2, HOOH) to the skeletons they
 * allow. The text fixes which hydrogens sit on which atom and the order of the heavy atoms; the
 * parent of each heavy atom is left open among earlier atoms that still have room, and the Lewis
 * search then picks the skeleton with the best formal charges (COOH is C(=O)OH, not C-O-O-H).
 */
import { atomTraits } from "../lewis/electronBookkeeping";
import type { CandidateSkeleton } from "../lewis/candidateSkeletons";

/** A heavy atom with the hydrogens written after it, or a parenthesised group repeated. */
interface Unit {
  readonly symbol: string;
  readonly hydrogens: number;
  /** Groups written in parentheses right after this atom: C(CH3)4, CH(OH). */
  readonly branches: Unit[][];
}

interface ParsedSequence {
  readonly units: Unit[];
  /** Groups written before the first atom of the sequence: (CH3)2CO. */
  readonly leadingBranches: Unit[][];
}

const MAX_HEAVY_ATOMS = 14;
const MAX_SKELETONS = 4_000;

/** Most neighbours an atom may have in a condensed formula, hydrogens included. */
function maxNeighbours(symbol: string): number {
  const traits = atomTraits(symbol);
  if (traits.isHalogen) return 1;
  switch (traits.element.group) {
    case 13:
      return 4;
    case 14:
      return 4;
    case 15:
      return traits.element.period === 2 ? 4 : 5;
    case 16:
      return traits.element.period === 2 ? 3 : 6;
    default:
      return 4;
  }
}

/**
 * True when the written groups show structure: an element in two places, a bond mark, or a nitro
 * group written after a carbon group (CH3NO2, CH3CH2NO2).
 */
export function looksCondensed(sequence: readonly { symbol: string; count?: number }[]): boolean {
  const seen = new Set<string>();
  for (let k = 0; k < sequence.length; k++) {
    const part = sequence[k];
    if (part.symbol === "=" || part.symbol === "≡") return true;
    if (seen.has(part.symbol)) return true;
    if (seen.has("C") && isNitroAt(sequence, k)) return true;
    seen.add(part.symbol);
  }
  return false;
}

/** N then O2, not followed by hydrogen: the nitro group, N bonded to both oxygens. */
function isNitroAt(sequence: readonly { symbol: string; count?: number }[], index: number): boolean {
  const nitrogen = sequence[index];
  const oxygen = sequence[index + 1];
  return (
    nitrogen.symbol === "N" &&
    (nitrogen.count ?? 1) === 1 &&
    oxygen?.symbol === "O" &&
    oxygen.count === 2 &&
    sequence[index + 2]?.symbol !== "H"
  );
}

/** Parse the body of a condensed formula (no charge); undefined when it is not one we read. */
function parseCondensed(text: string): ParsedSequence | undefined {
  let position = 0;
  const readCount = (): number => {
    let value = 0;
    let digits = 0;
    while (position < text.length && text[position] >= "0" && text[position] <= "9") {
      value = value * 10 + (text.charCodeAt(position) - 48);
      position++;
      digits++;
    }
    return digits === 0 ? 1 : value;
  };
  const readSymbol = (): string | undefined => {
    const first = text[position];
    if (!first || first < "A" || first > "Z") return undefined;
    const second = text[position + 1];
    if (second && second >= "a" && second <= "z") {
      position += 2;
      return first + second;
    }
    position++;
    return first;
  };

  const readSequence = (closing: string | undefined): ParsedSequence | undefined => {
    const units: Unit[] = [];
    const leadingBranches: Unit[][] = [];
    let leadingHydrogens = 0;
    while (position < text.length) {
      const character = text[position];
      if (character === closing) return finish();
      if (character === "=" || character === "≡" || character === "#" || character === "-") {
        position++;
        continue;
      }
      if (character === "(" || character === "[") {
        position++;
        const inner = readSequence(character === "(" ? ")" : "]");
        if (!inner || text[position] !== (character === "(" ? ")" : "]")) return undefined;
        position++;
        const copies = readCount();
        if (inner.leadingBranches.length > 0 || inner.units.length === 0) return undefined;
        for (let k = 0; k < copies; k++) {
          const copy = cloneUnits(inner.units);
          if (units.length === 0) leadingBranches.push(copy);
          else units[units.length - 1].branches.push(copy);
        }
        continue;
      }
      const symbol = readSymbol();
      if (!symbol) return undefined;
      const count = readCount();
      if (symbol === "H") {
        if (units.length === 0) leadingHydrogens += count;
        else (units[units.length - 1] as { hydrogens: number }).hydrogens += count;
        continue;
      }
      // Halogens after an atom are its substituents, like hydrogens: CF3COOH, CCl3CH2OH.
      if (atomTraits(symbol).isHalogen && units.length > 0 && count > 1) {
        for (let k = 0; k < count; k++) units[units.length - 1].branches.push([{ symbol, hydrogens: 0, branches: [] }]);
        continue;
      }
      // NO2 after another atom is a nitro group: both oxygens on the nitrogen (CH3NO2 is
      // CH3-NO2, not carbamic acid). A leading N (HNO2, HNO3) is left to the formula path, and
      // NO2H to the open search.
      const previous = units[units.length - 1];
      if (
        symbol === "O" &&
        count === 2 &&
        previous?.symbol === "N" &&
        previous.hydrogens === 0 &&
        previous.branches.length === 0 &&
        (units.length >= 2 || closing !== undefined) &&
        text[position] !== "H"
      ) {
        previous.branches.push([{ symbol, hydrogens: 0, branches: [] }], [{ symbol, hydrogens: 0, branches: [] }]);
        continue;
      }
      // "C2H5" hides its own connectivity; leave such formulas to the molecular-formula path.
      if (count !== 1) return undefined;
      units.push({ symbol, hydrogens: 0, branches: [] });
      if (leadingHydrogens > 0) {
        (units[0] as { hydrogens: number }).hydrogens += leadingHydrogens;
        leadingHydrogens = 0;
      }
    }
    return closing === undefined ? finish() : undefined;

    function finish(): ParsedSequence | undefined {
      if (leadingHydrogens > 0) return undefined;
      return { units, leadingBranches };
    }
  };

  const parsed = readSequence(undefined);
  if (!parsed || position !== text.length || parsed.units.length === 0) return undefined;
  return parsed;
}

function cloneUnits(units: readonly Unit[]): Unit[] {
  return units.map((unit) => ({
    symbol: unit.symbol,
    hydrogens: unit.hydrogens,
    branches: unit.branches.map(cloneUnits),
  }));
}

interface FlatAtom {
  readonly symbol: string;
  /** Fixed parent (branch roots, atoms of a group), or -1 when the search chooses it. */
  readonly fixedParent: number;
  /** Earlier atoms this one may bond to when its parent is open. */
  readonly parentChoices: readonly number[];
  readonly hydrogens: number;
}

/**
 * Lay the units out as atoms: heavy atoms in written order, hydrogens appended after them.
 * Returns undefined when the formula is too large to search.
 */
function flatten(parsed: ParsedSequence): FlatAtom[] | undefined {
  const atoms: FlatAtom[] = [];
  const placeSequence = (units: readonly Unit[], anchor: number): number[] => {
    const placed: number[] = [];
    units.forEach((unit, k) => {
      const index = atoms.length;
      const fixedParent = k === 0 ? anchor : -1;
      atoms.push({ symbol: unit.symbol, fixedParent, parentChoices: [...placed], hydrogens: unit.hydrogens });
      placed.push(index);
      for (const branch of unit.branches) placeSequence(branch, index);
    });
    return placed;
  };
  // Leading groups hang on the first atom of the main chain, whose index is not known yet:
  // place the main chain first, then the leading groups anchored to its first atom.
  const main = placeSequence(parsed.units, -1);
  for (const branch of parsed.leadingBranches) placeSequence(branch, main[0]);
  if (atoms.length > MAX_HEAVY_ATOMS) return undefined;
  return atoms;
}

/** Skeletons a condensed formula allows, or undefined when the text is not one. */
export function condensedSkeletons(formulaText: string): CandidateSkeleton[] | undefined {
  const caret = formulaText.indexOf("^");
  const body = caret >= 0 ? formulaText.slice(0, caret) : formulaText;
  // CO2H and CO2- are the carboxyl group written short: C(=O)OH and C(=O)O-.
  const parsed = parseCondensed(body.replace(/CO2(?=H|$|[-−+]|C)/g, "COO"));
  if (!parsed) return undefined;
  const atoms = flatten(parsed);
  if (!atoms || atoms.length < 2) return undefined;

  const heavyCount = atoms.length;
  const room = atoms.map((atom) => maxNeighbours(atom.symbol) - atom.hydrogens);
  if (room.some((value) => value < 0)) return undefined;
  const used = new Array<number>(heavyCount).fill(0);
  const parents = new Array<number>(heavyCount).fill(-1);
  const skeletons: CandidateSkeleton[] = [];

  const symbols: string[] = atoms.map((atom) => atom.symbol);
  const hydrogenOwners: number[] = [];
  atoms.forEach((atom, index) => {
    for (let k = 0; k < atom.hydrogens; k++) {
      symbols.push("H");
      hydrogenOwners.push(index);
    }
  });

  const emit = () => {
    const bonds: [number, number][] = [];
    for (let atom = 1; atom < heavyCount; atom++) if (parents[atom] >= 0) bonds.push([parents[atom], atom]);
    hydrogenOwners.forEach((owner, k) => bonds.push([owner, heavyCount + k]));
    // The centre reported first is the atom with the most neighbours.
    const degree = new Array<number>(symbols.length).fill(0);
    for (const [a, b] of bonds) {
      degree[a]++;
      degree[b]++;
    }
    const centre = degree.indexOf(Math.max(...degree));
    skeletons.push({ symbols, bonds, centre });
  };

  const visit = (atom: number) => {
    if (skeletons.length >= MAX_SKELETONS) return;
    if (atom === heavyCount) {
      emit();
      return;
    }
    const flat = atoms[atom];
    const fixed = flat.fixedParent;
    const choices = atom === 0 && fixed < 0 ? [] : fixed >= 0 ? [fixed] : [...flat.parentChoices].reverse();
    if (atom > 0 && choices.length === 0) return;
    if (atom === 0 && fixed < 0) {
      visit(1);
      return;
    }
    for (const parent of choices) {
      if (used[parent] >= room[parent] || used[atom] >= room[atom]) continue;
      used[parent]++;
      used[atom]++;
      parents[atom] = parent;
      visit(atom + 1);
      parents[atom] = -1;
      used[parent]--;
      used[atom]--;
    }
  };
  visit(0);
  return skeletons;
}
