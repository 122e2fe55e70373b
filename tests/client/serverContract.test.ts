/**
 * The requests the VS Code client sends, answered by the real server (dist/server.js): the
 * summary table as the insert command asks for it, the species at a position, its 3D view model
 * and coordinates, the document's counts and the check of a file that is not open. The client
 * bundles no chemistry, so these answers are everything it shows.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { parse } from "csv-parse/sync";
import type {
  CheckTextResult,
  CoordinatesResult,
  DocumentSummaryResult,
  ShapeModelResult,
  SpeciesAtResult,
  SummaryTableParams,
  SummaryTableResult,
} from "../../shared/src/editorRequests";
import { findPointGroup } from "../../shared/src/index";
import { fixtureUri, startSession, type LspSession } from "../server/lspSession";

const NOTE = [
  "# Run 15: why is our NF3 line weaker than SF6?",
  "",
  "Bay C keeps XeF4 for the etch trials; SF4 arrives next week.",
  "",
].join("\n");

const STEREO_NOTE = ["# Run 16: difluoroethene isomers", "", "Cis isomer: `smiles:F/C=C\\F`, trans isomer: `smiles:F/C=C/F`.", ""].join(
  "\n",
);

const CYLINDERS = [
  "id,species,formula,molecular geometry",
  "KR-0412,sulfur hexafluoride,SF6,octahedral",
  "KR-0413,ammonia,NH3,trigonal planar",
  "",
].join("\n");

let session: LspSession;

beforeAll(async () => {
  session = await startSession();
  session.open(fixtureUri("notebook/run-15.md"), "markdown", NOTE);
  session.open(fixtureUri("inventory/cylinders.csv"), "csv", CYLINDERS);
  session.open(fixtureUri("notebook/run-16.md"), "markdown", STEREO_NOTE);
  session.open(fixtureUri("inventory/ions.tsv"), "tsv", "ion\tformula\nsulfate\tSO4^2-\n");
});

afterAll(async () => {
  await session?.stop();
});

async function summaryTable(params: SummaryTableParams): Promise<string> {
  const result = await session.connection.sendRequest<SummaryTableResult>("lonepair/summaryTable", params);
  return result.text;
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

  it("summary table with no format asked comes in the document's own format", async () => {
    const csv = await session.connection.sendRequest<SummaryTableResult>("lonepair/summaryTable", {
      uri: fixtureUri("inventory/cylinders.csv"),
    });
    expect(csv.format).toBe("csv");
    const tsv = await session.connection.sendRequest<SummaryTableResult>("lonepair/summaryTable", {
      uri: fixtureUri("inventory/ions.tsv"),
    });
    expect(tsv.format).toBe("tsv");
    expect(tsv.text.split("\n")[0]).toContain("Formula\tName\t");
    // common practice: sulfate is tetrahedral.
    expect(tsv.text).toContain("SO4^2-\t");
    expect(tsv.text).toContain("tetrahedral");
  });

  it("species at a position: the mention under the cursor, with its formula", async () => {
    const found = await session.connection.sendRequest<SpeciesAtResult | null>("lonepair/speciesAt", {
      uri: fixtureUri("notebook/run-15.md"),
      position: { line: 2, character: 14 },
    });
    expect(found?.text).toBe("XeF4");
    expect(found?.formula).toBe("XeF4");
    expect(found?.range).toEqual({ start: { line: 2, character: 12 }, end: { line: 2, character: 16 } });
    const nothing = await session.connection.sendRequest<SpeciesAtResult | null>("lonepair/speciesAt", {
      uri: fixtureUri("notebook/run-15.md"),
      position: { line: 2, character: 3 },
    });
    expect(nothing).toBeNull();
  });

  it.each([
    // common practice: cis-1,2-difluoroethene is C2v (polar), trans is C2h (nonpolar).
    ["cis", 22, "C2v"],
    ["trans", 55, "C2h"],
  ])("the %s isomer keeps its geometry in the 3D view model and in the exported coordinates", async (_isomer, character, group) => {
    const position = { line: 2, character };
    const model = await session.connection.sendRequest<ShapeModelResult | null>("lonepair/shapeModel", {
      uri: fixtureUri("notebook/run-16.md"),
      position,
    });
    expect(model?.model, JSON.stringify(model)).toBeDefined();
    const viewAtoms = model!.model!.atoms.map((atom) => ({ element: atom.symbol, position: atom.position }));
    const fromView = findPointGroup(viewAtoms);
    expect(fromView.ok && fromView.value.symbol).toBe(group);
    const exported = await session.connection.sendRequest<CoordinatesResult | null>("lonepair/coordinates", {
      uri: fixtureUri("notebook/run-16.md"),
      position,
      format: "xyz",
    });
    const lines = exported!.file!.text.trim().split("\n").slice(2);
    const fileAtoms = lines.map((line) => {
      const [element, x, y, z] = line.trim().split(/\s+/);
      return { element, position: [Number(x), Number(y), Number(z)] as [number, number, number] };
    });
    const fromFile = findPointGroup(fileAtoms);
    expect(fromFile.ok && fromFile.value.symbol).toBe(group);
  });

  it("coordinates as an MDL molfile, and a clear refusal for a species with no structure", async () => {
    const molfile = await session.connection.sendRequest<CoordinatesResult | null>("lonepair/coordinates", {
      uri: fixtureUri("notebook/run-15.md"),
      position: { line: 2, character: 14 },
      format: "molfile",
    });
    expect(molfile?.file?.extension).toBe("mol");
    expect(molfile?.file?.text).toContain("V2000");
    const unknownFormat = await session.connection.sendRequest<CoordinatesResult | null>("lonepair/coordinates", {
      uri: fixtureUri("notebook/run-15.md"),
      position: { line: 2, character: 14 },
      format: "pdf",
    });
    expect(unknownFormat).toBeNull();
  });

  it("document summary counts the species mentions and the problems of the open version", async () => {
    const summary = await session.connection.sendRequest<DocumentSummaryResult | null>("lonepair/documentSummary", {
      uri: fixtureUri("inventory/cylinders.csv"),
    });
    // Two rows, each naming its species twice (name and formula).
    expect(summary?.species).toBe(4);
    // The "trigonal planar" NH3 row is wrong: common practice says trigonal pyramidal.
    expect(summary?.problems).toBeGreaterThanOrEqual(1);
  });

  it("checking a file that is not open gives the diagnostics an open file would get", async () => {
    const reply = await session.connection.sendRequest<CheckTextResult>("lonepair/checkText", {
      uri: fixtureUri("inventory/closed.csv"),
      text: CYLINDERS,
    });
    // The "trigonal planar" NH3 row is wrong: common practice says trigonal pyramidal.
    expect(reply.diagnostics.some((diagnostic) => diagnostic.range.start.line === 2 && diagnostic.source === "lonepair")).toBe(true);
    expect(reply.diagnostics.some((diagnostic) => diagnostic.range.start.line === 1)).toBe(false);
  });
});
