/**
 * Lewis diagrams through the core's facade: the SVG is read back with a general-purpose XML
 * parser and what it draws (dots, bond lines, charges, brackets, positions) is compared with the
 * analysis and with Lewis structures as textbooks draw them.
 */
import { describe, expect, it } from "vitest";
import {
  analyzeSmiles,
  analyzeSpecies,
  chargeLabel,
  hoverMarkdown,
  lewisDiagram,
  type LewisDiagram,
  type SpeciesAnalysis,
} from "../../shared/src/index";
import { parseXml, type XmlElement } from "../support/parseXml";

function analysed(text: string): SpeciesAnalysis {
  const result = text.startsWith("smiles:") ? analyzeSmiles(text.slice("smiles:".length)) : analyzeSpecies(text);
  if (!result.ok) throw new Error(`${text} was not analysed: ${result.problem.message}`);
  return result.value;
}

function diagramOf(text: string, form?: number): LewisDiagram {
  const result = lewisDiagram(analysed(text), { form });
  if (!result.ok) throw new Error(`${text} was not drawn: ${result.message}`);
  return result.diagram;
}

interface Drawn {
  readonly elements: XmlElement[];
  readonly atoms: Map<number, { symbol: string; x: number; y: number }>;
  readonly bondLines: XmlElement[];
  readonly dotsByAtom: Map<number, number>;
  readonly chargeByAtom: Map<number, string>;
}

function read(svg: string): Drawn {
  const elements = parseXml(svg);
  const atoms = new Map<number, { symbol: string; x: number; y: number }>();
  const dotsByAtom = new Map<number, number>();
  const chargeByAtom = new Map<number, string>();
  for (const element of elements) {
    const atom = Number(element.attributes["data-atom"]);
    if (element.attributes.class === "atom")
      atoms.set(atom, { symbol: element.text, x: Number(element.attributes.x), y: Number(element.attributes.y) });
    if (element.attributes.class === "electron") dotsByAtom.set(atom, (dotsByAtom.get(atom) ?? 0) + 1);
    if (element.attributes.class === "formal-charge") chargeByAtom.set(atom, element.text);
  }
  return { elements, atoms, bondLines: elements.filter((element) => element.attributes.class === "bond"), dotsByAtom, chargeByAtom };
}

/** Degrees between the directions from `centre` to `first` and to `second`. */
function angleAt(centre: { x: number; y: number }, first: { x: number; y: number }, second: { x: number; y: number }): number {
  const a = Math.atan2(first.y - centre.y, first.x - centre.x);
  const b = Math.atan2(second.y - centre.y, second.x - centre.x);
  const difference = Math.abs(((a - b) * 180) / Math.PI) % 360;
  return difference > 180 ? 360 - difference : difference;
}

// A spread of what the core analyses: single centres of every electron geometry, ions, radicals,
// resonance hybrids, chains and rings from formulas and from SMILES.
const SPECIES = [
  "H2O",
  "NH3",
  "CH4",
  "CO2",
  "HCN",
  "BF3",
  "SF4",
  "ClF3",
  "XeF2",
  "XeF4",
  "PCl5",
  "SF6",
  "BrF5",
  "XeOF4",
  "IF7",
  "NO3-",
  "SO4^2-",
  "NH4+",
  "O3",
  "NO2",
  "ClO2",
  "NO",
  "Ar",
  "Cl-",
  "CO",
  "N2",
  "I3-",
  "CH3COOH",
  "C2H5OH",
  "H2O2",
  "smiles:c1ccccc1",
  "smiles:CC(=O)[O-]",
  "smiles:CC(=O)Oc1ccccc1C(=O)O",
  "smiles:C[N+](C)(C)C",
];

describe("Lewis diagram: what is drawn matches the structure", () => {
  it.each(SPECIES)("%s parses as XML and draws every electron, bond line and charge", (text) => {
    const analysis = analysed(text);
    const diagram = diagramOf(text);
    // A general-purpose parser in strict mode; it throws on anything not well-formed.
    const drawn = read(diagram.svg);
    expect(drawn.elements[0].name, "root element").toBe("svg");
    expect(drawn.atoms.size, "one symbol per atom").toBe(analysis.graph.atoms.length);

    analysis.graph.atoms.forEach((atom, index) => {
      // common practice: a lone pair is drawn as two dots, an unpaired electron as one
      expect(drawn.dotsByAtom.get(index) ?? 0, `dots on ${atom.symbol} #${index} of ${text}`).toBe(
        2 * atom.lonePairs + atom.unpairedElectrons,
      );
      expect(drawn.atoms.get(index)?.symbol).toBe(atom.symbol);
      // common practice: a non-zero formal charge is written beside its atom; a lone atom's is the ion's, outside the brackets
      const expected = atom.formalCharge === 0 || analysis.graph.atoms.length === 1 ? undefined : chargeLabel(atom.formalCharge);
      expect(drawn.chargeByAtom.get(index), `formal charge on ${atom.symbol} #${index} of ${text}`).toBe(expected);
    });
    analysis.graph.bonds.forEach((bond, index) => {
      // common practice: a single bond is one line, a double bond two, a triple bond three
      const lines = drawn.bondLines.filter((line) => line.attributes["data-bond"] === String(index));
      expect(lines.length, `lines for bond ${bond.from}-${bond.to} of ${text}`).toBe(bond.order);
    });

    const brackets = drawn.elements.filter((element) => element.attributes.class === "ion-bracket");
    const ionCharge = drawn.elements.find((element) => element.attributes.class === "ion-charge");
    // common practice: an ion's Lewis structure stands in square brackets with the charge outside, top right
    expect(brackets.length, `brackets of ${text}`).toBe(analysis.reading.charge === 0 ? 0 : 2);
    expect(ionCharge?.text).toBe(analysis.reading.charge === 0 ? undefined : chargeLabel(analysis.reading.charge));
  });
});

describe("Lewis diagram: textbook structures", () => {
  // Each row: species, lines per bond (sorted), dots on the centre (or the first atom listed),
  // formal charges drawn (sorted), equivalent structures.
  it.each([
    // from memory: Zumdahl, Chemistry, ch. 8 (water: two single bonds, two lone pairs on O)
    ["H2O", [1, 1], "O", 4, [], 1],
    // from memory: Zumdahl, Chemistry, ch. 8 (carbon dioxide: two double bonds, no charges)
    ["CO2", [2, 2], "C", 0, [], 1],
    // from memory: Housecroft and Sharpe, Inorganic Chemistry, ch. 2 (SF4: one lone pair on S)
    ["SF4", [1, 1, 1, 1], "S", 2, [], 1],
    // from memory: Housecroft and Sharpe, Inorganic Chemistry, ch. 2 (ClF3: two lone pairs on Cl)
    ["ClF3", [1, 1, 1], "Cl", 4, [], 1],
    // from memory: Housecroft and Sharpe, Inorganic Chemistry, ch. 2 (XeF4: two lone pairs on Xe)
    ["XeF4", [1, 1, 1, 1], "Xe", 4, [], 1],
    // from memory: Zumdahl, Chemistry, ch. 8 (nitrate: N+ with one N=O, two O-, three resonance structures)
    ["NO3-", [1, 1, 2], "N", 0, ["+", "−", "−"], 3],
    // from memory: Zumdahl, Chemistry, ch. 8 (ozone: central O+ with one lone pair, terminal O-, two resonance structures)
    ["O3", [1, 2], "O", 2, ["+", "−"], 2],
    // from memory: Zumdahl, Chemistry, ch. 8 (carbon monoxide: triple bond, C- and O+)
    ["CO", [3], "C", 2, ["+", "−"], 1],
    // from memory: Zumdahl, Chemistry, ch. 8 (ammonium: four single bonds, N+)
    ["NH4+", [1, 1, 1, 1], "N", 0, ["+"], 1],
    // from memory: Zumdahl, Chemistry, ch. 8 (nitric oxide: N=O with the odd electron on N)
    ["NO", [2], "N", 3, [], 1],
    // from memory: Housecroft and Sharpe, Inorganic Chemistry, ch. 2 (triiodide: three lone pairs on the central I-)
    ["I3-", [1, 1], "I", 6, ["−"], 1],
    // from memory: Zumdahl, Chemistry, ch. 8 (carbonate: C with one C=O and two O-, three resonance structures)
    ["CO3^2-", [1, 1, 2], "C", 0, ["−", "−"], 3],
  ] as const)("%s", (text, bondLines, centreSymbol, centreDots, charges, structures) => {
    const diagram = diagramOf(text);
    const drawn = read(diagram.svg);
    const linesPerBond = new Map<string, number>();
    for (const line of drawn.bondLines)
      linesPerBond.set(line.attributes["data-bond"], (linesPerBond.get(line.attributes["data-bond"]) ?? 0) + 1);
    expect([...linesPerBond.values()].sort(), "lines per bond").toEqual([...bondLines]);
    const centre = [...drawn.atoms].find(([, atom]) => atom.symbol === centreSymbol);
    const centreIndex = centre?.[0] ?? -1;
    // The centre is the atom with most bonds.
    const degree = (index: number) =>
      drawn.bondLines.filter((l) => l.attributes["data-from"] === String(index) || l.attributes["data-to"] === String(index)).length;
    const mostBonded = [...drawn.atoms.keys()].sort((a, b) => degree(b) - degree(a))[0];
    const counted = drawn.atoms.size > 2 ? mostBonded : centreIndex;
    expect(drawn.atoms.get(counted)?.symbol).toBe(centreSymbol);
    expect(drawn.dotsByAtom.get(counted) ?? 0, "dots on the centre").toBe(centreDots);
    expect([...drawn.chargeByAtom.values()].sort(), "formal charges drawn").toEqual([...charges].sort());
    const caption = drawn.elements.find((element) => element.attributes.class === "caption");
    if (structures > 1) expect(caption?.text).toBe(`one of ${structures} equivalent structures`);
    else expect(caption).toBeUndefined();
  });
});

describe("Lewis diagram: one-centre layouts read as their shapes", () => {
  function centreAndOuter(text: string) {
    const drawn = read(diagramOf(text).svg);
    const entries = [...drawn.atoms.values()];
    const centre = entries[0];
    return { centre, outer: entries.slice(1) };
  }
  function pairAngles(text: string): number[] {
    const { centre, outer } = centreAndOuter(text);
    const angles: number[] = [];
    for (let i = 0; i < outer.length; i++)
      for (let j = i + 1; j < outer.length; j++) angles.push(Math.round(angleAt(centre, outer[i], outer[j])));
    return angles.sort((a, b) => a - b);
  }

  // from memory: Housecroft and Sharpe, Inorganic Chemistry, ch. 2 (seesaw: two axial F in line, two equatorial on one side)
  it("SF4 is a seesaw: two F in line through S, the other two below the line, the lone pair above", () => {
    const { centre, outer } = centreAndOuter("SF4");
    expect(pairAngles("SF4")).toContain(180);
    const axial = outer.filter((atom) => Math.abs(atom.y - centre.y) < 1);
    const legs = outer.filter((atom) => Math.abs(atom.y - centre.y) >= 1);
    expect(axial.length).toBe(2);
    expect(
      legs.every((atom) => atom.y > centre.y),
      "both equatorial F below the axis (y grows downwards)",
    ).toBe(true);
  });

  // from memory: Housecroft and Sharpe, Inorganic Chemistry, ch. 2 (T-shape: two F in line, one at 90°)
  it("ClF3 is a T: angles 90, 90 and 180", () => {
    expect(pairAngles("ClF3")).toEqual([90, 90, 180]);
  });

  // from memory: Housecroft and Sharpe, Inorganic Chemistry, ch. 2 (square planar XeF4)
  it("XeF4 is a square: four angles of 90 and two of 180", () => {
    expect(pairAngles("XeF4")).toEqual([90, 90, 90, 90, 180, 180]);
  });

  // from memory: Housecroft and Sharpe, Inorganic Chemistry, ch. 2 (octahedral SF6: three trans pairs)
  it("SF6 shows three F pairs in line through S", () => {
    expect(pairAngles("SF6").filter((angle) => angle === 180).length).toBe(3);
  });

  // from memory: Zumdahl, Chemistry, ch. 8 (tetrahedral CH4 drawn as a cross on paper)
  it("CH4 is drawn as a cross", () => {
    expect(pairAngles("CH4")).toEqual([90, 90, 90, 90, 180, 180]);
  });
});

describe("Lewis diagram: several centres without crossings", () => {
  // common practice: a structure diagram draws no bond across another and no atom on another
  it.each([
    "C2H5OH",
    "CH3COOH",
    "H2O2",
    "N2H4",
    "smiles:CC(=O)Oc1ccccc1C(=O)O",
    "smiles:CN1C=NC2=C1C(=O)N(C(=O)N2C)C",
    "smiles:c1ccc2ccccc2c1",
    "smiles:CC(C)CC(C)(C)C",
    "smiles:CC(C)Cc1ccc(cc1)C(C)C(=O)O",
    "smiles:c1ccc2c(c1)ccc1ccccc12",
    "smiles:C1CCCCC1",
    "smiles:CCOC(C)=O",
  ])("%s", (text) => {
    const analysis = analysed(text);
    const drawn = read(diagramOf(text).svg);
    const at = (index: number) => drawn.atoms.get(index)!;
    const bonds = analysis.graph.bonds;
    const crossings: string[] = [];
    const cross = (o: { x: number; y: number }, a: { x: number; y: number }, b: { x: number; y: number }) =>
      (a.x - o.x) * (b.y - o.y) - (a.y - o.y) * (b.x - o.x);
    for (let i = 0; i < bonds.length; i++) {
      for (let j = i + 1; j < bonds.length; j++) {
        const [p, q, r, s] = [bonds[i].from, bonds[i].to, bonds[j].from, bonds[j].to];
        if (new Set([p, q, r, s]).size < 4) continue;
        const d1 = cross(at(r), at(s), at(p));
        const d2 = cross(at(r), at(s), at(q));
        const d3 = cross(at(p), at(q), at(r));
        const d4 = cross(at(p), at(q), at(s));
        if (d1 * d2 < 0 && d3 * d4 < 0) crossings.push(`${p}-${q} x ${r}-${s}`);
      }
    }
    expect(crossings, `bonds crossing in ${text}`).toEqual([]);
    const atoms = [...drawn.atoms.values()];
    let closest = Infinity;
    for (let i = 0; i < atoms.length; i++)
      for (let j = i + 1; j < atoms.length; j++) closest = Math.min(closest, Math.hypot(atoms[i].x - atoms[j].x, atoms[i].y - atoms[j].y));
    // Symbols are drawn 16 px high and at most about 16 px wide: closer than 20 px they would touch.
    expect(closest, `closest two atoms of ${text} (px)`).toBeGreaterThan(20);
  });
});

describe("Lewis diagram: equivalent structures one by one", () => {
  it("nitrate's three structures put the double bond on a different O each time", () => {
    const doubleBonded = new Set<string>();
    for (const form of [1, 2, 3]) {
      const diagram = diagramOf("NO3-", form);
      expect(diagram.form).toBe(form);
      // from memory: Zumdahl, Chemistry, ch. 8 (three resonance structures of nitrate)
      expect(diagram.drawableForms).toBe(3);
      const double = diagram.graph.bonds.findIndex((bond) => bond.order === 2);
      doubleBonded.add(String(diagram.graph.bonds[double].to === 0 ? diagram.graph.bonds[double].from : diagram.graph.bonds[double].to));
      const drawn = read(diagram.svg);
      const caption = drawn.elements.find((element) => element.attributes.class === "caption");
      expect(caption?.text).toContain("one of 3 equivalent structures");
      diagram.graph.atoms.forEach((atom, index) =>
        expect(drawn.dotsByAtom.get(index) ?? 0).toBe(2 * atom.lonePairs + atom.unpairedElectrons),
      );
    }
    expect(doubleBonded.size).toBe(3);
  });

  it.each([
    // from memory: Zumdahl, Chemistry, ch. 8 (two Kekulé structures of benzene)
    ["smiles:c1ccccc1", 2],
    // from memory: Clayden, Organic Chemistry, ch. 7 (three Kekulé structures of naphthalene)
    ["smiles:c1ccc2ccccc2c1", 3],
    // from memory: Zumdahl, Chemistry, ch. 8 (ozone's two resonance structures)
    ["O3", 2],
  ] as const)("%s has %i structures to draw", (text, count) => {
    const first = diagramOf(text);
    expect(first.equivalentStructures).toBe(count);
    expect(first.drawableForms).toBe(count);
    const last = diagramOf(text, count);
    expect(last.graph.bonds.map((bond) => bond.order)).not.toEqual(first.graph.bonds.map((bond) => bond.order));
  });

  it("refuses a structure number beyond the last, saying which exist", () => {
    const result = lewisDiagram(analysed("NO3-"), { form: 4 });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.message).toContain("choose 1 to 3");
  });
});

describe("Lewis diagram: themes", () => {
  it.each([
    ["plate", "#1b1b1b", true],
    ["light", "#1b1b1b", false],
    ["dark", "#ececec", false],
    ["current", "currentColor", false],
  ] as const)("%s draws with %s", (theme, ink, plate) => {
    const result = lewisDiagram(analysed("SF4"), { theme });
    if (!result.ok) throw new Error(result.message);
    const elements = parseXml(result.diagram.svg);
    const groups = elements.filter(
      (element) => element.name === "g" && (element.attributes.fill === ink || element.attributes.stroke === ink),
    );
    expect(groups.length).toBeGreaterThanOrEqual(2);
    expect(elements.some((element) => element.attributes.class === "plate")).toBe(plate);
  });

  it("refuses a species too large to read, with a message", () => {
    const chain = `smiles:${"C".repeat(60)}`;
    const result = lewisDiagram(analysed(chain));
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.message).toMatch(/at most \d+/);
  });
});

describe("Lewis diagram in the hover card", () => {
  const imageOf = (card: string, alt: string): string | undefined => {
    const start = card.indexOf(`![${alt}`);
    if (start < 0) return undefined;
    const uri = card.slice(card.indexOf("](", start) + 2, card.indexOf(")", card.indexOf("](", start)));
    return Buffer.from(uri.slice(uri.indexOf(",") + 1), "base64").toString("utf8");
  };

  it("shows SF4's diagram as an SVG data image beside the sketch, with every dot of its lone pairs", () => {
    const card = hoverMarkdown(analysed("SF4"), { angleDecimals: 1 });
    const svg = imageOf(card, "Lewis structure of SF4");
    expect(svg, "a Lewis image in the card").toBeDefined();
    // from memory: Housecroft and Sharpe, Inorganic Chemistry, ch. 2 (SF4: one lone pair on S, three on each F)
    expect(parseXml(svg!).filter((element) => element.attributes.class === "electron").length).toBe(26);
    // Both pictures share one line, so the card grows by no line for the diagram.
    const pictureLine = card.split("\n").find((line) => line.includes("![Lewis structure"));
    expect(pictureLine).toContain("![ball-and-stick sketch");
    expect(card.length).toBeLessThan(100_000);
  });

  it("keeps the hover diagram small: at most 220 px on its longer side", () => {
    const card = hoverMarkdown(analysed("smiles:CC(=O)Oc1ccccc1C(=O)O"), { angleDecimals: 1 });
    const svg = imageOf(card, "Lewis structure of");
    expect(svg).toBeDefined();
    const root = parseXml(svg!)[0];
    expect(Math.max(Number(root.attributes.width), Number(root.attributes.height))).toBeLessThanOrEqual(220);
  });

  it.each([
    ["a plain-text client", "SF4", "plaintext"],
    ["a species of more than 24 atoms", `smiles:${"C".repeat(10)}`, "markdown"],
  ] as const)("leaves the diagram out for %s", (_, text, format) => {
    const card = hoverMarkdown(analysed(text), { angleDecimals: 1, format });
    expect(card).not.toContain("Lewis structure of");
  });
});
