/**
 * What a chemist reads into a molecular formula that does not spell out its connectivity: the
 * one ordinary structure (C2H4 is ethene), or the familiar candidates when there are several
 * (C2H6O is ethanol or dimethyl ether). Keyed by composition, so any way of writing it matches.
 */
import type { FormulaPart } from "../types";
import { compositionKey } from "../vsepr/measuredAngles";
import { smilesForName } from "../reader/names/nameLookup";

export interface KnownStructure {
  readonly name: string;
  /** A condensed formula the reader understands, or a SMILES string when `smiles` is set. */
  readonly written: string;
  readonly smiles?: boolean;
  /** Formulas that name this isomer and no other (OCN^- is cyanate), besides `written`. */
  readonly writtenAs?: readonly string[];
  /** What a chemist adds about this structure (the other tautomer, a bridged dimer). */
  readonly note?: string;
  /**
   * Point group of the real molecule, for cages and rings whose model coordinates come out less
   * symmetric than the molecule (S8 is a D4d crown): polarity then follows from it.
   */
  readonly pointGroup?: string;
}

// common practice: the ordinary stable compounds of these formulas
const SINGLE: Readonly<Record<string, KnownStructure>> = {
  C2H6: { name: "ethane", written: "CH3CH3" },
  C2H4: { name: "ethene", written: "CH2=CH2" },
  C2H2: { name: "ethyne", written: "HC≡CH" },
  C3H8: { name: "propane", written: "CH3CH2CH3" },
  C6H6: { name: "benzene", written: "c1ccccc1", smiles: true },
  CH2O2: { name: "formic acid", written: "HCOOH" },
  CH5N: { name: "methylamine", written: "CH3NH2" },
  C2N2: { name: "cyanogen", written: "N#CC#N", smiles: true },
  C3O2: { name: "carbon suboxide", written: "O=C=C=C=O", smiles: true },
  N2O3: { name: "dinitrogen trioxide", written: "O=N[N+](=O)[O-]", smiles: true },
  N2O4: { name: "dinitrogen tetroxide", written: "[O-][N+](=O)[N+]([O-])=O", smiles: true },
  N2O5: { name: "dinitrogen pentoxide", written: "[O-][N+](=O)O[N+]([O-])=O", smiles: true },
  F4N2: { name: "tetrafluorohydrazine", written: "FN(F)N(F)F", smiles: true },
  H6Si2: { name: "disilane", written: "[SiH3][SiH3]", smiles: true },
  Cl2O7: { name: "dichlorine heptoxide", written: "O=[Cl](=O)(=O)O[Cl](=O)(=O)=O", smiles: true },
  // from memory: descriptive inorganic chemistry texts: the tautomers that dominate, the cages
  // and rings of the elements and their oxides, and the bridged halide dimers
  C2H2O4: { name: "oxalic acid", written: "OC(=O)C(=O)O", smiles: true },
  H3O3P: {
    name: "phosphorous acid",
    written: "O[PH](=O)O",
    smiles: true,
    note: "Phosphorous acid is HP(O)(OH)2: one H sits on P and is not acidic, so the acid is diprotic. The P(OH)3 tautomer is a minor form.",
  },
  H3O2P: {
    name: "hypophosphorous acid",
    written: "O[PH2]=O",
    smiles: true,
    note: "Hypophosphorous acid is H2P(O)OH: two H sit on P and are not acidic, so the acid is monoprotic.",
  },
  P4: {
    name: "white phosphorus",
    written: "P12P3P1P23",
    smiles: true,
    pointGroup: "Td",
    note: "P4 is a tetrahedron of four P atoms, each bonded to the other three.",
  },
  O6P4: {
    name: "tetraphosphorus hexoxide",
    written: "O1P2OP3OP1OP(O2)O3",
    smiles: true,
    pointGroup: "Td",
    note: "P4O6 is a cage: an O bridges each edge of the P4 tetrahedron.",
  },
  O10P4: {
    name: "tetraphosphorus decoxide",
    written: "O=P12OP3(=O)OP(=O)(O1)OP(=O)(O2)O3",
    smiles: true,
    pointGroup: "Td",
    note: "P4O10 is the P4O6 cage with one more O on each P.",
  },
  S8: {
    name: "cyclooctasulfur",
    written: "S1SSSSSSS1",
    smiles: true,
    pointGroup: "D4d",
    note: "S8 is a puckered ring of eight S atoms (a crown).",
  },
  Cl6I2: {
    name: "iodine trichloride dimer",
    written: "Cl[I-]1(Cl)[Cl+][I-](Cl)(Cl)[Cl+]1",
    smiles: true,
    pointGroup: "D2h",
    note: "I2Cl6 is a planar bridged dimer: two Cl atoms each bond to both I atoms, and each I is square planar.",
  },
  // from memory: the chain and dimeric oxoanions of descriptive inorganic chemistry texts
  "C2O4^-2": { name: "oxalate", written: "[O-]C(=O)C(=O)[O-]", smiles: true },
  "O5S2^-2": {
    name: "disulfite",
    written: "[O-]S(=O)S(=O)(=O)[O-]",
    smiles: true,
    note: "Disulfite (metabisulfite) has an S-S bond: O2S-SO3.",
  },
  "O4S2^-2": {
    name: "dithionite",
    written: "[O-]S(=O)S(=O)[O-]",
    smiles: true,
    note: "Dithionite has a long, weak S-S bond: O2S-SO2.",
  },
  "O6S4^-2": {
    name: "tetrathionate",
    written: "[O-]S(=O)(=O)SSS(=O)(=O)[O-]",
    smiles: true,
    note: "Tetrathionate is a chain of four S atoms: O3S-S-S-SO3.",
  },
  "O6S2^-2": { name: "dithionate", written: "[O-]S(=O)(=O)S(=O)(=O)[O-]", smiles: true, note: "Dithionate has an S-S bond: O3S-SO3." },
  "O8S2^-2": {
    name: "peroxodisulfate",
    written: "[O-]S(=O)(=O)OOS(=O)(=O)[O-]",
    smiles: true,
    note: "Peroxodisulfate has an O-O bond between its two SO3 groups: O3S-O-O-SO3.",
  },
  "O7P2^-4": {
    name: "diphosphate",
    written: "[O-]P(=O)([O-])OP(=O)([O-])[O-]",
    smiles: true,
    note: "Diphosphate (pyrophosphate) is two PO4 tetrahedra sharing one O: O3P-O-PO3.",
  },
};

const SEVERAL: Readonly<Record<string, readonly KnownStructure[]>> = {
  C2H6O: [
    { name: "ethanol", written: "CH3CH2OH" },
    { name: "dimethyl ether", written: "CH3OCH3" },
  ],
  C3H8O: [
    { name: "1-propanol", written: "CH3CH2CH2OH" },
    { name: "2-propanol", written: "CH3CH(OH)CH3" },
    { name: "methyl ethyl ether", written: "CH3OCH2CH3" },
  ],
  C2H4O2: [
    { name: "acetic acid", written: "CH3COOH" },
    { name: "methyl formate", written: "HCOOCH3" },
  ],
  C2H4O: [
    { name: "acetaldehyde", written: "CH3CHO" },
    { name: "oxirane", written: "C1CO1", smiles: true },
  ],
  C3H6O: [
    { name: "acetone", written: "CH3COCH3" },
    { name: "propanal", written: "CH3CH2CHO" },
  ],
  C3H6: [
    { name: "propene", written: "CH2=CHCH3" },
    { name: "cyclopropane", written: "C1CC1", smiles: true },
  ],
  C4H10: [
    { name: "butane", written: "CH3CH2CH2CH3" },
    { name: "isobutane", written: "CH(CH3)3" },
  ],
  C2H7N: [
    { name: "ethylamine", written: "CH3CH2NH2" },
    { name: "dimethylamine", written: "(CH3)2NH" },
  ],
  CHNO: [
    { name: "isocyanic acid", written: "HNCO" },
    { name: "cyanic acid", written: "HOCN" },
  ],
  C2H3N: [
    { name: "acetonitrile", written: "CH3CN" },
    { name: "methyl isocyanide", written: "CH3NC" },
  ],
  // from memory: descriptive inorganic chemistry texts (cyanate OCN-, fulminate CNO-)
  "CNO^-1": [
    { name: "cyanate", written: "[O-]C#N", smiles: true, writtenAs: ["OCN^-", "NCO^-"] },
    { name: "fulminate", written: "[C-]#[N+][O-]", smiles: true },
  ],
};

// from memory: descriptive inorganic chemistry texts on aluminium chloride (layer lattice with
// six-coordinate Al in the solid; Cl-bridged Al2Cl6 in the melt and vapour; AlCl3 when hot)
const REFUSED: Readonly<Record<string, string>> = {
  Al2Cl6:
    "Al2Cl6 is aluminium chloride's bridged dimer: two Cl atoms each bond to both Al atoms, which makes each Al roughly tetrahedral, " +
    "but solid aluminium chloride is a layer lattice and the hot vapour is AlCl3, so the formula does not settle which form is meant. " +
    "Write AlCl3 for the monomer or the SMILES of the dimer, Cl[Al-]1(Cl)[Cl+][Al-](Cl)(Cl)[Cl+]1.",
  // from memory: Greenwood & Earnshaw, Chemistry of the Elements (metasilicates are chains and
  // rings of corner-sharing SiO4 tetrahedra; no salt holds a lone SiO3 2- ion)
  "O3Si^-2":
    "SiO3^2- (metasilicate) is no discrete ion: in its salts, such as Na2SiO3, SiO4 tetrahedra share two corners each in long chains " +
    "or rings, so every Si is tetrahedral among four O. A lone trigonal-planar SiO3^2- is found in no salt, so no shape is given for it.",
};

/** Why a formula with a well-known but phase-dependent structure is not analysed, if it is one. */
// One analysis asks up to three tables about the same reading: its key is worked out once.
const keys = new WeakMap<readonly FormulaPart[], { readonly charge: number; readonly key: string }>();

function keyOf(composition: readonly FormulaPart[], charge: number): string {
  const known = keys.get(composition);
  if (known !== undefined && known.charge === charge) return known.key;
  const key = compositionKey(composition, charge);
  keys.set(composition, { charge, key });
  return key;
}

export function refusalFor(composition: readonly FormulaPart[], charge: number): string | undefined {
  return REFUSED[keyOf(composition, charge)];
}

/** The structure a name means where the name vocabulary keeps one ("toluene" for C6H5CH3). */
export function structureForName(name: string | undefined): KnownStructure | undefined {
  if (name === undefined) return undefined;
  const lower = name.toLowerCase();
  const smiles = smilesForName(lower);
  return smiles === undefined ? undefined : { name: lower, written: smiles, smiles: true };
}

export function singleStructureFor(composition: readonly FormulaPart[], charge: number): KnownStructure | undefined {
  return SINGLE[keyOf(composition, charge)];
}

export function candidateStructuresFor(composition: readonly FormulaPart[], charge: number): readonly KnownStructure[] {
  return SEVERAL[keyOf(composition, charge)] ?? [];
}
