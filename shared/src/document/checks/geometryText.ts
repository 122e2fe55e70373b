/**
 * Geometry names as tables write them ("Trigonal-Pyramidal", "see-saw", "T shaped",
 * "tetrahedron", "V-shaped"; in German, French and Spanish tables "gewinkelt", "tétraédrique",
 * "piramidal trigonal"), reduced to the names the core uses for comparison, and the core's names
 * written back in the table's language.
 *
 * Only words listed here are read: a cell in a language or a wording lonepair does not know is
 * left unchecked, never called wrong.
 */
import type { TableLanguage } from "../types";
import { inStyleOf } from "./textStyle";

/** The core's geometry names, lower case, as `computedGeometry` writes them. */
const CORE_NAMES = [
  "linear",
  "bent",
  "trigonal planar",
  "tetrahedral",
  "trigonal pyramidal",
  "trigonal bipyramidal",
  "seesaw",
  "t-shaped",
  "octahedral",
  "square pyramidal",
  "square planar",
  "pentagonal bipyramidal",
  "pentagonal pyramidal",
  "pentagonal planar",
] as const;

type CoreName = (typeof CORE_NAMES)[number];

/** English spellings other than the core's own. Keys: lower case, hyphens as spaces, accents dropped. */
const ENGLISH: Readonly<Record<string, CoreName>> = {
  ...Object.fromEntries(CORE_NAMES.map((name) => [name.replace("-", " "), name])),
  "see saw": "seesaw",
  sawhorse: "seesaw",
  disphenoidal: "seesaw",
  "t shape": "t-shaped",
  t: "t-shaped",
  tetrahedron: "tetrahedral",
  octahedron: "octahedral",
  "trigonal bipyramid": "trigonal bipyramidal",
  "triangular bipyramidal": "trigonal bipyramidal",
  "trigonal pyramid": "trigonal pyramidal",
  pyramidal: "trigonal pyramidal",
  "square pyramid": "square pyramidal",
  "pentagonal bipyramid": "pentagonal bipyramidal",
  "pentagonal pyramid": "pentagonal pyramidal",
  angular: "bent",
  "v shaped": "bent",
  "v shape": "bent",
  "bent angular": "bent",
  "non linear": "bent",
  nonlinear: "bent",
  "triangular planar": "trigonal planar",
  "planar triangular": "trigonal planar",
  "trigonal plane": "trigonal planar",
  trigonal: "trigonal planar",
};

// from memory: the geometry names of German, French and Spanish chemistry textbooks (common practice).
const GERMAN: Readonly<Record<string, CoreName>> = {
  linear: "linear",
  gewinkelt: "bent",
  abgewinkelt: "bent",
  "v foermig": "bent",
  "trigonal planar": "trigonal planar",
  "trigonal eben": "trigonal planar",
  "planar trigonal": "trigonal planar",
  "dreieckig planar": "trigonal planar",
  "dreieckig eben": "trigonal planar",
  tetraedrisch: "tetrahedral",
  tetraeder: "tetrahedral",
  "trigonal pyramidal": "trigonal pyramidal",
  "trigonale pyramide": "trigonal pyramidal",
  pyramidal: "trigonal pyramidal",
  "trigonal bipyramidal": "trigonal bipyramidal",
  "trigonale bipyramide": "trigonal bipyramidal",
  wippenfoermig: "seesaw",
  wippe: "seesaw",
  saegebock: "seesaw",
  "t foermig": "t-shaped",
  oktaedrisch: "octahedral",
  oktaeder: "octahedral",
  "quadratisch pyramidal": "square pyramidal",
  "quadratische pyramide": "square pyramidal",
  "quadratisch planar": "square planar",
  "quadratisch eben": "square planar",
  "pentagonal bipyramidal": "pentagonal bipyramidal",
  "pentagonale bipyramide": "pentagonal bipyramidal",
  "pentagonal pyramidal": "pentagonal pyramidal",
  "pentagonal planar": "pentagonal planar",
};

const FRENCH: Readonly<Record<string, CoreName>> = {
  lineaire: "linear",
  coudee: "bent",
  coude: "bent",
  "en v": "bent",
  "trigonale plane": "trigonal planar",
  "triangulaire plane": "trigonal planar",
  "plane trigonale": "trigonal planar",
  "triangle plan": "trigonal planar",
  tetraedrique: "tetrahedral",
  tetraedre: "tetrahedral",
  "pyramidale trigonale": "trigonal pyramidal",
  "pyramide trigonale": "trigonal pyramidal",
  "pyramidale a base triangulaire": "trigonal pyramidal",
  "pyramide a base triangulaire": "trigonal pyramidal",
  "bipyramidale trigonale": "trigonal bipyramidal",
  "bipyramide trigonale": "trigonal bipyramidal",
  "bipyramide a base triangulaire": "trigonal bipyramidal",
  "en bascule": "seesaw",
  bascule: "seesaw",
  "en t": "t-shaped",
  "en forme de t": "t-shaped",
  octaedrique: "octahedral",
  octaedre: "octahedral",
  "pyramidale a base carree": "square pyramidal",
  "pyramide a base carree": "square pyramidal",
  "plan carre": "square planar",
  "plane carree": "square planar",
  "carree plane": "square planar",
  "bipyramidale pentagonale": "pentagonal bipyramidal",
  "bipyramide pentagonale": "pentagonal bipyramidal",
};

const SPANISH: Readonly<Record<string, CoreName>> = {
  lineal: "linear",
  angular: "bent",
  "en v": "bent",
  "trigonal plana": "trigonal planar",
  "plana trigonal": "trigonal planar",
  "triangular plana": "trigonal planar",
  "plana triangular": "trigonal planar",
  tetraedrica: "tetrahedral",
  tetraedrico: "tetrahedral",
  tetraedro: "tetrahedral",
  "piramidal trigonal": "trigonal pyramidal",
  "piramide trigonal": "trigonal pyramidal",
  piramidal: "trigonal pyramidal",
  "bipiramidal trigonal": "trigonal bipyramidal",
  "bipiramide trigonal": "trigonal bipyramidal",
  balancin: "seesaw",
  "de balancin": "seesaw",
  "en forma de t": "t-shaped",
  "forma de t": "t-shaped",
  octaedrica: "octahedral",
  octaedrico: "octahedral",
  octaedro: "octahedral",
  "piramidal cuadrada": "square pyramidal",
  "piramide cuadrada": "square pyramidal",
  "piramide de base cuadrada": "square pyramidal",
  "plana cuadrada": "square planar",
  "cuadrada plana": "square planar",
  "plano cuadrado": "square planar",
  "cuadrado plano": "square planar",
  "bipiramidal pentagonal": "pentagonal bipyramidal",
  "bipiramide pentagonal": "pentagonal bipyramidal",
};

type WordLanguage = "en" | TableLanguage;

const READING: Readonly<Record<WordLanguage, Readonly<Record<string, CoreName>>>> = { en: ENGLISH, de: GERMAN, fr: FRENCH, es: SPANISH };

/** How a fix names each geometry in a table of that language; a geometry not listed keeps the core's name. */
const WRITING: Readonly<Record<TableLanguage, Readonly<Partial<Record<CoreName, string>>>>> = {
  de: {
    bent: "gewinkelt",
    tetrahedral: "tetraedrisch",
    seesaw: "wippenförmig",
    "t-shaped": "T-förmig",
    octahedral: "oktaedrisch",
    "square pyramidal": "quadratisch pyramidal",
    "square planar": "quadratisch planar",
  },
  fr: {
    linear: "linéaire",
    bent: "coudée",
    "trigonal planar": "trigonale plane",
    tetrahedral: "tétraédrique",
    "trigonal pyramidal": "pyramidale trigonale",
    "trigonal bipyramidal": "bipyramidale trigonale",
    seesaw: "en bascule",
    "t-shaped": "en T",
    octahedral: "octaédrique",
    "square pyramidal": "pyramidale à base carrée",
    "square planar": "plan carré",
    "pentagonal bipyramidal": "bipyramidale pentagonale",
  },
  es: {
    linear: "lineal",
    bent: "angular",
    "trigonal planar": "trigonal plana",
    tetrahedral: "tetraédrica",
    "trigonal pyramidal": "piramidal trigonal",
    "trigonal bipyramidal": "bipiramidal trigonal",
    seesaw: "balancín",
    "t-shaped": "en forma de T",
    octahedral: "octaédrica",
    "square pyramidal": "piramidal cuadrada",
    "square planar": "plana cuadrada",
    "pentagonal bipyramidal": "bipiramidal pentagonal",
  },
};

/** Cells that say "no value" rather than a wrong one. */
const NO_VALUE = /^(?:|n\/?a|none|unknown|tbd|tbc|\?+|-+|\u2014|\u2013|not applicable)$/;

const UMLAUTS: Readonly<Record<string, string>> = { "\u00e4": "ae", "\u00f6": "oe", "\u00fc": "ue", "\u00df": "ss" };

/** A geometry as a cell states it, and the language of the words it is stated in. */
export interface WrittenGeometry {
  /** The core's name, lower case ("t-shaped"). */
  readonly geometry: string;
  readonly language: WordLanguage;
}

/**
 * The cell's geometry, or undefined when it states none or none that lonepair knows. Words that
 * several languages share ("linear") are taken in the column's `language` when it has them.
 */
export function readGeometry(cell: string, language?: TableLanguage): WrittenGeometry | undefined {
  const plain = cell
    .toLowerCase()
    .replace(/\([^)]*\)/g, " ")
    .trim();
  if (NO_VALUE.test(plain)) return undefined;
  const words = plain
    .replace(/[\u00e4\u00f6\u00fc\u00df]/g, (letter) => UMLAUTS[letter])
    .normalize("NFD")
    .replace(/[\u0300-\u036f]/g, "")
    .replace(/[-_\u2010\u2011]+/g, " ")
    .replace(/\s+/g, " ")
    .trim();
  if (language && READING[language][words]) return { geometry: READING[language][words], language };
  for (const each of ["en", "de", "fr", "es"] as const) {
    const geometry = READING[each][words];
    if (geometry) return { geometry, language: each };
  }
  return undefined;
}

/** The cell's geometry in the core's spelling (lower case), or undefined when it states none lonepair knows. */
export function normalizeGeometry(cell: string, language?: TableLanguage): string | undefined {
  return readGeometry(cell, language)?.geometry;
}

/** The core's geometry name in the same reduced spelling. */
export function computedGeometry(geometry: string): string {
  return geometry.toLowerCase();
}

/** The core's `geometry` written in the words, letter case and hyphenation of `written`'s cell. */
export function geometryInStyleOf(geometry: string, cell: string, language: WordLanguage): string {
  const words = language === "en" ? geometry : (WRITING[language][computedGeometry(geometry) as CoreName] ?? geometry);
  return inStyleOf(words, cell);
}
