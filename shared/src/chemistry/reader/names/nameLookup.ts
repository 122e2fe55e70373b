/**
 * Name -> structure and formula -> name: the one vocabulary of names, used by the species reader,
 * by prose spotting and by table columns alike. Names are matched lower-case with single spaces;
 * the formulas behind listed names are read by the formula reader once, on first use.
 */
import { elementByName } from "../../elements";
import type { FormulaPart } from "../../types";
import { chargeText } from "../chargeText";
import { readFormulaSpan } from "../readFormula";
import { acidByName, acidNames } from "./acidNames";
import { anionRootByName } from "./anionRoots";
import { COMMON_NAMES } from "./commonNames";
import { binaryCovalentName, formulaForCompoundName, usualCationCharge } from "./compoundNames";
import { ION_NAMES, ionByName } from "./ionNames";
import { NAMED_STRUCTURES, type NamedStructure } from "./namedStructures";
import { smilesForOrganicName } from "./organicNames";
import { NETWORK_SOLID_NAMES } from "./networkSolidNames";
import { NAME_SYNONYMS } from "./synonyms";
import { GREEK_PREFIXES } from "./greekPrefixes";
import { haloComplexAnionByName } from "./haloComplexNames";
import { stockCation, stockNumeralValue } from "./metalCations";
import { compareCodeUnits, sortSmall } from "../../sortSmall";

/**
 * A name that was understood, with the structure it stands for: a formula the formula reader
 * reads, a SMILES, or both (the formula is then what is shown, the SMILES what is analysed).
 */
export type NameMatch =
  | { readonly formula: string; readonly smiles?: string; readonly name: string; readonly listed: boolean }
  | { readonly formula?: undefined; readonly smiles: string; readonly name: string; readonly listed: boolean };

const COMMON_BY_NAME = new Map(COMMON_NAMES.map(([name, formula]) => [name, formula]));
const STRUCTURE_BY_NAME = new Map<string, NamedStructure>(NAMED_STRUCTURES.map((entry) => [entry.name, entry]));

/** Lower-case, runs of whitespace to one space, no space before "(" (so "iron (III)" = "iron(iii)"). */
export function normalizeName(text: string): string {
  let result = "";
  let pendingSpace = false;
  for (let i = 0; i < text.length; i++) {
    const character = text[i];
    if (character.trim() === "") {
      pendingSpace = result.length > 0;
      continue;
    }
    if (pendingSpace && character !== "(") result += " ";
    pendingSpace = false;
    result += character.toLowerCase();
  }
  return result;
}

/** The structure a normalised name stands for, or undefined. */
export function matchName(written: string): NameMatch | undefined {
  // British and older spellings of sulfur: one vocabulary for both
  const name = written.includes("sulph") ? written.replaceAll("sulph", "sulf") : written;
  // "anhydrous copper(ii) sulfate" is the salt without its water of crystallisation
  if (name.startsWith("anhydrous ")) return matchName(name.slice("anhydrous ".length));
  const direct = listedOrRuleName(name);
  if (direct !== undefined) return direct;
  // "iron(iii)" alone is the ion
  if (name.endsWith(")") && !name.includes(" ")) return monatomicCation(name);
  const hydrate = hydrateName(name);
  if (hydrate !== undefined) return hydrate;
  for (const suffix of [" ion", " anion", " cation"]) {
    if (!name.endsWith(suffix)) continue;
    const bare = name.slice(0, -suffix.length);
    const listed = listedOrRuleName(bare);
    if (listed?.formula?.includes("^")) return listed;
    const cation = monatomicCation(bare);
    if (cation !== undefined) return cation;
  }
  return undefined;
}

function listedOrRuleName(name: string): NameMatch | undefined {
  const synonym = NAME_SYNONYMS.get(name);
  if (synonym !== undefined) return listedOrRuleName(synonym) ?? hydrateName(synonym);
  const common = COMMON_BY_NAME.get(name);
  if (common !== undefined) return { formula: common, name, listed: true };
  const network = NETWORK_SOLID_NAMES.get(name);
  if (network !== undefined) return { formula: network, name, listed: true };
  const structure = STRUCTURE_BY_NAME.get(name);
  if (structure !== undefined) {
    return structure.formula === undefined
      ? { smiles: structure.smiles, name, listed: true }
      : { formula: structure.formula, smiles: structure.smiles, name, listed: true };
  }
  const ion = ionByName(name);
  if (ion !== undefined) return { formula: ion.body + chargeText(ion.charge), name, listed: true };
  const complex = haloComplexAnionByName(name);
  if (complex !== undefined) return { formula: complex.body + chargeText(complex.charge), name: complex.name, listed: false };
  const root = anionRootByName(name);
  if (root !== undefined) return { formula: root.symbol + chargeText(root.charge), name, listed: true };
  // an element named as a substance ("zinc" granules, "sulfur" in an inventory)
  const element = elementByName(name);
  if (element !== undefined && !name.includes(" ")) return { formula: element.symbol, name: element.name.toLowerCase(), listed: true };
  const acid = acidByName(name);
  if (acid !== undefined) return { formula: acid.formula, name, listed: false };
  const compound = formulaForCompoundName(name.split(" "));
  if (compound !== undefined) return { formula: compound.formula, name: compound.systematicName ?? name, listed: false };
  const smiles = smilesForOrganicName(name);
  return smiles === undefined ? undefined : { smiles, name, listed: true };
}

/** "monohydrate" 1 ... "decahydrate" 10, "dodecahydrate" 12, "octadecahydrate" 18. */
const HYDRATE_COUNTS = new Map([
  ...GREEK_PREFIXES.map((prefix, index): [string, number] => [`${prefix}hydrate`, index + 1]),
  // common practice: alums and aluminium sulfate carry 12 and 18 waters
  ["dodecahydrate", 12],
  ["octadecahydrate", 18],
]);

/** "copper(ii) sulfate pentahydrate" -> CuSO4·5H2O. */
function hydrateName(name: string): NameMatch | undefined {
  const space = name.lastIndexOf(" ");
  if (space < 0) return undefined;
  const count = HYDRATE_COUNTS.get(name.slice(space + 1));
  if (count === undefined) return undefined;
  const salt = listedOrRuleName(name.slice(0, space));
  if (salt === undefined || salt.formula === undefined || salt.smiles !== undefined || salt.formula.includes("^")) return undefined;
  const water = count === 1 ? "H2O" : `${count}H2O`;
  return { formula: `${salt.formula}·${water}`, name: `${salt.name}${name.slice(space)}`, listed: salt.listed };
}

/** The SMILES of the structure a listed name means, where the vocabulary keeps one. */
export function smilesForName(name: string): string | undefined {
  return STRUCTURE_BY_NAME.get(name)?.smiles;
}

/** "sodium ion" -> Na^+, "iron(iii) ion" -> Fe^3+. */
function monatomicCation(name: string): NameMatch | undefined {
  const open = name.indexOf("(");
  if (open > 0 && name.endsWith(")")) {
    const element = elementByName(name.slice(0, open));
    const charge = stockNumeralValue(name.slice(open + 1, -1));
    const cation = element === undefined || charge === 0 ? undefined : stockCation(element.symbol, charge);
    if (cation === undefined) return undefined;
    return { formula: cation.body + chargeText(cation.charge), name: `${name} ion`, listed: false };
  }
  const element = elementByName(name);
  const charge = element?.symbol === "H" ? 1 : element === undefined ? undefined : usualCationCharge(element);
  if (element === undefined || charge === undefined) return undefined;
  return { formula: element.symbol + chargeText(charge), name: `${name} ion`, listed: false };
}

/** Every listed name and synonym, for spelling suggestions and for spotting names in prose. */
export function listedNames(): readonly string[] {
  return [
    ...COMMON_BY_NAME.keys(),
    ...STRUCTURE_BY_NAME.keys(),
    ...ION_NAMES.map((ion) => ion.name),
    ...NAME_SYNONYMS.keys(),
    ...NETWORK_SOLID_NAMES.keys(),
  ];
}

interface NameIndex {
  readonly byFormula: Map<string, string>;
  /** null marks a composition shared by differently written listed formulas (isomers). */
  readonly byComposition: Map<string, string | null>;
}

let index: NameIndex | undefined;

function nameIndex(): NameIndex {
  if (index !== undefined) return index;
  const byFormula = new Map<string, string>();
  const byComposition = new Map<string, string | null>();
  const formulaOfComposition = new Map<string, string>();
  const entries: [string, string, boolean][] = [
    ...COMMON_NAMES.map(([name, formula]): [string, string, boolean] => [name, formula, true]),
    ...ION_NAMES.map((ion): [string, string, boolean] => [ion.name, ion.body + chargeText(ion.charge), true]),
    // a structure with isomers names only its own written formula, never every formula of its composition
    ...NAMED_STRUCTURES.flatMap((entry): [string, string, boolean][] =>
      entry.formula === undefined ? [] : [[entry.name, entry.formula, false]],
    ),
    // an acid named after its anion names its own written formula: HOCN is cyanic acid, HNCO is not
    ...acidNames().map((acid): [string, string, boolean] => [acid.name, acid.formula, false]),
  ];
  for (const [name, formulaText, byParts] of entries) {
    const reading = readFormulaSpan(formulaText, 0, formulaText.length, "formula");
    if (!reading.ok) continue;
    const { formula, composition, charge } = reading.value;
    if (!byFormula.has(formula)) byFormula.set(formula, name);
    if (!byParts) continue;
    const key = compositionKey(composition, charge);
    const seen = formulaOfComposition.get(key);
    if (seen === undefined) {
      formulaOfComposition.set(key, formula);
      byComposition.set(key, name);
    } else if (seen !== formula) {
      byComposition.set(key, null);
    }
  }
  index = { byFormula, byComposition };
  return index;
}

/** Element counts sorted by symbol, plus charge: equal for every way of writing one composition. */
export function compositionKey(composition: readonly FormulaPart[], charge: number): string {
  return (
    sortSmall(
      composition.map((part) => `${part.symbol}${part.count}`),
      compareCodeUnits,
    ).join("") + `|${charge}`
  );
}

/**
 * A name for a formula: the listed name for this exact formula, else the listed name for its
 * composition when only one listed species has it, else the binary covalent name.
 */
export function nameForFormula(
  formula: string,
  composition: readonly FormulaPart[],
  writtenSequence: readonly FormulaPart[],
  charge: number,
): string | undefined {
  const { byFormula, byComposition } = nameIndex();
  const exact = byFormula.get(formula);
  if (exact !== undefined) return exact;
  const byParts = byComposition.get(compositionKey(composition, charge));
  if (byParts) return byParts;
  return binaryCovalentName(writtenSequence, charge);
}
