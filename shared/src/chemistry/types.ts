/**
 * Plain data shared by every part of the chemistry core. Nothing here knows about editors,
 * the protocol or I/O; offsets are UTF-16 indices into the string that was read.
 */

/** Half-open range of UTF-16 code units, `start` inclusive, `end` exclusive. */
export interface TextRange {
  readonly start: number;
  readonly end: number;
}

export type ElementCategory = "main-group" | "noble-gas" | "transition-metal" | "lanthanide" | "actinide";

export interface ElementData {
  readonly symbol: string;
  readonly name: string;
  readonly atomicNumber: number;
  /** IUPAC group 1-18; lanthanides and actinides carry 3. */
  readonly group: number;
  readonly period: number;
  /** Valence electrons used in Lewis structures (s + p for main-group elements, group - 10 for groups 13-18). */
  readonly valenceElectrons: number;
  /** Pauling electronegativity, or null where none is tabulated (He, Ne, Ar, and Z >= 104). */
  readonly electronegativity: number | null;
  /** Single-bond covalent radius in picometres. */
  readonly covalentRadius: number;
  readonly category: ElementCategory;
}

/** One element and how many times it occurs, in the order the writer gave it. */
export interface FormulaPart {
  readonly symbol: string;
  readonly count: number;
}

/** How the writer wrote the species; drives nothing chemical, only messages. */
export type SpeciesNotation = "formula" | "mhchem" | "name" | "smiles";

/** A species as read from text: what it is made of, before any structure is chosen. */
export interface SpeciesReading {
  /** The text exactly as read (the slice of the input covered by `range`). */
  readonly text: string;
  readonly range: TextRange;
  readonly notation: SpeciesNotation;
  /** Element counts in first-appearance order (e.g. H2SO4 -> H 2, S 1, O 4). */
  readonly composition: readonly FormulaPart[];
  /**
   * Groups exactly as written, flattened in order: for CH3COOH this is C,H3,C,O,O,H.
   * Structure builders use it to recover connectivity from condensed formulas.
   */
  readonly writtenSequence: readonly FormulaPart[];
  readonly charge: number;
  /** Canonical formula with charge, Hill-free, in written element order, e.g. "SO4^2-". */
  readonly formula: string;
  /** A name for the species where one is known ("sulfur tetrafluoride"). */
  readonly name?: string;
  /**
   * For a name whose connectivity its formula cannot show ("ethyl acetate", "glucose"): the
   * structure the name stands for, as SMILES. Analysis follows it instead of guessing a skeleton.
   */
  readonly smiles?: string;
  /**
   * The parts of a hydrate or adduct as written, each with its count: CuSO4·5H2O is CuSO4 once and
   * H2O five times. Absent for a species written as one formula.
   */
  readonly parts?: readonly WrittenPart[];
  /** The physical state written after the formula ("NaCl(s)", "SO4^2-(aq)"); absent when none was. */
  readonly state?: PhysicalState;
  /**
   * Isotope labels as written, in written order ("D" in CDCl3, the 13 of 13CO2). The composition
   * and formula count a labelled atom as its element, since labels change no Lewis structure.
   */
  readonly isotopes?: readonly IsotopeLabel[];
}

/** One dot-separated part of a hydrate or adduct, as written. */
export interface WrittenPart {
  readonly count: number;
  /** The part's formula as the reader writes it ("CuSO4", "H2O"). */
  readonly formula: string;
}

/** State symbols: solid, liquid, gas, aqueous solution. */
export type PhysicalState = "s" | "l" | "g" | "aq";

/** One isotope label: "D" is hydrogen-2, "13C" carbon-13. */
export interface IsotopeLabel {
  /** The element the labelled atom is ("H" for D and T). */
  readonly symbol: string;
  readonly massNumber: number;
  /** The label as the writer wrote it: "D", "T", "13C", "^{227}_{90}Th". */
  readonly written: string;
}

/** Stable codes for everything that stops a species from being read or analysed. */
export type ProblemCode =
  // reading
  | "empty-input"
  | "unknown-element"
  | "unbalanced-brackets"
  | "malformed-formula"
  | "unknown-name"
  | "input-too-long"
  /** An element with an oxidation state and nothing else ("S(VI)"): many species share it. */
  | "oxidation-state"
  // analysis
  | "too-few-electrons"
  | "octet-exceeded"
  | "hydrogen-overbonded"
  | "transition-metal-centre"
  | "f-block-centre"
  | "superheavy-element"
  | "ionic-solid"
  | "ions-in-solution"
  | "metallic-element"
  | "hydrate"
  | "adduct"
  | "network-solid"
  | "metal-ion-complex"
  | "three-centre-bonding"
  | "ambiguous-connectivity"
  | "no-central-atom"
  | "no-valid-structure";

export interface Problem {
  readonly code: ProblemCode;
  readonly message: string;
  /** A corrected spelling to offer, e.g. "SF4" for "Sf4". */
  readonly suggestion?: string;
  /**
   * Other spellings that read, best first after `suggestion` ("CO2" after "Co2" for "co2"); the
   * analysis keeps the one that names a species it can work with.
   */
  readonly alternatives?: readonly string[];
  readonly range?: TextRange;
}

export type ReadResult = { readonly ok: true; readonly value: SpeciesReading } | { readonly ok: false; readonly problem: Problem };

/** One atom of a molecular graph, after the Lewis structure has been chosen. */
export interface GraphAtom {
  readonly symbol: string;
  readonly lonePairs: number;
  /** 0, or 1 for the odd electron of a radical. */
  readonly unpairedElectrons: number;
  readonly formalCharge: number;
  /** Member of an aromatic ring (written in lower case in SMILES). */
  readonly aromatic?: boolean;
}

export interface GraphBond {
  readonly from: number;
  readonly to: number;
  /** 1, 2 or 3. */
  readonly order: number;
}

/** The cis/trans arrangement written for a double bond a=b with neighbours x (on a) and y (on b). */
export interface DoubleBondStereo {
  readonly atoms: readonly [x: number, a: number, b: number, y: number];
  readonly relation: "cis" | "trans";
}

/** A Lewis structure: atoms, bonds with orders, lone pairs and formal charges. */
export interface MolecularGraph {
  readonly atoms: readonly GraphAtom[];
  readonly bonds: readonly GraphBond[];
  /** Double-bond geometry the writer fixed (SMILES / and \ marks); absent when none was. */
  readonly doubleBondStereo?: readonly DoubleBondStereo[];
}

export type ElectronGeometry =
  "linear" | "trigonal planar" | "tetrahedral" | "trigonal bipyramidal" | "octahedral" | "pentagonal bipyramidal";

export type MolecularGeometry =
  | ElectronGeometry
  | "bent"
  | "trigonal pyramidal"
  | "seesaw"
  | "T-shaped"
  | "square pyramidal"
  | "square planar"
  | "pentagonal pyramidal"
  | "pentagonal planar";

export type Hybridization = "sp" | "sp2" | "sp3" | "sp3d" | "sp3d2" | "sp3d3";

/** A range of bond angles in degrees, with the ideal value it deviates from. */
export interface AngleExpectation {
  /** Ideal angle of the electron geometry between two bonded atoms, e.g. 109.5. */
  readonly ideal: number;
  /** Lowest and highest angle expected once lone pairs and multiple bonds have had their say. */
  readonly min: number;
  readonly max: number;
  /** Which way the real angle moves and why, in one line. */
  readonly note: string;
  /** Short label for the pair of positions, e.g. "axial-equatorial"; absent when there is one kind. */
  readonly between?: string;
}

/** A measured angle for a well-known species, with where the number comes from. */
export interface MeasuredAngle {
  readonly degrees: number;
  readonly between: string;
  readonly source: string;
}

/** The VSEPR description of one atom with two or more neighbours. */
export interface CentreAnalysis {
  /** 0-based index into the graph's atoms. */
  readonly index: number;
  readonly atom: string;
  readonly axe: string;
  readonly stericNumber: number;
  readonly bondingDomains: number;
  readonly lonePairs: number;
  readonly unpairedElectrons: number;
  readonly electronGeometry: ElectronGeometry;
  readonly molecularGeometry: MolecularGeometry;
  /** Distinct ideal angles between bonded neighbours, ascending (SF4: 90, 120, 180). */
  readonly idealAngles: readonly number[];
  readonly expectedAngles: readonly AngleExpectation[];
  readonly hybridization: Hybridization;
  readonly hybridizationNote?: string;
}

export interface PolarityVerdict {
  readonly polar: boolean;
  /** One line: "bond dipoles cancel by symmetry", "lone pair makes the shape asymmetric", ... */
  readonly reason: string;
  /** Magnitude of the summed bond-dipole vector in electronegativity units (a model number). */
  readonly dipoleEstimate: number;
  /**
   * True when the model could not judge (the species is too large for a 3D model): `polar` is
   * then false but claims nothing, and `reason` says why. Readers show "not judged".
   */
  readonly undetermined?: true;
}

/** Everything lonepair works out for one species. */
export interface SpeciesAnalysis {
  readonly reading: SpeciesReading;
  readonly valenceElectrons: number;
  readonly radical: boolean;
  readonly electronDeficient: boolean;
  readonly expandedOctet: boolean;
  readonly graph: MolecularGraph;
  /** How many equivalent Lewis structures share the best formal-charge score. */
  readonly resonanceForms: number;
  readonly centres: readonly CentreAnalysis[];
  readonly polarity: PolarityVerdict;
  readonly measuredAngles: readonly MeasuredAngle[];
  /** Plain-language notes the reader should see (radical, electron-deficient, model caveats). */
  readonly warnings: readonly string[];
}

/** What a part plays in the species it belongs to. */
export type PartRole =
  /** an ion of a salt */
  | "cation"
  | "anion"
  /** the metal ion of a hydroxo or aqua ion, and what it holds */
  | "metal-ion"
  | "ligand"
  /** the salt or molecule of a hydrate or adduct, and its water of crystallisation */
  | "compound"
  | "water";

/**
 * One part of a species that is not one molecule: an ion of a salt (the NH4+ of NH4Cl), the water
 * of a hydrate, the hydroxide of CaOH+. Each part is analysed on its own.
 */
export interface SpeciesPart {
  readonly role: PartRole;
  /** How many of this part one formula unit holds: 2 for the NH4+ of (NH4)2SO4, 5 for the H2O of CuSO4·5H2O. */
  readonly count: number;
  /** The part's formula with its charge, as the reader writes it: "NH4^+", "SO4^2-", "H2O". */
  readonly formula: string;
  /** A single atom or monatomic ion (Na+, Cl-), which has no shape of its own. */
  readonly monatomic: boolean;
  /** The part's own analysis; absent for a monatomic part. A salt inside a hydrate carries its ions here. */
  readonly analysis?: AnalysisResult;
}

/** One kind of atom in a network solid with its surroundings there: each Si bonded to 4 O, tetrahedral. */
export interface LatticeSite {
  readonly symbol: string;
  readonly neighbourCount: number;
  /** The neighbours' element. */
  readonly neighbour: string;
  /** The arrangement of the neighbours: "tetrahedral", "bent", "trigonal planar". */
  readonly geometry: string;
}

export type AnalysisResult =
  | { readonly ok: true; readonly value: SpeciesAnalysis }
  | {
      readonly ok: false;
      readonly reading?: SpeciesReading;
      readonly problem: Problem;
      /** A salt's ions, a hydrate's parts: each analysed, though the whole has no one shape. */
      readonly parts?: readonly SpeciesPart[];
      /** A network solid's atoms, each with its surroundings in the solid (there is no molecule). */
      readonly lattice?: readonly LatticeSite[];
    };
