/**
 * Name -> formula and formula -> name. Names are matched lower-case with single spaces; the
 * formulas behind listed names are read by the formula reader once, on first use.
 */
import { elementByName } from "../../elements";
import type { FormulaPart } from "../../types";
import { chargeText } from "../chargeText";
import { readFormulaSpan } from "../readFormula";
import { anionRootByName } from "./anionRoots";
import { COMMON_NAMES } from "./commonNames";
import { binaryCovalentName, formulaForCompoundName, usualCationCharge } from "./compoundNames";
import { ION_NAMES, ionByName } from "./ionNames";
import { compareCodeUnits, sortSmall } from "../../sortSmall";

/** A name that was understood, with the formula text it stands for. */
export interface NameMatch {
  readonly formula: string;
  /** The name in its preferred lower-case spelling. */
  readonly name: string;
  /** True for listed names (common molecules and ions), false for names built by rule. */
  readonly listed: boolean;
}

const COMMON_BY_NAME = new Map(COMMON_NAMES.map(([name, formula]) => [name, formula]));

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

/** The formula a normalised name stands for, or undefined. */
export function matchName(name: string): NameMatch | undefined {
  const direct = listedOrRuleName(name);
  if (direct !== undefined) return direct;
  for (const suffix of [" ion", " anion", " cation"]) {
    if (!name.endsWith(suffix)) continue;
    const bare = name.slice(0, -suffix.length);
    const listed = listedOrRuleName(bare);
    if (listed !== undefined && listed.formula.includes("^")) return listed;
    const cation = monatomicCation(bare);
    if (cation !== undefined) return cation;
  }
  return undefined;
}

function listedOrRuleName(name: string): NameMatch | undefined {
  const common = COMMON_BY_NAME.get(name);
  if (common !== undefined) return { formula: common, name, listed: true };
  const ion = ionByName(name);
  if (ion !== undefined) return { formula: ion.body + chargeText(ion.charge), name, listed: true };
  const root = anionRootByName(name);
  if (root !== undefined) return { formula: root.symbol + chargeText(root.charge), name, listed: true };
  const formula = formulaForCompoundName(name.split(" "));
  return formula === undefined ? undefined : { formula, name, listed: false };
}

/** "sodium ion" -> Na^+, "iron(iii) ion" -> Fe^3+. */
function monatomicCation(name: string): NameMatch | undefined {
  const open = name.indexOf("(");
  if (open > 0 && name.endsWith(")")) {
    const element = elementByName(name.slice(0, open));
    const charge = ["i", "ii", "iii", "iv", "v", "vi", "vii", "viii"].indexOf(name.slice(open + 1, -1)) + 1;
    if (element === undefined || charge === 0) return undefined;
    return { formula: element.symbol + chargeText(charge), name: `${name} ion`, listed: false };
  }
  const element = elementByName(name);
  const charge = element === undefined ? undefined : usualCationCharge(element);
  if (element === undefined || charge === undefined) return undefined;
  return { formula: element.symbol + chargeText(charge), name: `${name} ion`, listed: false };
}

/** Every listed name, for spelling suggestions. */
export function listedNames(): readonly string[] {
  return [...COMMON_BY_NAME.keys(), ...ION_NAMES.map((ion) => ion.name)];
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
  const entries: [string, string][] = [
    ...COMMON_NAMES.map(([name, formula]): [string, string] => [name, formula]),
    ...ION_NAMES.map((ion): [string, string] => [ion.name, ion.body + chargeText(ion.charge)]),
  ];
  for (const [name, formulaText] of entries) {
    const reading = readFormulaSpan(formulaText, 0, formulaText.length, "formula");
    if (!reading.ok) continue;
    const { formula, composition, charge } = reading.value;
    if (!byFormula.has(formula)) byFormula.set(formula, name);
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
