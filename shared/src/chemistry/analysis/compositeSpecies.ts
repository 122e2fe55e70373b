/**
 * Species that are not one molecule but are made of parts, each of which has (or lacks) a shape of
 * its own: a salt is its ions (NH4Cl is NH4+ and Cl-), a hydrate is its salt and its water of
 * crystallisation (CuSO4·5H2O), a hydroxo or aqua ion is a metal ion with what it holds (CaOH+).
 * The whole gets no VSEPR shape; every polyatomic part is analysed on its own.
 */
import { elementBySymbol } from "../elements";
import { chargeText } from "../reader/chargeText";
import type { AnalysisResult, Problem, SpeciesPart, SpeciesReading } from "../types";
import { metalIonCharges, takesStockNumeral } from "./metalIonCharges";
import { partShapeText, partsListText } from "./partShapes";
import { saltIons, type SaltIon } from "./saltIons";
import { covalentCharacterNote } from "./networkSolids";
import { complexIon, complexName } from "./complexIons";
import { readFormulaSpan } from "../reader/readFormula";
import { ANION_ROOTS } from "../reader/names/anionRoots";
import { ION_NAMES } from "../reader/names/ionNames";
import { compositionKey } from "../vsepr/measuredAngles";
import { prefixFor } from "../reader/names/greekPrefixes";
import { acidNameOf } from "../reader/names/acidNames";
import { haloComplexAnionName } from "../reader/names/haloComplexNames";
import { haloComplexParts } from "./haloComplexAnions";

/** How a part's formula is analysed: the memoised analysis of the whole core. */
export type AnalyzeText = (text: string) => AnalysisResult;

/** A salt's ions, each polyatomic one analysed; undefined when the reading is not plainly a salt. */
export function saltAnalysis(reading: SpeciesReading, analyze: AnalyzeText): AnalysisResult | undefined {
  const ions = saltIons(reading);
  if (ions === undefined) return undefined;
  const parts: SpeciesPart[] = ions.map((ion) => part(ion.role, ion.count, ion.formula, ion.monatomic, analyze));
  const shaped = parts.filter((p) => !p.monatomic);
  const shapes =
    shaped.length === 0
      ? "Monatomic ions have no shape of their own."
      : `${shaped.map((p) => `${p.formula}: ${partShapeText(p)}`).join("; ")}.`;
  const name = reading.name ?? saltName(ions);
  const named = name ? { ...reading, name } : reading;
  if (ions.some(isHydrogenIon)) {
    const anions = partsListText(parts.filter((p) => p.role === "anion"));
    const message =
      `${reading.formula} is not a molecule: the acid exists as solvated H^+ (H3O^+ in water and in its solid hydrates) ` +
      `beside ${anions} ions, so it has no VSEPR shape as a whole. ${shapes}`;
    return { ok: false, reading: named, problem: { code: "ions-in-solution", message }, parts };
  }
  if (reading.state === "aq") {
    const message =
      `${reading.formula} in water is ${partsListText(parts)} ions, each held among water molecules (hydrated): ` +
      `not a lattice and not discrete molecules, so it has no VSEPR shape as a whole. ${shapes}` +
      hydratedMetalNote(ions);
    return { ok: false, reading: named, problem: { code: "ions-in-solution", message }, parts };
  }
  const covalent = covalentCharacterNote(reading.formula, reading.composition);
  const message =
    `${reading.formula} is an ionic compound of ${partsListText(parts)} ions: it forms a lattice of ions, ` +
    `not discrete molecules, so the compound as a whole has no VSEPR shape. ${shapes}` +
    (covalent ? ` ${covalent}` : metalSurroundingsNote(ions));
  return { ok: false, reading: named, problem: { code: "ionic-solid", message }, parts };
}

/** The H+ of an acid whose anion is a halo complex (HBF4, H2PtCl6). */
function isHydrogenIon(ion: SaltIon): boolean {
  return ion.role === "cation" && ion.formula === "H^+";
}

/**
 * For a salt of a d-block metal ion, that VSEPR does not decide how the ions around it are arranged
 * (the octahedral Cr3+ of Cr2O3 is no steric number); empty for other salts.
 */
function metalSurroundingsNote(ions: readonly SaltIon[]): string {
  const metals = dBlockCations(ions);
  if (metals.length === 0) return "";
  const subject = metals.length === 1 ? `each ${metals[0]} ion` : `the ${metals.join(" and ")} ions`;
  return ` How the neighbouring ions are arranged around ${subject} is set by ion sizes and ligand-field effects, not by VSEPR, so no geometry is given for the metal.`;
}

/** For a d-block metal ion in water, that VSEPR does not arrange the water around it; empty otherwise. */
function hydratedMetalNote(ions: readonly SaltIon[]): string {
  const metals = dBlockCations(ions);
  if (metals.length === 0) return "";
  return ` The water molecules around ${metals.length === 1 ? `each ${metals[0]} ion` : `the ${metals.join(" and ")} ions`} are arranged by ligand-field effects, not by VSEPR.`;
}

function dBlockCations(ions: readonly SaltIon[]): string[] {
  return ions
    .filter((ion) => ion.role === "cation" && ion.monatomic && elementBySymbol(symbolOf(ion))?.category === "transition-metal")
    .map((ion) => ion.formula);
}

/**
 * "ammonium hydrogen carbonate", "copper(II) sulfate": cation names then the anion's, with a Stock
 * numeral for a metal that has more than one usual charge ("iron(II,III) oxide" for a metal in
 * two); undefined when a name is not known.
 */
function saltName(ions: readonly SaltIon[]): string | undefined {
  // "tetrachloroauric(III) acid" for H+ and tetrachloroaurate(III)
  if (ions.length === 2 && isHydrogenIon(ions[0])) {
    const anion = anionOrComplexName(ions[1]);
    return anion === undefined ? undefined : acidNameOf(anion);
  }
  const words: string[] = [];
  for (let k = 0; k < ions.length; k++) {
    const ion = ions[k];
    const next = ions[k + 1];
    if (ion.monatomic && next?.role === "cation" && symbolOf(next) === symbolOf(ion)) {
      const element = elementBySymbol(symbolOf(ion));
      if (element === undefined) return undefined;
      words.push(`${element.name}(${ROMAN[ion.charge]},${ROMAN[next.charge]})`);
      k++;
      continue;
    }
    const word = ion.monatomic ? monatomicIonName(ion) : anionOrComplexName(ion);
    if (word === undefined) return undefined;
    words.push(word);
  }
  return words.join(" ");
}

/** A polyatomic ion's listed name, or its name as a complex ("hexachloroplatinate(IV)", "hexafluoroaluminate"). */
function anionOrComplexName(ion: SaltIon): string | undefined {
  const listed = ionNameFor(ion.formula) ?? complexNameFor(ion);
  if (listed !== undefined) return listed;
  const read = readFormulaSpan(ion.formula, 0, ion.formula.length, "formula");
  const halo = read.ok ? haloComplexParts(read.value.composition) : undefined;
  return halo === undefined ? undefined : haloComplexAnionName(halo, ion.charge);
}

/** "tetraamminecopper(II)" for the complex ion Cu(NH3)4^2+. */
function complexNameFor(ion: SaltIon): string | undefined {
  const complex = complexIon(ion.formula.slice(0, ion.formula.indexOf("^")));
  return complex === undefined ? undefined : complexName(complex, ion.charge);
}

function symbolOf(ion: SaltIon): string {
  return ion.formula.slice(0, ion.formula.indexOf("^"));
}

function monatomicIonName(ion: SaltIon): string | undefined {
  const symbol = symbolOf(ion);
  if (ion.role === "anion") return ANION_ROOTS.find((root) => root.symbol === symbol && root.charge === ion.charge)?.root;
  const element = elementBySymbol(symbol);
  if (element === undefined) return undefined;
  return takesStockNumeral(symbol) ? `${element.name}(${ROMAN[ion.charge] ?? ion.charge})` : element.name;
}

const ROMAN: readonly string[] = ["", "I", "II", "III", "IV", "V", "VI", "VII", "VIII"];

function ionNameFor(formula: string): string | undefined {
  const read = readFormulaSpan(formula, 0, formula.length, "formula");
  if (!read.ok) return undefined;
  const key = compositionKey(read.value.composition, 0);
  const name = ION_NAMES.find((ion) => ion.charge === read.value.charge && ionKey(ion.body) === key)?.name;
  // Names are listed in lower case for lookup; a Stock numeral is written in capitals.
  return name?.replace(/\(([ivx]+)\)/g, (numeral) => numeral.toUpperCase());
}

function ionKey(body: string): string | undefined {
  const read = readFormulaSpan(body, 0, body.length, "formula");
  return read.ok ? compositionKey(read.value.composition, 0) : undefined;
}

/** A hydrate or adduct written with a dot: each part analysed on its own. */
export function dottedAnalysis(reading: SpeciesReading, analyze: AnalyzeText): AnalysisResult | undefined {
  const written = reading.parts;
  if (written === undefined || written.length < 2 || reading.charge !== 0) return undefined;
  const parts = written.map((w, position): SpeciesPart => {
    const water = position > 0 && isWater(w.formula);
    return part(water ? "water" : "compound", w.count, w.formula, false, analyze);
  });
  const hydrate = parts.slice(1).every((p) => p.role === "water");
  const [host, ...guests] = parts;
  const sentences = parts.map((p) => `${p.formula}: ${partShapeText(p)}.`);
  const problem: Problem = hydrate
    ? {
        code: "hydrate",
        message:
          `${reading.formula} is a hydrate: each ${host.formula} holds ${guests.map(countedText).join(" and ")} of crystallisation. ` +
          `Each part is analysed on its own; the crystal as a whole has no VSEPR shape. ${sentences.join(" ")}`,
      }
    : {
        code: "adduct",
        message:
          `${reading.formula} is an adduct of ${partsListText(parts)}. Each part is analysed as a free species; ` +
          `where one part gives a lone pair to another, the acceptor's shape changes in the adduct. ${sentences.join(" ")}`,
      };
  const name = reading.name ?? (hydrate ? hydrateName(host, guests) : undefined);
  return { ok: false, reading: name ? { ...reading, name } : reading, problem, parts };
}

/** "copper(II) sulfate pentahydrate": the salt's name and the water count as a Greek prefix. */
function hydrateName(host: SpeciesPart, waters: readonly SpeciesPart[]): string | undefined {
  const hostName = host.analysis?.ok ? host.analysis.value.reading.name : host.analysis?.reading?.name;
  const count = waters.reduce((sum, water) => sum + water.count, 0);
  const prefix = count === 1 ? "mono" : count === 12 ? "dodeca" : prefixFor(count);
  return hostName && prefix ? `${hostName} ${prefix}hydrate` : undefined;
}

/**
 * A hydroxo or aqua ion as tables of aqueous ions list them (CaOH+, AlOH 2+, Fe(OH)2+,
 * Al(H2O)6 3+): a metal ion holding hydroxide ions or water molecules, not a lattice.
 */
export function metalIonComplexAnalysis(reading: SpeciesReading, analyze: AnalyzeText): AnalysisResult | undefined {
  if (reading.charge <= 0 || reading.parts !== undefined) return undefined;
  const caret = reading.formula.indexOf("^");
  const body = caret < 0 ? reading.formula : reading.formula.slice(0, caret);
  const ligands = ligandsOf(body);
  if (ligands === undefined) return undefined;
  const metal = elementBySymbol(ligands.metal);
  const metalCharge = reading.charge + ligands.hydroxides;
  if (metal === undefined || !metalIonCharges(metal.symbol).includes(metalCharge)) return undefined;
  const parts: SpeciesPart[] = [part("metal-ion", 1, metal.symbol + chargeText(metalCharge), true, analyze)];
  if (ligands.hydroxides > 0) parts.push(part("ligand", ligands.hydroxides, "OH^-", false, analyze));
  if (ligands.waters > 0) parts.push(part("ligand", ligands.waters, "H2O", false, analyze));
  const kind = ligands.hydroxides > 0 ? "hydroxo" : "aqua";
  const dBlock = metal.category !== "main-group";
  const metalNote = dBlock
    ? `${metal.name} is a transition metal: the arrangement of ligands around it follows coordination and ligand-field rules, not VSEPR`
    : `the bond to the metal ion is largely ionic, so VSEPR gives no shape for the ion as a whole`;
  const ligandShapes = parts
    .slice(1)
    .map((p) => `${p.formula}: ${partShapeText(p)}`)
    .join("; ");
  const message =
    `${reading.formula} is a ${kind} ion of ${metal.name}: the metal ion ${parts[0].formula} holding ${partsListText(parts.slice(1))}, ` +
    `a species in solution rather than a lattice; ${metalNote}. ${ligandShapes}.`;
  return { ok: false, reading, problem: { code: "metal-ion-complex", message }, parts };
}

/** "Ca", "OH" / "Al", "(OH)2" / "Al", "(H2O)6": the metal written first, then only OH and H2O groups. */
function ligandsOf(body: string): { metal: string; hydroxides: number; waters: number } | undefined {
  const symbolEnd = body.length > 1 && body.charCodeAt(1) >= 0x61 && body.charCodeAt(1) <= 0x7a ? 2 : 1;
  const metal = body.slice(0, symbolEnd);
  if (metalIonCharges(metal).length === 0) return undefined;
  let hydroxides = 0;
  let waters = 0;
  let i = symbolEnd;
  while (i < body.length) {
    if (body.startsWith("OH", i) && !body.startsWith("OH2", i)) {
      hydroxides++;
      i += 2;
      continue;
    }
    const open = body[i];
    if (open !== "(" && open !== "[") return undefined;
    const close = body.indexOf(open === "(" ? ")" : "]", i);
    const inner = body.slice(i + 1, close);
    if (close < 0 || (inner !== "OH" && inner !== "H2O" && inner !== "OH2")) return undefined;
    let count = 0;
    let j = close + 1;
    while (j < body.length && body.charCodeAt(j) >= 0x30 && body.charCodeAt(j) <= 0x39) count = count * 10 + body.charCodeAt(j++) - 0x30;
    if (j === close + 1) count = 1;
    if (inner === "OH") hydroxides += count;
    else waters += count;
    i = j;
  }
  return hydroxides + waters > 0 ? { metal, hydroxides, waters } : undefined;
}

function part(role: SpeciesPart["role"], count: number, formula: string, monatomic: boolean, analyze: AnalyzeText): SpeciesPart {
  return monatomic ? { role, count, formula, monatomic } : { role, count, formula, monatomic, analysis: analyze(formula) };
}

function isWater(formula: string): boolean {
  return formula === "H2O" || formula === "OH2" || formula === "D2O";
}

function countedText(p: SpeciesPart): string {
  const noun = p.role === "water" ? (p.count === 1 ? "water molecule" : "water molecules") : p.formula;
  return `${p.count} ${noun} (${p.formula})`;
}
