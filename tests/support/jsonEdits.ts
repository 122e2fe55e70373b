// Random edits to a JSON list of records, as typing makes them: records replaced, pasted and
// deleted, keystrokes that break the JSON for a while, and undo that mends it again.
import { parseTree, type ParseError } from "jsonc-parser/lib/esm/main.js";
import { editChunkedText, wholeText } from "../../shared/src/index";
import type { Session } from "./incrementalCheck";

// A reference shelf's records as JSON, one record a line, with records that are right, wrong and
// unreadable, and lines that break the JSON for a while (as typing does) or close it early.
export const JSON_RECORD_LINES = [
  '    {"id": "KR-1", "name": "sulfur hexafluoride", "formula": "SF6", "valence electrons": 48, "molecular geometry": "octahedral"},',
  '    {"id": "KR-2", "formula": "NF3", "valence electrons": 24, "lone pairs": 1},',
  '    {"id": "KR-3", "formula": "NH3", "molecular geometry": "trigonal planar"},',
  '    {"id": "KR-4", "formula": "Sf4", "lone pairs": 1},',
  '    {"id": "KR-5", "formula": "CH5"}, {"id": "KR-6", "formula": "XeF4", "lone pairs": 2},',
  '    {"SF4": {"lone pairs": 2}, "BF3": {"molecular geometry": "trigonal pyramidal"}},',
  '    [{"formula": "ClF3", "valence electrons": 28}], "KR-7", 12, null, // shelf 7\r',
  '    {"id": "KR-8", "formula": "SO2", "valence electrons": 18, /* checked */ "lone pairs": 1},',
  '    {"id": "KR-10", "equation": "SF4 + F2 -> SF6"}, {"reaction": "N2 + H2 -> NH3", "formula": "NH3"},',
];
export const JSON_BREAKING_LINES = [
  '    {"id": "KR-9", "formula": "SF4',
  "    ],",
  '    {"formula": "NF3"}',
  "  ]",
  "/* an open comment",
  '    "formula": "SF6",',
];

export function jsonDocument(lines: readonly string[]): string {
  return [
    "{",
    '  "lab": "Kestrel Ridge Analytical", "formula": "CO2", "valence electrons": 14,',
    '  "records": [',
    ...lines,
    '    {"id": "end of shelf"}',
    "  ],",
    '  "reviewed by": {"formula": "NO2", "name": "nitrogen dioxide"}',
    "}",
    "",
  ].join("\n");
}

export function randomJsonEdit(session: Session, random: () => number, undo: { start: number; length: number; removed: string }[]): void {
  const plain = wholeText(session.text);
  const pick = <T>(items: readonly T[]): T => items[Math.floor(random() * items.length)];
  const lineStarts = [0, ...[...plain.matchAll(/\n/g)].map((match) => match.index + 1)];
  const choice = random();
  let start: number;
  let end: number;
  let insert: string;
  const errors: ParseError[] = [];
  parseTree(plain, errors, { allowTrailingComma: true, disallowComments: false });
  const broken = errors.length > 0;
  if (((broken && choice < 0.85) || choice < 0.1) && undo.length > 0) {
    // Undo the last edit, as an editor does: mostly valid JSON again after a keystroke that broke it.
    const last = undo.pop()!;
    session.text = editChunkedText(session.text, last.start, last.start + last.length, last.removed);
    return;
  }
  if (choice < 0.55) {
    // Replace a line's text with a record line (or, rarely, one that breaks the JSON).
    const line = Math.floor(random() * lineStarts.length);
    start = lineStarts[line];
    const lineFeed = plain.indexOf("\n", start);
    end = lineFeed < 0 ? plain.length : lineFeed;
    insert = random() < 0.9 ? pick(JSON_RECORD_LINES) : pick(JSON_BREAKING_LINES);
  } else if (choice < 0.8) {
    // Insert or delete whole lines; a paste of several records at once.
    start = pick(lineStarts);
    end = random() < 0.4 ? start : Math.min(plain.length, pick(lineStarts.filter((at) => at >= start).slice(0, 4)));
    const count = 1 + Math.floor(random() * 3);
    insert = random() < 0.3 ? "" : Array.from({ length: count }, () => `${pick(JSON_RECORD_LINES)}\n`).join("");
  } else {
    // A keystroke anywhere.
    start = Math.floor(random() * (plain.length + 1));
    end = random() < 0.5 ? start : Math.min(plain.length, start + 1);
    insert = random() < 0.3 ? "" : pick(["4", "F", " ", "\n", "\r\n", '"', ",", "{", "}", "]", "/*", "*/", "8"]);
  }
  undo.push({ start, length: insert.length, removed: plain.slice(start, end) });
  session.text = editChunkedText(session.text, start, end, insert);
}
