/**
 * What a column holds, from its header as people write it: any case, spaces, underscores or
 * hyphens, units in brackets or after a slash ("angle (deg)", "bond angle / °"), and the short
 * forms of the trade (VE, LP, AXE).
 */
import type { ColumnMeaning, TableLanguage } from "../types";
import { FOREIGN_HEADERS, germanHeaderByPrefix } from "./foreignHeaders";

/** Normalised header words -> meaning. Keys are lower case, single-spaced, without units. */
const HEADERS: ReadonlyMap<string, ColumnMeaning> = new Map<string, ColumnMeaning>([
  ...words("species", [
    "formula",
    "species",
    "compound",
    "molecule",
    "ion",
    "chemical formula",
    "molecular formula",
    "species formula",
    "formula of species",
    "chemical",
    "substance",
    "gas",
    "molecule formula",
    "compound formula",
    "ion formula",
    "molecule or ion",
    "species or ion",
    "molecule ion",
    "formula ion",
  ]),
  ...words("constituent", [
    "cation",
    "anion",
    "cations",
    "anions",
    "cation formula",
    "anion formula",
    "counterion",
    "counter ion",
    "positive ion",
    "negative ion",
  ]),
  // A species' net charge only: a formal charge belongs to one atom, an oxidation state to one element.
  ...words("charge", [
    "charge",
    "charges",
    "net charge",
    "ionic charge",
    "ion charge",
    "overall charge",
    "total charge",
    "charge number",
    "charge e",
    "species charge",
  ]),
  ...words("smiles", [
    "smiles",
    "canonical smiles",
    "isomeric smiles",
    "smiles string",
    "smiles code",
    "structure smiles",
    "smiles structure",
  ]),
  // A compound id mostly holds names (or catalogue ids, which then name nothing). A reagent or
  // analyte column holds names with strengths and forms after them; a cell it cannot read is no
  // mistake there. A description, notes or comment column is free text and is not read.
  ...words("name", [
    "reagent",
    "reagents",
    "reagent name",
    "analyte",
    "analyte name",
    "compound id",
    "compound identifier",
    "name",
    "species name",
    "compound name",
    "chemical name",
    "common name",
    "iupac name",
    "molecule name",
    "ion name",
    "systematic name",
  ]),
  ...words("valenceElectrons", [
    "valence electrons",
    "valence electron",
    "valence e",
    "valence electron count",
    "ve",
    "v e",
    "total valence electrons",
    "number of valence electrons",
    "no of valence electrons",
    "valence electrons total",
    "total ve",
    "valence",
    "val e",
    "val electrons",
    "electrons",
    "valence count",
    "n valence",
    "nve",
    "tve",
  ]),
  ...words("lonePairs", [
    "lone pairs",
    "lone pair",
    "lp",
    "lps",
    "lone pairs on central atom",
    "lone pairs on the central atom",
    "lone pairs on centre",
    "lone pairs on center",
    "central lone pairs",
    "lone pairs central atom",
    "lone pairs central",
    "lone pairs centre",
    "lone pairs center",
    "central atom lone pairs",
    "number of lone pairs",
    "no of lone pairs",
    "nonbonding pairs",
    "non bonding pairs",
    "unshared pairs",
    "lone electron pairs",
    "e",
    "lone pairs on central",
    "lp on central atom",
    "lone pairs a",
  ]),
  ...words("axe", ["axe", "axe notation", "axe class", "axe formula", "vsepr notation", "vsepr class", "vsepr type", "axmen", "ax e"]),
  ...words("electronGeometry", [
    "electron geometry",
    "electron domain geometry",
    "electron pair geometry",
    "electronic geometry",
    "electron group geometry",
    "electron arrangement",
    "electron pair arrangement",
    "domain geometry",
    "eg",
    "e geometry",
    "electron domain arrangement",
    "electron shape",
    "parent geometry",
    "electron group arrangement",
  ]),
  ...words("molecularGeometry", [
    "shape",
    "geometry",
    "molecular geometry",
    "molecular shape",
    "mg",
    "shape of molecule",
    "molecule shape",
    "vsepr shape",
    "vsepr geometry",
    "molecular structure",
    "ion shape",
    "shape of ion",
    "predicted shape",
    "mol geometry",
  ]),
  ...words("bondAngle", [
    "bond angle",
    "bond angles",
    "angle",
    "angles",
    "ideal angle",
    "ideal bond angle",
    "expected angle",
    "predicted angle",
    "x a x angle",
    "bond angle range",
    "approx bond angle",
    "approximate bond angle",
    "measured angle",
  ]),
  ...words("hybridization", [
    "hybridization",
    "hybridisation",
    "hybrid",
    "hybridization of central atom",
    "hybridisation of central atom",
    "central atom hybridization",
    "central atom hybridisation",
    "orbital hybridization",
    "orbital hybridisation",
    "hybrid orbitals",
    "hybridization central atom",
    "hybridisation central atom",
  ]),
  ...words("polarity", [
    "polar",
    "polarity",
    "is polar",
    "polar or nonpolar",
    "polar nonpolar",
    "polar y n",
    "dipole",
    "polar molecule",
    "molecular polarity",
  ]),
  ...words("irBands", [
    "ir bands",
    "ir band",
    "number of ir bands",
    "no of ir bands",
    "ir band count",
    "infrared bands",
    "number of infrared bands",
    "ir active bands",
    "ir fundamentals",
    "ir active fundamentals",
    "bands in ir",
    "bands in the ir",
  ]),
  ...words("ramanBands", [
    "raman bands",
    "raman band",
    "number of raman bands",
    "no of raman bands",
    "raman band count",
    "raman active bands",
    "raman fundamentals",
    "raman active fundamentals",
    "bands in raman",
    "bands in the raman",
  ]),
  ...words("irActiveModes", [
    "ir active modes",
    "ir active mode",
    "number of ir active modes",
    "no of ir active modes",
    "infrared active modes",
    "ir active vibrations",
    "ir active",
  ]),
  ...words("vibrationalModes", [
    "vibrational modes",
    "number of vibrational modes",
    "no of vibrational modes",
    "vibrational mode count",
    "normal modes",
    "number of normal modes",
    "no of normal modes",
    "vibrational degrees of freedom",
    "3n 6",
    "3n 5",
    "3n 6 or 3n 5",
    "modes",
    "number of modes",
    "vibrations",
    "number of vibrations",
  ]),
]);

function words(meaning: ColumnMeaning, headers: readonly string[]): [string, ColumnMeaning][] {
  return headers.map((header) => [header, meaning]);
}

const MAX_HEADER = 80;

/** Unit words that may trail a header without brackets: "angle deg", "bond angle degrees". */
const TRAILING_UNITS = /\s+(?:deg|degs|degree|degrees|in degrees|count|no|number|y n|yes no)$/;

/** Units of band positions: a column with them holds wavenumbers or frequencies, never counts. */
const WAVENUMBER_UNITS = /cm\s*(?:-|\u2212|\u207b|\^-?)\s*1|cm\u207b\u00b9|wavenumber|frequenc|\bhz\b|position/i;

/** German letters spelt out, so "Polarität" and an export's "Polaritaet" read alike. */
const UMLAUTS: Readonly<Record<string, string>> = { "\u00e4": "ae", "\u00f6": "oe", "\u00fc": "ue", "\u00df": "ss" };

/** The header reduced to plain lower-case words. */
export function normalizeHeader(header: string): string {
  return header
    .toLowerCase()
    .replace(/[\u00e4\u00f6\u00fc\u00df]/g, (letter) => UMLAUTS[letter])
    .replace(/\u00b0/g, " deg ")
    .replace(/[([{][^)\]}]*[)\]}]/g, " ") // "(deg)", "[°]", "(y/n)"
    .replace(/\s\/\s.*$/, " ") // "bond angle / °"
    .replace(/e[-\u2212\u207b]/g, "e ") // "valence e-"
    .replace(/[_\-./\\:?#*|]+/g, " ")
    .replace(/\bcentral\s+atom's\b/g, "central atom")
    .replace(/\s+/g, " ")
    .trim()
    .replace(TRAILING_UNITS, "")
    .trim();
}

/** What the column under `header` holds, or undefined for any other column (ids, lots, notes). */
export function meaningOfHeader(header: string): ColumnMeaning | undefined {
  // Headers are a few words; anything longer is data, and not worth a regular expression's time.
  if (header.length > MAX_HEADER) return undefined;
  const meaning = plainMeaningOfHeader(header);
  // "Lone pairs (total)", "lone pairs in molecule": every lone pair of the species, not the centre's.
  if (meaning === "lonePairs" && TOTAL_LONE_PAIRS.test(header)) return undefined;
  // "Valence electrons (central atom)": the centre's own electrons, not the species' count.
  if (meaning === "valenceElectrons" && CENTRAL_ATOM.test(header)) return undefined;
  // "IR bands (cm-1)" lists band positions, not a count of bands.
  if (meaning && VIBRATION_COUNTS.has(meaning) && WAVENUMBER_UNITS.test(header)) return undefined;
  return meaning;
}

const TOTAL_LONE_PAIRS = /\b(?:total|sum|all|molecule|in molecule|whole)\b|\binsgesamt\b|\bgesamt/i;

const CENTRAL_ATOM = /\bcent(?:ral|re|er)\b|zentralatom|atome central|[aá]tomo central/i;

const VIBRATION_COUNTS: ReadonlySet<ColumnMeaning> = new Set(["irBands", "ramanBands", "irActiveModes", "vibrationalModes"]);

function plainMeaningOfHeader(header: string): ColumnMeaning | undefined {
  const normalized = normalizeHeader(header);
  const known = HEADERS.get(normalized) ?? HEADERS.get(normalized.replace(/^(?:the|predicted|expected|ideal|vsepr) /, ""));
  if (known) return known;
  // Longer headers that still say it plainly: "lone pairs (on N)", "hybridization of S".
  if (/^lone pairs?\b/.test(normalized)) return "lonePairs";
  if (/^hybridi[sz]ation\b/.test(normalized)) return "hybridization";
  if (/^valence electrons?\b/.test(normalized)) return "valenceElectrons";
  if (/^electron (?:domain |pair |group )?geometry\b/.test(normalized)) return "electronGeometry";
  if (/^molecular (?:geometry|shape)\b/.test(normalized)) return "molecularGeometry";
  if (/^bond angles?\b/.test(normalized)) return "bondAngle";
  return foreignHeader(normalized)?.meaning;
}

function foreignHeader(normalized: string) {
  return FOREIGN_HEADERS.get(normalized) ?? germanHeaderByPrefix(normalized);
}

/**
 * The language of a header that is not English ("Molekülgeometrie", "géométrie"), so its cells'
 * words are read, and fixes written, in that language; undefined for English and for any other.
 */
export function languageOfHeader(header: string): TableLanguage | undefined {
  if (header.length > MAX_HEADER) return undefined;
  const normalized = normalizeHeader(header);
  return HEADERS.has(normalized) ? undefined : foreignHeader(normalized)?.language;
}

/** True for a column whose cells name the species of their row: a formula, a name or a SMILES. */
export function namesSpecies(meaning: ColumnMeaning | undefined): boolean {
  return meaning === "species" || meaning === "name" || meaning === "smiles";
}

/** Headers that name a formula column, preferred over a "species" column that may hold names. */
export function isFormulaHeader(header: string): boolean {
  return header.length <= MAX_HEADER && /formula|formel|formule|fórmula/.test(normalizeHeader(header));
}

/**
 * Headers (and keys) of a column of equations: "Reaction", "Balanced equation", "Net ionic
 * equation", "Half-reaction", "rxn", "balancedEquation". The header must end in the word, so
 * columns about a reaction ("Reaction time", "Heat of reaction", "Reaction ID") are not read.
 */
export function isEquationHeader(header: string): boolean {
  // "Reaction no." and "Reaction #" number the reactions; normalising would drop the "no".
  if (header.length > MAX_HEADER || /(?:\bno\.?|\bnumber|#)\s*$/i.test(header)) return false;
  // camelCase keys in JSON and YAML: "balancedEquation", "halfReaction".
  return EQUATION_HEADER.test(normalizeHeader(header.replace(/([a-z])([A-Z])/g, "$1 $2")));
}

/**
 * `isEquationHeader`, remembered for one document's reading: the keys of JSON and YAML records
 * repeat in every record. Keeps at most `limit` keys (the rest are worked out each time).
 */
export function equationKeyTest(limit = 4096): (key: string) => boolean {
  const known = new Map<string, boolean>();
  return (key) => {
    let equation = known.get(key);
    if (equation === undefined) {
      equation = isEquationHeader(key);
      if (known.size < limit) known.set(key, equation);
    }
    return equation;
  };
}

/** Words that may stand before "reaction" or "equation" in an equation column's header. */
const EQUATION_QUALIFIERS =
  "balanced|unbalanced|chemical|overall|net|ionic|full|complete|molecular|skeleton|skeletal|main|side|" +
  "cell|redox|electrode|anode|cathode|anodic|cathodic|oxidation|reduction|half|reaction|written";
const EQUATION_HEADER = new RegExp(`^(?:(?:${EQUATION_QUALIFIERS}) ){0,3}(?:reactions?|equations?|rxns?|eqns?)(?: \\d{1,2})?$`);
