/**
 * In the editor, a row whose name and formula disagree gets the command line's warning, and two
 * quick fixes to choose between (neither preferred); fix-all takes neither.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { CodeActionRequest, type CodeAction, type Diagnostic, type TextEdit } from "vscode-languageserver-protocol/node";
import type { TextDocument } from "vscode-languageserver-textdocument";
import { applyEdits, fixtureUri, startSession, type LspSession } from "./lspSession";

// from memory: sodium sulfite is Na2SO3, Na2SO4 is sodium sulfate; NF3 has 26 valence electrons
const TEXT = [
  "Item,Chemical name,Formula,Valence electrons,Supplier lot",
  "KR-C-0013,Sodium sulfite,Na2SO4,,KR-2255",
  "KR-C-0090,Nitrogen trifluoride,NF3,24,KR-0502",
  "",
].join("\n");
const URI = fixtureUri("inventory/store-names.csv");

let session: LspSession;
let document: TextDocument;
let diagnostics: Diagnostic[];

beforeAll(async () => {
  session = await startSession();
  document = session.open(URI, "plaintext", TEXT);
  diagnostics = (await session.waitForDiagnostics(URI)).diagnostics;
});

afterAll(async () => {
  await session?.stop();
});

async function actionsAt(diagnostic: Diagnostic): Promise<CodeAction[]> {
  const result = await session.connection.sendRequest(CodeActionRequest.type, {
    textDocument: { uri: URI },
    range: diagnostic.range,
    context: { diagnostics: [diagnostic] },
  });
  return (result ?? []) as CodeAction[];
}

function editsOf(action: CodeAction): TextEdit[] {
  const changes = action.edit?.documentChanges ?? [];
  return changes.flatMap((change) => ("textDocument" in change ? change.edits : [])) as TextEdit[];
}

describe("a name that disagrees with its formula, in the editor", () => {
  it("is one warning on the name, worded as on the command line", () => {
    const warning = diagnostics.find((diagnostic) => diagnostic.code === "table-name-formula");
    expect(warning?.message).toBe("Name and formula disagree: the name says Na2SO3 (sodium sulfite); the formula column has Na2SO4.");
    expect(warning?.range).toEqual({ start: { line: 1, character: 10 }, end: { line: 1, character: 24 } });
  });

  it("offers the formula change as a quick fix that is not preferred, touching only the formula cell", async () => {
    const warning = diagnostics.find((diagnostic) => diagnostic.code === "table-name-formula")!;
    const actions = await actionsAt(warning);
    const choice = actions.find((action) => action.title === "Change the formula to Na2SO3");
    expect(choice?.kind).toBe("quickfix");
    expect(choice?.isPreferred).toBe(false);
    expect(applyEdits(document, editsOf(choice!))).toBe(TEXT.replace("Sodium sulfite,Na2SO4,", "Sodium sulfite,Na2SO3,"));
  });

  it("leaves the choice out of fix-all, which still fixes the table's values", async () => {
    const whole = { start: { line: 0, character: 0 }, end: document.positionAt(TEXT.length) };
    const result = (await session.connection.sendRequest(CodeActionRequest.type, {
      textDocument: { uri: URI },
      range: whole,
      context: { diagnostics },
    })) as CodeAction[];
    const fixAll = result.find((action) => action.title === "Fix all lonepair table values in this file");
    expect(fixAll).toBeDefined();
    expect(applyEdits(document, editsOf(fixAll!))).toBe(TEXT.replace("NF3,24,", "NF3,26,"));
  });
});
