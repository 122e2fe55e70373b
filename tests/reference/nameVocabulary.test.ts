/**
 * The one vocabulary of species names against outside references: every listed name and synonym
 * has a molecular formula written here from a named source, the structure the vocabulary stores
 * must have that formula (a SMILES through RDKit, a formula through the reader), and rule-built
 * names (salts, Stock and -ous/-ic names, substitutive organic names) give the expected formula.
 */
import { beforeAll, describe, expect, it } from "vitest";
import { analyzeSpecies, knownSpeciesNames, readSpecies } from "../../shared/src/index";
import type { SpeciesReading } from "../../shared/src/index";
import { loadRdkit, rdkitAtoms, rdkitComposition } from "../multicentre/rdkitReference";

type Row = readonly [name: string, formula: string, charge?: number];

// from memory: standard tables of inorganic molecules and acids (CRC Handbook of Chemistry and Physics)
const INORGANIC: readonly Row[] = [
  ["water", "H2O"],
  ["ammonia", "NH3"],
  ["ozone", "O3"],
  ["hydrogen", "H2"],
  ["nitrogen", "N2"],
  ["oxygen", "O2"],
  ["fluorine", "F2"],
  ["chlorine", "Cl2"],
  ["bromine", "Br2"],
  ["iodine", "I2"],
  ["white phosphorus", "P4"],
  ["nitrous oxide", "N2O"],
  ["nitric oxide", "NO"],
  ["hydrogen peroxide", "H2O2"],
  ["hydrazine", "N2H4"],
  ["hydroxylamine", "NH3O"],
  ["hydrogen cyanide", "HCN"],
  ["hydrogen azide", "HN3"],
  ["hydrazoic acid", "HN3"],
  ["phosphine", "PH3"],
  ["arsine", "AsH3"],
  ["stibine", "SbH3"],
  ["bismuthine", "BiH3"],
  ["silane", "SiH4"],
  ["germane", "GeH4"],
  ["borane", "BH3"],
  ["diborane", "B2H6"],
  ["hydrogen fluoride", "HF"],
  ["hydrogen chloride", "HCl"],
  ["hydrogen bromide", "HBr"],
  ["hydrogen iodide", "HI"],
  ["hydrogen sulfide", "H2S"],
  ["hydrofluoric acid", "HF"],
  ["hydrochloric acid", "HCl"],
  ["muriatic acid", "HCl"],
  ["fluoroboric acid", "HBF4"],
  ["fluorosilicic acid", "H2SiF6"],
  ["chloroauric acid", "HAuCl4"],
  ["chloroplatinic acid", "H2PtCl6"],
  ["hydrobromic acid", "HBr"],
  ["hydroiodic acid", "HI"],
  ["sulfuric acid", "H2SO4"],
  ["sulfurous acid", "H2SO3"],
  ["nitric acid", "HNO3"],
  ["nitrous acid", "HNO2"],
  ["phosphoric acid", "H3PO4"],
  ["orthophosphoric acid", "H3PO4"],
  ["carbonic acid", "H2CO3"],
  ["perchloric acid", "HClO4"],
  ["chloric acid", "HClO3"],
  ["hypochlorous acid", "HClO"],
  ["boric acid", "H3BO3"],
  ["chromic acid", "H2CrO4"],
  ["phosgene", "CCl2O"],
  ["thionyl chloride", "SOCl2"],
  ["sulfuryl chloride", "SO2Cl2"],
  ["nitrosyl chloride", "NOCl"],
  ["nitrosyl fluoride", "NOF"],
  ["nitryl chloride", "NO2Cl"],
  ["nitryl fluoride", "NO2F"],
  ["phosphoryl chloride", "POCl3"],
  ["phosphorus oxychloride", "POCl3"],
  ["carbonyl chloride", "CCl2O"],
  ["carbonyl fluoride", "CF2O"],
  ["carbonyl sulfide", "COS"],
  ["thiazyl fluoride", "NSF"],
  ["xenon oxytetrafluoride", "XeOF4"],
  ["xenon dioxydifluoride", "XeO2F2"],
];

// from memory: everyday and trade names of laboratory salts and oxides (school chemical inventories)
const TRADE_NAMES: readonly Row[] = [
  ["table salt", "NaCl"],
  ["baking soda", "NaHCO3"],
  ["washing soda", "Na2CO13H20"],
  ["caustic soda", "NaOH"],
  ["caustic potash", "KOH"],
  ["quicklime", "CaO"],
  ["slaked lime", "CaO2H2"],
  ["milk of magnesia", "MgO2H2"],
  ["epsom salt", "MgSO11H14"],
  ["epsom salts", "MgSO11H14"],
  ["silica", "SiO2"],
  ["alumina", "Al2O3"],
  ["laughing gas", "N2O"],
  ["mohr's salt", "N2H20FeS2O14"],
  ["ferrous ammonium sulfate", "N2H8FeS2O8"],
  ["disodium phosphate", "Na2HPO4"],
  ["dipotassium phosphate", "K2HPO4"],
  ["monosodium phosphate", "NaH2PO4"],
  ["monopotassium phosphate", "KH2PO4"],
  ["red lead", "Pb3O4"],
  ["magnetite", "Fe3O4"],
  ["alum", "KAlS2O20H24"],
  ["potassium alum", "KAlS2O20H24"],
  ["chrome alum", "KCrS2O20H24"],
  ["borax", "Na2B4O17H20"],
  ["gypsum", "CaSO6H4"],
  ["sulfurous anhydride", "SO2"],
  ["calcium carbide", "CaC2"],
  ["lithium aluminium hydride", "LiAlH4"],
  ["lithium aluminum hydride", "LiAlH4"],
];

// from memory: mineral names and their formulas (a mineralogy handbook)
const MINERALS: readonly Row[] = [
  ["calcite", "CaCO3"],
  ["halite", "NaCl"],
  ["pyrite", "FeS2"],
  ["sphalerite", "ZnS"],
  ["galena", "PbS"],
];

// from memory: Greenwood & Earnshaw, Chemistry of the Elements (quartz is SiO2; diamond and
// graphite are carbon)
const NETWORK_SOLIDS: readonly Row[] = [
  ["quartz", "SiO2"],
  ["diamond", "C"],
  ["graphite", "C"],
];

// from memory: CRC Handbook of Chemistry and Physics, physical constants of organic compounds
const ORGANIC: readonly Row[] = [
  ["methane", "CH4"],
  ["ethane", "C2H6"],
  ["propane", "C3H8"],
  ["butane", "C4H10"],
  ["ethene", "C2H4"],
  ["ethylene", "C2H4"],
  ["ethyne", "C2H2"],
  ["acetylene", "C2H2"],
  ["methanol", "CH4O"],
  ["ethanol", "C2H6O"],
  ["methyl alcohol", "CH4O"],
  ["ethyl alcohol", "C2H6O"],
  ["dimethyl ether", "C2H6O"],
  ["formaldehyde", "CH2O"],
  ["methanal", "CH2O"],
  ["acetaldehyde", "C2H4O"],
  ["ethanal", "C2H4O"],
  ["acetone", "C3H6O"],
  ["propanone", "C3H6O"],
  ["dimethyl ketone", "C3H6O"],
  ["formic acid", "CH2O2"],
  ["methanoic acid", "CH2O2"],
  ["acetic acid", "C2H4O2"],
  ["ethanoic acid", "C2H4O2"],
  ["acetonitrile", "C2H3N"],
  ["ethanenitrile", "C2H3N"],
  ["methylamine", "CH5N"],
  ["urea", "CH4N2O"],
  ["glycine", "C2H5NO2"],
  ["alanine", "C3H7NO2"],
  ["dimethyl sulfoxide", "C2H6OS"],
  ["methyl sulfoxide", "C2H6OS"],
  ["chloroform", "CHCl3"],
  ["trichloromethane", "CHCl3"],
  ["dichloromethane", "CH2Cl2"],
  ["methylene chloride", "CH2Cl2"],
  ["benzene", "C6H6"],
  ["toluene", "C7H8"],
  ["methylbenzene", "C7H8"],
  ["phenol", "C6H6O"],
  ["hydroxybenzene", "C6H6O"],
  ["aniline", "C6H7N"],
  ["aminobenzene", "C6H7N"],
  ["benzenamine", "C6H7N"],
  ["benzoic acid", "C7H6O2"],
  ["benzaldehyde", "C7H6O"],
  ["nitrobenzene", "C6H5NO2"],
  ["anisole", "C7H8O"],
  ["styrene", "C8H8"],
  ["naphthalene", "C10H8"],
  ["pyridine", "C5H5N"],
  ["salicylic acid", "C7H6O3"],
  ["acetylsalicylic acid", "C9H8O4"],
  ["aspirin", "C9H8O4"],
  ["phenolphthalein", "C20H14O4"],
  ["caffeine", "C8H10N4O2"],
  ["cyclohexane", "C6H12"],
  ["tetrahydrofuran", "C4H8O"],
  ["dioxane", "C4H8O2"],
  ["1,4-dioxane", "C4H8O2"],
  ["glucose", "C6H12O6"],
  ["dextrose", "C6H12O6"],
  ["sucrose", "C12H22O11"],
  ["citric acid", "C6H8O7"],
  ["ascorbic acid", "C6H8O6"],
  ["tartaric acid", "C4H6O6"],
  ["oxalic acid", "C2H2O4"],
  ["lactic acid", "C3H6O3"],
  ["trifluoroacetic acid", "C2HF3O2"],
  ["trichloroacetic acid", "C2HCl3O2"],
  ["acetic anhydride", "C4H6O3"],
  ["acetyl chloride", "C2H3ClO"],
  ["ethylenediaminetetraacetic acid", "C10H16N2O8"],
  ["edta", "C10H16N2O8"],
  ["glycerol", "C3H8O3"],
  ["glycerin", "C3H8O3"],
  ["glycerine", "C3H8O3"],
  ["propane-1,2,3-triol", "C3H8O3"],
  ["ethylene glycol", "C2H6O2"],
  ["ethane-1,2-diol", "C2H6O2"],
  ["propylene glycol", "C3H8O2"],
  ["isopropanol", "C3H8O"],
  ["isopropyl alcohol", "C3H8O"],
  ["2-propanol", "C3H8O"],
  ["propan-2-ol", "C3H8O"],
  ["n-propanol", "C3H8O"],
  ["n-butanol", "C4H10O"],
  ["tert-butanol", "C4H10O"],
  ["tert-butyl alcohol", "C4H10O"],
  ["diethyl ether", "C4H10O"],
  ["ether", "C4H10O"],
  ["ethyl ether", "C4H10O"],
  ["methyl tert-butyl ether", "C5H12O"],
  ["triethylamine", "C6H15N"],
  ["ethylenediamine", "C2H8N2"],
  ["ethanolamine", "C2H7NO"],
  ["dimethylformamide", "C3H7NO"],
  ["n,n-dimethylformamide", "C3H7NO"],
  ["acetamide", "C2H5NO"],
  ["formamide", "CH3NO"],
  ["isobutane", "C4H10"],
  ["2-methylpropane", "C4H10"],
  ["isopentane", "C5H12"],
  ["2-methylbutane", "C5H12"],
  ["neopentane", "C5H12"],
  ["2,2-dimethylpropane", "C5H12"],
  ["isooctane", "C8H18"],
  ["2,2,4-trimethylpentane", "C8H18"],
  ["hexanes", "C6H14"],
  ["malonic acid", "C3H4O4"],
  ["succinic acid", "C4H6O4"],
  ["malic acid", "C4H6O5"],
  ["salicylate", "C7H5O3", -1],
  ["methyl orange", "C14H14N3NaO3S"],
  ["potassium hydrogen phthalate", "C8H5KO4"],
];

// from memory: standard tables of common polyatomic ions (general chemistry nomenclature)
const IONS: readonly Row[] = [
  ["ammonium", "NH4", 1],
  ["hydronium", "H3O", 1],
  ["oxonium", "H3O", 1],
  ["nitronium", "NO2", 1],
  ["nitrosonium", "NO", 1],
  ["phosphonium", "PH4", 1],
  ["vanadyl", "VO", 2],
  ["uranyl", "UO2", 2],
  ["hydroxide", "OH", -1],
  ["cyanide", "CN", -1],
  ["cyanate", "OCN", -1],
  ["thiocyanate", "SCN", -1],
  ["azide", "N3", -1],
  ["triiodide", "I3", -1],
  ["amide", "NH2", -1],
  ["nitrate", "NO3", -1],
  ["nitrite", "NO2", -1],
  ["sulfate", "SO4", -2],
  ["sulphate", "SO4", -2],
  ["sulfite", "SO3", -2],
  ["sulphite", "SO3", -2],
  ["hydrogen sulfate", "HSO4", -1],
  ["bisulfate", "HSO4", -1],
  ["hydrogen sulfite", "HSO3", -1],
  ["bisulfite", "HSO3", -1],
  ["thiosulfate", "S2O3", -2],
  ["perchlorate", "ClO4", -1],
  ["chlorate", "ClO3", -1],
  ["chlorite", "ClO2", -1],
  ["hypochlorite", "ClO", -1],
  ["perbromate", "BrO4", -1],
  ["bromate", "BrO3", -1],
  // from memory: Greenwood & Earnshaw, Chemistry of the Elements (halogen oxoanions)
  ["bromite", "BrO2", -1],
  ["hypobromite", "BrO", -1],
  ["periodate", "IO4", -1],
  ["iodate", "IO3", -1],
  ["hypoiodite", "IO", -1],
  ["phosphate", "PO4", -3],
  ["hydrogen phosphate", "HPO4", -2],
  ["dihydrogen phosphate", "H2PO4", -1],
  ["carbonate", "CO3", -2],
  ["hydrogen carbonate", "HCO3", -1],
  ["bicarbonate", "HCO3", -1],
  ["acetate", "C2H3O2", -1],
  ["formate", "CHO2", -1],
  ["oxalate", "C2O4", -2],
  ["peroxide", "O2", -2],
  ["superoxide", "O2", -1],
  ["acetylide", "C2", -2],
  ["borate", "BO3", -3],
  ["tetrafluoroborate", "BF4", -1],
  ["tetrahydroborate", "BH4", -1],
  ["borohydride", "BH4", -1],
  ["tetrahydroaluminate", "AlH4", -1],
  ["hexafluorophosphate", "PF6", -1],
  ["hexafluorosilicate", "SiF6", -2],
  ["hexafluoroantimonate", "SbF6", -1],
  ["tetrachloroaluminate", "AlCl4", -1],
  ["tetrachloroiodate", "ICl4", -1],
  ["arsenate", "AsO4", -3],
  ["selenate", "SeO4", -2],
  ["silicate", "SiO3", -2],
  // from memory: Greenwood & Earnshaw, Chemistry of the Elements (meta- and orthosilicate, metaborate)
  ["metasilicate", "SiO3", -2],
  ["orthosilicate", "SiO4", -4],
  ["metaborate", "BO2", -1],
  ["permanganate", "MnO4", -1],
  ["manganate", "MnO4", -2],
  ["chromate", "CrO4", -2],
  ["dichromate", "Cr2O7", -2],
  ["hydrogensulfate", "HSO4", -1],
  ["hydrogensulfite", "HSO3", -1],
  ["hydrogenphosphate", "HPO4", -2],
  ["dihydrogenphosphate", "H2PO4", -1],
  ["hydrogencarbonate", "HCO3", -1],
  ["hydrogensulfide", "HS", -1],
  ["bisulfide", "HS", -1],
  ["disulfide", "S2", -2],
  ["metabisulfite", "S2O5", -2],
  ["disulfite", "S2O5", -2],
  ["peroxodisulfate", "S2O8", -2],
  ["persulfate", "S2O8", -2],
  ["pyrophosphate", "P2O7", -4],
  ["dithionate", "S2O6", -2],
  ["dithionite", "S2O4", -2],
  ["tetrathionate", "S4O6", -2],
  ["tetraborate", "B4O7", -2],
  ["tetrahydroxoaluminate", "AlO4H4", -1],
  ["molybdate", "MoO4", -2],
  ["heptamolybdate", "Mo7O24", -6],
  ["tungstate", "WO4", -2],
  ["metavanadate", "VO3", -1],
  ["vanadate", "VO4", -3],
  ["hexacyanoferrate(iii)", "FeC6N6", -3],
  ["ferricyanide", "FeC6N6", -3],
  ["hexacyanoferrate(ii)", "FeC6N6", -4],
  ["ferrocyanide", "FeC6N6", -4],
];

const VOCABULARY: readonly Row[] = [...INORGANIC, ...TRADE_NAMES, ...NETWORK_SOLIDS, ...MINERALS, ...ORGANIC, ...IONS];

/** "C2H4O2" -> {C: 2, H: 4, O: 2}, in any element order. */
function parseFormula(formula: string): Map<string, number> {
  const counts = new Map<string, number>();
  for (const [, symbol, digits] of formula.matchAll(/([A-Z][a-z]?)(\d*)/g)) {
    counts.set(symbol, (counts.get(symbol) ?? 0) + (digits === "" ? 1 : Number(digits)));
  }
  return counts;
}

function compositionOf(reading: SpeciesReading): Map<string, number> {
  const counts = new Map<string, number>();
  for (const part of reading.composition) counts.set(part.symbol, (counts.get(part.symbol) ?? 0) + part.count);
  return counts;
}

function sorted(counts: Map<string, number>): [string, number][] {
  return [...counts.entries()].sort(([a], [b]) => (a < b ? -1 : 1));
}

function read(name: string): SpeciesReading {
  const result = readSpecies(name);
  if (!result.ok) throw new Error(`"${name}" should read as a name, got ${result.problem.code}: ${result.problem.message}`);
  return result.value;
}

describe("the name vocabulary", () => {
  beforeAll(loadRdkit);

  it("has an outside formula in this file for every name it lists, and lists every name here", () => {
    const listed = new Set(knownSpeciesNames());
    const expected = new Set(VOCABULARY.map(([name]) => name));
    expect(
      [...listed].filter((name) => !expected.has(name)),
      "listed names without a reference formula here",
    ).toEqual([]);
    expect(
      [...expected].filter((name) => !listed.has(name)),
      "reference names the vocabulary does not list",
    ).toEqual([]);
  });

  const rows = VOCABULARY.map(([name, formula, charge]): [string, string, number] => [name, formula, charge ?? 0]);
  it.each(rows)("%s has the formula %s (charge %d)", (name, formula, charge) => {
    const reading = read(name);
    expect(sorted(compositionOf(reading)), `composition read for "${name}"`).toEqual(sorted(parseFormula(formula)));
    expect(reading.charge).toBe(charge);
    if (reading.smiles !== undefined) {
      // source: RDKit (WebAssembly build): the stored SMILES has the expected formula
      const atoms = rdkitAtoms(reading.smiles);
      expect(sorted(rdkitComposition(atoms)), `RDKit formula of ${reading.smiles}`).toEqual(sorted(parseFormula(formula)));
      expect(atoms.reduce((sum, atom) => sum + atom.formalCharge, 0)).toBe(charge);
    }
  });

  // common practice: a name is a name in any case and with any spacing
  it.each([
    ["Sulfuric Acid", "sulfuric acid"],
    ["sulphuric acid", "sulfuric acid"],
    ["ACETONE", "acetone"],
    ["Ethyl  Acetate", "ethyl acetate"],
    ["table salt", "sodium chloride"],
    ["propan-2-ol", "isopropanol"],
  ])("%j reads with the name %s", (written, name) => {
    expect(read(written).name).toBe(name);
  });
});

describe("acids named after their anions", () => {
  // from memory: Greenwood & Earnshaw, Chemistry of the Elements (the halogen oxoacids HOX, HXO2,
  // HXO3, HXO4 and the other oxoacids of the main groups); each also analyses with H on O
  it.each([
    ["chlorous acid", "HClO2", "chlorous acid"],
    ["hypochlorous acid", "HClO", "hypochlorous acid"],
    ["chloric acid", "HClO3", "chloric acid"],
    ["perchloric acid", "HClO4", "perchloric acid"],
    ["hypobromous acid", "HBrO", "hypobromous acid"],
    ["bromous acid", "HBrO2", "bromous acid"],
    ["bromic acid", "HBrO3", "bromic acid"],
    ["perbromic acid", "HBrO4", "perbromic acid"],
    ["hypoiodous acid", "HIO", "hypoiodous acid"],
    ["iodic acid", "HIO3", "iodic acid"],
    ["periodic acid", "HIO4", "periodic acid"],
    ["metaboric acid", "HBO2", "metaboric acid"],
    ["selenic acid", "H2SeO4", "selenic acid"],
    ["arsenic acid", "H3AsO4", "arsenic acid"],
    ["Chlorous Acid", "HClO2", "chlorous acid"],
  ])("%s is %s, shown as %s, with each H on O", (written, formula, shown) => {
    const reading = read(written);
    expect(sorted(compositionOf(reading))).toEqual(sorted(parseFormula(formula)));
    expect(reading.charge).toBe(0);
    expect(reading.name).toBe(shown);
    const analysis = analyzeSpecies(written);
    expect(analysis.ok, analysis.ok ? "" : analysis.problem.message).toBe(true);
    if (!analysis.ok) return;
    const { atoms, bonds } = analysis.value.graph;
    for (const bond of bonds) {
      const ends = [atoms[bond.from].symbol, atoms[bond.to].symbol];
      if (ends.includes("H")) expect(ends, `${written}: every H on O`).toContain("O");
    }
  });

  // from memory: Greenwood & Earnshaw (acids of the condensed and thio oxoanions)
  it.each([
    ["thiosulfuric acid", "H2S2O3"],
    ["disulfurous acid", "H2S2O5"],
    ["pyrophosphoric acid", "H4P2O7"],
    ["dichromic acid", "H2Cr2O7"],
  ])("%s reads as %s", (written, formula) => {
    const reading = read(written);
    expect(sorted(compositionOf(reading))).toEqual(sorted(parseFormula(formula)));
    expect(reading.name).toBe(written);
  });

  // from memory: Greenwood & Earnshaw (the acid formula written H first is named like the name reads)
  it.each([
    ["HClO2", "chlorous acid"],
    ["HBrO3", "bromic acid"],
    ["HIO", "hypoiodous acid"],
    ["HBO2", "metaboric acid"],
  ])("the formula %s is named %s", (written, name) => {
    expect(read(written).name).toBe(name);
  });

  // common practice: an acid of a trade name or a two-word anion is no name
  it.each([["metabisulfurous acid"], ["hydrogen carbonic acid"], ["ammonic acid"]])("%s is not read by the acid rule", (written) => {
    const result = readSpecies(written);
    expect(result.ok ? result.value.formula : result.problem.code).toBe("unknown-name");
  });
});

describe("salt names built from cation and anion vocabularies", () => {
  // from memory: IUPAC Red Book, Stock numerals; older -ous/-ic cation names (general chemistry texts)
  it.each([
    ["iron(III) chloride", "FeCl3", "iron(III) chloride"],
    ["iron (II) sulfate", "FeSO4", "iron(II) sulfate"],
    ["ferric chloride", "FeCl3", "iron(III) chloride"],
    ["ferrous sulfate", "FeSO4", "iron(II) sulfate"],
    ["tin(II) fluoride", "SnF2", "tin(II) fluoride"],
    ["stannous fluoride", "SnF2", "tin(II) fluoride"],
    ["stannic chloride", "SnCl4", "tin(IV) chloride"],
    ["copper(II) sulfate", "CuSO4", "copper(II) sulfate"],
    ["cupric sulfate", "CuSO4", "copper(II) sulfate"],
    ["cuprous oxide", "Cu2O", "copper(I) oxide"],
    ["copper(II) sulfate pentahydrate", "CuSO4H10O5", "copper(II) sulfate pentahydrate"],
    ["mercurous chloride", "Hg2Cl2", "mercury(I) chloride"],
    ["mercury(I) nitrate", "Hg2N2O6", "mercury(I) nitrate"],
    ["mercuric chloride", "HgCl2", "mercury(II) chloride"],
    ["lead(II) nitrate", "PbN2O6", "lead(II) nitrate"],
    ["chromic oxide", "Cr2O3", "chromium(III) oxide"],
    ["cobaltous chloride", "CoCl2", "cobalt(II) chloride"],
    ["manganese(IV) oxide", "MnO2", "manganese(IV) oxide"],
    ["ammonium chloride", "NH4Cl", "ammonium chloride"],
    ["potassium permanganate", "KMnO4", "potassium permanganate"],
    ["sodium hydrogen carbonate", "NaHCO3", "sodium hydrogen carbonate"],
    ["magnesium sulfate heptahydrate", "MgSO11H14", "magnesium sulfate heptahydrate"],
    ["anhydrous copper(II) sulfate", "CuSO4", "copper(II) sulfate"],
    ["sodium hydrogencarbonate", "NaHCO3", "sodium hydrogencarbonate"],
    ["sodium metabisulfite", "Na2S2O5", "sodium metabisulfite"],
    ["potassium hexacyanoferrate(III)", "K3FeC6N6", "potassium hexacyanoferrate(III)"],
    ["potassium ferrocyanide", "K4FeC6N6", "potassium ferrocyanide"],
    ["iron(III)", "Fe", "iron(III) ion"],
    ["hydrogen ion", "H", "hydrogen ion"],
    // from memory: CRC Handbook of Chemistry and Physics, physical constants of inorganic compounds
    // (double salts, counted cations, mixed-valence oxides, waters of alums)
    ["ammonium iron(II) sulfate", "N2H8FeS2O8", "ammonium iron(II) sulfate"],
    ["ammonium iron(II) sulfate hexahydrate", "N2H20FeS2O14", "ammonium iron(II) sulfate hexahydrate"],
    ["ferrous ammonium sulfate", "N2H8FeS2O8", "ammonium iron(II) sulfate"],
    ["iron(II) ammonium sulfate", "N2H8FeS2O8", "iron(II) ammonium sulfate"],
    ["ammonium iron(III) sulfate", "NH4FeS2O8", "ammonium iron(III) sulfate"],
    ["potassium aluminium sulfate dodecahydrate", "KAlS2O20H24", "potassium alum"],
    ["potassium chromium(III) sulfate", "KCrS2O8", "potassium chromium(III) sulfate"],
    ["magnesium ammonium phosphate", "MgNH4PO4", "magnesium ammonium phosphate"],
    ["sodium ammonium hydrogen phosphate", "NaNH5PO4", "sodium ammonium hydrogen phosphate"],
    ["aluminium sulfate octadecahydrate", "Al2S3O30H36", "aluminium sulfate octadecahydrate"],
    ["disodium hydrogen phosphate", "Na2HPO4", "disodium hydrogen phosphate"],
    ["trisodium phosphate", "Na3PO4", "trisodium phosphate"],
    ["diammonium hydrogen phosphate", "N2H9PO4", "diammonium hydrogen phosphate"],
    ["tetrasodium pyrophosphate", "Na4P2O7", "tetrasodium pyrophosphate"],
    ["iron(II,III) oxide", "Fe3O4", "iron(II,III) oxide"],
    ["lead(II,IV) oxide", "Pb3O4", "lead(II,IV) oxide"],
    ["manganese(II,III) oxide", "Mn3O4", "manganese(II,III) oxide"],
    ["sodium metasilicate", "Na2SiO3", "sodium metasilicate"],
    // from memory: CRC Handbook (older oxide names count the oxygens of E2On, not of one atom)
    ["phosphorus pentoxide", "P2O5", "diphosphorus pentoxide"],
    ["arsenic trioxide", "As2O3", "diarsenic trioxide"],
    ["vanadium pentoxide", "V2O5", "vanadium pentoxide"],
    ["manganese heptoxide", "Mn2O7", "manganese heptoxide"],
    ["phosphorus pentasulfide", "P2S5", "diphosphorus pentasulfide"],
    ["sulfur trioxide", "SO3", "sulfur trioxide"],
    ["chromium trioxide", "CrO3", "chromium trioxide"],
    ["osmium tetroxide", "OsO4", "osmium tetroxide"],
    ["nitrogen trioxide", "NO3", "nitrogen trioxide"],
  ])("%s is %s, shown as %s", (written, formula, shown) => {
    const reading = read(written);
    expect(sorted(compositionOf(reading))).toEqual(sorted(parseFormula(formula)));
    expect(reading.name).toBe(shown);
  });

  // common practice: an inventory's "copper sulfate" or "lead nitrate" is the +2 salt
  it.each([
    ["copper sulfate", "CuSO4", "copper(II) sulfate"],
    ["lead nitrate", "PbN2O6", "lead(II) nitrate"],
    ["nickel chloride", "NiCl2", "nickel(II) chloride"],
  ])("%s is read as %s (%s)", (written, formula, shown) => {
    const reading = read(written);
    expect(sorted(compositionOf(reading))).toEqual(sorted(parseFormula(formula)));
    expect(reading.name).toBe(shown);
  });

  // common practice: iron and tin salts are named with their charge; without it the name is open
  it.each([
    ["iron chloride"],
    ["tin fluoride"],
    ["ferric"],
    ["mercury(IX) chloride"],
    // common practice: a double salt names two different cations, and a count must balance
    ["sodium sodium sulfate"],
    ["copper iron sulfate"],
    ["monosodium sulfate"],
    ["sodium(II,III) oxide"],
  ])("%s is no name", (written) => {
    const result = readSpecies(written);
    expect(result.ok ? result.value.formula : result.problem.code).toBe("unknown-name");
  });
});

describe("substitutive and functional-class names of simple organic compounds", () => {
  beforeAll(loadRdkit);

  // from memory: IUPAC recommendations for the nomenclature of organic chemistry (2013) and the
  // older locant-first forms still printed on bottles; formulas from the CRC Handbook
  it.each([
    ["pentane", "C5H12"],
    ["hexane", "C6H14"],
    ["n-hexane", "C6H14"],
    ["heptane", "C7H16"],
    ["octane", "C8H18"],
    ["nonane", "C9H20"],
    ["decane", "C10H22"],
    ["cyclopentane", "C5H10"],
    ["cyclohexene", "C6H10"],
    ["propene", "C3H6"],
    ["but-1-ene", "C4H8"],
    ["2-butene", "C4H8"],
    ["buta-1,3-diene", "C4H6"],
    ["propyne", "C3H4"],
    ["propan-1-ol", "C3H8O"],
    ["1-propanol", "C3H8O"],
    ["butan-2-ol", "C4H10O"],
    ["2-methylpropan-2-ol", "C4H10O"],
    ["cyclohexanol", "C6H12O"],
    ["propanal", "C3H6O"],
    ["butanal", "C4H8O"],
    ["hexanal", "C6H12O"],
    ["butan-2-one", "C4H8O"],
    ["2-butanone", "C4H8O"],
    ["pentan-3-one", "C5H10O"],
    ["cyclohexanone", "C6H10O"],
    ["propanoic acid", "C3H6O2"],
    ["butanoic acid", "C4H8O2"],
    ["2-methylpropanoic acid", "C4H8O2"],
    ["hexanedioic acid", "C6H10O4"],
    ["ethyl acetate", "C4H8O2"],
    ["ethyl ethanoate", "C4H8O2"],
    ["methyl propanoate", "C4H8O2"],
    ["methyl formate", "C2H4O2"],
    ["isopropyl acetate", "C5H10O2"],
    ["butyl butanoate", "C8H16O2"],
    ["ethanamine", "C2H7N"],
    ["propan-2-amine", "C3H9N"],
    ["ethylamine", "C2H7N"],
    ["dimethylamine", "C2H7N"],
    ["trimethylamine", "C3H9N"],
    ["ethanamide", "C2H5NO"],
    ["propanamide", "C3H7NO"],
    ["propanenitrile", "C3H5N"],
    ["chloromethane", "CH3Cl"],
    ["tetrachloromethane", "CCl4"],
    ["bromoethane", "C2H5Br"],
    ["1,2-dichloroethane", "C2H4Cl2"],
    ["1,1,1-trichloroethane", "C2H3Cl3"],
    ["2-bromopropane", "C3H7Br"],
    ["2-chloro-2-methylpropane", "C4H9Cl"],
    ["chloroethene", "C2H3Cl"],
    ["vinyl chloride", "C2H3Cl"],
    ["methyl iodide", "CH3I"],
    ["ethyl methyl ether", "C3H8O"],
    ["chlorobenzene", "C6H5Cl"],
    ["ethylbenzene", "C8H10"],
    ["1,4-dimethylbenzene", "C8H10"],
    ["1,3-dinitrobenzene", "C6H4N2O4"],
    ["benzyl alcohol", "C7H8O"],
    ["isoamyl acetate", "C7H14O2"],
    ["octyl acetate", "C10H20O2"],
    ["methyl salicylate", "C8H8O3"],
    ["ethyl benzoate", "C9H10O2"],
    ["3-methylpentane", "C6H14"],
    ["2,3-dimethylbutane", "C6H14"],
  ])("%s is %s, and its structure analyses", (name, formula) => {
    const reading = read(name);
    expect(reading.smiles, `a SMILES for "${name}"`).toBeDefined();
    // source: RDKit (WebAssembly build): the formula of the SMILES the reader built
    expect(sorted(rdkitComposition(rdkitAtoms(reading.smiles as string)))).toEqual(sorted(parseFormula(formula)));
    expect(sorted(compositionOf(reading))).toEqual(sorted(parseFormula(formula)));
    const analysis = analyzeSpecies(name);
    expect(analysis.ok, analysis.ok ? "" : analysis.problem.message).toBe(true);
  });

  // from memory: IUPAC recommendations: these leave the position of a group open, so they name no
  // one compound; and words that only look like chain names
  it.each([
    ["butene"],
    ["propanol"],
    ["pentanone"],
    ["dichloroethane"],
    ["chloropropane"],
    ["ethanone"],
    ["propan-4-ol"],
    ["methanone"],
    ["hexan-1-one"],
    ["method"],
    ["octal"],
    ["nonsense"],
    ["butter"],
    ["pentagon"],
    ["decanted"],
    ["hexagonal"],
    ["methyl"],
    ["propanoic"],
    ["ethyl soup"],
  ])("%s is no name of one compound", (written) => {
    const result = readSpecies(written);
    expect(result.ok ? result.value.formula : result.problem.code).toBe("unknown-name");
  });
});

describe("abbreviations of the solvent shelf", () => {
  // common practice: abbreviations in chemistry writing that stand for one compound only
  it.each([
    ["EtOH", "ethanol"],
    ["MeOH", "methanol"],
    ["DCM", "dichloromethane"],
    ["THF", "tetrahydrofuran"],
    ["DMSO", "dimethyl sulfoxide"],
    ["DMF", "dimethylformamide"],
    ["EtOAc", "ethyl acetate"],
    ["MeCN", "acetonitrile"],
    ["AcOH", "acetic acid"],
    ["Et2O", "diethyl ether"],
    ["EDTA", "ethylenediaminetetraacetic acid"],
    ["KHP", "potassium hydrogen phthalate"],
  ])("%s reads as %s, exactly as written", (written, name) => {
    const reading = read(written);
    expect(reading.name).toBe(name);
    expect(reading.text).toBe(written);
    expect(analyzeSpecies(written).ok).toBe(true);
  });

  // common practice: abbreviations are case-sensitive; "thf" or "Dcm" are not how chemists write them
  it.each([["thf"], ["Dcm"], ["etoh"]])("%s is not read as an abbreviation", (written) => {
    const result = readSpecies(written);
    expect(result.ok && result.value.name !== undefined && result.value.notation === "name").toBe(false);
  });
});
