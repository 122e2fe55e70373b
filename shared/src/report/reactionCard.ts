/**
 * The card shown over an equation's arrow: the balance sheet (element, left, right), the charge,
 * and the oxidation-state changes: which elements are oxidised and reduced, and how many
 * electrons move per equation as balanced.
 */
import { analyzeSpecies } from "../chemistry/analyze";
import { CHARGE_LABEL, type BalanceLine } from "../chemistry/reactions/balance";
import { formatFraction } from "../chemistry/reactions/rational";
import { formatOxidationState, oxidationStatesOf } from "../chemistry/redox/oxidationStates";
import type { AnalysisResult } from "../chemistry/types";
import { imbalanceText, judgeReaction, termsOf } from "../document/reactions/judgeReaction";
import type { Reaction } from "../document/reactions/reactionTypes";
import type { DocumentModel } from "../document/types";
import { HOVER_CAUTION, type HoverFormat } from "./hoverMarkdown";

/** The equation whose arrow covers `offset` (either end included), if any. */
export function reactionAtOffset(model: DocumentModel, offset: number): Reaction | undefined {
  return model.reactions?.find((reaction) => reaction.arrow.range.start <= offset && offset <= reaction.arrow.range.end);
}

/** One element's change of oxidation state across the equation. */
export interface OxidationChange {
  readonly symbol: string;
  /** The state before and after ("+2", "+3"). */
  readonly before: string;
  readonly after: string;
  readonly kind: "oxidised" | "reduced";
  /** Electrons this element gives up (oxidised) or takes (reduced) per equation as balanced. */
  readonly electrons: number;
}

/** What the redox part of the card says; undefined when a species' states are unknown. */
export interface RedoxSummary {
  readonly changes: readonly OxidationChange[];
  /** Electrons moved per equation: given up by what is oxidised (or written as e-). */
  readonly electronsMoved: number;
}

/**
 * The oxidation-state changes of `reaction`, with `coefficients` (one per term, written order):
 * the balanced ones, so that the electron count is the equation's.
 */
export function redoxSummary(
  reaction: Reaction,
  coefficients: readonly number[],
  analyze: (text: string) => AnalysisResult = analyzeSpecies,
): RedoxSummary | undefined {
  // Whole-number copies of each species, so that atoms can be paired one by one.
  const scale = coefficients.reduce((multiple, value) => lcm(multiple, denominatorOf(value)), 1);
  const atoms = new Map<string, { left: number[]; right: number[] }>();
  let writtenElectrons = 0;
  let atomCount = 0;
  const terms = termsOf(reaction);
  for (let index = 0; index < terms.length; index++) {
    const term = terms[index];
    const copies = Math.round(coefficients[index] * scale);
    if (term.electron) {
      writtenElectrons += copies;
      continue;
    }
    if (!term.reading) return undefined;
    let analysis: AnalysisResult | undefined;
    try {
      analysis = analyze(term.speciesText);
    } catch {
      analysis = undefined;
    }
    const states = oxidationStatesOf(term.reading, analysis);
    if (!states) return undefined;
    for (const element of states.elements) {
      atomCount += copies * element.states.length;
      if (atomCount > MAX_PAIRED_ATOMS) return undefined;
      const entry = atoms.get(element.symbol) ?? { left: [], right: [] };
      const side = term.side === "left" ? entry.left : entry.right;
      for (let copy = 0; copy < copies; copy++) side.push(...element.states);
      atoms.set(element.symbol, entry);
    }
  }
  const changes: OxidationChange[] = [];
  for (const [symbol, { left, right }] of atoms) {
    if (left.length === 0 || left.length !== right.length) continue;
    // Atoms paired in order of state: the fewest electrons moved that explain both sides.
    left.sort((a, b) => a - b);
    right.sort((a, b) => a - b);
    const pairs = new Map<string, { before: number; after: number; count: number }>();
    left.forEach((before, index) => {
      const after = right[index];
      if (before === after) return;
      const key = `${before}>${after}`;
      const pair = pairs.get(key) ?? { before, after, count: 0 };
      pair.count++;
      pairs.set(key, pair);
    });
    for (const { before, after, count } of pairs.values()) {
      changes.push({
        symbol,
        before: formatOxidationState(before),
        after: formatOxidationState(after),
        kind: after > before ? "oxidised" : "reduced",
        electrons: (Math.abs(after - before) * count) / scale,
      });
    }
  }
  const given = changes.filter((change) => change.kind === "oxidised").reduce((sum, change) => sum + change.electrons, 0);
  const taken = changes.filter((change) => change.kind === "reduced").reduce((sum, change) => sum + change.electrons, 0);
  return { changes, electronsMoved: Math.max(given, taken, writtenElectrons / scale) };
}

/** Most atoms paired one by one for the redox summary; beyond this it is left out. */
const MAX_PAIRED_ATOMS = 20_000;

function denominatorOf(value: number): number {
  for (let denominator = 1; denominator <= 10_000; denominator++)
    if (Number.isInteger(Math.round(value * denominator * 1e9) / 1e9)) return denominator;
  return 1;
}

function lcm(a: number, b: number): number {
  return (a / (gcd(a, b) || 1)) * b;
}

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

/** The card for the arrow of `reaction`, in markdown or plain text. */
export function reactionCard(
  reaction: Reaction,
  format: HoverFormat = "markdown",
  analyze: (text: string) => AnalysisResult = analyzeSpecies,
): string {
  const markdown = format === "markdown";
  const strong = (text: string): string => (markdown ? `**${text}**` : text);
  const verdict = judgeReaction(reaction);
  const status =
    verdict.kind === "balanced"
      ? "balanced"
      : verdict.kind === "unbalanced"
        ? "not balanced"
        : verdict.kind === "not-unique"
          ? "not balanced (more than one independent way to balance it)"
          : "cannot balance";
  const lines = [`${strong("Equation")} · ${status}`, ""];
  const elementLines = verdict.sheet.filter((line) => line.label !== CHARGE_LABEL);
  if (markdown) {
    lines.push("| Element | Left | Right |", "|---|---:|---:|");
    for (const line of elementLines)
      lines.push(`| ${line.label} | ${formatFraction(line.left)} | ${formatFraction(line.right)}${mark(line)} |`);
  } else {
    for (const line of elementLines)
      lines.push(`${line.label}: ${formatFraction(line.left)} left, ${formatFraction(line.right)} right${mark(line)}`);
  }
  const charge = verdict.sheet.find((line) => line.label === CHARGE_LABEL);
  lines.push("", `Charge: ${signed(charge?.left)} on the left, ${signed(charge?.right)} on the right${charge ? mark(charge) : ""}`, "");
  if (verdict.kind !== "balanced") {
    lines.push(`Does not balance: ${imbalanceText(verdict.sheet)}`);
    if (verdict.kind === "impossible") lines.push(`Cannot balance: ${verdict.reason}.`);
    lines.push("");
  }
  if (reaction.arrow.conditions.length > 0)
    lines.push(`Conditions (over the arrow, not reactants): ${reaction.arrow.conditions.join("; ")}`, "");
  const coefficients =
    verdict.kind === "balanced"
      ? termsOf(reaction).map((term) => term.coefficient.numerator / term.coefficient.denominator)
      : verdict.kind === "unbalanced"
        ? verdict.coefficients.map(Number)
        : undefined;
  const redox = coefficients && redoxSummary(reaction, coefficients, analyze);
  if (redox && redox.changes.length > 0) {
    lines.push(strong("Oxidation states") + (verdict.kind === "unbalanced" ? " (as balanced)" : ""));
    for (const change of redox.changes) {
      lines.push(
        `- ${change.symbol} ${change.before} → ${change.after}: ${change.kind} (${formatElectrons(change.electrons)} ${change.kind === "oxidised" ? "given up" : "taken"})`,
      );
    }
    lines.push(`- Electrons moved per equation: ${formatElectrons(redox.electronsMoved)}`, "");
  } else if (redox) {
    lines.push("No oxidation state changes: not a redox reaction.", "");
  }
  lines.push(markdown ? `_${HOVER_CAUTION}_` : HOVER_CAUTION);
  return lines.join("\n");
}

function formatElectrons(count: number): string {
  const rounded = Number.isInteger(count) ? String(count) : count.toFixed(2);
  return `${rounded} e-`;
}

function mark(line: BalanceLine): string {
  return line.left.numerator * line.right.denominator === line.right.numerator * line.left.denominator ? "" : " ✗";
}

function signed(value: BalanceLine["left"] | undefined): string {
  if (!value || value.numerator === 0n) return "0";
  const text = formatFraction(value);
  return value.numerator > 0n ? `+${text}` : text;
}
