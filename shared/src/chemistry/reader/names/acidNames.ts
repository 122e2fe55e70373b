/**
 * Acids named after their anions: an "-ate" anion gives the "-ic acid" and an "-ite" anion the
 * "-ous acid", with one hydrogen for each negative charge (chlorite ClO2- -> chlorous acid HClO2,
 * sulfate SO4 2- -> sulfuric acid H2SO4). The anions are the ones the ion vocabulary lists.
 */
import { ION_NAMES } from "./ionNames";
import { haloComplexAnionByName } from "./haloComplexNames";

export interface AcidName {
  readonly name: string;
  /** Formula with the hydrogens written first, as the acid is usually written (HClO2). */
  readonly formula: string;
}

/**
 * "chlorate" -> "chloric acid", "sulfite" -> "sulfurous acid", "tetrachloroaurate(III)" ->
 * "tetrachloroauric(III) acid"; undefined for other ion names.
 */
export function acidNameOf(ionName: string): string | undefined {
  // Two-word ions (hydrogen sulfate), the "sulph" spelling (read as "sulf") and trade names
  // (metabisulfite) name no acid of their own.
  if (ionName.includes(" ") || ionName.includes("sulph") || ionName.includes("bisulf")) return undefined;
  const open = ionName.endsWith(")") ? ionName.lastIndexOf("(") : -1;
  const word = open > 0 ? ionName.slice(0, open) : ionName;
  const numeral = open > 0 ? ionName.slice(open) : "";
  const ending = word.endsWith("ate") ? "ic" : word.endsWith("ite") ? "ous" : undefined;
  if (ending === undefined) return undefined;
  let stem = word.slice(0, -3);
  // sulfate, phosphate: the acid takes the element's whole name (sulfuric, phosphoric)
  if (stem.endsWith("sulf")) stem += "ur";
  else if (stem.endsWith("phosph")) stem += "or";
  return `${stem}${ending}${numeral} acid`;
}

let acids: ReadonlyMap<string, AcidName> | undefined;

function acidsByName(): ReadonlyMap<string, AcidName> {
  if (acids !== undefined) return acids;
  const byName = new Map<string, AcidName>();
  for (const ion of ION_NAMES) {
    // An anion that already holds hydrogen (acetate, dihydrogen phosphate) is written with its
    // acid's own name and formula elsewhere; a cation names no acid.
    // A complex named with a Stock numeral (hexacyanoferrate(iii)) is listed for its salts only.
    if (ion.charge >= 0 || ion.body.includes("H") || ion.name.includes("(")) continue;
    const name = acidNameOf(ion.name);
    if (name === undefined || byName.has(name)) continue;
    const hydrogens = -ion.charge;
    byName.set(name, { name, formula: `H${hydrogens > 1 ? hydrogens : ""}${ion.body}` });
  }
  acids = byName;
  return byName;
}

/** The acid with this lower-case, single-spaced name ("chlorous acid"), or undefined. */
export function acidByName(name: string): AcidName | undefined {
  if (!name.endsWith(" acid")) return undefined;
  return acidsByName().get(name) ?? haloComplexAcid(name);
}

/** "hexachloroplatinic acid", "tetrachloroauric(iii) acid": the acid of a halo-complex anion named by rule. */
function haloComplexAcid(name: string): AcidName | undefined {
  const match = /^(\S+)ic(\([ivx]+\))? acid$/.exec(name);
  if (match === null) return undefined;
  const stem = match[1].endsWith("phosphor") ? match[1].slice(0, -2) : match[1];
  const anion = haloComplexAnionByName(`${stem}ate${match[2] ?? ""}`);
  if (anion === undefined) return undefined;
  const hydrogens = -anion.charge;
  return { name, formula: `H${hydrogens > 1 ? hydrogens : ""}${anion.body}` };
}

/** Every acid name the rule gives, for naming formulas and for spotting names in prose. */
export function acidNames(): readonly AcidName[] {
  return [...acidsByName().values()];
}
