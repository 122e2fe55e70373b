/**
 * Oxidation states of every atom. From a Lewis structure: each bond's electrons go to the more
 * electronegative atom (split evenly between like atoms), and a homonuclear multiple bond drawn
 * only to spare an expanded octet its formal charges is counted as the single bond of the octet
 * structure, and a radical's odd electron is counted on the least electronegative atom that can
 * carry it. A salt or hydrate adds up its parts. Where no structure is drawn (Fe3O4, MnO4-), the
 * usual states of fluorine, oxygen, hydrogen and the s-block fix the rest, and a fractional
 * average is split into whole states the element commonly takes.
 *
 * The per-atom split is the drawn resonance form's: each element's total is the same in every
 * form, but which atom carries how much can differ (N2O: N≡N⁺–O⁻ gives the terminal N 0 and the
 * central +2, ⁻N=N⁺=O gives -1 and +3). Asked for, the splits of the other forms are found too,
 * so that a reader is told the split depends on the form.
 */
import { elementBySymbol } from "../elements";
import { readSpecies } from "../reader/readSpecies";
import type { AnalysisResult, MolecularGraph, SpeciesPart, SpeciesReading } from "../types";
import { otherResonanceForms } from "./resonanceForms";

/** The states of one element's atoms in a species. */
export interface ElementOxidationStates {
  readonly symbol: string;
  /** One per atom, ascending. */
  readonly states: readonly number[];
  /** The average as a fraction in lowest terms. */
  readonly average: { readonly numerator: number; readonly denominator: number };
  /** False when the atoms differ but nothing says which has which state (no structure, no usual states). */
  readonly split: boolean;
  /**
   * Per-atom states (ascending) in other resonance forms where they differ from `states`, each
   * split once; set only when asked for and some form differs.
   */
  readonly otherForms?: readonly (readonly number[])[];
}

/** Every element's oxidation states in one species, and how they were found. */
export interface OxidationStates {
  readonly elements: readonly ElementOxidationStates[];
  /** "structure": from the Lewis structure; "rules": from the usual states, no structure. */
  readonly from: "structure" | "rules";
}

/** What to work out beside the drawn form's states. */
export interface OxidationStateOptions {
  /** The per-atom splits of the other resonance forms (a search over bond orders: hovers only). */
  readonly otherForms?: boolean;
}

/** The oxidation states of `reading`, using `analysis` when it drew a structure; undefined when unknown. */
export function oxidationStatesOf(
  reading: SpeciesReading,
  analysis?: AnalysisResult,
  options: OxidationStateOptions = {},
): OxidationStates | undefined {
  const perAtom = statesFrom(reading, analysis);
  if (!perAtom) return undefined;
  const others = options.otherForms && analysis?.ok ? otherFormStates(analysis.value.graph) : [];
  const elements = reading.composition
    .map((part) => part.symbol)
    .filter((symbol, index, all) => all.indexOf(symbol) === index)
    .map((symbol) => {
      const element = elementStates(symbol, perAtom.states.get(symbol) ?? [], !perAtom.unsplit?.has(symbol));
      const differing = distinctSplits(
        element.states,
        others.map((states) => states.get(symbol) ?? []),
      );
      return differing.length > 0 ? { ...element, otherForms: differing } : element;
    });
  return { elements, from: perAtom.from };
}

/** Each other resonance form's states per element (none when the forms were not searched). */
function otherFormStates(graph: MolecularGraph): Map<string, number[]>[] {
  return (otherResonanceForms(graph) ?? []).map(structureStates);
}

/** The splits in `others` (sorted) that differ from `drawn` and from each other. */
function distinctSplits(drawn: readonly number[], others: readonly (readonly number[])[]): number[][] {
  const seen = new Set([drawn.join(",")]);
  const splits: number[][] = [];
  for (const states of others) {
    const sorted = [...states].sort((a, b) => a - b);
    const key = sorted.join(",");
    if (seen.has(key)) continue;
    seen.add(key);
    splits.push(sorted);
  }
  return splits;
}

type PerAtom = { states: Map<string, number[]>; from: "structure" | "rules"; unsplit?: Set<string> };

function statesFrom(reading: SpeciesReading, analysis: AnalysisResult | undefined): PerAtom | undefined {
  if (analysis?.ok) return { states: structureStates(analysis.value.graph), from: "structure" };
  if (analysis && !analysis.ok && analysis.parts && analysis.parts.length > 0) {
    const combined = new Map<string, number[]>();
    let from: "structure" | "rules" = "structure";
    let unsplit: Set<string> | undefined;
    for (const part of analysis.parts) {
      const partStates = partStatesOf(part);
      if (!partStates) return ruleStates(reading);
      if (partStates.from === "rules") from = "rules";
      for (const [symbol, states] of partStates.states) {
        const list = combined.get(symbol) ?? [];
        for (let copy = 0; copy < part.count; copy++) list.push(...states);
        combined.set(symbol, list);
      }
      for (const symbol of partStates.unsplit ?? []) (unsplit ??= new Set()).add(symbol);
    }
    return { states: combined, from, unsplit };
  }
  return ruleStates(reading);
}

function partStatesOf(part: SpeciesPart): PerAtom | undefined {
  const read = readSpecies(part.formula);
  if (!read.ok) return undefined;
  return statesFrom(read.value, part.monatomic ? undefined : part.analysis);
}

/** Electrons each atom keeps once every bond is given to its more electronegative end. */
function structureStates(graph: MolecularGraph): Map<string, number[]> {
  const kept = graph.atoms.map((atom) => 2 * atom.lonePairs + atom.unpairedElectrons);
  const shell = graph.atoms.map((atom) => 2 * atom.lonePairs + atom.unpairedElectrons);
  for (const bond of graph.bonds) {
    shell[bond.from] += 2 * bond.order;
    shell[bond.to] += 2 * bond.order;
  }
  for (const bond of graph.bonds) {
    const a = graph.atoms[bond.from].symbol;
    const b = graph.atoms[bond.to].symbol;
    if (a === b) {
      // S=S in thiosulfate: the second pair belongs to the atom that keeps an octet.
      const extra = bond.order - 1;
      const expandedFrom = shell[bond.from] > 8;
      const expandedTo = shell[bond.to] > 8;
      if (extra > 0 && expandedFrom !== expandedTo) {
        kept[expandedFrom ? bond.to : bond.from] += 2 * bond.order - 1;
        kept[expandedFrom ? bond.from : bond.to] += 1;
      } else {
        kept[bond.from] += bond.order;
        kept[bond.to] += bond.order;
      }
      continue;
    }
    const enA = elementBySymbol(a)?.electronegativity ?? 0;
    const enB = elementBySymbol(b)?.electronegativity ?? 0;
    if (enA > enB) kept[bond.from] += 2 * bond.order;
    else if (enB > enA) kept[bond.to] += 2 * bond.order;
    else {
      kept[bond.from] += bond.order;
      kept[bond.to] += bond.order;
    }
  }
  placeOddElectrons(graph, kept);
  const states = new Map<string, number[]>();
  graph.atoms.forEach((atom, index) => {
    const valence = elementBySymbol(atom.symbol)?.valenceElectrons ?? 0;
    const list = states.get(atom.symbol) ?? [];
    list.push(valence - kept[index]);
    states.set(atom.symbol, list);
  });
  return states;
}

/**
 * A radical's odd electron is counted on the least electronegative atom that can carry it: when
 * the drawn structure puts it on an atom short of an octet next to a less electronegative atom
 * with a lone pair, the resonance form with that lone pair's electron moved across is the one
 * counted (NO2 is N +4 from O=N•-O-, not N +3 from O=N-O•), so the more electronegative atom
 * completes its octet as the ionic approximation would.
 */
function placeOddElectrons(graph: MolecularGraph, kept: number[]): void {
  const electronegativity = (index: number) => elementBySymbol(graph.atoms[index].symbol)?.electronegativity ?? 0;
  graph.atoms.forEach((atom, radical) => {
    if (atom.unpairedElectrons === 0 || kept[radical] >= 8) return;
    const donors = graph.bonds
      .map((bond) => (bond.from === radical ? bond.to : bond.to === radical ? bond.from : -1))
      .filter((index) => index >= 0 && graph.atoms[index].lonePairs > 0 && electronegativity(index) < electronegativity(radical))
      .sort((a, b) => electronegativity(a) - electronegativity(b));
    if (donors.length === 0) return;
    kept[donors[0]] -= 1;
    kept[radical] += 1;
  });
}

/** States elements nearly always take in compounds. */
function fixedState(symbol: string, others: readonly string[]): number | undefined {
  const element = elementBySymbol(symbol);
  if (!element) return undefined;
  if (symbol === "F") return -1;
  if (symbol === "H") return others.every((other) => isMetal(other)) && others.length > 0 ? -1 : 1;
  if (symbol === "O") return others.includes("F") ? undefined : -2;
  if (element.group === 1) return 1;
  if (element.group === 2) return 2;
  if (symbol === "Al" || symbol === "Ga") return 3;
  if (symbol === "Zn" || symbol === "Cd") return 2;
  if (symbol === "Ag") return 1;
  return undefined;
}

function isMetal(symbol: string): boolean {
  const element = elementBySymbol(symbol);
  if (!element) return false;
  return element.category !== "main-group" && element.category !== "noble-gas"
    ? true
    : element.group <= 2 || (element.group === 13 && symbol !== "B");
}

/** The usual negative state of a non-metal that is the most electronegative left: -1, -2, -3. */
function anionState(symbol: string): number | undefined {
  const group = elementBySymbol(symbol)?.group;
  return group === 17 ? -1 : group === 16 ? -2 : group === 15 ? -3 : undefined;
}

/** States by rule: fixed states, then the most electronegative unknowns as anions, the last one by charge. */
function ruleStates(reading: SpeciesReading): PerAtom | undefined {
  const counts = new Map<string, number>();
  for (const part of reading.composition) counts.set(part.symbol, (counts.get(part.symbol) ?? 0) + part.count);
  const symbols = [...counts.keys()];
  const totals = new Map<string, number>();
  if (symbols.length === 1) totals.set(symbols[0], reading.charge);
  else {
    for (const symbol of symbols) {
      const fixed = fixedState(
        symbol,
        symbols.filter((other) => other !== symbol),
      );
      if (fixed !== undefined) totals.set(symbol, fixed * counts.get(symbol)!);
    }
    let unknown = symbols.filter((symbol) => !totals.has(symbol));
    while (unknown.length > 1) {
      const most = [...unknown].sort(
        (a, b) => (elementBySymbol(b)?.electronegativity ?? 0) - (elementBySymbol(a)?.electronegativity ?? 0),
      )[0];
      const state = anionState(most);
      if (state === undefined) return undefined;
      totals.set(most, state * counts.get(most)!);
      unknown = unknown.filter((symbol) => symbol !== most);
    }
    const assigned = [...totals.values()].reduce((sum, value) => sum + value, 0);
    if (unknown.length === 1) totals.set(unknown[0], reading.charge - assigned);
    else if (assigned !== reading.charge) return undefined;
  }
  const states = new Map<string, number[]>();
  const unsplit = new Set<string>();
  for (const [symbol, total] of totals) {
    const count = counts.get(symbol)!;
    states.set(symbol, splitTotal(symbol, total, count));
    if (total % count !== 0 && !COMMON_STATES.has(symbol)) unsplit.add(symbol);
  }
  return { states, from: "rules", unsplit };
}

// from memory: common oxidation states of metals in mixed-valence compounds (Greenwood & Earnshaw)
const COMMON_STATES: ReadonlyMap<string, readonly number[]> = new Map([
  ["Fe", [2, 3]],
  ["Co", [2, 3]],
  ["Ni", [2, 3]],
  ["Mn", [2, 3, 4]],
  ["Pb", [2, 4]],
  ["Sn", [2, 4]],
  ["Cu", [1, 2]],
  ["Cr", [2, 3, 6]],
  ["V", [3, 4, 5]],
  ["Ti", [3, 4]],
  ["Sb", [3, 5]],
  ["Tl", [1, 3]],
  ["Hg", [1, 2]],
  ["U", [4, 6]],
  ["Eu", [2, 3]],
  ["Ce", [3, 4]],
]);

/** `count` whole states adding up to `total`: equal when they can be, else the states the element takes. */
function splitTotal(symbol: string, total: number, count: number): number[] {
  if (total % count === 0) return Array.from({ length: count }, () => total / count);
  const usual = COMMON_STATES.get(symbol);
  if (usual && count <= 12) {
    // Two of the usual states, as many of the higher as the total needs.
    for (let low = 0; low < usual.length; low++) {
      for (let high = low + 1; high < usual.length; high++) {
        const highCount = (total - usual[low] * count) / (usual[high] - usual[low]);
        if (Number.isInteger(highCount) && highCount > 0 && highCount < count) {
          return [...Array.from({ length: count - highCount }, () => usual[low]), ...Array.from({ length: highCount }, () => usual[high])];
        }
      }
    }
  }
  const floor = Math.floor(total / count);
  const above = total - floor * count;
  return [...Array.from({ length: count - above }, () => floor), ...Array.from({ length: above }, () => floor + 1)];
}

function elementStates(symbol: string, states: readonly number[], split: boolean): ElementOxidationStates {
  const sorted = [...states].sort((a, b) => a - b);
  const sum = sorted.reduce((total, value) => total + value, 0);
  const divisor = gcdOf(Math.abs(sum), sorted.length) || 1;
  return { symbol, states: sorted, average: { numerator: sum / divisor, denominator: sorted.length / divisor }, split };
}

function gcdOf(a: number, b: number): number {
  return b === 0 ? a : gcdOf(b, a % b);
}

/** "+3", "-2", "0", "+8/3". */
export function formatOxidationState(numerator: number, denominator = 1): string {
  const text = denominator === 1 ? String(Math.abs(numerator)) : `${Math.abs(numerator)}/${denominator}`;
  return numerator > 0 ? `+${text}` : numerator < 0 ? `-${text}` : "0";
}

/**
 * "S 1× +5, 1× -1 (average +2); O -2"; where resonance forms split an element differently,
 * "N 1× +2, 1× 0 in the drawn resonance form, 1× +3, 1× -1 in another (average +1 in every form)".
 */
/**
 * The oxidation states every card shows for a species (the other resonance forms' splits
 * included), as one line of text; undefined when they are not known.
 */
export function oxidationStatesLine(reading: SpeciesReading, analysis: AnalysisResult): string | undefined {
  const states = oxidationStatesOf(reading, analysis, { otherForms: true });
  return states ? oxidationStatesText(states) : undefined;
}

export function oxidationStatesText(states: OxidationStates): string {
  return states.elements
    .map((element) => {
      const distinct = [...new Set(element.states)];
      const average = formatOxidationState(element.average.numerator, element.average.denominator);
      if (element.otherForms && element.otherForms.length > 0) {
        // A hover is a glance: two other splits at most, the rest counted.
        const shown = element.otherForms.slice(0, MAX_OTHER_SPLITS).map(splitText);
        const more = element.otherForms.length - shown.length;
        const others = shown.join("; ") + (more > 0 ? `; ${more} more` : "");
        const another = element.otherForms.length === 1 ? "another" : "others";
        const drawn = `${element.symbol} ${splitText(element.states)} in the drawn resonance form, ${others} in ${another}`;
        // A lone pair that moves between unlike atoms (H2C=N⁺=N⁻, H2C⁻-N⁺≡N) changes the
        // element's total too: then there is no one average to give.
        const total = sumOf(element.states);
        const sameTotal = element.otherForms.every((states) => sumOf(states) === total);
        return sameTotal ? `${drawn} (average ${average} in every form)` : drawn;
      }
      if (distinct.length === 1) return `${element.symbol} ${formatOxidationState(distinct[0])}`;
      if (!element.split) return `${element.symbol} ${average} (average; no structure to say which atom has which)`;
      return `${element.symbol} ${splitText(element.states)} (average ${average})`;
    })
    .join("; ");
}

function sumOf(states: readonly number[]): number {
  return states.reduce((total, state) => total + state, 0);
}

/** Other forms' splits written out on a card; the rest are counted. */
const MAX_OTHER_SPLITS = 2;

/** "1× +5, 1× -1": how many atoms have each state, highest first; "+1" when all have one. */
function splitText(states: readonly number[]): string {
  const distinct = [...new Set(states)].sort((a, b) => b - a);
  if (distinct.length === 1 && states.length === 1) return formatOxidationState(distinct[0]);
  return distinct.map((state) => `${states.filter((value) => value === state).length}× ${formatOxidationState(state)}`).join(", ");
}
