/**
 * Quick fixes are claims that the new text is right, and `check --fix` applies them unasked. What is
 * offered, on documents in the styles people write; and the property that applying any offered fix
 * never creates a new error and never touches text outside its range, over every fixture and example
 * document and over random documents.
 */
import { readdirSync, readFileSync, statSync } from "node:fs";
import { join, relative } from "node:path";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  analyzeDocument,
  checkDocument,
  documentKindFor,
  type DocumentKind,
  type DocumentModel,
  type Finding,
  type TextFix,
} from "../../shared/src/index";
import { stripLabels } from "./labelledText";

const ROOT = join(__dirname, "..", "..");

/** Findings of a document as [severity, the text covered, the fix's replacement or "-"]. */
function findingsOf(text: string, kind: DocumentKind): [string, string, string][] {
  return checkDocument(analyzeDocument(text, kind)).map((finding) => [
    finding.severity,
    text.slice(finding.range.start, finding.range.end),
    finding.fix?.newText ?? "-",
  ]);
}

describe("which fixes are offered", () => {
  it.each<[string, string, DocumentKind, [string, string, string][]]>([
    // common practice: CDCl3 is deuterated chloroform, D the deuterium symbol; Ph is phenyl
    ["deuterated and phenyl formulas in prose", "Spectra in CDCl3; the toluene (PhCH3) wash.", "markdown", []],
    // common practice: D is hydrogen-2, so CDCl3 is chloroform with a label and reads without a finding
    ["deuterated solvent in a formula column", "formula,name\nCDCl3,chloroform-d\n", "csv", []],
    // common practice: tBu is tert-butyl, Et ethyl, Me methyl; Et2O (diethyl ether) and MeCN
    // (acetonitrile) are abbreviations the name vocabulary knows, so they are species, not notes
    [
      "group abbreviations in a species column",
      "species\ntBuOH\nEt2O\nMeCN\nPhCH3\n",
      "csv",
      [
        ["information", "tBuOH", "-"],
        ["information", "PhCH3", "-"],
      ],
    ],
    // common practice: limonene and bacon are words, not symbol strings to re-case (krypton is an
    // element's name, which the name vocabulary reads as Kr)
    [
      "words in a species column are notes, never re-cased",
      "species\nLimonene\nBacon\nnacl\n",
      "csv",
      [
        ["information", "Limonene", "-"],
        ["information", "Bacon", "-"],
        ["information", "nacl", "-"],
      ],
    ],
    [
      "words in a markdown species column",
      "| Species | Notes |\n|---|---|\n| Limonene | citrus |\n| KRYPTON | bay C |\n",
      "markdown",
      [["information", "Limonene", "-"]],
    ],
    // common practice: element symbols are a capital and an optional lower-case letter
    ["a mis-cased formula in prose", "The CLF3 line was weak.", "markdown", [["error", "CLF3", "ClF3"]]],
    [
      "a mis-cased formula in a formula column",
      "formula\nSf6\nnh4+\n",
      "csv",
      [
        ["error", "Sf6", "SF6"],
        ["error", "nh4+", "NH4+"],
      ],
    ],
    ["a mis-cased formula in mhchem", "\\ce{XEF4 + H2O}", "markdown", [["error", "XEF4", "XeF4"]]],
    // from memory: sulfate is SO4 with charge 2-; "SO42-" runs the count and the charge together
    ["a charge run into the count", "formula\nSO42-\n", "csv", [["error", "SO42-", "SO4^2-"]]],
  ])("%s", (_, text, kind, expected) => {
    expect(findingsOf(text, kind)).toEqual(expected);
  });

  it("keeps a respelt name as a hint in the message, not as a fix", () => {
    // common practice: "amonia" is a misspelling of ammonia; the fix would re-spell a word
    const [finding] = checkDocument(analyzeDocument("species\namonia\n", "csv"));
    expect(finding).toMatchObject({ severity: "information", code: "unknown-name" });
    expect(finding.fix).toBeUndefined();
    expect(finding.message).toContain("ammonia");
  });
});

/** Every document the repository keeps as an example or fixture, with its kind. */
function repositoryDocuments(): { name: string; text: string; kind: DocumentKind }[] {
  const documents: { name: string; text: string; kind: DocumentKind }[] = [];
  const visit = (folder: string): void => {
    for (const entry of readdirSync(folder)) {
      const path = join(folder, entry);
      if (statSync(path).isDirectory()) {
        visit(path);
        continue;
      }
      const kind = documentKindFor(path);
      // The real-style corpus carries its labels inline; the documents are the text without them.
      const text = stripLabels(readFileSync(path, "utf8")).text;
      if (kind && !entry.startsWith("sarif-schema")) documents.push({ name: relative(ROOT, path), text, kind });
    }
  };
  visit(join(ROOT, "tests", "fixtures"));
  visit(join(ROOT, "examples"));
  return documents;
}

/** An error, keyed by what it says and the text it covers. */
function errorKey(text: string, finding: Finding, at: number): string {
  return `${finding.code} ${at} ${text.slice(finding.range.start, finding.range.end)}`;
}

/**
 * Where an equation's fix may write: each term's coefficient slot, from its written coefficient
 * (or, when none is written, the species' start) up to the species, and nothing else.
 */
function coefficientSlots(model: DocumentModel, finding: Finding): readonly { start: number; end: number }[] {
  const reaction = model.reactions?.find((candidate) => candidate.arrow.range.start === finding.range.start);
  if (!reaction || !finding.code.startsWith("equation-")) return [];
  return [...reaction.left, ...reaction.right].map((term) => ({
    start: term.coefficient.written?.start ?? term.speciesRange.start,
    end: term.speciesRange.start,
  }));
}

/** Why the edits of `fix` are not one coherent change inside `allowed` ranges, or undefined. */
function editProblem(text: string, fix: TextFix, allowed: readonly { start: number; end: number }[]): string | undefined {
  const edits = fix.edits ?? [{ range: fix.range, newText: fix.newText }];
  let previousEnd = -1;
  let rebuilt = "";
  for (const edit of edits) {
    if (edit.range.start < previousEnd) return "edits overlap or are out of order";
    if (!allowed.some((range) => edit.range.start >= range.start && edit.range.end <= range.end)) {
      return `edit of "${text.slice(edit.range.start, edit.range.end)}" reaches outside its finding`;
    }
    rebuilt += text.slice(previousEnd < 0 ? fix.range.start : previousEnd, edit.range.start) + edit.newText;
    previousEnd = edit.range.end;
  }
  if (edits[0].range.start !== fix.range.start || previousEnd !== fix.range.end) return "the fix's range is not its edits' span";
  if (rebuilt !== fix.newText) return "the fix's text is not what its edits make";
  return undefined;
}

/**
 * Applies each fix offered for `text` on its own and checks the outcome: only the fixed range
 * changed (an equation's fix only its coefficients, each edit inside one coefficient slot and
 * writing nothing but a number), the new text there is no error, and every error elsewhere was
 * already there. Returns a description of each violation.
 */
function fixViolations(text: string, kind: DocumentKind): string[] {
  const model = analyzeDocument(text, kind);
  const findings = checkDocument(model);
  const violations: string[] = [];
  for (const finding of findings) {
    const fix = finding.fix;
    if (!fix) continue;
    const slots = coefficientSlots(model, finding);
    const problem = editProblem(text, fix, slots.length > 0 ? slots : [finding.range]);
    if (problem) {
      violations.push(`fix for ${finding.code}: ${problem}`);
      continue;
    }
    if (slots.length > 0 && (fix.edits ?? [fix]).some((edit) => !/^(?:[1-9]\d*\s?)?$/.test(edit.newText))) {
      violations.push(`fix for ${finding.code} writes more than a coefficient`);
      continue;
    }
    const fixed = text.slice(0, fix.range.start) + fix.newText + text.slice(fix.range.end);
    const shift = fix.newText.length - (fix.range.end - fix.range.start);
    const before = new Set(
      findings.filter((other) => other.severity === "error" && other !== finding).map((other) => errorKey(text, other, other.range.start)),
    );
    const fixedModel = analyzeDocument(fixed, kind);
    for (const after of checkDocument(fixedModel)) {
      if (after.severity !== "error") continue;
      // An equation with a species the core refused was not judged; once the species is fixed, it is.
      const equation = fixedModel.reactions?.find((reaction) => reaction.arrow.range.start === after.range.start);
      if (
        equation &&
        !finding.code.startsWith("equation-") &&
        equation.range.start <= fix.range.start &&
        equation.range.end >= fix.range.start + fix.newText.length
      )
        continue;
      const inFix = after.range.start < fix.range.start + fix.newText.length && after.range.end > fix.range.start;
      const original = after.range.start >= fix.range.start + fix.newText.length ? after.range.start - shift : after.range.start;
      if (inFix || !before.has(errorKey(fixed, after, original))) {
        violations.push(
          `"${text.slice(fix.range.start, fix.range.end)}" -> "${fix.newText}" leaves ${after.code} on "${fixed.slice(after.range.start, after.range.end)}"`,
        );
      }
    }
  }
  return violations;
}

describe("applying a fix never creates an error", () => {
  const documents = repositoryDocuments();

  it("finds the repository's documents", () => {
    expect(documents.length).toBeGreaterThan(10);
  });

  it.each(documents.map((document) => [document.name, document] as const))("in %s", (_, document) => {
    expect(fixViolations(document.text, document.kind)).toEqual([]);
  });

  it.each<[string, string, DocumentKind]>([
    // from memory: Zumdahl, Chemistry, ch. 3 (methane burns 1:2:1:2); two coefficients of 2 removed or kept
    ["a coefficient deleted", "\\ce{2 CH4 + 2 O2 -> CO2 + 2 H2O}", "markdown"],
    // from memory: Tro, Chemistry: A Molecular Approach, ch. 7 (4 Fe + 3 O2 -> 2 Fe2O3); a glued number replaced
    ["a glued coefficient replaced", "Rust: 4Fe + 2O2 → 2Fe2O3", "plaintext"],
    // from memory: Brown, LeMay & Bursten, ch. 3 (N2 + 3 H2 -> 2 NH3); replaced and inserted together
    ["replaced and inserted", "3 H2 + N2 -> 3 NH3", "plaintext"],
    // from memory: Zumdahl, ch. 18 (Fe -> Fe3+ + 3e-); an electron count replaced in a half-reaction
    ["a half-reaction's electrons", "Fe -> Fe^3+ + 2e-", "plaintext"],
  ])("an equation fix that %s touches only coefficients", (_, text, kind) => {
    const fixes = checkDocument(analyzeDocument(text, kind)).filter((finding) => finding.fix);
    expect(fixes.map((finding) => finding.code)).toEqual(["equation-unbalanced"]);
    expect(fixViolations(text, kind)).toEqual([]);
  });

  // common practice: how formulas, names, abbreviations and words appear in lab documents; each
  // is right as written, so no fix may touch it
  const CORRECT = [
    "SF4",
    "ClF3",
    "SO4^2-",
    "CDCl3",
    "PhCH3",
    "tBuOH",
    "EtOH",
    "THF",
    "Limonene",
    "Bacon",
    "BACON",
    "NaCl",
    "Co2",
    "CO2",
    "NO",
    "US",
    "The",
    "water",
    "H2O",
    "Fe3+",
    "CO<sub>2</sub>",
    "\\ce{SF4 + H2O}",
    "`smiles:CCO`",
    "2H2",
    "C",
    "+",
    "->",
    "→",
    "(aq)",
    "R–OH",
    "H315",
    "Ti6Al4V",
    "KR-0412",
    "NO2",
    "Ca+2",
    "CO3-2",
    "Et2O",
    "MeCN",
    "D2O",
    "iPrOH",
  ];
  // common practice: mistakes people make typing formulas and names
  const WRONG = ["Sf4", "CLF3", "XEF4", "nh4+", "SO42-", "nacl", "amonia", "sulfer tetrafluoride", "\\ce{Sf4}", "CH5", "Ch5"];
  const SEPARATORS = [" ", ", ", "\n", "\n\n", " + ", " -> ", "; ", "("];
  /** A document and the ranges of its correct pieces. */
  interface Generated {
    readonly text: string;
    readonly correct: readonly { start: number; end: number }[];
  }
  const piece = fc.oneof(
    fc.constantFrom(...CORRECT).map((text) => ({ text, correct: true })),
    fc.constantFrom(...WRONG).map((text) => ({ text, correct: false })),
  );
  const prose = fc.array(fc.tuple(piece, fc.constantFrom(...SEPARATORS)), { maxLength: 30 }).map((parts): Generated => {
    let text = "";
    const correct: { start: number; end: number }[] = [];
    for (const [{ text: written, correct: isCorrect }, separator] of parts) {
      if (isCorrect) correct.push({ start: text.length, end: text.length + written.length });
      text += written + separator;
    }
    return { text, correct };
  });
  const table = fc.array(fc.tuple(piece, piece), { minLength: 1, maxLength: 15 }).map((rows): Generated => {
    let text = "formula,name\n";
    const correct: { start: number; end: number }[] = [];
    for (const row of rows) {
      row.forEach(({ text: written, correct: isCorrect }, column) => {
        if (isCorrect) correct.push({ start: text.length + 1, end: text.length + 1 + written.length });
        text += `"${written}"${column === 0 ? "," : "\n"}`;
      });
    }
    return { text, correct };
  });

  /** Fixes that would rewrite part of a piece that is right as written. */
  function fixesOnCorrectText({ text, correct }: Generated, kind: DocumentKind): string[] {
    return checkDocument(analyzeDocument(text, kind))
      .filter(
        (finding) => finding.fix && correct.some((range) => finding.fix!.range.start < range.end && finding.fix!.range.end > range.start),
      )
      .map((finding) => `"${text.slice(finding.fix!.range.start, finding.fix!.range.end)}" -> "${finding.fix!.newText}"`);
  }

  it.each<DocumentKind>(["markdown", "plaintext"])("in random %s documents", (kind) => {
    fc.assert(
      fc.property(prose, (generated) => {
        expect(fixViolations(generated.text, kind)).toEqual([]);
        expect(fixesOnCorrectText(generated, kind)).toEqual([]);
      }),
      { numRuns: 300, seed: 11 },
    );
  });

  it("in random tables", () => {
    fc.assert(
      fc.property(table, (generated) => {
        expect(fixViolations(generated.text, "csv")).toEqual([]);
        expect(fixesOnCorrectText(generated, "csv")).toEqual([]);
      }),
      { numRuns: 200, seed: 12 },
    );
  });
});
