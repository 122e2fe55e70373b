/**
 * Balancing a typed equation in acidic or basic solution: as `balanceText` when the coefficients
 * alone balance it; otherwise completed with H+ (or OH-), H2O and, for a half-reaction,
 * electrons, when one completion does it. The command line's answer, decided here once.
 */
import { memoisedReader, type SpeciesReader } from "../speciesReader";
import { balanceText, readTypedEquation, type BalanceAnswer } from "./balanceText";
import { completeReaction, type SolutionMedium } from "./completeEquation";

/** The answer for one equation balanced in a solution; `completedIn` is set when species were added. */
export type SolutionBalanceAnswer = BalanceAnswer & { readonly completedIn?: SolutionMedium };

/** Balances `input` in `medium`; never throws. */
export function balanceInSolution(input: string, medium: SolutionMedium, read: SpeciesReader = memoisedReader()): SolutionBalanceAnswer {
  const plain = balanceText(input, read);
  if (plain.ok) return plain;
  const reaction = readTypedEquation(input, read);
  const completion = reaction && completeReaction(reaction, medium, read);
  if (!reaction || !completion) {
    if (!reaction) return plain;
    const supplies = medium === "acidic" ? "H+ and H2O" : "OH- and H2O";
    return {
      ...plain,
      error: {
        ...plain.error,
        message: `${plain.error.message}; completing with ${supplies} is done only for a redox equation or half-reaction with one answer`,
      },
    };
  }
  const completed = input.slice(0, reaction.range.start) + completion.equation + input.slice(reaction.range.end);
  const answer = balanceText(completed, read);
  if (!answer.ok) return plain;
  return { ...answer, input, wasBalanced: false, completedIn: medium };
}
