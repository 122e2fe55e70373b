// A JSON or YAML file just opened is read a few records at a time, and whatever is asked of it
// meanwhile (the findings around a place, the species under a hover), or an edit made before the
// read is done, gives what a from-scratch analysis of the same text gives (the core's own
// analyzeDocument + checkDocument are the reference).
import { parseTree, type ParseError } from "jsonc-parser/lib/esm/main.js";
import { describe, expect, it } from "vitest";
import { chunkedTextOf, createDocumentAnalyser, wholeText } from "../../shared/src/index";
import { canonical, checkAgainstScratch, fromScratch, placesAgree, type Session } from "../support/incrementalCheck";
import { JSON_RECORD_LINES, jsonDocument, randomJsonEdit } from "../support/jsonEdits";
import { seededRandom } from "../support/seededRandom";

function isCleanJson(text: string): boolean {
  const errors: ParseError[] = [];
  parseTree(text, errors, { allowTrailingComma: true, disallowComments: false });
  return errors.length === 0;
}

describe("a JSON list of records read a few records at a time", () => {
  it.each([1, 2, 3, 4])("agrees with a fresh analysis whatever is asked while it is read (seed %i)", (seed) => {
    const random = seededRandom(seed);
    const lines = Array.from({ length: 30 }, (_, index) => JSON_RECORD_LINES[(index * 5 + seed) % JSON_RECORD_LINES.length]);
    const session: Session = { text: chunkedTextOf(jsonDocument(lines), 128), analyser: createDocumentAnalyser("json") };
    const undo: { start: number; length: number; removed: string }[] = [];
    for (let round = 0; round < 150; round++) {
      randomJsonEdit(session, random, undo);
      // Opened afresh, read in steps of a few characters to a few records. A clean text is taken
      // for a large one, which answers requests about a place from the records there before the
      // rest is read; a broken one must be read through first to give what a fresh reading gives.
      const clean = isCleanJson(wholeText(session.text));
      const analyser = createDocumentAnalyser("json", undefined, {
        listStep: 1 + Math.floor(random() * 400),
        readWholeElsewhereFrom: clean ? 0 : undefined,
      });
      const opened = analyser.analyse(session.text);
      placesAgree(opened, wholeText(session.text), "json", random);
      let steps = 0;
      for (const part of opened.findingParts()) {
        steps++;
        if (random() < 0.2) break;
        expect(Array.isArray(part)).toBe(true);
      }
      expect(steps).toBeGreaterThan(0);
      // An edit before the read is done: what was read is kept, and the result is the same.
      const edited: Session = { text: session.text, analyser };
      randomJsonEdit(edited, random, []);
      checkAgainstScratch(edited, "json", random);
    }
  });

  it("reads a long list in many steps, each holding no findings until the last holds them all", () => {
    const lines = Array.from({ length: 200 }, (_, index) => JSON_RECORD_LINES[index % 4]);
    const text = jsonDocument(lines);
    const parts = [...createDocumentAnalyser("json", undefined, { listStep: 500 }).analyse(chunkedTextOf(text)).findingParts()];
    expect(parts.length).toBeGreaterThan(20);
    expect(parts.slice(0, -1).every((part) => part.length === 0)).toBe(true);
    expect(canonical(parts[parts.length - 1])).toEqual(canonical(fromScratch(text, "json")));
  });

  it("keeps the equations of a list under an equation key when one is edited", () => {
    // common practice: both sides of these equations balance except the seeded one.
    const equations = ['"H2 + Cl2 -> 2 HCl"', '"N2 + 3 H2 -> 2 NH3"', '"2 SO2 + O2 -> 2 SO3"', '"N2 + H2 -> NH3"'];
    const text = `{"lab": "Kestrel Ridge Analytical", "equations": [\n  ${equations.join(",\n  ")}\n]}\n`;
    const session: Session = { text: chunkedTextOf(text, 16), analyser: createDocumentAnalyser("json") };
    checkAgainstScratch(session, "json", seededRandom(9));
    expect(fromScratch(text, "json").length).toBeGreaterThan(0);
    // The balanced first equation loses a 2: it must now be reported, as a fresh reading reports it.
    const at = text.indexOf("2 HCl");
    session.text = chunkedTextOf(text.slice(0, at) + text.slice(at + 2), 16);
    checkAgainstScratch(session, "json", seededRandom(10));
  });
});
