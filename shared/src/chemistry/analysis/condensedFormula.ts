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
  /** Groups written right after this atom: C(CH3)4, CH(OH), the oxygens of SO2. */
  readonly branches: Branch[];
  /** The first carbon of a phenyl ring (C6H5): five CH atoms close the ring back onto it. */
  readonly phenyl?: boolean;
}

/** A group hanging on a unit; `repeat` > 0 for the second and later copies of a group. */
interface Branch {
  readonly units: Unit[];
  /**
   * True for a parenthesised group, which may bond to an earlier atom than the one it follows
   * (CO(NH2)2 is urea, the NH2 groups on carbon) and, repeated, may form a chain (CH3(CH2)4CH3).
   */
  readonly written: boolean;
  /** Copy number within a repeated group: 0 for the first. */
  readonly copy: number;
}

interface ParsedSequence {
  readonly units: Unit[];
  /** Groups written before the first atom of the sequence: (CH3)2CO. */
  readonly leadingBranches: Unit[][];
}

const MAX_HEAVY_ATOMS = 14;
const MAX_SKELETONS = 4_000;
/** Elements whose written On (n >= 2) are oxygens bonded to them: CH3SO2Cl, CH3NO2, (CH3)2SO2. */
const OXO_HOSTS: ReadonlySet<string> = new Set(["N", "S", "P", "Se"]);

/** Most neighbours an atom may have in a condensed formula, hydrogens included. */
function maxNeighbours(symbol: string): number {
  const traits = atomTraits(symbol);
  // Fluorine bonds once; the heavier halogens also centre oxides, interhalogens and polyhalides
  // (OClO, ClICl-, FBrF4), and formal charges keep them terminal elsewhere.
  if (traits.isHalogen) return symbol === "F" ? 1 : traits.element.period <= 4 ? 5 : 7;
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
 * True when the written groups show structure: an element in two places, a bond mark, an oxo
 * group written after a carbon group (CH3NO2, CH3SO2Cl, CH3SO3-), or an alkyl or phenyl group
 * followed by more atoms (C6H5Cl, C2H5Br).
 */
export function looksCondensed(sequence: readonly { symbol: string; count?: number }[]): boolean {
  const seen = new Set<string>();
  for (let k = 0; k < sequence.length; k++) {
    const part = sequence[k];
    if (part.symbol === "=" || part.symbol === "≡") return true;
    if (seen.has(part.symbol)) return true;
    if (seen.has("C") && isOxoGroupAt(sequence, k)) return true;
    if (k + 2 < sequence.length && isCarbonGroupAt(sequence, k)) return true;
    if (isNitrogenChainAt(sequence, k)) return true;
    seen.add(part.symbol);
  }
  return false;
}

/** N, S, P or Se then O2 or more: the oxygens are bonded to that atom (nitro, sulfonyl, ...). */
function isOxoGroupAt(sequence: readonly { symbol: string; count?: number }[], index: number): boolean {
  const host = sequence[index];
  const oxygen = sequence[index + 1];
  return (
    OXO_HOSTS.has(host.symbol) &&
    (host.count ?? 1) === 1 &&
    oxygen?.symbol === "O" &&
    (host.symbol === "N" ? oxygen.count === 2 : (oxygen.count ?? 1) >= 2)
  );
}

/**
 * CHn then N2 or N3: the nitrogens are a chain on that carbon, as the hydrogens written after it
 * are on it (CH2N2 is diazomethane, H2C=N=N; CH3N3 is methyl azide).
 */
function isNitrogenChainAt(sequence: readonly { symbol: string; count?: number }[], index: number): boolean {
  const [carbon, hydrogen, nitrogen] = [sequence[index], sequence[index + 1], sequence[index + 2]];
  return (
    carbon.symbol === "C" &&
    (carbon.count ?? 1) === 1 &&
    hydrogen?.symbol === "H" &&
    nitrogen?.symbol === "N" &&
    isNitrogenChainCount(nitrogen.count ?? 1)
  );
}

function isNitrogenChainCount(count: number): boolean {
  return count === 2 || count === 3;
}

/** CnH2n+1 (n >= 2) or C6H5: an alkyl or phenyl group written as one block. */
function isCarbonGroupAt(sequence: readonly { symbol: string; count?: number }[], index: number): boolean {
  const carbon = sequence[index];
  const hydrogen = sequence[index + 1];
  if (carbon.symbol !== "C" || hydrogen?.symbol !== "H") return false;
  return carbonGroupKind(carbon.count ?? 1, hydrogen.count ?? 1) !== undefined;
}

function carbonGroupKind(carbons: number, hydrogens: number): "alkyl" | "phenyl" | undefined {
  if (carbons === 6 && hydrogens === 5) return "phenyl";
  if (carbons >= 2 && carbons <= 6 && hydrogens === 2 * carbons + 1) return "alkyl";
  return undefined;
}

/** A straight-chain alkyl group as one CH2 unit carrying the rest of the chain: C2H5 is CH2-CH3. */
function alkylUnit(carbons: number): Unit {
  const rest: Unit[] = [];
  for (let k = 1; k < carbons; k++) rest.push({ symbol: "C", hydrogens: k === carbons - 1 ? 3 : 2, branches: [] });
  return { symbol: "C", hydrogens: 2, branches: [{ units: rest, written: false, copy: 0 }] };
}

/**
 * Whether an atom that already has a neighbour may take `child` as another. A halogen's bonds
 * beyond its first are to atoms at least as electronegative as itself (OClO, ClICl-, III-): a
 * carbon written after CH2Cl starts the next group (CH2ClCH2Cl, CH3CHClCH3). Flatten offers a
 * halogen as a parent only to the atom written right after it.
 */
function mayBondAgain(parent: string, child: string): boolean {
  const traits = atomTraits(parent);
  return !traits.isHalogen || atomTraits(child).electronegativity >= traits.electronegativity;
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
  const single = (symbol: string): Branch => ({ units: [{ symbol, hydrogens: 0, branches: [] }], written: false, copy: 0 });

  const readSequence = (closing: string | undefined): ParsedSequence | undefined => {
    const units: Unit[] = [];
    const leadingBranches: Unit[][] = [];
    let leadingHydrogens = 0;
    let leadingHydrogensGiven = false;
    // Oxygens just written after a host atom (the O3 of SO3H): hydrogens written next go on them.
    let oxoBranches: Branch[] = [];
    while (position < text.length) {
      const character = text[position];
      if (character === closing) return finish();
      if (character === "=" || character === "≡" || character === "#" || character === "-") {
        position++;
        oxoBranches = [];
        continue;
      }
      if (character === "(" || character === "[") {
        position++;
        oxoBranches = [];
        const inner = readSequence(character === "(" ? ")" : "]");
        if (!inner || text[position] !== (character === "(" ? ")" : "]")) return undefined;
        position++;
        const copies = readCount();
        if (inner.leadingBranches.length > 0 || inner.units.length === 0) return undefined;
        for (let k = 0; k < copies; k++) {
          const copy = cloneUnits(inner.units);
          if (units.length === 0) leadingBranches.push(copy);
          else units[units.length - 1].branches.push({ units: copy, written: true, copy: k });
        }
        continue;
      }
      const symbol = readSymbol();
      if (!symbol) return undefined;
      const count = readCount();
      if (symbol === "H") {
        if (oxoBranches.length > 0) {
          // SO3H, PO3H2: one hydrogen on each of the last oxygens written.
          if (count > oxoBranches.length) return undefined;
          for (let k = oxoBranches.length - count; k < oxoBranches.length; k++) {
            (oxoBranches[k].units[0] as { hydrogens: number }).hydrogens += 1;
          }
          oxoBranches = [];
        } else if (units.length === 0) leadingHydrogens += count;
        else (units[units.length - 1] as { hydrogens: number }).hydrogens += count;
        continue;
      }
      oxoBranches = [];
      // Halogens after an atom are its substituents, like hydrogens: CF3COOH, CCl3CH2OH.
      if (atomTraits(symbol).isHalogen && units.length > 0 && count > 1) {
        for (let k = 0; k < count; k++) units[units.length - 1].branches.push(single(symbol));
        continue;
      }
      // On after N, S, P or Se: the oxygens are on that atom (CH3NO2 is CH3-NO2, not carbamic
      // acid; CH3SO2Cl is a sulfonyl chloride). A leading atom with leading hydrogens (HNO3,
      // H2SO4) is left to the formula path, which puts the hydrogens on oxygen.
      const previous = units[units.length - 1];
      if (
        symbol === "O" &&
        count >= 2 &&
        previous !== undefined &&
        OXO_HOSTS.has(previous.symbol) &&
        // NO3 is a nitrate ion or ester (Pb(NO3)2, CH3ONO2), never three O on a carbon-bound N.
        (previous.symbol !== "N" || count === 2) &&
        previous.branches.length === 0 &&
        !(units.length === 1 && leadingHydrogensGiven)
      ) {
        for (let k = 0; k < count; k++) {
          const oxygen = single(symbol);
          previous.branches.push(oxygen);
          oxoBranches.push(oxygen);
        }
        continue;
      }
      // C2H5, C6H5: an alkyl or phenyl group written as one block.
      if (symbol === "C" && count > 1 && text[position] === "H") {
        const save = position;
        position++;
        const hydrogens = readCount();
        const kind = carbonGroupKind(count, hydrogens);
        if (kind === undefined || text[position] === "H") {
          position = save;
          return undefined;
        }
        pushUnit(kind === "phenyl" ? { symbol: "C", hydrogens: 0, branches: [], phenyl: true } : alkylUnit(count));
        continue;
      }
      // N2 or N3 after a carbon group: a chain of nitrogens on it (diazo, azide).
      if (
        symbol === "N" &&
        isNitrogenChainCount(count) &&
        previous?.symbol === "C" &&
        (previous.hydrogens > 0 || previous.phenyl === true || previous.branches.length > 0)
      ) {
        for (let k = 0; k < count; k++) pushUnit({ symbol, hydrogens: 0, branches: [] });
        continue;
      }
      // Any other count hides its own connectivity; leave such formulas to the molecular-formula path.
      if (count !== 1) return undefined;
      pushUnit({ symbol, hydrogens: 0, branches: [] });
    }
    return closing === undefined ? finish() : undefined;

    function pushUnit(unit: Unit): void {
      units.push(unit);
      if (leadingHydrogens > 0) {
        (units[0] as { hydrogens: number }).hydrogens += leadingHydrogens;
        leadingHydrogens = 0;
        leadingHydrogensGiven = true;
      }
    }

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
    branches: unit.branches.map((branch) => ({ ...branch, units: cloneUnits(branch.units) })),
    ...(unit.phenyl ? { phenyl: true } : {}),
  }));
}

interface FlatAtom {
  readonly symbol: string;
  /** Earlier atoms this one may bond to, the likeliest first; empty for the first atom. */
  readonly parentChoices: readonly number[];
  readonly hydrogens: number;
  /**
   * For the root of a later copy of a repeated group: the roots of the first, second and
   * previous copies. Copies either all hang on one atom (C(CH3)4) or form a chain (CH3(CH2)4CH3).
   */
  readonly copyOf?: { readonly first: number; readonly second: number; readonly previous: number };
}

interface FlatFormula {
  readonly atoms: FlatAtom[];
  /** Bonds fixed apart from the tree of parents: the bond that closes a phenyl ring. */
  readonly ringBonds: [number, number][];
}

/**
 * Lay the units out as atoms: heavy atoms in written order, hydrogens appended after them.
 * Returns undefined when the formula is too large to search.
 */
function flatten(parsed: ParsedSequence): FlatFormula | undefined {
  const atoms: FlatAtom[] = [];
  const ringBonds: [number, number][] = [];
  // Returns the atoms later units of the same sequence may bond to.
  const placeSequence = (units: readonly Unit[], anchorChoices: readonly number[]): number[] => {
    const placed: number[] = [];
    units.forEach((unit, k) => {
      const index = atoms.length;
      // Later atoms prefer the most recent one written: ties keep the chain as written.
      const parentChoices =
        k === 0 ? anchorChoices : [...placed].reverse().filter((atom, back) => back === 0 || !atomTraits(atoms[atom].symbol).isHalogen);
      atoms.push({ symbol: unit.symbol, parentChoices, hydrogens: unit.hydrogens });
      placed.push(index);
      if (unit.phenyl) {
        let previous = index;
        for (let ring = 0; ring < 5; ring++) {
          atoms.push({ symbol: "C", parentChoices: [previous], hydrogens: 1 });
          previous = atoms.length - 1;
        }
        ringBonds.push([previous, index]);
      }
      const copyRoots: number[] = [];
      for (const branch of unit.branches) {
        if (branch.copy === 0) copyRoots.length = 0;
        // A written group may instead bond to an earlier atom (after a terminal =O: CO(NH2)2)
        // or, repeated, to the copy before it (CH3(CH2)4CH3).
        const choices = branch.written ? [index, ...[...copyRoots].reverse(), ...placed.slice(0, -1).reverse()] : [index];
        const root = atoms.length;
        placeSequence(branch.units, choices);
        if (branch.written && branch.copy > 0) {
          const copyOf = { first: copyRoots[0], second: copyRoots[1] ?? root, previous: copyRoots[copyRoots.length - 1] };
          atoms[root] = { ...atoms[root], copyOf };
        }
        if (branch.written) {
          copyRoots.push(root);
          if (branch.copy > 0) placed.push(root);
        }
      }
    });
    return placed;
  };
  // Leading groups hang on the first atom of the main chain, whose index is not known yet:
  // place the main chain first, then the leading groups, each bonded by its last atom, the one
  // written next to the chain: (CH3O)3PO is P bonded to three O.
  const main = placeSequence(parsed.units, []);
  for (const branch of parsed.leadingBranches) placeSequence([...branch].reverse(), [main[0]]);
  if (atoms.length > MAX_HEAVY_ATOMS) return undefined;
  return { atoms, ringBonds };
}

/** Skeletons a condensed formula allows, or undefined when the text is not one. */
export function condensedSkeletons(formulaText: string): CandidateSkeleton[] | undefined {
  const caret = formulaText.indexOf("^");
  const body = caret >= 0 ? formulaText.slice(0, caret) : formulaText;
  // CO2H and CO2- are the carboxyl group written short: C(=O)OH and C(=O)O-.
  // HOOC- and HO2C- are the same group written from the other side: HO-C(=O)-.
  const parsed = parseCondensed(body.replace(/CO2(?=H|$|[-−+]|C)/g, "COO").replace(/HO(?:OC|2C)/g, "HOC(O)"));
  if (!parsed) return undefined;
  const flat = flatten(parsed);
  if (!flat || flat.atoms.length < 2) return undefined;
  const { atoms, ringBonds } = flat;

  const heavyCount = atoms.length;
  const room = atoms.map((atom) => maxNeighbours(atom.symbol) - atom.hydrogens);
  const used = new Array<number>(heavyCount).fill(0);
  for (const [a, b] of ringBonds) {
    used[a]++;
    used[b]++;
  }
  if (room.some((value, atom) => value < used[atom])) return undefined;
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
    for (const bond of ringBonds) bonds.push(bond);
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
    const { parentChoices: choices, copyOf } = atoms[atom];
    if (atom === 0) {
      visit(1);
      return;
    }
    for (const parent of choices) {
      if (used[parent] >= room[parent] || used[atom] >= room[atom]) continue;
      if (used[parent] > 0 && !mayBondAgain(symbols[parent], symbols[atom])) continue;
      if (copyOf && !copyMayBondTo(copyOf, atom, parent)) continue;
      used[parent]++;
      used[atom]++;
      parents[atom] = parent;
      visit(atom + 1);
      parents[atom] = -1;
      used[parent]--;
      used[atom]--;
    }
  };
  // A second copy picks the pattern (beside the first, or chained to it); later copies follow it.
  const copyMayBondTo = (copyOf: NonNullable<FlatAtom["copyOf"]>, atom: number, parent: number): boolean => {
    const besideFirst = parent === parents[copyOf.first];
    const chained = parent === copyOf.previous;
    if (copyOf.second === atom) return besideFirst || chained;
    return parents[copyOf.second] === parents[copyOf.first] ? besideFirst : chained;
  };
  visit(0);
  return skeletons;
}
