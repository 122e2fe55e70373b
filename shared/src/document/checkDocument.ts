/**
 * The checks over a document model: species the core rejects, radicals, and table cells that
 * contradict what the core works out. The model's own `problems` (malformed JSON, a stray quote)
 * are not repeated here; callers show both.
 */
import { analyzeSpecies } from "../chemistry/analyze";
import type { AnalysisResult, Problem, ProblemCode } from "../chemistry/types";
import { analyzeOccurrence } from "./analyzeOccurrence";
import { checkRecord } from "./checks/recordChecks";
import type { DocumentModel, Finding, FindingSeverity, SpeciesOccurrence, UnreadableSpecies } from "./types";

/** Species VSEPR is not meant for: worth a note, not an error. */
const OUTSIDE_THE_MODEL: ReadonlySet<ProblemCode> = new Set([
  "transition-metal-centre",
  "ionic-solid",
  "three-centre-bonding",
  "ambiguous-connectivity",
  "no-central-atom",
]);

/** Findings for `model`, with `analyze` working out each distinct species once. */
export function checkDocument(model: DocumentModel, analyze: (text: string) => AnalysisResult = analyzeSpecies): Finding[] {
  const memo = new Map<string, AnalysisResult>();
  const analysisOf = (occurrence: SpeciesOccurrence): AnalysisResult | undefined => {
    let result = memo.get(occurrence.text);
    if (!result) {
      try {
        result = analyzeOccurrence(occurrence, analyze);
      } catch (error) {
        result = { ok: false, problem: { code: "no-valid-structure", message: String(error) } };
      }
      memo.set(occurrence.text, result);
    }
    return result;
  };

  // A name beside a formula for the same species would repeat the formula's note: say it once, on the formula.
  const echoes = new Set<SpeciesOccurrence>();
  for (const record of model.records) {
    for (const other of record.otherNames ?? []) if (sameSpecies(other, record.species)) echoes.add(other);
  }

  const findings: Finding[] = [];
  for (const unreadable of model.unreadable ?? []) findings.push(unreadableFinding(unreadable));
  for (const occurrence of model.occurrences) {
    if (echoes.has(occurrence)) continue;
    const result = analysisOf(occurrence);
    if (!result) continue;
    if (!result.ok) findings.push(problemFinding(occurrence, result.problem));
    else if (result.value.radical) findings.push(radicalFinding(occurrence, result.value.valenceElectrons));
  }
  for (const record of model.records) {
    const result = analysisOf(record.species);
    if (result?.ok) checkRecord(record, result.value, findings);
  }
  return findings.sort((a, b) => a.range.start - b.range.start);
}

function sameSpecies(a: SpeciesOccurrence, b: SpeciesOccurrence): boolean {
  return a.reading.formula === b.reading.formula && a.reading.charge === b.reading.charge;
}

function severityOf(code: ProblemCode): FindingSeverity {
  if (OUTSIDE_THE_MODEL.has(code)) return "information";
  return code === "unknown-name" ? "warning" : "error";
}

function unreadableFinding(unreadable: UnreadableSpecies): Finding {
  return withSuggestion(
    { range: unreadable.range, severity: severityOf(unreadable.problem.code), code: unreadable.problem.code, message: unreadable.problem.message },
    unreadable.problem,
  );
}

function problemFinding(occurrence: SpeciesOccurrence, problem: Problem): Finding {
  const message = problem.message.includes(occurrence.reading.formula) || problem.message.includes(occurrence.text)
    ? problem.message
    : `${occurrence.text}: ${problem.message}`;
  return withSuggestion({ range: occurrence.range, severity: severityOf(problem.code), code: problem.code, message }, problem);
}

/** Adds the reader's suggested spelling as a fix for the whole mention. */
function withSuggestion(finding: Finding, problem: Problem): Finding {
  if (!problem.suggestion) return finding;
  return { ...finding, fix: { range: finding.range, newText: problem.suggestion, title: `Change to ${problem.suggestion}` } };
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
