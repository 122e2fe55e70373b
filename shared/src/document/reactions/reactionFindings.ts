/**
 * Findings about equations: on the arrow, saying what does not balance, with a fix that rewrites
 * only the coefficients when one set of smallest whole numbers balances it. An equation with a
 * species the core refuses is not judged: that species has its own finding.
 */
import type { AnalysisResult } from "../../chemistry/types";
import { severityOf } from "../findingSeverity";
import type { Finding } from "../types";
import { fixOfEdits, shiftedFix } from "../fixEdits";
import { completionNote } from "./completionNote";
import { coefficientEdits, imbalanceText, judgeReaction, rewrittenWithCoefficients, termsOf } from "./judgeReaction";
import type { Reaction } from "./reactionTypes";

/** Stable codes of the equation findings. */
export const REACTION_CODES = {
  unbalanced: "equation-unbalanced",
  notUnique: "equation-balance-not-unique",
  impossible: "equation-cannot-balance",
} as const;

/** Findings for `reactions`; `analyze` tells which species the core refuses. */
export function reactionFindings(reactions: readonly Reaction[], analyze: (text: string) => AnalysisResult | undefined): Finding[] {
  const findings: Finding[] = [];
  // Notebooks repeat their equations: one verdict per distinct text, placed at each copy.
  const memo = new Map<string, { readonly at: number; readonly finding: Finding | undefined }>();
  for (const reaction of reactions) {
    if (!judgeable(reaction, analyze)) continue;
    const key = `${reaction.notation}\u0000${reaction.text}`;
    let known = memo.get(key);
    if (!known) {
      known = { at: reaction.range.start, finding: reactionFinding(reaction) };
      if (memo.size >= MEMO_LIMIT) memo.clear();
      memo.set(key, known);
    }
    if (known.finding) findings.push(movedFinding(known.finding, reaction.range.start - known.at));
  }
  return findings;
}

/** Distinct equation texts remembered per check. */
const MEMO_LIMIT = 10_000;

function movedFinding(finding: Finding, by: number): Finding {
  if (by === 0) return finding;
  const range = { start: finding.range.start + by, end: finding.range.end + by };
  const fix = finding.fix && shiftedFix(finding.fix, by);
  return fix ? { ...finding, range, fix } : { ...finding, range };
}

function judgeable(reaction: Reaction, analyze: (text: string) => AnalysisResult | undefined): boolean {
  for (const term of termsOf(reaction)) {
    if (term.electron) continue;
    const result = analyze(term.speciesText);
    if (result && !result.ok && severityOf(result.problem.code) === "error") return false;
  }
  return true;
}

/** The finding for one equation, or undefined when it balances. */
export function reactionFinding(reaction: Reaction): Finding | undefined {
  const verdict = judgeReaction(reaction);
  const range = reaction.arrow.range;
  switch (verdict.kind) {
    case "balanced":
      return undefined;
    case "unbalanced": {
      const newText = rewrittenWithCoefficients(reaction, verdict.coefficients);
      // Only the coefficients change: one edit each, applied together as one change.
      const edits = coefficientEdits(reaction, verdict.coefficients);
      const fix = fixOfEdits(reaction.text, reaction.range.start, edits, `Balance: ${verdict.coefficients.join(", ")}`);
      return {
        range,
        severity: "error",
        code: REACTION_CODES.unbalanced,
        message: `Equation not balanced: ${imbalanceText(verdict.sheet)}. Balanced: ${newText}`,
        ...(fix && { fix }),
      };
    }
    case "not-unique":
      return {
        range,
        // Two reactions written as one, or a scheme: worth a look, not a verdict.
        severity: "warning",
        code: REACTION_CODES.notUnique,
        message:
          `Equation not balanced: ${imbalanceText(verdict.sheet)}. It can be balanced in ${verdict.ways} independent ways ` +
          (completionNote(reaction)?.replace(/^/, "as written. ") ??
            "(two reactions written as one?), so no single set of coefficients is offered."),
      };
    case "impossible":
      return {
        range,
        // Reaction schemes leave out by-products on purpose ("-> ester", no water): a warning, not an error.
        severity: "warning",
        code: REACTION_CODES.impossible,
        message:
          `Equation cannot balance: ${verdict.reason}. As written: ${imbalanceText(verdict.sheet)}. ` +
          (completionNote(reaction) ?? "A species is missing, or this is a scheme that leaves out by-products."),
      };
  }
}
