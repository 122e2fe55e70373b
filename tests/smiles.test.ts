import { createRequire } from "node:module";
import { beforeAll, describe, expect, it } from "vitest";
import { ChemElements } from "@chemistry/elements";
import {
  kekulize,
  parseSmiles,
  smilesFormula,
  smilesNetCharge,
  writeSmiles,
  type SmilesMolecule,
  type SmilesResult,
} from "../shared/src/chemistry/smiles";
import type { ProblemCode } from "../shared/src/chemistry/types";
import { seededRandom } from "./support/seededRandom";

interface RDKitMol {
  get_json(): string;
  get_smiles(details?: string): string;
  delete(): void;
}
interface RDKitModule {
  get_mol(input: string, details?: string): RDKitMol | null;
}
interface RDKitAtomJson {
  z?: number;
  chg?: number;
  impHs?: number;
}

const require = createRequire(import.meta.url);
let RDKit: RDKitModule;

beforeAll(async () => {
  const initRDKit = require("@rdkit/rdkit");
  RDKit = await initRDKit();
});

/** RDKit's atoms in input order (hydrogens written as [H] kept), with its defaults filled in. */
function rdkitAtoms(smiles: string, sanitize: boolean): { symbol: string; charge: number; hydrogens: number }[] {
  const mol = RDKit.get_mol(smiles, JSON.stringify({ removeHs: false, sanitize }));
  if (mol === null) throw new Error(`RDKit refused ${smiles}`);
  try {
    const json = JSON.parse(mol.get_json());
    const defaults = json.defaults.atom;
    const atoms: RDKitAtomJson[] = json.molecules.flatMap((molecule: { atoms: RDKitAtomJson[] }) => molecule.atoms);
    return atoms.map((atom) => ({
      symbol: ChemElements.getById(atom.z ?? defaults.z)!.symbol,
      charge: atom.chg ?? defaults.chg,
      hydrogens: atom.impHs ?? defaults.impHs,
    }));
  } finally {
    mol.delete();
  }
}

/** Hill formula (C, H, then alphabetical; alphabetical without carbon) built from RDKit's atoms. */
function hillFormulaOf(atoms: readonly { symbol: string; charge: number; hydrogens: number }[]): string {
  const counts = new Map<string, number>();
  const add = (symbol: string, count: number) => counts.set(symbol, (counts.get(symbol) ?? 0) + count);
  let charge = 0;
  for (const atom of atoms) {
    add(atom.symbol, 1);
    if (atom.hydrogens > 0) add("H", atom.hydrogens);
    charge += atom.charge;
  }
  const symbols = [...counts.keys()].sort();
  const order = counts.has("C") ? ["C", ...(counts.has("H") ? ["H"] : []), ...symbols.filter((s) => s !== "C" && s !== "H")] : symbols;
  const magnitude = Math.abs(charge);
  const chargeText = charge === 0 ? "" : `${charge > 0 ? "+" : "-"}${magnitude === 1 ? "" : magnitude}`;
  return order.map((symbol) => (counts.get(symbol) === 1 ? symbol : `${symbol}${counts.get(symbol)}`)).join("") + chargeText;
}

function rdkitCanonical(smiles: string, isomeric = false): string {
  const mol = RDKit.get_mol(smiles);
  if (mol === null) throw new Error(`RDKit refused ${smiles}`);
  try {
    return mol.get_smiles(JSON.stringify({ doIsomericSmiles: isomeric }));
  } finally {
    mol.delete();
  }
}

function molecule(result: SmilesResult): SmilesMolecule {
  if (!result.ok) throw new Error(`${result.problem.code}: ${result.problem.message}`);
  return result.value;
}

// source: RDKit (WebAssembly build) is the reference for every row: formula, charges, hydrogens.
const READABLE: readonly (readonly [string, string])[] = [
  ["methane", "C"],
  ["water", "O"],
  ["ammonia", "N"],
  ["ethanol", "CCO"],
  ["acetic acid", "CC(=O)O"],
  ["acetone", "CC(C)=O"],
  ["neopentane", "CC(C)(C)C"],
  ["cyclohexane", "C1CCCCC1"],
  ["cyclooctatetraene", "C1=CC=CC=CC=C1"],
  ["norbornane", "C1CC2CCC1C2"],
  ["adamantane", "C1C2CC3CC1CC(C2)C3"],
  ["cubane", "C12C3C4C1C5C2C3C45"],
  ["spiro[4.5]decane", "C1CCC2(C1)CCCCC2"],
  ["ring closure %10", "C%10CCCCC%10"],
  ["ring closures %11 and %12 in one ring system", "C%11CC%12CCC%11CC%12"],
  ["ring bond symbol before the digit", "C=1CCCCC=1"],
  ["hydrogen peroxide", "OO"],
  ["hydrogen", "[H][H]"],
  ["methane with explicit hydrogens", "[H]C([H])([H])[H]"],
  ["carbon dioxide", "O=C=O"],
  ["nitrogen", "N#N"],
  ["hydrogen cyanide", "C#N"],
  ["carbon monoxide", "[C-]#[O+]"],
  ["diazomethane", "C=[N+]=[N-]"],
  ["azide", "[N-]=[N+]=[N-]"],
  ["ammonium", "[NH4+]"],
  ["hydroxide", "[OH-]"],
  ["proton", "[H+]"],
  ["amide anion", "[NH2-]"],
  ["oxide", "[O-2]"],
  ["sulfide written with two minus signs", "[S--]"],
  ["nitrate", "[O-][N+](=O)[O-]"],
  ["nitrite", "[O-]N=O"],
  ["sulfate", "[O-]S(=O)(=O)[O-]"],
  ["phosphate", "[O-]P(=O)([O-])[O-]"],
  ["sulfuric acid", "O=S(=O)(O)O"],
  ["perchlorate", "[O-]Cl(=O)(=O)=O"],
  ["sulfur tetrafluoride", "F[S](F)(F)F"],
  ["sulfur hexafluoride", "FS(F)(F)(F)(F)F"],
  ["phosphorus pentachloride", "ClP(Cl)(Cl)(Cl)Cl"],
  ["boron trifluoride", "FB(F)F"],
  ["borohydride", "[BH4-]"],
  ["tetrafluoroborate", "F[B-](F)(F)F"],
  ["boric acid", "B(O)(O)O"],
  ["xenon", "[Xe]"],
  ["xenon tetrafluoride", "F[Xe](F)(F)F"],
  ["iron(II)", "[Fe+2]"],
  ["iron(III)", "[Fe+3]"],
  ["copper(II) written as ++", "[Cu++]"],
  ["osmium tetroxide", "O=[Os](=O)(=O)=O"],
  ["chromium quadruple bond", "[Cr]$[Cr]"],
  ["sodium chloride", "[Na+].[Cl-]"],
  ["carbon-13 methane", "[13CH4]"],
  ["heavy water", "[2H]O[2H]"],
  ["glycine zwitterion", "[NH3+]CC(=O)[O-]"],
  ["L-alanine with a stereo mark", "N[C@@H](C)C(=O)O"],
  ["stereo class marks", "F[C@TH1](Cl)(Br)I"],
  ["octahedral stereo class and atom class", "[Co@OH1:3](Cl)(Cl)(Cl)(Cl)(Cl)Cl"],
  ["atom classes", "[CH3:1][CH2:2]O"],
  ["trans-2-butene", "C/C=C/C"],
  ["cis-2-butene", "C/C=C\\C"],
  ["benzene", "c1ccccc1"],
  ["toluene", "Cc1ccccc1"],
  ["phenol", "Oc1ccccc1"],
  ["pyridine", "c1ccncc1"],
  ["pyrrole", "c1cc[nH]c1"],
  ["N-methylpyrrole", "Cn1cccc1"],
  ["furan", "c1ccoc1"],
  ["thiophene", "c1ccsc1"],
  ["selenophene", "c1cc[se]c1"],
  ["imidazole", "c1c[nH]cn1"],
  ["thiazole", "c1cscn1"],
  ["oxazole", "c1cocn1"],
  ["tetrazole", "c1nn[nH]n1"],
  ["pyridinium", "c1cc[nH+]cc1"],
  ["pyridine N-oxide", "[O-][n+]1ccccc1"],
  ["cyclopentadienide", "[cH-]1cccc1"],
  ["2-pyridone", "O=c1cccc[nH]1"],
  ["uracil", "O=c1cc[nH]c(=O)[nH]1"],
  ["naphthalene", "c1ccc2ccccc2c1"],
  ["azulene", "c1ccc2cccc2cc1"],
  ["pyrene", "c1cc2ccc3cccc4ccc(c1)c2c34"],
  ["indole", "c1ccc2[nH]ccc2c1"],
  ["quinoline", "c1ccc2ncccc2c1"],
  ["purine", "c1ncc2[nH]cnc2n1"],
  ["biphenyl, unwritten bond between rings", "c1ccccc1c1ccccc1"],
  ["biphenyl, explicit single bond", "c1ccc(cc1)-c1ccccc1"],
  ["benzene with explicit aromatic bonds", "c:1:c:c:c:c:c:1"],
  ["caffeine", "Cn1cnc2c1c(=O)n(C)c(=O)n2C"],
  ["aspirin", "CC(=O)Oc1ccccc1C(=O)O"],
  ["ibuprofen", "CC(C)Cc1ccc(cc1)C(C)C(=O)O"],
  ["paracetamol", "CC(=O)Nc1ccc(O)cc1"],
  ["L-tryptophan", "N[C@@H](Cc1c[nH]c2ccccc12)C(=O)O"],
  ["L-histidine", "N[C@@H](Cc1c[nH]cn1)C(=O)O"],
  ["nicotine", "CN1CCC[C@H]1c1cccnc1"],
  ["sulfamethoxazole", "Cc1cc(NS(=O)(=O)c2ccc(N)cc2)no1"],
];

describe("parseSmiles against RDKit", () => {
  it("has at least 60 reference molecules", () => {
    expect(READABLE.length).toBeGreaterThanOrEqual(60);
  });

  it.each(READABLE)("%s (%s): Hill formula, per-atom charges and hydrogens", (_name, smiles) => {
    const value = molecule(parseSmiles(smiles));
    // source: RDKit (WebAssembly build), sanitized: hydrogens as RDKit assigns them
    const sanitized = rdkitAtoms(smiles, true);
    // source: RDKit (WebAssembly build), unsanitized: charges exactly as written (RDKit's clean-up
    // redraws perchlorate as [Cl+3] with four O-, which is the same ion with charges moved)
    const asWritten = rdkitAtoms(smiles, false);
    expect(smilesFormula(value)).toBe(hillFormulaOf(sanitized));
    expect(value.atoms.map((atom) => atom.symbol)).toEqual(sanitized.map((atom) => atom.symbol));
    expect(value.atoms.map((atom) => atom.hydrogens)).toEqual(sanitized.map((atom) => atom.hydrogens));
    expect(value.atoms.map((atom) => atom.charge)).toEqual(asWritten.map((atom) => atom.charge));
    expect(smilesNetCharge(value)).toBe(sanitized.reduce((sum, atom) => sum + atom.charge, 0));
  });

  it.each(READABLE)("%s (%s): Kekulé form is chemically sound and RDKit reads it back as the same molecule", (_name, smiles) => {
    const kekule = molecule(kekulize(parseSmiles(smiles)));
    expect(kekule.bonds.every((bond) => !bond.aromatic && bond.order >= 1)).toBe(true);
    const bondOrderSums = new Array<number>(kekule.atoms.length).fill(0);
    for (const bond of kekule.bonds) {
      bondOrderSums[bond.from] += bond.order;
      bondOrderSums[bond.to] += bond.order;
    }
    kekule.atoms.forEach((atom, index) => {
      // common practice: a neutral carbon makes four bonds, a carbanion or carbocation three
      if (atom.symbol === "C") expect(bondOrderSums[index] + atom.hydrogens).toBe(atom.charge === 0 ? 4 : 3);
    });
    expect(kekule.atoms.some((atom) => atom.aromatic)).toBe(false);
    const written = writeSmiles(kekule);
    // source: RDKit (WebAssembly build) canonical SMILES, stereo and isotopes left out on both
    // sides; atom classes are dropped by the reader on purpose, so they are taken off the input
    const withoutClasses = smiles.replace(/:\d+\]/g, "]");
    expect(rdkitCanonical(written)).toBe(rdkitCanonical(withoutClasses));
    // source: RDKit (WebAssembly build) isomeric canonical SMILES: with no stereo in the input,
    // isotopes must survive the round trip too
    if (!/[@/\\]/.test(smiles)) expect(rdkitCanonical(written, true)).toBe(rdkitCanonical(withoutClasses, true));
  });

  it.each(READABLE)("%s (%s): written back without kekulizing, RDKit reads the same molecule", (_name, smiles) => {
    const written = writeSmiles(molecule(parseSmiles(smiles)));
    // source: RDKit (WebAssembly build) canonical SMILES, stereo, isotopes and atom classes left out
    expect(rdkitCanonical(written)).toBe(rdkitCanonical(smiles.replace(/:\d+\]/g, "]")));
  });
});

describe("parseSmiles details", () => {
  it.each([
    // source: OpenSMILES specification, implicit hydrogens of the organic subset
    ["C", [4]],
    ["N(C)(C)(C)C", [1, 3, 3, 3, 3]],
    ["S(F)(F)(F)", [1, 0, 0, 0]],
    ["S(F)(F)(F)(F)F", [1, 0, 0, 0, 0, 0]],
    ["[CH3]", [3]],
    ["[C]", [0]],
  ] as const)("%s has hydrogens %j", (smiles, hydrogens) => {
    expect(molecule(parseSmiles(smiles)).atoms.map((atom) => atom.hydrogens)).toEqual(hydrogens);
  });

  it("records where each atom is written, brackets included", () => {
    const smiles = "C[13CH2+]Cl.[O-]";
    const ranges = molecule(parseSmiles(smiles)).atoms.map((atom) => smiles.slice(atom.range.start, atom.range.end));
    expect(ranges).toEqual(["C", "[13CH2+]", "Cl", "[O-]"]);
  });

  it("reads isotopes and leaves them out of the formula", () => {
    const value = molecule(parseSmiles("[13CH4]"));
    expect(value.atoms[0].isotope).toBe(13);
    // source: RDKit (WebAssembly build) counts [13C] as carbon in its element totals
    expect(smilesFormula(value)).toBe(hillFormulaOf(rdkitAtoms("[13CH4]", true)));
  });

  it("reads quadruple and explicit aromatic bonds", () => {
    expect(molecule(parseSmiles("[Cr]$[Cr]")).bonds).toEqual([{ from: 0, to: 1, order: 4, aromatic: false }]);
    expect(molecule(parseSmiles("c1ccccc1")).bonds.every((bond) => bond.aromatic && bond.order === 1)).toBe(true);
  });

  it("makes the unwritten bond between two aromatic rings single, as RDKit does", () => {
    const bonds = molecule(parseSmiles("c1ccccc1c1ccccc1")).bonds;
    const joining = bonds.find((bond) => bond.from === 5 && bond.to === 6);
    expect(joining).toEqual({ from: 5, to: 6, order: 1, aromatic: false });
    // source: RDKit (WebAssembly build) writes that bond with an explicit "-"
    expect(rdkitCanonical("c1ccccc1c1ccccc1")).toContain("-");
  });
});

const UNREADABLE: readonly (readonly [string, string, ProblemCode, number, "RDKit refuses" | "RDKit tolerates"])[] = [
  // [label, SMILES, problem code, start of the range the problem points at, what RDKit does]
  ["unclosed ring", "C1CC", "malformed-formula", 1, "RDKit refuses"],
  ["unclosed ring %nn", "C%12CC", "malformed-formula", 1, "RDKit refuses"],
  ["unclosed parenthesis", "CC(C", "unbalanced-brackets", 2, "RDKit refuses"],
  ["extra closing parenthesis", "CC)C", "unbalanced-brackets", 2, "RDKit refuses"],
  ["unclosed bracket", "[CH4", "unbalanced-brackets", 0, "RDKit refuses"],
  ["unknown bracket element", "C[Zz]", "unknown-element", 2, "RDKit refuses"],
  ["unknown aromatic bracket element", "[x]", "unknown-element", 1, "RDKit refuses"],
  ["unknown letter", "CQC", "unknown-element", 1, "RDKit refuses"],
  ["element outside the organic subset without brackets", "Xe", "malformed-formula", 0, "RDKit refuses"],
  ["garbage", "!!", "malformed-formula", 0, "RDKit refuses"],
  ["two bond symbols", "C==C", "malformed-formula", 2, "RDKit refuses"],
  ["bond at the start", "=C", "malformed-formula", 0, "RDKit refuses"],
  ["bond at the end", "CC=", "malformed-formula", 2, "RDKit refuses"],
  ["empty branch", "C()C", "malformed-formula", 2, "RDKit refuses"],
  ["ring bond to the same bond twice", "C12CCCC12", "malformed-formula", 8, "RDKit refuses"],
  ["ring bond closing on its own atom", "C11", "malformed-formula", 2, "RDKit refuses"],
  // source: OpenSMILES grammar puts ring bonds before branches; RDKit reads this leniently
  ["ring digit after a branch", "C(C)1CC1", "malformed-formula", 4, "RDKit tolerates"],
  ["lone %", "C%1C", "malformed-formula", 1, "RDKit refuses"],
  ["dot at the end", "C.", "malformed-formula", 1, "RDKit refuses"],
  // source: OpenSMILES ends a SMILES at a space; RDKit reads up to it, we refuse the whole string
  ["space inside", "C C", "malformed-formula", 1, "RDKit tolerates"],
  // source: OpenSMILES grammar allows "++" and "--" but no longer runs of signs
  ["three plus signs", "[Fe+++]", "malformed-formula", 5, "RDKit refuses"],
];

describe("parseSmiles refuses bad input with a problem, never an exception", () => {
  it.each(UNREADABLE)("%s: %s gives %s", (_label, smiles, code, start, rdkit) => {
    const result = parseSmiles(smiles);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.problem.code).toBe(code);
    expect(result.problem.range?.start).toBe(start);
    expect(result.problem.message.length).toBeGreaterThan(10);
    // source: RDKit (WebAssembly build) refuses the same strings, bar the two marked rows
    const mol = RDKit.get_mol(smiles);
    mol?.delete();
    expect(mol === null ? "RDKit refuses" : "RDKit tolerates").toBe(rdkit);
  });

  it("gives empty-input for the empty string", () => {
    const result = parseSmiles("");
    expect(result.ok ? "read" : result.problem.code).toBe("empty-input");
  });

  it.each([
    ["five-membered ring of carbons only", "c1cccc1", 3],
    ["pyrrole without its [nH]", "c1ccnc1", 3],
    ["aromatic atoms on no ring", "cc", 0],
  ] as const)("kekulize reports no-valid-structure for %s (%s)", (_label, smiles, start) => {
    const result = kekulize(parseSmiles(smiles));
    expect(result.ok ? "kekulized" : result.problem.code).toBe("no-valid-structure");
    if (!result.ok) expect(result.problem.range?.start).toBe(start);
    // source: RDKit (WebAssembly build) cannot kekulize these either
    expect(RDKit.get_mol(smiles)).toBeNull();
  });

  it("kekulize passes a reading problem through", () => {
    const result = kekulize(parseSmiles("C1CC"));
    expect(result.ok ? "kekulized" : result.problem.code).toBe("malformed-formula");
  });
});

const FUZZ_ALPHABET = "CNOSPFIBclnosbp[]()=#$:/\\.%0123456789+-@HTHALSPxeZz* \u00e9\u{1F600}";

function mutate(base: string, random: () => number): string {
  const pick = () => FUZZ_ALPHABET[Math.floor(random() * FUZZ_ALPHABET.length)];
  const chars = [...base];
  const edits = 1 + Math.floor(random() * 4);
  for (let e = 0; e < edits; e++) {
    const at = Math.floor(random() * (chars.length + 1));
    const kind = random();
    if (kind < 0.35) chars.splice(at, 0, pick());
    else if (kind < 0.65) chars.splice(at, 1);
    else if (kind < 0.9) chars[at] = pick();
    else chars.splice(at, 0, ...chars.slice(0, at));
  }
  return chars.join("");
}

describe("fuzz", () => {
  it("20,000 random and mutated SMILES never throw, and whatever reads also writes back to the same formula", () => {
    const random = seededRandom(20240611);
    const bases = READABLE.map(([, smiles]) => smiles);
    let read = 0;
    for (let n = 0; n < 20_000; n++) {
      let text: string;
      if (n % 4 === 0) {
        const length = Math.floor(random() * 30);
        text = Array.from({ length }, () => FUZZ_ALPHABET[Math.floor(random() * FUZZ_ALPHABET.length)]).join("");
      } else {
        text = mutate(bases[Math.floor(random() * bases.length)], random);
      }
      const result = parseSmiles(text);
      if (!result.ok) {
        const { start, end } = result.problem.range ?? { start: 0, end: 0 };
        if (start < 0 || end > text.length || start > end) throw new Error(`bad problem range for ${JSON.stringify(text)}`);
        continue;
      }
      read++;
      const { atoms, bonds } = result.value;
      for (const bond of bonds) {
        if (bond.from === bond.to || bond.from >= atoms.length || bond.to >= atoms.length) {
          throw new Error(`bad bond in ${JSON.stringify(text)}`);
        }
      }
      for (const atom of atoms) {
        if (!(atom.hydrogens >= 0) || atom.range.end > text.length) throw new Error(`bad atom in ${JSON.stringify(text)}`);
      }
      const formula = smilesFormula(result.value);
      const kekule = kekulize(result);
      if (!kekule.ok) continue;
      const again = parseSmiles(writeSmiles(kekule.value));
      if (!again.ok || smilesFormula(again.value) !== formula) {
        throw new Error(`write-back changed ${JSON.stringify(text)} to ${writeSmiles(kekule.value)}`);
      }
    }
    // The corpus must exercise the success path too, not only the refusals.
    expect(read).toBeGreaterThan(2_000);
  });
});
