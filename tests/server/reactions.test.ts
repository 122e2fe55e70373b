/**
 * Equations through the language server: the diagnostic on the arrow, the hover card with the
 * balance sheet and the oxidation-state changes, and the quick fix that rewrites the coefficients.
 */
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
