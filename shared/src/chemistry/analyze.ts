/**
 * From text to shape: read the species, rule out what VSEPR cannot describe, choose the skeleton
 * and Lewis structure by formal charges, then describe every centre. Results are memoised by the
 * exact text, since documents mention the same species over and over.
 */
import { elementBySymbol } from "./elements";
import { readSpecies } from "./reader/readSpecies";
import type { AnalysisResult, PolarityVerdict, Problem, SpeciesAnalysis, SpeciesReading } from "./types";
import { looksCondensed } from "./analysis/condensedFormula";
import { pointGroupAllowsDipole } from "./analysis/shape3d";
import { buildAnalysis } from "./analysis/buildAnalysis";
import { chooseSkeletonStructure } from "./analysis/chooseSkeletonStructure";
import { smilesStructure } from "./analysis/fromSmiles";
import { boundedMemo } from "./boundedMemo";
import {
  candidateStructuresFor,
  refusalFor,
  singleStructureFor,
  structureForName,
  type KnownStructure,
} from "./analysis/structuresByFormula";
import { metalCentreProblem } from "./analysis/metalCentre";
import { gasMoleculeOfSolidNote } from "./analysis/metalHalideSolids";
import { metallicElementProblem } from "./analysis/metallicElement";
import { chooseRespelling } from "./analysis/respelling";
import { oversaturationProblem } from "./analysis/saturation";
import { dottedAnalysis, metalIonComplexAnalysis, saltAnalysis } from "./analysis/compositeSpecies";
import { networkSolidFinding } from "./analysis/networkSolids";
import { connectivitySignature } from "./analysis/connectivitySignature";
import { matchName, normalizeName } from "./reader/names/nameLookup";
import { splitReagentQualifiers } from "./reader/reagentQualifiers";

// Bound: 20,000 analyses, the oldest generation forgotten first (see boundedMemo).
const MEMO_LIMIT = 20_000;
const memo = boundedMemo<AnalysisResult>(MEMO_LIMIT);

/** Read and analyse one species; never throws. */
export function analyzeSpecies(text: string): AnalysisResult {
  const cached = memo.get(text);
  if (cached) return cached;
  let result: AnalysisResult;
  try {
    const read = readSpecies(text);
    result = read.ok ? analyzeReading(read.value) : { ok: false, problem: chooseRespelling(read.problem, analyzeSpecies) };
  } catch (error) {
    result = { ok: false, problem: { code: "no-valid-structure", message: `internal error: ${String(error)}` } };
  }
  memo.set(text, result);
  return result;
}

/**
 * SMILES memo budget in characters of SMILES text: a drug-sized molecule's analysis takes far more
 * memory than a small species', so a long-running server keeps fewer of them (about 4,000 such
 * molecules) rather than a fixed count.
 */
const SMILES_MEMO_CHARACTERS = 200_000;
const smilesMemo = boundedMemo<AnalysisResult>(SMILES_MEMO_CHARACTERS, (text) => text.length);

/** Analyse a molecule written as SMILES (the whole text); never throws. */
export function analyzeSmiles(text: string): AnalysisResult {
  const cached = smilesMemo.get(text);
  if (cached) return cached;
  let result: AnalysisResult;
  try {
    const outcome = smilesStructure(text);
    result = outcome.ok
      ? {
          ok: true,
          value: buildAnalysis(outcome.value.reading, outcome.value.structure, undefined),
        }
      : { ok: false, ...(outcome.reading ? { reading: outcome.reading } : {}), problem: outcome.problem };
  } catch (error) {
    result = { ok: false, problem: { code: "no-valid-structure", message: `internal error: ${String(error)}` } };
  }
  smilesMemo.set(text, result);
  return result;
}

/** Analyse a species that has already been read. */
export function analyzeReading(reading: SpeciesReading): AnalysisResult {
  if (reading.notation === "smiles") return analyzeSmiles(reading.text);
  if (reading.smiles !== undefined) return analyzeNamedStructure(reading, reading.smiles);
  // Species made of parts (salts, hydrates, hydroxo ions) are split before anything is refused
  // for containing a metal: NH4Cl is NH4+ and Cl-, not a molecule with a five-bonded nitrogen.
  const composite =
    dottedAnalysis(reading, analyzeSpecies) ?? saltAnalysis(reading, analyzeSpecies) ?? metalIonComplexAnalysis(reading, analyzeSpecies);
  if (composite) return composite;
  const network = networkSolidFinding(reading);
  if (network) return { ok: false, reading: { ...reading, name: network.name }, problem: network.problem, lattice: network.sites };
  const scope = outOfScope(reading);
  if (scope) return { ok: false, reading, problem: scope };
  // A formula that does not spell out its connectivity but has one ordinary structure (P4O10,
  // S2O8^2-, H3PO3) is that structure, even where a star-shaped skeleton would also fit.
  const refusal = refusalFor(reading.composition, reading.charge);
  if (refusal) return { ok: false, reading, problem: { code: "ambiguous-connectivity", message: refusal } };
  if (!looksCondensed(reading.writtenSequence) && singleStructureFor(reading.composition, reading.charge)) {
    const known = readIntoFormula(reading, undefined);
    if (known.ok) return known;
  }
  const chosen = chooseSkeletonStructure(reading);
  if (!chosen.ok) {
    if (chosen.problem.code === "ambiguous-connectivity") {
      const impossible = oversaturationProblem(reading.formula, reading.composition, reading.charge);
      if (impossible) return { ok: false, reading, problem: impossible };
      return readIntoFormula(reading, chosen.problem);
    }
    return { ok: false, reading, problem: chosen.problem };
  }
  // Atoms bonded in the order written spell out one isomer, so no other needs mentioning.
  const isomers = chosen.asWritten ? undefined : isomerNote(reading);
  const named =
    isomers !== undefined || !nameFitsStructure(reading, chosen.structure.graph, chosen.asWritten === true)
      ? withoutName(reading)
      : reading;
  const notes: string[] = isomers === undefined ? [] : [isomers];
  const solid = gasMoleculeOfSolidNote(reading, chosen.structure.graph);
  if (solid !== undefined) notes.push(solid);
  return { ok: true, value: buildAnalysis(named, chosen.structure, chosen.centre, notes) };
}

/**
 * A molecular formula shared by familiar isomers (CNO-: cyanate and fulminate) that the writer
 * did not write as one of them: what to tell the reader, or undefined.
 */
function isomerNote(reading: SpeciesReading): string | undefined {
  if (looksCondensed(reading.writtenSequence)) return undefined;
  const candidates = candidateStructuresFor(reading.composition, reading.charge);
  const writtenAsOne = candidates.some(
    (c) => (!c.smiles && c.written === reading.formula) || c.writtenAs?.includes(reading.formula) === true,
  );
  if (candidates.length < 2 || writtenAsOne) return undefined;
  return (
    `${reading.formula} is the formula of ${listCandidates(candidates)}. Shown is the structure with the smallest formal charges; ` +
    "write a structural formula or SMILES for the one you mean."
  );
}

/**
 * A name given by composition alone (the reader names HCOOCH3 after the one listed species with
 * its atoms, acetic acid; HNC after hydrogen cyanide) is kept only when the written structure is
 * that species.
 */
function nameFitsStructure(reading: SpeciesReading, graph: SpeciesAnalysis["graph"], asWritten: boolean): boolean {
  if (reading.name === undefined || reading.notation === "name") return true;
  if (!asWritten && !looksCondensed(reading.writtenSequence)) return true;
  const match = matchName(normalizeName(reading.name));
  if (match === undefined || match.formula === reading.formula) return true;
  const listed = match.smiles !== undefined ? analyzeSmiles(match.smiles) : analyzeSpecies(match.formula ?? "");
  if (!listed.ok) return true;
  return connectivitySignature(listed.value.graph) === connectivitySignature(graph);
}

function withoutName(reading: SpeciesReading): SpeciesReading {
  if (reading.name === undefined) return reading;
  const { name: _dropped, ...rest } = reading;
  return rest;
}

function listCandidates(candidates: readonly KnownStructure[]): string {
  const named = candidates.map((c) => `${c.name} (${c.smiles ? `SMILES ${c.written}` : c.written})`);
  return named.length === 2 ? named.join(" or ") : `${named.slice(0, -1).join(", ")} or ${named[named.length - 1]}`;
}

/** A name that fixes its structure: the SMILES analysis of that structure, under the name. */
function analyzeNamedStructure(reading: SpeciesReading, smiles: string): AnalysisResult {
  const known = analyzeSmiles(smiles);
  if (!known.ok) return { ok: false, reading, problem: known.problem };
  // Copy the property descriptors, not the values: centres and polarity stay worked out on first
  // read (a spread would build the 3D model of every named molecule at once).
  const value = Object.defineProperties({}, Object.getOwnPropertyDescriptors(known.value)) as SpeciesAnalysis;
  const note = `Read as the structure of ${reading.name ?? reading.text} (SMILES ${smiles}).`;
  Object.defineProperty(value, "reading", { value: reading, enumerable: true });
  Object.defineProperty(value, "warnings", { value: [...known.value.warnings, note], enumerable: true });
  return { ok: true, value };
}

/**
 * A molecular formula whose connectivity is not written: analyse the one ordinary structure it
 * stands for (C2H4 is ethene), or name the familiar candidates when there are several.
 */
function readIntoFormula(reading: SpeciesReading, problem: Problem | undefined): AnalysisResult {
  // A name (or a written phenyl group) says which structure is meant; a bare formula only when
  // it has one ordinary structure.
  const byName = reading.notation === "name" || reading.formula.includes("C6H5") ? structureForName(reading.name) : undefined;
  const single = byName ?? singleStructureFor(reading.composition, reading.charge);
  if (single) {
    const known = single.smiles ? analyzeSmiles(single.written) : analyzeSpecies(single.written);
    if (known.ok) {
      const { value } = known;
      return {
        ok: true,
        value: {
          ...value,
          polarity: single.pointGroup ? polarityFromKnownSymmetry(single.pointGroup, reading.charge, value.polarity) : value.polarity,
          reading: { ...reading, name: reading.name ?? single.name },
          warnings: [
            ...value.warnings,
            reading.notation === "name"
              ? `Read as the structure of ${single.name} (${single.smiles ? `SMILES ${single.written}` : single.written}).`
              : `Read as ${single.name} (${single.smiles ? `SMILES ${single.written}` : single.written}), the one ordinary structure with this formula; write a structural formula or SMILES for anything else.`,
            ...(single.note ? [single.note] : []),
          ],
        },
      };
    }
  }
  if (!problem)
    return { ok: false, reading, problem: { code: "no-valid-structure", message: `${reading.formula}: no Lewis structure fits.` } };
  const candidates = candidateStructuresFor(reading.composition, reading.charge);
  if (candidates.length === 0) return { ok: false, reading, problem };
  return {
    ok: false,
    // The name the reader found for the composition is one isomer's name: not said.
    reading: withoutName(reading),
    problem: {
      code: "ambiguous-connectivity",
      message: `${reading.formula} can be ${listCandidates(candidates)}: write the structural formula or SMILES you mean.`,
    },
  };
}

/**
 * Polarity of a cage or ring from the symmetry of the real molecule, which its model coordinates
 * may not reach (S8 is a D4d crown; P4O10 is tetrahedral).
 */
function polarityFromKnownSymmetry(pointGroup: string, charge: number, model: PolarityVerdict): PolarityVerdict {
  if (charge !== 0) return model;
  const polar = pointGroupAllowsDipole(pointGroup);
  return {
    polar,
    reason: polar
      ? `the real molecule has ${pointGroup} symmetry, which allows a permanent dipole`
      : `the real molecule has ${pointGroup} symmetry, so its bond dipoles cancel (whatever symmetry the model coordinates reach)`,
    dipoleEstimate: polar ? model.dipoleEstimate : 0,
  };
}

const IONIC_GROUPS = new Set([1, 2]);

/** Species VSEPR has nothing to say about: transition-metal centres, ionic solids, boranes. */
function outOfScope(reading: SpeciesReading): Problem | undefined {
  // A lone metal atom is the element itself, whichever block it belongs to.
  const metallic = metallicElementProblem(reading);
  if (metallic) return metallic;
  const metal = metalCentreProblem(
    reading.formula,
    reading.composition.map((part) => part.symbol),
  );
  if (metal) return metal;
  const elements = reading.composition.map((part) => elementBySymbol(part.symbol)!);
  const distinctElements = new Set(reading.composition.map((part) => part.symbol));
  const ionicMetal = elements.find((e) => IONIC_GROUPS.has(e.group) && e.symbol !== "H" && e.symbol !== "Be");
  if (ionicMetal && distinctElements.size > 1) {
    return {
      code: "ionic-solid",
      message:
        `${reading.formula} is an ionic compound of ${ionicMetal.name}: it forms a lattice of ions, ` +
        "not discrete molecules, so it has no VSEPR shape. Analyse its ions separately (for example the anion).",
    };
  }
  const boranes = reading.composition.every((part) => part.symbol === "B" || part.symbol === "H");
  const borons = reading.composition.reduce((total, part) => total + (part.symbol === "B" ? part.count : 0), 0);
  if (boranes && borons >= 2 && distinctElements.size === 2) {
    return {
      code: "three-centre-bonding",
      message:
        `${reading.formula} is a borane: its boron atoms are held together by B-H-B bridges, bonds of two ` +
        "electrons shared by three atoms, which a Lewis structure of two-atom bonds cannot draw, so VSEPR " +
        "predicts no shape." +
        (borons === 2 && reading.charge === 0 && reading.formula === "B2H6"
          ? " (Each boron in diborane sits roughly tetrahedrally among two bridging and two end hydrogens.)"
          : ""),
    };
  }
  return undefined;
}

/** The marker that makes text a SMILES string, in documents (`` `smiles:CCO` ``) and as an argument alike. */
export const SMILES_MARKER = "smiles:";

/**
 * Analyse one species as a person types it anywhere outside a document: `smiles:` and a SMILES
 * string, or anything the species reader takes (formula, mhchem, name). Never throws.
 */
export function analyzeTyped(text: string): AnalysisResult {
  const trimmed = text.trim();
  if (trimmed.slice(0, SMILES_MARKER.length).toLowerCase() === SMILES_MARKER)
    return analyzeSmiles(trimmed.slice(SMILES_MARKER.length).trim());
  const whole = analyzeSpecies(text);
  // Text that reads as a species is that species; only unreadable text is tried without the
  // grade, form or strength a reagent's label writes around its name.
  if (whole.ok || whole.reading !== undefined) return whole;
  const qualified = splitReagentQualifiers(text);
  if (qualified === undefined) return whole;
  const inner = qualified.dissolved ? analyzeDissolved(qualified.species) : analyzeSpecies(qualified.species);
  const reading = inner.ok ? inner.value.reading : inner.reading;
  if (reading === undefined) return whole;
  const shown = reading.name ?? reading.formula;
  const note = `Read as ${shown}: "${qualified.qualifiers}" says the reagent's grade, form or strength, not which species it is.`;
  // A salt, hydrate or solid has no warnings to add to: its card says it in the note on the whole.
  if (!inner.ok) return { ...inner, problem: { ...inner.problem, message: `${inner.problem.message} ${note}` } };
  // Copy the property descriptors, not the values: centres and polarity stay worked out on first read.
  const value = Object.defineProperties({}, Object.getOwnPropertyDescriptors(inner.value)) as SpeciesAnalysis;
  Object.defineProperty(value, "warnings", { value: [...inner.value.warnings, note], enumerable: true });
  return { ok: true, value };
}

/** A species from a label that says it is a solution: read as written in water, "(aq)", unless a state is written. */
function analyzeDissolved(text: string): AnalysisResult {
  const read = readSpecies(text);
  if (!read.ok || read.value.state !== undefined) return analyzeSpecies(text);
  return analyzeReading({ ...read.value, state: "aq" });
}
