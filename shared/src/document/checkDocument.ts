/**
 * The checks over a document model: species the core rejects, radicals, table cells that
 * contradict what the core works out, and a record's name that names another species than its
 * formula. The model's own `problems` (malformed JSON, a stray quote) are not repeated here;
 * callers show both.
 */
import { analyzeSpecies } from "../chemistry/analyze";
import { chooseRespelling } from "../chemistry/analysis/respelling";
import type { AnalysisResult, Problem } from "../chemistry/types";
import { analyzeOccurrence, speciesTextOf } from "./analyzeOccurrence";
import { nameFormulaChecker, sameComposition, type NameFormulaCheck } from "./checks/nameFormulaAgreement";
import { checkRecord, checkRecordReading } from "./checks/recordChecks";
import { sameSpecies } from "./tables/records";
import { severityOf } from "./findingSeverity";
import { isSafeSpellingFix, type AnalyzeText } from "./fixPolicy";
import { groupAbbreviationIn } from "./groupAbbreviations";
import { reactionFindings } from "./reactions/reactionFindings";
import type { DocumentModel, Finding, SpeciesOccurrence, TableRecord, UnreadableSpecies } from "./types";

/** Findings for `model`, with `analyze` working out each distinct species once. */
export function checkDocument(model: DocumentModel, analyze: (text: string) => AnalysisResult = analyzeSpecies): Finding[] {
  return documentChecker(analyze)(model);
}

/** Distinct species texts a checker remembers; past this many it starts afresh. */
const CHECKER_MEMO_LIMIT = 20_000;

/**
 * A `checkDocument` that keeps its analyses from call to call, for a document checked part by
 * part: the findings of each part are those the whole document gives inside that part.
 */
export function documentChecker(analyze: (text: string) => AnalysisResult = analyzeSpecies): (model: DocumentModel) => Finding[] {
  const memo = new Map<string, AnalysisResult>();
  const analysisOf = (occurrence: SpeciesOccurrence): AnalysisResult | undefined => {
    const key = speciesTextOf(occurrence);
    let result = memo.get(key);
    if (!result) {
      try {
        result = analyzeOccurrence(occurrence, analyze);
      } catch (error) {
        result = { ok: false, problem: { code: "no-valid-structure", message: String(error) } };
      }
      if (memo.size >= CHECKER_MEMO_LIMIT) memo.clear();
      memo.set(key, result);
    }
    return result;
  };
  // Equation terms are plain species texts: their analyses are remembered apart from occurrences.
  const textMemo = new Map<string, AnalysisResult>();
  const analysisOfText = (text: string): AnalysisResult => {
    let result = textMemo.get(text);
    if (!result) {
      try {
        result = analyze(text);
      } catch (error) {
        result = { ok: false, problem: { code: "no-valid-structure", message: String(error) } };
      }
      if (textMemo.size >= CHECKER_MEMO_LIMIT) textMemo.clear();
      textMemo.set(text, result);
    }
    return result;
  };
  const nameFormula = nameFormulaChecker();
  return (model) => checkModel(model, analysisOf, analyze, analysisOfText, nameFormula);
}

function checkModel(
  model: DocumentModel,
  analysisOf: (occurrence: SpeciesOccurrence) => AnalysisResult | undefined,
  analyze: AnalyzeText,
  analysisOfText: (text: string) => AnalysisResult,
  nameFormula: NameFormulaCheck,
): Finding[] {
  // A name beside a formula for the same species would repeat the formula's note: say it once, on the formula.
  const echoes = new Set<SpeciesOccurrence>();
  for (const record of model.records) {
    for (const other of record.otherNames ?? []) if (sameSpecies(other, record.species)) echoes.add(other);
  }

  // "Acetone, C3H6O": a name with the formula's composition says which of the structures the
  // formula allows is meant, so the formula's request for a structure would be noise, and the
  // row's cells are checked against the named species.
  const settledBy = new Map<string, SpeciesOccurrence>();
  for (const record of model.records) {
    const pair = record.nameBesideFormula;
    if (pair && sameComposition(pair.name.reading, pair.formula.reading)) settledBy.set(rangeKey(pair.formula), pair.name);
  }
  const settles = (occurrence: SpeciesOccurrence, result: AnalysisResult | undefined): SpeciesOccurrence | undefined =>
    result && !result.ok && result.problem.code === "ambiguous-connectivity" ? settledBy.get(rangeKey(occurrence)) : undefined;

  const findings: Finding[] = [];
  for (const unreadable of model.unreadable ?? []) findings.push(unreadableFinding(unreadable, analyze));
  for (const occurrence of model.occurrences) {
    if (echoes.has(occurrence) || occurrence.inferred) continue;
    const result = analysisOf(occurrence);
    if (!result || settles(occurrence, result)) continue;
    if (!result.ok) {
      // "4 Al + 3 O2": the metal itself, right as written; its hover says what it is.
      if (result.problem.code !== "metallic-element") findings.push(problemFinding(occurrence, result.problem, analyze));
    } else if (result.value.radical) findings.push(radicalFinding(occurrence, result.value.valenceElectrons));
  }
  for (const record of model.records) {
    let result = analysisOf(record.species);
    const name = settles(record.species, result);
    if (name) result = analysisOf(name);
    if (result?.ok) checkRecord(record, result.value, findings);
    else checkRecordReading(record, findings);
    const pair = record.nameBesideFormula;
    const disagreement = pair && nameFormula(pair, model.kind, () => nameFitsCells(record, pair.name, analysisOf));
    if (disagreement) findings.push(disagreement);
  }
  if (model.reactions && model.reactions.length > 0) findings.push(...reactionFindings(model.reactions, analysisOfText));
  return findings.sort((a, b) => a.range.start - b.range.start);
}

/**
 * Whether the record's value cells fit the species its name gives at least as well as they fit
 * the record's species: changing the formula to the name's must not make the rest of the row wrong.
 */
function nameFitsCells(
  record: TableRecord,
  name: SpeciesOccurrence,
  analysisOf: (occurrence: SpeciesOccurrence) => AnalysisResult | undefined,
): boolean {
  if (record.cells.length === 0) return true;
  const named = analysisOf(name);
  if (!named?.ok) return false;
  const current = analysisOf(record.species);
  const before = current?.ok ? checkRecord(record, current.value).length : 0;
  return checkRecord({ species: name, cells: record.cells }, named.value).length <= before;
}

function rangeKey(occurrence: SpeciesOccurrence): string {
  return `${occurrence.range.start}:${occurrence.range.end}`;
}

function unreadableFinding(unreadable: UnreadableSpecies, analyze: AnalyzeText): Finding {
  const { problem, text, range } = unreadable;
  const abbreviation = problem.code === "unknown-element" ? groupAbbreviationIn(text) : undefined;
  if (abbreviation !== undefined) {
    // "PhCH3", "CDCl3": right as written, in a notation lonepair does not read.
    const message = `${text} is written with "${abbreviation}", a group or isotope symbol that lonepair does not read, so it is not analysed.`;
    return { range, severity: "information", code: problem.code, message };
  }
  return withSafeFix({ range, severity: severityOf(problem.code), code: problem.code, message: problem.message }, text, problem, analyze);
}

function problemFinding(occurrence: SpeciesOccurrence, problem: Problem, analyze: AnalyzeText): Finding {
  const message =
    problem.message.includes(occurrence.reading.formula) || problem.message.includes(occurrence.text)
      ? problem.message
      : `${occurrence.text}: ${problem.message}`;
  const finding: Finding = { range: occurrence.range, severity: severityOf(problem.code), code: problem.code, message };
  // A respelling is worked out for the species text; the cell holds only part of it (the charge is in its own column).
  if (occurrence.speciesText !== undefined) return finding;
  return withSafeFix(finding, occurrence.text, problem, analyze);
}

/**
 * Adds the reader's suggested spelling as a fix for the whole mention when the fix policy allows
 * it; otherwise the suggestion stays a hint in the message.
 */
function withSafeFix(finding: Finding, written: string, problem: Problem, analyze: AnalyzeText): Finding {
  // the reader lists every spelling that reads ("nh4+": Nh4+, NH4+); offer the species it means
  const suggestion = chooseRespelling(problem, analyze).suggestion;
  if (!suggestion) return finding;
  if (!isSafeSpellingFix(written, suggestion, analyze)) {
    // A respelt name is worth a hint; a word re-cased into symbols ("LiMoNeNe") is not.
    const recased = suggestion.toLowerCase() === written.toLowerCase();
    return recased || finding.message.includes(suggestion)
      ? finding
      : { ...finding, message: `${finding.message} Did you mean ${suggestion}?` };
  }
  return { ...finding, fix: { range: finding.range, newText: suggestion, title: `Change to ${suggestion}` } };
}

function radicalFinding(occurrence: SpeciesOccurrence, valenceElectrons: number): Finding {
  return {
    range: occurrence.range,
    severity: "information",
    code: "radical",
    message:
      `${occurrence.text} has an odd number of valence electrons (${valenceElectrons}), so it is a radical: ` +
      "one electron stays unpaired in the model structure.",
  };
}
