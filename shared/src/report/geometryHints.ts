/**
 * Which inlay hints a document gets, decided once for every editor: the molecular geometry after
 * each species mention ("SF4: seesaw"). A name and its formula written side by side ("chlorine
 * trifluoride (ClF3)") get one hint; species inside an mhchem `\ce{...}` span get theirs after the
 * closing brace, never inside the braces; a table's species cells get none in prose, and in data
 * files only each record's own species cell does.
 */
import type { SpeciesAnalysis, TextRange } from "../chemistry/types";
import { lastMhchemOpening } from "../document/mhchemSpan";
import { analyzeOccurrenceSafely } from "../document/speciesAt";
import type { DocumentKind, DocumentModel, SpeciesOccurrence } from "../document/types";

/** A hint: where it goes (a UTF-16 offset) and what it says. */
export interface GeometryHint {
  readonly offset: number;
  readonly label: string;
}

const PROSE_KINDS: readonly DocumentKind[] = ["markdown", "plaintext", "latex", "asciidoc", "restructuredtext"];

/** True for the kinds of document whose hints the prose setting governs. */
export function isProseKind(kind: DocumentKind): boolean {
  return PROSE_KINDS.includes(kind);
}

/** Text allowed between a name and the formula that repeats it: spaces, an opening bracket, a comma or a dash. */
const SIDE_BY_SIDE_GAP = /^[\s(,–—-]*$/;

/** The hints whose offset lies in `range`, in document order. `isCancelled` stops early with none. */
export function geometryHints(
  text: string,
  model: DocumentModel,
  range: TextRange,
  isCancelled: () => boolean = () => false,
): GeometryHint[] {
  const pending: PendingHint[] = [];
  for (const occurrence of hintedOccurrences(model)) {
    if (isCancelled()) return [];
    // Occurrences come in order of their start; the hint of one can land a little after its end.
    if (occurrence.range.start > range.end) break;
    if (occurrence.range.end < range.start) continue;
    const result = analyzeOccurrenceSafely(occurrence);
    const label = result.ok ? geometryLabel(result.value) : undefined;
    if (!result.ok || !label) continue;
    const formula = result.value.reading.formula;
    const mhchemEnd = occurrence.reading.notation === "mhchem" ? mhchemSpanEnd(text, occurrence.range) : undefined;
    const aloneInSpan =
      mhchemEnd !== undefined && text.slice(lastMhchemOpening(text, occurrence.range.start) + 4, mhchemEnd - 1) === occurrence.text;
    const previous = pending[pending.length - 1];
    const pairsWithPrevious =
      previous !== undefined &&
      previous.formula === formula &&
      previous.mhchemEnd === undefined &&
      mhchemEnd === undefined &&
      SIDE_BY_SIDE_GAP.test(text.slice(previous.end, occurrence.range.start));
    // The same species named twice in a row: one hint, after the second mention (and its closing bracket).
    if (pairsWithPrevious) pending.pop();
    pending.push({ end: occurrence.range.end, formula, label, mhchemEnd, aloneInSpan, closesPair: pairsWithPrevious });
  }
  return placeHints(text, pending).filter((hint) => hint.offset >= range.start && hint.offset <= range.end);
}

interface PendingHint {
  readonly end: number;
  readonly formula: string;
  readonly label: string;
  /** Just after the closing brace of the mhchem span holding the mention. */
  readonly mhchemEnd?: number;
  /** The mhchem span holds this mention and nothing else. */
  readonly aloneInSpan: boolean;
  /** The second mention of a name and its formula written side by side. */
  readonly closesPair: boolean;
}

/** Offsets and labels: after a closing bracket that ends a side-by-side pair; one hint per mhchem span. */
function placeHints(text: string, pending: readonly PendingHint[]): GeometryHint[] {
  const hints: GeometryHint[] = [];
  for (let index = 0; index < pending.length; index++) {
    const item = pending[index];
    if (item.mhchemEnd === undefined) {
      hints.push({ offset: item.closesPair && text[item.end] === ")" ? item.end + 1 : item.end, label: item.label });
      continue;
    }
    // Every species of one \ce span shares a hint after its closing brace.
    const group = [item];
    while (index + 1 < pending.length && pending[index + 1].mhchemEnd === item.mhchemEnd) group.push(pending[++index]);
    // A span that is more than one species (a reaction) names the species each label belongs to.
    const labels =
      group.length === 1 && item.aloneInSpan ? [item.label] : uniqueLabels(group.map((member) => `${member.formula} ${member.label}`));
    hints.push({ offset: item.mhchemEnd, label: labels.join("; ") });
  }
  return hints;
}

function uniqueLabels(labels: readonly string[]): string[] {
  return labels.filter((label, index) => labels.indexOf(label) === index);
}

/** The offset just after the closing brace of the `\ce{...}` (or `\ch{...}`) span holding `range`, if there is one. */
function mhchemSpanEnd(text: string, range: TextRange): number | undefined {
  const opening = lastMhchemOpening(text, range.start);
  if (opening < 0) return undefined;
  let depth = 0;
  for (let index = opening + 3; index < text.length; index++) {
    const character = text[index];
    if (character === "\\") {
      index++;
      continue;
    }
    if (character === "{") depth++;
    else if (character === "}" && --depth === 0) return index + 1 >= range.end ? index + 1 : undefined;
    else if (character === "\n" && text[index + 1] === "\n") return undefined;
  }
  return undefined;
}

/**
 * In prose a table's species cells are data and get no hint. In data files only each record's
 * species cell does: a name cell beside the formula would repeat it.
 */
function hintedOccurrences(model: DocumentModel): readonly SpeciesOccurrence[] {
  if (!isProseKind(model.kind)) return model.records.map((record) => record.species);
  const key = (range: TextRange): string => `${range.start}:${range.end}`;
  const speciesCells = new Set(model.records.map((record) => key(record.species.range)));
  return model.occurrences.filter((occurrence) => !speciesCells.has(key(occurrence.range)));
}

/** "seesaw" for one centre; "C: tetrahedral, O: bent" when the centres differ. */
export function geometryLabel(analysis: SpeciesAnalysis): string | undefined {
  const labels: string[] = [];
  for (const centre of analysis.centres) {
    const label = `${centre.atom}: ${centre.molecularGeometry}`;
    if (!labels.includes(label)) labels.push(label);
  }
  if (labels.length === 0) return undefined;
  const geometries = new Set(analysis.centres.map((centre) => centre.molecularGeometry));
  return geometries.size === 1 ? analysis.centres[0].molecularGeometry : labels.join(", ");
}
