// The quick pass that finds a YAML text's block list of records finds its items where the `yaml`
// package's parser puts them (the reference: the line of each item's dash), and leaves to a whole
// reading what it cannot cut safely.
import { isMap, isSeq, parseDocument, type Node } from "yaml";
import { describe, expect, it } from "vitest";
import { chunkedTextOf } from "../../shared/src/index";
import { scanYamlList } from "../../shared/src/document/tables/yamlListScan";

/** The line start of each item of the list at `key` (or the root list), as the parser reads it. */
function parsedItemLines(text: string, key: string | undefined): number[] {
  const root = parseDocument(text).contents as Node | null;
  const list = key === undefined ? root : isMap(root) ? (root.get(key, true) as Node | undefined) : undefined;
  if (!isSeq(list)) throw new Error("no list");
  return list.items.map((item) => {
    const at = (item as Node).range![0];
    // The dash is on the item's line or the nearest line above it that opens with one.
    let line = text.lastIndexOf("\n", at - 1) + 1;
    while (!/^\s*-(\s|$)/.test(text.slice(line))) line = text.lastIndexOf("\n", line - 2) + 1;
    return line;
  });
}

const usable = (key: string): boolean => key !== "equations";

const FOUND: readonly { label: string; text: string; key?: string; indent: number }[] = [
  { label: "a list at the root", text: "# shelf\n- formula: SF6\n- formula: NF3\n# end\n", indent: 0 },
  { label: "an indented list at the root", text: "  - a\n  - b\n", indent: 2 },
  {
    label: "records under a key, keys around",
    text: "lab: Kestrel\nrecords:\n  - formula: SF6\n    lone pairs: 0\n  - {formula: NF3}\nnote: end\n",
    key: "records",
    indent: 2,
  },
  {
    label: "a list in the key's own column",
    text: "shelf: 7\nrecords:\n- formula: SF6\n- formula: NF3\ncount: 2\n",
    key: "records",
    indent: 0,
  },
  {
    label: "a block scalar whose lines look like items",
    text: "records:\n  - notes: |\n      - formula: XeF4\n    formula: SF6\n  - formula: NF3\n",
    key: "records",
    indent: 2,
  },
  { label: "a dash alone on its line", text: "records:\n  -\n    formula: NO2\n  - formula: NF3\n", key: "records", indent: 2 },
  { label: "comments and blank lines between items", text: "records:\n  - a\n\n# shelf 2\n  - b\n", key: "records", indent: 2 },
  { label: "CRLF line ends", text: "records:\r\n  - a\r\n  - b\r\nnote: end\r\n", key: "records", indent: 2 },
  { label: "a quoted key with a comment", text: '"records":   # the shelf\n  - a\n  - b\n', key: "records", indent: 2 },
  {
    label: "the longest of two lists",
    text: "tags:\n  - x\nrecords:\n  - formula: SF6\n    lone pairs: 0\n  - formula: NF3\n",
    key: "records",
    indent: 2,
  },
  {
    label: "a longer list beside an equation list",
    text: "equations:\n  - N2 + H2 -> NH3\n  - H2 + O2 -> H2O\n  - SF4 + F2 -> SF6\nrecords:\n  - a\n",
    key: "records",
    indent: 2,
  },
];

const REFUSED: readonly { label: string; text: string }[] = [
  { label: "no list", text: "formula: SF6\nlone pairs: 0\n" },
  { label: "a directive", text: "%YAML 1.2\n---\n- a\n" },
  { label: "several documents", text: "- a\n---\n- b\n" },
  { label: "a tab in the indentation", text: "records:\n\t- a\n" },
  { label: "text after a list at the root", text: "- a\n- b\nnote: end\n" },
  { label: "a key with a value on its line", text: "records: &shelf\n  - a\n" },
  { label: "only a list under an equation key", text: "equations:\n  - N2 + H2 -> NH3\n" },
  { label: "a list that ends in a column of its own", text: "records:\n    - a\n  - b\n" },
];

describe("the quick pass over a YAML text's block list", () => {
  it.each(FOUND)("finds $label where the parser puts its items", ({ text, key, indent }) => {
    const expected = parsedItemLines(text, key);
    for (const chunkTarget of [1, 8, 1024]) {
      const scanned = scanYamlList(chunkedTextOf(text, chunkTarget), usable);
      expect(scanned).toBeDefined();
      expect([...scanned!.starts]).toEqual(expected);
      expect(scanned!.indent).toBe(indent);
    }
  });

  it.each(REFUSED)("leaves $label to a whole reading", ({ text }) => {
    expect(scanYamlList(chunkedTextOf(text), usable)).toBeUndefined();
  });
});
