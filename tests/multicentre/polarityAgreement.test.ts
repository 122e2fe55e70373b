import { describe, expect, it } from "vitest";
import { analyzeSmiles, analyzeSpecies, pointGroupAllowsDipole, shapeOf } from "../../shared/src/index";

// Two independent derivations of polarity must agree: the bond-dipole vector sum (with lone
// pairs) and the point group found in the 3D model (common practice: a molecule can carry a
// permanent dipole only in C1, Cs, Cn, Cnv or C∞v).
const FORMULAS = [
  "H2O",
  "NH3",
  "CH4",
  "SF4",
  "SF6",
  "XeF2",
  "XeF4",
  "XeF6",
  "PCl5",
  "PCl3F2",
  "PCl2F3",
  "ClF3",
  "BrF5",
  "IF7",
  "BF3",
  "BeCl2",
  "CO2",
  "HCN",
  "N2O",
  "O3",
  "SO2",
  "SO3",
  "NO2",
  "ClO2",
  "Cl2O",
  "OF2",
  "CH2Cl2",
  "CHCl3",
  "CCl4",
  "CH3Cl",
  "NF3",
  "PH3",
  "H2S",
  "SOCl2",
  "POCl3",
  "SO2Cl2",
  "COCl2",
  "XeOF4",
  "XeO2F2",
  "XeO3",
  "XeO4",
  "I3-",
  "N3-",
  "NH4+",
  "H3O+",
  "SO4^2-",
  "NO3-",
  "CO3^2-",
  "ICl4-",
  "SF5-",
  "XeF5-",
  "H2SO4",
  "HNO3",
  "H2O2",
  "N2H4",
  "CH3OH",
  "HOCl",
  "CH3COOH",
  "CH3CH2OH",
  "CH3OCH3",
  "(CH3)2CO",
  "C(CH3)4",
  "CH2=CH2",
  "HC≡CH",
  "CH3CN",
];
const SMILES = [
  "c1ccccc1",
  "Clc1ccc(Cl)cc1",
  "Clc1ccccc1Cl",
  "C=C=C",
  "CC#CC",
  "N#CC#N",
  "C1CCCCC1",
  "c1ccncc1",
  "c1cc[nH]c1",
  "c1ccoc1",
  "CC(=O)N",
  "OC(=O)C(=O)O",
  "FC(F)(F)F",
  "ClC(Cl)=C(Cl)Cl",
  "Cl/C=C/Cl",
];

function check(analysis: ReturnType<typeof analyzeSpecies>, label: string) {
  expect(analysis.ok, label).toBe(true);
  if (!analysis.ok) return;
  const group = shapeOf(analysis.value).pointGroup;
  expect(group, `${label}: no point group`).toBeDefined();
  expect(analysis.value.polarity.polar, `${label}: point group ${group}, polarity "${analysis.value.polarity.reason}"`).toBe(
    pointGroupAllowsDipole(group!),
  );
  // The model's summed bond dipoles (lone pairs included) vanish exactly when symmetry forbids a dipole.
  expect(analysis.value.polarity.dipoleEstimate > 0.01, `${label}: dipole estimate ${analysis.value.polarity.dipoleEstimate}`).toBe(
    pointGroupAllowsDipole(group!),
  );
}

describe("polarity from bond dipoles agrees with the point group", () => {
  it.each(FORMULAS)("%s", (formula) => check(analyzeSpecies(formula), formula));
  it.each(SMILES)("SMILES %s", (smiles) => check(analyzeSmiles(smiles), smiles));
});
