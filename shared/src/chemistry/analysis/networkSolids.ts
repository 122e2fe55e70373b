/**
 * Network solids: one covalent lattice, no molecules. A formula such as SiO2 or GaAs names the
 * solid, so no molecular shape is drawn for it (an O=Si=O or a diatomic Ga-As would present a
 * gas-phase curiosity as the substance). What VSEPR does say about such a solid is each atom's
 * surroundings in the lattice, and that is what the finding carries.
 *
 * Listed: the binary oxides, nitrides, carbides, phosphides and arsenides of the metalloids, boron,
 * beryllium and the group 13 metals that are covalent networks with no discrete molecule under
 * ordinary conditions. Oxides and sulfides of the other metals are ionic lattices, read as their
 * ions (saltIons.ts); molecular oxides (CO2, P4O10, As4O6) are not listed.
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
};

// from memory: Greenwood & Earnshaw, Chemistry of the Elements (allotropes of carbon)
const NETWORK_ELEMENTS: Readonly<Record<string, NetworkSolid>> = {
  diamond: { name: "diamond", forms: "", sites: [site("C", 4, "C", "tetrahedral")] },
  graphite: { name: "graphite", forms: "in flat hexagonal layers", sites: [site("C", 3, "C", "trigonal planar")] },
};

let byComposition: Map<string, NetworkSolid> | undefined;

function solidFor(composition: readonly FormulaPart[], charge: number): NetworkSolid | undefined {
  if (charge !== 0) return undefined;
  if (byComposition === undefined) {
    byComposition = new Map();
    for (const [formula, solid] of Object.entries(NETWORK_SOLIDS)) {
      const read = readFormulaBody(formula, 0, formula.length);
      if (read.ok) byComposition.set(compositionKey(read.value.composition, 0), solid);
    }
  }
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
