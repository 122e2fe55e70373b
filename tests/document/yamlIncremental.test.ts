// A YAML document edited again and again, analysed item by item where its list of records allows
// it and whole where it does not, gives the findings and the species of a from-scratch analysis
// of the same text (the core's own analyzeDocument + checkDocument are the reference), after
// thousands of random edits to YAML written in the styles people write it in.
import { describe, expect, it } from "vitest";
import { parseAllDocuments } from "yaml";
import { chunkedTextOf, createDocumentAnalyser, editChunkedText, wholeText } from "../../shared/src/index";
import { canonical, checkAgainstScratch, fromScratch, placesAgree, type Session } from "../support/incrementalCheck";
import { seededRandom } from "../support/seededRandom";

// common practice: valence electron counts, lone pairs and shapes of the lab's reference gases,
// right and wrong, written as records in the styles YAML files use: block mappings, flow
// mappings, comments, block scalars (whose lines look like records but are text), anchors and
// aliases, a merge key, quoted scalars, a species as a key, nested lists, an equation.
const ITEMS = [
  "- id: KR-1\n  name: sulfur hexafluoride\n  formula: SF6\n  valence electrons: 48\n  molecular geometry: octahedral",
  "- id: KR-2\n  formula: NF3\n  valence electrons: 24   # the label says 26\n  lone pairs: 1",
  "- {id: KR-3, formula: NH3, molecular geometry: trigonal planar}",
  "- {id: KR-4, formula: Sf4, lone pairs: 1}",
  "- id: KR-5\n  formula: CH5\n  notes: |\n    weighed twice;\n    - formula: XeF4\n    valence electrons: 7",
  '- id: KR-6\n  formula: "XeF4"\n  lone pairs: 2\n  summary: >\n    square planar,\n    two lone pairs',
  "- &kr7\n  id: KR-7\n  formula: ClF3\n  valence electrons: 28",
  "- <<: *kr7\n  id: KR-8\n  formula: 'SO2'\n  valence electrons: 18",
  "- SF4: {lone pairs: 2}\n  BF3:\n    molecular geometry: trigonal pyramidal",
  "-\n  # shelf 9, checked by Dana\n  formula: NO2\n  name: nitrogen dioxide",
  "- - formula: BF3\n    valence electrons: 24\n  - KR-10",
  "- {id: KR-11,\n   formula: H2O, lone pairs: 2}",
  "- equation: SF4 + F2 -> SF6\n  formula: SF4",
  "- formula: NH4+\n  name: ammonium\n  shelf: *kr7",
  '- formula: "CLF3"\n  note: "two lines\n    in quotes"',
];

/** Lines that make the YAML invalid for a while (as typing does) or change its structure. */
const BREAKING_LINES = [
  '  formula: "SF4',
  "- [unclosed, SF4",
  "records:",
  "---",
  "%YAML 1.2",
  "\tformula: SF4",
  "  bad: : :",
  "...",
  "  - formula: SF4\n wrong: indent",
  "reviewed by: Dana",
  "- formula: NF3 # a record at the root's column",
];

const KEYSTROKES = [
  "4",
  "F",
  " ",
  "  ",
  "\n",
  "\r\n",
  "\r",
  "-",
  "- ",
  ":",
  "#",
  "'",
  '"',
  "{",
  "}",
  "[",
  "]",
  ",",
  "|",
  ">",
  "&a ",
  "*a",
  "?",
];

/** `item` with every line moved right by `indent` spaces. */
function indented(item: string, indent: number): string {
  return item.replace(/^/gm, " ".repeat(indent));
}

interface Style {
  readonly label: string;
  /** The column of the list's dashes. */
  readonly indent: number;
  readonly document: (items: readonly string[]) => string;
}

const STYLES: readonly Style[] = [
  {
    label: "a block list at the root",
    indent: 0,
    document: (items) => `# Kestrel Ridge Analytical reference shelf\n${items.join("\n")}\n# end of shelf\n`,
  },
  {
    label: "records under a top-level key, with keys before and after",
    indent: 2,
    document: (items) =>
      [
        "lab: Kestrel Ridge Analytical",
        "formula: CO2",
        "valence electrons: 14",
        "records:",
        ...items.map((item) => indented(item, 2)),
        "reviewed by:",
        "  formula: NO2",
        "  name: nitrogen dioxide",
        "equations:",
        "  - N2 + H2 -> NH3",
        "",
      ].join("\n"),
  },
  {
    label: "a list in the key's own column",
    indent: 0,
    document: (items) => ["shelf: 7", "records:", ...items, "count: 40", ""].join("\n"),
  },
  {
    label: "several documents",
    indent: 2,
    document: (items) =>
      [
        "---",
        "lab: Kestrel Ridge Analytical",
        "---",
        "records:",
        ...items.map((item) => indented(item, 2)),
        "...",
        "---",
        "- formula: SF6",
        "",
      ].join("\n"),
  },
  {
    label: "a longer list of short tags beside the records",
    indent: 2,
    document: (items) =>
      [
        "tags:",
        ...Array.from({ length: 40 }, (_, index) => `  - shelf-${index}`),
        "records:",
        ...items.map((item) => indented(item, 2)),
        "",
      ].join("\n"),
  },
  {
    label: "CRLF line ends",
    indent: 2,
    document: (items) => `records:\r\n${items.map((item) => indented(item, 2).replaceAll("\n", "\r\n")).join("\r\n")}\r\nnote: end\r\n`,
  },
];

/** Shapes that are read whole on every edit. */
const WHOLE_READ_STYLES: readonly Style[] = [
  {
    label: "a directive at the top",
    indent: 2,
    document: (items) => `%YAML 1.2\n---\nrecords:\n${items.map((item) => indented(item, 2)).join("\n")}\n`,
  },
  {
    label: "a list of equations",
    indent: 2,
    document: (items) =>
      `equations:\n${items.map((_, index) => `  - ${["SF4 + F2 -> SF6", "N2 + H2 -> NH3", "H2 + O2 -> H2O"][index % 3]}`).join("\n")}\n`,
  },
  {
    label: "a flow list at the root",
    indent: 0,
    document: (items) =>
      `[\n${items.map((_, index) => `  {id: KR-${index}, formula: ${["SF4", "NF3", "CH5"][index % 3]}},`).join("\n")}\n]\n`,
  },
];

function isBroken(text: string): boolean {
  try {
    return parseAllDocuments(text).some((document) => document.errors.length > 0);
  } catch {
    return true;
  }
}

interface Undo {
  readonly start: number;
  readonly length: number;
  readonly removed: string;
}

/** Edits as a writer makes them to a YAML file: whole records, lines retyped, keystrokes, often undone. */
function randomYamlEdit(session: Session, random: () => number, indent: number, undo: Undo[]): void {
  const plain = wholeText(session.text);
  const pick = <T>(items: readonly T[]): T => items[Math.floor(random() * items.length)];
  const lineStarts = [0, ...[...plain.matchAll(/\n/g)].map((match) => match.index + 1)];
  // Mostly the list's own column; now and then another one.
  const column = random() < 0.9 ? indent : pick([0, 1, 2, 4]);
  const choice = random();
  if (((isBroken(plain) && choice < 0.8) || choice < 0.08) && undo.length > 0) {
    // Undo the last edit, as an editor does: mostly valid YAML again after a keystroke that broke it.
    const last = undo.pop()!;
    session.text = editChunkedText(session.text, last.start, last.start + last.length, last.removed);
    return;
  }
  let start: number;
  let end: number;
  let insert: string;
  if (choice < 0.45) {
    // A line retyped: the first line of a record, a line from inside one, or (rarely) one that breaks the YAML.
    const line = Math.floor(random() * lineStarts.length);
    start = lineStarts[line];
    const lineFeed = plain.indexOf("\n", start);
    end = lineFeed < 0 ? plain.length : lineFeed;
    const lines = pick(ITEMS).split("\n");
    insert = random() < 0.85 ? indented(pick(lines), column) : pick(BREAKING_LINES);
  } else if (choice < 0.75) {
    // Whole records pasted or deleted, with the line end the file uses (or not).
    start = pick(lineStarts);
    end = random() < 0.4 ? start : Math.min(plain.length, pick(lineStarts.filter((at) => at >= start).slice(0, 6)));
    const lineEnd = plain.includes("\r\n") === random() < 0.9 ? "\r\n" : "\n";
    const count = 1 + Math.floor(random() * 3);
    insert =
      random() < 0.3
        ? ""
        : Array.from({ length: count }, () => `${indented(pick(ITEMS), column).replaceAll("\n", lineEnd)}${lineEnd}`).join("");
  } else {
    // A keystroke anywhere.
    start = Math.floor(random() * (plain.length + 1));
    end = random() < 0.5 ? start : Math.min(plain.length, start + 1 + Math.floor(random() * 3));
    insert = random() < 0.3 ? "" : pick(KEYSTROKES);
  }
  undo.push({ start, length: insert.length, removed: plain.slice(start, end) });
  session.text = editChunkedText(session.text, start, end, insert);
}

function runEdits(style: Style, seed: number, edits: number): void {
  const random = seededRandom(seed);
  const items = Array.from({ length: 20 }, (_, index) => ITEMS[(index * 7 + seed) % ITEMS.length]);
  // Half the sessions read a file opened afresh an item or two at a time.
  const tuning = seed % 2 === 0 ? { listStep: 64 } : {};
  const session: Session = { text: chunkedTextOf(style.document(items), 256), analyser: createDocumentAnalyser("yaml", undefined, tuning) };
  const undo: Undo[] = [];
  for (let edit = 0; edit < edits; edit++) {
    randomYamlEdit(session, random, style.indent, undo);
    checkAgainstScratch(session, "yaml", random);
    if (random() < 0.1) {
      // The same text opened afresh and read a few items at a time: requests about places first.
      const fresh: Session = {
        text: session.text,
        analyser: createDocumentAnalyser("yaml", undefined, { listStep: 1 + Math.floor(random() * 300) }),
      };
      placesAgree(fresh.analyser.analyse(fresh.text), wholeText(fresh.text), "yaml", random);
      checkAgainstScratch(fresh, "yaml", random);
    }
  }
}

describe("YAML edited item by item", () => {
  const cases = STYLES.flatMap((style, index) => [1, 2].map((seed) => [style.label, style, seed + 10 * index] as const));
  it.each(cases)("%s keeps the findings of a fresh analysis through 300 edits (case %#)", (_, style, seed) => {
    runEdits(style, seed, 300);
  });

  it.each(WHOLE_READ_STYLES.map((style, index) => [style.label, style, 100 + index] as const))(
    "%s is read whole and still agrees with a fresh analysis through 150 edits",
    (_, style, seed) => {
      runEdits(style, seed, 150);
    },
  );

  it("a wrong electron count typed into one record of many is reported there, and only there", () => {
    // common practice: SF6 has 48 valence electrons (6 from sulfur, 7 from each fluorine).
    const records = Array.from({ length: 200 }, (_, index) => `  - {id: REF-${index}, formula: SF6, valence electrons: 48}`);
    const text = `lab: Kestrel Ridge Analytical\nrecords:\n${records.join("\n")}\n`;
    const analyser = createDocumentAnalyser("yaml");
    let chunked = chunkedTextOf(text, 256);
    expect(analyser.analyse(chunked).findings()).toEqual([]);
    const at = text.indexOf("valence electrons: 48}", text.indexOf("REF-150,")) + "valence electrons: ".length;
    chunked = editChunkedText(chunked, at, at + 2, "46");
    const findings = analyser.analyse(chunked).findings();
    expect(findings.map((finding) => [finding.code, finding.range.start])).toEqual([["table-valence-electrons", at]]);
    expect(canonical(findings)).toEqual(canonical(fromScratch(wholeText(chunked), "yaml")));
  });

  // Edits at the edges of an item, where the re-read items alone are clean YAML but the document may not be.
  it.each([
    ["a record typed above the first one", "  - {id: KR-1", "  - {formula: CH5}\n  - {id: KR-1"],
    ["a line typed between two records at the key's column", "  - {id: KR-2", "extra: 1\n  - {id: KR-2"],
    ["a comment typed between two records", "  - {id: KR-2", "# checked\n  - {id: KR-2"],
    ["a record's dash deleted", "  - {id: KR-2", "    {id: KR-2"],
    ["a record moved one column left", "  - {id: KR-2", " - {id: KR-2"],
    ["a character typed at the start of the line after the list", "reviewed by:", "xreviewed by:"],
    ["the line end before the key after the list deleted", "}\nreviewed by:", "}reviewed by:"],
    ["a document marker typed inside the list", "  - {id: KR-3", "---\n  - {id: KR-3"],
    ["a block scalar opened on the last record", "lone pairs: 1}\nreviewed by:", "lone pairs: 1}\n  - notes: |\nreviewed by:"],
    ["a quote opened in a record", "formula: NH3", 'formula: "NH3'],
    ["every record deleted", "  - {id: KR-1, formula: SF6, valence electrons: 48}\n", ""],
  ] as const)("a YAML edit at an item's edge: %s", (_, find, replace) => {
    const records = [
      "  - {id: KR-1, formula: SF6, valence electrons: 48}",
      "  - {id: KR-2, formula: NF3, valence electrons: 24, lone pairs: 1}",
      "  - {id: KR-3, formula: NH3, molecular geometry: trigonal planar, lone pairs: 1}",
    ];
    const text = `lab: Kestrel Ridge Analytical\nrecords:\n${records.join("\n")}\nreviewed by:\n  formula: NO2\n`;
    const session: Session = { text: chunkedTextOf(text, 64), analyser: createDocumentAnalyser("yaml") };
    session.analyser.analyse(session.text).findings();
    let plain = text;
    // Applied as far as it goes, then again, so the edit meets a list cut after the first.
    for (let round = 0; round < 2; round++) {
      const at = plain.indexOf(find);
      if (at < 0) break;
      session.text = editChunkedText(session.text, at, at + find.length, replace);
      plain = wholeText(session.text);
      checkAgainstScratch(session, "yaml", seededRandom(5 + round));
    }
  });
});
