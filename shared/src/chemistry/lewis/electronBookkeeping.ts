/**
 * Per-element facts the Lewis search needs, looked up once per element symbol.
 */
import { elementBySymbol } from "../elements";
import type { ElementData } from "../types";

export interface AtomTraits {
  readonly element: ElementData;
  readonly valenceElectrons: number;
  readonly electronegativity: number;
  /** Most electrons the atom's valence shell may hold: 2 for H, 8 in period 2, more from period 3 on. */
  readonly shellCapacity: number;
  /** Whether the atom should reach a full octet (duet for H); B, Be, Al and friends may stay short. */
  readonly mustCompleteShell: boolean;
  /** Full shell: 2 for H and He, 8 otherwise. */
  readonly fullShell: number;
  readonly isHydrogen: boolean;
  readonly isHalogen: boolean;
}

// Bound: one entry per element symbol.
const cache = new Map<string, AtomTraits>();

/** Traits for an element symbol the reader has already validated. */
export function atomTraits(symbol: string): AtomTraits {
  const cached = cache.get(symbol);
  if (cached) return cached;
  const element = elementBySymbol(symbol);
  if (!element) throw new Error(`unknown element ${symbol}`);
  const isHydrogen = element.atomicNumber === 1;
  const fullShell = element.period === 1 ? 2 : 8;
  // Groups 1, 2, 12 and 13 have too few electrons to fill an octet with covalent bonds alone.
  const mayStayShort = [1, 2, 12, 13].includes(element.group) && !isHydrogen;
  const traits: AtomTraits = {
    element,
    valenceElectrons: element.valenceElectrons,
    // Noble gases without a tabulated value sit above fluorine in practice; use a high number.
    electronegativity: element.electronegativity ?? 4.5,
    shellCapacity: element.period <= 1 ? 2 : element.period === 2 ? 8 : 18,
    mustCompleteShell: !mayStayShort,
    fullShell,
    isHydrogen,
    isHalogen: element.group === 17,
  };
  cache.set(symbol, traits);
  return traits;
}
