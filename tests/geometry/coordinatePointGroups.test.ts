// The point group of the model coordinates, found by the symmetry search, against the textbook
// point group of each species.
import { describe, expect, it } from "vitest";
import { analyzeSpecies, type MolecularGraph } from "../../shared/src/index";
import { buildCoordinates } from "../../shared/src/chemistry/geometry/buildCoordinates";
import { findPointGroup } from "../../shared/src/chemistry/symmetry/pointGroup";
import { graphFromSmiles } from "./graphFromSmiles";

function pointGroupOf(graph: MolecularGraph, radical = false): string {
  const { atoms } = buildCoordinates(graph, radical);
  const result = findPointGroup(atoms.map((atom) => ({ element: atom.symbol, position: atom.position })));
  if (!result.ok) throw new Error(result.problem.message);
  return result.value.symbol;
}

describe("point groups of analysed species", () => {
  // from memory: character tables of a standard inorganic chemistry text
  it.each([
    ["H2O", "C2v"],
    ["NH3", "C3v"],
    ["CH4", "Td"],
    ["SF6", "Oh"],
    ["XeF4", "D4h"],
    ["PCl5", "D3h"],
    ["SF4", "C2v"],
    ["ClF3", "C2v"],
    ["BrF5", "C4v"],
    ["XeF2", "D∞h"],
    ["CO2", "D∞h"],
    ["HCN", "C∞v"],
    ["BF3", "D3h"],
    ["IF7", "D5h"],
    ["NH4+", "Td"],
    ["I3-", "D∞h"],
    ["CH2Cl2", "C2v"],
    ["POCl3", "C3v"],
    ["XeOF4", "C4v"],
    ["ICl4-", "D4h"],
    // Resonance forms averaged: equal bonds to equivalent terminal atoms.
    ["SO4^2-", "Td"],
    ["NO3-", "D3h"],
    ["CO3^2-", "D3h"],
    ["O3", "C2v"],
    ["SO2", "C2v"],
    ["HNO3", "Cs"], // planar: the O-H joins the nitrate π system
    // Skew forms: staggered, lone pairs gauche to each other (H-N-N-H and H-O-O-H near 60°).
    ["N2H4", "C2"],
    ["H2O2", "C2"],
    ["CH3OH", "Cs"], // staggered
  ])("%s is %s", (text, expected) => {
    const result = analyzeSpecies(text);
    if (!result.ok) throw new Error(result.problem.message);
    expect(pointGroupOf(result.value.graph, result.value.radical)).toBe(expected);
  });
});

describe("point groups of multi-centre molecules built from SMILES", () => {
  // from memory: character tables of a standard inorganic chemistry text; ethane staggered,
  // cyclohexane chair, butane and butadiene in their anti / s-trans forms
  it.each([
    ["ethane", "CC", "D3d"],
    ["ethylene", "C=C", "D2h"],
    ["acetylene", "C#C", "D∞h"],
    ["allene", "C=C=C", "D2d"],
    ["benzene", "c1ccccc1", "D6h"],
    ["naphthalene", "c1ccc2ccccc2c1", "D2h"],
    ["pyridine", "c1ccncc1", "C2v"],
    ["cyclohexane (chair)", "C1CCCCC1", "D3d"],
    ["cyclopropane", "C1CC1", "D3h"],
    ["anti-butane", "CCCC", "C2h"],
    ["s-trans-butadiene", "C=CC=C", "C2h"],
    ["trans-diazene", "N=N", "C2h"],
    ["formaldehyde", "C=O", "C2v"],
    ["acetic acid", "CC(=O)O", "Cs"],
  ])("%s (%s) is %s", (_name, smiles, expected) => {
    expect(pointGroupOf(graphFromSmiles(smiles))).toBe(expected);
  });
});
