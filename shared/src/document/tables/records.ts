/**
 * Turns the recognised fields of one row or object into a TableRecord: which field names the
 * species (a formula, or failing that a name) and which cells the checks can compare.
 */
import { elementByName } from "../../chemistry/elements";
import type { TextRange } from "../../chemistry/types";
import { scanProse } from "../scanProse";
import { isOccurrence, smilesAt } from "../smilesSpan";
import { emptySink, occurrenceAt, unreadableAt, type ScanSink, type SpeciesReader } from "../speciesReader";
import { chargeOfCell, withRowCharge } from "./chargeColumn";
import { namesSpecies } from "./headers";
import { mixtureComponents } from "./mixtureCells";
import type { ColumnMeaning, SpeciesOccurrence, TableCell, TableLanguage, TableRecord, UnreadableSpecies } from "../types";

/** A value in a row or object, with the header or key it sits under. */
export interface RecordField {
  readonly meaning: ColumnMeaning;
  /** Written under a header that says "formula": preferred as the record's species. */
  readonly formulaHeader: boolean;
  /** The header's language when not English: the checks read the cell's words in it. */
  readonly language?: TableLanguage;
  readonly text: string;
  readonly range: TextRange;
}

/** Where records and the species they name are collected while a table is read. */
export interface RecordSink extends ScanSink {
  readonly records: TableRecord[];
}

/** The field's value without surrounding whitespace, and the matching narrower range. */
export function trimmedField<T extends { text: string; range: TextRange }>(field: T): T {
  const { text, range } = field;
  // Most cells have nothing to trim; checking the two ends is cheaper than trimming.
  if (text.length === 0 || (isPlainVisible(text.charCodeAt(0)) && isPlainVisible(text.charCodeAt(text.length - 1)))) return field;
  const leading = text.length - text.trimStart().length;
  const trimmed = text.trim();
  if (trimmed.length === text.length) return field;
  // Escapes make the written range longer than the value; only move the range when they agree.
  if (range.end - range.start !== text.length) return { ...field, text: trimmed };
  const start = range.start + leading;
  return { ...field, text: trimmed, range: { start, end: start + trimmed.length } };
}

/** A printable ASCII character other than the space: never trimmed. */
function isPlainVisible(code: number): boolean {
  return code > 0x20 && code < 0x7f;
}

const ASTERISK = 0x2a;
const UNDERSCORE = 0x5f;
const BACKTICK = 0x60;

/** Markdown emphasis or code ticks around a whole cell: **SF4**, `SF4`, _SF4_. */
function unwrapped(field: RecordField): RecordField {
  // Only a cell opening with one of the marks can be wrapped; skip the expression for the rest.
  const first = field.text.charCodeAt(0);
  if (first !== ASTERISK && first !== UNDERSCORE && first !== BACKTICK) return field;
  const match = /^(\*\*|__|\*|_|`)(.+)\1$/.exec(field.text);
  if (!match) return field;
  const inner = match[2];
  const start = field.range.start + match[1].length;
  return field.range.end - field.range.start === field.text.length
    ? { ...field, text: inner, range: { start, end: start + inner.length } }
    : { ...field, text: inner };
}

/** Adds the record for `fields` (if any field names a species) to `sink`. */
export function addRecord(fields: readonly RecordField[], read: SpeciesReader, sink: RecordSink): void {
  // One pass over the fields, without intermediate lists: tables call this once a row.
  const naming: RecordField[] = [];
  let cells: TableCell[] = [];
  let chargeCell: TableCell | undefined;
  // A charge cell of minus signs alone: a placeholder, or the charge itself ("hydroxide, OH, -").
  let dashes: TableCell | undefined;
  for (const written of fields) {
    const field = trimmedField(written);
    if (field.text.length === 0) continue;
    if (isPlaceholder(field.text)) {
      if (field.meaning === "charge" && MINUS_SIGNS.test(field.text))
        dashes ??= { meaning: "charge", range: field.range, text: field.text };
      continue;
    }
    if (field.meaning === "constituent") {
      constituentOf(field, read, sink);
      continue;
    }
    if (namesSpecies(field.meaning)) naming.push(unwrapped(field));
    else {
      const cell: TableCell = field.language
        ? { meaning: field.meaning, range: field.range, text: field.text, language: field.language }
        : { meaning: field.meaning, range: field.range, text: field.text };
      cells.push(cell);
      if (field.meaning === "charge") chargeCell ??= cell;
    }
  }
  if (naming.length === 0) return;
  if (!chargeCell && dashes && namedWithCharge(naming, chargeOfCell(dashes.text), read)) {
    chargeCell = dashes;
    cells.push(dashes);
  }
  // Every species the row names carries the row's charge; one that cannot is read as written.
  const rowCharge = chargeCell && chargeOfCell(chargeCell.text);
  let uncharged: Set<SpeciesOccurrence> | undefined;
  const charged = (occurrence: SpeciesOccurrence): SpeciesOccurrence => {
    if (!rowCharge) return occurrence;
    const species = withRowCharge(occurrence, rowCharge, read);
    if (species) return species;
    (uncharged ??= new Set()).add(occurrence);
    return occurrence;
  };
  if (naming.length > 1) inRankOrder(naming);
  const found: SpeciesOccurrence[] = [];
  let failed: UnreadableSpecies[] | undefined;
  // The first formula cell and the first name cell, for the check that they agree.
  let formula: SpeciesOccurrence | undefined;
  let name: SpeciesOccurrence | undefined;
  let nameCell: RecordField | undefined;
  // A row about a mixture ("5% H2 in N2") names no single species for its other cells to describe.
  let mixtureParts: readonly SpeciesOccurrence[] | undefined;
  for (const field of naming) {
    if (field.meaning === "smiles") {
      const smiles = smilesAt(field.text, 0, field.text.length);
      if (smiles && isOccurrence(smiles)) found.push(moved(smiles, field.range.start));
      else if (smiles) (failed ??= []).push(movedUnreadable(smiles, field.range.start));
      continue;
    }
    const result = read(field.text);
    if (result.ok) {
      const occurrence = charged(occurrenceAt(result.value, field.text, field.range.start));
      found.push(occurrence);
      if (result.value.notation !== "name") {
        if (field.meaning === "species") formula ??= occurrence;
      } else if (!name) {
        name = occurrence;
        nameCell = field;
      }
      continue;
    }
    // A species cell is read as a mixture before names; a name cell's synonyms ("Acetone /
    // propanone") come before a mixture.
    const mixture = field.meaning === "species" ? mixtureComponents(field, read) : undefined;
    const named = mixture ? undefined : namesOpeningCellOf(field, read)?.map(charged);
    if (named) {
      for (const occurrence of named) found.push(occurrence);
      if (!name && named[0].reading.notation === "name") {
        name = named[0];
        nameCell = field;
      }
      continue;
    }
    const components = mixture ?? (field.meaning === "name" ? mixtureComponents(field, read) : undefined);
    if (components) {
      for (const occurrence of components) found.push(occurrence);
      mixtureParts = components;
      continue;
    }
    const element = elementOpeningCellOf(field, read);
    if (element) {
      const occurrence = charged(element);
      found.push(occurrence);
      if (!name) {
        name = occurrence;
        nameCell = field;
      }
    } else if (field.meaning === "species") (failed ??= []).push(unreadableAt(field.text, field.range.start, result));
  }
  for (const occurrence of found) sink.occurrences.push(occurrence);
  // A name the reader does not know is no mistake when another column names the species; a
  // formula it cannot read always is.
  if (failed) {
    for (const unreadable of failed) {
      if (unreadable.problem.code !== "unknown-name" || found.length === 0) sink.unreadable.push(unreadable);
    }
  }
  if (found.length === 0) return;
  if (mixtureParts) {
    // "Nitric oxide std" beside "NO 10 ppm, N2 bal": the name is one of the mixture's parts. A
    // record with no cells to check says the two are one species, so its note is said once.
    const named = name && mixtureParts.find((part) => sameSpecies(part, name));
    if (named && name) sink.records.push({ species: named, cells: [], otherNames: [name] });
    return;
  }
  // The charge column is compared with the species only when the two were read together.
  if (chargeCell && uncharged?.has(found[0])) cells = cells.filter((cell) => cell !== chargeCell);
  if (found.length === 1) sink.records.push({ species: found[0], cells });
  else if (!formula || !name || !nameCell) sink.records.push({ species: found[0], cells, otherNames: found.slice(1) });
  // A record field is a table cell with one more property: it serves as the name cell as it is.
  else sink.records.push({ species: found[0], cells, otherNames: found.slice(1), nameBesideFormula: { name, nameCell, formula } });
}

/** Whether two occurrences name one species: the same formula and charge, however written. */
export function sameSpecies(a: SpeciesOccurrence, b: SpeciesOccurrence): boolean {
  return a.reading.formula === b.reading.formula && a.reading.charge === b.reading.charge;
}

/**
 * Whether a cell of a column that names species reads as the row's species as `addRecord` reads
 * it: a formula, name or SMILES, a mixture, or a name with a qualifier after it ("ammonia
 * (anhydrous, small cylinder)", "Argon, UHP"). A markdown table scans any other such cell with
 * words in it as prose ("SF4 (reference)").
 */
export function namingCellReads(written: RecordField, read: SpeciesReader): boolean {
  const field = unwrapped(trimmedField(written));
  if (field.meaning === "smiles" || read(field.text).ok) return true;
  if (field.meaning === "species" && mixtureComponents(field, read)) return true;
  if (namesOpeningCellOf(field, read)) return true;
  if (field.meaning === "name" && mixtureComponents(field, read)) return true;
  return elementOpeningCellOf(field, read) !== undefined;
}

/**
 * A cation or anion cell ("Ca++", "SO4-2", "chloride"): a species of its own, spotted where it is
 * written. It is not the row's species, so no other cell is checked against it; and a cell it
 * cannot read is left alone, as such a column may hold notes ("mixed", "see text").
 */
function constituentOf(field: RecordField, read: SpeciesReader, sink: RecordSink): void {
  const cell = unwrapped(field);
  const result = read(cell.text);
  if (result.ok) sink.occurrences.push(occurrenceAt(result.value, cell.text, cell.range.start));
}

/**
 * What a name cell, or a species column that is not headed as a formula ("Substance",
 * "Chemical"), opens with when the whole cell is more than a name: such columns hold names with a
 * strength or form after them ("Hydrochloric acid, dilute"). A species column's cell counts only
 * when it opens with a name, so a formula with a word after it is still reported.
 */
function namesOpeningCellOf(field: RecordField, read: SpeciesReader): readonly SpeciesOccurrence[] | undefined {
  if (field.meaning === "name") return namesOpeningCell(field, read);
  if (field.meaning !== "species" || field.formulaHeader) return undefined;
  const named = namesOpeningCell(field, read);
  return named && named[0].reading.notation === "name" ? named : undefined;
}

const MINUS_SIGNS = /^[-\u2212\u2013]{1,3}$/;

/**
 * Whether a name in the row reads as a species of charge `charge`: "hydroxide" beside "-" says
 * the dash is the charge −1, where "water" beside "-" says the cell is empty.
 */
function namedWithCharge(naming: readonly RecordField[], charge: number | undefined, read: SpeciesReader): boolean {
  if (charge === undefined) return false;
  return naming.some((field) => {
    const result = field.meaning === "smiles" ? undefined : read(field.text);
    return result?.ok === true && result.value.notation === "name" && result.value.charge === charge;
  });
}

/**
 * An element's name opening a name cell, or a species column's cell that is not headed as a
 * formula, with a grade or a remark after it: "Argon (UHP)", "Nitrogen, 99.999%", "Helium -
 * balloon grade". Prose reads an element's name as a plain word unless the words around it say
 * "substance"; in a column of names it names the element.
 */
function elementOpeningCellOf(field: RecordField, read: SpeciesReader): SpeciesOccurrence | undefined {
  if (field.meaning !== "name" && (field.meaning !== "species" || field.formulaHeader)) return undefined;
  const word = ELEMENT_WORD.exec(field.text)?.[0];
  if (!word || !elementByName(word)) return undefined;
  const result = read(word);
  return result.ok ? occurrenceAt(result.value, word, field.range.start) : undefined;
}

/**
 * A word that is the whole cell, or is followed by punctuation, a dash or a bracket after a
 * space: not by another word ("Calcium monohydroxide ion", "Carbon black") nor by a bracket
 * against it ("Copper(II) carbonate"), which make it part of a longer name.
 */
const ELEMENT_WORD = /^[A-Za-z]+(?=$|\s*[,;:]|\s+[-\u2013\u2014(])/;

/**
 * The species a name cell opens with when the whole cell is more than a name, then any synonym
 * after it: inventories write the grade or form after the name ("Hydrochloric acid 2 M", "Zinc
 * granules") and other names in brackets ("Propanone (acetone)"). Read as prose, so the words after
 * the name are judged as prose judges them. Undefined unless the cell starts with a species.
 */
function namesOpeningCell(field: RecordField, read: SpeciesReader): readonly SpeciesOccurrence[] | undefined {
  // Escapes make the written range longer than the value: offsets in the value would not map.
  if (field.range.end - field.range.start !== field.text.length) return undefined;
  const found = emptySink();
  scanProse(field.text, 0, field.text.length, found, read);
  if (found.occurrences[0]?.range.start !== 0) return undefined;
  return found.occurrences.map((occurrence) => moved(occurrence, field.range.start));
}

/**
 * Formula columns first, then other species columns, then names; fields of equal rank keep their
 * order. An insertion sort: a record has two or three such fields.
 */
function inRankOrder(naming: RecordField[]): void {
  for (let index = 1; index < naming.length; index++) {
    const field = naming[index];
    let place = index;
    while (place > 0 && rank(naming[place - 1]) > rank(field)) {
      naming[place] = naming[place - 1];
      place--;
    }
    naming[place] = field;
  }
}

function rank(field: RecordField): number {
  if (field.meaning === "species") return field.formulaHeader ? 0 : 1;
  return field.meaning === "smiles" ? 2 : 3;
}

/** What a cell holds when it holds nothing: "—", "-", "n/a", "none", "?". */
const PLACEHOLDER = /^(?:[-\u2010-\u2015\u2212]+|n\/?a\.?|none|nil|\?+|tbd|\.{2,3}|\u2026|\u2205)$/i;

function isPlaceholder(text: string): boolean {
  // "Na" with a capital N and a small a is sodium's symbol; "NA", "na" and "N/A" say not available.
  return text.length <= 5 && text !== SODIUM && PLACEHOLDER.test(text);
}

const SODIUM = "Na";

/** An occurrence read from a cell's own text, moved to the cell's place in the document. */
function moved(occurrence: SpeciesOccurrence, start: number): SpeciesOccurrence {
  const range = { start: occurrence.range.start + start, end: occurrence.range.end + start };
  return { ...occurrence, range, reading: { ...occurrence.reading, range } };
}

function movedUnreadable(unreadable: UnreadableSpecies, start: number): UnreadableSpecies {
  const shift = (range: TextRange): TextRange => ({ start: range.start + start, end: range.end + start });
  const problem = unreadable.problem.range ? { ...unreadable.problem, range: shift(unreadable.problem.range) } : unreadable.problem;
  return { ...unreadable, range: shift(unreadable.range), problem };
}
