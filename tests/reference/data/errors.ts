/** Inputs that must be refused, each with the problem code that says why. */
import type { ProblemCode } from "../../../shared/src/index";

export interface RefusalCase {
  readonly input: string;
  readonly code: ProblemCode;
  /** Why this input is refused, for the test title and messages. */
  readonly why: string;
  /** A spelling the engine should offer instead. */
  readonly suggestion?: string;
  /** Text the message should mention so the writer can find the culprit. */
  readonly mentions?: string;
  /** The slice of the input the problem's range should cover: the culprit itself. */
  readonly marks?: string;
}

/** Problems found after the species was read: the reading is known, no structure is drawn. */
export const ANALYSIS_REFUSALS: readonly RefusalCase[] = [
  // common practice: a positive charge cannot remove more electrons than the atoms bring
  { input: "CH4^10+", code: "too-few-electrons", why: "8 valence electrons minus 10 is negative" },
  { input: "H^3+", code: "too-few-electrons", why: "one valence electron cannot lose three" },
  { input: "NH3^8+", code: "too-few-electrons", why: "8 valence electrons minus 8 leaves none to bond with" },
  // common practice: four single bonds need 8 electrons
  { input: "CH4^4+", code: "too-few-electrons", why: "4 electrons cannot make the 4 bonds CH4 needs" },
  // common practice: period-2 atoms hold at most eight electrons
  { input: "CH5", code: "octet-exceeded", why: "carbon would need five bonds", mentions: "C" },
  { input: "NF5", code: "octet-exceeded", why: "nitrogen would need five bonds", mentions: "N" },
  { input: "OF4", code: "octet-exceeded", why: "oxygen would need four bonds and two lone pairs", mentions: "O" },
  { input: "BF5", code: "octet-exceeded", why: "boron would need five bonds", mentions: "B" },
  // common practice: hydrogen takes one bond. Any skeleton joining three H atoms gives one of them two
  // bonds. HF2- really is F-H-F, held by a three-centre bond that two-electron Lewis bonds cannot draw,
  // so the honest refusal is about the overbonded hydrogen, not about fluorine.
  { input: "H3", code: "hydrogen-overbonded", why: "three H atoms cannot join with one bond each" },
  { input: "HF2-", code: "hydrogen-overbonded", why: "F-H-F needs two bonds to hydrogen" },
  // common practice: d-block centres follow the 18-electron rule and ligand-field theory, not VSEPR
  { input: "Fe(CO)5", code: "transition-metal-centre", why: "iron carbonyl", mentions: "Fe" },
  { input: "[Fe(CN)6]4-", code: "transition-metal-centre", why: "hexacyanoferrate", mentions: "Fe" },
  { input: "TiCl4", code: "transition-metal-centre", why: "titanium tetrachloride", mentions: "Ti" },
  { input: "MnO4-", code: "transition-metal-centre", why: "permanganate", mentions: "Mn" },
  { input: "Cr(CO)6", code: "transition-metal-centre", why: "chromium carbonyl", mentions: "Cr" },
  // common practice: metal-nonmetal salts are ionic lattices, not molecules with a VSEPR shape
  { input: "NaCl", code: "ionic-solid", why: "sodium chloride lattice" },
  { input: "CaF2", code: "ionic-solid", why: "fluorite lattice" },
  { input: "KBr", code: "ionic-solid", why: "potassium bromide lattice" },
  { input: "MgO", code: "ionic-solid", why: "rock-salt lattice" },
  { input: "LiF", code: "ionic-solid", why: "lithium fluoride lattice" },
  // common practice: molecular formulas of isomers do not say which atoms are joined
  { input: "C2H6O", code: "ambiguous-connectivity", why: "ethanol or dimethyl ether" },
  { input: "C3H8O", code: "ambiguous-connectivity", why: "two propanols or methyl ethyl ether" },
  { input: "C4H10", code: "ambiguous-connectivity", why: "butane or isobutane" },
  // common practice: bridged dimers such as Al2Cl6 (two AlCl4 tetrahedra sharing an edge) need their
  // bridges written out; no single centre carries all the other atoms
  { input: "Al2Cl6", code: "ambiguous-connectivity", why: "bridged dimer of two tetrahedral Al" },
  // from memory: any inorganic chemistry text on boranes; B-H-B bridges are three-centre two-electron
  // bonds, which Lewis structures of two-atom bonds cannot draw
  { input: "B2H6", code: "three-centre-bonding", why: "diborane's hydrogen bridges", mentions: "B-H-B" },
  { input: "B4H10", code: "three-centre-bonding", why: "tetraborane's hydrogen bridges" },
  { input: "B10H14", code: "three-centre-bonding", why: "decaborane's cluster" },
  // common practice: fluorine takes one bond, so three F atoms leave nothing to sit in the middle
  { input: "F3", code: "no-central-atom", why: "no atom can take two bonds" },
  // common practice: helium's shell holds two electrons, so it forms no bonds; the problem is helium's
  // shell, and the message must not blame hydrogen
  { input: "HeF2", code: "octet-exceeded", why: "helium would need 10 electrons", mentions: "helium" },
  { input: "He2", code: "octet-exceeded", why: "a He-He bond would give helium 4 electrons", mentions: "helium" },
];

/** Problems found while reading: there is no reading to show. */
export const READING_REFUSALS: readonly RefusalCase[] = [
  { input: "", code: "empty-input", why: "nothing to read" },
  { input: "   ", code: "empty-input", why: "only spaces" },
  // common practice: element symbols are one capital, optionally one lower-case letter
  { input: "Sf4", code: "unknown-element", why: "Sf is no element; SF4 was meant", suggestion: "SF4", mentions: "Sf", marks: "Sf" },
  { input: "Xef4", code: "unknown-element", why: "lower-case f; XeF4 was meant", suggestion: "XeF4" },
  { input: "sf6", code: "unknown-element", why: "all lower case; SF6 was meant", suggestion: "SF6" },
  { input: "Xx2", code: "unknown-element", why: "Xx is no element", mentions: "Xx", marks: "Xx" },
  { input: "Ca(OH2", code: "unbalanced-brackets", why: "an opening bracket is never closed", marks: "(" },
  { input: "Ca(OH))2", code: "unbalanced-brackets", why: "a closing bracket has no partner", marks: ")" },
  { input: "[Fe(CN)6", code: "unbalanced-brackets", why: "the square bracket is never closed", marks: "[" },
  { input: "unobtainium tetrafluoride", code: "unknown-name", why: "not a chemical name" },
  { input: "blue gas", code: "unknown-name", why: "not a chemical name" },
  // common practice: "SO42-" could be SO4 2- or SO 42-; the digits must be separated from the charge
  { input: "SO42-", code: "malformed-formula", why: "digits glued to the charge are ambiguous", marks: "42-" },
  { input: "C".repeat(100_000), code: "input-too-long", why: "far longer than any species" },
];
