/**
 * The charges a metal's simple cation takes in ordinary salts. A salt is split into ions only when
 * one of these charges balances the anions, so a metal missing here (or a charge nobody writes)
 * leaves the formula unsplit rather than forcing a reading.
 */
import { elementBySymbol } from "../elements";

// common practice: the usual charges of metal ions in salts and oxides, as in the tables of common
// ions of general-chemistry texts (Mn4+ as in MnO2, Cr4+ as in CrO2, V5+ as in V2O5). Mercury(I)
// is the Hg2 2+ pair, not Hg+, so it is left out.
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
  V: [2, 3, 4, 5],
  Cr: [2, 3, 4],
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
 * Charges found only beside oxide ions: VO2, V2O5, CrO2 and MnO2 are oxides of these charges, but a
 * cation this oxidising would oxidise sulfide (MnS2 is Mn2+ with the disulfide ion S2 2-, as in
 * pyrite) and forms no simple salt with the common oxoanions.
 */
const OXIDE_ONLY_CHARGES: Readonly<Record<string, readonly number[]>> = {
  V: [4, 5],
  Cr: [4],
  Mn: [4],
};

/**
 * The charges of the metal's cation that form an ionic lattice with the anion `anionKey` (its
 * composition key: "O", "Cl", "SO4"); `monatomic` tells a single-element anion from a polyatomic one.
 */
export function chargesBeside(symbol: string, anionKey: string, monatomic: boolean): readonly number[] {
  const charges = metalIonCharges(symbol);
  if (monatomic && !formsIonicLattice(symbol, anionKey)) return [];
  const oxideOnly = OXIDE_ONLY_CHARGES[symbol];
  const fitting = oxideOnly === undefined || anionKey === "O" ? charges : charges.filter((charge) => !oxideOnly.includes(charge));
  // Halides of d-block metals are layer lattices up to the 3+ ion (FeCl2, CrCl3, CuCl); beyond it
  // they are molecules (TiCl4, VCl4).
  return monatomic && HALOGENS.has(anionKey) && !formsIonicBinarySalts(symbol) ? fitting.filter((charge) => charge <= 3) : fitting;
}

/**
 * d-block metals whose halides are ionic lattices in their usual charges up to 3+ (and the
 * lanthanides, in their 3+ ion). Not zinc and
 * mercury (ZnCl2 and HgCl2 are linear molecules in the gas and strongly covalent solids), nor the
 * platinum metals and gold, whose halides are chains and molecules of square-planar units (PdCl2,
 * Au2Cl6).
 */
const COVALENT_D_HALIDES = new Set(["Zn", "Hg", "Pd", "Pt", "Au"]);

function formsIonicHalides(symbol: string): boolean {
  // Cadmium's are the layer lattices that name a structure type (CdCl2, CdI2); silver's are rock salt.
  if (symbol === "Ag" || symbol === "Cd") return true;
  const element = elementBySymbol(symbol);
  // The lanthanide trihalides are ionic lattices too (LaCl3, GdCl3).
  if (element?.category === "lanthanide") return true;
  return element?.category === "transition-metal" && !COVALENT_D_HALIDES.has(symbol) && metalIonCharges(symbol).length > 0;
}

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
 * conditions (ZnO, Fe2O3, PbS). Main-group halides are often molecules (SnCl4, AlCl3), so of the
 * other metals' halides only those of silver and of the d-block metals that form layer lattices
 * (FeCl2, CoCl2, CrCl3, CuCl) are split. Nitrides, phosphides and carbides of these metals are
 * covalent networks (AlN, GaAs) or not simple ions at all.
 */
export function formsIonicLattice(symbol: string, anionSymbol: string): boolean {
  if (formsIonicBinarySalts(symbol)) return true;
  if (symbol === "Be" || metalIonCharges(symbol).length === 0) return false;
  if (CHALCOGENS.has(anionSymbol)) return true;
  return HALOGENS.has(anionSymbol) && formsIonicHalides(symbol);
}

/**
 * A Stock numeral belongs in the name of this metal's cation: it has more than one usual charge,
 * or (mercury) its other cation is a pair, Hg2 2+, so "mercury oxide" would not say which.
 */
export function takesStockNumeral(symbol: string): boolean {
  return metalIonCharges(symbol).length > 1 || symbol === "Hg";
}
