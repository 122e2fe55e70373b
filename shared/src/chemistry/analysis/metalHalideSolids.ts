/**
 * A metal halide that is analysed as a molecule (BeCl2, ZnCl2, PbCl2, AlCl3, TlCl) is the molecule
 * of the gas. At room temperature it is a solid in which the metal, with so few neighbours in the
 * molecule, takes more by sharing halide ions with the next metal, so the card says the shape is
 * not that of the solid. The plainly ionic salts (NaCl, CdCl2, FeCl2) never come here: they are
 * read as their ions before anything is drawn as a molecule.
 */
import { graphIndex } from "../graphIndex";
import type { MolecularGraph, SpeciesReading } from "../types";
import { metalIonCharges } from "./metalIonCharges";

const HALOGENS = new Set(["F", "Cl", "Br", "I"]);

/**
 * Metals whose halides of this kind are molecular crystals of the same molecules: mercury(II)
 * chloride and bromide are linear HgX2 molecules in the solid too.
 */
// from memory: Greenwood & Earnshaw, Chemistry of the Elements (HgCl2 and HgBr2 crystals are made of linear molecules)
const MOLECULAR_SOLID_METALS = new Set(["Hg"]);

/** The note for a metal halide drawn as its gas-phase molecule, or undefined. */
export function gasMoleculeOfSolidNote(reading: SpeciesReading, graph: MolecularGraph): string | undefined {
  if (reading.charge !== 0 || reading.state === "g" || reading.state === "aq") return undefined;
  let metal = -1;
  let halogens = 0;
  for (let index = 0; index < graph.atoms.length; index++) {
    const symbol = graph.atoms[index].symbol;
    if (HALOGENS.has(symbol)) halogens++;
    else if (metal < 0 && metalIonCharges(symbol).length > 0) metal = index;
    else return undefined;
  }
  if (metal < 0 || halogens === 0) return undefined;
  const atom = graph.atoms[metal];
  if (MOLECULAR_SOLID_METALS.has(atom.symbol) || !metalIonCharges(atom.symbol).includes(halogens)) return undefined;
  // Four or more domains (BiCl3, SnCl4) fill the metal's shell in the molecule, which then stays
  // a molecule in the solid or liquid; fewer leave room to take shared halide ions.
  const domains = graphIndex(graph).neighbours[metal].length + atom.lonePairs;
  if (domains > 3) return undefined;
  return (
    `At room temperature ${reading.formula} is a solid that is not made of separate molecules: each ${atom.symbol} ` +
    "takes more neighbours by sharing halide ions with the next (in chains, layers, pairs or an ionic lattice). " +
    "The shape given is that of the molecule in the gas."
  );
}
