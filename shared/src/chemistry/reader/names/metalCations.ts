/**
 * The cation half of salt names beyond "sodium" and "iron(III)": the old -ous/-ic adjectives
 * (ferrous, ferric), the charge chemists assume when a common salt's name gives none ("copper
 * sulfate" is copper(II) sulfate), and mercury(I), which is the pair Hg2^2+.
 */
import { elementBySymbol } from "../../elements";
import { NONMETALS } from "../nonmetals";
import type { ElementData } from "../../types";

/** A metal cation a salt name can begin with. */
export interface MetalCation {
  /** Formula of the cation without charge: "Fe", or "Hg2" for mercury(I). */
  readonly body: string;
  readonly charge: number;
  readonly element: ElementData;
  /** True when the body is one atom ("Fe"), false for a group ("Hg2"). */
  readonly singleAtom: boolean;
}

// from memory: older nomenclature of metal cations, -ous for the lower and -ic for the higher charge
const OLD_NAMES: readonly (readonly [adjective: string, symbol: string, charge: number])[] = [
  ["ferrous", "Fe", 2],
  ["ferric", "Fe", 3],
  ["cuprous", "Cu", 1],
  ["cupric", "Cu", 2],
  ["stannous", "Sn", 2],
  ["stannic", "Sn", 4],
  ["plumbous", "Pb", 2],
  ["plumbic", "Pb", 4],
  ["mercurous", "Hg", 1],
  ["mercuric", "Hg", 2],
  ["cobaltous", "Co", 2],
  ["cobaltic", "Co", 3],
  ["chromous", "Cr", 2],
  ["chromic", "Cr", 3],
  ["manganous", "Mn", 2],
  ["manganic", "Mn", 3],
  ["nickelous", "Ni", 2],
  ["aurous", "Au", 1],
  ["auric", "Au", 3],
  ["cerous", "Ce", 3],
  ["ceric", "Ce", 4],
];

// common practice: the salt a lab means when the name carries no numeral
const ASSUMED_CHARGES: ReadonlyMap<string, number> = new Map([
  ["Cu", 2],
  ["Pb", 2],
  ["Ni", 2],
  ["Co", 2],
  ["Mn", 2],
]);

const BY_ADJECTIVE = new Map(OLD_NAMES.map(([adjective, symbol, charge]) => [adjective, { symbol, charge }]));

/** The cation an old adjective names ("ferric" -> Fe3+), or undefined. */
export function cationByOldName(adjective: string): MetalCation | undefined {
  const known = BY_ADJECTIVE.get(adjective);
  return known === undefined ? undefined : metalCation(known.symbol, known.charge);
}

/** The cation of `element` with this Stock charge; mercury(I) is the pair Hg2^2+. */
export function metalCation(symbol: string, charge: number): MetalCation | undefined {
  const element = elementBySymbol(symbol);
  if (element === undefined) return undefined;
  if (symbol === "Hg" && charge === 1) return { body: "Hg2", charge: 2, element, singleAtom: false };
  return { body: symbol, charge, element, singleAtom: true };
}

const STOCK_NUMERALS: readonly string[] = ["i", "ii", "iii", "iv", "v", "vi", "vii", "viii"];

/** The oxidation state a Stock numeral stands for ("III" or "iii" is 3), or 0 when it is none. */
export function stockNumeralValue(numeral: string): number {
  const lower = numeral.toLowerCase();
  // "Iii" is no numeral: one case throughout
  if (numeral !== lower && numeral !== numeral.toUpperCase()) return 0;
  return STOCK_NUMERALS.indexOf(lower) + 1;
}

/**
 * What an element with a Stock numeral and nothing else stands for ("iron(III)", "Fe(III)"): a
 * metal's cation in that oxidation state. Undefined for a nonmetal: sulfur(VI) is the sulfur of
 * SO3, H2SO4 and SF6 alike, no one species.
 */
export function stockCation(symbol: string, charge: number): MetalCation | undefined {
  return NONMETALS.has(symbol) ? undefined : metalCation(symbol, charge);
}

/** The charge assumed for a salt of this metal named without a numeral, where chemists assume one. */
export function assumedCationCharge(symbol: string): number | undefined {
  return ASSUMED_CHARGES.get(symbol);
}

/** Every old adjective, for the words that may begin a name. */
export function oldCationNames(): readonly string[] {
  return OLD_NAMES.map(([adjective]) => adjective);
}
