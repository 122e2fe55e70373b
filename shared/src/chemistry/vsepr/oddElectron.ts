/**
 * Whether an atom's odd electron takes a site of its own (a weak domain that bends or puckers
 * the atom) or sits in the p orbital its bonds leave over, and why: the hover and the command
 * line explain the shape with the same reason the shape was built from.
 */
import { graphIndex } from "../graphIndex";
import { atomTraits } from "../lewis/electronBookkeeping";
import type { MolecularGraph } from "../types";

/**
 * Where the odd electron of an atom sits:
 * - `beside-lone-pairs`: with lone pairs on the same atom, in an orbital with s character (NO2, ClO2);
 * - `two-neighbours`: two bonds and no lone pair leave an sp2-like orbital for it (HCO, BH2);
 * - `electronegative-neighbours`: three neighbours that pull harder than the atom take p
 *   character into their bonds and leave s character for the electron (CF3, CCl3, SiH3);
 * - `p-orbital`: three bonds leave a p orbital free and the electron sits there (CH3), or the
 *   electron joins a neighbouring pi system (allyl, benzyl), so it takes no site.
 */
export type OddElectronSite = "beside-lone-pairs" | "two-neighbours" | "electronegative-neighbours" | "p-orbital";

/** How much more electronegative (Pauling) a neighbour must be to pull the odd electron's orbital toward s. */
const PULLING_DIFFERENCE = 0.25;

/** Undefined when the atom has no odd electron or fewer than two neighbours. */
export function oddElectronSite(graph: MolecularGraph, index: number): OddElectronSite | undefined {
  const atom = graph.atoms[index];
  if (atom.unpairedElectrons === 0) return undefined;
  const { neighbours, bondOrderSums } = graphIndex(graph);
  const own = neighbours[index];
  if (own.length < 2) return undefined;
  if (atom.lonePairs > 0) return "beside-lone-pairs";
  if (own.length === 2) return "two-neighbours";
  if (own.length !== 3 || own.some((n) => n.order > 1)) return "p-orbital";
  // Beside a multiple bond or an aromatic ring the electron spreads over the pi system, which
  // keeps the atom flat whatever its neighbours.
  for (const { atom: other } of own) {
    if (graph.atoms[other].aromatic === true || bondOrderSums[other] > neighbours[other].length) return "p-orbital";
  }
  const centre = atomTraits(atom.symbol);
  let pulling = 0;
  for (const neighbour of own) if (neighbour.electronegativity - centre.electronegativity >= PULLING_DIFFERENCE) pulling++;
  return pulling >= 2 ? "electronegative-neighbours" : "p-orbital";
}

/** Whether the odd electron counts as a domain in the steric number. */
export function oddElectronTakesSite(site: OddElectronSite | undefined): boolean {
  return site !== undefined && site !== "p-orbital";
}
