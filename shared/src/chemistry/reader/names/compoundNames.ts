/**
 * Reads names built by rule rather than listed: binary covalent names with Greek prefixes
 * ("sulfur tetrafluoride", "dinitrogen tetroxide"), hydrogen compounds ("hydrogen sulfide"),
 * salts of metals with one usual charge or a Stock numeral ("calcium chloride", "iron(III) oxide")
 * and salts of polyatomic ions ("ammonium nitrate", "sodium sulfate"). Also writes the binary
 * covalent name for a formula ("SF4" -> "sulfur tetrafluoride").
 */
import { elementByName, elementBySymbol } from "../../elements";
import type { ElementData, FormulaPart } from "../../types";
import { metalIonCharges } from "../../analysis/metalIonCharges";
import { NONMETALS } from "../nonmetals";
import { anionRootByName, anionRootBySymbol } from "./anionRoots";
import { joinPrefix, prefixFor, prefixReadings } from "./greekPrefixes";
import { ionByName } from "./ionNames";
import { haloComplexAnionByName } from "./haloComplexNames";
import { assumedCationCharge, cationByOldName, metalCation, type MetalCation } from "./metalCations";

const ROMAN_NUMERALS: readonly string[] = ["i", "ii", "iii", "iv", "v", "vi", "vii", "viii"];

interface NamedPart {
  /** Formula of the part without charge: "Fe", "NH4", "SO4". */
  readonly body: string;
  readonly singleElement: boolean;
  readonly count: number;
  readonly prefixed: boolean;
  /** Charge of the bare ion where the name fixes it. */
  readonly charge?: number;
  readonly element?: ElementData;
  /** The cation in Stock form when the name wrote it otherwise ("ferric" -> "iron(iii)"). */
  readonly stockWord?: string;
}

/** What a compound name stands for: a formula, and the systematic name when it differs. */
export interface CompoundNameReading {
  readonly formula: string;
  /** The Stock name for an old or numeral-free salt name ("ferric chloride" -> "iron(iii) chloride"). */
  readonly systematicName?: string;
}

/** Formula text for a compound name split into lower-case words, or undefined. */
export function formulaForCompoundName(words: readonly string[]): CompoundNameReading | undefined {
  if (words.length < 2) return undefined;
  const mixed = mixedValenceOxide(words);
  if (mixed !== undefined) return mixed;
  const cation = readCationWord(words[0]);
  if (cation !== undefined) {
    // "disulfide" is an ion (S2^2-) in "iron(ii) disulfide" and two sulfides in "carbon disulfide"
    for (const anion of readAnionWords(words.slice(1))) {
      const reading = compoundOf(cation, anion, words);
      if (reading !== undefined) return reading;
    }
  }
  return doubleSalt(words);
}

/**
 * "iron(ii,iii) oxide", "lead(ii,iv) oxide": the mixed-valence oxides M3O4, one M2+ with two M3+
 * or two M2+ with one M4+, for a metal that takes both charges.
 */
function mixedValenceOxide(words: readonly string[]): CompoundNameReading | undefined {
  if (words.length !== 2 || words[1] !== "oxide") return undefined;
  const match = /^([a-z]+)\((ii,iii|ii,iv)\)$/.exec(words[0]);
  const element = match ? elementByName(match[1]) : undefined;
  if (!match || element === undefined) return undefined;
  const charges = match[2] === "ii,iii" ? [2, 3] : [2, 4];
  if (!charges.every((charge) => metalIonCharges(element.symbol).includes(charge))) return undefined;
  return { formula: `${element.symbol}3O4` };
}

/**
 * Double salts named cation, cation, anion: "ammonium iron(ii) sulfate" (NH4)2Fe(SO4)2,
 * "potassium aluminium sulfate" KAl(SO4)2. One of the ion with the larger charge; of the other
 * as few as make the cations' charge a whole number of anions. Written in the name's order.
 */
function doubleSalt(words: readonly string[]): CompoundNameReading | undefined {
  if (words.length < 3) return undefined;
  const first = readCationWord(words[0]);
  const second = readCationWord(words[1]);
  const anion = readAnionWords(words.slice(2)).find((reading) => !reading.prefixed);
  if (first === undefined || second === undefined || anion === undefined || first.body === second.body) return undefined;
  const firstCharge = saltCationCharge(first);
  const secondCharge = saltCationCharge(second);
  const anionCharge = -(anion.charge as number);
  if (firstCharge === undefined || secondCharge === undefined || Math.min(firstCharge, secondCharge) > 1) return undefined;
  // The singly charged ion is the one whose count grows (the first, when both are).
  const growsFirst = firstCharge === 1 && secondCharge > 1;
  const [grown, fixed] = growsFirst ? [firstCharge, secondCharge] : [secondCharge, firstCharge];
  for (let count = 1; count <= anionCharge; count++) {
    const total = count * grown + fixed;
    if (total % anionCharge !== 0) continue;
    const [firstCount, secondCount] = growsFirst ? [count, 1] : [1, count];
    const formula = group(first, firstCount) + group(second, secondCount) + group(anion, total / anionCharge);
    const stockWords = [first.stockWord ?? words[0], second.stockWord ?? words[1], ...words.slice(2)];
    return first.stockWord === undefined && second.stockWord === undefined
      ? { formula }
      : { formula, systematicName: stockWords.join(" ") };
  }
  return undefined;
}

/** The charge a named cation has in a salt: its own, or the metal's one usual charge. */
function saltCationCharge(cation: NamedPart): number | undefined {
  if (cation.prefixed) return undefined;
  return ionCharge(cation);
}

/** The charge of a named cation's ion, counted or not: its own, or the metal's one usual charge. */
function ionCharge(cation: NamedPart): number | undefined {
  if (cation.charge !== undefined) return cation.charge;
  return cation.element === undefined ? undefined : usualCationCharge(cation.element);
}

/**
 * "disodium hydrogen phosphate" Na2HPO4, "trisodium phosphate" Na3PO4, "diammonium hydrogen
 * phosphate" (NH4)2HPO4: a count prefix on an ionic cation states how many balance one anion.
 */
function countedSalt(cation: NamedPart, anion: NamedPart): CompoundNameReading | undefined {
  const charge = ionCharge(cation);
  if (charge === undefined || anion.prefixed || cation.count * charge !== -(anion.charge as number)) return undefined;
  return { formula: group(cation, cation.count) + group(anion, 1) };
}

function compoundOf(cation: NamedPart, anion: NamedPart, words: readonly string[]): CompoundNameReading | undefined {
  const anionCharge = anion.charge as number;
  if (cation.prefixed && !anion.prefixed) {
    const counted = countedSalt(cation, anion);
    if (counted !== undefined) return counted;
  }
  const systematic = (formula: string | undefined, stockWord = cation.stockWord): CompoundNameReading | undefined => {
    if (formula === undefined) return undefined;
    return stockWord === undefined ? { formula } : { formula, systematicName: [stockWord, ...words.slice(1)].join(" ") };
  };

  if (cation.prefixed || anion.prefixed) {
    if (!cation.singleElement || !anion.singleElement || cation.charge !== undefined) return undefined;
    const count = cation.prefixed ? cation.count : firstElementCount(cation, anion);
    return count === undefined ? undefined : { formula: part(cation.body, count) + part(anion.body, anion.count) };
  }
  if (cation.charge !== undefined) return systematic(balanced(cation, cation.charge, anion, anionCharge));
  const element = cation.element as ElementData;
  if (element.symbol === "H" && anion.singleElement) return { formula: part("H", -anionCharge) + anion.body };
  const usual = usualCationCharge(element);
  if (usual !== undefined) return systematic(balanced(cation, usual, anion, anionCharge));
  if (NONMETALS.has(element.symbol) && anion.singleElement) return { formula: cation.body + anion.body };
  const assumed = assumedCationCharge(element.symbol);
  if (assumed !== undefined) {
    return systematic(balanced(cation, assumed, anion, anionCharge), `${words[0]}(${ROMAN_NUMERALS[assumed - 1]})`);
  }
  return undefined;
}

/**
 * How many atoms of the first element a name without a prefix on it means: one ("sulfur
 * trioxide" SO3), unless one atom would need an oxidation state beyond its group's highest;
 * then two, as in the older names "phosphorus pentoxide" P2O5, "arsenic trioxide" As2O3 and
 * "vanadium pentoxide" V2O5. Undefined when neither fits.
 */
function firstElementCount(cation: NamedPart, anion: NamedPart): number | undefined {
  const element = cation.element as ElementData;
  const electrons = -(anion.charge as number) * anion.count;
  // Nitrogen's oxides are written with both prefixes, and NO3 is a radical in its own right.
  if (element.symbol === "N") return 1;
  const highest = highestOxidationState(element);
  if (electrons <= highest) return 1;
  return electrons % 2 === 0 && electrons / 2 <= highest ? 2 : undefined;
}

/** The highest oxidation state an element's group allows (common practice: the group's valence electrons, at most 8). */
function highestOxidationState(element: ElementData): number {
  if (element.group >= 13) return element.group - 10;
  return Math.min(element.group, 8);
}

/** "sulfur tetrafluoride" for SF4: the prefixed name of a neutral binary covalent compound. */
export function binaryCovalentName(sequence: readonly FormulaPart[], charge: number): string | undefined {
  if (charge !== 0 || sequence.length !== 2) return undefined;
  const [first, second] = sequence;
  if (first.symbol === second.symbol) return undefined;
  const firstElement = elementBySymbol(first.symbol);
  const anion = anionRootBySymbol(second.symbol);
  if (firstElement === undefined || anion === undefined) return undefined;
  if (first.symbol === "H") {
    return first.count === -anion.charge && second.count === 1 ? `hydrogen ${anion.root}` : undefined;
  }
  const usual = usualCationCharge(firstElement);
  if (usual !== undefined) {
    const lcm = leastCommonMultiple(usual, -anion.charge);
    const fits = first.count === lcm / usual && second.count === lcm / -anion.charge;
    return fits ? `${firstElement.name} ${anion.root}` : undefined;
  }
  if (!NONMETALS.has(first.symbol) && second.symbol !== "H") return metalHalideName(firstElement, first.count, second.count, anion);
  // hydrides of nonmetals go by parent-hydride names (methane, silane), never "carbon tetrahydride"
  if (!NONMETALS.has(first.symbol) || second.symbol === "H") return undefined;
  const firstPrefix = first.count === 1 ? "" : prefixFor(first.count);
  const secondPrefix = prefixFor(second.count);
  if (firstPrefix === undefined || secondPrefix === undefined) return undefined;
  return `${firstPrefix}${firstElement.name} ${joinPrefix(secondPrefix, anion.root)}`;
}

/**
 * "tin(II) chloride", "mercury(I) chloride", "bismuth(III) chloride": a metal's halide named by
 * the charge its count implies, when that is one of the metal's usual charges (Hg2Cl2 holds the
 * Hg2 2+ pair). Oxides and sulfides are left to the salt reader, which knows MnS2 is a disulfide.
 */
function metalHalideName(
  metal: ElementData,
  metalCount: number,
  anionCount: number,
  anion: { root: string; charge: number },
): string | undefined {
  if (anion.charge !== -1) return undefined;
  const mercuryPair = metal.symbol === "Hg" && metalCount === 2 && anionCount === 2;
  const charge = mercuryPair ? 1 : anionCount;
  // One metal atom per formula: Sn2Cl4 is not how tin(II) chloride is written.
  if (!mercuryPair && (metalCount !== 1 || !metalIonCharges(metal.symbol).includes(charge))) return undefined;
  return `${metal.name}(${ROMAN_NUMERALS[charge - 1].toUpperCase()}) ${anion.root}`;
}

function readCationWord(word: string): NamedPart | undefined {
  const ion = ionByName(word);
  if (ion !== undefined && ion.charge > 0) {
    return { body: ion.body, singleElement: false, count: 1, prefixed: false, charge: ion.charge };
  }
  const open = word.indexOf("(");
  if (open > 0 && word.endsWith(")")) {
    const element = elementByName(word.slice(0, open));
    const numeral = ROMAN_NUMERALS.indexOf(word.slice(open + 1, -1));
    if (element === undefined || numeral < 0) return undefined;
    return cationPart(metalCation(element.symbol, numeral + 1));
  }
  const old = cationByOldName(word);
  if (old !== undefined) {
    const numeral = ROMAN_NUMERALS[(old.body === "Hg2" ? 1 : old.charge) - 1];
    const named = cationPart(old);
    return named && { ...named, stockWord: `${old.element.name}(${numeral})` };
  }
  for (const reading of prefixReadings(word)) {
    const element = elementByName(reading.rest);
    if (element !== undefined) {
      return { body: element.symbol, singleElement: true, count: reading.count, prefixed: reading.prefixed, element };
    }
    // "diammonium": a counted polyatomic cation
    const counted = reading.prefixed ? ionByName(reading.rest) : undefined;
    if (counted !== undefined && counted.charge > 0) {
      return { body: counted.body, singleElement: false, count: reading.count, prefixed: true, charge: counted.charge };
    }
  }
  return undefined;
}

function cationPart(cation: MetalCation | undefined): NamedPart | undefined {
  if (cation === undefined) return undefined;
  return { body: cation.body, singleElement: cation.singleAtom, count: 1, prefixed: false, charge: cation.charge, element: cation.element };
}

/** Every reading of the anion words: a listed ion first, then a prefixed "-ide" root. */
function readAnionWords(words: readonly string[]): NamedPart[] {
  const readings: NamedPart[] = [];
  const ion = ionByName(words.join(" ")) ?? (words.length === 1 ? haloComplexAnionByName(words[0]) : undefined);
  if (ion !== undefined && ion.charge < 0) {
    readings.push({ body: ion.body, singleElement: false, count: 1, prefixed: false, charge: ion.charge });
  }
  if (words.length !== 1) return readings;
  for (const reading of prefixReadings(words[0])) {
    const root = anionRootByName(reading.rest);
    if (root !== undefined) {
      readings.push({ body: root.symbol, singleElement: true, count: reading.count, prefixed: reading.prefixed, charge: root.charge });
      break;
    }
  }
  return readings;
}

/** The one charge a metal takes in nearly all its salts, where there is one. */
export function usualCationCharge(element: ElementData): number | undefined {
  if (element.symbol === "H") return undefined;
  if (element.group === 1) return 1;
  if (element.group === 2) return 2;
  if (element.symbol === "Al" || element.symbol === "Ga") return 3;
  if (element.symbol === "Zn" || element.symbol === "Cd") return 2;
  if (element.symbol === "Ag") return 1;
  return undefined;
}

function balanced(cation: NamedPart, cationCharge: number, anion: NamedPart, anionCharge: number): string | undefined {
  if (cationCharge <= 0 || anionCharge >= 0) return undefined;
  const lcm = leastCommonMultiple(cationCharge, -anionCharge);
  return group(cation, lcm / cationCharge) + group(anion, lcm / -anionCharge);
}

function group(named: NamedPart, count: number): string {
  // A complex ion named as one word (ferricyanide) is written in square brackets: K3[Fe(CN)6].
  if (!named.singleElement && isComplexBody(named.body)) return part(`[${named.body}]`, count);
  if (named.singleElement || count === 1) return part(named.body, count);
  return `(${named.body})${count}`;
}

function part(body: string, count: number): string {
  return count === 1 ? body : `${body}${count}`;
}

function leastCommonMultiple(a: number, b: number): number {
  let x = a;
  let y = b;
  while (y !== 0) [x, y] = [y, x % y];
  return (a * b) / x;
}

/** A metal holding bracketed ligands: "Fe(CN)6", "Al(OH)4". */
function isComplexBody(body: string): boolean {
  const symbolEnd = body.length > 1 && body.charCodeAt(1) >= 0x61 && body.charCodeAt(1) <= 0x7a ? 2 : 1;
  const symbol = body.slice(0, symbolEnd);
  return elementBySymbol(symbol) !== undefined && !NONMETALS.has(symbol) && body.includes("(");
}
