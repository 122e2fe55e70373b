/**
 * A species cell that names a mixture: a gas store's balance-gas cylinders ("N2/Ar", "5% H2 in
 * N2", "CO 1000 ppm in air", "Ar/CO2 80/20") and reagents sold in a solvent ("4 M HCl in
 * dioxane"). Each component is a species of its own, found where it is written; the row names no
 * single species, so no other cell of it is checked.
 *
 * A cell counts as a mixture only when every component reads as a species (or is air), so a
 * formula with a stray slash or space ("SF4/", "NH 3") is still reported as written.
 */
import type { SpeciesReader } from "../speciesReader";
import { occurrenceAt } from "../speciesReader";
import type { SpeciesOccurrence } from "../types";

/** A cell's text and its range in the document. */
interface Cell {
  readonly text: string;
  readonly range: { readonly start: number; readonly end: number };
}

/**
 * Between components: a slash (not the one closing an HTML tag, "N<sub>2</sub>"), a plus with
 * spaces around it, the word "in", a comma before a space.
 */
const SEPARATOR = /\s*(?<!<)\/\s*|\s+\+\s+|\s+in\s+|\s*[,;]\s+/gi;
/** A mixing ratio closing the cell: "80/20", "(5/95)", "(80:20)", "79/21 %". */
const TRAILING_RATIO = /\s*\(?\s*\d+(?:[.,]\d+)?(?:\s*[:/]\s*\d+(?:[.,]\d+)?)+\s*%?\s*\)?$/;
// common practice: how gas and reagent labels write an amount (percent, ppm, molarity, mol%, v/v).
// The unit is required: a bare number before a formula is a coefficient ("2 H2 + O2").
const AMOUNT = String.raw`[<>~\u2248\u2264\u2265]?\s*\d+(?:[.,]\d+)?\s*(?:%|ppm|ppb|mol\s*%|vol\s*%|wt\s*%|mol/l|mm|m|n)(?:\s*(?:v/v|w/w|w/v|mol|vol))?`;
/** The balance gas's mark: "bal.", "balance", and German exports' "Rest". */
const BALANCE = String.raw`bal\.?|balance|rest`;
/** What may stand before a component's species: an amount or the balance mark. */
const LEADING = new RegExp(String.raw`^(?:(?:${AMOUNT}|${BALANCE})\s+)`, "i");
/** What may follow it: an amount or the balance mark, or a remark in brackets after a space ("(5%)", "(synthetic air)"). */
const TRAILING = new RegExp(String.raw`(?:\s*\(\s*(?:${AMOUNT}|${BALANCE})\s*\)|\s+\([^()]*\)|\s+(?:${AMOUNT}|${BALANCE}))$`, "i");
/** A balance that is a mixture itself: no species to find there, but no typo either. */
const AIR = /^(?:air|synthetic air|zero air|dry air|luft|synthetische luft)$/i;

/** Grade marks of gases and reagents, as suppliers write them: never a mixture's component. */
// common practice: ultra high purity, high purity, chemically pure, analytical reagent, and so on.
const GRADE = /^(?:UHP|HP|CP|ACS|USP|AR|GR|LR|EP|BP|tech\.?|technical|research|reagent)$/;

const MAX_CELL = 120;

/**
 * The components of a mixture cell as occurrences at their places in the document, or undefined
 * when the cell is not a mixture of species that all read.
 */
export function mixtureComponents(cell: Cell, read: SpeciesReader): readonly SpeciesOccurrence[] | undefined {
  const { text } = cell;
  // Escapes make the written range longer than the value: offsets in the value would not map.
  if (text.length > MAX_CELL || cell.range.end - cell.range.start !== text.length) return undefined;
  const body = text.replace(TRAILING_RATIO, "");
  const pieces: { start: number; end: number }[] = [];
  let from = 0;
  for (const separator of body.matchAll(SEPARATOR)) {
    pieces.push({ start: from, end: separator.index });
    from = separator.index + separator[0].length;
  }
  if (pieces.length === 0) return undefined;
  pieces.push({ start: from, end: body.length });
  const components: SpeciesOccurrence[] = [];
  for (const piece of pieces) {
    const component = speciesPart(body, piece.start, piece.end);
    if (!component) return undefined;
    const written = body.slice(component.start, component.end);
    if (AIR.test(written)) continue;
    // "Argon, UHP": a grade after a comma, not a second gas (UHP would read as U, H and P).
    if (GRADE.test(written)) return undefined;
    const result = read(written);
    if (!result.ok) return undefined;
    components.push(occurrenceAt(result.value, written, cell.range.start + component.start));
  }
  return components.length > 0 ? components : undefined;
}

/** The stretch of `text[start, end)` left once an amount or "balance" around it is taken off. */
function speciesPart(text: string, from: number, end: number): { start: number; end: number } | undefined {
  let start = from;
  let piece = text.slice(start, end);
  const leading = LEADING.exec(piece);
  if (leading) {
    start += leading[0].length;
    piece = piece.slice(leading[0].length);
  }
  const trailing = TRAILING.exec(piece);
  if (trailing) piece = piece.slice(0, piece.length - trailing[0].length);
  const trimmedStart = piece.length - piece.trimStart().length;
  const trimmed = piece.trim();
  if (trimmed.length === 0) return undefined;
  return { start: start + trimmedStart, end: start + trimmedStart + trimmed.length };
}
