/**
 * Whether an equation's written coefficients conserve every element and the charge, and if not,
 * the smallest whole-number coefficients that do: the null space of the composition matrix
 * (one row per element and one for charge, reactants counted positive and products negative),
 * worked out exactly.
 */
import type { FormulaPart } from "../types";
import { nullSpace } from "./nullSpace";
import { add, fraction, isZero, multiply, sign, smallestWholeRatio, subtract, ZERO, type Fraction } from "./rational";

/** One species of an equation as the balancer needs it. */
export interface BalanceTerm {
  readonly composition: readonly FormulaPart[];
  readonly charge: number;
  readonly side: "left" | "right";
  /** The coefficient as written (1 when none is). */
  readonly coefficient: Fraction;
}

/** One line of the balance sheet: an element (or "charge") and its totals on each side. */
export interface BalanceLine {
  readonly label: string;
  readonly left: Fraction;
  readonly right: Fraction;
}

/** What the balancer concluded about an equation. */
export type BalanceVerdict =
  | { readonly kind: "balanced"; readonly sheet: readonly BalanceLine[] }
  /** Not balanced as written; `coefficients` (smallest whole numbers, in written order) balance it. */
  | { readonly kind: "unbalanced"; readonly sheet: readonly BalanceLine[]; readonly coefficients: readonly bigint[] }
  /** Not balanced as written, and balanced in `ways` independent ways: no one answer. */
  | { readonly kind: "not-unique"; readonly sheet: readonly BalanceLine[]; readonly ways: number }
  /** No positive coefficients balance it; `reason` says which element or charge cannot. */
  | {
      readonly kind: "impossible";
      readonly sheet: readonly BalanceLine[];
      readonly reason: string;
      /** The element symbol, or "charge", that cannot balance (absent when a species is on the wrong side). */
      readonly culprit?: string;
    };

/** The label of the charge line of a balance sheet. */
export const CHARGE_LABEL = "charge";

/** Judges the equation made of `terms` (left side first, in written order). */
export function balanceEquation(terms: readonly BalanceTerm[]): BalanceVerdict {
  const labels = rowLabels(terms);
  const matrix = labels.map((label) => terms.map((term) => signedCount(term, label)));
  const sheet = balanceSheet(terms, labels);
  if (sheet.every((line) => isZero(subtract(line.left, line.right)))) return { kind: "balanced", sheet };

  const oneSided = oneSidedRow(terms, labels);
  if (oneSided) return { kind: "impossible", sheet, ...oneSided };
  const basis = nullSpace(matrix, terms.length);
  if (basis.length > 1) return { kind: "not-unique", sheet, ways: basis.length };
  if (basis.length === 1) {
    const whole = smallestWholeRatio(basis[0]);
    if (whole.every((value) => value > 0n)) return { kind: "unbalanced", sheet, coefficients: whole };
    return {
      kind: "impossible",
      sheet,
      reason: "only a zero or negative coefficient would balance it: a species is on the wrong side or does not belong",
    };
  }
  return { kind: "impossible", sheet, ...blamedRow(terms, labels, matrix) };
}

/** Elements in order of first appearance, then the charge when any species carries one. */
function rowLabels(terms: readonly BalanceTerm[]): string[] {
  const labels: string[] = [];
  for (const term of terms) for (const part of term.composition) if (!labels.includes(part.symbol)) labels.push(part.symbol);
  if (terms.some((term) => term.charge !== 0)) labels.push(CHARGE_LABEL);
  return labels;
}

function countOf(term: BalanceTerm, label: string): number {
  if (label === CHARGE_LABEL) return term.charge;
  let count = 0;
  for (const part of term.composition) if (part.symbol === label) count += part.count;
  return count;
}

function signedCount(term: BalanceTerm, label: string): bigint {
  const count = BigInt(countOf(term, label));
  return term.side === "left" ? count : -count;
}

function balanceSheet(terms: readonly BalanceTerm[], labels: readonly string[]): BalanceLine[] {
  return labels.map((label) => {
    let left = ZERO;
    let right = ZERO;
    for (const term of terms) {
      const amount = multiply(term.coefficient, fraction(BigInt(countOf(term, label))));
      if (term.side === "left") left = add(left, amount);
      else right = add(right, amount);
    }
    return { label, left, right };
  });
}

/** An element (or the charge) found on one side only can never balance. */
function oneSidedRow(terms: readonly BalanceTerm[], labels: readonly string[]): { reason: string; culprit: string } | undefined {
  for (const label of labels) {
    const onLeft = terms.some((term) => term.side === "left" && countOf(term, label) !== 0);
    const onRight = terms.some((term) => term.side === "right" && countOf(term, label) !== 0);
    if (onLeft === onRight) continue;
    const side = onLeft ? "left" : "right";
    if (label !== CHARGE_LABEL) return { culprit: label, reason: `${label} appears only on the ${side}` };
    // One-sided charge of one sign cannot cancel; of both signs it might, so that is left to the matrix.
    const signs = new Set(terms.filter((term) => term.side === side && term.charge !== 0).map((term) => Math.sign(term.charge)));
    if (signs.size === 1)
      return { culprit: CHARGE_LABEL, reason: `only the ${side} side carries a charge (add electrons, e-, for a half-reaction)` };
  }
  return undefined;
}

/** The row whose removal makes the rest balance: the element or charge to blame. */
function blamedRow(
  terms: readonly BalanceTerm[],
  labels: readonly string[],
  matrix: readonly (readonly bigint[])[],
): { reason: string; culprit?: string } {
  for (let row = labels.length - 1; row >= 0; row--) {
    const rest = matrix.filter((_, index) => index !== row);
    const basis = nullSpace(rest, terms.length);
    if (basis.length !== 1) continue;
    const whole = smallestWholeRatio(basis[0]);
    if (!whole.every((value) => value > 0n)) continue;
    const label = labels[row];
    return label === CHARGE_LABEL
      ? { culprit: label, reason: "the charge cannot balance once the atoms do (a half-reaction needs electrons, e-)" }
      : { culprit: label, reason: `${label} cannot balance once the other elements do` };
  }
  return { reason: "no coefficients balance every element and the charge at once" };
}

/** True when the sheet has a line whose totals differ. */
export function lineDiffers(line: BalanceLine): boolean {
  return sign(subtract(line.left, line.right)) !== 0;
}
