/**
 * The requests the VS Code client sends, answered by the real server (dist/server.js): the
 * summary table as the insert command asks for it, and the two proposed requests, which the
 * server either answers or refuses with "method not found", the signal for the client's
 * fallback to the bundled core.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ErrorCodes, ResponseError } from "vscode-languageserver-protocol/node";
import { parse } from "csv-parse/sync";
import type { CheckTextResult, SpeciesAtResult, SummaryTableParams, SummaryTableResult } from "../../client/src/protocol";
import { fixtureUri, startSession, type LspSession } from "../server/lspSession";

const NOTE = [
  "# Run 15: why is our NF3 line weaker than SF6?",
  "",
  "Bay C keeps XeF4 for the etch trials; SF4 arrives next week.",
  "",
].join("\n");

const CYLINDERS = ["id,species,formula,molecular geometry", "KR-0412,sulfur hexafluoride,SF6,octahedral", "KR-0413,ammonia,NH3,trigonal planar", ""].join("\n");

let session: LspSession;

beforeAll(async () => {
  session = await startSession();
  session.open(fixtureUri("notebook/run-15.md"), "markdown", NOTE);
  session.open(fixtureUri("inventory/cylinders.csv"), "csv", CYLINDERS);
});

afterAll(async () => {
  await session?.stop();
});

async function summaryTable(params: SummaryTableParams): Promise<string> {
  const result = await session.connection.sendRequest<SummaryTableResult>("lonepair/summaryTable", params);
  return result.text;
}

/** The answer, or undefined when the server says it does not know the method. */
async function answerOrMethodNotFound<T>(method: string, params: unknown): Promise<{ answered: true; value: T } | { answered: false }> {
  try {
    return { answered: true, value: await session.connection.sendRequest<T>(method, params) };
  } catch (error) {
    expect(error).toBeInstanceOf(ResponseError);
    expect((error as ResponseError<unknown>).code).toBe(ErrorCodes.MethodNotFound);
    return { answered: false };
  }
}

describe("requests the client sends", () => {
  it("summary table of a selection, as markdown, lists only the species selected", async () => {
    // The selection covers line 2 only: XeF4 and SF4, not the NF3 and SF6 of the heading.
    const text = await summaryTable({
      uri: fixtureUri("notebook/run-15.md"),
      range: { start: { line: 2, character: 0 }, end: { line: 2, character: 60 } },
      format: "markdown",
    });
    const rows = text.split("\n").filter((line) => line.startsWith("| ") && !line.startsWith("| ---"));
    // common practice: XeF4 square planar, SF4 seesaw.
    expect(rows.slice(1).map((row) => row.split("|")[1].trim())).toEqual(["XeF4", "SF4"]);
    expect(text).toContain("square planar");
    expect(text).toMatch(/model prediction, not measured data/i);
  });

  it("summary table of a CSV document comes as CSV rows that a CSV reader accepts", async () => {
    const text = await summaryTable({ uri: fixtureUri("inventory/cylinders.csv"), format: "csv" });
    // source: csv-parse reads the rows back
    const records = parse(text, { columns: true }) as Record<string, string>[];
    expect(records.map((record) => record.Formula)).toEqual(["SF6", "NH3"]);
    // common practice: SF6 octahedral, NH3 trigonal pyramidal.
    expect(records.map((record) => record["Molecular geometry"])).toEqual(["octahedral", "trigonal pyramidal"]);
  });

  it("species at a position: the mention under the cursor, or a refusal the client falls back on", async () => {
    const reply = await answerOrMethodNotFound<SpeciesAtResult | null>("lonepair/speciesAt", {
      uri: fixtureUri("notebook/run-15.md"),
      position: { line: 2, character: 14 },
    });
    if (reply.answered) {
      expect(reply.value?.text).toBe("XeF4");
      expect(reply.value?.range).toEqual({ start: { line: 2, character: 12 }, end: { line: 2, character: 16 } });
    }
  });

  it("checking a file that is not open: diagnostics, or a refusal the client falls back on", async () => {
    const reply = await answerOrMethodNotFound<CheckTextResult>("lonepair/checkText", {
      uri: fixtureUri("inventory/closed.csv"),
      text: CYLINDERS,
    });
    if (reply.answered) {
      // The "trigonal planar" NH3 row is wrong: common practice says trigonal pyramidal.
      expect(reply.value.diagnostics.some((diagnostic) => diagnostic.range.start.line === 2 && diagnostic.source === "lonepair")).toBe(true);
    }
  });
});
