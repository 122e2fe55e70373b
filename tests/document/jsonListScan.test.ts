// The quick pass that finds a JSON text's list of records finds the list the ordinary reading
// chooses (jsonc-parser's syntax tree is the reference for where each element lies), and refuses
// what it can see is not clean JSON at the list's own level.
import { parseTree, type Node } from "jsonc-parser/lib/esm/main.js";
import { describe, expect, it } from "vitest";
import { chunkedTextOf } from "../../shared/src/index";
import { scanJsonList } from "../../shared/src/document/tables/jsonListScan";
import { equationKeyTest } from "../../shared/src/document/tables/headers";

/** The elements' bounds of the list at `path` in the parser's own tree. */
function treeBounds(text: string, path: readonly (string | number)[]): { starts: number[]; ends: number[] } {
  let node: Node | undefined = parseTree(text, [], { allowTrailingComma: true, disallowComments: false });
  for (const step of path) {
    node =
      typeof step === "number"
        ? node?.children?.[step]
        : node?.children?.find((property) => property.children?.[0].value === step)?.children?.[1];
  }
  const children = node?.children ?? [];
  return { starts: children.map((child) => child.offset), ends: children.map((child) => child.offset + child.length) };
}

const FOUND: readonly { label: string; text: string; path: readonly (string | number)[] }[] = [
  { label: "a root list", text: '[{"formula": "SF6"}, {"formula": "NF3"}]', path: [] },
  { label: "scalars and lists as elements", text: '[1, "SF6", true, null, [2, 3], -4.5e3, {"a": [1]}]', path: [] },
  { label: "a trailing comma", text: '[{"formula": "SF6"},\n  {"formula": "NF3"},\n]', path: [] },
  { label: "comments between elements", text: '[ // shelf\n {"formula": "SF6"} /* one */ , {"formula": "NF3"} // two\n]', path: [] },
  { label: "brackets, quotes and escapes inside strings", text: '[{"note": "a ] b [ c \\" d , e"}, "\\\\", {"x": "}{"}]', path: [] },
  {
    label: "records under a key",
    text: '{"lab": "Kestrel Ridge", "records": [{"formula": "SF6"}, {"formula": "NF3"}], "done": true}',
    path: ["records"],
  },
  { label: "the longest list under the root object", text: '{"tags": ["a"], "records": [1, 2, 3], "more": [4, 5]}', path: ["records"] },
  { label: "the first of equally long lists", text: '{"a": [1, 2], "b": [3, 4]}', path: ["a"] },
  {
    label: "a list under an equation key is passed over",
    text: '{"equations": ["H2 + Cl2 -> 2 HCl", "a", "b"], "records": [{"formula": "SF6"}]}',
    path: ["records"],
  },
  { label: "a key written with escapes", text: '{"rec\\u006frds": [1, 2]}', path: ["rec\u006frds"] },
  { label: "a nested list is not the record list", text: '{"records": [{"inner": [1, 2, 3, 4]}]}', path: ["records"] },
  { label: "white space and a comment after the root", text: "[1, 2]\n// end\n", path: [] },
];

const REFUSED: readonly { label: string; text: string }[] = [
  { label: "no list at all", text: '{"formula": "SF6"}' },
  { label: "an empty list", text: '{"records": []}' },
  { label: "a missing comma between records", text: '[{"formula": "SF6"} {"formula": "NF3"}]' },
  { label: "a missing comma between numbers", text: "[1 2]" },
  { label: "a doubled comma", text: "[1,, 2]" },
  { label: "a leading comma", text: "[, 1]" },
  { label: "an unclosed list", text: "[1, 2" },
  { label: "an unclosed string", text: '["SF6, 2]' },
  { label: "mismatched brackets", text: "[1, {2]}" },
  { label: "a second root value", text: "[1] [2]" },
  { label: "a stray slash", text: "[1, / 2]" },
  { label: "a scalar root", text: '"SF6"' },
];

describe("the quick pass over a JSON text's list of records", () => {
  it.each(FOUND)("finds $label where the parser puts its elements", ({ text, path }) => {
    const expected = treeBounds(text, path);
    for (const chunkTarget of [1, 3, 16, 1024]) {
      const scanned = scanJsonList(chunkedTextOf(text, chunkTarget), equationKeyTest());
      expect(scanned).toBeDefined();
      expect([...scanned!.starts]).toEqual(expected.starts);
      expect([...scanned!.ends]).toEqual(expected.ends);
      expect(text[scanned!.open]).toBe("[");
      expect(text[scanned!.close]).toBe("]");
    }
  });

  it.each(REFUSED)("refuses $label", ({ text }) => {
    for (const chunkTarget of [1, 1024]) expect(scanJsonList(chunkedTextOf(text, chunkTarget), equationKeyTest())).toBeUndefined();
  });
});
