/**
 * Which ions a neutral formula is made of, decided by chemistry: a metal, ammonium or phosphonium
 * cation, then a known polyatomic anion (or a single-element anion where the two make an ionic
 * lattice: a halide, oxide, sulfide... after a metal of groups 1 and 2, ammonium or phosphonium;
 * an oxide or sulfide after any listed metal), with charges that balance in exactly one way.
 * NH4Cl is NH4+ and Cl-; (NH4)2SO4 is two NH4+ and SO4 2-; K2Cr2O7 is two K+ and Cr2O7 2-;
 * MnO2 is Mn4+ and two O2-. A formula that fits no such reading, or fits it in two ways, is not
 * split: it is left to the molecular path.
 *
 * Two readings of one formula are settled by one rule: an anion of one element bonded to itself
 * (peroxide O2 2-, disulfide S2 2-, acetylide C2 2-) is read only where the metal's usual charges
 * balance no single-atom anion. MnO2 and PbO2 are dioxides (Mn4+, Pb4+); BaO2 can only be Ba2+
 * and peroxide, FeS2 only Fe2+ and disulfide. A metal with two neighbouring usual charges and a
 * single-atom anion that neither balances alone is read as a mixed-valence lattice: Fe3O4 is one
 * Fe2+, two Fe3+ and four O2-.
 */
import { chargeText } from "../reader/chargeText";
import { readFormulaBody } from "../reader/formulaBody";
import { ANION_ROOTS } from "../reader/names/anionRoots";
import { ION_NAMES } from "../reader/names/ionNames";
import type { FormulaPart, SpeciesReading } from "../types";
import { compositionKey } from "../vsepr/measuredAngles";
import { complexCharges, complexIon } from "./complexIons";
import { chargesBeside, formsIonicBinarySalts, formsIonicLattice, metalIonCharges } from "./metalIonCharges";
import { bareHaloComplexCharges, haloComplexParts } from "./haloComplexAnions";

/** One ion of a salt with its count in one formula unit. */
export interface SaltIon {
  readonly role: "cation" | "anion";
  readonly count: number;
  /** Formula with charge, in the writer's element order: "NH4^+", "OCl^-", "Cl^-". */
  readonly formula: string;
  readonly charge: number;
  readonly monatomic: boolean;
}

/** One top-level group of a written formula: an element with its count, or a bracket with its count. */
interface WrittenUnit {
  /** The written text without the count ("Na", "NH4" for "(NH4)2"). */
  readonly body: string;
  readonly count: number;
  readonly bracketed: boolean;
  /** Written in square brackets: a coordination complex, [Cu(NH3)4] or [Fe(CN)6]. */
  readonly square: boolean;
  readonly composition: readonly FormulaPart[];
}

/** A cation as it may start (or end) a salt's formula: its body and the charges it can take. */
interface CationChoice {
  readonly body: string;
  readonly count: number;
  readonly charges: readonly number[];
  readonly monatomic: boolean;
  /** The metal's symbol; undefined for an onium ion, which forms ionic salts with every anion. */
  readonly metal?: string;
  /** The acid's hydrogen, an ion only beside a halo-complex anion (HBF4, H2PtCl6). */
  readonly hydrogen?: boolean;
  /** Units used. */
  readonly width: number;
}

interface AnionChoice {
  readonly body: string;
  /** Composition key of one ion. */
  readonly key: string;
  readonly count: number;
  readonly charges: readonly number[];
  readonly monatomic: boolean;
  /** A central atom holding only halides: BF4, PF6, AuCl4. */
  readonly haloComplex: boolean;
}

/**
 * Polyatomic cations whose salts are plainly ionic, the oxocations of vanadium(IV) and uranium(VI)
 * among them (VOSO4, UO2(NO3)2); nitrosyl and nitronium compounds (NOCl) are not split.
 */
const ONIUM_CATIONS = new Set(["ammonium", "phosphonium", "hydronium", "vanadyl", "uranyl"]);
/** Polyatomic cations that people write without brackets: NH4Cl, PH4I, VOSO4, UO2(NO3)2. */
const UNBRACKETED_ONIUM: ReadonlyMap<string, readonly [second: string, count: number]> = new Map([
  ["NH4", ["H", 4]],
  ["PH4", ["H", 4]],
  ["VO", ["O", 1]],
  ["UO2", ["O", 2]],
]);

/**
 * Anions that bind metals other than those of groups 1-2 by covalent bonds or as ligands
 * (Hg(CN)2 is a molecule, Fe(SCN)3 a complex): their formulas are not split after such metals.
 */
const COVALENT_WITH_D_METALS = new Set(["CN", "CNS", "CNO", "N3"]);

/**
 * Peroxide and superoxide (both O2) are the salts of groups 1-2; a dioxide of another metal
 * (MnO2, PbO2, CrO2) is an oxide of that metal in a higher charge, never its peroxide.
 */
const S_BLOCK_ANIONS = new Set(["O2"]);

/** Polyatomic ions by composition key, each with the charges they are listed with. */
let ionTable: { readonly cations: Map<string, number[]>; readonly anions: Map<string, number[]> } | undefined;

function ions(): NonNullable<typeof ionTable> {
  if (ionTable) return ionTable;
  const cations = new Map<string, number[]>();
  const anions = new Map<string, number[]>();
  for (const ion of ION_NAMES) {
    if (ion.charge > 0 && !ONIUM_CATIONS.has(ion.name)) continue;
    const body = readFormulaBody(ion.body, 0, ion.body.length);
    if (!body.ok) continue;
    const key = compositionKey(body.value.composition, 0);
    const table = ion.charge > 0 ? cations : anions;
    const charges = table.get(key) ?? [];
    if (!charges.includes(ion.charge)) charges.push(ion.charge);
    table.set(key, charges);
  }
  ionTable = { cations, anions };
  return ionTable;
}

const MONATOMIC_ANION_CHARGE = new Map<string, number>();
for (const root of ANION_ROOTS) MONATOMIC_ANION_CHARGE.set(root.symbol, root.charge);

/** The ions of a neutral salt, cations first; undefined when the formula is not plainly a salt. */
export function saltIons(reading: SpeciesReading): readonly SaltIon[] | undefined {
  if (reading.charge !== 0 || reading.parts !== undefined) return undefined;
  const units = writtenUnits(reading.formula);
  if (units === undefined || units.length < 2) return undefined;
  const found: SaltIon[][] = [];
  // Cation first (NaCl, (NH4)2SO4), or, for carboxylates, last (CH3COONa, HCOONH4).
  for (const cation of leadingCations(units)) collectSplits(cation, units.slice(cation.width), found);
  // Salts of two anions (basic carbonates, apatites, oxide halides) only where no one anion fits.
  if (found.length === 0) for (const cation of leadingCations(units)) collectTwoAnions(cation, units.slice(cation.width), found);
  for (const cation of trailingCations(units)) {
    const rest = units.slice(0, units.length - cation.width);
    const anion = wholeAnion(rest);
    if (anion && !anion.monatomic) collect([cation], anion, found);
  }
  const distinct = [...new Map(found.map((split) => [split.map((ion) => `${ion.count}${ion.formula}`).join(" "), split])).values()];
  if (distinct.length === 1) return distinct[0];
  // An anion bonded to itself only where no single-atom anion balances (SnS2 is Sn4+ and 2 S2-).
  const singleAtom = distinct.filter((split) => split.every((ion) => ion.role === "cation" || ion.monatomic));
  return singleAtom.length === 1 ? singleAtom[0] : undefined;
}

function collectSplits(first: CationChoice, rest: readonly WrittenUnit[], found: SaltIon[][]): void {
  for (const anion of anionsOf(rest)) collect([first], anion, found);
  // Double salts: a second metal or onium ion before the anion, as in the alum KCr(SO4)2 or
  // Fe(NH4)2(SO4)2, the metal written first.
  if (rest.length < 2) return;
  const seconds: CationChoice[] = [];
  if (!rest[0].bracketed && metalIonCharges(rest[0].body).length > 0) seconds.push(metalCation(rest[0], 1));
  const onium = first.metal !== undefined ? oniumAt(rest, 0) : undefined;
  if (onium) seconds.push(onium);
  for (const second of seconds) {
    for (const anion of anionsOf(rest.slice(second.width))) if (!anion.monatomic) collect([first, second], anion, found);
  }
}

/**
 * One cation with two anions, the first a bracketed group or a single element: Cu2(OH)2CO3,
 * Ca5(PO4)3OH, Pb(OH)Cl, BiOCl. The metal takes only a charge it takes beside both anions, so
 * molecular oxide halides (VOCl3, CrO2Cl2) are not split.
 */
function collectTwoAnions(cation: CationChoice, rest: readonly WrittenUnit[], found: SaltIon[][]): void {
  if (rest.length < 2) return;
  const head = rest[0];
  const key = compositionKey(head.composition, 0);
  const firsts: AnionChoice[] = [];
  if (head.bracketed && !head.square) {
    const charges = ions().anions.get(key);
    if (charges) firsts.push({ body: head.body, key, count: head.count, charges, monatomic: false, haloComplex: isHaloComplex(head) });
  } else if (!head.bracketed) {
    const charge = MONATOMIC_ANION_CHARGE.get(head.body);
    if (charge !== undefined)
      firsts.push({ body: head.body, key: head.body, count: head.count, charges: [charge], monatomic: true, haloComplex: false });
  }
  for (const first of firsts) {
    for (const second of anionsOf(rest.slice(1))) {
      if (second.key === first.key) continue;
      const anions = [first, second];
      if (!anions.every((anion) => ionicWith(cation, anion))) continue;
      const charges =
        cation.metal === undefined
          ? cation.charges
          : anions
              .map((anion) => chargesBeside(cation.metal!, anion.key, anion.monatomic))
              .reduce((kept, beside) => kept.filter((charge) => beside.includes(charge)));
      for (const charge of charges) {
        for (const firstCharge of first.charges) {
          for (const secondCharge of second.charges) {
            if (charge * cation.count + firstCharge * first.count + secondCharge * second.count !== 0) continue;
            found.push([
              ion("cation", cation.count, cation.body, charge, cation.monatomic),
              ion("anion", first.count, first.body, firstCharge, first.monatomic),
              ion("anion", second.count, second.body, secondCharge, second.monatomic),
            ]);
          }
        }
      }
    }
  }
}

/** Adds every way the charges balance to zero. */
function collect(written: readonly CationChoice[], anion: AnionChoice, found: SaltIon[][]): void {
  if (!written.every((cation) => ionicWith(cation, anion))) return;
  // Only the charges each metal takes beside this anion (Mn4+ beside oxide, never beside sulfide).
  const cations = written.map((cation) =>
    cation.metal === undefined ? cation : { ...cation, charges: chargesBeside(cation.metal, anion.key, anion.monatomic) },
  );
  if (cations.some((cation) => cation.charges.length === 0)) return;
  for (const anionCharge of anion.charges) {
    const negative = anion.count * anionCharge;
    const before = found.length;
    for (const charges of chargeCombinations(cations)) {
      const positive = charges.reduce((sum, charge, k) => sum + charge * cations[k].count, 0);
      if (positive + negative !== 0) continue;
      found.push([
        ...cations.map((cation, k) => ion("cation", cation.count, cation.body, charges[k], cation.monatomic)),
        ion("anion", anion.count, anion.body, anionCharge, anion.monatomic),
      ]);
    }
    if (found.length === before && cations.length === 1 && cations[0].metal !== undefined && anion.monatomic) {
      for (const mixed of mixedValence(cations[0], -negative))
        found.push([...mixed, ion("anion", anion.count, anion.body, anionCharge, true)]);
    }
  }
}

/** Whether the cation and the anion make an ionic lattice rather than covalent bonds. */
function ionicWith(cation: CationChoice, anion: AnionChoice): boolean {
  if (cation.hydrogen === true) return anion.haloComplex;
  if (cation.metal === undefined) return true;
  if (anion.monatomic) return formsIonicLattice(cation.metal, anion.key);
  if (COVALENT_WITH_D_METALS.has(anion.key) || S_BLOCK_ANIONS.has(anion.key)) return formsIonicBinarySalts(cation.metal);
  return true;
}

/**
 * The metal's atoms shared between two neighbouring usual charges so that they carry `positive`
 * in all (Fe3O4: one Fe2+ and two Fe3+; Pb3O4: two Pb2+ and one Pb4+); none when no pair fits.
 */
function mixedValence(cation: CationChoice, positive: number): SaltIon[][] {
  const splits: SaltIon[][] = [];
  const charges = [...cation.charges].sort((a, b) => a - b);
  for (let k = 0; k + 1 < charges.length; k++) {
    const [lower, higher] = [charges[k], charges[k + 1]];
    const excess = positive - lower * cation.count;
    if (excess <= 0 || excess % (higher - lower) !== 0) continue;
    const higherCount = excess / (higher - lower);
    if (higherCount >= cation.count) continue;
    splits.push([
      ion("cation", cation.count - higherCount, cation.body, lower, true),
      ion("cation", higherCount, cation.body, higher, true),
    ]);
  }
  return splits;
}

function ion(role: SaltIon["role"], count: number, body: string, charge: number, monatomic: boolean): SaltIon {
  return { role, count, formula: body + chargeText(charge), charge, monatomic };
}

function chargeCombinations(cations: readonly CationChoice[]): number[][] {
  let combinations: number[][] = [[]];
  for (const cation of cations) {
    combinations = combinations.flatMap((partial) => cation.charges.map((charge) => [...partial, charge]));
  }
  return combinations;
}

function leadingCations(units: readonly WrittenUnit[]): CationChoice[] {
  const choices: CationChoice[] = [];
  const first = units[0];
  if (!first.bracketed && metalIonCharges(first.body).length > 0) choices.push(metalCation(first, 1));
  const onium = oniumAt(units, 0);
  if (onium) choices.push(onium);
  const complex = first.square ? complexIon(first.body) : undefined;
  if (complex) choices.push({ body: first.body, count: first.count, charges: complexCharges(complex, 1), monatomic: false, width: 1 });
  if (!first.bracketed && first.body === "H")
    choices.push({ body: "H", count: first.count, charges: [1], monatomic: true, hydrogen: true, width: 1 });
  return choices;
}

function trailingCations(units: readonly WrittenUnit[]): CationChoice[] {
  const choices: CationChoice[] = [];
  const last = units[units.length - 1];
  if (!last.bracketed && metalIonCharges(last.body).length > 0) choices.push(metalCation(last, 1));
  if (units.length >= 3) {
    const onium = oniumAt(units, units.length - 2);
    if (onium && onium.width === 2) choices.push(onium);
  }
  const bracketed = oniumAt(units, units.length - 1);
  if (bracketed && bracketed.width === 1) choices.push(bracketed);
  return choices;
}

function metalCation(unit: WrittenUnit, width: number): CationChoice {
  return {
    body: unit.body,
    count: unit.count,
    charges: metalIonCharges(unit.body),
    monatomic: true,
    metal: unit.body,
    width,
  };
}

/** Ammonium, phosphonium, vanadyl... at `index`: "(NH4)2" as one unit, or "NH4" written as N then H4. */
function oniumAt(units: readonly WrittenUnit[], index: number): CationChoice | undefined {
  const unit = units[index];
  if (unit === undefined) return undefined;
  if (unit.bracketed) {
    const charges = ions().cations.get(compositionKey(unit.composition, 0));
    return charges ? { body: unit.body, count: unit.count, charges, monatomic: false, width: 1 } : undefined;
  }
  const next = units[index + 1];
  if (next === undefined || next.bracketed || unit.bracketed || unit.count !== 1) return undefined;
  const body = `${unit.body}${next.body}${next.count === 1 ? "" : next.count}`;
  const second = UNBRACKETED_ONIUM.get(body);
  if (second === undefined || second[0] !== next.body || second[1] !== next.count) return undefined;
  const secondParts = next.composition.map((part) => ({ symbol: part.symbol, count: part.count * next.count }));
  const charges = ions().cations.get(compositionKey([...unit.composition, ...secondParts], 0));
  return charges ? { body, count: 1, charges, monatomic: false, width: 2 } : undefined;
}

/**
 * The anions the remaining units may spell: one bracketed group with its count, a single element
 * as a monatomic anion (Cl, O, N), or the rest as one polyatomic ion (SO4, and O2 as peroxide).
 */
function anionsOf(rest: readonly WrittenUnit[]): AnionChoice[] {
  const choices: AnionChoice[] = [];
  if (rest.length === 1 && rest[0].bracketed) {
    const key = compositionKey(rest[0].composition, 0);
    const charges = ions().anions.get(key);
    const haloComplex = isHaloComplex(rest[0]);
    if (charges) choices.push({ body: rest[0].body, key, count: rest[0].count, charges, monatomic: false, haloComplex });
    const complex = rest[0].square ? complexIon(rest[0].body) : undefined;
    if (complex)
      choices.push({ body: rest[0].body, key, count: rest[0].count, charges: complexCharges(complex, -1), monatomic: false, haloComplex });
  }
  if (rest.length === 1 && !rest[0].bracketed) {
    const charge = MONATOMIC_ANION_CHARGE.get(rest[0].body);
    if (charge !== undefined)
      choices.push({ body: rest[0].body, key: rest[0].body, count: rest[0].count, charges: [charge], monatomic: true, haloComplex: false });
  }
  const whole = wholeAnion(rest);
  if (whole) choices.push(whole);
  return choices;
}

/**
 * The units together, unbracketed, as one polyatomic anion: SO4, HCO3, Cr2O7, OCl, CH3COO, and
 * a halo complex of four to six halides (PtCl6 of K2PtCl6, AlF6 of Na3AlF6).
 */
function wholeAnion(rest: readonly WrittenUnit[]): AnionChoice | undefined {
  if (rest.length === 0 || rest.some((unit) => unit.bracketed)) return undefined;
  if (rest.length === 1 && rest[0].composition.length === 1 && rest[0].count === 1) return undefined;
  const composition = rest.flatMap((unit) => unit.composition.map((part) => ({ symbol: part.symbol, count: part.count * unit.count })));
  const key = compositionKey(composition, 0);
  const listed = ions().anions.get(key);
  const charges = listed ?? bareHaloComplexCharges(composition);
  if (charges.length === 0) return undefined;
  const body = rest.map((unit) => (unit.count === 1 ? unit.body : `${unit.body}${unit.count}`)).join("");
  return { body, key, count: 1, charges, monatomic: false, haloComplex: haloComplexParts(composition) !== undefined };
}

function isHaloComplex(unit: WrittenUnit): boolean {
  return haloComplexParts(unit.composition) !== undefined;
}

/**
 * The top-level groups of a canonical formula ("(NH4)2SO4" -> (NH4)2, S, O4). Undefined when the
 * formula has bond marks, dots or anything else a plain salt formula does not.
 */
function writtenUnits(formula: string): WrittenUnit[] | undefined {
  const units: WrittenUnit[] = [];
  let i = 0;
  while (i < formula.length) {
    const code = formula.charCodeAt(i);
    let body: string;
    let bracketed = false;
    const square = code === 0x5b;
    if (code >= 0x41 && code <= 0x5a) {
      const symbolEnd = i + 1 < formula.length && isLower(formula.charCodeAt(i + 1)) ? i + 2 : i + 1;
      body = formula.slice(i, symbolEnd);
      i = symbolEnd;
    } else if (code === 0x28 || code === 0x5b) {
      const close = matchingClose(formula, i);
      if (close < 0) return undefined;
      body = formula.slice(i + 1, close);
      bracketed = true;
      i = close + 1;
    } else {
      return undefined;
    }
    let count = 0;
    const countStart = i;
    while (i < formula.length && isDigit(formula.charCodeAt(i))) count = count * 10 + formula.charCodeAt(i++) - 0x30;
    const read = readFormulaBody(body, 0, body.length);
    if (!read.ok) return undefined;
    units.push({ body, count: i > countStart ? count : 1, bracketed, square, composition: read.value.composition });
  }
  return units;
}

function matchingClose(text: string, open: number): number {
  let depth = 0;
  for (let i = open; i < text.length; i++) {
    const code = text.charCodeAt(i);
    if (code === 0x28 || code === 0x5b) depth++;
    else if ((code === 0x29 || code === 0x5d) && --depth === 0) return i;
  }
  return -1;
}

function isLower(code: number): boolean {
  return code >= 0x61 && code <= 0x7a;
}

function isDigit(code: number): boolean {
  return code >= 0x30 && code <= 0x39;
}
