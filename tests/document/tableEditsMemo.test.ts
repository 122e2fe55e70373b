/**
 * The editor keeps one memo of table rows per open table from edit to edit. After any sequence of
 * edits (cells changed, rows added and removed, the header renamed), the findings through the
 * kept memo must equal the ordinary reading of the whole text (model, then checks).
 */
import { describe, expect, it } from "vitest";
import { analyzeDocument, checkDelimitedText, checkDocument, delimitedRowMemo } from "../../shared/src/index";
import { seededRandom } from "../support/seededRandom";

// common practice: the valence electron counts and shapes of these cylinder gases.
const ROWS = [
  "sulfur hexafluoride,SF6,48,octahedral",
  "nitrogen trifluoride,NF3,26,trigonal pyramidal",
  "ammonia,NH3,8,trigonal pyramidal",
  "xenon tetrafluoride,XeF4,36,square planar",
  "ammonia,NH3,8,trigonal planar",
  "nitrogen trifluoride,NF3,24,trigonal pyramidal",
  "methane,CH5,10,tetrahedral",
];
const HEADERS = [
  "id,species,formula,valence electrons,molecular geometry",
  "id,name,formula,electrons,shape",
  "id,species,formula,notes,molecular geometry",
];

describe("a table's row memo kept across edits", () => {
  it.each([1, 2, 3, 4, 5])("gives the findings of a fresh check after 300 random edits (seed %i)", (seed) => {
    const random = seededRandom(seed);
    const pick = <T>(items: readonly T[]): T => items[Math.floor(random() * items.length)];
    let header = HEADERS[0];
    const rows: string[] = Array.from({ length: 40 }, (_, index) => `KR-${index},${pick(ROWS)}`);
    const kept = delimitedRowMemo();
    for (let edit = 0; edit < 300; edit++) {
      const choice = random();
      if (choice < 0.6) rows[Math.floor(random() * rows.length)] = `KR-${edit},${pick(ROWS)}`;
      else if (choice < 0.8) rows.splice(Math.floor(random() * rows.length), 0, `KR-x${edit},${pick(ROWS)}`);
      else if (choice < 0.95 && rows.length > 1) rows.splice(Math.floor(random() * rows.length), 1);
      else header = pick(HEADERS);
      const text = `${[header, ...rows].join("\n")}\n`;
      const incremental = checkDelimitedText(text, "csv", { memo: kept });
      const model = analyzeDocument(text, "csv");
      const fromScratch = [...model.problems, ...checkDocument(model)];
      expect(incremental).toEqual(fromScratch);
    }
    expect(kept.looked).toBeGreaterThan(kept.worked);
  });
});
