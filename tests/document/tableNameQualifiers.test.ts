/**
 * Name cells with words after the name, in markdown tables as in CSV: the name is the row's
 * species and the words are set aside; a mixture row's name and the component it names get one
 * note between them.
 */
import { describe, expect, it } from "vitest";
import { analyzeDocument, checkDocument, type DocumentKind } from "../../shared/src/index";

/** Each finding as [code, the text it covers, the fix's replacement text or "-"]. */
function findings(text: string, kind: DocumentKind): [string, string, string][] {
  return checkDocument(analyzeDocument(text, kind)).map((finding) => [
    finding.code,
    text.slice(finding.range.start, finding.range.end),
    finding.fix?.newText ?? "-",
  ]);
}

function markdownTable(header: readonly string[], ...rows: readonly (readonly string[])[]): string {
  const line = (cells: readonly string[]) => `| ${cells.join(" | ")} |`;
  return [line(header), line(header.map(() => "---")), ...rows.map(line), ""].join("\n");
}

describe("a name cell with a qualifier after the name", () => {
  it.each([
    // [header, name cell, value header, value, expected findings]
    // from memory: NH3 is trigonal pyramidal, SF6 has 6 + 6 × 7 = 48 valence electrons, any general chemistry text
    [
      "Reagent",
      "ammonia (anhydrous, small cylinder)",
      "Shape",
      "trigonal planar",
      [["table-molecular-geometry", "trigonal planar", "trigonal pyramidal"]],
    ],
    ["Reagent", "ammonia (anhydrous, small cylinder)", "Shape", "trigonal pyramidal", []],
    ["Name", "sulfur hexafluoride – etch gas", "Valence electrons", "46", [["table-valence-electrons", "46", "48"]]],
    ["Name", "sulfur hexafluoride – etch gas", "Valence electrons", "48", []],
    ["Gas", "nitrogen trifluoride, 99.99%", "Polar", "no", [["table-polarity", "no", "yes"]]],
    ["Gas", "Argon, UHP", "Valence electrons", "8", []],
  ])("%s %j is read as the name, its %s %j checked", (header, cell, valueHeader, value, expected) => {
    expect(findings(markdownTable([header, valueHeader], [cell, value]), "markdown")).toEqual(expected);
    expect(findings(`${header},${valueHeader}\n"${cell}",${value}\n`, "csv")).toEqual(expected);
  });

  it("compares the name with the formula beside it", () => {
    const text = markdownTable(["Name", "Formula"], ["methane (CP grade)", "CH4"], ["methane (CP grade)", "CH5"]);
    // from memory: methane is CH4; carbon holds at most four electron pairs
    expect(findings(text, "markdown").map((finding) => finding.slice(0, 2))).toEqual([
      ["table-name-formula", "methane"],
      ["octet-exceeded", "CH5"],
    ]);
  });

  it("says a radical's note once, on the formula, not again on the name", () => {
    // from memory: NO has 11 valence electrons, a radical
    const text = markdownTable(["Name", "Formula"], ["nitric oxide (cal std)", "NO"]);
    expect(findings(text, "markdown")).toEqual([["radical", "NO", "-"]]);
  });

  it.each([
    // [header, cell]: a formula with words around it stays prose, found and not called a typo
    ["Gas", "SF4 (reference)"],
    ["Species", "NF3 line 2"],
  ])("reads %s %j as prose", (header, cell) => {
    const model = analyzeDocument(markdownTable([header, "Shape"], [cell, "seesaw"]), "markdown");
    expect(model.records).toEqual([]);
    expect(model.occurrences.map((occurrence) => occurrence.text)).toEqual([cell.split(" ")[0]]);
    expect(checkDocument(model).filter((finding) => finding.severity === "error")).toEqual([]);
  });
});

describe("a mixture row with a name column", () => {
  it.each([
    ["csv", 'Gas,Formula\nNitric oxide std,"NO 10 ppm, N2 bal"\n'],
    ["markdown", markdownTable(["Gas", "Formula"], ["Nitric oxide std", "NO 10 ppm, N2 bal"])],
    ["markdown", markdownTable(["Name", "Formula"], ["Nitric oxide std", "NO 10 ppm, N<sub>2</sub> bal"])],
    ["csv", "Summenformel;Bezeichnung\nNO 10 ppm, N2 Rest;Stickstoffmonoxid\n"],
  ] as const)("%s: says the radical note once, on the mixture's NO", (kind, text) => {
    // from memory: NO has 11 valence electrons, a radical
    expect(findings(text, kind)).toEqual([["radical", "NO", "-"]]);
  });

  it("still checks no other cell of a mixture row", () => {
    const text = 'Gas,Formula,Valence electrons\nNitric oxide std,"NO 10 ppm, N2 bal",10\n';
    expect(findings(text, "csv").map((finding) => finding[0])).toEqual(["radical"]);
  });
});
