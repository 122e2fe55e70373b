/**
 * Additive names of halo-complex and polyhalide anions read by rule (count prefix, halide ligand,
 * the centre's "-ate" word, optional Stock numeral), the salts and acids named after them, and the
 * name a formula of such a salt is given. Formulas and charges are checked against RDKit.
 */
import { beforeAll, describe, expect, it } from "vitest";
import { analyzeSpecies, readSpecies } from "../../shared/src/index";
import { loadRdkit, rdkitAtoms, rdkitComposition } from "../multicentre/rdkitReference";

const TRANSITION_METAL = "transition-metal-centre";

// from memory: Housecroft & Sharpe, Inorganic Chemistry (ICl2- and I3- linear, ICl4- square
// planar, BF4- and ZnCl4 2- tetrahedral, PF6-, SnCl6 2- and AlF6 3- octahedral; the d-block
// complexes named with their metal's oxidation state)
const ANIONS: readonly (readonly [name: string, formula: string, smiles: string, shape: string])[] = [
  ["dichloroiodate(I)", "ICl2^-", "Cl[I-]Cl", "linear"],
  ["dichloroiodate", "ICl2^-", "Cl[I-]Cl", "linear"],
  ["tetrachloroiodate(III)", "ICl4^-", "Cl[I-](Cl)(Cl)Cl", "square planar"],
  ["dibromoiodate(I)", "IBr2^-", "Br[I-]Br", "linear"],
  ["triiodide", "I3^-", "I[I-]I", "linear"],
  ["tetrafluoroborate", "BF4^-", "F[B-](F)(F)F", "tetrahedral"],
  ["tetrafluoroborate(III)", "BF4^-", "F[B-](F)(F)F", "tetrahedral"],
  ["hexafluorophosphate", "PF6^-", "F[P-](F)(F)(F)(F)F", "octahedral"],
  ["hexafluorophosphate(V)", "PF6^-", "F[P-](F)(F)(F)(F)F", "octahedral"],
  ["hexafluoridophosphate(V)", "PF6^-", "F[P-](F)(F)(F)(F)F", "octahedral"],
  ["hexafluoroaluminate", "AlF6^3-", "F[Al-3](F)(F)(F)(F)F", "octahedral"],
  ["hexachlorostannate(IV)", "SnCl6^2-", "Cl[Sn-2](Cl)(Cl)(Cl)(Cl)Cl", "octahedral"],
  ["tetrachlorozincate", "ZnCl4^2-", "Cl[Zn-2](Cl)(Cl)Cl", "tetrahedral"],
  ["hexachloroplatinate(IV)", "PtCl6^2-", "Cl[Pt-2](Cl)(Cl)(Cl)(Cl)Cl", TRANSITION_METAL],
  ["tetrachloroplatinate(II)", "PtCl4^2-", "Cl[Pt-2](Cl)(Cl)Cl", TRANSITION_METAL],
  ["tetrachloroaurate(III)", "AuCl4^-", "Cl[Au-](Cl)(Cl)Cl", TRANSITION_METAL],
  ["tetrachloroaurate", "AuCl4^-", "Cl[Au-](Cl)(Cl)Cl", TRANSITION_METAL],
  ["tetrachloroferrate(III)", "FeCl4^-", "Cl[Fe-](Cl)(Cl)Cl", TRANSITION_METAL],
];

// common practice: a numeral the centre does not take, or one that leaves no anion, names nothing;
// an "-ate" word that is no element's is left to the other rules
const NOT_HALO_COMPLEXES: readonly string[] = [
  "dichloroiodate(III)",
  "tetrachloroiodate(II)",
  "hexachloroplatinate(VII)",
  "tetrafluoroborate(I)",
  "tetrachloroacetate",
];

// from memory: CRC Handbook of Chemistry and Physics (inorganic compounds: formulas of these salts
// and acids); the trade names are common practice
const SALTS_AND_ACIDS: readonly (readonly [name: string, formula: string, code: string])[] = [
  ["potassium tetrafluoroborate", "KBF4", "ionic-solid"],
  ["potassium dichloroiodate(I)", "KICl2", "ionic-solid"],
  ["caesium tetrachloroiodate(III)", "CsICl4", "ionic-solid"],
  ["ammonium hexafluorophosphate", "NH4PF6", "ionic-solid"],
  ["potassium hexachloroplatinate(IV)", "K2PtCl6", "ionic-solid"],
  ["sodium tetrachloroaurate(III)", "NaAuCl4", "ionic-solid"],
  ["sodium hexafluoroaluminate", "Na3AlF6", "ionic-solid"],
  ["hexachloroplatinic acid", "H2PtCl6", "ions-in-solution"],
  ["hexachloroplatinic(IV) acid", "H2PtCl6", "ions-in-solution"],
  ["tetrachloroauric(III) acid", "HAuCl4", "ions-in-solution"],
  ["chloroplatinic acid", "H2PtCl6", "ions-in-solution"],
  ["chloroauric acid", "HAuCl4", "ions-in-solution"],
  ["fluoroboric acid", "HBF4", "ions-in-solution"],
  ["fluorosilicic acid", "H2SiF6", "ions-in-solution"],
];

function formulaOf(text: string): { formula: string; counts: Map<string, number>; charge: number } {
  const read = readSpecies(text);
  if (!read.ok) throw new Error(`${text} did not read: ${read.problem.message}`);
  const { formula, composition, charge } = read.value;
  return { formula, counts: new Map(composition.map((part) => [part.symbol, part.count])), charge };
}

function shapeOrCode(text: string): string {
  const result = analyzeSpecies(text);
  return result.ok ? result.value.centres[0].molecularGeometry : result.problem.code;
}

describe("halo-complex anion names read by rule", () => {
  it.each(ANIONS)("%s is %s", (name, formula, _smiles, shape) => {
    expect(formulaOf(name).formula).toBe(formula);
    expect(shapeOrCode(name)).toBe(shape);
  });

  it.each(NOT_HALO_COMPLEXES)("%s is not read as a halo complex", (name) => {
    const result = analyzeSpecies(name);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.problem.code).toBe("unknown-name");
  });
});

describe("salts and acids named after them", () => {
  it.each(SALTS_AND_ACIDS)("%s is %s (%s)", (name, formula, code) => {
    const result = analyzeSpecies(name);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.reading?.formula).toBe(formula);
    expect(result.problem.code, result.problem.message).toBe(code);
    expect(result.parts?.some((part) => part.role === "anion" && !part.monatomic)).toBe(true);
  });

  // common practice: the additive name, with the numeral only where the bare name reads another charge
  it.each([
    ["Na3AlF6", "sodium hexafluoroaluminate"],
    ["KICl2", "potassium dichloroiodate"],
    ["K2PtCl6", "potassium hexachloroplatinate(IV)"],
    ["K2SnCl6", "potassium hexachlorostannate"],
    ["K2PtCl4", "potassium tetrachloroplatinate(II)"],
  ])("the formula %s is named %s", (formula, name) => {
    const result = analyzeSpecies(formula);
    expect(result.ok ? result.value.reading.name : result.reading?.name).toBe(name);
  });
});

describe("anion formulas and charges agree with RDKit", () => {
  beforeAll(async () => {
    await loadRdkit();
  });

  // source: RDKit (WebAssembly build), element counts and formal charges of each anion's SMILES
  it.each(ANIONS)("%s", (name, _formula, smiles) => {
    const atoms = rdkitAtoms(smiles);
    const read = formulaOf(name);
    expect(read.counts).toEqual(rdkitComposition(atoms));
    expect(read.charge).toBe(atoms.reduce((sum, atom) => sum + atom.formalCharge, 0));
  });
});
