import { describe, expect, it } from "vitest";
import type { SpeciesAnalysis } from "../../shared/src/index";
import { analysisOf, centreOf, neighboursOf } from "./analysisHelpers";
import {
  ELECTRON_DEFICIENT,
  EXPANDED_OCTET,
  FULL_OCTETS,
  HUB_FORMAL_CHARGES,
  ION_SHAPES,
  MOLECULE_SHAPES,
  MULTI_CENTRE,
  NAMES,
  NOT_RADICALS,
  NOTATIONS,
  NO_EXPANDED_OCTET,
  RADICALS,
  RESONANCE_FORMS,
  SKELETONS,
  VALENCE_ELECTRON_COUNTS,
} from "./data/lewis";

/** Index of the atom of `symbol` with the most bonds: the centre of the skeleton. */
function hubIndex(analysis: SpeciesAnalysis, symbol: string): number {
  let best = -1;
  analysis.graph.atoms.forEach((atom, index) => {
    if (atom.symbol !== symbol) return;
    if (best < 0 || neighboursOf(analysis, index).length > neighboursOf(analysis, best).length) best = index;
  });
  if (best < 0) throw new Error(`${analysis.reading.text}: no ${symbol} atom in the Lewis structure`);
  return best;
}

function describeGraph(analysis: SpeciesAnalysis): string {
  const atoms = analysis.graph.atoms.map((atom, i) => `${i}:${atom.symbol}(fc ${atom.formalCharge}, lp ${atom.lonePairs})`).join(" ");
  const bonds = analysis.graph.bonds.map((bond) => `${bond.from}-${bond.to}x${bond.order}`).join(" ");
  return `atoms ${atoms}; bonds ${bonds}`;
}

/** Electrons around an atom in the Lewis structure: two per bond and per lone pair, plus odd ones. */
function electronsAround(analysis: SpeciesAnalysis, index: number): number {
  const atom = analysis.graph.atoms[index];
  const bonded = analysis.graph.bonds
    .filter((bond) => bond.from === index || bond.to === index)
    .reduce((sum, bond) => sum + 2 * bond.order, 0);
  return bonded + 2 * atom.lonePairs + atom.unpairedElectrons;
}

const PERIOD_TWO = new Set(["Li", "Be", "B", "C", "N", "O", "F", "Ne"]);

describe("valence electron counts", () => {
  it.each(VALENCE_ELECTRON_COUNTS)("$species has $valenceElectrons", ({ species, valenceElectrons }) => {
    expect(analysisOf(species).valenceElectrons, species).toBe(valenceElectrons);
  });

  it.each(VALENCE_ELECTRON_COUNTS)(
    "$species: bonds, lone pairs and odd electrons account for every electron",
    ({ species, valenceElectrons }) => {
      // common practice: a Lewis structure places each valence electron exactly once
      const analysis = analysisOf(species);
      const placed =
        analysis.graph.bonds.reduce((sum, bond) => sum + 2 * bond.order, 0) +
        analysis.graph.atoms.reduce((sum, atom) => sum + 2 * atom.lonePairs + atom.unpairedElectrons, 0);
      expect(placed, `${species}: ${describeGraph(analysis)}`).toBe(valenceElectrons);
    },
  );

  it.each(VALENCE_ELECTRON_COUNTS)("$species: formal charges add up to the charge", ({ species }) => {
    // common practice: the formal charges of a Lewis structure sum to the species' charge
    const analysis = analysisOf(species);
    const total = analysis.graph.atoms.reduce((sum, atom) => sum + atom.formalCharge, 0);
    expect(total, `${species}: ${describeGraph(analysis)}`).toBe(analysis.reading.charge);
  });
});

describe("resonance", () => {
  it.each(RESONANCE_FORMS)("$species has $forms equivalent structures", ({ species, forms }) => {
    expect(analysisOf(species).resonanceForms, species).toBe(forms);
  });
});

describe("formal charges", () => {
  it.each(HUB_FORMAL_CHARGES)("$species: central $hub carries $hubFormalCharge", ({ species, hub, hubFormalCharge }) => {
    const analysis = analysisOf(species);
    const index = hubIndex(analysis, hub);
    expect(analysis.graph.atoms[index].formalCharge, `${species}: ${describeGraph(analysis)}`).toBe(hubFormalCharge);
  });

  it("CO: triple bond, C -1 and O +1", () => {
    // from memory: general chemistry text conventions
    const analysis = analysisOf("CO");
    const carbon = analysis.graph.atoms.findIndex((atom) => atom.symbol === "C");
    const oxygen = analysis.graph.atoms.findIndex((atom) => atom.symbol === "O");
    const detail = describeGraph(analysis);
    expect(analysis.graph.bonds, detail).toHaveLength(1);
    expect(analysis.graph.bonds[0].order, detail).toBe(3);
    expect(analysis.graph.atoms[carbon].formalCharge, detail).toBe(-1);
    expect(analysis.graph.atoms[oxygen].formalCharge, detail).toBe(1);
  });

  it("O3: one terminal O neutral and the other -1", () => {
    // from memory: general chemistry text conventions
    const analysis = analysisOf("O3");
    const centre = hubIndex(analysis, "O");
    const ends = analysis.graph.atoms
      .filter((_, i) => i !== centre)
      .map((atom) => atom.formalCharge)
      .sort();
    expect(ends, describeGraph(analysis)).toEqual([-1, 0]);
  });
});

describe("skeleton chosen by formal charges", () => {
  it.each(SKELETONS)("$species: $hub in the middle, bonded to $neighbours", ({ species, hub, neighbours }) => {
    const analysis = analysisOf(species);
    const index = hubIndex(analysis, hub);
    const bonded = neighboursOf(analysis, index)
      .map((i) => analysis.graph.atoms[i].symbol)
      .sort();
    expect(bonded, `${species}: ${describeGraph(analysis)}`).toEqual([...neighbours].sort());
  });
});

describe("electron-deficient centres", () => {
  it.each(ELECTRON_DEFICIENT)("%s is electron-deficient with single bonds only", (species) => {
    const analysis = analysisOf(species);
    expect(analysis.electronDeficient, species).toBe(true);
    expect(
      analysis.graph.bonds.map((bond) => bond.order),
      describeGraph(analysis),
    ).toEqual(analysis.graph.bonds.map(() => 1));
    expect(analysis.warnings.length, `${species}: the reader should be told`).toBeGreaterThan(0);
  });

  it.each(FULL_OCTETS)("%s is not electron-deficient", (species) => {
    expect(analysisOf(species).electronDeficient, species).toBe(false);
  });
});

describe("radicals", () => {
  it.each(RADICALS)("%s is a radical with one unpaired electron", (species) => {
    const analysis = analysisOf(species);
    expect(analysis.radical, species).toBe(true);
    const unpaired = analysis.graph.atoms.reduce((sum, atom) => sum + atom.unpairedElectrons, 0);
    expect(unpaired, describeGraph(analysis)).toBe(1);
    expect(analysis.warnings.length, `${species}: the reader should be told`).toBeGreaterThan(0);
  });

  it.each(NOT_RADICALS)("%s is not a radical", (species) => {
    const analysis = analysisOf(species);
    expect(analysis.radical, species).toBe(false);
    expect(
      analysis.graph.atoms.every((atom) => atom.unpairedElectrons === 0),
      describeGraph(analysis),
    ).toBe(true);
  });
});

describe("expanded octets", () => {
  it.each(EXPANDED_OCTET)("%s has an expanded octet", (species) => {
    expect(analysisOf(species).expandedOctet, species).toBe(true);
  });

  it.each(NO_EXPANDED_OCTET)("%s has no expanded octet", (species) => {
    expect(analysisOf(species).expandedOctet, species).toBe(false);
  });

  it.each([...EXPANDED_OCTET, ...NO_EXPANDED_OCTET])("%s: no period-2 atom above 8 electrons, no H above 2", (species) => {
    // common practice: period-2 atoms have only 2s and 2p orbitals; hydrogen only 1s
    const analysis = analysisOf(species);
    analysis.graph.atoms.forEach((atom, index) => {
      const around = electronsAround(analysis, index);
      if (PERIOD_TWO.has(atom.symbol))
        expect(around, `${species} ${atom.symbol}${index}: ${describeGraph(analysis)}`).toBeLessThanOrEqual(8);
      if (atom.symbol === "H") expect(around, `${species} H${index}`).toBeLessThanOrEqual(2);
    });
  });
});

describe("ions and other centres", () => {
  it.each([...ION_SHAPES, ...MOLECULE_SHAPES])(
    "$species: $centre is $axe, $molecularGeometry",
    ({ species, centre, axe, molecularGeometry }) => {
      const found = centreOf(analysisOf(species), centre);
      expect({ axe: found.axe, molecularGeometry: found.molecularGeometry }, species).toEqual({ axe, molecularGeometry });
    },
  );
});

// common practice: the steric number fixes the electron geometry and the textbook hybridization label
const BY_STERIC_NUMBER: Readonly<Record<number, { electronGeometry: string; hybridization: string }>> = {
  2: { electronGeometry: "linear", hybridization: "sp" },
  3: { electronGeometry: "trigonal planar", hybridization: "sp2" },
  4: { electronGeometry: "tetrahedral", hybridization: "sp3" },
  5: { electronGeometry: "trigonal bipyramidal", hybridization: "sp3d" },
  6: { electronGeometry: "octahedral", hybridization: "sp3d2" },
  7: { electronGeometry: "pentagonal bipyramidal", hybridization: "sp3d3" },
};

describe("electron geometry and hybridization follow the steric number", () => {
  it.each([...ION_SHAPES, ...MOLECULE_SHAPES])("$species", ({ species, centre }) => {
    const found = centreOf(analysisOf(species), centre);
    const got = { electronGeometry: found.electronGeometry, hybridization: found.hybridization };
    expect(got, `${species} ${found.axe}, steric number ${found.stericNumber}`).toEqual(BY_STERIC_NUMBER[found.stericNumber]);
  });
});

describe("several centres, H on O", () => {
  it.each(MULTI_CENTRE)("$species", ({ species, centres }) => {
    const analysis = analysisOf(species);
    const got = analysis.centres.map((c) => `${c.atom} ${c.axe} ${c.molecularGeometry}`).sort();
    const want = centres.flatMap((c) => Array.from({ length: c.count }, () => `${c.atom} ${c.axe} ${c.molecularGeometry}`)).sort();
    expect(got, `${species}: got [${got.join(", ")}], want [${want.join(", ")}]; ${describeGraph(analysis)}`).toEqual(want);
  });

  // Formamide's N is nearly planar in the gas phase, so its shape is left open; its fields must still agree.
  const consistencyOnly = [...MULTI_CENTRE.map((row) => row.species), "HCONH2"].map((species) => ({ species }));

  it.each(consistencyOnly)("$species: every centre's AXE agrees with its lone pairs and steric number", ({ species }) => {
    // common practice: AX(n)E(m) means n bonding domains and m lone pairs, steric number n + m
    for (const centre of analysisOf(species).centres) {
      const lonePart = centre.lonePairs > 0 ? `E${centre.lonePairs}` : "";
      const where = `${species} ${centre.atom}${centre.index} (${centre.axe}, ${centre.lonePairs} lone pairs, steric number ${centre.stericNumber})`;
      expect(centre.axe, where).toBe(`AX${centre.bondingDomains}${lonePart}`);
      expect(centre.stericNumber, where).toBe(centre.bondingDomains + centre.lonePairs);
    }
  });
});

describe("names analyse like their formulas", () => {
  it.each(NAMES)('"$name" is $formula', ({ name, formula, centre }) => {
    const byName = analysisOf(name);
    const byFormula = analysisOf(formula);
    expect(byName.reading.notation).toBe("name");
    const summary = (analysis: SpeciesAnalysis) => {
      const found = centreOf(analysis, centre);
      const composition = analysis.reading.composition.map((part) => `${part.symbol}${part.count}`).sort();
      return {
        composition,
        charge: analysis.reading.charge,
        valenceElectrons: analysis.valenceElectrons,
        axe: found.axe,
        molecularGeometry: found.molecularGeometry,
      };
    };
    expect(summary(byName), name).toEqual(summary(byFormula));
  });
});

describe("other notations analyse like the plain formula", () => {
  it.each(NOTATIONS)("$written is $plain", ({ written, plain, centre }) => {
    const summary = (analysis: SpeciesAnalysis) => ({
      formula: analysis.reading.formula,
      charge: analysis.reading.charge,
      valenceElectrons: analysis.valenceElectrons,
      axe: centreOf(analysis, centre).axe,
    });
    expect(summary(analysisOf(written)), written).toEqual(summary(analysisOf(plain)));
  });
});
