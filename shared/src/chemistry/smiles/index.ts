/** SMILES reading and writing for the chemistry core. */
export type { SmilesAtom, SmilesBond, SmilesMolecule, SmilesResult } from "./types";
export { parseSmiles } from "./parseSmiles";
export { kekulize } from "./kekulize";
export { writeSmiles } from "./writeSmiles";
export { smilesFormula, smilesNetCharge } from "./smilesFormula";
