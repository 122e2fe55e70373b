/**
 * A chemical equation as written in a document: its sides, each term's coefficient and species
 * with their exact spans, and the arrow. Every edge (checks, hovers, the command line) reads it.
 */
import type { SpeciesReading, TextRange } from "../../chemistry/types";

/** What the arrow says: a one-way reaction, an equilibrium, a resonance pair, or a plain "=". */
export type ArrowKind = "forward" | "backward" | "equilibrium" | "resonance" | "equals";

/** Where the equation was written. */
export type ReactionNotation = "mhchem" | "text" | "table";

/** A coefficient as a fraction of plain integers (1 when none is written). */
export interface Coefficient {
  readonly numerator: number;
  readonly denominator: number;
  /** The coefficient's own text, when one is written ("2", "1/2", "0.5", "½"). */
  readonly written?: TextRange;
  /** Written straight against the formula ("2H2O"), not with a space ("2 H2O"). */
  readonly glued?: true;
}

/** One reactant or product. */
export interface ReactionTerm {
  /** From the coefficient (when written) to the end of the species. */
  readonly range: TextRange;
  readonly side: "left" | "right";
  readonly coefficient: Coefficient;
  /** The species as written, states and hydrate water included ("CuSO4·5H2O", "Ag+ (aq)"). */
  readonly speciesRange: TextRange;
  readonly speciesText: string;
  /** The reader's reading of the species; absent for an electron. */
  readonly reading?: SpeciesReading;
  /** An electron ("e-", "e^-", "e⁻") of a half-reaction. */
  readonly electron: boolean;
}

/** The arrow (or "=") between the sides, with the text written over and under it. */
export interface ReactionArrow {
  readonly range: TextRange;
  readonly text: string;
  readonly kind: ArrowKind;
  /** Arrow labels ("H2SO4", "heat"): conditions, not reactants. */
  readonly conditions: readonly string[];
}

/** One equation: left side, arrow, right side. */
export interface Reaction {
  /** From the first term to the last. */
  readonly range: TextRange;
  /** The document's text over `range`, exactly. */
  readonly text: string;
  readonly notation: ReactionNotation;
  readonly arrow: ReactionArrow;
  readonly left: readonly ReactionTerm[];
  readonly right: readonly ReactionTerm[];
}
