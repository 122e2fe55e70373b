/** Nonmetals and metalloids: elements that form covalent molecules rather than simple cations. */
export const NONMETALS: ReadonlySet<string> = new Set([
  "H", "He", "B", "C", "N", "O", "F", "Ne", "Si", "P", "S", "Cl", "Ar",
  "Ge", "As", "Se", "Br", "Kr", "Sb", "Te", "I", "Xe", "At", "Rn",
]);
