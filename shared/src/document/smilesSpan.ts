/**
 * SMILES in documents: an inline code span marked `smiles:` (`` `smiles:C1=CC=CC=C1` ``). The span
 * becomes an occurrence whose reading has notation "smiles" and the composition the SMILES spells.
 */
import { SMILES_MARKER } from "../chemistry/analyze";
import type { FormulaPart, SpeciesReading } from "../chemistry/types";
import { parseSmiles } from "../chemistry/smiles/parseSmiles";
import type { SmilesMolecule } from "../chemistry/smiles/types";
import type { SpeciesOccurrence, UnreadableSpecies } from "./types";

const PREFIX = SMILES_MARKER;

/** Longer code spans are not one species typed into a note. */
const MAX_SMILES = 1000;

/**
 * The occurrence for the code span content `text[start, end)` when it is marked `smiles:`, or an
 * unreadable mention when the SMILES does not parse; undefined for any other code span.
 */
export function smilesOccurrence(text: string, start: number, end: number): SpeciesOccurrence | UnreadableSpecies | undefined {
  if (!text.startsWith(PREFIX, start)) return undefined;
  let smilesStart = start + PREFIX.length;
  let smilesEnd = end;
  while (smilesStart < smilesEnd && text.charCodeAt(smilesStart) === 0x20) smilesStart++;
  while (smilesEnd > smilesStart && text.charCodeAt(smilesEnd - 1) === 0x20) smilesEnd--;
  return smilesAt(text, smilesStart, smilesEnd);
}

/**
 * The SMILES `text[start, end)` (already trimmed, without any marker) as an occurrence, or as an
 * unreadable mention when it does not parse; undefined when empty or too long for one species.
 */
export function smilesAt(text: string, smilesStart: number, smilesEnd: number): SpeciesOccurrence | UnreadableSpecies | undefined {
  if (smilesEnd === smilesStart || smilesEnd - smilesStart > MAX_SMILES) return undefined;
  const smiles = text.slice(smilesStart, smilesEnd);
  const range = { start: smilesStart, end: smilesEnd };
  const parsed = parseSmiles(smiles);
  if (!parsed.ok) {
    const problemRange = parsed.problem.range;
    const problem = problemRange
      ? { ...parsed.problem, range: { start: smilesStart + problemRange.start, end: smilesStart + problemRange.end } }
      : parsed.problem;
    return { range, text: smiles, problem };
  }
  return { range, text: smiles, reading: readingOf(parsed.value, smiles, range) };
}

/** Composition in first-appearance order, hydrogens after the atom that carries them. */
function readingOf(molecule: SmilesMolecule, smiles: string, range: { start: number; end: number }): SpeciesReading {
  const counts = new Map<string, number>();
  const add = (symbol: string, count: number): void => {
    if (count > 0) counts.set(symbol, (counts.get(symbol) ?? 0) + count);
  };
  let charge = 0;
  for (const atom of molecule.atoms) {
    add(atom.symbol, 1);
    add("H", atom.hydrogens);
    charge += atom.charge;
  }
  const composition: FormulaPart[] = [...counts].map(([symbol, count]) => ({ symbol, count }));
  return {
    text: smiles,
    range,
    notation: "smiles",
    composition,
    writtenSequence: composition,
    charge,
    formula: formulaText(composition, charge),
  };
}

/** "SO4^2-" style, as every other reading writes its formula. */
function formulaText(composition: readonly FormulaPart[], charge: number): string {
  const body = composition.map((part) => (part.count === 1 ? part.symbol : `${part.symbol}${part.count}`)).join("");
  if (charge === 0) return body;
  const size = Math.abs(charge) === 1 ? "" : String(Math.abs(charge));
  return `${body}^${size}${charge > 0 ? "+" : "-"}`;
}

/** Tells a found SMILES occurrence from an unreadable one. */
export function isOccurrence(found: SpeciesOccurrence | UnreadableSpecies): found is SpeciesOccurrence {
  return "reading" in found;
}
