/**
 * Completing and combining half-reactions through the language server: the code actions on the
 * arrow, their edits as one workspace edit, and the diagnostics after each is applied.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { CodeActionRequest, type CodeAction, type Diagnostic, type TextEdit } from "vscode-languageserver-protocol/node";
import { applyEdits, positionOf, startSession, type LspSession } from "./lspSession";

// Our own scenario: a chromate clean-up write-up with a skeleton and two half-reactions.
const TEXT = [
  "# Run 48: chromate clean-up (Kestrel Ridge Analytical, Bay C)",
  "",
  "Skeleton from the bench sheet: $\\ce{Cr2O7^2- + Fe^2+ -> Cr^3+ + Fe^3+}$",
  "",
  "Oxidation: $\\ce{Fe^2+ -> Fe^3+ + e-}$",
  "",
  "Reduction: $\\ce{Cr2O7^2- + 14 H+ + 6 e- -> 2 Cr^3+ + 7 H2O}$",
  "",
  "Checked by J. Okafor.",
  "",
].join("\n");

let session: LspSession;
let diagnostics: Diagnostic[] = [];
let version = 1;

beforeAll(async () => {
  session = await startSession();
  session.open("file:///kestrel/notebook/run-48.md", "markdown", TEXT);
  diagnostics = (await session.waitForDiagnostics("file:///kestrel/notebook/run-48.md", (params) => params.diagnostics.length > 0))
    .diagnostics;
});

afterAll(async () => {
  await session?.stop();
});

async function actionsAt(uri: string, needle: string): Promise<CodeAction[]> {
  const document = session.documents.get(uri)!;
  const position = positionOf(document, needle, 1);
  return ((await session.connection.sendRequest(CodeActionRequest.type, {
    textDocument: { uri },
    range: { start: position, end: position },
    context: { diagnostics: diagnostics.filter((diagnostic) => diagnostic.range.start.line === position.line) },
  })) ?? []) as CodeAction[];
}

function editsOf(action: CodeAction): TextEdit[] {
  return (action.edit?.documentChanges ?? []).flatMap((change) => ("edits" in change ? change.edits : [])) as TextEdit[];
}

/** Opens `text` as a new document and returns its equation diagnostics once published. */
async function equationDiagnostics(text: string): Promise<Diagnostic[]> {
  const uri = `file:///kestrel/notebook/run-48-v${++version}.md`;
  session.open(uri, "markdown", text);
  const published = await session.waitForDiagnostics(uri, () => true);
  return published.diagnostics.filter((diagnostic) => String(diagnostic.code).startsWith("equation-"));
}

describe("completing the skeleton", () => {
  it("the warning on the arrow gives the completed equation", () => {
    const warning = diagnostics.find((diagnostic) => diagnostic.code === "equation-cannot-balance")!;
    expect(warning.range.start.line).toBe(2);
    // from memory: Brown, LeMay & Bursten, Chemistry: The Central Science, ch. 20
    expect(warning.message).toContain("Completed in acidic solution: Cr2O7^2- + 6 Fe^2+ + 14 H+ -> 2 Cr^3+ + 6 Fe^3+ + 7 H2O");
  });

  it("offers acid and base as quick fixes for that warning; each leaves a balanced equation", async () => {
    const uri = "file:///kestrel/notebook/run-48.md";
    const actions = (await actionsAt(uri, "-> Cr^3+ + Fe")).filter((action) => action.kind === "quickfix");
    expect(actions.map((action) => action.title)).toEqual([
      "Complete in acidic solution (add H+, H2O)",
      "Complete in basic solution (add OH-, H2O)",
    ]);
    expect(actions[0].diagnostics?.map((diagnostic) => diagnostic.code)).toEqual(["equation-cannot-balance"]);
    const afterAcid = applyEdits(session.documents.get(uri)!, editsOf(actions[0]));
    // from memory: Brown, LeMay & Bursten, ch. 20
    expect(afterAcid).toBe(TEXT.replace("Cr2O7^2- + Fe^2+ -> Cr^3+ + Fe^3+}", "Cr2O7^2- + 6 Fe^2+ + 14 H+ -> 2 Cr^3+ + 6 Fe^3+ + 7 H2O}"));
    const afterBase = applyEdits(session.documents.get(uri)!, editsOf(actions[1]));
    // from memory: Petrucci, General Chemistry, ch. 5 (the acid answer with OH- added to both sides)
    expect(afterBase).toBe(TEXT.replace("Cr2O7^2- + Fe^2+ -> Cr^3+ + Fe^3+}", "Cr2O7^2- + 6 Fe^2+ + 7 H2O -> 2 Cr^3+ + 6 Fe^3+ + 14 OH-}"));
    for (const after of [afterAcid, afterBase]) expect(await equationDiagnostics(after)).toEqual([]);
  });
});

describe("combining the two halves", () => {
  it.each(["-> Fe^3+ + e-", "-> 2 Cr^3+"])("is offered on the arrow %s and inserts the overall equation", async (needle) => {
    const uri = "file:///kestrel/notebook/run-48.md";
    const actions = (await actionsAt(uri, needle)).filter((action) => action.kind === "refactor.rewrite");
    expect(actions.map((action) => action.title)).toEqual(["Insert the overall equation (half-reactions combined)"]);
    const edits = editsOf(actions[0]);
    expect(edits).toHaveLength(1);
    const after = applyEdits(session.documents.get(uri)!, edits);
    // from memory: Brown, LeMay & Bursten, ch. 20
    expect(after).toBe(TEXT.replace("7 H2O}$\n", "7 H2O}$\n$\\ce{6 Fe^2+ + Cr2O7^2- + 14 H+ -> 6 Fe^3+ + 2 Cr^3+ + 7 H2O}$\n"));
    // The inserted equation balances: only the skeleton's warning remains.
    expect((await equationDiagnostics(after)).map((diagnostic) => diagnostic.range.start.line)).toEqual([2]);
  });
});
