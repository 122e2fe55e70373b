/**
 * Acids of halo-complex anions (HBF4, HPF6, H2PtCl6) and salts of such anions written without
 * brackets (K2PtCl6, Na3AlF6): read as their ions, never as one invented molecule. Ion formulas
 * and charges are checked against RDKit; shapes against the VSEPR tables of standard texts.
 */
import { beforeAll, describe, expect, it } from "vitest";
import { analyzeSpecies, readSpecies } from "../../shared/src/index";
import type { AnalysisResult, SpeciesPart } from "../../shared/src/index";
import { loadRdkit, rdkitAtoms, rdkitComposition } from "../multicentre/rdkitReference";

type Failure = Extract<AnalysisResult, { ok: false }>;

/** An ion as the core writes it, its count, its SMILES and its shape phrase. */
type IonRow = readonly [formula: string, count: number, smiles: string, shape: string];

const MONATOMIC = "monatomic ion, no shape of its own";
const PLATINUM = "its centre is platinum, a transition metal, so VSEPR predicts no shape";
const GOLD = "its centre is gold, a transition metal, so VSEPR predicts no shape";

// from memory: Greenwood & Earnshaw, Chemistry of the Elements (these acids are handled as
// solutions or as hydrates of H3O+ with the complex anion; BF4- tetrahedral, PF6-, SbF6- and
// SiF6 2- octahedral)
const ACIDS: readonly (readonly [written: string, formula: string, ions: readonly IonRow[]])[] = [
  [
    "HBF4",
    "HBF4",
    [
      ["H^+", 1, "[H+]", MONATOMIC],
      ["BF4^-", 1, "F[B-](F)(F)F", "tetrahedral"],
    ],
  ],
  [
    "tetrafluoroboric acid",
    "HBF4",
    [
      ["H^+", 1, "[H+]", MONATOMIC],
      ["BF4^-", 1, "F[B-](F)(F)F", "tetrahedral"],
    ],
  ],
  [
    "HPF6",
    "HPF6",
    [
      ["H^+", 1, "[H+]", MONATOMIC],
      ["PF6^-", 1, "F[P-](F)(F)(F)(F)F", "octahedral"],
    ],
  ],
  [
    "hexafluorophosphoric acid",
    "HPF6",
    [
      ["H^+", 1, "[H+]", MONATOMIC],
      ["PF6^-", 1, "F[P-](F)(F)(F)(F)F", "octahedral"],
    ],
  ],
  [
    "HSbF6",
    "HSbF6",
    [
      ["H^+", 1, "[H+]", MONATOMIC],
      ["SbF6^-", 1, "F[Sb-](F)(F)(F)(F)F", "octahedral"],
    ],
  ],
  [
    "H2SiF6",
    "H2SiF6",
    [
      ["H^+", 2, "[H+]", MONATOMIC],
      ["SiF6^2-", 1, "F[Si-2](F)(F)(F)(F)F", "octahedral"],
    ],
  ],
  [
    "hexafluorosilicic acid",
    "H2SiF6",
    [
      ["H^+", 2, "[H+]", MONATOMIC],
      ["SiF6^2-", 1, "F[Si-2](F)(F)(F)(F)F", "octahedral"],
    ],
  ],
  [
    "HAuCl4",
    "HAuCl4",
    [
      ["H^+", 1, "[H+]", MONATOMIC],
      ["AuCl4^-", 1, "Cl[Au-](Cl)(Cl)Cl", GOLD],
    ],
  ],
  [
    "H[AuCl4]",
    "H[AuCl4]",
    [
      ["H^+", 1, "[H+]", MONATOMIC],
      ["AuCl4^-", 1, "Cl[Au-](Cl)(Cl)Cl", GOLD],
    ],
  ],
  [
    "H2PtCl6",
    "H2PtCl6",
    [
      ["H^+", 2, "[H+]", MONATOMIC],
      ["PtCl6^2-", 1, "Cl[Pt-2](Cl)(Cl)(Cl)(Cl)Cl", PLATINUM],
    ],
  ],
];

// from memory: Greenwood & Earnshaw (potassium hexachloroplatinate(IV), cryolite, potassium
// hexachlorostannate(IV), potassium tetrachloroaurate(III); AlF6 3- and SnCl6 2- octahedral)
const SALTS: readonly (readonly [formula: string, ions: readonly IonRow[]])[] = [
  [
    "K2PtCl6",
    [
      ["K^+", 2, "[K+]", MONATOMIC],
      ["PtCl6^2-", 1, "Cl[Pt-2](Cl)(Cl)(Cl)(Cl)Cl", PLATINUM],
    ],
  ],
  [
    "KAuCl4",
    [
      ["K^+", 1, "[K+]", MONATOMIC],
      ["AuCl4^-", 1, "Cl[Au-](Cl)(Cl)Cl", GOLD],
    ],
  ],
  [
    "Na3AlF6",
    [
      ["Na^+", 3, "[Na+]", MONATOMIC],
      ["AlF6^3-", 1, "F[Al-3](F)(F)(F)(F)F", "octahedral"],
    ],
  ],
  [
    "K2SnCl6",
    [
      ["K^+", 2, "[K+]", MONATOMIC],
      ["SnCl6^2-", 1, "Cl[Sn-2](Cl)(Cl)(Cl)(Cl)Cl", "octahedral"],
    ],
  ],
];

function refused(input: string): Failure {
  const result = analyzeSpecies(input);
  if (result.ok) throw new Error(`${input} analysed as one molecule`);
  return result;
}

function summary(part: SpeciesPart): readonly [string, number, string] {
  const shape = part.monatomic ? MONATOMIC : part.analysis?.ok ? part.analysis.value.centres[0].molecularGeometry : "";
  const refusal = part.analysis && !part.analysis.ok ? part.analysis.problem.message : "";
  return [part.formula, part.count, shape || (refusal.includes("platinum") ? PLATINUM : refusal.includes("gold") ? GOLD : refusal)];
}

function composition(formula: string): { counts: Map<string, number>; charge: number } {
  const read = readSpecies(formula);
  if (!read.ok) throw new Error(`${formula} did not read: ${read.problem.message}`);
  return { counts: new Map(read.value.composition.map((part) => [part.symbol, part.count])), charge: read.value.charge };
}

describe("an acid of a halo-complex anion is H+ beside the anion", () => {
  it.each(ACIDS)("%s", (written, formula, ions) => {
    const result = refused(written);
    expect(result.problem.code, result.problem.message).toBe("ions-in-solution");
    expect(result.reading?.formula).toBe(formula);
    expect(result.parts?.map(summary)).toEqual(ions.map(([ion, count, , shape]) => [ion, count, shape]));
    // the card says what the acid is, never that an octet is exceeded
    expect(result.problem.message).toMatch(/solvated H\^\+/);
    expect(result.problem.message).not.toMatch(/octet/);
  });

  // common practice: the acid's name is the anion's "-ate" made "-ic acid", the Stock numeral kept
  it.each([
    ["HBF4", "tetrafluoroboric acid"],
    ["HPF6", "hexafluorophosphoric acid"],
    ["H2SiF6", "hexafluorosilicic acid"],
    ["HAuCl4", "tetrachloroauric(III) acid"],
    ["H2PtCl6", "hexachloroplatinic(IV) acid"],
  ])("%s is named %s", (formula, name) => {
    expect(refused(formula).reading?.name).toBe(name);
  });
});

describe("salts of bare halo-complex anions are their ions", () => {
  it.each(SALTS)("%s", (formula, ions) => {
    const result = refused(formula);
    expect(result.problem.code, result.problem.message).toBe("ionic-solid");
    expect(result.parts?.map(summary)).toEqual(ions.map(([ion, count, , shape]) => [ion, count, shape]));
  });
});

describe("ion formulas and charges agree with RDKit", () => {
  beforeAll(async () => {
    await loadRdkit();
  });

  // source: RDKit (WebAssembly build), element counts and formal charges of each ion's SMILES
  it.each([...ACIDS.map(([, formula, ions]) => [formula, ions] as const), ...SALTS])("%s", (formula, ions) => {
    const total = new Map<string, number>();
    let totalCharge = 0;
    for (const [ion, count, smiles] of ions) {
      const atoms = rdkitAtoms(smiles);
      const charge = atoms.reduce((sum, atom) => sum + atom.formalCharge, 0);
      const core = composition(ion);
      expect(core.counts, `${ion} against RDKit's ${smiles}`).toEqual(rdkitComposition(atoms));
      expect(core.charge, `charge of ${ion} against RDKit's ${smiles}`).toBe(charge);
      for (const [symbol, n] of core.counts) total.set(symbol, (total.get(symbol) ?? 0) + n * count);
      totalCharge += charge * count;
    }
    expect(totalCharge).toBe(0);
    expect(composition(formula).counts).toEqual(total);
  });
});

describe("other hydrogen compounds stay molecules", () => {
  // from memory: Greenwood & Earnshaw (oxoacids and hydrogen halides are molecules; trichlorosilane
  // and trichlorogermane are tetrahedral molecules with an Si-H or Ge-H bond)
  it.each(["HCl", "HF", "HNO3", "H2SO4", "HClO4", "HOCl", "HCN", "HSiCl3", "HGeCl3", "H3PO4"])("%s", (formula) => {
    const result = analyzeSpecies(formula);
    expect(result.ok, result.ok ? "" : result.problem.message).toBe(true);
  });
});
