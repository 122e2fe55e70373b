/**
 * Species names in running prose, matched against the one name vocabulary with the whole written
 * span: the longest name wins ("ethyl acetate" is one species, not the acetate ion; "copper(II)
 * sulfate" is not also sulfate), phrases that hold a name but name a mixture are skipped ("lime
 * water"), and a lone element name counts only where the text treats it as a substance.
 */
import {
  isCationWord,
  isIonName,
  isKnownName,
  isLabAbbreviation,
  isNotASpeciesPhrase,
  loneNameKind,
  mayContinueName,
  mayStartName,
} from "../chemistry/reader/names/nameWords";
import { elementByName } from "../chemistry/elements";
import { isInvisibleFormatting } from "../chemistry/reader/characters";
import { NONMETALS } from "../chemistry/reader/nonmetals";
import { occurrenceAt, type ScanSink, type SpeciesReader } from "./speciesReader";

/** The longest names are four words: "copper(II) sulfate pentahydrate", "methyl tert-butyl ether". */
const MAX_NAME_WORDS = 4;

/** What the name scan keeps between words of one stretch of prose. */
export interface NameScanState {
  /** Offset up to which text already belongs to a name (its words are not read again). */
  nameEnd: number;
  /** End of the last name reported, so a list such as "sodium, potassium and zinc" stays one. */
  lastNameEnd: number;
  /** True when the last name reported was a substance named by an element ("zinc granules"). */
  lastWasElement: boolean;
}

export function newNameScanState(): NameScanState {
  return { nameEnd: -1, lastNameEnd: -1, lastWasElement: false };
}

interface NameWord {
  readonly start: number;
  readonly end: number;
  readonly lower: string;
  /** Nothing but emphasis follows it in its chunk: a name may go on into the next word. */
  readonly open: boolean;
}

/**
 * Tries the names that begin in the whitespace-free chunk `[start, end)`, reading at most up to
 * `limit`; adds what it finds to `sink` and moves `state.nameEnd` past it. Names joined by a slash
 * ("hexanes/EtOAc", "nitrate/nitrite") are read one by one.
 */
export function scanNamesInChunk(
  text: string,
  start: number,
  end: number,
  limit: number,
  read: SpeciesReader,
  sink: ScanSink,
  state: NameScanState,
): void {
  let partStart = start;
  // only this chunk is searched: indexOf would look through the rest of the document each time
  for (let index = start; index < end; index++) {
    if (text.charCodeAt(index) !== 0x2f) continue;
    if (index > partStart) scanNameAt(text, partStart, index, index, read, sink, state);
    partStart = index + 1;
  }
  if (partStart < end) scanNameAt(text, partStart, end, limit, read, sink, state);
}

function scanNameAt(
  text: string,
  start: number,
  end: number,
  limit: number,
  read: SpeciesReader,
  sink: ScanSink,
  state: NameScanState,
): void {
  const first = nameWordIn(text, start, end);
  if (first === undefined) return;
  const exact = text.slice(first.start, first.end);
  // abbreviations are short and begin with a capital
  if (exact.length <= 5 && isUpperCode(exact.charCodeAt(0)) && isLabAbbreviation(exact)) {
    report(text, first.start, first.end, exact, read, sink, state, false);
    return;
  }
  if (first.lower.length < 3 || !mayStartName(first.lower)) return;

  const words: NameWord[] = [first];
  const phrases: string[] = [first.lower];
  let chunkEnd = end;
  while (words.length < MAX_NAME_WORDS && words[words.length - 1].open) {
    const next = nextChunk(text, chunkEnd, limit);
    if (next === undefined) break;
    const numeral = text.charCodeAt(next.start) === 0x28 ? stockNumeralIn(text, next.start, next.end) : undefined;
    const word = numeral ?? nameWordIn(text, next.start, next.end);
    if (word === undefined || word.start !== next.start || !mayContinueName(word.lower)) break;
    words.push(word);
    // "iron (III) chloride" is read as "iron(iii) chloride"
    phrases.push(numeral ? phrases[phrases.length - 1] + word.lower : `${phrases[phrases.length - 1]} ${word.lower}`);
    chunkEnd = next.end;
  }
  for (let count = words.length; count >= 2; count--) {
    const last = words[count - 1];
    const phrase = phrases[count - 1];
    if (isNotASpeciesPhrase(phrase)) {
      state.nameEnd = last.end;
      return;
    }
    // "the nitrate ion": the ion is the word before "ion"
    if (isIonWord(last.lower)) continue;
    if (isKnownName(phrase)) {
      if (makesAnotherSubstance(wordAfter(text, last.end, limit))) {
        state.nameEnd = last.end;
        return;
      }
      report(text, first.start, last.end, text.slice(first.start, last.end), read, sink, state, false);
      return;
    }
  }
  const kind = loneNameKind(first.lower);
  if (kind === undefined) return;
  const following = words.length > 1 && first.open ? words[1].lower : wordAfter(text, end, limit);
  if (makesAnotherSubstance(following)) {
    state.nameEnd = first.end;
    return;
  }
  const before = wordBefore(text, first.start);
  if (kind === "element") {
    if (isWikiLinkWord(text, first.start, first.end) || (following !== undefined && ATOM_AFTER.has(following))) return;
    if (!isSubstanceContext(text, first, before, following, state)) return;
  } else {
    const ion = following !== undefined && isIonWord(following);
    if (kind === "class" && !ion) return;
    if (!ion && isIonName(first.lower) && isPartOfLongerName(first.lower, before, following)) return;
  }
  report(text, first.start, first.end, exact, read, sink, state, kind === "element");
}

// common practice: catalogues name basic salts by adding "basic" after the salt ("copper(II)
// carbonate basic"), and dyes and indicators are a compound's name and a colour ("phenol red",
// "cresol purple"): other substances than the name alone
const ANOTHER_SUBSTANCE_AFTER: ReadonlySet<string> = new Set(["basic", "red", "blue", "green", "orange", "violet", "purple", "yellow"]);

function makesAnotherSubstance(following: string | undefined): boolean {
  return following !== undefined && ANOTHER_SUBSTANCE_AFTER.has(following);
}

// common practice: words around an ion name that make it a material or a family, not the ion
const CLASS_BEFORE: ReadonlySet<string> = new Set(["a", "an", "any", "each", "every", "metal", "binary", "organic", "inorganic"]);
const CLASS_AFTER: ReadonlySet<string> = new Set([
  "layer",
  "layers",
  "film",
  "films",
  "coating",
  "coatings",
  "salt",
  "salts",
  "compound",
  "compounds",
  "glass",
  "mineral",
  "minerals",
  "ore",
  "ores",
  "scale",
  "complex",
  "complexes",
  "ester",
  "esters",
  "group",
  "groups",
  "cupboard",
  "cabinet",
  "store",
  "room",
  "shelf",
  "hood",
]);

/**
 * A one-word ion that is the half of a longer name the vocabulary does not know: "isoamyl
 * acetate", "iron cyanide complexes", "ammonium molybdate". Better no species than the wrong one.
 */
function isPartOfLongerName(word: string, before: string | undefined, following: string | undefined): boolean {
  if (before !== undefined && (CLASS_BEFORE.has(before) || before.endsWith("yl") || isCationWord(before))) return true;
  if (following !== undefined && CLASS_AFTER.has(following)) return true;
  // a cation followed by an anion-like word: a salt with an anion the vocabulary lacks
  const cation = isCationWord(word);
  return cation && following !== undefined && following.length > 4 && /(?:ate|ite|ide)$/.test(following);
}

function report(
  text: string,
  start: number,
  end: number,
  written: string,
  read: SpeciesReader,
  sink: ScanSink,
  state: NameScanState,
  element: boolean,
): void {
  const result = read(written);
  if (!result.ok || result.value.notation !== "name") return;
  sink.occurrences.push(occurrenceAt(result.value, written, start, "name"));
  state.nameEnd = end;
  state.lastNameEnd = end;
  state.lastWasElement = element;
}

function isIonWord(word: string): boolean {
  return word === "ion" || word === "ions" || word === "anion" || word === "anions" || word === "cation" || word === "cations";
}

// common practice: words after an element name that make it atoms of the element, whatever
// comes before ("the plasma gives fluorine atoms")
const ATOM_AFTER: ReadonlySet<string> = new Set(["atom", "atoms", "nucleus", "nuclei", "isotope", "isotopes"]);

/**
 * Whether the word at `start`..`end` is the whole target or label of a wiki link ("three
 * [[fluorine]] atoms", "[[Fluorine (element)|fluorine]]"): a link to the element's page, a word.
 */
function isWikiLinkWord(text: string, start: number, end: number): boolean {
  const closes = text.startsWith("]]", end) || text.charCodeAt(end) === 0x7c;
  if (!closes) return false;
  if (text.startsWith("[[", start - 2)) return true;
  if (text.charCodeAt(start - 1) !== 0x7c) return false;
  const open = text.lastIndexOf("[[", start);
  return open >= 0 && start - open < 200 && !text.slice(open, start).includes("]]") && !text.slice(open, start).includes("\n");
}

// common practice: words around an element name that make it the substance, not an atom; the
// words of gases only after gaseous (or volatile) elements: a "nickel gas cell" is a cell
const AFTER_ANY_ELEMENT: ReadonlySet<string> = new Set([
  "solution",
  "solutions",
  "water",
  "dropwise",
  "crystals",
  "powder",
  "liquid",
  "was",
  "were",
  "reacts",
  "reacted",
  "burns",
  "burned",
  "boils",
  "condenses",
  "dissolves",
  "sublimes",
]);
const AFTER_GASEOUS_ELEMENT: ReadonlySet<string> = new Set([
  "gas",
  "gases",
  "vapour",
  "vapor",
  "cylinder",
  "cylinders",
  "atmosphere",
  "blanket",
  "purge",
  "stream",
  "flow",
  "supply",
  "line",
  "lines",
]);
const AFTER_METAL: ReadonlySet<string> = new Set([
  "metal",
  "metals",
  "turnings",
  "ribbon",
  "granules",
  "filings",
  "foil",
  "wire",
  "dust",
  "pellets",
  "chips",
  "shot",
]);
const GASEOUS_OR_VOLATILE = new Set(["H", "N", "O", "F", "Cl", "Br", "I", "He", "Ne", "Ar", "Kr", "Xe", "Rn", "Hg"]);

function isSubstanceWordAfter(elementName: string, following: string): boolean {
  if (AFTER_ANY_ELEMENT.has(following)) return true;
  const element = elementByName(elementName);
  if (element === undefined) return false;
  if (AFTER_GASEOUS_ELEMENT.has(following)) return GASEOUS_OR_VOLATILE.has(element.symbol);
  return AFTER_METAL.has(following) && !NONMETALS.has(element.symbol);
}

const SUBSTANCE_BEFORE: ReadonlySet<string> = new Set([
  "liquid",
  "gaseous",
  "molecular",
  "elemental",
  "solid",
  "dry",
  "excess",
  "pure",
  "fresh",
  "add",
  "added",
  "adding",
  "under",
  "molten",
  "powdered",
  "granulated",
  "metallic",
  "native",
  "burning",
  "burn",
  "gives",
  "give",
  "forms",
  "produces",
  "yields",
  "liberates",
  "releases",
  "evolves",
]);

function isSubstanceContext(
  text: string,
  word: NameWord,
  before: string | undefined,
  following: string | undefined,
  state: NameScanState,
): boolean {
  if (following !== undefined && isSubstanceWordAfter(word.lower, following)) return true;
  if (before !== undefined && SUBSTANCE_BEFORE.has(before)) return true;
  // the first of a pair: "sodium or potassium metal", "the chlorine and ammonia cylinders"
  const pair = /^[ \t]+(?:and|or)[ \t]+([A-Za-z]+)(?:[ \t]+([A-Za-z]+))?/.exec(text.slice(word.end, word.end + 40));
  if (pair) {
    const partner = pair[1].toLowerCase();
    const kind = loneNameKind(partner);
    if (kind === "species") return true;
    if (kind === "element" && pair[2] !== undefined && isSubstanceWordAfter(partner, pair[2].toLowerCase())) return true;
  }
  // one more item of a list of substances: "with aluminium, sodium and potassium"
  if (state.lastWasElement && state.lastNameEnd >= 0 && word.start - state.lastNameEnd < 8) {
    return /^(?:,\s*|\s+)(?:(?:and|or)\s+)?$/.test(text.slice(state.lastNameEnd, word.start));
  }
  return false;
}

/** The lower-case letters-only word just before `start` (spaces between) on its line, if any. */
function wordBefore(text: string, start: number): string | undefined {
  let end = start;
  while (end > 0 && (text.charCodeAt(end - 1) === 0x20 || text.charCodeAt(end - 1) === 0x09)) end--;
  let begin = end;
  while (begin > 0 && end - begin < 30 && isLetter(text.charCodeAt(begin - 1))) begin--;
  return begin < end ? text.slice(begin, end).toLowerCase() : undefined;
}

function isUpperCode(code: number): boolean {
  return code >= 0x41 && code <= 0x5a;
}

/** The lower-case letters-only word right after `end` (spaces between), if any. */
function wordAfter(text: string, end: number, limit: number): string | undefined {
  const match = /^[ \t]+([A-Za-z]+)/.exec(text.slice(end, Math.min(limit, end + 30)));
  return match ? match[1].toLowerCase() : undefined;
}

/** The next whitespace-free chunk after `from` in the same paragraph, stopping at code and markup. */
function nextChunk(text: string, from: number, limit: number): { start: number; end: number } | undefined {
  let index = from;
  let newlines = 0;
  while (index < limit) {
    const code = text.charCodeAt(index);
    if (code === 0x0a) newlines++;
    else if (code !== 0x20 && code !== 0x09 && code !== 0x0d && code !== 0xa0) break;
    index++;
  }
  if (index >= limit || newlines > 1) return undefined;
  let chunkEnd = index;
  while (chunkEnd < limit) {
    const code = text.charCodeAt(chunkEnd);
    if (code === 0x20 || code === 0x0a || code === 0x09 || code === 0x0d || code === 0xa0) break;
    if (code === 0x60 || code === 0x5c || code === 0x3c) return undefined;
    chunkEnd++;
  }
  return { start: index, end: chunkEnd };
}

/** A Stock numeral written apart from its element: the "(III)" of "iron (III) chloride". */
function stockNumeralIn(text: string, start: number, end: number): NameWord | undefined {
  const match = /^\((?:i|ii|iii|iv|v|vi|vii|viii)\)/i.exec(text.slice(start, Math.min(end, start + 6)));
  if (!match) return undefined;
  const wordEnd = start + match[0].length;
  const rest = text.slice(wordEnd, end);
  return { start, end: wordEnd, lower: match[0].toLowerCase(), open: /^[*_]*$/.test(rest) };
}

/** Punctuation that may sit before a word: ( [ " ' * _ and curly quotes. */
function isLeadingPunctuation(code: number): boolean {
  return (
    code === 0x28 ||
    code === 0x5b ||
    code === 0x22 ||
    code === 0x27 ||
    code === 0x2a ||
    code === 0x5f ||
    code === 0x201c ||
    code === 0x2018 ||
    // A table cell in lightweight markup: "|sulfur dioxide |".
    code === 0x7c
  );
}

/** Punctuation that may sit after a word: ) ] " ' * _ , . ; : ! ? and curly quotes. */
function isTrailingPunctuation(code: number): boolean {
  return (
    code === 0x29 ||
    code === 0x5d ||
    code === 0x22 ||
    code === 0x27 ||
    code === 0x2a ||
    code === 0x5f ||
    code === 0x2c ||
    code === 0x2e ||
    code === 0x3b ||
    code === 0x3a ||
    code === 0x21 ||
    code === 0x3f ||
    code === 0x201d ||
    code === 0x2019
  );
}

function isLetter(code: number): boolean {
  return (code >= 0x41 && code <= 0x5a) || (code >= 0x61 && code <= 0x7a);
}

/** Letters, locant digits and commas, hyphens, and the brackets of a Stock numeral. */
function isNameCharacter(code: number): boolean {
  return (
    isLetter(code) || (code >= 0x30 && code <= 0x39) || code === 0x2d || code === 0x2c || code === 0x28 || code === 0x29 || code === 0x27
  );
}

/** The word a name could be made of inside the chunk `[start, end)`, without the punctuation around it. */
function nameWordIn(text: string, start: number, end: number): NameWord | undefined {
  let wordStart = start;
  while (wordStart < end && isLeadingPunctuation(text.charCodeAt(wordStart))) wordStart++;
  let wordEnd = end;
  while (wordEnd > wordStart && isTrailingPunctuation(text.charCodeAt(wordEnd - 1))) wordEnd--;
  // "iron(III)": a closing bracket that closes one inside the word belongs to it
  let depth = 0;
  for (let index = wordStart; index < wordEnd; index++) {
    const code = text.charCodeAt(index);
    if (code === 0x28) depth++;
    else if (code === 0x29) depth--;
  }
  if (depth > 0 && text.charCodeAt(wordEnd) === 0x29) wordEnd++;
  if (wordEnd - wordStart < 2) return undefined;
  let letters = 0;
  for (let index = wordStart; index < wordEnd; index++) {
    const code = text.charCodeAt(index);
    // Word processors leave soft hyphens and zero-width spaces inside long words: "tetra\u00adfluoride".
    if (!isNameCharacter(code) && !isInvisibleFormatting(code)) return undefined;
    if (isLetter(code)) letters++;
  }
  if (letters < 2) return undefined;
  let open = true;
  for (let index = wordEnd; index < end; index++) {
    const code = text.charCodeAt(index);
    // Emphasis may close around a name; any other punctuation ends it.
    if (code !== 0x2a && code !== 0x5f) open = false;
  }
  const written = text.slice(wordStart, wordEnd);
  const visible = /[\u00ad\u200b-\u200d\u2060\ufeff]/.test(written) ? written.replace(/[\u00ad\u200b-\u200d\u2060\ufeff]/g, "") : written;
  return { start: wordStart, end: wordEnd, lower: visible.toLowerCase(), open };
}
