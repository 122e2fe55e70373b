import type { SmilesMolecule } from "./types";

/** Net charge of a molecule: the sum of its atoms' formal charges. */
export function smilesNetCharge(value: SmilesMolecule): number {
  let charge = 0;
  for (const atom of value.atoms) charge += atom.charge;
  return charge;
}

/**
 * Molecular formula in Hill order: C then H then the other elements alphabetically when there
 * is carbon, all elements alphabetically when there is none. Hydrogens on atoms and hydrogen
 * atoms written as [H] both count; isotopes count as their element. A net charge follows as
 * "+", "-", or sign and size ("+2", "-3"): "C2H6O", "C5H5N", "NO3-", "Fe+2".
 */
export function smilesFormula(value: SmilesMolecule): string {
  const counts = new Map<string, number>();
  let hydrogens = 0;
  for (const atom of value.atoms) {
    hydrogens += atom.hydrogens;
    if (atom.symbol === "H") hydrogens++;
    else counts.set(atom.symbol, (counts.get(atom.symbol) ?? 0) + 1);
  }
  const carbon = counts.get("C") ?? 0;
  const parts: string[] = [];
  const write = (symbol: string, count: number): void => {
    if (count > 0) parts.push(count === 1 ? symbol : `${symbol}${count}`);
  };
  if (carbon > 0) {
    write("C", carbon);
    write("H", hydrogens);
    counts.delete("C");
  } else if (hydrogens > 0) {
    counts.set("H", hydrogens);
  }
  for (const symbol of [...counts.keys()].sort()) write(symbol, counts.get(symbol)!);
  const charge = smilesNetCharge(value);
  if (charge !== 0) {
    const sign = charge > 0 ? "+" : "-";
    parts.push(Math.abs(charge) === 1 ? sign : `${sign}${Math.abs(charge)}`);
  }
  return parts.join("");
}
