/**
 * The sentence a finding on an equation adds when the equation can be completed in acidic or
 * basic solution: what the completed equation is.
 */
import { completionsOf } from "./completeEquation";
import type { Reaction } from "./reactionTypes";

/** "(with H+ and H2O) in acidic solution: ...; in basic solution: ...", or undefined when it cannot be. */
export function completionNote(reaction: Reaction): string | undefined {
  let completions;
  try {
    completions = completionsOf(reaction);
  } catch {
    return undefined;
  }
  if (completions.length === 0) return undefined;
  const [first, second] = completions;
  // Acid and base give the same equation when only electrons are missing.
  if (!second && first.added.every((term) => /^e/.test(term.text))) return `As a half-reaction: ${first.equation}.`;
  const parts = [`Completed in ${first.medium} solution: ${first.equation}`];
  if (second) parts.push(`in ${second.medium} solution: ${second.equation}`);
  return `${parts.join("; ")}.`;
}
