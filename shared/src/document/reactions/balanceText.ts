/**
 * Balancing one equation typed as an argument ("Al + O2 -> Al2O3", or an mhchem
 * "\ce{Al + O2 -> Al2O3}"): the answer the command line prints, decided here once.
 */
import { smallestWholeRatio } from "../../chemistry/reactions/rational";
import { memoisedReader, type SpeciesReader } from "../speciesReader";
import { coefficientOf, imbalanceText, judgeReaction, rewrittenWithCoefficients, termsOf } from "./judgeReaction";
import { readWholeEquation } from "./readEquation";
import { REACTION_CODES } from "./reactionFindings";
import type { Reaction } from "./reactionTypes";

/** Code of the answer for text that is not one equation lonepair can read. */
export const NOT_AN_EQUATION = "not-an-equation";

/** The answer for one typed equation. */
export type BalanceAnswer =
  | {
      readonly input: string;
      readonly ok: true;
      /** The equation with the smallest whole-number coefficients (only coefficients changed). */
      readonly equation: string;
      /** One per species in written order (left side, then right; electrons included). */
      readonly coefficients: readonly number[];
      readonly wasBalanced: boolean;
      readonly reaction: Reaction;
    }
  | { readonly input: string; readonly ok: false; readonly error: { readonly code: string; readonly message: string } };

/** Balances the equation `input`; never throws. */
export function balanceText(input: string, read: SpeciesReader = memoisedReader()): BalanceAnswer {
  const reaction = readTypedEquation(input, read);
  if (!reaction) return { input, ok: false, error: { code: NOT_AN_EQUATION, message: notAnEquationMessage(input, read) } };
  const verdict = judgeReaction(reaction);
  switch (verdict.kind) {
    case "balanced": {
      const whole = smallestWholeRatio(termsOf(reaction).map(coefficientOf));
      return answer(input, reaction, whole, true);
    }
    case "unbalanced":
      return answer(input, reaction, verdict.coefficients, false);
    case "not-unique":
      return {
        input,
        ok: false,
        error: {
          code: REACTION_CODES.notUnique,
          message: `${imbalanceText(verdict.sheet)}: it balances in ${verdict.ways} independent ways, so there is no single answer`,
        },
      };
    case "impossible":
      return { input, ok: false, error: { code: REACTION_CODES.impossible, message: `cannot balance: ${verdict.reason}` } };
  }
}

/** The one equation typed as `input` (plain, or wrapped in `\\ce{...}` or `\\ch{...}`), if it is one. */
export function readTypedEquation(input: string, read: SpeciesReader): Reaction | undefined {
  const wrapped = /^\s*\\c[eh]\{([\s\S]*)\}\s*$/.exec(input);
  const bodyStart = wrapped ? input.indexOf("{") + 1 : 0;
  const bodyEnd = wrapped ? input.lastIndexOf("}") : input.length;
  return readWholeEquation(input, bodyStart, bodyEnd, "mhchem", read);
}

function answer(input: string, reaction: Reaction, coefficients: readonly bigint[], wasBalanced: boolean): BalanceAnswer {
  const rewritten = rewrittenWithCoefficients(reaction, coefficients);
  const equation = input.slice(0, reaction.range.start) + rewritten + input.slice(reaction.range.end);
  return { input, ok: true, equation, coefficients: coefficients.map(Number), wasBalanced, reaction };
}

/** Why `input` is not an equation: no arrow, several arrows, or a piece that does not read. */
function notAnEquationMessage(input: string, read: SpeciesReader): string {
  const arrows = input.match(/<=>|<->|-+>|<-|[\u2192\u27f6\u2190\u27f5\u21cc\u21c4\u21c6\u2194\u27f7]|\s=\s/g) ?? [];
  if (arrows.length === 0) return `"${input}" has no arrow (->, →, <=>, ⇌) between reactants and products`;
  if (arrows.length > 1) return `"${input}" has ${arrows.length} arrows; give one step at a time`;
  for (const piece of input
    .replace(/\\c[eh]\{|\}$/g, " ")
    .split(/\s+\+\s+|\s*(?:<=>|<->|-+>|<-|[\u2192\u27f6\u2190\u27f5\u21cc\u21c4\u21c6\u2194\u27f7]|\s=\s)\s*/)) {
    const species = piece.trim().replace(/^(?:\d+\/\d+|\d*\.\d+|\d+)\s*(?=[A-Z([e])/, "");
    if (species.length === 0 || /^e(?:[-\u2212\u207b]|\^-)$/.test(species)) continue;
    const result = read(species);
    if (!result.ok) return `"${species}" is not a species lonepair can read: ${result.problem.message}`;
  }
  return `"${input}" is not an equation lonepair can read`;
}
