/**
 * The everyday compounds of a teaching lab's reagent shelf: salts of the d-block metals, their
 * oxides and halides, oxocations, coordination complexes, polyoxoanions. Each is read as its ions
 * with the charges a textbook gives them; the metal centre and the complexes get a plain statement
 * that VSEPR does not decide their geometry, never an invented structure.
 */
import { describe, expect, it } from "vitest";
import { analyzeSpecies } from "../../shared/src/index";
import type { AnalysisResult } from "../../shared/src/index";

type Failure = Extract<AnalysisResult, { ok: false }>;

function refused(input: string): Failure {
  const result = analyzeSpecies(input);
  expect(result.ok, `${input} should not be analysed as one molecule`).toBe(false);
  return result as Failure;
}

/** "Cr^4+ ×1, O^2- ×2": the parts in order with their counts. */
function ionsOf(input: string): string {
  return (refused(input).parts ?? []).map((part) => `${part.formula} ×${part.count}`).join(", ");
}

// from memory: Greenwood & Earnshaw, Chemistry of the Elements (oxidation states of the d-block
// oxides and halides; CrO2 and VO2 are rutile-type, V2O5 is vanadium(V) oxide; MnS2 is hauerite,
// Mn2+ with S2 2- like pyrite; FeCl2, CoCl2, NiCl2 and CrCl3 are layer lattices; CuCl is zinc blende)
const SALTS: readonly (readonly [formula: string, ions: string, name: string])[] = [
  ["CrO2", "Cr^4+ ×1, O^2- ×2", "chromium(IV) oxide"],
  ["VO2", "V^4+ ×1, O^2- ×2", "vanadium(IV) oxide"],
  ["V2O5", "V^5+ ×2, O^2- ×5", "vanadium(V) oxide"],
  ["V2O3", "V^3+ ×2, O^2- ×3", "vanadium(III) oxide"],
  ["Cr2O3", "Cr^3+ ×2, O^2- ×3", "chromium(III) oxide"],
  ["TiO2", "Ti^4+ ×1, O^2- ×2", "titanium(IV) oxide"],
  ["MnO", "Mn^2+ ×1, O^2- ×1", "manganese(II) oxide"],
  ["NiO", "Ni^2+ ×1, O^2- ×1", "nickel oxide"],
  ["CoO", "Co^2+ ×1, O^2- ×1", "cobalt(II) oxide"],
  ["Cu2O", "Cu^+ ×2, O^2- ×1", "copper(I) oxide"],
  ["Ag2O", "Ag^+ ×2, O^2- ×1", "silver oxide"],
  ["HgO", "Hg^2+ ×1, O^2- ×1", "mercury(II) oxide"],
  ["MnS2", "Mn^2+ ×1, S2^2- ×1", "manganese(II) disulfide"],
  ["FeS2", "Fe^2+ ×1, S2^2- ×1", "iron(II) disulfide"],
  ["CuCl", "Cu^+ ×1, Cl^- ×1", "copper(I) chloride"],
  ["CuBr", "Cu^+ ×1, Br^- ×1", "copper(I) bromide"],
  ["CuI", "Cu^+ ×1, I^- ×1", "copper(I) iodide"],
  ["CuCl2", "Cu^2+ ×1, Cl^- ×2", "copper(II) chloride"],
  ["FeCl2", "Fe^2+ ×1, Cl^- ×2", "iron(II) chloride"],
  ["FeCl3", "Fe^3+ ×1, Cl^- ×3", "iron(III) chloride"],
  ["CoCl2", "Co^2+ ×1, Cl^- ×2", "cobalt(II) chloride"],
  ["NiCl2", "Ni^2+ ×1, Cl^- ×2", "nickel(II) chloride"],
  ["MnCl2", "Mn^2+ ×1, Cl^- ×2", "manganese(II) chloride"],
  ["CrCl3", "Cr^3+ ×1, Cl^- ×3", "chromium(III) chloride"],
  ["CdCl2", "Cd^2+ ×1, Cl^- ×2", "cadmium chloride"],
  ["Cr2(SO4)3", "Cr^3+ ×2, SO4^2- ×3", "chromium(III) sulfate"],
];

// from memory: Housecroft & Sharpe, Inorganic Chemistry (vanadyl and uranyl oxocations; tungstate,
// metavanadate and heptamolybdate anions; charges and names of ammine, aqua, cyano, chloro,
// oxalato and nitrosyl complexes)
const OXOCATION_AND_COMPLEX_SALTS: readonly (readonly [formula: string, ions: string, name: string | undefined])[] = [
  ["VOSO4", "VO^2+ ×1, SO4^2- ×1", "vanadyl sulfate"],
  ["UO2(NO3)2", "UO2^2+ ×1, NO3^- ×2", "uranyl nitrate"],
  ["NH4VO3", "NH4^+ ×1, VO3^- ×1", "ammonium metavanadate"],
  ["Na2WO4", "Na^+ ×2, WO4^2- ×1", "sodium tungstate"],
  ["(NH4)6Mo7O24", "NH4^+ ×6, Mo7O24^6- ×1", "ammonium heptamolybdate"],
  ["K3[Fe(CN)6]", "K^+ ×3, Fe(CN)6^3- ×1", "potassium hexacyanoferrate(III)"],
  ["K4[Fe(CN)6]", "K^+ ×4, Fe(CN)6^4- ×1", "potassium hexacyanoferrate(II)"],
  ["[Cu(NH3)4]SO4", "Cu(NH3)4^2+ ×1, SO4^2- ×1", "tetraamminecopper(II) sulfate"],
  ["[Co(NH3)6]Cl3", "Co(NH3)6^3+ ×1, Cl^- ×3", "hexaamminecobalt(III) chloride"],
  ["[Co(NH3)5Cl]Cl2", "Co(NH3)5Cl^2+ ×1, Cl^- ×2", "pentaamminechlorocobalt(III) chloride"],
  ["[Ag(NH3)2]NO3", "Ag(NH3)2^+ ×1, NO3^- ×1", "diamminesilver(I) nitrate"],
  ["K2[PtCl6]", "K^+ ×2, PtCl6^2- ×1", "potassium hexachloroplatinate(IV)"],
  ["K2[CuCl4]", "K^+ ×2, CuCl4^2- ×1", "potassium tetrachlorocuprate(II)"],
  // nitroprusside is named two ways (nitrosyl as NO+ or NO), so no name is made for it
  ["Na2[Fe(CN)5NO]", "Na^+ ×2, Fe(CN)5NO^2- ×1", undefined],
  ["[Cr(H2O)6]Cl3", "Cr(H2O)6^3+ ×1, Cl^- ×3", "hexaaquachromium(III) chloride"],
  ["K3[Fe(C2O4)3]", "K^+ ×3, Fe(C2O4)3^3- ×1", "potassium trioxalatoferrate(III)"],
  ["[Co(NH3)4Cl2]Cl", "Co(NH3)4Cl2^+ ×1, Cl^- ×1", "tetraamminedichlorocobalt(III) chloride"],
];

describe("salts of the d-block metals are their ions with the usual charges", () => {
  it.each(SALTS)("%s is %s (%s)", (formula, ions, name) => {
    expect(ionsOf(formula)).toBe(ions);
    const result = refused(formula);
    expect(result.problem.code).toBe("ionic-solid");
    expect(result.reading?.name).toBe(name);
  });

  it.each(OXOCATION_AND_COMPLEX_SALTS)("%s is %s", (formula, ions, name) => {
    expect(ionsOf(formula)).toBe(ions);
    const result = refused(formula);
    expect(result.problem.code).toBe("ionic-solid");
    expect(result.reading?.name).toBe(name);
  });

  it.each([...SALTS, ...OXOCATION_AND_COMPLEX_SALTS].map(([formula]) => formula))(
    "%s: the ions make up the formula exactly, and their charges cancel",
    (formula) => {
      const whole = analyzeSpecies(formula.replace(/\[|\]/g, ""));
      const parts = refused(formula).parts ?? [];
      const total = new Map<string, number>();
      let charge = 0;
      for (const part of parts) {
        const ion = analyzeSpecies(part.formula);
        const reading = ion.ok ? ion.value.reading : ion.reading;
        expect(reading, `${part.formula} reads`).toBeDefined();
        charge += reading!.charge * part.count;
        for (const atom of reading!.composition) total.set(atom.symbol, (total.get(atom.symbol) ?? 0) + atom.count * part.count);
      }
      expect(charge).toBe(0);
      const written = (whole.ok ? whole.value.reading : whole.reading)!.composition;
      const expected = new Map<string, number>();
      for (const atom of written) expected.set(atom.symbol, (expected.get(atom.symbol) ?? 0) + atom.count);
      expect(total).toEqual(expected);
    },
  );
});

describe("the metal centre: VSEPR says it does not decide the geometry", () => {
  // common practice: the coordination of a d-block ion follows ion size and ligand field, not electron pairs
  it.each(["CrO2", "V2O5", "FeCl2", "Cr2(SO4)3", "CoO", "Fe3O4"])("%s says no geometry is given for the metal", (formula) => {
    expect(refused(formula).problem.message).toMatch(/not by VSEPR, so no geometry is given for the metal/);
  });

  it.each([
    ["[Cu(NH3)4]SO4", "Cu(NH3)4^2+", "copper"],
    ["K3[Fe(CN)6]", "Fe(CN)6^3-", "iron"],
    ["VOSO4", "VO^2+", "vanadium"],
    ["K2[PtCl6]", "PtCl6^2-", "platinum"],
    ["[Co(NH3)5Cl]Cl2", "Co(NH3)5Cl^2+", "cobalt"],
  ])("%s: %s gets no shape, and says why", (formula, complex, metal) => {
    const result = refused(formula);
    expect(result.problem.message).toContain(`${complex}: its centre is ${metal}, a transition metal, so VSEPR predicts no shape`);
    const part = (result.parts ?? []).find((candidate) => candidate.formula === complex);
    expect(part?.analysis?.ok).toBe(false);
  });

  // common practice: the main-group anion keeps its VSEPR shape inside any salt
  it.each([
    ["Cr2(SO4)3", "SO4^2-", "tetrahedral"],
    ["[Cu(NH3)4]SO4", "SO4^2-", "tetrahedral"],
    ["[Ag(NH3)2]NO3", "NO3^-", "trigonal planar"],
    ["MnS2", "S2^2-", "linear (two atoms)"],
  ])("%s: %s is %s", (formula, ion, shape) => {
    expect(refused(formula).problem.message).toContain(`${ion}: ${shape}`);
  });
});

describe("ionic solids with considerable covalent character say so", () => {
  // from memory: Wells, Structural Inorganic Chemistry (wurtzite and zinc-blende structures, each
  // atom tetrahedral among four of the other)
  it.each([
    ["ZnO", "each Zn is bonded to 4 O (tetrahedral) and each O to 4 Zn (tetrahedral)"],
    ["ZnS", "each Zn is bonded to 4 S (tetrahedral) and each S to 4 Zn (tetrahedral)"],
    ["CdS", "each Cd is bonded to 4 S (tetrahedral) and each S to 4 Cd (tetrahedral)"],
    ["CuCl", "each Cu is bonded to 4 Cl (tetrahedral) and each Cl to 4 Cu (tetrahedral)"],
    ["CuI", "each Cu is bonded to 4 I (tetrahedral) and each I to 4 Cu (tetrahedral)"],
    ["AgI", "each Ag is bonded to 4 I (tetrahedral) and each I to 4 Ag (tetrahedral)"],
  ])("%s: %s", (formula, sites) => {
    const result = refused(formula);
    expect(result.problem.code).toBe("ionic-solid");
    expect(result.problem.message).toContain("considerable covalent character");
    expect(result.problem.message).toContain(sites);
  });

  // from memory: Greenwood & Earnshaw (rock-salt lattices of plainly ionic oxides and halides)
  it.each(["NaCl", "MgO", "CaO", "AgCl", "FeO"])("%s gets no such note", (formula) => {
    expect(refused(formula).problem.message).not.toContain("covalent character");
  });
});

describe("what is not a salt stays unsplit", () => {
  // from memory: Greenwood & Earnshaw (CrO3 is chains of CrO4 tetrahedra; Mn2O7 a molecular liquid;
  // OsO4 and RuO4 volatile molecules; TiCl4 and VCl4 molecular liquids; PdCl2 square-planar chains)
  it.each(["CrO3", "Mn2O7", "OsO4", "RuO4", "TiCl4", "VCl4", "PdCl2", "AuCl3"])("%s is not forced into ions", (formula) => {
    const result = refused(formula);
    expect(result.problem.code).toBe("transition-metal-centre");
    expect(result.parts).toBeUndefined();
  });

  // from memory: Greenwood & Earnshaw (Mn(IV), Cr(IV) and V(V) are found with oxide, not sulfide)
  it.each([
    ["MnS2", "Mn^4+"],
    ["VS2", "V^4+"],
  ])("%s is never read with %s beside sulfide", (formula, ion) => {
    const result = analyzeSpecies(formula);
    const parts = result.ok ? [] : (result.parts ?? []);
    expect(parts.map((part) => part.formula)).not.toContain(ion);
  });

  it("metasilicate is chains of tetrahedra, never a trigonal-planar ion", () => {
    // from memory: Greenwood & Earnshaw (metasilicates: corner-sharing SiO4 chains and rings)
    const ion = refused("SiO3^2-");
    expect(ion.problem.message).toMatch(/chains/);
    expect(ion.problem.message).not.toMatch(/is trigonal planar/);
    const salt = refused("Na2SiO3");
    expect(salt.problem.message).not.toContain("SiO3^2-: trigonal planar");
  });
});

describe("molecular metal halides keep their shape and get their Stock names", () => {
  // from memory: Greenwood & Earnshaw (gas-phase SnCl2 bent, SnCl4 tetrahedral, HgCl2 linear,
  // calomel a molecular solid of linear Cl-Hg-Hg-Cl units)
  it.each([
    ["SnCl2", "tin(II) chloride", "bent"],
    ["SnCl4", "tin(IV) chloride", "tetrahedral"],
    ["PbCl2", "lead(II) chloride", "bent"],
    ["HgCl2", "mercury(II) chloride", "linear"],
    ["Hg2Cl2", "mercury(I) chloride", "linear"],
    ["BiCl3", "bismuth(III) chloride", "trigonal pyramidal"],
  ])("%s is %s, %s", (formula, name, shape) => {
    const result = analyzeSpecies(formula);
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.value.reading.name).toBe(name);
    expect(result.value.centres.map((centre) => centre.molecularGeometry)).toContain(shape);
  });

  it.each(["Sn2Cl4", "Hg3Cl2"])("%s, not in lowest terms for a usual charge, gets no Stock name", (formula) => {
    const result = analyzeSpecies(formula);
    const reading = result.ok ? result.value.reading : result.reading;
    expect(reading?.name ?? "").not.toMatch(/\((?:I|II|III|IV)\)/);
  });
});

describe("lanthanide halides are salts", () => {
  // from memory: Cotton, Lanthanide and Actinide Chemistry (LnCl3 are ionic lattices of Ln3+)
  it.each([
    ["LaCl3", "La^3+ ×1, Cl^- ×3"],
    ["GdCl3", "Gd^3+ ×1, Cl^- ×3"],
    ["CeCl3", "Ce^3+ ×1, Cl^- ×3"],
  ])("%s is %s", (formula, ions) => {
    expect(ionsOf(formula)).toBe(ions);
  });
});
