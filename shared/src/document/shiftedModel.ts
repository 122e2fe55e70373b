/**
 * Document models moved along the text and joined: what incremental analysis needs to place a
 * part of a document, read where it once was, at its place in the current version.
 */
import { shiftedReaction } from "./reactions/proseEquations";
import { moved } from "./tables/delimitedFindings";
import type { DocumentKind, DocumentModel, SpeciesOccurrence, TableCell, TableRecord, UnreadableSpecies } from "./types";

/** The models of consecutive parts of a document as one model. */
export function joinedModels(kind: DocumentKind, models: readonly DocumentModel[]): DocumentModel {
  if (models.length === 1) return models[0];
  return {
    kind,
    occurrences: models.flatMap((model) => model.occurrences),
    records: models.flatMap((model) => model.records),
    problems: models.flatMap((model) => model.problems),
    unreadable: models.flatMap((model) => model.unreadable ?? []),
    reactions: models.flatMap((model) => model.reactions ?? []),
  };
}

/** `model` with every range moved `by` characters; a record still shares its occurrences with the list. */
export function shiftedModel(model: DocumentModel, by: number): DocumentModel {
  if (by === 0) return model;
  const occurrences = new Map<SpeciesOccurrence, SpeciesOccurrence>();
  const occurrence = (item: SpeciesOccurrence): SpeciesOccurrence => {
    let shifted = occurrences.get(item);
    if (!shifted) {
      shifted = shiftedOccurrence(item, by);
      occurrences.set(item, shifted);
    }
    return shifted;
  };
  const cell = (item: TableCell): TableCell => ({ ...item, range: shiftedRange(item.range, by) });
  const record = (item: TableRecord): TableRecord => ({
    ...item,
    species: occurrence(item.species),
    cells: item.cells.map(cell),
    ...(item.otherNames ? { otherNames: item.otherNames.map(occurrence) } : {}),
    ...(item.nameBesideFormula
      ? {
          nameBesideFormula: {
            name: occurrence(item.nameBesideFormula.name),
            nameCell: cell(item.nameBesideFormula.nameCell),
            formula: occurrence(item.nameBesideFormula.formula),
          },
        }
      : {}),
  });
  const unreadable = (item: UnreadableSpecies): UnreadableSpecies => ({
    ...item,
    range: shiftedRange(item.range, by),
    problem: item.problem.range ? { ...item.problem, range: shiftedRange(item.problem.range, by) } : item.problem,
  });
  return {
    kind: model.kind,
    occurrences: model.occurrences.map(occurrence),
    records: model.records.map(record),
    problems: model.problems.map((finding) => moved(finding, by)),
    unreadable: (model.unreadable ?? []).map(unreadable),
    reactions: (model.reactions ?? []).map((reaction) => shiftedReaction(reaction, by)),
  };
}

function shiftedRange(range: { readonly start: number; readonly end: number }, by: number): { start: number; end: number } {
  return { start: range.start + by, end: range.end + by };
}

function shiftedOccurrence(occurrence: SpeciesOccurrence, by: number): SpeciesOccurrence {
  const range = shiftedRange(occurrence.range, by);
  // A reading placed in the document carries the same range as its occurrence.
  const readingRange = occurrence.reading.range === occurrence.range ? range : shiftedRange(occurrence.reading.range, by);
  return { ...occurrence, range, reading: { ...occurrence.reading, range: readingRange } };
}
