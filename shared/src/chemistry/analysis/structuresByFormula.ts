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
};

/** The structure a name means where the name vocabulary keeps one ("toluene" for C6H5CH3). */
export function structureForName(name: string | undefined): KnownStructure | undefined {
  if (name === undefined) return undefined;
  const lower = name.toLowerCase();
  const smiles = smilesForName(lower);
  return smiles === undefined ? undefined : { name: lower, written: smiles, smiles: true };
}

export function singleStructureFor(composition: readonly FormulaPart[], charge: number): KnownStructure | undefined {
  return charge === 0 ? SINGLE[compositionKey(composition, 0)] : undefined;
}

export function candidateStructuresFor(composition: readonly FormulaPart[], charge: number): readonly KnownStructure[] {
  return charge === 0 ? (SEVERAL[compositionKey(composition, 0)] ?? []) : [];
}
