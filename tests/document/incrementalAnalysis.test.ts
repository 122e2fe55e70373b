// An edited document analysed segment by segment, reusing what each edit left alone, gives the
// findings and the species of a from-scratch analysis of the same text (the core's own
// analyzeDocument + checkDocument are the reference), after thousands of random edits to tables,
// markdown notebooks and plain-text logs.
import { describe, expect, it } from "vitest";
import {
  analyzeDocument,
  chunkedTextOf,
  createDocumentAnalyser,
  editChunkedText,
  speciesAtOffset,
  wholeText,
} from "../../shared/src/index";
import { canonical, checkAgainstScratch, fromScratch, type Session } from "../support/incrementalCheck";
import { seededRandom } from "../support/seededRandom";
import { JSON_RECORD_LINES, jsonDocument, randomJsonEdit } from "../support/jsonEdits";

// common practice: valence electron counts, lone pairs and shapes of these cylinder gases, right and wrong.
const TABLE_ROWS = [
  "KR-1,sulfur hexafluoride,SF6,48,0,octahedral",
  "KR-2,nitrogen trifluoride,NF3,26,1,trigonal pyramidal",
  "KR-3,ammonia,NH3,8,1,trigonal planar",
  "KR-4,xenon tetrafluoride,XeF4,36,2,square planar",
  "KR-5,nitrogen trifluoride,NF3,24,1,trigonal pyramidal",
  "KR-6,methane,CH5,10,0,tetrahedral",
  'KR-7,"boron, trifluoride",BF3,24,0,trigonal planar',
  'KR-8,"a note over\ntwo lines",SF4,34,1,seesaw',
  "KR-9,,Sf4,34,1,seesaw",
  "",
  'KR-10,"never closed,SF4,34,1,seesaw',
  "KR-11,water,H2O,8,2,bent\r",
];
const TABLE_HEADERS = [
  "id,species,formula,valence electrons,lone pairs,molecular geometry",
  "id,name,formula,electrons,lone pairs on central atom,shape",
  "id,species,formula,notes,lone pairs,molecular geometry",
];

// Markdown written the way the lab's notebooks are: prose, headings, chemistry fences, tables, comments.
const MARKDOWN_LINES = [
  "# Run 15: NF3 against SF6",
  "Dana weighed SF4 and XeF4 into the glovebox; NH4+ stayed in the fridge.",
  "The Sf4 cylinder label is wrong, and CLF3 was not opened.",
  "NO2 is a radical; so is ClO2.",
  "",
  "```chem",
  "SF4 + F2 -> SF6",
  "```",
  "```python",
  "print('CO2')",
  "~~~",
  "| Formula | Molecular geometry |",
  "|---|---|",
  "| SF4 | seesaw |",
  "| NF3 | trigonal planar |",
  "<!-- reviewer: check XeF2 -->",
  "<!--",
  "-->",
  "---",
  "title: CO2 storage",
  "...",
  "$\\ce{H2SO4}$ and `smiles:C1CC1` in one line.",
  "<!-- DO NOT USE -->NO is kept in bay 3.",
];

// What writers also do to notebooks: CRLF lines, headings, other fences, mhchem spans, table rows,
// pasted blocks of several lines, a stray byte order mark, front matter.
const MORE_MARKDOWN_LINES = [
  ...MARKDOWN_LINES,
  "## Heading with SF4\r",
  "NH3 and BF3 in one line\r",
  "````",
  "~~~chem",
  "~~~",
  "```mhchem",
  "$\\ce{XeF4 + F2 -> XeF6}$ then $\\ce{SO4^2-}$",
  "| XeF4 | square planar |\r",
  "| CH5 | tetrahedral |",
  "| Formula | Shape |\n|---|---|\n| SF4 | seesaw |",
  "Pasted:\n\n```chem\nNF3 + F2\n```\n\nClF3 and CLF3",
  "\ufeff",
  "---\ntitle: SF4\n---",
  "  ```",
  "    indented SF4 code",
  "Text with `NO2` and H<sub>2</sub>O",
];

// Plain text as people keep it: a lab log with timestamps, inventory notes, half-reactions and
// equations on lines of their own, numbered procedures, runs numbered as ids, pasted Unicode
// subscripts, CRLF lines, a very long line, comments and reStructuredText blocks, and the
// markup a writer half types (a backtick, a \ce{ or a comment left open for a while).
const PLAIN_TEXT_LINES = [
  "2026-01-05  gas store, shift Priya",
  "08:12  Cylinder KR-0412: SF6 at 2.1 bar, NF3 line purged with N2.",
  "09:40  Label on KR-0415 reads CH5, not SF4: sent back.",
  "Shelf 3: XeF4 (2 ampoules), Sf4 small cylinder, CLF3 - do not open",
  "MnO4- + 8H+ + 5e- -> Mn2+ + 4H2O",
  "Fe3+ + e- -> Fe2+",
  "2H2 + O2 → 2H2O",
  "SF4 + F2 -> SF5",
  "1. Close the NF3 and SF6 valves.",
  "2. Flush with dry nitrogen; weigh sodium, potassium and zinc granules.",
  "Runs N1, N2 and P1, P2 (pilot) below.",
  "The N2 extraction ran late; C2 was repeated.",
  "H₂O and SO₄²⁻ pasted from a handbook, NH₄⁺ too",
  "XeF2 is linear, NO2 is a radical\r",
  "\r",
  "",
  "   ",
  "<!-- reviewer: CH5 is a typo -->",
  "<!-- left open: BF3",
  "closed here --> ClF3 stays",
  "`SF4 in a code span` and \\ce{XeF4 + F2 -> XeF6} and $H_2O$",
  "a \\ce{SO4^2- + opened and $ opened",
  "Run it like this::",
  "    SF4 + CH5 typed as code",
  ".. math::",
  "   H_2SO_4 + CH_5",
  ".. note::",
  "   NH4+ in a note",
  "\\begin{verbatim}",
  "CH5 typed in a verbatim block",
  "\\end{verbatim}",
  "CuSO4 · 5H2O and sulfur tetrafluoride",
  `${"NF3, SF6 and CH5; ".repeat(120)}end of a long line`,
];

/** Edits as a writer makes them to a JSON file: mostly whole records, sometimes a keystroke, often undone. */
function randomEdit(session: Session, random: () => number, pieces: readonly string[]): void {
  const plain = wholeText(session.text);
  const lineStarts = [0, ...[...plain.matchAll(/\n/g)].map((match) => match.index + 1)];
  const pick = <T>(items: readonly T[]): T => items[Math.floor(random() * items.length)];
  const choice = random();
  let start: number;
  let end: number;
  let insert: string;
  if (choice < 0.5) {
    // Replace a whole line, as typing over a row does.
    const line = Math.floor(random() * lineStarts.length);
    start = lineStarts[line];
    const lineFeed = plain.indexOf("\n", start);
    end = lineFeed < 0 ? plain.length : lineFeed;
    insert = pick(pieces);
  } else if (choice < 0.75) {
    // Insert or delete whole lines.
    start = pick(lineStarts);
    end = random() < 0.5 ? start : Math.min(plain.length, pick(lineStarts.filter((at) => at >= start)));
    insert = random() < 0.5 ? "" : `${pick(pieces)}\n`;
  } else {
    // A keystroke anywhere: one character typed or deleted.
    start = Math.floor(random() * (plain.length + 1));
    end = random() < 0.5 ? start : Math.min(plain.length, start + 1);
    insert = random() < 0.5 ? "" : pick(["4", "F", " ", "\n", '"', "|", "`", ",", "<!--", "-->"]);
  }
  session.text = editChunkedText(session.text, start, end, insert);
}

/**
 * Edits only a table gets: a paste of several rows (with CRLF line ends as often as not), or one
 * cell retyped between its delimiters; otherwise one of `randomEdit`'s.
 */
function randomTableEdit(session: Session, random: () => number, delimiter: string): void {
  const choice = random();
  if (choice >= 0.3) {
    const pieces = random() < 0.03 ? TABLE_HEADERS : TABLE_ROWS;
    randomEdit(session, random, delimiter === "," ? pieces : pieces.map((piece) => piece.replaceAll(",", delimiter)));
    return;
  }
  const plain = wholeText(session.text);
  const pick = <T>(items: readonly T[]): T => items[Math.floor(random() * items.length)];
  const lineStarts = [0, ...[...plain.matchAll(/\n/g)].map((match) => match.index + 1)];
  if (choice < 0.15) {
    const lineEnd = random() < 0.5 ? "\r\n" : "\n";
    const rows = Array.from({ length: 2 + Math.floor(random() * 6) }, () => pick(TABLE_ROWS).replaceAll(",", delimiter));
    const at = pick(lineStarts);
    session.text = editChunkedText(session.text, at, at, rows.map((row) => `${row}${lineEnd}`).join(""));
    return;
  }
  // A cell retyped: the text between two delimiters on one line replaced by a value from another row.
  const cells = [...plain.matchAll(new RegExp(`[^${delimiter}\n]*`, "g"))].filter((match) => match.index !== undefined);
  const cell = pick(cells);
  const values = TABLE_ROWS.flatMap((row) => row.split(","));
  session.text = editChunkedText(session.text, cell.index, cell.index + cell[0].length, pick(values));
}

describe("incremental analysis after random edits", () => {
  it.each([
    [1, "csv"],
    [2, "csv"],
    [3, "csv"],
    [4, "csv"],
    [5, "tsv"],
    [6, "tsv"],
  ] as const)("a table keeps the findings of a fresh analysis through 600 edits (seed %i, %s)", (seed, kind) => {
    const random = seededRandom(seed);
    const delimiter = kind === "tsv" ? "\t" : ",";
    const rows = Array.from({ length: 120 }, (_, index) => TABLE_ROWS[(index * 7 + seed) % 6].replaceAll(",", delimiter));
    // Small chunks, so that a table of a few hundred rows has many segments.
    const session: Session = {
      text: chunkedTextOf(`${[TABLE_HEADERS[0].replaceAll(",", delimiter), ...rows].join("\n")}\n`, 256),
      analyser: createDocumentAnalyser(kind),
    };
    for (let edit = 0; edit < 600; edit++) {
      randomTableEdit(session, random, delimiter);
      checkAgainstScratch(session, kind, random);
    }
  });

  it.each([1, 2, 3, 4])("a markdown notebook keeps the findings of a fresh analysis through 600 edits (seed %i)", (seed) => {
    const random = seededRandom(seed);
    const lines = Array.from({ length: 60 }, (_, index) => MARKDOWN_LINES[(index * 5 + seed) % MARKDOWN_LINES.length]);
    const kind = "markdown";
    const session: Session = { text: chunkedTextOf(`${lines.join("\n")}\n`, 256), analyser: createDocumentAnalyser(kind) };
    for (let edit = 0; edit < 600; edit++) {
      randomEdit(session, random, MARKDOWN_LINES);
      checkAgainstScratch(session, kind, random);
    }
  });

  it.each([
    [5, undefined],
    [6, undefined],
    [7, undefined],
    [8, undefined],
    [9, 40],
    [10, 40],
    [11, 200],
    [12, 200],
  ])("a markdown notebook with pasted blocks, CRLF and fences agrees through 600 edits (seed %i, split %s at a time)", (seed, stretch) => {
    const random = seededRandom(seed);
    const lines = Array.from({ length: 80 }, (_, index) => MORE_MARKDOWN_LINES[(index * 7 + seed) % MORE_MARKDOWN_LINES.length]);
    const kind = "markdown";
    const session: Session = {
      text: chunkedTextOf(`${lines.join("\n")}\n`, 256),
      analyser: createDocumentAnalyser(kind, undefined, { markdownStretch: stretch }),
    };
    for (let edit = 0; edit < 600; edit++) {
      randomEdit(session, random, MORE_MARKDOWN_LINES);
      const partly = random();
      if (partly < 0.2) {
        // A version only hovered over, its blocks split no further than the hover needed.
        const analysis = session.analyser.analyse(session.text);
        analysis.speciesAt(Math.floor(random() * session.text.length));
        continue;
      }
      if (partly < 0.35) {
        // A version whose diagnostics were given up after a few parts, as a newer edit came.
        let parts = Math.floor(random() * 12);
        for (const _ of session.analyser.analyse(session.text).findingParts()) if (parts-- <= 0) break;
        continue;
      }
      checkAgainstScratch(session, kind, random);
    }
  });

  it.each([
    [13, 40],
    [14, 120],
    [15, 400],
  ])(
    "a notebook whose split stopped part way keeps agreeing through edits before it is finished (seed %i, split %i at a time)",
    (seed, stretch) => {
      const random = seededRandom(seed);
      const kind = "markdown";
      for (let round = 0; round < 40; round++) {
        // As a server opens a notebook and stops reading once it has a screenful of diagnostics.
        const lines = Array.from({ length: 80 }, () => MORE_MARKDOWN_LINES[Math.floor(random() * MORE_MARKDOWN_LINES.length)]);
        const session: Session = {
          text: chunkedTextOf(`${lines.join("\n")}\n`, 256),
          analyser: createDocumentAnalyser(kind, undefined, { markdownStretch: stretch }),
        };
        for (let edit = 0, edits = 1 + Math.floor(random() * 8); edit <= edits; edit++) {
          if (edit > 0) randomEdit(session, random, MORE_MARKDOWN_LINES);
          const analysis = session.analyser.analyse(session.text);
          if (random() < 0.3) analysis.speciesAt(Math.floor(random() * session.text.length));
          let parts = Math.floor(random() * 30);
          for (const _ of analysis.findingParts()) if (parts-- <= 0) break;
        }
        randomEdit(session, random, MORE_MARKDOWN_LINES);
        checkAgainstScratch(session, kind, random);
      }
    },
  );

  it.each([1, 2, 3, 4])("a JSON list of records keeps the findings of a fresh analysis through 400 edits (seed %i)", (seed) => {
    const random = seededRandom(seed);
    const lines = Array.from({ length: 40 }, (_, index) => JSON_RECORD_LINES[(index * 3 + seed) % JSON_RECORD_LINES.length]);
    const kind = "json";
    const session: Session = { text: chunkedTextOf(jsonDocument(lines), 256), analyser: createDocumentAnalyser(kind) };
    const undo: { start: number; length: number; removed: string }[] = [];
    for (let edit = 0; edit < 400; edit++) {
      randomJsonEdit(session, random, undo);
      checkAgainstScratch(session, kind, random);
    }
  });

  it.each([1, 2, 3, 4, 5, 6])("a plain-text lab log keeps the findings of a fresh analysis through 600 edits (seed %i)", (seed) => {
    const random = seededRandom(seed);
    const lines = Array.from({ length: 90 }, (_, index) =>
      index % 9 === 8 ? "" : PLAIN_TEXT_LINES[(index * 7 + seed) % PLAIN_TEXT_LINES.length],
    );
    const kind = "plaintext";
    const session: Session = { text: chunkedTextOf(`${lines.join("\n")}\n`, 256), analyser: createDocumentAnalyser(kind) };
    for (let edit = 0; edit < 600; edit++) {
      if (random() < 0.15) {
        // A paste of several lines, with blank lines between, as often with CRLF as not.
        const lineEnd = random() < 0.5 ? "\r\n" : "\n";
        const pasted = Array.from({ length: 2 + Math.floor(random() * 5) }, () =>
          random() < 0.3 ? "" : PLAIN_TEXT_LINES[Math.floor(random() * PLAIN_TEXT_LINES.length)],
        );
        const plain = wholeText(session.text);
        const lineStarts = [0, ...[...plain.matchAll(/\n/g)].map((match) => match.index + 1)];
        const at = lineStarts[Math.floor(random() * lineStarts.length)];
        session.text = editChunkedText(session.text, at, at, pasted.map((line) => `${line}${lineEnd}`).join(""));
      } else {
        randomEdit(session, random, PLAIN_TEXT_LINES);
      }
      if (random() < 0.2) {
        // A version only hovered over, read no further than the hover needed.
        session.analyser.analyse(session.text).speciesAt(Math.floor(random() * session.text.length));
        continue;
      }
      checkAgainstScratch(session, kind, random);
    }
  });

  it.each([
    ["a comment opened in the first paragraph", "<!-- draft", "<!-- draft -->"],
    ["a comment closed in the middle", "closed here -->", "still open"],
    ["a run numbered 1 typed far above", "Runs N1, N2 and P1, P2 (pilot) below.", "Runs N3 and P3 below."],
  ])("a plain-text edit that changes what later paragraphs carry: %s", (_, before, after) => {
    // common practice: a log whose paragraphs each mention a species, some of them ids.
    const paragraphs = Array.from({ length: 40 }, (_, index) => `${index}: the N2 purge and SF6 then CH5 <!-- x --> BF3`);
    const text = `${before}\n\n${paragraphs.join("\n\n")}\n\nclosed here -->\n\nSF4 and NF3\n`;
    const session: Session = { text: chunkedTextOf(text, 256), analyser: createDocumentAnalyser("plaintext") };
    checkAgainstScratch(session, "plaintext", seededRandom(1));
    for (const [find, replace] of [
      [before, after],
      [after, before],
    ]) {
      const at = wholeText(session.text).indexOf(find);
      session.text = editChunkedText(session.text, at, at + find.length, replace);
      checkAgainstScratch(session, "plaintext", seededRandom(2));
    }
  });

  it("answers a hover far into a long plain-text log before the whole of it is read", () => {
    // common practice: one log entry repeated until the file is well past a megabyte.
    const entry = "08:12  Cylinder KR-0412: SF6 at 2.1 bar, XeF4 weighed; NH4+ stayed in the fridge.\n\n";
    const text = entry.repeat(20_000);
    const analysis = createDocumentAnalyser("plaintext").analyse(chunkedTextOf(text));
    const offset = text.lastIndexOf("XeF4") + 1;
    const expected = speciesAtOffset(analyzeDocument(text, "plaintext"), offset);
    expect(expected?.text).toBe("XeF4");
    expect(analysis.speciesAt(offset)?.range).toEqual(expected?.range);
    expect(canonical(analysis.findings())).toEqual(canonical(fromScratch(text, "plaintext")));
  });

  it("answers a hover far into a long notebook before the whole of it is split", () => {
    // common practice: one paragraph repeated until the notebook is well past a megabyte.
    const paragraph = "Dana weighed SF4 and XeF4 into the glovebox; NH4+ stayed in the fridge.\n\n";
    const text = paragraph.repeat(20_000);
    const analysis = createDocumentAnalyser("markdown").analyse(chunkedTextOf(text));
    const offset = text.lastIndexOf("XeF4") + 1;
    const expected = speciesAtOffset(analyzeDocument(text, "markdown"), offset);
    expect(expected?.text).toBe("XeF4");
    expect(analysis.speciesAt(offset)?.range).toEqual(expected?.range);
    // The whole analysis still agrees once it is done.
    expect(canonical(analysis.findings())).toEqual(canonical(fromScratch(text, "markdown")));
  });

  it("a JSON list at the root, edited record by record, agrees with a fresh analysis", () => {
    const random = seededRandom(11);
    const lines = Array.from({ length: 60 }, (_, index) => JSON_RECORD_LINES[index % 4].replace(/,$/, index === 59 ? "" : ","));
    const kind = "json";
    const session: Session = { text: chunkedTextOf(`[\n${lines.join("\n")}\n]\n`, 256), analyser: createDocumentAnalyser(kind) };
    const undo: { start: number; length: number; removed: string }[] = [];
    for (let edit = 0; edit < 400; edit++) {
      randomJsonEdit(session, random, undo);
      checkAgainstScratch(session, kind, random);
    }
  });

  // Edits at the edges of a record, where a re-read record alone is clean JSON but the document is not.
  it.each([
    ["a comma typed after a record's closing brace", [['"lone pairs": 1}', '"lone pairs": 1},']]],
    ["a comma typed before a record", [['    {"id": "KR-2"', '    ,{"id": "KR-2"']]],
    ["the comma between two records deleted", [['"lone pairs": 1},', '"lone pairs": 1}']]],
    ["a bracket typed after a record", [['"lone pairs": 1}', '"lone pairs": 1}]']]],
    ["a record's opening brace deleted", [['    {"id": "KR-3"', '    "id": "KR-3"']]],
    ["a space typed before a record", [['    {"id": "KR-3"', '     {"id": "KR-3"']]],
    ["a second record pasted after the first", [['"lone pairs": 1},', '"lone pairs": 1}, {"formula": "CH5"},']]],
    [
      "a comma typed between a record and its comment",
      [
        ['"lone pairs": 1},', '"lone pairs": 1} /* shelf 2 */,'],
        ['"lone pairs": 1} /*', '"lone pairs": 1}, /*'],
      ],
    ],
  ] as const)("a JSON edit at a record's edge: %s", (_, edits) => {
    const lines = ['    {"id": "KR-1", "formula": "SF6", "valence electrons": 48},', ...JSON_RECORD_LINES.slice(1, 3)];
    const session: Session = { text: chunkedTextOf(jsonDocument(lines), 256), analyser: createDocumentAnalyser("json") };
    session.analyser.analyse(session.text).findings();
    for (const [find, replace] of edits) {
      const before = wholeText(session.text);
      const at = before.indexOf(find);
      session.text = editChunkedText(session.text, at, at + find.length, replace);
      checkAgainstScratch(session, "json", seededRandom(3));
    }
  });

  it.each(["plaintext", "json", "yaml"] as const)("%s typed from a line of prose agrees with a fresh analysis", (kind) => {
    const random = seededRandom(7);
    const session: Session = { text: chunkedTextOf("SF4 and NF3\n"), analyser: createDocumentAnalyser(kind) };
    for (let edit = 0; edit < 50; edit++) {
      randomEdit(session, random, ['{"formula": "SF4", "valence electrons": 30}', "- formula: NF3", "XeF4 is square planar", "Sf4"]);
      checkAgainstScratch(session, kind, random);
    }
  });
});
