/**
 * Salts, hydrates, network solids and hydroxo ions: a species made of parts is read as its parts,
 * each polyatomic part analysed on its own, never as one invented molecule. Ion formulas and
 * charges are checked against RDKit; shapes against the VSEPR tables of standard texts.
 */
import { beforeAll, describe, expect, it } from "vitest";
import { analyzeSpecies, readSpecies } from "../../shared/src/index";
import type { AnalysisResult, SpeciesPart } from "../../shared/src/index";
import { loadRdkit, rdkitAtoms, rdkitComposition } from "../multicentre/rdkitReference";

type Failure = Extract<AnalysisResult, { ok: false }>;

/** One ion of a salt: its formula as the core writes it, its count, its SMILES and its shape. */
type IonRow = readonly [formula: string, count: number, smiles: string, shape: string];

/** The shape phrase of a monatomic ion. */
const MONATOMIC = "monatomic ion";
/** A polyatomic ion whose centre is a transition metal. */
const TRANSITION_METAL = "transition metal";

// from memory: Housecroft & Sharpe, Inorganic Chemistry (VSEPR shapes of common oxoanions and
// onium ions; ionic formulas of common salts)
const SALTS: readonly (readonly [salt: string, ions: readonly IonRow[]])[] = [
  [
    "NH4Cl",
    [
      ["NH4^+", 1, "[NH4+]", "tetrahedral"],
      ["Cl^-", 1, "[Cl-]", MONATOMIC],
    ],
  ],
  [
    "(NH4)2SO4",
    [
      ["NH4^+", 2, "[NH4+]", "tetrahedral"],
      ["SO4^2-", 1, "[O-]S(=O)(=O)[O-]", "tetrahedral"],
    ],
  ],
  [
    "NH4NO3",
    [
      ["NH4^+", 1, "[NH4+]", "tetrahedral"],
      ["NO3^-", 1, "[O-][N+](=O)[O-]", "trigonal planar"],
    ],
  ],
  [
    "NH4HCO3",
    [
      ["NH4^+", 1, "[NH4+]", "tetrahedral"],
      ["HCO3^-", 1, "OC(=O)[O-]", "C trigonal planar"],
    ],
  ],
  [
    "PH4I",
    [
      ["PH4^+", 1, "[PH4+]", "tetrahedral"],
      ["I^-", 1, "[I-]", MONATOMIC],
    ],
  ],
  [
    "KNO3",
    [
      ["K^+", 1, "[K+]", MONATOMIC],
      ["NO3^-", 1, "[O-][N+](=O)[O-]", "trigonal planar"],
    ],
  ],
  [
    "NaClO",
    [
      ["Na^+", 1, "[Na+]", MONATOMIC],
      ["ClO^-", 1, "[O-]Cl", "linear"],
    ],
  ],
  [
    "Na2SO4",
    [
      ["Na^+", 2, "[Na+]", MONATOMIC],
      ["SO4^2-", 1, "[O-]S(=O)(=O)[O-]", "tetrahedral"],
    ],
  ],
  [
    "CaCO3",
    [
      ["Ca^2+", 1, "[Ca+2]", MONATOMIC],
      ["CO3^2-", 1, "[O-]C(=O)[O-]", "trigonal planar"],
    ],
  ],
  [
    "Ca(NO3)2",
    [
      ["Ca^2+", 1, "[Ca+2]", MONATOMIC],
      ["NO3^-", 2, "[O-][N+](=O)[O-]", "trigonal planar"],
    ],
  ],
  [
    "K2Cr2O7",
    [
      ["K^+", 2, "[K+]", MONATOMIC],
      ["Cr2O7^2-", 1, "[O-][Cr](=O)(=O)O[Cr](=O)(=O)[O-]", TRANSITION_METAL],
    ],
  ],
  [
    "KMnO4",
    [
      ["K^+", 1, "[K+]", MONATOMIC],
      ["MnO4^-", 1, "[O-][Mn](=O)(=O)=O", TRANSITION_METAL],
    ],
  ],
  [
    "NaHCO3",
    [
      ["Na^+", 1, "[Na+]", MONATOMIC],
      ["HCO3^-", 1, "OC(=O)[O-]", "C trigonal planar"],
    ],
  ],
  [
    "NaOH",
    [
      ["Na^+", 1, "[Na+]", MONATOMIC],
      ["OH^-", 1, "[OH-]", "linear"],
    ],
  ],
  [
    "Ca(OH)2",
    [
      ["Ca^2+", 1, "[Ca+2]", MONATOMIC],
      ["OH^-", 2, "[OH-]", "linear"],
    ],
  ],
  [
    "CH3COONa",
    [
      ["Na^+", 1, "[Na+]", MONATOMIC],
      ["CH3COO^-", 1, "CC(=O)[O-]", "C trigonal planar"],
    ],
  ],
  [
    "NaBH4",
    [
      ["Na^+", 1, "[Na+]", MONATOMIC],
      ["BH4^-", 1, "[BH4-]", "tetrahedral"],
    ],
  ],
  [
    "Na2O2",
    [
      ["Na^+", 2, "[Na+]", MONATOMIC],
      ["O2^2-", 1, "[O-][O-]", "linear"],
    ],
  ],
  [
    "KO2",
    [
      ["K^+", 1, "[K+]", MONATOMIC],
      ["O2^-", 1, "[O-][O]", "linear"],
    ],
  ],
  [
    "CuSO4",
    [
      ["Cu^2+", 1, "[Cu+2]", MONATOMIC],
      ["SO4^2-", 1, "[O-]S(=O)(=O)[O-]", "tetrahedral"],
    ],
  ],
  [
    "Fe2(SO4)3",
    [
      ["Fe^3+", 2, "[Fe+3]", MONATOMIC],
      ["SO4^2-", 3, "[O-]S(=O)(=O)[O-]", "tetrahedral"],
    ],
  ],
  [
    "KCr(SO4)2",
    [
      ["K^+", 1, "[K+]", MONATOMIC],
      ["Cr^3+", 1, "[Cr+3]", MONATOMIC],
      ["SO4^2-", 2, "[O-]S(=O)(=O)[O-]", "tetrahedral"],
    ],
  ],
  // Double salts written with the metal first, as inventories and handbooks often do.
  [
    "Fe(NH4)2(SO4)2",
    [
      ["Fe^2+", 1, "[Fe+2]", MONATOMIC],
      ["NH4^+", 2, "[NH4+]", "tetrahedral"],
      ["SO4^2-", 2, "[O-]S(=O)(=O)[O-]", "tetrahedral"],
    ],
  ],
  [
    "FeNH4(SO4)2",
    [
      ["Fe^3+", 1, "[Fe+3]", MONATOMIC],
      ["NH4^+", 1, "[NH4+]", "tetrahedral"],
      ["SO4^2-", 2, "[O-]S(=O)(=O)[O-]", "tetrahedral"],
    ],
  ],
  [
    "MgNH4PO4",
    [
      ["Mg^2+", 1, "[Mg+2]", MONATOMIC],
      ["NH4^+", 1, "[NH4+]", "tetrahedral"],
      ["PO4^3-", 1, "[O-]P(=O)([O-])[O-]", "tetrahedral"],
    ],
  ],
  // Salts of two anions: basic carbonates, apatites, oxide halides (from memory: Greenwood &
  // Earnshaw, Chemistry of the Elements; Wells, Structural Inorganic Chemistry).
  [
    "Cu2(OH)2CO3",
    [
      ["Cu^2+", 2, "[Cu+2]", MONATOMIC],
      ["OH^-", 2, "[OH-]", "linear"],
      ["CO3^2-", 1, "[O-]C(=O)[O-]", "trigonal planar"],
    ],
  ],
  [
    "Ca5(PO4)3OH",
    [
      ["Ca^2+", 5, "[Ca+2]", MONATOMIC],
      ["PO4^3-", 3, "[O-]P(=O)([O-])[O-]", "tetrahedral"],
      ["OH^-", 1, "[OH-]", "linear"],
    ],
  ],
  [
    "Ca5(PO4)3F",
    [
      ["Ca^2+", 5, "[Ca+2]", MONATOMIC],
      ["PO4^3-", 3, "[O-]P(=O)([O-])[O-]", "tetrahedral"],
      ["F^-", 1, "[F-]", MONATOMIC],
    ],
  ],
  [
    "FeOCl",
    [
      ["Fe^3+", 1, "[Fe+3]", MONATOMIC],
      ["O^2-", 1, "[O-2]", MONATOMIC],
      ["Cl^-", 1, "[Cl-]", MONATOMIC],
    ],
  ],
  [
    "NaCl",
    [
      ["Na^+", 1, "[Na+]", MONATOMIC],
      ["Cl^-", 1, "[Cl-]", MONATOMIC],
    ],
  ],
  [
    "CaF2",
    [
      ["Ca^2+", 1, "[Ca+2]", MONATOMIC],
      ["F^-", 2, "[F-]", MONATOMIC],
    ],
  ],
  [
    "Li3N",
    [
      ["Li^+", 3, "[Li+]", MONATOMIC],
      ["N^3-", 1, "[N-3]", MONATOMIC],
    ],
  ],
];

function refused(input: string): Failure {
  const result = analyzeSpecies(input);
  expect(result.ok, `${input} should be read as parts, not analysed as one molecule`).toBe(false);
  return result as Failure;
}

function partSummary(part: SpeciesPart): string {
  return `${part.count} ${part.formula}`;
}

/** The geometry phrase of a part, from its own analysis. */
function shapeOfPart(part: SpeciesPart): string {
  if (part.monatomic) return MONATOMIC;
  const result = part.analysis;
  if (!result) return "missing analysis";
  if (!result.ok) return result.problem.code === "transition-metal-centre" ? TRANSITION_METAL : result.problem.code;
  const { centres, graph } = result.value;
  if (centres.length === 0) return graph.atoms.length === 2 ? "linear" : "none";
  if (centres.length === 1) return centres[0].molecularGeometry;
  return centres.map((centre) => `${centre.atom} ${centre.molecularGeometry}`).join(", ");
}

/** Element counts and charge of a formula as the core reads it. */
function coreComposition(formula: string): { counts: Map<string, number>; charge: number } {
  const read = readSpecies(formula);
  if (!read.ok) throw new Error(`${formula} did not read: ${read.problem.message}`);
  return { counts: new Map(read.value.composition.map((part) => [part.symbol, part.count])), charge: read.value.charge };
}

describe("a salt is its ions", () => {
  it.each(SALTS)("%s", (salt, ions) => {
    const result = refused(salt);
    // common practice: an ionic compound is a lattice of ions, with no VSEPR shape of its own
    expect(result.problem.code).toBe("ionic-solid");
    expect(result.parts?.map(partSummary), `${salt}: ${result.problem.message}`).toEqual(
      ions.map(([formula, count]) => `${count} ${formula}`),
    );
    for (const [index, [formula, , , shape]] of ions.entries()) {
      const part = result.parts![index];
      // A row naming an atom ("C trigonal planar") is about that centre of a several-centre ion.
      if (shape.startsWith("C ")) expect(shapeOfPart(part).split(", "), `${formula} in ${salt}`).toContain(shape);
      else expect(shapeOfPart(part), `${formula} in ${salt}`).toBe(shape);
      expect(part.role).toBe(formula.endsWith("-") ? "anion" : "cation");
    }
    expect(result.problem.message).toMatch(/ionic compound/);
    const transitionMetalIon = ions.find(([, , , shape]) => shape === TRANSITION_METAL);
    if (transitionMetalIon) expect(result.problem.message).toMatch(/transition metal/);
  });
});

describe("ion formulas and charges agree with RDKit", () => {
  beforeAll(async () => {
    await loadRdkit();
  });

  // source: RDKit (WebAssembly build), element counts and formal charges of each ion's SMILES
  it.each(SALTS)("%s", (salt, ions) => {
    const total = new Map<string, number>();
    let totalCharge = 0;
    for (const [formula, count, smiles] of ions) {
      const atoms = rdkitAtoms(smiles);
      const rdkitCharge = atoms.reduce((sum, atom) => sum + atom.formalCharge, 0);
      const core = coreComposition(formula);
      expect(core.counts, `${formula} against RDKit's ${smiles}`).toEqual(rdkitComposition(atoms));
      expect(core.charge, `charge of ${formula} against RDKit's ${smiles}`).toBe(rdkitCharge);
      for (const [symbol, n] of core.counts) total.set(symbol, (total.get(symbol) ?? 0) + n * count);
      totalCharge += rdkitCharge * count;
    }
    // the ions together make up the salt exactly, and it is neutral
    expect(totalCharge).toBe(0);
    expect(coreComposition(salt).counts).toEqual(total);
  });
});

describe("formulas that are not plainly salts are not forced into ions", () => {
  // from memory: Greenwood & Earnshaw, Chemistry of the Elements (molecular halides, nitrosyl
  // chloride, mercury(II) cyanide, complex ions)
  it.each([
    ["NOCl", "ok", "nitrosyl chloride is a bent molecule, not NO+ Cl-"],
    ["AlCl3", "ok", "the aluminium chloride monomer is a molecule"],
    ["Hg(CN)2", "ok", "mercury(II) cyanide is a linear molecule"],
    ["HNO3", "ok", "nitric acid: hydrogen is not a metal cation"],
    ["NH4+", "ok", "ammonium on its own is the ion"],
    ["TiCl4", "transition-metal-centre", "a molecular transition-metal halide"],
    ["[Fe(CN)6]4-", "transition-metal-centre", "a complex ion, not a salt"],
    ["Mn2O7", "transition-metal-centre", "manganese(VII) oxide is a molecular liquid, O3Mn-O-MnO3"],
    ["VOCl3", "transition-metal-centre", "vanadium oxytrichloride is a molecular liquid"],
    ["CrO2Cl2", "transition-metal-centre", "chromyl chloride is a molecular liquid"],
    ["SOCl2", "ok", "thionyl chloride: sulfur is not a metal cation"],
    ["VCl4", "transition-metal-centre", "vanadium(IV) chloride is a tetrahedral molecular liquid"],
    ["SnCl4", "ok", "tin(IV) chloride is a tetrahedral molecular liquid"],
    ["HgCl2", "ok", "mercury(II) chloride is a linear molecule"],
  ])("%s", (input, expected, why) => {
    const result = analyzeSpecies(input);
    if (expected === "ok") {
      expect(result.ok, `${input}: ${why}`).toBe(true);
      return;
    }
    expect(result.ok, why).toBe(false);
    const failure = result as Failure;
    expect(failure.problem.code, why).toBe(expected);
    expect(failure.parts, `${input} should not be split: ${why}`).toBeUndefined();
  });

  it("the ammonium and phosphonium salts have no five-bonded centre", () => {
    // from memory: Housecroft & Sharpe (NH4Cl is ammonium chloride; nitrogen never exceeds an octet)
    for (const salt of ["NH4Cl", "PH4I", "NH4NO3"]) {
      const result = refused(salt);
      expect(result.problem.code).not.toBe("octet-exceeded");
      expect(result.problem.message).not.toMatch(/octet/);
    }
  });
});

// from memory: Greenwood & Earnshaw (copper(II) sulfate pentahydrate, washing soda, chrome alum)
const HYDRATE_WRITINGS: readonly (readonly [written: string, host: string, waters: number])[] = [
  ["CuSO4·5H2O", "CuSO4", 5],
  ["CuSO4.5H2O", "CuSO4", 5],
  ["CuSO4•5H2O", "CuSO4", 5],
  ["CuSO4 · 5H2O", "CuSO4", 5],
  ["\\ce{CuSO4*5H2O}", "CuSO4", 5],
  ["\\ce{KCr(SO4)2 * 12 H2O}", "KCr(SO4)2", 12],
  ["Na2CO3·10H2O", "Na2CO3", 10],
  ["CaSO4·2H2O", "CaSO4", 2],
];

describe("hydrates are one species with their parts", () => {
  it.each(HYDRATE_WRITINGS)("%s", (written, host, waters) => {
    const read = readSpecies(written);
    expect(read.ok).toBe(true);
    if (!read.ok) return;
    // the reading keeps each part with its count
    expect(read.value.parts).toEqual([
      { count: 1, formula: host },
      { count: waters, formula: "H2O" },
    ]);
    const result = refused(written);
    expect(result.problem.code).toBe("hydrate");
    expect(result.parts?.map((part) => [part.role, part.count, part.formula])).toEqual([
      ["compound", 1, host],
      ["water", waters, "H2O"],
    ]);
    // from memory: water is bent (AX2E2), and the salt part is split into its ions
    expect(shapeOfPart(result.parts![1])).toBe("bent");
    const salt = result.parts![0].analysis as Failure;
    expect(salt.problem.code).toBe("ionic-solid");
    expect(salt.parts?.length).toBeGreaterThanOrEqual(2);
  });

  it.each(HYDRATE_WRITINGS)("%s has the element counts of its parts added up", (written, host, waters) => {
    // common practice: a hydrate's formula is the salt plus n H2O
    const whole = coreComposition(written).counts;
    const sum = new Map(coreComposition(host).counts);
    for (const [symbol, n] of coreComposition("H2O").counts) sum.set(symbol, (sum.get(symbol) ?? 0) + n * waters);
    expect(whole).toEqual(sum);
  });

  it("the sulfate of copper sulfate pentahydrate is tetrahedral", () => {
    // from memory: Housecroft & Sharpe (sulfate ion, Td)
    const copperSulfate = refused("CuSO4·5H2O").parts![0].analysis as Failure;
    const sulfate = copperSulfate.parts!.find((part) => part.formula === "SO4^2-");
    expect(sulfate && shapeOfPart(sulfate)).toBe("tetrahedral");
  });

  it.each([
    ["CuSO4.", "a period after a formula ends the sentence"],
    ["NaCl.", "a period after a formula ends the sentence"],
  ])("%s is not a hydrate", (written, why) => {
    const read = readSpecies(written);
    if (read.ok) expect(read.value.parts, why).toBeUndefined();
  });
});

describe("network solids", () => {
  // from memory: Greenwood & Earnshaw (silica, boron nitride and silicon carbide are covalent networks)
  it("SiO2 is a network solid with no molecular shape, not the gas-phase O=Si=O", () => {
    const result = refused("SiO2");
    expect(result.problem.code).toBe("network-solid");
    expect(result.problem.message).toMatch(/no discrete SiO2 molecule/);
    expect(result.lattice?.map((site) => [site.symbol, site.neighbourCount, site.geometry])).toEqual([
      ["Si", 4, "tetrahedral"],
      ["O", 2, "bent"],
    ]);
  });

  it.each(["BN", "SiC", "diamond", "graphite", "boron nitride"])("%s is a network solid", (input) => {
    const result = refused(input);
    expect(result.problem.code).toBe("network-solid");
    expect(result.problem.message).toMatch(/network covalent solid/);
  });
});

describe("names of network solids", () => {
  // from memory: Greenwood & Earnshaw (diamond sp3 tetrahedral, graphite sp2 trigonal planar; quartz is SiO2)
  it.each([
    ["diamond", /tetrahedr/],
    ["graphite", /trigonal planar/],
  ])("%s says how each carbon is bonded", (input, surroundings) => {
    expect(refused(input).problem.message).toMatch(surroundings);
  });

  it("quartz is read as SiO2 with the network note", () => {
    const result = refused("quartz");
    expect(result.reading?.formula).toBe("SiO2");
    expect(result.problem.message).toMatch(/network covalent solid/);
  });

  it("a carbon atom written C is not named diamond", () => {
    const read = readSpecies("C");
    expect(read.ok && read.value.name).not.toBe("diamond");
    expect(analyzeSpecies("C").ok).toBe(true);
  });
});

describe("hydroxo and aqua ions are ions, not lattices", () => {
  // from memory: Baes & Mesmer, The Hydrolysis of Cations (CaOH+, HgOH+, AlOH2+ and Al(H2O)6 3+ in water)
  it.each([
    ["CaOH+", "Ca^2+", [[1, "OH^-"]]],
    ["HgOH+", "Hg^2+", [[1, "OH^-"]]],
    ["AlOH^2+", "Al^3+", [[1, "OH^-"]]],
    ["Fe(OH)2+", "Fe^3+", [[2, "OH^-"]]],
    ["[Al(H2O)6]3+", "Al^3+", [[6, "H2O"]]],
  ] as const)("%s", (input, metal, ligands) => {
    const result = refused(input);
    expect(result.problem.code).toBe("metal-ion-complex");
    expect(result.problem.message).not.toMatch(/lattice of ions/);
    expect(result.parts?.map((part) => [part.role, part.count, part.formula])).toEqual([
      ["metal-ion", 1, metal],
      ...ligands.map(([count, formula]) => ["ligand", count, formula]),
    ]);
  });
});
