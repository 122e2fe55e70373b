import type { Problem, TextRange } from "../types";

/** One atom as written in a SMILES string. */
export interface SmilesAtom {
  /** Element symbol in its usual capitalisation ("C", "Cl", "Se"), also for aromatic atoms. */
  readonly symbol: string;
  /** Written in lower case (c, n, [nH], [se]): a member of an aromatic system. */
  readonly aromatic: boolean;
  /** Formal charge as written; 0 when none is given. */
  readonly charge: number;
  /** Hydrogens on this atom: the bracket count, or the implicit count from the valence rules. */
  readonly hydrogens: number;
  /** Mass number when one is written, as in [13CH4]. */
  readonly isotope?: number;
  /** Written in square brackets. */
  readonly bracket: boolean;
  /** Where the atom is written (the whole bracket for bracket atoms). */
  readonly range: TextRange;
}

/** A bond between two atoms, by index into the atom list. */
export interface SmilesBond {
  readonly from: number;
  readonly to: number;
  /** 1, 2, 3, or 4 for the quadruple bond `$`. Aromatic bonds carry 1. */
  readonly order: 1 | 2 | 3 | 4;
  /** Part of an aromatic ring system; `kekulize` turns these into single and double bonds. */
  readonly aromatic: boolean;
  /** "/" or "\\" written on this bond (from `from` towards `to`): double-bond geometry. */
  readonly direction?: "/" | "\\";
}

/** The molecular graph read from a SMILES string. */
export interface SmilesMolecule {
  readonly atoms: readonly SmilesAtom[];
  readonly bonds: readonly SmilesBond[];
}

/** The result of reading SMILES: the molecule, or the first problem found. */
export type SmilesResult = { readonly ok: true; readonly value: SmilesMolecule } | { readonly ok: false; readonly problem: Problem };
