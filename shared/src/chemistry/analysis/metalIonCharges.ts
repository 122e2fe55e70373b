/**
 * The charges a metal's simple cation takes in ordinary salts. A salt is split into ions only when
 * one of these charges balances the anions, so a metal missing here (or a charge nobody writes)
 * leaves the formula unsplit rather than forcing a reading.
 */
import { elementBySymbol } from "../elements";

// common practice: the usual charges of metal ions in salts and oxides, as in the tables of common
// ions of general-chemistry texts (Mn4+ as in MnO2). Mercury(I) is the Hg2 2+ pair, not Hg+, so it
// is left out.
const CHARGES: Readonly<Record<string, readonly number[]>> = {
  Be: [2],
  Al: [3],
  Ga: [3],
  In: [3],
  Tl: [1, 3],
  Sn: [2, 4],
  Pb: [2, 4],
  Bi: [3],
  Sc: [3],
  Ti: [3, 4],
  V: [2, 3],
  Cr: [2, 3],
  Mn: [2, 3, 4],
  Fe: [2, 3],
  Co: [2, 3],
  Ni: [2],
  Cu: [1, 2],
  Zn: [2],
  Y: [3],
  Zr: [4],
  Pd: [2],
  Ag: [1],
  Cd: [2],
  La: [3],
  Ce: [3, 4],
  Pt: [2, 4],
  Au: [1, 3],
  Hg: [2],
  Th: [4],
  U: [3, 4],
};

const LANTHANIDE_CHARGES: readonly number[] = [3];

/** Possible charges of the metal's simple cation; empty for a nonmetal or an unlisted metal. */
export function metalIonCharges(symbol: string): readonly number[] {
  const element = elementBySymbol(symbol);
  if (element === undefined || symbol === "H") return [];
  if (element.group === 1) return [1];
  if (element.group === 2 && symbol !== "Be") return [2];
  if (element.category === "lanthanide") return CHARGES[symbol] ?? LANTHANIDE_CHARGES;
  return CHARGES[symbol] ?? [];
}

/** Oxide and the heavier chalcogenides: ionic lattices with every listed metal but beryllium. */
const CHALCOGENS = new Set(["O", "S", "Se", "Te"]);
const HALOGENS = new Set(["F", "Cl", "Br", "I"]);

/**
 * Metals whose binary compounds with halide, oxide and sulfide ions are plainly ionic lattices
 * (groups 1 and 2 but beryllium). Other metals' halides are often molecular (AlCl3, SnCl4, TiCl4),
 * so a metal and a single-element anion are split into ions only for these.
 */
export function formsIonicBinarySalts(symbol: string): boolean {
  const element = elementBySymbol(symbol);
  if (element === undefined || symbol === "H" || symbol === "Be") return false;
  return element.group === 1 || element.group === 2;
}

/**
 * Whether the metal `symbol` and the single-element anion of `anionSymbol` form an extended ionic
 * lattice, so that the formula is read as their ions. Groups 1-2 (but beryllium) do with every
 * such anion. Every other listed metal does with oxide, sulfide, selenide and telluride in its
 * usual charges: no oxide or sulfide of these in such a charge is a molecule under ordinary
 * conditions (ZnO, Fe2O3, PbS). Their halides are often molecules (SnCl4, HgCl2, AlCl3), so only
 * silver's are split: the silver halides are ionic lattices. Nitrides, phosphides and carbides of
 * these metals are covalent networks (AlN, GaAs) or not simple ions at all.
 */
export function formsIonicLattice(symbol: string, anionSymbol: string): boolean {
  if (formsIonicBinarySalts(symbol)) return true;
  if (symbol === "Be" || metalIonCharges(symbol).length === 0) return false;
  if (CHALCOGENS.has(anionSymbol)) return true;
  return symbol === "Ag" && HALOGENS.has(anionSymbol);
}

/**
 * A Stock numeral belongs in the name of this metal's cation: it has more than one usual charge,
 * or (mercury) its other cation is a pair, Hg2 2+, so "mercury oxide" would not say which.
 */
export function takesStockNumeral(symbol: string): boolean {
  return metalIonCharges(symbol).length > 1 || symbol === "Hg";
}
