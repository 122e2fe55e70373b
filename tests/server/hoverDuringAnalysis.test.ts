/**
 * A hover sent while the server is still working out a long notebook's diagnostics is answered
 * before those diagnostics, and with the card the same hover gets once they are done: after
 * opening, after an edit, and far into the text where the analysis has not got to yet.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  DocumentDiagnosticRequest,
  HoverRequest,
  type DocumentDiagnosticReport,
  type Hover,
  type MarkupContent,
  type Position,
} from "vscode-languageserver-protocol/node";
import { FULL_CAPABILITIES, fixtureUri, startSession, type LspSession } from "./lspSession";

const PULLING_CLIENT = {
  ...FULL_CAPABILITIES,
  textDocument: { ...FULL_CAPABILITIES.textDocument, diagnostic: { dynamicRegistration: false } },
};

/** A long run log in the lab's style: prose, mhchem and a table per run, a slip now and then. */
function runLog(runs: number): string {
  const lines: string[] = [];
  for (let run = 1; run <= runs; run++) {
    lines.push(
      `## Run ${run}: fluorinating agents for the etch study`,
      "",
      `Dana weighed SF4 and XeF4 into the glovebox for run ${run}; NH4+ stayed in the fridge, and the NF3 line was purged.`,
      `The balance: $\\ce{SF4 + F2 -> SF6}$, checked by Marcus in room ${(run % 7) + 1}.`,
      "",
      "| Formula | Molecular geometry |",
      "|---|---|",
      "| ClF3 | T-shaped |",
      `| ${run % 50 === 0 ? "CH5" : "PF6-"} | octahedral |`,
      "",
    );
  }
  return lines.join("\n");
}

/** Positions of the first letter of the last mention of `formula` on a line that starts with `prefix`. */
function lastMention(text: string, formula: string, prefix: string): Position {
  const lines = text.split("\n");
  for (let line = lines.length - 1; line >= 0; line--) {
    const character = lines[line].indexOf(formula);
    if (lines[line].startsWith(prefix) && character >= 0) return { line, character: character + 1 };
  }
  throw new Error(`no ${formula} in the log`);
}

function cardOf(hover: Hover | null): string {
  expect(hover).not.toBeNull();
  return (hover!.contents as MarkupContent).value;
}

describe("hover while a long notebook is analysed", () => {
  let session: LspSession;
  const uri = fixtureUri("notebook/all-runs.md");
  // common practice: a notebook of a few megabytes takes the server a good while to check through.
  const text = runLog(10_000);
  // The XeF4 of the prose near the end, the PF6- of the last table, the CH5 of the last run with a slip.
  const places = [lastMention(text, "XeF4", "Dana"), lastMention(text, "PF6-", "| PF6-"), lastMention(text, "CH5", "| CH5")];

  beforeAll(async () => {
    session = await startSession({ capabilities: PULLING_CLIENT, configuration: () => ({}) });
  });
  afterAll(async () => {
    await session?.stop();
  });

  /** Asks for the diagnostics and, at once, the hovers; returns the hovers, in the order answers came. */
  async function hoversDuringDiagnostics(): Promise<{ order: string[]; cards: string[]; report: DocumentDiagnosticReport }> {
    const order: string[] = [];
    const diagnostics = session.connection
      .sendRequest(DocumentDiagnosticRequest.type, { textDocument: { uri } })
      .then((report) => (order.push("diagnostics"), report));
    const hovers = places.map((position, index) =>
      session.connection.sendRequest(HoverRequest.type, { textDocument: { uri }, position }).then((hover) => {
        order.push(`hover ${index}`);
        return cardOf(hover);
      }),
    );
    const [report, ...cards] = await Promise.all([diagnostics, ...hovers]);
    return { order, cards, report };
  }

  /** The same hovers once nothing else is running. */
  async function quietHovers(): Promise<string[]> {
    const cards: string[] = [];
    for (const position of places) {
      cards.push(cardOf(await session.connection.sendRequest(HoverRequest.type, { textDocument: { uri }, position })));
    }
    return cards;
  }

  it("answers hovers sent with the first diagnostics request before the diagnostics, with the cards given afterwards", async () => {
    session.open(uri, "markdown", text);
    const during = await hoversDuringDiagnostics();
    expect(during.order[during.order.length - 1]).toBe("diagnostics");
    // The slip in the table is reported, so the analysis did reach the end of the notebook.
    expect("items" in during.report && during.report.items.some((item) => String(item.message).includes("CH5"))).toBe(true);
    expect(during.cards).toEqual(await quietHovers());
    // source: VSEPR, AX4E2 and AX6: XeF4 is square planar and PF6- octahedral; CH5 has no Lewis structure
    expect(during.cards[0]).toContain("square planar");
    expect(during.cards[1]).toContain("octahedral");
  });

  it("after an edit near the top, answers hovers during the new diagnostics with the same cards", async () => {
    session.change(uri, [{ range: { start: { line: 2, character: 0 }, end: { line: 2, character: 0 } }, text: "Noted: " }]);
    const during = await hoversDuringDiagnostics();
    expect(during.order[during.order.length - 1]).toBe("diagnostics");
    expect(during.cards).toEqual(await quietHovers());
  });
});
