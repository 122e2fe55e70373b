/**
 * Model bond lengths: the sum of the two single-bond covalent radii, shortened for multiple
 * bonds. The factors are round values that land within a few hundredths of an ångström of
 * typical C=C, C=O, C≡C and C≡N lengths; they are a model, not a fit.
 */
import { elementBySymbol } from "../elements";

/** Bond order used for the ring bonds of a benzene-like ring (alternating single and double). */
export const AROMATIC_BOND_ORDER = 1.5;

/** Length factor by bond order: single 1, double 0.87, triple 0.78; in between interpolated. */
const FACTOR_BY_ORDER: readonly (readonly [number, number])[] = [
  [1, 1],
  [2, 0.87],
  [3, 0.78],
];

/** Radius used for a symbol the element table does not know, in picometres (about carbon). */
const FALLBACK_RADIUS_PM = 75;

/** Shortening factor for a bond order (1, 1.5, 2, 3); orders outside 1-3 are clamped. */
export function bondOrderFactor(order: number): number {
  const clamped = Math.min(3, Math.max(1, order));
  for (let k = 1; k < FACTOR_BY_ORDER.length; k++) {
    const [lowOrder, lowFactor] = FACTOR_BY_ORDER[k - 1];
    const [highOrder, highFactor] = FACTOR_BY_ORDER[k];
    if (clamped <= highOrder) {
      return lowFactor + ((clamped - lowOrder) / (highOrder - lowOrder)) * (highFactor - lowFactor);
    }
  }
  return FACTOR_BY_ORDER[FACTOR_BY_ORDER.length - 1][1];
}

/** Single-bond covalent radius of an element in ångströms. */
export function covalentRadiusAngstrom(symbol: string): number {
  return (elementBySymbol(symbol)?.covalentRadius ?? FALLBACK_RADIUS_PM) / 100;
}

/** Model length in ångströms of a bond of the given order between two elements. */
export function modelBondLength(first: string, second: string, order: number): number {
  return (covalentRadiusAngstrom(first) + covalentRadiusAngstrom(second)) * bondOrderFactor(order);
}
