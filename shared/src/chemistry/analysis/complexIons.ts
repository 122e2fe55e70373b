/**
 * Coordination complexes written in square brackets inside a salt's formula: [Cu(NH3)4]SO4,
 * [Co(NH3)5Cl]Cl2, K2[PtCl6]. The bracket names a metal and the ligands it holds; the complex's
 * charge is the metal's charge plus the ligands', and a reading is kept only where the metal's
 * charge is one it usually takes. VSEPR gives no shape for such an ion: the arrangement of ligands
 * around a d-block metal follows coordination number and ligand-field effects.
 */
import { elementBySymbol } from "../elements";
import { metalIonCharges } from "./metalIonCharges";
import { ateNameOf } from "../reader/names/ateNames";

// common practice: the charges of the common ligands as counted when working out a metal's
// oxidation state in a complex (nitrosyl counted as NO+, as in nitroprusside).
const LIGAND_CHARGES: ReadonlyMap<string, number> = new Map([
  ["NH3", 0],
  ["H2O", 0],
  ["OH2", 0],
  ["CO", 0],
  ["NO", 1],
  ["F", -1],
  ["Cl", -1],
  ["Br", -1],
  ["I", -1],
  ["CN", -1],
  ["NC", -1],
  ["OH", -1],
  ["NO2", -1],
  ["ONO", -1],
  ["SCN", -1],
  ["NCS", -1],
  ["N3", -1],
  ["C2O4", -2],
  ["CO3", -2],
  ["SO4", -2],
]);

/** Ligands written without brackets after the metal: PtCl6, Fe(CN)5NO, Co(NH3)5Cl. */
const BARE_LIGAND = /(Cl|Br|NO|CN|CO|F|I)(\d*)/y;
const BRACKETED_LIGAND = /\(([A-Za-z0-9]+)\)(\d*)/y;

/** A complex's metal, its ligands as written, and what they add to the charge. */
export interface ComplexIon {
  readonly metal: string;
  readonly ligandCharge: number;
  readonly ligands: readonly { readonly formula: string; readonly count: number }[];
}

/** The metal and ligand charge of a bracket's body ("Cu(NH3)4"), or undefined when it is not a complex of known ligands. */
export function complexIon(body: string): ComplexIon | undefined {
  const symbolEnd = body.length > 1 && body.charCodeAt(1) >= 0x61 && body.charCodeAt(1) <= 0x7a ? 2 : 1;
  const metal = body.slice(0, symbolEnd);
  if (elementBySymbol(metal)?.category !== "transition-metal" || metalIonCharges(metal).length === 0) return undefined;
  let ligandCharge = 0;
  const ligands: { formula: string; count: number }[] = [];
  let i = symbolEnd;
  while (i < body.length) {
    const pattern = body[i] === "(" ? BRACKETED_LIGAND : BARE_LIGAND;
    pattern.lastIndex = i;
    const match = pattern.exec(body);
    const charge = match ? LIGAND_CHARGES.get(match[1]) : undefined;
    if (match === null || charge === undefined) return undefined;
    const count = match[2] === "" ? 1 : Number(match[2]);
    if (count === 0) return undefined;
    ligandCharge += charge * count;
    ligands.push({ formula: match[1], count });
    i = pattern.lastIndex;
  }
  return ligands.length > 0 ? { metal, ligandCharge, ligands } : undefined;
}

/** The charges the complex may carry with the given sign: the metal's usual charges plus the ligands'. */
export function complexCharges(complex: ComplexIon, sign: 1 | -1): readonly number[] {
  return metalIonCharges(complex.metal)
    .map((charge) => charge + complex.ligandCharge)
    .filter((charge) => Math.sign(charge) === sign);
}

// common practice: the ligand names of laboratory labels and older texts (as in hexacyanoferrate),
// sorted alphabetically in a name; nitrosyl is left out, since its complexes are named two ways.
const LIGAND_NAMES: ReadonlyMap<string, string> = new Map([
  ["NH3", "ammine"],
  ["H2O", "aqua"],
  ["OH2", "aqua"],
  ["CO", "carbonyl"],
  ["F", "fluoro"],
  ["Cl", "chloro"],
  ["Br", "bromo"],
  ["I", "iodo"],
  ["CN", "cyano"],
  ["OH", "hydroxo"],
  ["NO2", "nitro"],
  ["SCN", "thiocyanato"],
  ["C2O4", "oxalato"],
]);

const COUNT_PREFIXES: readonly string[] = ["", "", "di", "tri", "tetra", "penta", "hexa"];

const ROMAN: readonly string[] = ["0", "I", "II", "III", "IV", "V", "VI"];

/**
 * "tetraamminecopper(II)", "hexachloroplatinate(IV)": the name of the complex with this charge,
 * or undefined when a ligand or the metal has no name here.
 */
export function complexName(complex: ComplexIon, charge: number): string | undefined {
  const named: { readonly prefix: string; readonly name: string }[] = [];
  for (const ligand of complex.ligands) {
    const name = LIGAND_NAMES.get(ligand.formula);
    const prefix = COUNT_PREFIXES[ligand.count];
    if (name === undefined || prefix === undefined) return undefined;
    named.push({ prefix, name });
  }
  // Alphabetical by ligand name, the count prefix aside.
  const ligandText = named
    .sort((a, b) => (a.name < b.name ? -1 : a.name > b.name ? 1 : 0))
    .map((ligand) => ligand.prefix + ligand.name)
    .join("");
  const oxidationState = charge - complex.ligandCharge;
  const numeral = ROMAN[oxidationState];
  if (numeral === undefined || oxidationState < 1) return undefined;
  const metalName = charge < 0 ? ateNameOf(complex.metal) : elementBySymbol(complex.metal)?.name.toLowerCase();
  return metalName === undefined ? undefined : `${ligandText}${metalName}(${numeral})`;
}
