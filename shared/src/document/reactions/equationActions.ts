/**
 * The actions an editor offers on an equation's arrow beyond the coefficient fix: completing a
 * half-reaction or skeleton redox equation in acidic or basic solution, and writing the overall
 * equation of two half-reactions. Decided here once; editors only turn them into edits.
 */
import type { TextRange } from "../../chemistry/types";
import { readSpecies } from "../../chemistry/reader/readSpecies";
import type { SpeciesReader } from "../speciesReader";
import type { DocumentModel, FixEdit } from "../types";
import { combinedEquations } from "./combineHalfReactions";
import { completionsOf, completionTitle } from "./completeEquation";
import { judgeReaction } from "./judgeReaction";
import { REACTION_CODES } from "./reactionFindings";
import { isTextMarkup } from "../documentKind";

/** One action on an equation: a title and the edits it makes, applied together. */
export interface EquationAction {
  readonly title: string;
  /** "complete": fixes the equation's finding; "combine": adds a new equation. */
  readonly kind: "complete" | "combine";
  /** The arrow of the equation the action belongs to. */
  readonly arrow: TextRange;
  /** The code of the finding on that arrow the action answers, for "complete". */
  readonly findingCode?: string;
  /** Edits in document order, none overlapping: one undoable change. */
  readonly edits: readonly FixEdit[];
}

/**
 * The actions for the equations whose arrows touch `range`. `text` is the document's text (for
 * the line a combined equation goes on); `model` its model.
 */
export function equationActions(text: string, model: DocumentModel, range: TextRange, read: SpeciesReader = readSpecies): EquationAction[] {
  const reactions = model.reactions ?? [];
  const actions: EquationAction[] = [];
  for (const reaction of reactions) {
    const arrow = reaction.arrow.range;
    if (arrow.start > range.end || range.start > arrow.end) continue;
    const completions = completionsOf(reaction, read);
    if (completions.length === 0) continue;
    const verdict = judgeReaction(reaction).kind;
    const findingCode = verdict === "not-unique" ? REACTION_CODES.notUnique : REACTION_CODES.impossible;
    for (const completion of completions)
      actions.push({
        title: completionTitle(completion, completions.length === 1),
        kind: "complete",
        arrow,
        findingCode,
        edits: completion.edits,
      });
  }
  // Tables hold equations one to a cell: no line to add one after.
  if (model.kind === "markdown" || isTextMarkup(model.kind)) {
    for (const combined of combinedEquations(text, reactions, range, read)) {
      const touched = [combined.oxidation, combined.reduction].find(
        (reaction) => reaction.arrow.range.start <= range.end && range.start <= reaction.arrow.range.end,
      )!;
      actions.push({ title: combined.edit.title, kind: "combine", arrow: touched.arrow.range, edits: [combined.edit] });
    }
  }
  return actions;
}
