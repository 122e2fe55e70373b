/**
 * Network solids: one covalent lattice, no molecules. A formula such as SiO2 or GaAs names the
 * solid, so no molecular shape is drawn for it (an O=Si=O or a diatomic Ga-As would present a
 * gas-phase curiosity as the substance). What VSEPR does say about such a solid is each atom's
 * surroundings in the lattice, and that is what the finding carries.
 *
 * Listed: the binary oxides, nitrides, carbides, phosphides and arsenides of the metalloids, boron,
 * beryllium and the group 13 metals that are covalent networks with no discrete molecule under
 * ordinary conditions. Oxides and sulfides of the other metals are ionic lattices, read as their
 * ions (saltIons.ts), with a word on the covalent character of those that are tetrahedral networks
 * too (ZnO, ZnS, CuCl); molecular oxides (CO2, P4O10, As4O6) are not listed.
 */
import type { FormulaPart, LatticeSite, Problem, SpeciesReading } from "../types";
import { readFormulaBody } from "../reader/formulaBody";
import { compositionKey } from "../vsepr/measuredAngles";

interface NetworkSolid {
  /** The name the solid goes by ("boron nitride", not the rule-built "boron mononitride"). */
  readonly name: string;
  /** The solid's everyday forms, in brackets after the formula. */
  readonly forms: string;
  /** Each kind of atom and its surroundings. */
  readonly sites: readonly LatticeSite[];
}

function site(symbol: string, neighbourCount: number, neighbour: string, geometry: string): LatticeSite {
  return { symbol, neighbourCount, neighbour, geometry };
}

/** Both atoms of a 1:1 solid tetrahedral, as in zinc blende and wurtzite. */
function tetrahedralPair(first: string, second: string): readonly LatticeSite[] {
  return [site(first, 4, second, "tetrahedral"), site(second, 4, first, "tetrahedral")];
}

// from memory: Greenwood & Earnshaw, Chemistry of the Elements, and Wells, Structural Inorganic
// Chemistry (silica, germania, boric oxide, beryllia, boron nitride, silicon carbide and nitride,
// and the III-V semiconductors)
const NETWORK_SOLIDS: Readonly<Record<string, NetworkSolid>> = {
  SiO2: {
    name: "silicon dioxide",
    forms: "quartz, sand, silica glass",
    sites: [site("Si", 4, "O", "tetrahedral"), site("O", 2, "Si", "bent")],
  },
  GeO2: {
    name: "germanium dioxide",
    forms: "its quartz-like form",
    sites: [site("Ge", 4, "O", "tetrahedral"), site("O", 2, "Ge", "bent")],
  },
  B2O3: { name: "boron trioxide", forms: "boric oxide glass", sites: [site("B", 3, "O", "trigonal planar"), site("O", 2, "B", "bent")] },
  BeO: { name: "beryllium oxide", forms: "wurtzite structure", sites: tetrahedralPair("Be", "O") },
  BN: {
    name: "boron nitride",
    forms: "hexagonal boron nitride; cubic BN has both atoms tetrahedral",
    sites: [site("B", 3, "N", "trigonal planar"), site("N", 3, "B", "trigonal planar")],
  },
  SiC: { name: "silicon carbide", forms: "carborundum", sites: tetrahedralPair("Si", "C") },
  Si3N4: {
    name: "silicon nitride",
    forms: "silicon nitride ceramic",
    sites: [site("Si", 4, "N", "tetrahedral"), site("N", 3, "Si", "trigonal planar")],
  },
  AlN: { name: "aluminium nitride", forms: "wurtzite structure", sites: tetrahedralPair("Al", "N") },
  GaN: { name: "gallium nitride", forms: "wurtzite structure", sites: tetrahedralPair("Ga", "N") },
  BP: { name: "boron phosphide", forms: "zinc-blende structure", sites: tetrahedralPair("B", "P") },
  AlP: { name: "aluminium phosphide", forms: "zinc-blende structure", sites: tetrahedralPair("Al", "P") },
  AlAs: { name: "aluminium arsenide", forms: "zinc-blende structure", sites: tetrahedralPair("Al", "As") },
  GaP: { name: "gallium phosphide", forms: "zinc-blende structure", sites: tetrahedralPair("Ga", "P") },
  GaAs: { name: "gallium arsenide", forms: "zinc-blende structure", sites: tetrahedralPair("Ga", "As") },
  InP: { name: "indium phosphide", forms: "zinc-blende structure", sites: tetrahedralPair("In", "P") },
  InAs: { name: "indium arsenide", forms: "zinc-blende structure", sites: tetrahedralPair("In", "As") },
  InN: { name: "indium nitride", forms: "wurtzite structure", sites: tetrahedralPair("In", "N") },
};

// from memory: Greenwood & Earnshaw, Chemistry of the Elements (allotropes of carbon)
const NETWORK_ELEMENTS: Readonly<Record<string, NetworkSolid>> = {
  diamond: { name: "diamond", forms: "", sites: [site("C", 4, "C", "tetrahedral")] },
  graphite: { name: "graphite", forms: "in flat hexagonal layers", sites: [site("C", 3, "C", "trigonal planar")] },
};

// from memory: Greenwood & Earnshaw, Chemistry of the Elements, and Wells, Structural Inorganic
// Chemistry (zinc oxide and sulfide, cadmium chalcogenides, copper(I) and silver iodide halides)
const COVALENT_IONIC_LATTICES: Readonly<Record<string, NetworkSolid>> = {
  ZnO: { name: "zinc oxide", forms: "wurtzite structure", sites: tetrahedralPair("Zn", "O") },
  ZnS: { name: "zinc sulfide", forms: "zinc-blende and wurtzite structures", sites: tetrahedralPair("Zn", "S") },
  ZnSe: { name: "zinc selenide", forms: "zinc-blende structure", sites: tetrahedralPair("Zn", "Se") },
  CdS: { name: "cadmium sulfide", forms: "wurtzite structure", sites: tetrahedralPair("Cd", "S") },
  CdSe: { name: "cadmium selenide", forms: "wurtzite structure", sites: tetrahedralPair("Cd", "Se") },
  CuCl: { name: "copper(I) chloride", forms: "zinc-blende structure", sites: tetrahedralPair("Cu", "Cl") },
  CuBr: { name: "copper(I) bromide", forms: "zinc-blende structure", sites: tetrahedralPair("Cu", "Br") },
  CuI: { name: "copper(I) iodide", forms: "zinc-blende structure", sites: tetrahedralPair("Cu", "I") },
  AgI: { name: "silver iodide", forms: "wurtzite form", sites: tetrahedralPair("Ag", "I") },
};

let covalentByComposition: Map<string, NetworkSolid> | undefined;

/**
 * A sentence for the ionic solids that are as much covalent networks as ionic lattices (ZnO, ZnS,
 * CuCl): each atom tetrahedral among four of the other, as in the III-V semiconductors. Undefined
 * for every other composition.
 */
export function covalentCharacterNote(formula: string, composition: readonly FormulaPart[]): string | undefined {
  covalentByComposition ??= byKey(COVALENT_IONIC_LATTICES);
  const solid = covalentByComposition.get(compositionKey(composition, 0));
  if (solid === undefined) return undefined;
  return (
    `${formula} also has considerable covalent character: in its ${solid.forms} ${latticeSitesText(solid.sites)}, ` +
    "a network solid as much as a lattice of ions."
  );
}

function byKey(table: Readonly<Record<string, NetworkSolid>>): Map<string, NetworkSolid> {
  const map = new Map<string, NetworkSolid>();
  for (const [formula, solid] of Object.entries(table)) {
    const read = readFormulaBody(formula, 0, formula.length);
    if (read.ok) map.set(compositionKey(read.value.composition, 0), solid);
  }
  return map;
}

let byComposition: Map<string, NetworkSolid> | undefined;

function solidFor(composition: readonly FormulaPart[], charge: number): NetworkSolid | undefined {
  if (charge !== 0) return undefined;
  byComposition ??= byKey(NETWORK_SOLIDS);
  return byComposition.get(compositionKey(composition, 0));
}

/** "each Si is bonded to 4 O (tetrahedral)". */
function siteText(latticeSite: LatticeSite): string {
  return `each ${latticeSite.symbol} is bonded to ${latticeSite.neighbourCount} ${latticeSite.neighbour} (${latticeSite.geometry})`;
}

/** The atoms' surroundings in words: "each Si is bonded to 4 O (tetrahedral) and each O to 2 Si (bent)". */
export function latticeSitesText(sites: readonly LatticeSite[]): string {
  return sites.map((latticeSite, k) => (k === 0 ? siteText(latticeSite) : siteText(latticeSite).replace(" is bonded", ""))).join(" and ");
}

/** A network solid's finding and its atoms' surroundings; undefined for anything else. */
export interface NetworkSolidFinding {
  readonly name: string;
  readonly problem: Problem;
  readonly sites: readonly LatticeSite[];
}

/** The finding for a network solid (SiO2, GaAs, diamond): no molecule, so no molecular shape. */
export function networkSolidFinding(reading: SpeciesReading): NetworkSolidFinding | undefined {
  if (reading.parts !== undefined) return undefined;
  const byName = reading.name === undefined || reading.notation !== "name" ? undefined : NETWORK_ELEMENTS[reading.name.toLowerCase()];
  const solid = byName ?? solidFor(reading.composition, reading.charge);
  if (solid === undefined) return undefined;
  const title = byName ? `${reading.name![0].toUpperCase()}${reading.name!.slice(1)}` : reading.formula;
  const subject = solid.forms === "" ? title : `${title} (${solid.forms})`;
  const molecule = byName ? "there are no molecules" : `there is no discrete ${reading.formula} molecule`;
  const message =
    `${subject} is a network covalent solid: ${latticeSitesText(solid.sites)}, and ${molecule}, so no molecular shape ` +
    "is given. VSEPR describes each atom's surroundings in the solid, as here.";
  return { name: solid.name, problem: { code: "network-solid", message }, sites: solid.sites };
}
