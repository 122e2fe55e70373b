/**
 * Over the protocol, the same reading of table rows the checks use: a formula beside a charge
 * column is the ion, each part of a mixture has its own hover, and an element's name in a name
 * column is the element; none of these rows gets a diagnostic.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { HoverRequest, MarkupContent, type Diagnostic } from "vscode-languageserver-protocol/node";
import type { TextDocument } from "vscode-languageserver-textdocument";
import { fixtureUri, positionOf, startSession, type LspSession } from "./lspSession";

const IONS = fixtureUri("inventory/ic-standards.csv");
const IONS_TEXT = "Std ID,Name,Formula,Charge\nKR-IC-07,Sulfate,SO4,2-\nKR-IC-13,Ammonium,NH4,+1\nKR-IC-20,Check,NH4,\n";
const GASES = fixtureUri("inventory/cylinders-bay-d.csv");
const GASES_TEXT = "Cylinder,Name,Formula,Valence electrons\nC-103,Forming gas,5% H2 in N2,\nC-110,helium,,2\n";

let session: LspSession;
const documents = new Map<string, TextDocument>();
const diagnostics = new Map<string, Diagnostic[]>();

beforeAll(async () => {
  session = await startSession();
  for (const [uri, text] of [
    [IONS, IONS_TEXT],
    [GASES, GASES_TEXT],
  ]) {
    documents.set(uri, session.open(uri, "plaintext", text));
  }
  for (const uri of documents.keys()) diagnostics.set(uri, (await session.waitForDiagnostics(uri)).diagnostics);
});

afterAll(async () => {
  await session?.stop();
});

async function hoverAt(uri: string, needle: string): Promise<string> {
  const result = await session.connection.sendRequest(HoverRequest.type, {
    textDocument: { uri },
    position: positionOf(documents.get(uri)!, needle, 1),
  });
  return (result as { contents: MarkupContent } | null)?.contents.value ?? "";
}

describe("hovers on table rows", () => {
  it.each([
    // from memory: sulfate and ammonium are tetrahedral, AX4 (any general chemistry VSEPR table)
    [IONS, "SO4,2-", ["tetrahedral", "AX4"]],
    [IONS, "NH4,+1", ["tetrahedral", "AX4"]],
    // from memory: H2 and N2 are linear diatomics
    [GASES, "H2 in", ["linear"]],
    [GASES, "N2,", ["linear"]],
    // common practice: helium is a noble gas, one atom
    [GASES, "helium", ["He"]],
  ])("%s at %s", async (uri, needle, fragments) => {
    const text = await hoverAt(uri, needle);
    for (const fragment of fragments) expect(text).toContain(fragment);
  });

  it("reports only the row whose formula has no charge anywhere", () => {
    const document = documents.get(IONS)!;
    const lines = (diagnostics.get(IONS) ?? []).map((diagnostic) => diagnostic.range.start.line);
    expect(lines).toEqual([document.positionAt(IONS_TEXT.indexOf("KR-IC-20")).line]);
    expect(diagnostics.get(GASES)).toEqual([]);
  });
});
