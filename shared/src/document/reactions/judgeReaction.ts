/**
 * The verdict on one written equation: balanced or not, and if not, the coefficients that balance
 * it and the equation rewritten with them (only the coefficients change).
 */
import { balanceEquation, lineDiffers, CHARGE_LABEL, type BalanceLine, type BalanceVerdict } from "../../chemistry/reactions/balance";
import { formatFraction, fraction, type Fraction } from "../../chemistry/reactions/rational";
import type { FixEdit } from "../types";
import type { Reaction, ReactionTerm } from "./reactionTypes";

/** Every term of the equation, left side first, in written order. */
export function termsOf(reaction: Reaction): readonly ReactionTerm[] {
  return [...reaction.left, ...reaction.right];
}

/** The written coefficient of `term` as an exact fraction. */
export function coefficientOf(term: ReactionTerm): Fraction {
  return fraction(BigInt(term.coefficient.numerator), BigInt(term.coefficient.denominator));
}

/** Balances the equation's terms as the balancer sees them (an electron: charge -1, no atoms). */
export function judgeReaction(reaction: Reaction): BalanceVerdict {
  return balanceEquation(
    termsOf(reaction).map((term) => ({
      composition: term.reading?.composition ?? [],
      charge: term.electron ? -1 : (term.reading?.charge ?? 0),
      side: term.side,
      coefficient: coefficientOf(term),
    })),
  );
}

/**
 * The smallest edits that put `coefficients` (one per term, in written order) in place of the
 * written ones, in document order: a written number is replaced, a coefficient of 1 is deleted
 * with the space after it, a new one is inserted before its species (glued when the writer glues
 * them). Nothing else in the equation changes.
 */
export function coefficientEdits(reaction: Reaction, coefficients: readonly bigint[]): FixEdit[] {
  const terms = termsOf(reaction);
  const glued = terms.some((term) => term.coefficient.glued) && !terms.some((term) => term.coefficient.written && !term.coefficient.glued);
  const base = reaction.range.start;
  const edits: FixEdit[] = [];
  terms.forEach((term, index) => {
    const wanted = coefficients[index];
    const written = term.coefficient.written;
    if (!written) {
      if (wanted !== 1n)
        edits.push({
          range: { start: term.speciesRange.start, end: term.speciesRange.start },
          newText: glued ? String(wanted) : `${wanted} `,
        });
    } else if (wanted === 1n) {
      // The old coefficient runs up to the species; the gap after it goes too.
      edits.push({ range: { start: written.start, end: term.speciesRange.start }, newText: "" });
    } else if (reaction.text.slice(written.start - base, written.end - base) !== String(wanted)) {
      edits.push({ range: written, newText: String(wanted) });
    }
  });
  return edits;
}

/** The equation's text with `coefficients` in place of the written ones (see `coefficientEdits`). */
export function rewrittenWithCoefficients(reaction: Reaction, coefficients: readonly bigint[]): string {
  const base = reaction.range.start;
  let text = "";
  let copied = 0;
  for (const edit of coefficientEdits(reaction, coefficients)) {
    text += reaction.text.slice(copied, edit.range.start - base) + edit.newText;
    copied = edit.range.end - base;
  }
  return text + reaction.text.slice(copied);
}

/** The sign a charge total is written with: "+1", "-2", "0", "+3/2". */
function signedTotal(value: Fraction): string {
  const text = formatFraction(value);
  return value.numerator > 0n ? `+${text}` : text;
}

/** "O: 4 on the left, 3 on the right; charge +1 vs 0" for the lines that differ. */
export function imbalanceText(sheet: readonly BalanceLine[]): string {
  return sheet
    .filter(lineDiffers)
    .map((line) =>
      line.label === CHARGE_LABEL
        ? `charge ${signedTotal(line.left)} vs ${signedTotal(line.right)}`
        : `${line.label}: ${formatFraction(line.left)} on the left, ${formatFraction(line.right)} on the right`,
    )
    .join("; ");
}
