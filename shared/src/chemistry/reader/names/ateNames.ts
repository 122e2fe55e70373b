/**
 * The "-ate" word an element takes as the centre of a complex anion ("borate", "platinate",
 * "iodate"): its name shortened by rule, or the Latin root chemists use (ferrate, aurate, stannate).
 */
import { ELEMENTS, elementBySymbol } from "../../elements";

// common practice: the Latin and other roots of anion names that the English name does not give
const ROOTS: ReadonlyMap<string, string> = new Map([
  ["Fe", "ferr"],
  ["Cu", "cupr"],
  ["Ag", "argent"],
  ["Au", "aur"],
  ["Sn", "stann"],
  ["Pb", "plumb"],
  ["Mo", "molybd"],
  ["W", "tungst"],
  ["P", "phosph"],
  ["S", "sulf"],
]);

/** Name endings dropped before "-ate": platinum, iodine, boron, arsenic, manganese, mercury. */
const DROPPED_ENDINGS: readonly string[] = ["ium", "um", "ine", "on", "ic", "ese", "y"];

/** The element's "-ate" word: "B" -> "borate", "Pt" -> "platinate", "Au" -> "aurate"; undefined for an unknown symbol. */
export function ateNameOf(symbol: string): string | undefined {
  const root = ROOTS.get(symbol);
  if (root !== undefined) return `${root}ate`;
  const name = elementBySymbol(symbol)?.name.toLowerCase();
  if (name === undefined) return undefined;
  const ending = DROPPED_ENDINGS.find((candidate) => name.endsWith(candidate) && name.length > candidate.length + 2);
  return `${ending === undefined ? name : name.slice(0, -ending.length)}ate`;
}

let bySymbolAte: ReadonlyMap<string, string> | undefined;

/** The element whose "-ate" word this is ("platinate" -> "Pt"), or undefined. */
export function elementByAteName(word: string): string | undefined {
  if (bySymbolAte === undefined) {
    const index = new Map<string, string>();
    for (const element of ELEMENTS) {
      const ate = ateNameOf(element.symbol);
      if (ate !== undefined && !index.has(ate)) index.set(ate, element.symbol);
    }
    bySymbolAte = index;
  }
  return bySymbolAte.get(word);
}
