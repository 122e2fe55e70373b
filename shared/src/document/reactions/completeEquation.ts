/**
 * Completing a half-reaction or a skeleton redox equation in acidic or basic solution: the
 * writer's species keep their text and side, and H+ (acid) or OH- (base), H2O and, for a
 * half-reaction, electrons are added wherever they make the equation balance. Offered only when
 * one set of smallest whole numbers does it and the equation is redox (an element changes its
 * oxidation state, or electrons are written or needed).
 */
import { analyzeSpecies } from "../../chemistry/analyze";
import { nullSpace } from "../../chemistry/reactions/nullSpace";
import { isZero, sign, smallestWholeRatio } from "../../chemistry/reactions/rational";
import { readSpecies } from "../../chemistry/reader/readSpecies";
import { oxidationStatesOf, type OxidationStates } from "../../chemistry/redox/oxidationStates";
import type { FormulaPart } from "../../chemistry/types";
import type { SpeciesReader } from "../speciesReader";
import type { FixEdit } from "../types";
import { coefficientEdits, judgeReaction, termsOf } from "./judgeReaction";
import { readWholeEquation } from "./readEquation";
import type { Reaction, ReactionTerm } from "./reactionTypes";

/** Acidic solution (H+ and H2O) or basic solution (OH- and H2O). */
export type SolutionMedium = "acidic" | "basic";

/** A species the completion adds, with where it goes and how many. */
export interface AddedTerm {
  /** As written into the equation ("H+", "H2O", "e-", in the writer's style). */
  readonly text: string;
  readonly side: "left" | "right";
  readonly coefficient: number;
}

/** One way to complete an equation, and the edits that make it so. */
export interface Completion {
  readonly medium: SolutionMedium;
  /** The completed equation (the text over the reaction's range after the edits). */
  readonly equation: string;
  /** New coefficients of the writer's terms, in written order. */
  readonly coefficients: readonly number[];
  readonly added: readonly AddedTerm[];
  /** The equation is a half-reaction: electrons are written or added. */
  readonly halfReaction: boolean;
  /** Coefficient changes and inserted terms, in document order, none overlapping. */
  readonly edits: readonly FixEdit[];
}

/** A species the medium supplies: its kind and what the balancer counts in it. */
interface Supply {
  readonly kind: "proton" | "hydroxide" | "water" | "electron";
  readonly composition: readonly FormulaPart[];
  readonly charge: number;
}

const PROTON: Supply = { kind: "proton", composition: [{ symbol: "H", count: 1 }], charge: 1 };
const HYDROXIDE: Supply = {
  kind: "hydroxide",
  composition: [
    { symbol: "O", count: 1 },
    { symbol: "H", count: 1 },
  ],
  charge: -1,
};
const WATER: Supply = {
  kind: "water",
  composition: [
    { symbol: "H", count: 2 },
    { symbol: "O", count: 1 },
  ],
  charge: 0,
};
const ELECTRON: Supply = { kind: "electron", composition: [], charge: -1 };

/** The species each medium supplies, in the order they are written when added. */
const SUPPLIES: Readonly<Record<SolutionMedium, readonly Supply[]>> = {
  acidic: [PROTON, WATER],
  basic: [HYDROXIDE, WATER],
};

/** Most terms an equation may have for completion to be tried. */
const MAX_TERMS = 16;

/**
 * The completion of `reaction` in `medium`, or undefined when the equation balances by its
 * coefficients alone, cannot be completed, can be completed in more than one way, or is not
 * redox.
 */
export function completeReaction(reaction: Reaction, medium: SolutionMedium, read: SpeciesReader = readSpecies): Completion | undefined {
  const terms = termsOf(reaction);
  if (terms.length === 0 || terms.length > MAX_TERMS) return undefined;
  if (terms.some((term) => !term.electron && !term.reading)) return undefined;
  const verdict = judgeReaction(reaction);
  if (verdict.kind === "balanced" || verdict.kind === "unbalanced") return undefined;
  const electronsWritten = terms.some((term) => term.electron);
  const supplies = SUPPLIES[medium].filter((supply) => !terms.some((term) => sameSpecies(term, supply)));
  // A half-reaction gets electrons; an equation with both an oxidation and a reduction in it does not.
  // Water, H+ and OH- bring only H and O: any other element written on one side only stays so.
  // Checked first, since oxidation states need each species' structure.
  if (!otherElementsOnBothSides(terms)) return undefined;
  const states = terms.map(statesOfTerm);
  let solved: Solved | undefined;
  let halfReaction = electronsWritten;
  if (electronsWritten) solved = solve(terms, supplies, states);
  else {
    const directions = redoxDirections(terms, states);
    if (!directions.oxidised && !directions.reduced) return undefined;
    // Both an oxidation and a reduction: no electrons; one of them: a half-reaction.
    halfReaction = !(directions.oxidised && directions.reduced);
    solved = solve(terms, halfReaction ? [...supplies, ELECTRON] : supplies, states);
    if (solved && halfReaction && solved.amounts[solved.amounts.length - 1] === 0n) solved = undefined;
  }
  if (!solved) return undefined;
  const style = writingStyle(reaction);
  const added: AddedTerm[] = [];
  solved.supplies.forEach((supply, index) => {
    const amount = solved.amounts[index];
    if (amount === 0n) return;
    added.push({ text: style.textOf(supply), side: amount > 0n ? "left" : "right", coefficient: Number(amount < 0n ? -amount : amount) });
  });
  if (added.length === 0) return undefined;
  const coefficients = solved.coefficients.map(Number);
  const edits = completionEdits(reaction, coefficients, added, style);
  const equation = applied(reaction, edits);
  if (!readsBalanced(reaction, equation, terms.length + added.length, read)) return undefined;
  return { medium, equation, coefficients, added, halfReaction, edits };
}

/** Both completions of `reaction` that exist; one when acid and base give the same equation. */
export function completionsOf(reaction: Reaction, read: SpeciesReader = readSpecies): Completion[] {
  const acidic = completeReaction(reaction, "acidic", read);
  const basic = completeReaction(reaction, "basic", read);
  if (acidic && basic && acidic.equation === basic.equation) return [acidic];
  return [acidic, basic].filter((completion): completion is Completion => completion !== undefined);
}

/** A short title for the quick fix that applies `completion`. */
export function completionTitle(completion: Completion, alone: boolean): string {
  const names = completion.added.map((term) => term.text).join(", ");
  if (alone && completion.added.every((term) => isElectronText(term.text))) return `Complete the half-reaction (add ${names})`;
  return `Complete in ${completion.medium} solution (add ${names})`;
}

function isElectronText(text: string): boolean {
  return /^e/.test(text);
}

interface Solved {
  readonly coefficients: readonly bigint[];
  readonly supplies: readonly Supply[];
  /** Signed: positive on the left, negative on the right. */
  readonly amounts: readonly bigint[];
}

/**
 * The one balance of the writer's terms (on their sides, each at least once) with `supplies`
 * free to go on either side or not at all; undefined when there is none or more than one.
 */
function solve(
  terms: readonly ReactionTerm[],
  supplies: readonly Supply[],
  states: readonly (OxidationStates | undefined)[],
): Solved | undefined {
  const columns = [
    ...terms.map((term) => ({
      composition: term.reading?.composition ?? [],
      charge: term.electron ? -1 : (term.reading?.charge ?? 0),
      sign: term.side === "left" ? 1n : -1n,
    })),
    ...supplies.map((supply) => ({ composition: supply.composition, charge: supply.charge, sign: 1n })),
  ];
  const labels: string[] = [];
  for (const column of columns) for (const part of column.composition) if (!labels.includes(part.symbol)) labels.push(part.symbol);
  const matrix = [
    ...labels.map((label) =>
      columns.map(
        (column) =>
          column.sign * BigInt(column.composition.filter((part) => part.symbol === label).reduce((sum, part) => sum + part.count, 0)),
      ),
    ),
    columns.map((column) => column.sign * BigInt(column.charge)),
  ];
  let basis = nullSpace(matrix, columns.length);
  if (basis.length > 1) {
    // The usual convention settles it: H+, OH- and H2O take no part in the electron transfer, so
    // hydrogen and oxygen atoms in other states than +1 and -2 stay in the writer's species.
    const spectatorRows = (["H", "O"] as const).map((symbol) => [
      ...terms.map((term, index) => (term.side === "left" ? 1n : -1n) * BigInt(unusualAtoms(states[index], symbol))),
      ...supplies.map(() => 0n),
    ]);
    basis = nullSpace([...matrix, ...spectatorRows], columns.length);
  }
  if (basis.length !== 1) return undefined;
  const vector = basis[0];
  const writer = vector.slice(0, terms.length);
  if (writer.some(isZero)) return undefined;
  const signs = new Set(writer.map(sign));
  if (signs.size !== 1) return undefined;
  const whole = smallestWholeRatio(vector);
  // smallestWholeRatio makes the first value positive: the first writer term, so all of them.
  return { coefficients: whole.slice(0, terms.length), supplies, amounts: whole.slice(terms.length) };
}

/** True when the written term is the species `supply` stands for (H2O already written, say). */
function sameSpecies(term: ReactionTerm, supply: Supply): boolean {
  if (term.electron) return supply.kind === "electron";
  const reading = term.reading;
  if (!reading || reading.charge !== supply.charge) return false;
  const counts = (parts: readonly FormulaPart[]) => {
    const map = new Map<string, number>();
    for (const part of parts) map.set(part.symbol, (map.get(part.symbol) ?? 0) + part.count);
    return [...map.entries()].sort(([a], [b]) => a.localeCompare(b)).join(";");
  };
  return counts(reading.composition) === counts(supply.composition);
}

/** True when every element but H and O appears on both sides. */
function otherElementsOnBothSides(terms: readonly ReactionTerm[]): boolean {
  const sides = { left: new Set<string>(), right: new Set<string>() };
  for (const term of terms) for (const part of term.reading?.composition ?? []) sides[term.side].add(part.symbol);
  const oneSided = (from: Set<string>, to: Set<string>) => [...from].some((symbol) => symbol !== "H" && symbol !== "O" && !to.has(symbol));
  return !oneSided(sides.left, sides.right) && !oneSided(sides.right, sides.left);
}

/** The oxidation states of a term's species (undefined for an electron or when unknown). */
function statesOfTerm(term: ReactionTerm): OxidationStates | undefined {
  if (term.electron || !term.reading) return undefined;
  let analysis;
  try {
    analysis = analyzeSpecies(term.speciesText);
  } catch {
    analysis = undefined;
  }
  return oxidationStatesOf(term.reading, analysis);
}

/** The usual state of hydrogen and oxygen in water, H+ and OH-. */
const USUAL_STATE: Readonly<Record<"H" | "O", number>> = { H: 1, O: -2 };

/** How many `symbol` atoms of the species are in another state than the usual one (O in a peroxide). */
function unusualAtoms(states: OxidationStates | undefined, symbol: "H" | "O"): number {
  const element = states?.elements.find((candidate) => candidate.symbol === symbol);
  return element ? element.states.filter((state) => state !== USUAL_STATE[symbol]).length : 0;
}

/**
 * Whether the writer's species show an element oxidised (its average state in some species on
 * the right above one on the left) and one reduced (below). Unknown states count as neither.
 */
function redoxDirections(
  terms: readonly ReactionTerm[],
  states: readonly (OxidationStates | undefined)[],
): { oxidised: boolean; reduced: boolean } {
  const none = { oxidised: false, reduced: false };
  const averagesBySide = { left: new Map<string, number[]>(), right: new Map<string, number[]>() };
  for (const [index, term] of terms.entries()) {
    if (term.electron) continue;
    const species = states[index];
    if (!species) return none;
    for (const element of species.elements) {
      const map = averagesBySide[term.side];
      map.set(element.symbol, [...(map.get(element.symbol) ?? []), element.average.numerator / element.average.denominator]);
    }
  }
  // Hydrogen or oxygen written on one side only goes to (or comes from) water, H+ or OH-.
  for (const symbol of ["H", "O"] as const) {
    const [left, right] = [averagesBySide.left.get(symbol), averagesBySide.right.get(symbol)];
    if (left && !right) averagesBySide.right.set(symbol, [USUAL_STATE[symbol]]);
    if (right && !left) averagesBySide.left.set(symbol, [USUAL_STATE[symbol]]);
  }
  let oxidised = false;
  let reduced = false;
  for (const [symbol, left] of averagesBySide.left) {
    const right = averagesBySide.right.get(symbol);
    if (!right) continue;
    if ([...new Set(left)].sort().join() === [...new Set(right)].sort().join()) continue;
    if (Math.max(...right) > Math.min(...left)) oxidised = true;
    if (Math.min(...right) < Math.max(...left)) reduced = true;
  }
  return { oxidised, reduced };
}

/** How the writer writes: coefficients glued or spaced, charges, subscripts, states, the "+". */
interface WritingStyle {
  readonly glued: boolean;
  readonly separator: string;
  textOf(supply: Supply): string;
}

/** The writer's habits, read from the equation itself. */
export function writingStyle(reaction: Reaction): WritingStyle {
  const terms = termsOf(reaction);
  const glued = terms.some((term) => term.coefficient.glued) && !terms.some((term) => term.coefficient.written && !term.coefficient.glued);
  const species = terms.filter((term) => !term.electron).map((term) => term.speciesText);
  // A single charge written with a caret ("MnO4^-"); "Mn^2+" beside "MnO4-" says nothing about it.
  const caret = species.some((text) => /\^\{?[+\-\u2212]\}?(?:\s*\((?:aq|s|l|g|cr)\))?$/.test(text));
  const superscript = species.some((text) => /[\u207a\u207b]/.test(text));
  const subscript = species.some((text) => /[\u2080-\u2089]/.test(text));
  const writtenElectron = terms.find((term) => term.electron)?.speciesText;
  const state = commonState(species);
  const separator = separatorOf(reaction);
  const plus = superscript ? "\u207a" : caret ? "^+" : "+";
  const minus = superscript ? "\u207b" : caret ? "^-" : "-";
  return {
    glued,
    separator,
    textOf(supply) {
      switch (supply.kind) {
        case "proton":
          return `H${plus}${state ? `${state.gap}(aq)` : ""}`;
        case "hydroxide":
          return `OH${minus}${state ? `${state.gap}(aq)` : ""}`;
        case "water":
          return `H${subscript ? "\u2082" : "2"}O${state ? `${state.gap}(l)` : ""}`;
        case "electron":
          return writtenElectron ?? `e${minus}`;
      }
    },
  };
}

/** The state symbols' spacing when every species carries one ("Fe^2+(aq)", "Fe^2+ (aq)"). */
function commonState(species: readonly string[]): { gap: string } | undefined {
  if (species.length === 0) return undefined;
  const states = species.map((text) => /(\s*)\((?:aq|s|l|g|cr)\)$/.exec(text));
  if (states.some((state) => !state)) return undefined;
  return { gap: states[0]![1] };
}

/** The "+" between two terms as written, spaces included; " + " when no side has two terms. */
function separatorOf(reaction: Reaction): string {
  for (const side of [reaction.left, reaction.right]) {
    if (side.length < 2) continue;
    const between = reaction.text.slice(side[0].range.end - reaction.range.start, side[1].range.start - reaction.range.start);
    if (/^\s*\+\s*$/.test(between)) return between;
  }
  return " + ";
}

/** A coefficient as written before a species: nothing for 1. */
function coefficientText(value: number, glued: boolean): string {
  if (value === 1) return "";
  return glued ? String(value) : `${value} `;
}

/** The edits that set the writer's coefficients and insert the added terms at the end of their side. */
function completionEdits(reaction: Reaction, coefficients: readonly number[], added: readonly AddedTerm[], style: WritingStyle): FixEdit[] {
  const edits = coefficientEdits(reaction, coefficients.map(BigInt));
  for (const side of [reaction.left, reaction.right]) {
    const last = side[side.length - 1];
    const inserted = added
      .filter((term) => term.side === last.side)
      .map((term) => style.separator + coefficientText(term.coefficient, style.glued) + term.text)
      .join("");
    if (inserted) edits.push({ range: { start: last.range.end, end: last.range.end }, newText: inserted });
  }
  return edits.sort((a, b) => a.range.start - b.range.start);
}

/** The reaction's text with `edits` (document offsets, in order) applied. */
export function applied(reaction: Reaction, edits: readonly FixEdit[]): string {
  let text = "";
  let copied = reaction.range.start;
  for (const edit of edits) {
    text += reaction.text.slice(copied - reaction.range.start, edit.range.start - reaction.range.start) + edit.newText;
    copied = edit.range.end;
  }
  return text + reaction.text.slice(copied - reaction.range.start);
}

/** True when `equation` reads back as one equation of `termCount` terms that balances. */
function readsBalanced(reaction: Reaction, equation: string, termCount: number, read: SpeciesReader): boolean {
  const again = readWholeEquation(equation, 0, equation.length, reaction.notation, read);
  if (!again || termsOf(again).length !== termCount) return false;
  return judgeReaction(again).kind === "balanced";
}
