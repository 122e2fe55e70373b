// Normal modes by symmetry, through the core's facade, against the worked examples of
// group-theory and vibrational-spectroscopy texts.
import { describe, expect, it } from "vitest";
import { analyzeSpecies, analyzeTyped, shapeOf, vibrationalModes, vibrationsOf, type VibrationalModes } from "../../shared/src/index";
import { crownRing, cubane } from "../support/moleculeBuilders";
import { randomlyPlaced, seededRandom } from "../support/randomFrames";

interface Case {
  readonly species: string;
  readonly group: string;
  /** Γvib as texts print it; term order does not matter. */
  readonly modes: string;
  readonly ir: number;
  readonly raman: number;
  readonly silent: number;
  /** Γstretch, where the text gives it. */
  readonly stretching?: string;
}

/** "2A1 + B2" as sorted terms, so that order does not matter. */
function terms(text: string): string[] {
  return text
    .split("+")
    .map((term) => term.trim())
    .filter(Boolean)
    .sort();
}

function written(list: VibrationalModes["representation"]): string[] {
  return terms(list.map((mode) => `${mode.count > 1 ? mode.count : ""}${mode.symmetry}`).join(" + "));
}

function modesOf(text: string): VibrationalModes {
  const result = analyzeTyped(text);
  if (!result.ok) throw new Error(`${text} was not analysed: ${result.problem.message}`);
  const vibrations = vibrationsOf(result.value);
  if (!vibrations.ok) throw new Error(`${text}: no vibrational analysis: ${vibrations.reason}`);
  return vibrations.value;
}

// Planar C2v molecules are placed in the yz plane and planar D2h ones with x normal to the plane
// and z along the C=C axis (Mulliken's recommended convention); texts that use the other plane
// swap B1 and B2 (B3 and B2), which changes no count.
const CASES: readonly Case[] = [
  // from memory: Cotton, "Chemical Applications of Group Theory", ch. 10 (H2O, NH3, CH4, the
  // stretching sets of AB_n molecules); Harris & Bertolucci, "Symmetry and Spectroscopy", ch. 3
  { species: "H2O", group: "C2v", modes: "2A1 + B2", ir: 3, raman: 3, silent: 0, stretching: "A1 + B2" },
  { species: "SO2", group: "C2v", modes: "2A1 + B2", ir: 3, raman: 3, silent: 0, stretching: "A1 + B2" },
  { species: "O3", group: "C2v", modes: "2A1 + B2", ir: 3, raman: 3, silent: 0 },
  { species: "NH3", group: "C3v", modes: "2A1 + 2E", ir: 4, raman: 4, silent: 0, stretching: "A1 + E" },
  { species: "CH4", group: "Td", modes: "A1 + E + 2T2", ir: 2, raman: 4, silent: 0, stretching: "A1 + T2" },
  { species: "SO4^2-", group: "Td", modes: "A1 + E + 2T2", ir: 2, raman: 4, silent: 0, stretching: "A1 + T2" },
  { species: "NH4+", group: "Td", modes: "A1 + E + 2T2", ir: 2, raman: 4, silent: 0 },
  { species: "CCl4", group: "Td", modes: "A1 + E + 2T2", ir: 2, raman: 4, silent: 0 },
  // from memory: Nakamoto, "Infrared and Raman Spectra of Inorganic and Coordination Compounds",
  // Part A: the tables of normal modes of linear triatomic, planar XY3, trigonal-bipyramidal,
  // octahedral, square-planar and pentagonal-bipyramidal molecules
  { species: "CO2", group: "D∞h", modes: "Σg+ + Σu+ + Πu", ir: 2, raman: 1, silent: 0, stretching: "Σg+ + Σu+" },
  { species: "CS2", group: "D∞h", modes: "Σg+ + Σu+ + Πu", ir: 2, raman: 1, silent: 0 },
  { species: "XeF2", group: "D∞h", modes: "Σg+ + Σu+ + Πu", ir: 2, raman: 1, silent: 0 },
  { species: "I3-", group: "D∞h", modes: "Σg+ + Σu+ + Πu", ir: 2, raman: 1, silent: 0 },
  { species: "N2O", group: "C∞v", modes: "2Σ+ + Π", ir: 3, raman: 3, silent: 0, stretching: "2Σ+" },
  { species: "HCN", group: "C∞v", modes: "2Σ+ + Π", ir: 3, raman: 3, silent: 0 },
  { species: "BF3", group: "D3h", modes: "A1′ + A2″ + 2E′", ir: 3, raman: 3, silent: 0, stretching: "A1′ + E′" },
  { species: "NO3-", group: "D3h", modes: "A1′ + A2″ + 2E′", ir: 3, raman: 3, silent: 0 },
  { species: "CO3^2-", group: "D3h", modes: "A1′ + A2″ + 2E′", ir: 3, raman: 3, silent: 0 },
  { species: "PCl5", group: "D3h", modes: "2A1′ + 2A2″ + 3E′ + E″", ir: 5, raman: 6, silent: 0, stretching: "2A1′ + A2″ + E′" },
  { species: "SF4", group: "C2v", modes: "4A1 + A2 + 2B1 + 2B2", ir: 8, raman: 9, silent: 0 },
  { species: "ClF3", group: "C2v", modes: "3A1 + B1 + 2B2", ir: 6, raman: 6, silent: 0 },
  { species: "XeF4", group: "D4h", modes: "A1g + B1g + B2g + A2u + B2u + 2Eu", ir: 3, raman: 3, silent: 1, stretching: "A1g + B1g + Eu" },
  { species: "BrF5", group: "C4v", modes: "3A1 + 2B1 + B2 + 3E", ir: 6, raman: 9, silent: 0 },
  { species: "IF5", group: "C4v", modes: "3A1 + 2B1 + B2 + 3E", ir: 6, raman: 9, silent: 0 },
  { species: "SF6", group: "Oh", modes: "A1g + Eg + T2g + 2T1u + T2u", ir: 2, raman: 3, silent: 1, stretching: "A1g + Eg + T1u" },
  { species: "PF6-", group: "Oh", modes: "A1g + Eg + T2g + 2T1u + T2u", ir: 2, raman: 3, silent: 1 },
  { species: "IF7", group: "D5h", modes: "2A1′ + 3E1′ + 2E2′ + 2A2″ + E1″ + E2″", ir: 5, raman: 5, silent: 1 },
  { species: "P4", group: "Td", modes: "A1 + E + T2", ir: 1, raman: 3, silent: 0 },
  // from memory: Herzberg, "Infrared and Raman Spectra of Polyatomic Molecules" (the symmetric
  // tops CH3Cl and CHCl3, CH2Cl2, acetylene, ethylene, ethane, benzene, allene) and Wilson,
  // Decius & Cross, "Molecular Vibrations" (benzene's 20 fundamentals)
  { species: "CH3Cl", group: "C3v", modes: "3A1 + 3E", ir: 6, raman: 6, silent: 0 },
  { species: "CHCl3", group: "C3v", modes: "3A1 + 3E", ir: 6, raman: 6, silent: 0 },
  { species: "CH2Cl2", group: "C2v", modes: "4A1 + A2 + 2B1 + 2B2", ir: 8, raman: 9, silent: 0 },
  { species: "C2H2", group: "D∞h", modes: "2Σg+ + Σu+ + Πg + Πu", ir: 2, raman: 3, silent: 0 },
  { species: "C2H4", group: "D2h", modes: "3Ag + Au + 2B1u + 2B2u + B3u + 2B3g + B2g", ir: 5, raman: 6, silent: 1 },
  { species: "C2H6", group: "D3d", modes: "3A1g + A1u + 2A2u + 3Eg + 3Eu", ir: 5, raman: 6, silent: 1 },
  {
    species: "C6H6",
    group: "D6h",
    modes: "2A1g + A2g + 2B2g + E1g + 4E2g + A2u + 2B1u + 2B2u + 3E1u + 2E2u",
    ir: 4,
    raman: 7,
    silent: 9,
  },
  { species: "smiles:C=C=C", group: "D2d", modes: "3A1 + B1 + 3B2 + 4E", ir: 7, raman: 11, silent: 0 },
  { species: "smiles:F/C=C/F", group: "C2h", modes: "5Ag + Bg + 2Au + 4Bu", ir: 6, raman: 6, silent: 0 },
  // from memory: vibrational analyses of cyclohexane (chair, D3d) and of cubane (Oh) in the
  // spectroscopy literature: 13 IR and 14 Raman fundamentals; 3 IR and 8 Raman fundamentals
  { species: "cyclohexane", group: "D3d", modes: "6A1g + 2A2g + 8Eg + 3A1u + 5A2u + 8Eu", ir: 13, raman: 14, silent: 5 },
  {
    species: "smiles:C12C3C4C1C5C2C3C45",
    group: "Oh",
    modes: "2A1g + 2Eg + T1g + 4T2g + 2A2u + 2Eu + 3T1u + 2T2u",
    ir: 3,
    raman: 8,
    silent: 7,
  },
];

describe("normal modes of textbook molecules", () => {
  it.each(CASES)("$species ($group): $modes; IR $ir, Raman $raman, silent $silent", (expected) => {
    const found = modesOf(expected.species);
    expect(found.pointGroup, `point group of ${expected.species}`).toBe(expected.group);
    expect(written(found.representation), `Γvib of ${expected.species}`).toEqual(terms(expected.modes));
    expect(found.irBands, `IR bands of ${expected.species}`).toBe(expected.ir);
    expect(found.ramanBands, `Raman bands of ${expected.species}`).toBe(expected.raman);
    expect(found.silent, `silent modes of ${expected.species}`).toBe(expected.silent);
    if (expected.stretching) expect(written(found.stretching), `Γstretch of ${expected.species}`).toEqual(terms(expected.stretching));
  });

  // from memory: Wilson, Decius & Cross: benzene has 30 normal modes in 20 fundamentals
  it("benzene: 30 modes in 20 fundamentals, 4 IR and 7 Raman bands, none in both", () => {
    const benzene = modesOf("C6H6");
    expect(benzene.modes).toBe(30);
    expect(benzene.representation.reduce((sum, mode) => sum + mode.count, 0)).toBe(20);
    expect(benzene.coincidences).toBe(0);
    expect(benzene.centrosymmetric).toBe(true);
  });

  // source: the mutual exclusion rule, and its converse for groups without i (C3v: every mode in both)
  it("coincidences: none for SF6 and CO2, every band for NH3", () => {
    expect(modesOf("SF6").coincidences).toBe(0);
    expect(modesOf("CO2").coincidences).toBe(0);
    expect(modesOf("NH3").coincidences).toBe(4);
  });
});

describe("species whose model is less symmetric than the molecule", () => {
  // from memory: descriptive inorganic chemistry texts: S8 is a D4d crown, P4O10 a Td cage,
  // I2Cl6 a planar D2h dimer; the model coordinates reach lower symmetry, so no band count is given
  it.each([
    ["S8", "D4d"],
    ["P4O10", "Td"],
    ["I2Cl6", "D2h"],
    ["smiles:S1SSSSSSS1", "D4d"],
  ])("%s says why, naming the real group %s, instead of counting bands", (species, realGroup) => {
    const result = analyzeTyped(species);
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    const vibrations = vibrationsOf(result.value);
    expect(vibrations.ok, `${species} must not get band counts from a model of lower symmetry`).toBe(false);
    if (!vibrations.ok) expect(vibrations.reason).toContain(realGroup);
  });

  // from memory: S8 (D4d): 2A1 + B1 + B2 + 2E1 + 3E2 + 2E3, 3 IR and 7 Raman fundamentals, B1 silent
  // (in the spectroscopy literature of elemental sulfur); counted here on D4d crown coordinates
  it("the D4d crown itself gives S8's published count", () => {
    const result = vibrationalModes(crownRing("S", 8, 1.7, 0.45), []);
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.value.pointGroup).toBe("D4d");
    expect(written(result.value.representation)).toEqual(terms("2A1 + B1 + B2 + 2E1 + 3E2 + 2E3"));
    expect([result.value.irBands, result.value.ramanBands, result.value.silent]).toEqual([3, 7, 1]);
  });
});

describe("properties", () => {
  // common practice: a spread of shapes, charges and organic molecules
  const SPECIES = [
    ...CASES.map((c) => c.species),
    "HCl",
    "N2",
    "H2S",
    "PH3",
    "SiH4",
    "BCl3",
    "ClO4-",
    "XeO4",
    "SF2",
    "ICl4-",
    "ClF5",
    "SeF6",
    "CH3OH",
    "HCOOH",
    "CH3COOH",
    "C3H8",
    "smiles:c1ccncc1",
    "smiles:CC(=O)Nc1ccc(O)cc1",
    "smiles:C1CCCCCCC1",
    "smiles:OC(=O)c1ccccc1",
    "smiles:F/C=C\\F",
    "C2N2",
    "C3O2",
    "H2O2",
    "N2H4",
  ];

  function atomCount(text: string): { atoms: number; linear: boolean; modes: VibrationalModes } {
    const result = analyzeTyped(text);
    if (!result.ok) throw new Error(`${text}: ${result.problem.message}`);
    const vibrations = vibrationsOf(result.value);
    if (!vibrations.ok) throw new Error(`${text}: ${vibrations.reason}`);
    return { atoms: result.value.graph.atoms.length, linear: /∞/.test(vibrations.value.pointGroup), modes: vibrations.value };
  }

  // source: a molecule of N atoms has 3N coordinates, less 3 translations and 3 rotations (2 if linear)
  it.each(SPECIES)("%s: modes = 3N − 6 (3N − 5 if linear), whole non-negative counts", (text) => {
    const { atoms, linear, modes } = atomCount(text);
    expect(modes.modes).toBe(3 * atoms - (linear ? 5 : 6));
    const sum = modes.representation.reduce((total, mode) => total + mode.count * mode.degeneracy, 0);
    expect(sum).toBe(modes.modes);
    for (const mode of [...modes.representation, ...modes.stretching]) {
      expect(Number.isInteger(mode.count) && mode.count > 0, `${mode.symmetry} × ${mode.count} in ${text}`).toBe(true);
    }
    expect(modes.irBands + modes.ramanBands - modes.coincidences + modes.silent).toBe(
      modes.representation.reduce((total, mode) => total + mode.count, 0),
    );
  });

  // source: the mutual exclusion rule: with an inversion centre no fundamental is both IR- and Raman-active
  it.each(SPECIES)("%s: centrosymmetric means no mode in both spectra", (text) => {
    const { modes } = atomCount(text);
    if (modes.centrosymmetric) expect(modes.representation.filter((mode) => mode.ir && mode.raman)).toEqual([]);
  });

  // common practice: the stretching modes are one per bond
  it.each(SPECIES)("%s: one stretching mode per bond", (text) => {
    const result = analyzeTyped(text);
    if (!result.ok) return;
    const vibrations = vibrationsOf(result.value);
    if (!vibrations.ok) return;
    const stretches = vibrations.value.stretching.reduce((total, mode) => total + mode.count * mode.degeneracy, 0);
    expect(stretches).toBe(result.value.graph.bonds.length);
  });

  // common practice: reusing the point-group search must give what a fresh search gives
  it.each(SPECIES)("%s: the analysis of the species equals a fresh analysis of its coordinates", (text) => {
    const result = analyzeTyped(text);
    if (!result.ok) throw new Error(result.problem.message);
    const atoms = shapeOf(result.value).coordinates.atoms.map((atom) => ({ element: atom.symbol, position: atom.position }));
    const bonds = result.value.graph.bonds.map((bond): [number, number] => [bond.from, bond.to]);
    expect(vibrationsOf(result.value)).toEqual(vibrationalModes(atoms, bonds));
  });

  // source: symmetry does not depend on where a molecule sits or how it is turned
  it.each([
    ["cubane", cubane()],
    ["S8 crown", crownRing("S", 8, 1.7, 0.45)],
  ] as const)("%s: the same modes wherever the coordinates are placed", (_name, atoms) => {
    const reference = vibrationalModes(atoms, []);
    const random = seededRandom(15);
    for (let trial = 0; trial < 5; trial++) {
      const moved = vibrationalModes(randomlyPlaced(atoms, random), []);
      expect(moved).toEqual(reference);
    }
  });

  // common practice: bad input gets a reason, never an exception
  it.each([
    ["no atoms", []],
    ["one atom", [{ element: "Ar", position: [0, 0, 0] as const }]],
    [
      "atoms on top of each other",
      [
        { element: "H", position: [0, 0, 0] as const },
        { element: "H", position: [0, 0, 0] as const },
      ],
    ],
    [
      "a coordinate that is not a number",
      [
        { element: "H", position: [0, 0, Number.NaN] as const },
        { element: "H", position: [0, 0, 1] as const },
      ],
    ],
  ])("%s: a reason, no exception", (_name, atoms) => {
    const result = vibrationalModes(atoms, []);
    expect(result.ok).toBe(false);
  });

  it("a species without a model of its own (one atom) gets a reason", () => {
    const argon = analyzeSpecies("Ar");
    if (argon.ok) expect(vibrationsOf(argon.value).ok).toBe(false);
  });
});
