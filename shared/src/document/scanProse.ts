/**
 * Finds species in running prose (markdown paragraphs, plain text): formulas such as SF4, NH4+ or
 * SO4^2-, mhchem `\ce{...}` spans, names such as "sulfur tetrafluoride", and `smiles:` code spans.
 * Precision comes first: a token counts only when its shape and context leave no doubt, and the
 * species reader has the last word on every candidate.
 */
import { scriptMarkupAt, withUnicodeScripts } from "../chemistry/reader/markupScripts";
import { isGluedCoefficient, isLoneReactant } from "./equationContext";
import { isSafeSpellingFix } from "./fixPolicy";
import { isAlloyDesignation, isCalledAPiece, isGroupFragment, isSeriesId, type SeriesMemo } from "./nonSpeciesContext";
import { latexKeyCommandEnd } from "./latexCommands";
import { latexMathSpan, scanLatexMath, type MathSpan } from "./latexMathSpan";
import { holdsMhchem, mhchemOpensAt, mhchemSpanEnd, scanMhchemBody } from "./mhchemSpan";
import { equationsInProse } from "./reactions/proseEquations";
import { isChemicalContext, isPartOfCode, isWordContext } from "./proseContext";
import { isConfidentToken, isWordlikeCompound, needsCalmContext, shapeOf } from "./proseTokenRules";
import { isSingleBondedMolecule } from "./singleBondRuns";
import { isOccurrence, smilesAt, smilesOccurrence } from "./smilesSpan";
import { newNameScanState, scanNamesInChunk, type NameScanState } from "./proseNames";
import { emptySink, memoisedReader, occurrenceAt, unreadableAt, type ScanSink, type ScanSteps, type SpeciesReader } from "./speciesReader";
import type { SpeciesReading } from "../chemistry/types";
import type { SpeciesOccurrence } from "./types";

/** Chunks longer than this are pasted data (base64, hashes, minified text), not words. */
const MAX_CHUNK = 300;

/**
 * Every species mentioned in `text`, in order. Ranges are offsets into `text` plus `offset`, so a
 * caller that passes a slice of a document can ask for document offsets.
 */
export function findSpeciesInProse(text: string, offset = 0): SpeciesOccurrence[] {
  const sink = emptySink();
  scanProse(text, 0, text.length, sink, memoisedReader());
  if (offset === 0) return sink.occurrences;
  return sink.occurrences.map((occurrence) => shifted(occurrence, offset));
}

function shifted(occurrence: SpeciesOccurrence, offset: number): SpeciesOccurrence {
  const range = { start: occurrence.range.start + offset, end: occurrence.range.end + offset };
  return { ...occurrence, range, reading: { ...occurrence.reading, range } };
}

interface ProseScan {
  readonly text: string;
  readonly end: number;
  readonly sink: ScanSink;
  readonly read: SpeciesReader;
  readonly names: NameScanState;
  /** Backtick runs known to have no closing run further on, by length (keeps the scan linear). */
  readonly unclosedTicks: Set<number>;
  /** Where scanning goes on after a mention that ran past its chunk ("CuSO4 · 5H2O"). */
  resumeAt: number;
  /** Which blocks of the text hold the first id of a series (N1), per symbol. */
  readonly seriesMemo: SeriesMemo;
  /** Unmarked code spans already tried as SMILES: the occurrence at offset 0, or null. */
  readonly smilesMemo: Map<string, SpeciesOccurrence | null>;
  /** What the stretch takes from the text around it and hands on, when the caller keeps it. */
  readonly carry?: ProseCarry;
}

/**
 * The little a stretch of prose reads from the stretches around it, for a caller that reads a
 * document a paragraph at a time: an HTML comment left open goes on into the next paragraph, and
 * ids numbered 1 in nearby paragraphs make a lone "N2" a sample id. The scan sets `commentOpen` as
 * it leaves.
 */
export interface ProseCarry {
  /** An HTML comment opened before the stretch is still open where it starts (and, after the scan, where it ends). */
  commentOpen: boolean;
  /** Whether "X1" stands alone in a stretch near this one, for the symbol X: then "X2" here is an id too. */
  readonly seriesNearby: (symbol: string) => boolean;
}

/** Scans `text[start, end)` and adds what it finds to `sink`, with offsets into `text`. */
export function scanProse(text: string, start: number, end: number, sink: ScanSink, read: SpeciesReader): void {
  for (const _ of proseSteps(text, start, end, sink, read, Infinity));
}

/**
 * `scanProse` that pauses whenever `sink` holds at least `pauseAt` items, yielding the offset it
 * goes on from: whatever it adds to `sink` later starts there or after.
 */
export function* proseSteps(
  text: string,
  start: number,
  end: number,
  sink: ScanSink,
  read: SpeciesReader,
  pauseAt: number,
  carry?: ProseCarry,
): ScanSteps {
  const scan: ProseScan = {
    text,
    end,
    sink,
    read,
    names: newNameScanState(),
    unclosedTicks: new Set(),
    resumeAt: start,
    seriesMemo: new Map(),
    smilesMemo: new Map(),
    carry,
  };
  if (sink.reactions) sink.reactions.push(...equationsInProse(text, start, end, read));
  let index = carry?.commentOpen ? commentEnd(scan, start) : start;
  while (index < end) {
    if (sink.occurrences.length + sink.unreadable.length >= pauseAt) yield index;
    const code = text.charCodeAt(index);
    if (isSpaceCode(code)) {
      index++;
      continue;
    }
    if (code === 0x60) {
      index = codeSpan(scan, index);
      continue;
    }
    if (code === 0x5c && mhchemOpensAt(text, index)) {
      index = mhchemSpan(scan, index);
      continue;
    }
    const keyEnd = code === 0x5c ? latexKeyCommandEnd(text, index, end) : index;
    if (keyEnd > index) {
      index = keyEnd;
      continue;
    }
    if (code === 0x24 || (code === 0x5c && (text.charCodeAt(index + 1) === 0x28 || text.charCodeAt(index + 1) === 0x5b))) {
      const math = latexMathSpan(text, index, end);
      if (math) {
        index = mathSpan(scan, math);
        continue;
      }
    }
    if (code === 0x3c && text.startsWith("<!--", index)) {
      index = commentEnd(scan, index + 4);
      continue;
    }
    let chunkEnd = index + 1;
    while (chunkEnd < end) {
      const next = text.charCodeAt(chunkEnd);
      // reStructuredText glues a role to the letters around it with escaped spaces: "H\ :sub:`2`\ O".
      const role = next === 0x5c || next === 0x3a ? scriptMarkupAt(text, chunkEnd, end) : undefined;
      if (role) {
        chunkEnd = role.end;
        continue;
      }
      if (isSpaceCode(next) || next === 0x60 || (next === 0x5c && mhchemOpensAt(text, chunkEnd))) break;
      // "Eq.~\ref{eq:NO2}": a key is no prose.
      if (next === 0x5c && latexKeyCommandEnd(text, chunkEnd, end) > chunkEnd) break;
      // Math may open right after a bracket or quote: "($H_2O$)".
      if (next === 0x24 && isLeadingPunctuation(text.charCodeAt(chunkEnd - 1))) break;
      chunkEnd++;
    }
    scanChunk(scan, index, chunkEnd);
    index = chunkEnd;
    if (scan.resumeAt > index) index = scan.resumeAt;
  }
}

/**
 * Where scanning goes on after a comment open at `from`: past its "-->", or the stretch's end (an
 * unclosed comment hides the rest of the stretch, and of the paragraphs after it when carried).
 */
function commentEnd(scan: ProseScan, from: number): number {
  const close = scan.text.indexOf("-->", from);
  const closed = close >= 0 && close < scan.end;
  if (scan.carry) scan.carry.commentOpen = !closed;
  return closed ? close + 3 : scan.end;
}

function isSpaceCode(code: number): boolean {
  return code === 0x20 || code === 0x0a || code === 0x09 || code === 0x0d || code === 0xa0 || code === 0x0c;
}

/** An inline code span: skipped, unless it is marked `smiles:`. Returns where scanning goes on. */
function codeSpan(scan: ProseScan, open: number): number {
  const { text, end } = scan;
  let ticksEnd = open;
  while (ticksEnd < end && text.charCodeAt(ticksEnd) === 0x60) ticksEnd++;
  const length = ticksEnd - open;
  if (scan.unclosedTicks.has(length)) return ticksEnd;
  // Search only this stretch of prose: a span never closes in a later paragraph.
  const stretch = text.slice(ticksEnd, end);
  const fence = "`".repeat(length);
  let close = stretch.indexOf(fence);
  while (close >= 0 && stretch.charCodeAt(close + length) === 0x60) {
    // A longer run does not close this span; skip past it.
    let runEnd = close;
    while (stretch.charCodeAt(runEnd) === 0x60) runEnd++;
    close = stretch.indexOf(fence, runEnd);
  }
  if (close < 0) {
    scan.unclosedTicks.add(length);
    return ticksEnd;
  }
  close += ticksEnd;
  // reStructuredText: ":math:`H_3O^+`" is math; "`dissolved CO2 <https://...>`_" is a link whose text is prose.
  if (length === 1 && text.endsWith(":math:", open)) {
    scanLatexMath(text, ticksEnd, close, scan.read, scan.sink);
    return close + length;
  }
  if (length === 1 && text.charCodeAt(close + 1) === 0x5f && text.charCodeAt(open - 1) !== 0x3a) {
    const target = text.lastIndexOf(" <", close);
    scanProse(text, ticksEnd, target > ticksEnd && text.charCodeAt(close - 1) === 0x3e ? target : close, scan.sink, scan.read);
    return close + length;
  }
  const found = smilesOccurrence(text, ticksEnd, close) ?? unmarkedSmiles(scan, ticksEnd, close);
  if (found && isOccurrence(found)) scan.sink.occurrences.push(found);
  else if (found) scan.sink.unreadable.push(found);
  return close + length;
}

/**
 * A code span holding a SMILES without the `smiles:` marker ("`CC(=O)O`"): offered as a species
 * when it spells three or more heavy atoms and is neither a word nor a formula, and never checked,
 * as the writer did not say it is chemistry.
 */
function unmarkedSmiles(scan: ProseScan, start: number, end: number): SpeciesOccurrence | undefined {
  const { text } = scan;
  if (end - start < 3 || end - start > 200) return undefined;
  const content = text.slice(start, end);
  if (/^[A-Za-z]+$/.test(content) || !/^[A-Za-z0-9@+\-[\]()=#$/\\%.:*]+$/.test(content)) return undefined;
  // Notes repeat their code spans; each distinct one is parsed once per scan, at offset 0.
  let template = scan.smilesMemo.get(content);
  if (template === undefined) {
    template = null;
    const found = scan.read(content).ok ? undefined : smilesAt(content, 0, content.length);
    if (found && isOccurrence(found)) {
      let heavyAtoms = 0;
      for (const part of found.reading.composition) if (part.symbol !== "H") heavyAtoms += part.count;
      if (heavyAtoms >= 3) template = found;
    }
    scan.smilesMemo.set(content, template);
  }
  if (template === null) return undefined;
  const range = { start, end };
  return { ...template, range, reading: { ...template.reading, range }, inferred: true };
}

/** A `\ce{...}` span: every piece is chemistry, so every readable piece counts. */
function mhchemSpan(scan: ProseScan, open: number): number {
  const { text, end } = scan;
  const spanEnd = mhchemSpanEnd(text, open, end);
  if (spanEnd < 0) return open + 4;
  scanMhchemBody(text, open + 4, spanEnd - 1, scan.read, scan.sink);
  return spanEnd;
}

/** A LaTeX math span: species typed in math, or prose around a nested `\ce{...}`. */
function mathSpan(scan: ProseScan, math: MathSpan): number {
  if (holdsMhchem(scan.text.slice(math.contentStart, math.contentEnd))) {
    scanProse(scan.text, math.contentStart, math.contentEnd, scan.sink, scan.read);
  } else {
    scanLatexMath(scan.text, math.contentStart, math.contentEnd, scan.read, scan.sink);
  }
  return math.end;
}

const URL_OR_MAIL = /:\/\/|^[<(["']*www\.|[A-Za-z0-9._%+-]@[A-Za-z0-9-]+\.[A-Za-z]/;

/** One whitespace-free chunk of prose. */
function scanChunk(scan: ProseScan, start: number, end: number): void {
  const { text } = scan;
  if (end - start > MAX_CHUNK) return;
  const chunk = text.slice(start, end);
  // A markdown link: the text before "](" is prose, the destination after it is not.
  const link = chunk.indexOf("](");
  if (link >= 0) {
    scanChunk(scan, start, start + link + 1);
    return;
  }
  if (URL_OR_MAIL.test(chunk)) return;
  // The later words of a name already found are part of it, formulas included.
  if (start < scan.names.nameEnd) return;
  // "V(NaOH)/mL", "n(KHP) =": a quantity of the species in brackets; the species starts inside.
  if (isQuantityOf(text, start, end)) {
    scanChunk(scan, start + 2, end);
    return;
  }
  scanNamesInChunk(text, start, end, scan.end, scan.read, scan.sink, scan.names);
  if (start < scan.names.nameEnd) return;
  scanFormulas(scan, start, end);
}

/** Punctuation that may sit before a word: ( [ " ' * _ < and curly quotes. */
function isLeadingPunctuation(code: number): boolean {
  return (
    code === 0x28 ||
    code === 0x5b ||
    code === 0x22 ||
    code === 0x27 ||
    code === 0x2a ||
    code === 0x5f ||
    code === 0x3c ||
    code === 0x201c ||
    code === 0x2018
  );
}

/** Formula tokens inside one chunk, e.g. "(SF4)," or "NF3/SF6" or "NH4+". */
function scanFormulas(scan: ProseScan, start: number, end: number): void {
  // Most words hold no bond mark: looked for once per word, not at every capital.
  const word = scan.text.slice(start, end);
  const bondMarks = BOND_MARK.test(word) || SINGLE_BOND_MARK.test(word);
  const { text } = scan;
  let index = start;
  while (index < end) {
    const code = text.charCodeAt(index);
    const startsToken = isUpper(code) || code === 0x28 || code === 0x5b || massNumberEnd(text, index, end) > index;
    if (!startsToken || (isWordCharacter(text.charCodeAt(index - 1)) && !afterCoefficient(text, start, index))) {
      const massStart = isUpper(code) ? asciiMassNumberStart(text, start, index) : index;
      index = massStart < index ? formulaToken(scan, massStart, end, index - massStart) : index + 1;
      continue;
    }
    const bonded = bondMarks ? bondedRunEnd(scan, index, end, start) : index;
    index = bonded > index ? bonded : formulaToken(scan, index, end);
  }
}

/** Groups joined by bond marks with no space: "CH2=CH2", "HC≡CH", "O=C=O", "CH3-CH=CH2", "C=O". */
const BONDED_RUN = /[A-Z([][A-Za-z0-9()[\]]*(?:[-\u2013=\u2261][A-Z([][A-Za-z0-9()[\]]*)+/y;

/**
 * A structural formula written with bond marks, read whole rather than as the groups between the
 * marks (CH2=CH2 is ethene, not two CH2). Two lone atoms joined by one mark ("C=O", "N≡N") name a
 * bond, not a species, and so do only carbons ("C=C=C"): nothing is reported. A run of single
 * bonds is read whole only when its groups make one molecule ("CH3-CH3"), and otherwise ("F-S-F",
 * "NF3-SF6") left to the word rules. Returns where scanning goes on, or `index` when there is no
 * such run here.
 */
function bondedRunEnd(scan: ProseScan, index: number, end: number, chunkStart: number): number {
  const { text } = scan;
  // "SO2+O2=SO3": an equation typed without spaces uses "=" as its arrow.
  if (EQUATION_SIGN.test(text.slice(chunkStart, end))) return index;
  BONDED_RUN.lastIndex = index;
  const match = BONDED_RUN.exec(text);
  if (!match) return index;
  let runEnd = index + match[0].length;
  // The run ends the word: "CH2=CH2," but not "C=Ox" or "X=Y1a".
  while (runEnd > index && runEnd <= end && isClose(text.charCodeAt(runEnd - 1)) && depthOf(text, index, runEnd) < 0) runEnd--;
  if (runEnd > end || (runEnd < end && isWordCharacter(text.charCodeAt(runEnd)))) return index;
  const run = text.slice(index, runEnd);
  const groups = run.split(/[-\u2013=\u2261]/);
  if (!BOND_MARK.test(run)) {
    // "(CH3-CH3)": the brackets of the sentence hold the run, not its first and last groups.
    const enclosed = isOpen(run.charCodeAt(0)) && closingOf(run, 0, run.length) === run.length - 1;
    const pieces = enclosed ? run.slice(1, -1).split(/[-\u2013]/) : groups;
    if (!isSingleBondedMolecule(pieces, scan.read)) return index;
  } else {
    const loneAtoms = groups.every((group) => /^[A-Z][a-z]?$/.test(group));
    if (loneAtoms && (groups.length < 3 || groups.every((group) => group === "C"))) return runEnd;
  }
  const result = scan.read(run);
  if (!result.ok) return index;
  scan.sink.occurrences.push(occurrenceAt(result.value, run, index, "formula"));
  return runEnd;
}

const BOND_MARK = /[=\u2261]/;
/** A hyphen or en dash between a group and a capital: perhaps "CH3-CH3", perhaps "NF3-SF6". */
const SINGLE_BOND_MARK = /[A-Za-z0-9)\]][-\u2013][A-Z([]/;
/** A plus or an arrow in a word: an equation, not a structural formula. */
const EQUATION_SIGN = /\+|->|<-|[\u2192\u27f6\u21cc]/;

/**
 * "13CO2", "15N2" outside an equation: digits glued before a formula at the start of a word are a
 * mass number when there are two or three of them (a coefficient would be one digit, and "2H" is
 * a proton count). Returns where the digits start, or `index` when they are no mass number.
 */
function asciiMassNumberStart(text: string, chunkStart: number, index: number): number {
  let digitsStart = index;
  while (digitsStart > chunkStart && index - digitsStart < 4 && isDigitCode(text.charCodeAt(digitsStart - 1))) digitsStart--;
  if (index - digitsStart < 2 || index - digitsStart > 3 || text.charCodeAt(digitsStart) === 0x30) return index;
  for (let at = chunkStart; at < digitsStart; at++) if (!isLeadingPunctuation(text.charCodeAt(at))) return index;
  return isGluedCoefficient(text, digitsStart, index) ? index : digitsStart;
}

/** "2H2O" at the start of a chunk, on an equation line: the formula starts after the digits. */
function afterCoefficient(text: string, chunkStart: number, index: number): boolean {
  if (!isUpper(text.charCodeAt(index))) return false;
  let digitsStart = index;
  while (digitsStart > chunkStart && isDigitCode(text.charCodeAt(digitsStart - 1))) digitsStart--;
  if (digitsStart === index) return false;
  // Only brackets or quotes may come before the coefficient inside the chunk.
  for (let at = chunkStart; at < digitsStart; at++) if (!isLeadingPunctuation(text.charCodeAt(at))) return false;
  return isGluedCoefficient(text, digitsStart, index);
}

function isDigitCode(code: number): boolean {
  return code >= 0x30 && code <= 0x39;
}

function isUpper(code: number): boolean {
  return code >= 0x41 && code <= 0x5a;
}

function isWordCharacter(code: number): boolean {
  return (code >= 0x30 && code <= 0x39) || isUpper(code) || (code >= 0x61 && code <= 0x7a);
}

function isBodyCharacter(code: number): boolean {
  return (
    isWordCharacter(code) ||
    code === 0x28 ||
    code === 0x29 ||
    code === 0x5b ||
    code === 0x5d ||
    code === 0xb7 ||
    (code >= 0x2080 && code <= 0x2089)
  );
}

function isSuperscript(code: number): boolean {
  return code === 0xb9 || code === 0xb2 || code === 0xb3 || code === 0x2070 || (code >= 0x2074 && code <= 0x207b);
}

function isSign(code: number): boolean {
  // An en dash is how word processors and hand-typed memos often write the minus: "Cl–", "SO4 2–".
  return code === 0x2b || code === 0x2d || code === 0x2212 || code === 0x2013;
}

/**
 * The end of a TeX subscript count at `at` after a symbol or a bracket ("H_2O", "Fe_{2}O_3"), or
 * `at`. Snake-case names ("NH3_flow", "run_2") are not counts: the body must be formula-like.
 */
function texSubscriptEnd(text: string, start: number, at: number, end: number): number {
  if (text.charCodeAt(at) !== 0x5f || at === start || !/[A-Za-z)\]]/.test(text[at - 1])) return at;
  const match = /^_(?:[0-9]{1,3}|\{[0-9]{1,3}\})/.exec(text.slice(at, Math.min(end, at + 6)));
  if (!match) return at;
  const after = text.charCodeAt(at + match[0].length);
  // "CO_2_ppm": a name made of words, not a formula.
  if (after === 0x5f || (after >= 0x61 && after <= 0x7a)) return at;
  return at + match[0].length;
}

/** Superscript mass numbers before an element symbol: "¹³C", "¹⁸O". */
const MASS_NUMBERS = /[\u00b9\u00b2\u00b3\u2070\u2074-\u2079]+(?=[A-Z])/g;

/**
 * The end of a mass number written before an element symbol at `at` ("¹³CO₂", "NaH¹³CO3",
 * "<sup>13</sup>CO<sub>2</sub>", "^13^CO~2~"), or `at` when there is none.
 */
function massNumberEnd(text: string, at: number, end: number): number {
  let index = at;
  while (index < end && index - at < 3 && isSuperscriptDigit(text.charCodeAt(index))) index++;
  if (index > at) return isUpper(text.charCodeAt(index)) ? index : at;
  const code = text.charCodeAt(at);
  if (code !== 0x3c && code !== 0x7b && code !== 0x5e && code !== 0x5c) return at;
  const markup = scriptMarkupAt(text, at, end);
  if (!markup?.superscript || !/^[0-9]{1,3}$/.test(markup.content) || !isUpper(text.charCodeAt(markup.end))) return at;
  return markup.end;
}

function isSuperscriptDigit(code: number): boolean {
  return code === 0xb9 || code === 0xb2 || code === 0xb3 || code === 0x2070 || (code >= 0x2074 && code <= 0x2079);
}

/** Reads one token starting at `start`; returns where scanning goes on. */
function formulaToken(scan: ProseScan, start: number, end: number, massDigits = 0): number {
  const { text } = scan;
  let bodyEnd = start;
  // Counts, charges and mass numbers in markup: "Al<sub>2</sub>(CO<sub>3</sub>)<sub>3</sub>",
  // "SO<sub>4</sub><sup>2−</sup>", "H{{sub|2}}O", "H~2~O", "H\ :sub:`2`\ O", "<sup>13</sup>CO<sub>2</sub>".
  let markup = false;
  // "H_2O", "N_2" typed in prose by someone used to LaTeX.
  let tex = false;
  for (;;) {
    while (bodyEnd < end && isBodyCharacter(text.charCodeAt(bodyEnd))) bodyEnd++;
    const massEnd = massNumberEnd(text, bodyEnd, end);
    if (massEnd > bodyEnd) {
      markup ||= !isSuperscript(text.charCodeAt(bodyEnd));
      bodyEnd = massEnd;
      continue;
    }
    const subscript = scriptMarkupAt(text, bodyEnd, end);
    if (subscript && !subscript.superscript) {
      bodyEnd = subscript.end;
      markup = true;
      continue;
    }
    const texEnd = texSubscriptEnd(text, start, bodyEnd, end);
    if (texEnd === bodyEnd) break;
    bodyEnd = texEnd;
    tex = true;
  }
  // "SO4(2-)", "NH4(+)": a charge in brackets after the formula, as handbook tables write it.
  const bracketedCharge = bracketedChargeAt(text, start, bodyEnd, end);
  if (bracketedCharge) {
    const read = scan.read(text.slice(start, bracketedCharge.end));
    if (read.ok && !isPartOfCode(text, start, bracketedCharge.end)) {
      pushFormula(scan, read.value, text.slice(start, bracketedCharge.end), start);
      return bracketedCharge.end;
    }
  }
  // "NaCl(aq)": the state symbol follows the formula; the shape rules look at the formula alone.
  const state = stateSymbolBefore(text, start, bodyEnd);
  if (state > 0) bodyEnd -= state;
  let tokenEnd = bodyEnd;
  const superscript = scriptMarkupAt(text, bodyEnd, end);
  if (superscript?.superscript) {
    tokenEnd = superscript.end;
    markup = true;
  } else {
    while (tokenEnd < end && isSuperscript(text.charCodeAt(tokenEnd))) tokenEnd++;
    // "CrO₄²−": a superscript count with the sign typed on the line.
    if (tokenEnd > bodyEnd && tokenEnd < end && isSign(text.charCodeAt(tokenEnd)) && !isWordCharacter(text.charCodeAt(tokenEnd + 1)))
      tokenEnd++;
    if (tokenEnd === bodyEnd) tokenEnd = chargeEnd(text, bodyEnd, end);
    if (tokenEnd === bodyEnd && state === 0) tokenEnd = spacedChargeEnd(text, start, bodyEnd, scan.end);
  }
  // "CuSO4.5H2O", "CuSO4•5H2O", "CuSO4 · 5H2O": water of crystallisation after a hydrate dot.
  // A period with no count and formula right after it ends the sentence.
  let hydrate: HydrateTail | undefined;
  if (!markup && state === 0 && tokenEnd === bodyEnd) {
    hydrate = hydrateTail(text, bodyEnd, scan.end);
    // Only when the whole reads as one species: "Chloroform · Carbon tetrachloride" is a list.
    if (hydrate && !readsAsOne(scan, start, hydrate.end)) hydrate = undefined;
    if (hydrate) bodyEnd = tokenEnd = hydrate.end;
  }
  let bodyStart = start;
  // Brackets that belong to the sentence, not the formula: "(SF4)," "[NF3]" "SF6)".
  while (bodyStart < bodyEnd && isOpen(text.charCodeAt(bodyStart))) {
    const close = closingOf(text, bodyStart, bodyEnd);
    if (close === bodyEnd - 1 && tokenEnd === bodyEnd) {
      bodyEnd--;
      tokenEnd--;
    } else if (close >= 0) break;
    bodyStart++;
  }
  while (bodyEnd > bodyStart && isClose(text.charCodeAt(bodyEnd - 1)) && depthOf(text, bodyStart, bodyEnd) < 0) {
    if (tokenEnd !== bodyEnd) break;
    bodyEnd--;
    tokenEnd--;
  }
  const next = Math.max(tokenEnd, start + 1);
  if (bodyEnd <= bodyStart) return next;
  if (next > end) scan.resumeAt = next;
  const token = text.slice(bodyStart, tokenEnd);
  // The shape rules know the hydrate dot "·" only: the other ways of writing it are read as one.
  const written = hydrate
    ? `${text.slice(bodyStart, hydrate.dotStart)}·${text.slice(hydrate.partStart, bodyEnd).replace(/[ \t]/g, "")}`
    : text.slice(bodyStart, bodyEnd);
  const converted = markup ? withUnicodeScripts(written) : tex ? written.replace(/_\{?([0-9]+)\}?/g, "$1") : written;
  if (converted === undefined) return next;
  // "¹³CO₂" has the shape of CO₂: the mass numbers label atoms, they add none.
  const body = converted.slice(massDigits).replace(MASS_NUMBERS, "");
  if (body.length === 0) return next;
  const shape = shapeOf(body, text.slice(bodyEnd, tokenEnd));
  if (!shape) return next;
  if (!isConfidentToken(token, body, shape)) {
    // "C + O2 -> CO2": a lone element symbol counts as a reactant or product in an equation.
    const loneSymbol = shape.symbols.length === 1 && !shape.hasCount && !shape.hasCharge && body === shape.symbols[0];
    const reactant = loneSymbol && isLoneReactant(text, bodyStart, tokenEnd);
    // "tin(II) oxide (SnO)": a formula that also spells a word counts beside chemistry words.
    const chemical = !loneSymbol && isWordlikeCompound(body) && isChemicalContext(text, bodyStart, tokenEnd, shape.symbols[0]);
    if (!reactant && !chemical) return next;
  }
  if (isPartOfCode(text, bodyStart, tokenEnd)) return next;
  if (isGroupFragment(text, bodyStart, tokenEnd, body, shape.hasCharge) || isAlloyDesignation(shape.symbols)) return next;
  // An id is typed on the line ("N2"); a count written as a subscript ("N~2~", "N₂", "N_2") is chemistry.
  const scriptedCount = markup || tex || /[\u2080-\u2089]/.test(written);
  if (shape.hasCount && !shape.hasCharge && !scriptedCount && isSeriesToken(scan, bodyStart, shape.symbols)) return next;
  if (needsCalmContext(body, shape) && isWordContext(text, bodyStart, tokenEnd)) return next;
  // A state symbol belongs to the mention ("Ag+(aq)"): it is reported whole or not at all.
  const stateLength = stateSymbolAt(text, tokenEnd, end);
  if (stateLength > 0) {
    const withState = text.slice(bodyStart, tokenEnd + stateLength);
    const stateResult = scan.read(withState);
    if (stateResult.ok && (massDigits === 0 || stateResult.value.isotopes)) pushFormula(scan, stateResult.value, withState, bodyStart);
    return tokenEnd + stateLength;
  }
  // "NaCl (s)", "H₂SO₄ (aq)": a state symbol after one space belongs to the mention too, when the whole reads.
  const spacedStateEnd = spacedStateSymbolEnd(text, tokenEnd, scan.end);
  if (spacedStateEnd > tokenEnd) {
    const withState = text.slice(bodyStart, spacedStateEnd);
    const stateResult = scan.read(withState);
    if (stateResult.ok && (massDigits === 0 || stateResult.value.isotopes)) {
      pushFormula(scan, stateResult.value, withState, bodyStart);
      if (spacedStateEnd > end) scan.resumeAt = Math.max(scan.resumeAt, spacedStateEnd);
      return spacedStateEnd;
    }
  }
  const result = scan.read(token);
  // Digits read as a mass number only when the reader agrees they label an isotope.
  if (massDigits > 0) {
    if (result.ok && result.value.isotopes) pushFormula(scan, result.value, token, bodyStart);
    return next;
  }
  if (result.ok) {
    pushFormula(scan, result.value, token, bodyStart);
  } else if ((shape.hasCount || shape.hasCharge) && new Set(shape.symbols).size > 1) {
    // Report only what comes with a safe better spelling: "CLF3" -> "ClF3", never "CDCl3" -> "CdCl3".
    const suggestion = result.problem.suggestion;
    if (suggestion && isSafeSpellingFix(token, suggestion)) scan.sink.unreadable.push(unreadableAt(token, bodyStart, result));
  }
  return next;
}

/**
 * Adds the formula `written` at `start` to what the scan found. One the writer calls a fragment,
 * unit or radical ("CH2 fragments", "CH3 radicals") is shown but never the subject of a finding.
 */
function pushFormula(scan: ProseScan, reading: SpeciesReading, written: string, start: number): void {
  const occurrence = occurrenceAt(reading, written, start, "formula");
  scan.sink.occurrences.push(isCalledAPiece(scan.text, start, start + written.length) ? { ...occurrence, inferred: true } : occurrence);
}

/** A one-element token with a count in a series of ids nearby: in its own stretch, or in one near it. */
function isSeriesToken(scan: ProseScan, start: number, symbols: readonly string[]): boolean {
  if (isSeriesId(scan.text, start, symbols, scan.seriesMemo)) return true;
  return symbols.length === 1 && scan.carry !== undefined && scan.carry.seriesNearby(symbols[0]);
}

/** Whether `text[start, end)` reads as one species, with or without the sentence's brackets around it. */
function readsAsOne(scan: ProseScan, start: number, end: number): boolean {
  const { text } = scan;
  let inner = start;
  while (inner < end && isOpen(text.charCodeAt(inner))) inner++;
  let innerEnd = end;
  while (innerEnd > inner && isClose(text.charCodeAt(innerEnd - 1))) innerEnd--;
  for (const from of new Set([start, inner])) {
    for (const to of new Set([end, innerEnd])) if (from < to && scan.read(text.slice(from, to)).ok) return true;
  }
  return false;
}

/** Where a hydrate's separator starts, where its water part (count included) starts, and where it ends. */
interface HydrateTail {
  readonly dotStart: number;
  readonly partStart: number;
  readonly end: number;
}

/**
 * A hydrate dot and the part after it, from `at` (the end of a formula body): "·5H2O", ".5H2O",
 * "•5H2O", "*5H2O", " · 5H2O", " • 5 H2O". A period or star needs a count right after it, so a
 * full stop ("dried the CuSO4. Then") and a footnote star are never read as a hydrate.
 */
function hydrateTail(text: string, at: number, limit: number): HydrateTail | undefined {
  let index = at;
  while (index < limit && (text.charCodeAt(index) === 0x20 || text.charCodeAt(index) === 0x09)) index++;
  const spaced = index > at;
  const dot = text.charCodeAt(index);
  const centred = dot === 0xb7 || dot === 0x2022 || dot === 0x2219 || dot === 0x22c5;
  if (!(centred || (!spaced && (dot === 0x2e || dot === 0x2a)))) return undefined;
  if (!spaced && dot === 0xb7) return undefined;
  const dotStart = at;
  index++;
  if (spaced) while (index < limit && (text.charCodeAt(index) === 0x20 || text.charCodeAt(index) === 0x09)) index++;
  const partStart = index;
  while (index < limit && text.charCodeAt(index) >= 0x30 && text.charCodeAt(index) <= 0x39) index++;
  const counted = index > partStart;
  if (!centred && !counted) return undefined;
  if (counted && spaced && text.charCodeAt(index) === 0x20) index++;
  if (!isUpper(text.charCodeAt(index))) return undefined;
  while (index < limit && isBodyCharacter(text.charCodeAt(index))) index++;
  return { dotStart, partStart, end: index };
}

/** The length of a state symbol "(aq)", "(s)", "(l)", "(g)" ending at `end` after a formula, or 0. */
function stateSymbolBefore(text: string, start: number, end: number): number {
  for (const state of STATE_SYMBOLS) {
    if (end - state.length > start && text.endsWith(state, end)) return state.length;
  }
  return 0;
}

const STATE_SYMBOLS = ["(aq)", "(s)", "(l)", "(g)"];

/** The end of " (aq)", " (s)", " (l)" or " (g)" after a formula ending at `at`, or `at`. */
function spacedStateSymbolEnd(text: string, at: number, limit: number): number {
  if (text.charCodeAt(at) !== 0x20) return at;
  const length = stateSymbolAt(text, at + 1, limit);
  if (length === 0) return at;
  const end = at + 1 + length;
  return end < limit && isWordCharacter(text.charCodeAt(end)) ? at : end;
}

/** The length of a state symbol starting at `at`, or 0. */
function stateSymbolAt(text: string, at: number, end: number): number {
  for (const state of STATE_SYMBOLS) {
    if (at + state.length <= end && text.startsWith(state, at)) return state.length;
  }
  return 0;
}

/**
 * "V(NaOH)/mL", "n(KHP) = m / M", "c(HCl)": a quantity symbol (volume, amount, mass, concentration,
 * molar mass) with the species in brackets. Of these only V is also an element symbol: "V(CO)6" and
 * "V(OH)3" carry a count after the bracket and stay vanadium compounds.
 */
function isQuantityOf(text: string, start: number, end: number): boolean {
  if (!QUANTITY_SYMBOLS.has(text.charCodeAt(start)) || text.charCodeAt(start + 1) !== 0x28 || !isUpper(text.charCodeAt(start + 2))) {
    return false;
  }
  let close = start + 2;
  while (close < end && isWordCharacter(text.charCodeAt(close))) close++;
  if (text.charCodeAt(close) !== 0x29) return false;
  const after = text.charCodeAt(close + 1);
  return !isWordCharacter(after) && !isSubscriptCode(after) && after !== 0x28 && after !== 0x5b;
}

// common practice: V volume, n amount, m mass, c concentration, M molar mass
const QUANTITY_SYMBOLS: ReadonlySet<number> = new Set([0x56, 0x6e, 0x6d, 0x63, 0x4d]);

function isSubscriptCode(code: number): boolean {
  return code >= 0x2080 && code <= 0x2089;
}

/**
 * Plain text without superscripts writes an ion's charge after a space: "S2O3 2-", "SO4 2-". Taken
 * only after a formula with a count (a polyatomic ion) and a one-digit charge that ends the word.
 */
function spacedChargeEnd(text: string, start: number, bodyEnd: number, limit: number): number {
  if (text.charCodeAt(bodyEnd) !== 0x20 || bodyEnd + 3 > limit) return bodyEnd;
  const digit = text.charCodeAt(bodyEnd + 1);
  if (digit < 0x31 || digit > 0x34 || !isSign(text.charCodeAt(bodyEnd + 2))) return bodyEnd;
  const after = text.charCodeAt(bodyEnd + 3);
  if (bodyEnd + 3 < limit && (isWordCharacter(after) || isSign(after))) return bodyEnd;
  if (!/[A-Z][a-z]?\d/.test(text.slice(start, bodyEnd))) return bodyEnd;
  return bodyEnd + 3;
}

/**
 * A charge in brackets that ends the formula whose body ends at `bodyEnd` ("SO4(2-)", "NH4(+)",
 * "Fe(3+)"): the body scan stops inside the bracket, at its digits or before its sign. Undefined
 * unless the bracket holds only a charge and closes before the end of the word.
 */
function bracketedChargeAt(text: string, start: number, bodyEnd: number, end: number): { end: number } | undefined {
  let open = bodyEnd - 1;
  while (open > start && isDigitCode(text.charCodeAt(open))) open--;
  if (open <= start || text.charCodeAt(open) !== 0x28 || !isUpperOrCount(text.charCodeAt(open - 1))) return undefined;
  const match = /^\((?:[1-9][+\-\u2212\u2013]|[+\-\u2212\u2013][1-9]?)\)/.exec(text.slice(open, Math.min(end, open + 6)));
  if (!match) return undefined;
  const after = open + match[0].length;
  if (after < end && (isWordCharacter(text.charCodeAt(after)) || isSign(text.charCodeAt(after)))) return undefined;
  return { end: after };
}

/** A letter or digit a formula body may end with before a bracketed charge. */
function isUpperOrCount(code: number): boolean {
  return isWordCharacter(code) || code === 0x29;
}

/** The end of a charge such as "+", "2-", "^2-", "^{2-}" right after a formula body. */
function chargeEnd(text: string, bodyEnd: number, end: number): number {
  let index = bodyEnd;
  if (text.charCodeAt(index) === 0x5e) {
    index++;
    if (text.charCodeAt(index) === 0x7b) {
      const close = text.slice(index, Math.min(end, index + 6)).indexOf("}");
      return close > 0 ? index + close + 1 : bodyEnd;
    }
    while (index < end && text.charCodeAt(index) >= 0x30 && text.charCodeAt(index) <= 0x39) index++;
  }
  const signStart = index;
  while (index < end && index - signStart < 3 && isSign(text.charCodeAt(index))) index++;
  if (index === signStart) return bodyEnd;
  // A sign followed by a letter or digit is a hyphen or an operator: "NF3-rich", "NF3+SF6".
  if (index < end && (isWordCharacter(text.charCodeAt(index)) || isOtherLetter(text.charCodeAt(index)))) return bodyEnd;
  if (text.charCodeAt(signStart) === 0x2d && isSuspendedHyphen(text, index)) return bodyEnd;
  return index;
}

/** A letter outside ASCII ("κ" in NF-κB): a sign before it is a hyphen. */
function isOtherLetter(code: number): boolean {
  return code > 0x7f && /\p{L}/u.test(String.fromCharCode(code));
}

/** "CF4- and SF6-based": the hyphen waits for a word later in the sentence. */
function isSuspendedHyphen(text: string, afterSign: number): boolean {
  return /^[ \t]+(?:and|or|to|and\/or)[ \t]+\S*[A-Za-z0-9]-[A-Za-z]/.test(text.slice(afterSign, afterSign + 60));
}

function isOpen(code: number): boolean {
  return code === 0x28 || code === 0x5b;
}

function isClose(code: number): boolean {
  return code === 0x29 || code === 0x5d;
}

/** Bracket depth at the end of `text[start, end)`; negative when closers dangle. */
function depthOf(text: string, start: number, end: number): number {
  let depth = 0;
  for (let index = start; index < end; index++) {
    const code = text.charCodeAt(index);
    if (isOpen(code)) depth++;
    else if (isClose(code)) depth--;
  }
  return depth;
}

/** Index of the bracket closing the one at `open`, or -1. */
function closingOf(text: string, open: number, end: number): number {
  let depth = 0;
  for (let index = open; index < end; index++) {
    const code = text.charCodeAt(index);
    if (isOpen(code)) depth++;
    else if (isClose(code) && --depth === 0) return index;
  }
  return -1;
}
