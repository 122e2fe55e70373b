/**
 * Equations through the language server: the diagnostic on the arrow, the hover card with the
 * balance sheet and the oxidation-state changes, and the quick fix that rewrites the coefficients.
 */
import { parse } from "csv-parse/sync";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  CodeActionRequest,
  HoverRequest,
  type CodeAction,
  type Diagnostic,
  type MarkupContent,
  type TextEdit,
} from "vscode-languageserver-protocol/node";
import { applyEdits, positionOf, startSession, type LspSession } from "./lspSession";

const URI = "file:///kestrel/notebook/run-31-etch-byproducts.md";
// Our own scenario: a write-up with one right and one wrong equation.
const TEXT = [
  "# Run 31: what the etch leaves behind",
  "",
  "Scrubber check: \\ce{SiF4 + 2 F- -> SiF6^2-} ran to completion.",
  "",
  "Iron(II) titrated with permanganate (Bay C, J. Okafor):",
  "",
  "\\ce{MnO4- + H+ + Fe^2+ -> Mn^2+ + Fe^3+ + H2O}",
  "",
].join("\n");

let session: LspSession;
let diagnostics: Diagnostic[] = [];

beforeAll(async () => {
  session = await startSession();
  session.open(URI, "markdown", TEXT);
  diagnostics = (await session.waitForDiagnostics(URI, (params) => params.diagnostics.length > 0)).diagnostics;
});

afterAll(async () => {
  await session?.stop();
});

describe("an unbalanced equation in a notebook", () => {
  it("is reported on its arrow, and only there", () => {
    const equations = diagnostics.filter((diagnostic) => String(diagnostic.code).startsWith("equation-"));
    expect(equations.map((diagnostic) => diagnostic.code)).toEqual(["equation-unbalanced"]);
    const document = session.documents.get(URI)!;
    expect(document.getText(equations[0].range)).toBe("->");
    expect(equations[0].range.start.line).toBe(6);
    // from memory: Zumdahl, Chemistry, ch. 18: 8 H+ on the left give 4 H2O on the right
    expect(equations[0].message).toContain("O: 4 on the left, 1 on the right");
  });

  it("hover on the arrow shows the balance sheet and who is oxidised and reduced", async () => {
    const document = session.documents.get(URI)!;
    const result = await session.connection.sendRequest(HoverRequest.type, {
      textDocument: { uri: URI },
      position: positionOf(document, "-> Mn", 1),
    });
    const text = (result as { contents: MarkupContent } | null)?.contents.value ?? "";
    expect(text).toContain("| Element | Left | Right |");
    // from memory: Zumdahl, Chemistry, ch. 18: Mn +7 -> +2 takes 5 electrons; 5 Fe2+ each give one
    expect(text).toContain("Mn +7 → +2: reduced");
    expect(text).toContain("Fe +2 → +3: oxidised");
    expect(text).toContain("Electrons moved per equation: 5 e-");
    expect(text).toContain("Model prediction, not measured data");
  });

  it("the quick fix rewrites only the coefficients", async () => {
    const diagnostic = diagnostics.find((item) => item.code === "equation-unbalanced")!;
    const actions = ((await session.connection.sendRequest(CodeActionRequest.type, {
      textDocument: { uri: URI },
      range: diagnostic.range,
      context: { diagnostics: [diagnostic] },
    })) ?? []) as CodeAction[];
    const fix = actions.find((action) => action.kind === "quickfix");
    expect(fix?.title).toBe("Balance: 1, 8, 5, 1, 5, 4");
    const edits = (fix!.edit!.documentChanges ?? []).flatMap((change) => ("edits" in change ? change.edits : [])) as TextEdit[];
    // One action, so one undo step; inside it one insertion per coefficient and nothing else.
    expect(actions.filter((action) => action.kind === "quickfix")).toHaveLength(1);
    expect(edits.map((edit) => edit.newText)).toEqual(["8 ", "5 ", "5 ", "4 "]);
    expect(edits.every((edit) => edit.range.start.line === 6 && edit.range.start.character === edit.range.end.character)).toBe(true);
    const after = applyEdits(session.documents.get(URI)!, edits);
    // from memory: Zumdahl, Chemistry, ch. 18 (permanganate titration of iron(II))
    expect(after).toBe(TEXT.replace("MnO4- + H+ + Fe^2+ -> Mn^2+ + Fe^3+ + H2O", "MnO4- + 8 H+ + 5 Fe^2+ -> Mn^2+ + 5 Fe^3+ + 4 H2O"));
  });
});

describe("fix all in a table with an equation column", () => {
  const CSV_URI = "file:///kestrel/inventory/run-31-yields.csv";
  const TSV_URI = "file:///kestrel/inventory/run-31-yields.tsv";
  // Our own scenario: Bay C's yield log; the reaction column is quoted where the writer added a note.
  const CSV_TEXT = [
    "run,formula,valence electrons,reaction,analyst",
    "KR-31-01,NF3,24,Al + O2 -> Al2O3,J. Okafor",
    'KR-31-02,NH3,8,"NH3 + O2 -> NO + H2O, Pt gauze",M. Reyes',
    "KR-31-03,C2H6,14,2 C2H6 + 5 O2 -> 4 CO2 + 6 H2O,J. Okafor",
    'KR-31-04,N2,10,"H2 + O2 + N2 -> H2O + NH3",M. Reyes',
    "KR-31-05,H2O,8,2 H2 + O2 -> 2 H2O,J. Okafor",
    "",
  ].join("\r\n");
  const CSV_FIXED = [
    "run,formula,valence electrons,reaction,analyst",
    // from memory: Zumdahl, Chemistry, ch. 3 (4 Al + 3 O2 -> 2 Al2O3); NF3 has 26 valence electrons
    "KR-31-01,NF3,26,4 Al + 3 O2 -> 2 Al2O3,J. Okafor",
    // from memory: Housecroft & Sharpe, nitrogen chapter (4 NH3 + 5 O2 -> 4 NO + 6 H2O)
    'KR-31-02,NH3,8,"4 NH3 + 5 O2 -> 4 NO + 6 H2O, Pt gauze",M. Reyes',
    // from memory: Tro, Chemistry: A Molecular Approach, ch. 3 (2 C2H6 + 7 O2 -> 4 CO2 + 6 H2O)
    "KR-31-03,C2H6,14,2 C2H6 + 7 O2 -> 4 CO2 + 6 H2O,J. Okafor",
    // common practice: two reactions written as one balance in more than one way, so no fix
    'KR-31-04,N2,10,"H2 + O2 + N2 -> H2O + NH3",M. Reyes',
    "KR-31-05,H2O,8,2 H2 + O2 -> 2 H2O,J. Okafor",
    "",
  ].join("\r\n");

  async function fixAllEdits(uri: string): Promise<{ actions: CodeAction[]; edits: TextEdit[] }> {
    const document = session.documents.get(uri)!;
    const whole = { start: { line: 0, character: 0 }, end: document.positionAt(document.getText().length) };
    const actions = ((await session.connection.sendRequest(CodeActionRequest.type, {
      textDocument: { uri },
      range: whole,
      context: { diagnostics: [], only: ["source.fixAll"] },
    })) ?? []) as CodeAction[];
    const changes = actions[0]?.edit?.documentChanges ?? [];
    return { actions, edits: changes.flatMap((change) => ("edits" in change ? change.edits : [])) as TextEdit[] };
  }

  it("rewrites the coefficients of every equation with one balance, with the other table values", async () => {
    session.open(CSV_URI, "plaintext", CSV_TEXT);
    await session.waitForDiagnostics(CSV_URI, (params) => params.diagnostics.some((item) => item.code === "equation-unbalanced"));
    const { actions, edits } = await fixAllEdits(CSV_URI);
    // One action holding one document's edits: one undo step takes the whole change back.
    expect(actions.map((action) => action.kind)).toEqual(["source.fixAll.lonepair"]);
    expect(actions[0].edit!.documentChanges).toHaveLength(1);
    const document = session.documents.get(CSV_URI)!;
    expect(applyEdits(document, edits)).toBe(CSV_FIXED);
    // Minimal: each edit replaces a number (or nothing) and writes a number, never a whole cell.
    for (const edit of edits) {
      expect(document.getText(edit.range)).toMatch(/^\d*\s?$/);
      expect(edit.newText).toMatch(/^\d+\s?$/);
    }
  });

  it("keeps every row the same number of valid fields, the quoted cell quoted", async () => {
    const { edits } = await fixAllEdits(CSV_URI);
    const rows = parse(applyEdits(session.documents.get(CSV_URI)!, edits)) as string[][];
    const before = parse(CSV_TEXT) as string[][];
    expect(rows.map((row) => row.length)).toEqual(before.map((row) => row.length));
    // common practice (RFC 4180): a field holding a comma stays quoted
    expect(rows[2][3]).toBe("4 NH3 + 5 O2 -> 4 NO + 6 H2O, Pt gauze");
    expect(rows.map((row) => [row[0], row[4]])).toEqual(before.map((row) => [row[0], row[4]]));
  });

  it("does the same in a tab-separated file that has only an equation column", async () => {
    // from memory: Brown, LeMay & Bursten, ch. 20 (Cu2+ + 2 e- -> Cu); Zumdahl, ch. 4 (Ba2+ + SO4^2- -> BaSO4)
    const text = "electrode\thalf-reaction\ncathode\tCu2+ + e- -> Cu\nsump\tBa2+ + SO4^2- -> BaSO4\n";
    session.open(TSV_URI, "plaintext", text);
    await session.waitForDiagnostics(TSV_URI, (params) => params.diagnostics.length > 0);
    const { edits } = await fixAllEdits(TSV_URI);
    expect(applyEdits(session.documents.get(TSV_URI)!, edits)).toBe(text.replace("Cu2+ + e-", "Cu2+ + 2 e-"));
  });
});
