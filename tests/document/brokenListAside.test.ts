// A large JSON or YAML list broken by a keystroke is not read whole on the spot: its whole
// reading is offered to the caller (an editor server does it on another thread), requests about
// a place meanwhile answer from the records there, and the findings and species count in the end,
// settled elsewhere or read here, are a from-scratch analysis's (the core's own analyzeDocument +
// checkDocument are the reference). Here every text counts as large.
import { describe, expect, it } from "vitest";
import {
  analyzeDocument,
  chunkedTextOf,
  createDocumentAnalyser,
  editChunkedText,
  wholeReadingOf,
  wholeText,
  type DocumentAnalysis,
} from "../../shared/src/index";
import { canonical, fromScratch, speciesCountOf, type Session } from "../support/incrementalCheck";
import { JSON_BREAKING_LINES, JSON_RECORD_LINES, jsonDocument, randomJsonEdit } from "../support/jsonEdits";
import { seededRandom } from "../support/seededRandom";

const EVERY_TEXT_IS_LARGE = { readWholeElsewhereFrom: 0, listStep: 300 };

/**
 * Reads `analysis` a step at a time as the server does; where the whole reading is wanted, asks
 * about a few places first (none of which may read the text whole), then settles it or leaves it
 * to be read here. Returns whether the whole reading was wanted.
 */
function readAsTheServerDoes(analysis: DocumentAnalysis, kind: "json" | "yaml", random: () => number): { wanted: boolean; last: string } {
  const plain = wholeText(analysisText.get(analysis)!);
  let wanted = false;
  let last: readonly unknown[] = [];
  for (const part of analysis.findingParts()) {
    last = part;
    const offer = analysis.wholeReadWanted();
    if (!offer || wanted) continue;
    wanted = true;
    for (let probe = 0; probe < 3; probe++) {
      const place = Math.floor(random() * (plain.length + 1));
      analysis.speciesAt(place);
      analysis.findingsAround(place, place);
    }
    expect(analysis.wholeReadWanted(), "a request about a place read the broken text whole").toBeDefined();
    if (random() < 0.6) offer.settle(wholeReadingOf(kind, wholeText(offer.text)));
  }
  return { wanted, last: JSON.stringify(canonical(last as never)) };
}

const analysisText = new WeakMap<DocumentAnalysis, ReturnType<typeof chunkedTextOf>>();

function analyse(session: Session): DocumentAnalysis {
  const analysis = session.analyser.analyse(session.text);
  analysisText.set(analysis, session.text);
  return analysis;
}

describe("a broken list read whole elsewhere", () => {
  it.each([1, 2, 3])("JSON: the findings and the count are a fresh analysis's, settled or not (seed %i)", (seed) => {
    const random = seededRandom(seed);
    const lines = Array.from({ length: 24 }, (_, index) => JSON_RECORD_LINES[(index * 3 + seed) % JSON_RECORD_LINES.length]);
    const session: Session = {
      text: chunkedTextOf(jsonDocument(lines), 128),
      analyser: createDocumentAnalyser("json", undefined, EVERY_TEXT_IS_LARGE),
    };
    const undo: { start: number; length: number; removed: string }[] = [];
    let wantedTimes = 0;
    for (let round = 0; round < 120; round++) {
      randomJsonEdit(session, random, undo);
      const plain = wholeText(session.text);
      const reading = readAsTheServerDoes(analyse(session), "json", random);
      if (reading.wanted) wantedTimes++;
      expect(reading.last).toEqual(JSON.stringify(canonical(fromScratch(plain, "json"))));
      expect(speciesCountOf(analyse(session))).toBe(analyzeDocument(plain, "json").occurrences.length);
    }
    // The edits break the text now and then: the offer was made.
    expect(wantedTimes).toBeGreaterThan(3);
  });

  it("YAML: a record left open is offered, and the mend reads as an edit again", () => {
    // common practice: SF4 has 34 valence electrons; NH3 is trigonal pyramidal.
    const records = Array.from({ length: 40 }, (_, index) =>
      index % 2 === 0
        ? `  - {id: KR-${index}, formula: SF4, valence electrons: 32}`
        : `  - {id: KR-${index}, formula: NH3, molecular geometry: trigonal pyramidal}`,
    );
    const text = `lab: Kestrel Ridge Analytical\nrecords:\n${records.join("\n")}\n`;
    const session: Session = { text: chunkedTextOf(text, 256), analyser: createDocumentAnalyser("yaml", undefined, EVERY_TEXT_IS_LARGE) };
    const random = seededRandom(4);
    expect(readAsTheServerDoes(analyse(session), "yaml", random).wanted).toBe(false);
    // A flow mapping left open in the middle of the list.
    const at = text.indexOf("{id: KR-20,");
    session.text = editChunkedText(session.text, at, at + 1, "");
    const broken = readAsTheServerDoes(analyse(session), "yaml", random);
    expect(broken.wanted).toBe(true);
    expect(broken.last).toEqual(JSON.stringify(canonical(fromScratch(wholeText(session.text), "yaml"))));
    session.text = editChunkedText(session.text, at, at, "{");
    const mended = readAsTheServerDoes(analyse(session), "yaml", random);
    expect(mended.wanted).toBe(false);
    expect(mended.last).toEqual(JSON.stringify(canonical(fromScratch(text, "yaml"))));
    expect(speciesCountOf(analyse(session))).toBe(analyzeDocument(text, "yaml").occurrences.length);
  });

  it("waits for the whole reading of a text whose list the quick pass cannot find, finding nothing meanwhile", () => {
    const lines = Array.from({ length: 20 }, (_, index) => JSON_RECORD_LINES[index % 4]);
    const text = jsonDocument(lines);
    const session: Session = { text: chunkedTextOf(text, 128), analyser: createDocumentAnalyser("json", undefined, EVERY_TEXT_IS_LARGE) };
    for (const _ of analyse(session).findingParts());
    // The quote that opens the key before the list taken away: the list is no longer found.
    const key = text.indexOf('"records"');
    session.text = editChunkedText(session.text, key, key + 1, "");
    const analysis = analyse(session);
    const offer = analysis.wholeReadWanted();
    expect(offer).toBeDefined();
    const edited = wholeText(session.text);
    expect(analysis.speciesAt(edited.indexOf('"NF3"') + 2)).toBeUndefined();
    expect(analysis.findingsAround(0, edited.length)).toEqual([]);
    expect(analysis.wholeReadWanted()).toBeDefined();
    offer!.settle(wholeReadingOf("json", edited));
    expect(analysis.wholeReadWanted()).toBeUndefined();
    expect(canonical([...analysis.findingParts()].flat())).toEqual(canonical(fromScratch(edited, "json")));
    expect(speciesCountOf(analysis)).toBe(analyzeDocument(edited, "json").occurrences.length);
  });

  it("answers the species under a hover from the records there while the broken text waits", () => {
    const lines = Array.from({ length: 30 }, (_, index) => JSON_RECORD_LINES[index % 4]);
    const text = jsonDocument(lines);
    const session: Session = { text: chunkedTextOf(text, 128), analyser: createDocumentAnalyser("json", undefined, EVERY_TEXT_IS_LARGE) };
    for (const _ of analyse(session).findingParts());
    // The first record's line is replaced by one whose string is left open.
    const first = text.indexOf(JSON_RECORD_LINES[0]);
    session.text = editChunkedText(session.text, first, first + JSON_RECORD_LINES[0].length, JSON_BREAKING_LINES[0]);
    const analysis = analyse(session);
    for (const _ of analysis.findingParts()) if (analysis.wholeReadWanted()) break;
    expect(analysis.wholeReadWanted()).toBeDefined();
    // A formula far from the break: the record there reads as it did before the break.
    const edited = wholeText(session.text);
    const far = edited.lastIndexOf('"NH3"') + 2;
    expect(analysis.speciesAt(far)?.text).toBe("NH3");
    expect(analysis.wholeReadWanted()).toBeDefined();
  });
});
