/**
 * Everyday inorganic solids of a lab report, read as what they are: the ions of an oxide in the
 * metal's usual charge (MnO2 is Mn4+ and two O2-, not a peroxide), a true peroxide or disulfide
 * only where the usual charges leave no other reading, mixed-valence oxides as two charges, and
 * molecular halides left as molecules. Checked through the core's public face.
 */
import { beforeAll, describe, expect, it } from "vitest";
import { analyzeSpecies, checkDocument, analyzeDocument } from "../../shared/src/index";
import type { AnalysisResult } from "../../shared/src/index";
import { ensureBuilt, runCli } from "../cli/cliRunner";

type Failure = Extract<AnalysisResult, { ok: false }>;

/** Formula -> the ions as "formula ×count" in order, the name shown. */
type SolidRow = readonly [formula: string, ions: string, name: string];

function ionsOf(formula: string): Failure {
  const result = analyzeSpecies(formula);
  expect(result.ok, `${formula} is not one molecule`).toBe(false);
  return result as Failure;
}

function ionList(result: Failure): string {
  return (result.parts ?? []).map((part) => `${part.formula} ×${part.count}`).join(", ");
}

const DIOXIDES: readonly SolidRow[] = [
  // from memory: Greenwood & Earnshaw, Chemistry of the Elements (MnO2, rutile structure, Mn(IV))
  ["MnO2", "Mn^4+ ×1, O^2- ×2", "manganese(IV) oxide"],
  // from memory: Greenwood & Earnshaw (PbO2 is lead(IV) oxide, rutile structure)
  ["PbO2", "Pb^4+ ×1, O^2- ×2", "lead(IV) oxide"],
  // from memory: Greenwood & Earnshaw (SnO2, cassiterite, tin(IV) oxide)
  ["SnO2", "Sn^4+ ×1, O^2- ×2", "tin(IV) oxide"],
  // from memory: Greenwood & Earnshaw (TiO2, rutile and anatase, titanium(IV) oxide)
  ["TiO2", "Ti^4+ ×1, O^2- ×2", "titanium(IV) oxide"],
  // from memory: Greenwood & Earnshaw (SnS2, CdI2 layer structure, tin(IV) sulfide)
  ["SnS2", "Sn^4+ ×1, S^2- ×2", "tin(IV) sulfide"],
];

const SELF_BONDED_ANIONS: readonly SolidRow[] = [
  // from memory: Greenwood & Earnshaw (peroxides and superoxides of the alkali and alkaline-earth metals)
  ["Na2O2", "Na^+ ×2, O2^2- ×1", "sodium peroxide"],
  ["Li2O2", "Li^+ ×2, O2^2- ×1", "lithium peroxide"],
  ["BaO2", "Ba^2+ ×1, O2^2- ×1", "barium peroxide"],
  ["CaO2", "Ca^2+ ×1, O2^2- ×1", "calcium peroxide"],
  ["KO2", "K^+ ×1, O2^- ×1", "potassium superoxide"],
  // from memory: Greenwood & Earnshaw (pyrite is Fe(II) with S2 2- units)
  ["FeS2", "Fe^2+ ×1, S2^2- ×1", "iron(II) disulfide"],
  // from memory: Greenwood & Earnshaw (calcium carbide contains the C2 2- ion, isoelectronic with N2)
  ["CaC2", "Ca^2+ ×1, C2^2- ×1", "calcium carbide"],
];

const EVERYDAY_IONIC: readonly SolidRow[] = [
  // from memory: general-chemistry tables of common ions and Stock names (Fe3+, Cu+, Cu2+, Ag+, Al3+)
  ["Fe2O3", "Fe^3+ ×2, O^2- ×3", "iron(III) oxide"],
  ["FeO", "Fe^2+ ×1, O^2- ×1", "iron(II) oxide"],
  ["Cu2O", "Cu^+ ×2, O^2- ×1", "copper(I) oxide"],
  ["CuO", "Cu^2+ ×1, O^2- ×1", "copper(II) oxide"],
  ["Ag2O", "Ag^+ ×2, O^2- ×1", "silver oxide"],
  ["AgCl", "Ag^+ ×1, Cl^- ×1", "silver chloride"],
  ["AgBr", "Ag^+ ×1, Br^- ×1", "silver bromide"],
  ["Al2O3", "Al^3+ ×2, O^2- ×3", "aluminium oxide"],
  ["ZnO", "Zn^2+ ×1, O^2- ×1", "zinc oxide"],
  ["ZnS", "Zn^2+ ×1, S^2- ×1", "zinc sulfide"],
  ["PbO", "Pb^2+ ×1, O^2- ×1", "lead(II) oxide"],
  ["SnO", "Sn^2+ ×1, O^2- ×1", "tin(II) oxide"],
  ["PbS", "Pb^2+ ×1, S^2- ×1", "lead(II) sulfide"],
  // from memory: mercury(I) is Hg2 2+, so mercury(II) oxide carries its numeral
  ["HgO", "Hg^2+ ×1, O^2- ×1", "mercury(II) oxide"],
  // from memory: Greenwood & Earnshaw (magnetite is Fe(II)Fe(III)2O4, red lead Pb(II)2Pb(IV)O4, hausmannite Mn(II)Mn(III)2O4)
  ["Fe3O4", "Fe^2+ ×1, Fe^3+ ×2, O^2- ×4", "iron(II,III) oxide"],
  ["Pb3O4", "Pb^2+ ×2, Pb^4+ ×1, O^2- ×4", "lead(II,IV) oxide"],
  ["Mn3O4", "Mn^2+ ×1, Mn^3+ ×2, O^2- ×4", "manganese(II,III) oxide"],
  // from memory: Greenwood & Earnshaw (LiAlH4 is Li+ and tetrahedral AlH4-; Mg3N2 and NaN3 are ionic)
  ["LiAlH4", "Li^+ ×1, AlH4^- ×1", "lithium aluminium hydride"],
  ["NaN3", "Na^+ ×1, N3^- ×1", "sodium azide"],
  ["Mg3N2", "Mg^2+ ×3, N^3- ×2", "magnesium nitride"],
];

describe("inorganic solids are their ions, with the name that matches", () => {
  it.each([...DIOXIDES, ...SELF_BONDED_ANIONS, ...EVERYDAY_IONIC])("%s is %s (%s)", (formula, ions, name) => {
    const result = ionsOf(formula);
    expect(result.problem.code).toBe("ionic-solid");
    expect(ionList(result)).toBe(ions);
    expect(result.reading?.name).toBe(name);
    // the note names the same ions as the list
    for (const part of result.parts ?? []) expect(result.problem.message).toContain(part.formula);
  });

  it.each([
    // from memory: Greenwood & Earnshaw (Stock names of the dioxides and the peroxides)
    ["manganese(IV) oxide", "Mn^4+ ×1, O^2- ×2"],
    ["lead(IV) oxide", "Pb^4+ ×1, O^2- ×2"],
    ["barium peroxide", "Ba^2+ ×1, O2^2- ×1"],
    ["calcium carbide", "Ca^2+ ×1, C2^2- ×1"],
    ["silver chloride", "Ag^+ ×1, Cl^- ×1"],
  ])("the name %s gives the same ions, %s", (name, ions) => {
    expect(ionList(ionsOf(name))).toBe(ions);
  });

  it("the polyatomic anions are analysed for their own shapes", () => {
    // from memory: AlH4- is tetrahedral (AX4), C2 2- is diatomic
    const hydride = ionsOf("LiAlH4").parts?.find((part) => part.formula === "AlH4^-");
    expect(hydride?.analysis?.ok && hydride.analysis.value.centres[0].molecularGeometry).toBe("tetrahedral");
    const acetylide = ionsOf("CaC2").parts?.find((part) => part.formula === "C2^2-");
    expect(acetylide?.analysis?.ok).toBe(true);
  });
});

/** Formula -> each atom's surroundings ("Si 4 O tetrahedral"), the name shown. */
type NetworkRow = readonly [formula: string, sites: string, name: string];

const NETWORK_SOLIDS: readonly NetworkRow[] = [
  // from memory: Greenwood & Earnshaw (quartz: SiO4 tetrahedra sharing every corner, Si-O-Si bent)
  ["SiO2", "Si 4 O tetrahedral; O 2 Si bent", "silicon dioxide"],
  ["GeO2", "Ge 4 O tetrahedral; O 2 Ge bent", "germanium dioxide"],
  // from memory: Greenwood & Earnshaw (B2O3: BO3 triangles linked through O)
  ["B2O3", "B 3 O trigonal planar; O 2 B bent", "boron trioxide"],
  // from memory: Wells, Structural Inorganic Chemistry (wurtzite BeO, AlN, GaN; zinc-blende GaAs, InP; carborundum SiC)
  ["BeO", "Be 4 O tetrahedral; O 4 Be tetrahedral", "beryllium oxide"],
  ["AlN", "Al 4 N tetrahedral; N 4 Al tetrahedral", "aluminium nitride"],
  ["GaN", "Ga 4 N tetrahedral; N 4 Ga tetrahedral", "gallium nitride"],
  ["GaAs", "Ga 4 As tetrahedral; As 4 Ga tetrahedral", "gallium arsenide"],
  ["InP", "In 4 P tetrahedral; P 4 In tetrahedral", "indium phosphide"],
  ["SiC", "Si 4 C tetrahedral; C 4 Si tetrahedral", "silicon carbide"],
  // from memory: Greenwood & Earnshaw (hexagonal BN layers as in graphite; Si3N4: SiN4 tetrahedra, planar NSi3)
  ["BN", "B 3 N trigonal planar; N 3 B trigonal planar", "boron nitride"],
  ["Si3N4", "Si 4 N tetrahedral; N 3 Si trigonal planar", "silicon nitride"],
];

describe("network solids have no molecule and say each atom's surroundings", () => {
  it.each(NETWORK_SOLIDS)("%s: %s (%s)", (formula, sites, name) => {
    const result = ionsOf(formula);
    expect(result.problem.code).toBe("network-solid");
    expect(result.parts).toBeUndefined();
    expect(result.lattice?.map((site) => `${site.symbol} ${site.neighbourCount} ${site.neighbour} ${site.geometry}`).join("; ")).toBe(
      sites,
    );
    expect(result.reading?.name).toBe(name);
    expect(result.problem.message).toContain(`no discrete ${formula} molecule`);
  });

  it.each([
    // from memory: Greenwood & Earnshaw (CO2, SO3 and P4O10 are molecules; As4O6 likewise)
    ["CO2", "linear"],
    ["SO3", "trigonal planar"],
    ["SiF4", "tetrahedral"],
    ["BF3", "trigonal planar"],
  ])("the molecule %s is still %s", (formula, shape) => {
    const result = analyzeSpecies(formula);
    expect(result.ok && result.value.centres[0].molecularGeometry).toBe(shape);
  });
});

describe("molecular species stay molecules", () => {
  // from memory: Greenwood & Earnshaw (gas-phase and molecular-liquid halides and hydrides)
  it.each([
    ["SnCl4", "tetrahedral"],
    ["SnCl2", "bent"],
    ["PbCl2", "bent"],
    ["BeCl2", "linear"],
    ["AlCl3", "trigonal planar"],
    ["HgCl2", "linear"],
    ["ZnCl2", "linear"],
    ["H2O2", "bent"],
  ])("%s is analysed as a %s molecule", (formula, shape) => {
    const result = analyzeSpecies(formula);
    expect(result.ok).toBe(true);
    if (result.ok) expect(result.value.centres.map((centre) => centre.molecularGeometry)).toContain(shape);
  });

  it.each([
    // from memory: Greenwood & Earnshaw (TiCl4 is a molecular liquid; CrO3 is chains of CrO4 tetrahedra)
    ["TiCl4", "transition-metal-centre"],
    ["CrO3", "transition-metal-centre"],
  ])("%s is not forced into ions", (formula, code) => {
    const result = ionsOf(formula);
    expect(result.problem.code).toBe(code);
    expect(result.parts).toBeUndefined();
  });
});

describe("a metal halide drawn as its gas molecule says what its solid is", () => {
  const SOLID_NOTE = "not made of separate molecules";
  function warningsOf(written: string): string {
    const result = analyzeSpecies(written);
    expect(result.ok, written).toBe(true);
    return result.ok ? result.value.warnings.join(" ") : "";
  }

  // from memory: Greenwood & Earnshaw, Chemistry of the Elements (solid BeCl2 is chains of
  // edge-sharing BeCl4 tetrahedra, ZnCl2 a network of ZnCl4 tetrahedra, PbCl2 and PbF2 ionic
  // lattices of high coordination, SnCl2 chains, AlCl3 and InCl3 layer lattices, GaCl3 Ga2Cl6
  // pairs, TlCl the CsCl lattice)
  it.each([
    ["BeCl2"],
    ["ZnCl2"],
    ["ZnI2"],
    ["PbCl2"],
    ["PbF2"],
    ["SnCl2"],
    ["AlCl3"],
    ["InCl3"],
    ["GaCl3"],
    ["TlCl"],
    ["lead(II) chloride"],
  ])("%s says its solid is not made of these molecules", (written) => {
    expect(warningsOf(written)).toContain(SOLID_NOTE);
    expect(warningsOf(written)).toContain("molecule in the gas");
  });

  // from memory: Greenwood & Earnshaw (HgCl2 crystals are linear molecules; SnCl4 and TiCl4 are
  // molecular liquids; BiCl3 and SbCl3 crystals are pyramidal molecules; BF3 is a gas); a gas
  // written as one is the gas; common practice: AlCl is no room-temperature solid
  it.each([["HgCl2"], ["SnCl4"], ["BiCl3"], ["SbCl3"], ["BF3"], ["PbCl2(g)"], ["AlCl"]])("%s has no solid note", (written) => {
    expect(warningsOf(written)).not.toContain(SOLID_NOTE);
  });
});

describe("the command line says the same", () => {
  beforeAll(ensureBuilt);

  it.each([
    // from memory: Greenwood & Earnshaw (MnO2 is manganese(IV) oxide; quartz is a network of SiO4 tetrahedra)
    ["MnO2", ["MnO2 - manganese(IV) oxide - ionic compound", "Mn^4+ ×1 (cation)", "O^2- ×2 (anion)"]],
    ["Fe3O4", ["Fe3O4 - iron(II,III) oxide - ionic compound", "Fe^2+ ×1 (cation)", "Fe^3+ ×2 (cation)"]],
    ["SiO2", ["SiO2 - silicon dioxide - network solid", "Si: tetrahedral, bonded to 4 O", "O: bent, bonded to 2 Si"]],
  ])("analyze %s", (formula, expected) => {
    const run = runCli(["analyze", formula]);
    expect(run.status).toBe(0);
    for (const line of expected) expect(run.stdout).toContain(line);
    expect(run.stdout).not.toMatch(/peroxide|Molecular geometry/);
  });

  it("the table gives a network solid a row of atoms' surroundings", () => {
    // from memory: Greenwood & Earnshaw (quartz: Si tetrahedral, O bent)
    const run = runCli(["table", "SiO2", "MnO2"]);
    expect(run.stdout).toContain("| SiO2 | silicon dioxide |  |  |  | Si: tetrahedral (4 O); O: bent (2 Si) |  |  | network solid |");
    expect(run.stdout).toContain("| MnO2 | manganese(IV) oxide |");
    expect(run.stdout).not.toContain("could not analyse");
  });
});

describe("a lab report naming these solids gets notes, never errors", () => {
  it("every solid is an information finding", () => {
    // common practice: a correct lab report gets no error for naming a common solid
    // (documents never spot "SnO", which is also a word)
    const formulas = [...DIOXIDES, ...SELF_BONDED_ANIONS, ...EVERYDAY_IONIC]
      .map(([formula]) => formula)
      .filter((formula) => formula !== "SnO");
    const text = `# Practical 4\n\n| Reagent | Mass / g |\n| --- | --- |\n${formulas.map((formula) => `| ${formula} | 1.0 |`).join("\n")}\n`;
    const findings = checkDocument(analyzeDocument(text, "markdown"));
    expect(findings.filter((finding) => finding.severity !== "information")).toEqual([]);
    expect(new Set(findings.map((finding) => text.slice(finding.range.start, finding.range.end)))).toEqual(new Set(formulas));
  });
});
