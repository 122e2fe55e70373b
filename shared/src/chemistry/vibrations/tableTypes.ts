/**
 * The shape of a character table as the core keeps it: classes with the operation that stands
 * for each, irreducible representations with their characters, and what each one spans.
 */
import type { ClassOperation } from "./classOperation";

/** One class of symmetry operations: its printed name ("2C3", "3σv"), how many it holds, one member. */
export interface SymmetryClass {
  readonly name: string;
  readonly size: number;
  /** A member of the class in the table's standard frame (z along the principal axis). */
  readonly operation: ClassOperation;
}

/** One irreducible representation (or a pair of complex-conjugate ones printed as one E). */
export interface IrreducibleRepresentation {
  /** Mulliken label: A1g, B2u, E′, T1u, Hg, ... */
  readonly label: string;
  /**
   * Characters in class order. For a complex-conjugate pair, the sum of the pair's two
   * characters (real), as tables print it and as the count of vibrations needs it.
   */
  readonly characters: readonly number[];
  /**
   * Set only for a complex-conjugate pair: the imaginary parts of one member's characters; the
   * other member has the negatives. The pair is degenerate by time reversal, so it counts as one E.
   */
  readonly imaginaryParts?: readonly number[];
  /** Dimension: 1, 2 (E, or a complex pair), 3 (T), 4 (G) or 5 (H). */
  readonly degeneracy: number;
  /** Which of x, y, z transform as it: ["z"], ["(x, y)"], ["x", "y"] ... */
  readonly linear: readonly string[];
  /** Which rotations transform as it: ["Rz"], ["(Rx, Ry)"] ... */
  readonly rotations: readonly string[];
  /** It holds a component of the dipole (x, y or z): a fundamental of this symmetry is IR-active. */
  readonly ir: boolean;
  /** It holds a quadratic function (x², xy, ...): a fundamental of this symmetry is Raman-active. */
  readonly raman: boolean;
}

/** A point group's character table. */
export interface CharacterTable {
  /** Schoenflies symbol as the point-group search reports it: "C2v", "D3h", "Oh". */
  readonly group: string;
  /** Number of operations in the group. */
  readonly order: number;
  readonly classes: readonly SymmetryClass[];
  readonly irreps: readonly IrreducibleRepresentation[];
  /** The group holds the inversion centre i (so g/u labels and the mutual exclusion rule apply). */
  readonly centrosymmetric: boolean;
}

/** A table before its activities and basis functions are worked out. */
export interface RawCharacterTable {
  readonly group: string;
  readonly classes: readonly SymmetryClass[];
  readonly irreps: readonly RawIrrep[];
}

export interface RawIrrep {
  readonly label: string;
  readonly characters: readonly number[];
  readonly imaginaryParts?: readonly number[];
}
