/**
 * A record's name and its formula must name one species: "copper(II) chloride" beside CuCl, or
 * "sodium sulfite" beside Na2SO4, is a typo that can send someone to the wrong bottle.
 *
 * Only a name read with confidence is compared, and "one species" is read generously, since a
 * false warning on a right table is worse than a missed one: hydrate water and solution water,
 * isomers, multiples (P4O10 for P2O5), a charge written in another column, and an element's name
 * beside any form of that element all agree.
 */
import { elementByName, elementBySymbol } from "../../chemistry/elements";
import type { SpeciesReading } from "../../chemistry/types";
import { chargeText } from "../../chemistry/reader/chargeText";
import { anionRootBySymbol } from "../../chemistry/reader/names/anionRoots";
import { assumedCationCharge } from "../../chemistry/reader/names/metalCations";
import { normalizeName } from "../../chemistry/reader/names/nameLookup";
import { readSpecies } from "../../chemistry/reader/readSpecies";
import { isQualifierTail } from "../../chemistry/reader/reagentQualifiers";
import { speciesTextOf } from "../analyzeOccurrence";
import type { DocumentKind, Finding, NameBesideFormula, TextFix } from "../types";

export const NAME_FORMULA_CODE = "table-name-formula";

/**
 * The warning for a name and formula that name different species, or undefined. It is placed on
 * the name: the formula is what the row's other cells are checked against and carries its own
 * findings, so the name is the cell that stands alone in disagreeing with the row.
 * `formulaFitsRow` says whether the row's other cells would still agree with the name's species.
 */
export function nameFormulaFinding(
  pair: NameBesideFormula,
  kind: DocumentKind,
  formulaFitsRow: () => boolean = () => true,
): Finding | undefined {
  return disagree(pair) ? disagreement(pair, kind, formulaFitsRow) : undefined;
}

/** A checked (name, name cell, formula) remembered: tables repeat the same pairs row after row. */
export type NameFormulaCheck = typeof nameFormulaFinding;

/** Verdicts remembered by one checker; past this many it starts afresh. */
const VERDICT_LIMIT = 20_000;

/**
 * `nameFormulaFinding` remembering whether each distinct pair disagrees, so a table of 100,000
 * rows of the same few species works each pair out once. The verdict depends only on the texts.
 */
export function nameFormulaChecker(): NameFormulaCheck {
  const verdicts = new Map<string, boolean>();
  return (pair, kind, formulaFitsRow) => {
    const key = `${speciesTextOf(pair.name)}\u0001${pair.nameCell.text}\u0001${speciesTextOf(pair.formula)}`;
    let disagrees = verdicts.get(key);
    if (disagrees === undefined) {
      disagrees = disagree(pair);
      if (verdicts.size >= VERDICT_LIMIT) verdicts.clear();
      verdicts.set(key, disagrees);
    }
    return disagrees ? disagreement(pair, kind, formulaFitsRow) : undefined;
  };
}

/** The name is read with confidence and names another species than the formula. */
function disagree(pair: NameBesideFormula): boolean {
  const { name, formula } = pair;
  if (name.reading.notation !== "name" || formula.reading.notation === "name") return false;
  if (!isConfidentName(pair)) return false;
  const chargeOpen = leavesChargeOpen(name.text);
  if (agree(name.reading, formula.reading, chargeOpen)) return false;
  const other = chargeReadingOf(formula.text);
  return !(other && agree(name.reading, other, chargeOpen));
}

function disagreement(pair: NameBesideFormula, kind: DocumentKind, formulaFitsRow: () => boolean = () => true): Finding {
  const { name, formula } = pair;
  const named = name.reading.name ? ` (${name.reading.name})` : "";
  const formulaNamed = formula.reading.name ? ` (${formula.reading.name})` : "";
  const column = kind === "json" || kind === "yaml" ? "field" : "column";
  const message =
    `Name and formula disagree: the name says ${name.reading.formula}${named}; ` +
    `the formula ${column} has ${formula.text}${formulaNamed}.`;
  // The name's formula is no fix when the row's other cells were written for the formula's species.
  const choices = [formulaFitsRow() ? formulaChoice(pair, kind) : undefined, nameChoice(pair, kind)].filter(
    (choice): choice is TextFix => choice !== undefined,
  );
  const finding: Finding = { range: name.range, severity: "warning", code: NAME_FORMULA_CODE, message };
  return choices.length > 0 ? { ...finding, choices } : finding;
}

// ---- Which names are read with confidence ----

/** Names of a family, not of one compound: "alum" is any of several double sulfates. */
// from memory: an alum is any M(I)M(III)(SO4)2·12H2O; potassium alum is only the best known
const FAMILY_NAMES: ReadonlySet<string> = new Set(["alum", "alums"]);

function isConfidentName(pair: NameBesideFormula): boolean {
  const { name, nameCell } = pair;
  if (FAMILY_NAMES.has(normalizeName(name.text))) return false;
  if (name.range.start !== nameCell.range.start) return false;
  if (name.range.end < nameCell.range.end) {
    // The cell says more than the name: only a grade, a form or a strength may follow it.
    if (nameCell.range.end - nameCell.range.start !== nameCell.text.length) return false;
    if (!isQualifierTail(nameCell.text.slice(name.range.end - nameCell.range.start))) return false;
  }
  return !hasImpossibleCount(name.reading);
}

/**
 * A two-element name read by rule with one atom of the first element, where that atom would need
 * an oxidation state above its highest: "phosphorus pentoxide" is P4O10, not PO5. The rule's
 * reading is then not to be trusted, so nothing is compared.
 */
function hasImpossibleCount(reading: SpeciesReading): boolean {
  const [first, second] = reading.composition;
  if (reading.charge !== 0 || reading.composition.length !== 2 || first.count !== 1) return false;
  const element = elementBySymbol(first.symbol);
  const root = anionRootBySymbol(second.symbol);
  if (!element || !root || element.category === "lanthanide" || element.category === "actinide") return false;
  // from memory: an element's highest oxidation state is its group number (groups 1-12) or the group minus 10 (groups 13-18)
  const highest = element.group <= 12 ? element.group : element.group - 10;
  return second.count * -root.charge > highest;
}

/**
 * A salt name without a numeral for a metal with several charges ("copper oxide", "lead
 * nitrate"): the reader assumes the usual charge, but the writer may mean the other salt.
 */
function leavesChargeOpen(nameText: string): boolean {
  const [first] = normalizeName(nameText).split(" ");
  const element = first === undefined || first.includes("(") ? undefined : elementByName(first);
  return element !== undefined && assumedCationCharge(element.symbol) !== undefined;
}

/**
 * The other reading of a formula ending in a digit and a sign without a caret: handbook exports
 * write the oxide ion "O2-" and sulfate "SO42-", where the digit is the charge, not a count.
 */
function chargeReadingOf(text: string): SpeciesReading | undefined {
  const match = /^(.*[A-Za-z)\]])(\d)([+\-\u2212])$/.exec(text.trim());
  if (!match) return undefined;
  const result = readSpecies(`${match[1]}^${match[2]}${match[3]}`);
  return result.ok ? result.value : undefined;
}

// ---- When a name and a formula name one species ----

type Counts = ReadonlyMap<string, number>;

function countsOf(reading: SpeciesReading): Map<string, number> {
  const counts = new Map<string, number>();
  for (const part of reading.composition) counts.set(part.symbol, (counts.get(part.symbol) ?? 0) + part.count);
  return counts;
}

function agree(name: SpeciesReading, formula: SpeciesReading, chargeOpen: boolean): boolean {
  const named = countsOf(name);
  const written = countsOf(formula);
  // A formula column without charges, the charge in a column of its own: "sulfate" beside SO4.
  const charges = formula.charge === name.charge || formula.charge === 0;
  // common practice: isomers share a molecular formula, and a table of formulas need not say which is meant
  if (charges && sameCounts(named, written)) return true;
  // "sulfur" beside S8, "phosphorus" beside P4, "sodium" beside Na+ in a list of ions.
  if (name.charge === 0 && named.size === 1 && written.size === 1 && sameElements(named, written)) return true;
  // from memory: P4O10 is written P2O5, Al2Cl6 AlCl3, Hg2Cl2 HgCl, N2O4 beside NO2 in equilibrium
  if (isMultiple(named, name.charge, written, formula.charge)) return true;
  // from memory: water of crystallisation is often left out, and a solution's water written in (NH4OH, H2CO3)
  if (charges && differByWater(named, written)) return true;
  return chargeOpen && formula.charge === name.charge && sameElements(named, written);
}

/** The same elements in the same numbers, and the same charge: one molecular formula. */
export function sameComposition(a: SpeciesReading, b: SpeciesReading): boolean {
  return a.charge === b.charge && sameCounts(countsOf(a), countsOf(b));
}

function sameCounts(a: Counts, b: Counts): boolean {
  if (a.size !== b.size) return false;
  for (const [symbol, count] of a) if (b.get(symbol) !== count) return false;
  return true;
}

function sameElements(a: Counts, b: Counts): boolean {
  if (a.size !== b.size) return false;
  for (const symbol of a.keys()) if (!b.has(symbol)) return false;
  return true;
}

function isMultiple(a: Counts, chargeA: number, b: Counts, chargeB: number): boolean {
  if (!sameElements(a, b)) return false;
  let ratio: number | undefined;
  for (const [symbol, count] of a) {
    const each = (b.get(symbol) as number) / count;
    if (ratio === undefined) ratio = each;
    else if (Math.abs(each - ratio) > 1e-9) return false;
  }
  return ratio !== undefined && (chargeB === 0 || Math.abs(chargeB - chargeA * ratio) < 1e-9);
}

/** The two differ by water alone: every other element the same, and hydrogen twice oxygen. */
function differByWater(a: Counts, b: Counts): boolean {
  for (const symbol of new Set([...a.keys(), ...b.keys()])) {
    if (symbol !== "H" && symbol !== "O" && (a.get(symbol) ?? 0) !== (b.get(symbol) ?? 0)) return false;
  }
  const hydrogen = (a.get("H") ?? 0) - (b.get("H") ?? 0);
  const oxygen = (a.get("O") ?? 0) - (b.get("O") ?? 0);
  // Neither side may be water alone: "water" beside an empty formula is no hydrate.
  const otherElements = [...a.keys()].some((symbol) => symbol !== "H" && symbol !== "O");
  return oxygen !== 0 && Math.abs(hydrogen - 2 * oxygen) < 1e-9 && otherElements;
}

// ---- The two fixes to choose between ----

/**
 * Characters a replacement may not hold, so that it needs no quoting or escaping where it goes.
 * A reStructuredText table lines its columns up by width, so no replacement of another length is safe.
 */
const UNSAFE: Readonly<Record<DocumentKind, RegExp | undefined>> = {
  csv: /[,;\t|"'\r\n]/,
  tsv: /[\t"\r\n]/,
  json: /["\\\t\r\n]/,
  yaml: /[:#,[\]{}"'&*!|>%@`\r\n]|^[-?\s]|\s$/,
  markdown: /[|`*_\\<\r\n]/,
  plaintext: /[\r\n]/,
  latex: /[&\\%$#_{}^~\r\n]/,
  asciidoc: /[|!`*_\r\n]/,
  restructuredtext: undefined,
};

function isSafeText(text: string, kind: DocumentKind): boolean {
  const unsafe = UNSAFE[kind];
  return text.length > 0 && unsafe !== undefined && !unsafe.test(text);
}

const STATE_SUFFIX = /\((?:aq|s|l|g)\)$/;
/** Charge suffixes as cells write them: "^2-", "^{2-}", " 2-", "(2-)", "+2", "--", "²⁻". */
const CHARGE_SUFFIXES: readonly RegExp[] = [
  /\^\{?\d*[+\-\u2212]+\}?$/,
  /\s+\d*[+\-\u2212]+$/,
  /\(\d*[+\-\u2212]+\)$/,
  /[+\-\u2212]+\d*$/,
  /[\u2070\u00b9\u00b2\u00b3\u2074-\u2079]*[\u207a\u207b]$/,
];

/** The formula cell rewritten with the name's formula, its state and charge kept as the cell writes them. */
function formulaChoice(pair: NameBesideFormula, kind: DocumentKind): TextFix | undefined {
  const target = pair.name.reading;
  const written = pair.formula.text;
  const caret = target.formula.indexOf("^");
  const body = caret < 0 ? target.formula : target.formula.slice(0, caret);
  const state = STATE_SUFFIX.exec(written)?.[0] ?? "";
  const unstated = written.slice(0, written.length - state.length);
  if (pair.formula.speciesText !== undefined) {
    // The row's charge is in a column of its own: the cell gets the formula alone, and only
    // when the name's charge is the column's.
    const newText = body + state;
    if (target.charge !== pair.formula.reading.charge || newText === written || !isSafeText(newText, kind)) return undefined;
    if (!readsAs(body + chargeText(target.charge) + state, target)) return undefined;
    return { range: pair.formula.range, newText, title: `Change the formula to ${newText}` };
  }
  const candidates: string[] = [];
  if (target.charge !== 0 && pair.formula.reading.charge === target.charge) {
    for (const suffix of CHARGE_SUFFIXES) {
      const match = suffix.exec(unstated);
      if (match) candidates.push(body + match[0] + state);
    }
  }
  candidates.push(body + chargeText(target.charge) + state);
  const newText = candidates.find((candidate) => candidate !== written && isSafeText(candidate, kind) && readsAs(candidate, target));
  return newText === undefined ? undefined : { range: pair.formula.range, newText, title: `Change the formula to ${newText}` };
}

/** The name cell's name rewritten as the formula's name, in the letter case the cell uses. */
function nameChoice(pair: NameBesideFormula, kind: DocumentKind): TextFix | undefined {
  const target = pair.formula.reading;
  if (!target.name) return undefined;
  const newText = inLetterCaseOf(target.name, pair.name.text);
  if (newText === pair.name.text || !isSafeText(newText, kind) || !readsAs(newText, target)) return undefined;
  return { range: pair.name.range, newText, title: `Change the name to ${newText}` };
}

/** `text` reads as the species of `reading`: the same elements, counts and charge. */
function readsAs(text: string, reading: SpeciesReading): boolean {
  const result = readSpecies(text);
  return result.ok && result.value.charge === reading.charge && sameCounts(countsOf(result.value), countsOf(reading));
}

/** A name written like `cell`: UPPER CASE, Title Case or a capital first letter; Stock numerals stay capitals. */
function inLetterCaseOf(name: string, cell: string): string {
  const letters = cell.replace(/[^A-Za-z]/g, "");
  if (letters.length > 1 && letters === letters.toUpperCase()) return name.toUpperCase();
  const words = cell.split(/\s+/).filter((word) => /^[A-Za-z]/.test(word));
  if (words.length > 1 && words.every((word) => /^[A-Z]/.test(word))) {
    return name.replace(/(^|\s)([a-z])/g, (_, gap: string, letter: string) => gap + letter.toUpperCase());
  }
  if (/^[A-Z]/.test(cell)) return name.charAt(0).toUpperCase() + name.slice(1);
  return name;
}
