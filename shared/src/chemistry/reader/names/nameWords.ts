/**
 * What the name vocabulary says about single words and short phrases, for finding names in
 * running text without asking the reader about every word: which words may begin a name, whether
 * a phrase is a name, and which phrases hold a name but name no species ("lime water").
 */
import { ELEMENTS, elementByName } from "../../elements";
import { acidNames } from "./acidNames";
import { ANION_ROOTS, anionRootByName } from "./anionRoots";
import { GREEK_PREFIXES, joinPrefix } from "./greekPrefixes";
import { haloComplexAnionByName } from "./haloComplexNames";
import { oldCationNames } from "./metalCations";
import { listedNames, matchName } from "./nameLookup";
import { alkylGroupNames } from "./organicNames";
import { LAB_ABBREVIATIONS } from "./synonyms";

/**
 * Phrases that contain a name but are mixtures, solutions or materials, not the species the
 * name inside them names.
 */
// common practice: bench reagents named after what they are made from
const NOT_SPECIES_PHRASES: ReadonlySet<string> = new Set([
  "lime water",
  "baryta water",
  "soda water",
  "soda lime",
  "heavy water",
  "hydrogen bond",
  "hydrogen bonds",
  "hydrogen bonding",
  "hydrogen bonded",
]);

let startWords: ReadonlySet<string> | undefined;
let laterWords: ReadonlySet<string> | undefined;

/** Words that come after the first in some name: "acid", "sulfate", "pentahydrate", "ether". */
function nameLaterWords(): ReadonlySet<string> {
  if (laterWords !== undefined) return laterWords;
  const words = new Set<string>(["acid", "alcohol", "ether", "ion", "ions"]);
  for (const name of [...listedNames(), ...NOT_SPECIES_PHRASES]) {
    const parts = name.split(" ");
    for (let index = 1; index < parts.length; index++) words.add(parts[index]);
  }
  for (const prefix of GREEK_PREFIXES) words.add(`${prefix}hydrate`);
  for (const root of ANION_ROOTS) for (const prefix of ["", ...GREEK_PREFIXES]) words.add(joinPrefix(prefix, root.root));
  for (const alkyl of alkylGroupNames()) words.add(alkyl);
  laterWords = words;
  return words;
}

/**
 * True when a lower-case word may follow the first word inside a name: a later word of some
 * name, an ion or "-ate/-ite/-ide" word, a Stock numeral written apart, or a word that may begin a
 * name ("anhydrous copper(ii) sulfate").
 */
export function mayContinueName(word: string): boolean {
  if (nameLaterWords().has(word) || word.charCodeAt(0) === 0x28) return true;
  if (word.length > 4 && /(?:ate|ite|ide)$/.test(word)) return true;
  return mayStartName(word);
}

/**
 * "dichloroiodate(i)", "tetrachloroaurate": a halo-complex anion, named by rule rather than
 * listed, or the first word of its acid ("tetrachloroauric acid").
 */
function isHaloComplexWord(word: string): boolean {
  const stem = /^(.{8,})(ate|ic)(\([iv]+\))?$/.exec(word);
  return stem !== null && haloComplexAnionByName(`${stem[1]}ate${stem[3] ?? ""}`) !== undefined;
}

function nameStartWords(): ReadonlySet<string> {
  if (startWords !== undefined) return startWords;
  const words = new Set<string>();
  const addFirstWord = (name: string): void => {
    const space = name.indexOf(" ");
    words.add(space < 0 ? name : name.slice(0, space));
  };
  for (const name of listedNames()) addFirstWord(name);
  for (const acid of acidNames()) addFirstWord(acid.name);
  for (const root of ANION_ROOTS) words.add(root.root);
  words.add("anhydrous");
  for (const phrase of NOT_SPECIES_PHRASES) addFirstWord(phrase);
  for (const element of ELEMENTS) {
    const name = element.name.toLowerCase();
    words.add(name);
    for (const prefix of GREEK_PREFIXES) words.add(joinPrefix(prefix, name));
  }
  for (const adjective of oldCationNames()) words.add(adjective);
  for (const alkyl of alkylGroupNames()) {
    words.add(alkyl);
    words.add(`di${alkyl}`);
  }
  startWords = words;
  return words;
}

// Endings of the organic names the chain reader builds ("hexane", "propan-2-ol", "butanoic").
const ORGANIC_ENDING = /(?:ane|ene|yne|ol|al|one|amine|amide|nitrile|oic)$/;

/** True when a lower-case word may be the first (or only) word of a name. */
export function mayStartName(written: string): boolean {
  const word = written.includes("sulph") ? written.replaceAll("sulph", "sulf") : written;
  const words = nameStartWords();
  if (words.has(word) || isHaloComplexWord(word)) return true;
  // "iron(iii)": an element with a Stock numeral
  const open = word.indexOf("(");
  if (open > 0 && word.endsWith(")")) return words.has(word.slice(0, open));
  return word.length >= 5 && ORGANIC_ENDING.test(word);
}

import type { NameMatch } from "./nameLookup";

const MEMO_LIMIT = 4_000;
const known = new Map<string, NameMatch | null>();

/** The vocabulary's match for a phrase, remembered: prose asks about the same words again and again. */
function knownMatch(phrase: string): NameMatch | null {
  const remembered = known.get(phrase);
  if (remembered !== undefined) return remembered;
  const match = matchName(phrase) ?? null;
  if (known.size >= MEMO_LIMIT) known.clear();
  known.set(phrase, match);
  return match;
}

/** True when a normalised phrase (lower case, single spaces) is a name of the vocabulary. */
export function isKnownName(phrase: string): boolean {
  return knownMatch(phrase) !== null;
}

/** True for phrases that hold a name but name no single species ("lime water"). */
export function isNotASpeciesPhrase(phrase: string): boolean {
  return NOT_SPECIES_PHRASES.has(phrase);
}

/** True for a lab abbreviation written exactly as chemists write it ("DCM", "EtOH"). */
export function isLabAbbreviation(word: string): boolean {
  return LAB_ABBREVIATIONS.has(word);
}

/** How a name of one word reads alone in running text. */
export type LoneNameKind =
  /** One species: "acetone", "ammonia", "sulfate". */
  | "species"
  /** An element, which prose names far more often as an atom than as a substance. */
  | "element"
  /** A class of compounds or a bare anion root: "an amide", "the oxide layer", "a fluoride". */
  | "class";

// common practice: words that name a family of compounds as often as one species; of the bare
// "-ide" anions only the halides and sulfide are usual as dissolved ions ("chloride by titration")
// and materials named in lab notes as tools ("a quartz cuvette", "the diamond ATR crystal")
const CLASS_WORDS: ReadonlySet<string> = new Set(["amide", "peroxide", "ether", "hydride", "superoxide", "quartz", "diamond", "graphite"]);
const LONE_ANION_ROOTS: ReadonlySet<string> = new Set(["fluoride", "chloride", "bromide", "iodide", "sulfide", "sulphide"]);

/** What a lower-case word means alone, or undefined when it is no name. */
export function loneNameKind(word: string): LoneNameKind | undefined {
  if (!isKnownName(word)) return undefined;
  if (elementByName(word) !== undefined) return "element";
  if (CLASS_WORDS.has(word)) return "class";
  if (anionRootByName(word) !== undefined && !LONE_ANION_ROOTS.has(word)) return "class";
  return "species";
}

/** True for a word that names an ion ("nitrate", "ammonium", "chloride"). */
export function isIonName(word: string): boolean {
  return knownMatch(word)?.formula?.includes("^") === true;
}

/** True for a word that names a cation or a metal, the first half of a salt's name. */
export function isCationWord(word: string): boolean {
  const match = knownMatch(word);
  if (match === null) return oldCationNames().includes(word);
  return elementByName(word) !== undefined || (match.formula?.includes("^") === true && match.formula.endsWith("+"));
}
