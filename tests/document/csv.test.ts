/**
 * The CSV/TSV tokenizer against the csv-parse package on random input, and its exact ranges.
 */
import { parse } from "csv-parse/sync";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { readDelimited, sniffDelimiter } from "../../shared/src/document/tables/csv";

/** A random CSV: fields plain or quoted (with "" escapes, commas and line breaks inside). */
function randomCsv(delimiter: string): fc.Arbitrary<string> {
  const plainCharacter = fc.constantFrom("a", "b", "S", "F", "4", " ", "é", "°", "-", "+", "^", "·");
  const quotedCharacter = fc.constantFrom("a", "F", "6", delimiter, '"', "\n", "\r\n", " ", "'");
  const plain = fc.array(plainCharacter, { maxLength: 6 }).map((characters) => characters.join(""));
  const quoted = fc.array(quotedCharacter, { maxLength: 6 }).map((characters) => `"${characters.join("").replace(/"/g, '""')}"`);
  const field = fc.oneof(plain, quoted);
  // csv-parse reads a row of one empty field as an empty line; keep rows non-empty.
  const row = fc.array(field, { minLength: 1, maxLength: 5 }).filter((fields) => fields.join("").length > 0);
  return fc
    .tuple(fc.array(row, { minLength: 1, maxLength: 6 }), fc.constantFrom("\n", "\r\n"), fc.boolean(), fc.boolean())
    .map(
      ([rows, lineEnd, bom, finalLineEnd]) =>
        (bom ? "\ufeff" : "") + rows.map((fields) => fields.join(delimiter)).join(lineEnd) + (finalLineEnd ? lineEnd : ""),
    );
}

function ourValues(text: string, delimiter: string): string[][] {
  return readDelimited(text, delimiter).rows.map((row) => row.cells.map((cell) => cell.text));
}

describe("readDelimited", () => {
  it.each([",", "\t", ";"])("agrees with csv-parse on 2,000 random tables delimited by %j", (delimiter) => {
    fc.assert(
      fc.property(randomCsv(delimiter), (text) => {
        // source: csv-parse npm package
        const reference = parse(text, { bom: true, delimiter, relax_column_count: true, skip_empty_lines: false }) as string[][];
        const ours = ourValues(text, delimiter);
        expect(ours.length).toBe(reference.length);
        expect(ours).toEqual(reference);
      }),
      { numRuns: 2000, seed: 20250611 },
    );
  });

  it("gives each value's exact range: inside the quotes, after a BOM, across CRLF", () => {
    const text = '\ufeffspecies,"name, common","note"\r\nSF4,"sulfur ""tetra"" fluoride","two\r\nlines"\r\nNF3,,x';
    const rows = readDelimited(text, ",").rows;
    const ranges = rows.map((row) => row.cells.map((cell) => text.slice(cell.range.start, cell.range.end)));
    // common practice: RFC 4180 quoting, "" inside a quoted field is one quote
    expect(ranges).toEqual([
      ["species", "name, common", "note"],
      ["SF4", 'sulfur ""tetra"" fluoride', "two\r\nlines"],
      ["NF3", "", "x"],
    ]);
    expect(rows[1].cells[1].text).toBe('sulfur "tetra" fluoride');
  });

  it.each([
    ['a,"b', 1],
    ['a,"b"c,d', 1],
    ["a,b\nc,d", 0],
  ])("reports quote problems in %j (%i)", (text, problems) => {
    expect(readDelimited(text, ",").problems).toHaveLength(problems);
  });

  it.each([
    ["species,formula\nsulfur tetrafluoride,SF4\n", ","],
    ["species\tformula\tlone pairs\nSF4\tSF4\t1\n", "\t"],
    ["species;formula;angle\nwater;H2O;104,5\n", ";"],
    ['"a,b";c;d\n"x,y";z;w\n', ";"],
  ])("sniffs the delimiter of %j", (text, delimiter) => {
    expect(sniffDelimiter(text)).toBe(delimiter);
  });
});
