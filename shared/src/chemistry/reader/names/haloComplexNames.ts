/**
 * Additive names of halo-complex anions, read by rule: a count prefix, a halide ligand, the
 * central element's "-ate" word and an optional Stock numeral ("dichloroiodate(I)" ICl2-,
 * "tetrachloroiodate(III)" ICl4-, "hexachloroplatinate(IV)" PtCl6 2-). The numeral must be an
 * oxidation state the centre takes and must leave an anion; without one the centre takes its
 * highest such state (tetrachloroaurate is gold(III), hexafluorophosphate phosphorus(V)).
 */
import { haloCentreOxidationStates, haloComplexCharges, type HaloComplexParts } from "../../analysis/haloComplexAnions";
import { ateNameOf, elementByAteName } from "./ateNames";
import { GREEK_PREFIXES } from "./greekPrefixes";
import type { IonName } from "./ionNames";

// common practice: the halide ligand names, the older "-o" form and the current "-ido" form
const HALIDE_LIGANDS: readonly (readonly [word: string, symbol: string])[] = [
  ["fluorido", "F"],
  ["fluoro", "F"],
  ["chlorido", "Cl"],
  ["chloro", "Cl"],
  ["bromido", "Br"],
  ["bromo", "Br"],
  ["iodido", "I"],
  ["iodo", "I"],
];

const NUMERALS: readonly string[] = ["i", "ii", "iii", "iv", "v", "vi", "vii", "viii"];

/** The halo-complex anion a lower-case name stands for ("tetrachloroaurate(iii)"), or undefined. */
export function haloComplexAnionByName(name: string): IonName | undefined {
  const numeral = /\(([ivx]+)\)$/.exec(name);
  const word = numeral === null ? name : name.slice(0, numeral.index);
  if (!word.endsWith("ate")) return undefined;
  const oxidationState = numeral === null ? undefined : NUMERALS.indexOf(numeral[1]) + 1;
  if (oxidationState === 0) return undefined;
  for (let index = GREEK_PREFIXES.length - 1; index >= 1; index--) {
    const prefix = GREEK_PREFIXES[index];
    if (!word.startsWith(prefix)) continue;
    const ligand = HALIDE_LIGANDS.find(([ligandWord]) => word.startsWith(ligandWord, prefix.length));
    if (ligand === undefined) continue;
    const centre = elementByAteName(word.slice(prefix.length + ligand[0].length));
    if (centre === undefined) return undefined;
    const halides = index + 1;
    const charge = chargeOf(centre, halides, oxidationState);
    if (charge === undefined) return undefined;
    return { name: numeral === null ? name : `${word}(${numeral[1].toUpperCase()})`, body: `${centre}${ligand[1]}${halides}`, charge };
  }
  return undefined;
}

function chargeOf(centre: string, halides: number, oxidationState: number | undefined): number | undefined {
  if (oxidationState === undefined) return haloComplexCharges(centre, halides)[0];
  if (!haloCentreOxidationStates(centre).includes(oxidationState)) return undefined;
  const charge = oxidationState - halides;
  return charge < 0 ? charge : undefined;
}

/**
 * The name of a halo-complex anion with this charge ("hexafluoroaluminate", "dichloroiodate(I)"),
 * the numeral written only where the name alone would read another charge; undefined when no name fits.
 */
export function haloComplexAnionName(parts: HaloComplexParts, charge: number): string | undefined {
  const prefix = GREEK_PREFIXES[parts.halides - 1];
  const ligand = HALIDE_LIGANDS.find(([word, symbol]) => symbol === parts.halide && !word.endsWith("ido"));
  const ate = ateNameOf(parts.centre);
  const oxidationState = charge + parts.halides;
  if (
    prefix === undefined ||
    ligand === undefined ||
    ate === undefined ||
    !haloCentreOxidationStates(parts.centre).includes(oxidationState)
  )
    return undefined;
  const word = `${prefix}${ligand[0]}${ate}`;
  return haloComplexCharges(parts.centre, parts.halides)[0] === charge ? word : `${word}(${NUMERALS[oxidationState - 1].toUpperCase()})`;
}
