// Random CSV/TSV tables in the shape of a cylinder store's export, with the awkward parts real
// files have: quotes, stray line ends, short and long rows, blank lines, a byte-order mark,
// repeated rows, and cells that are not ASCII.
import fc from "fast-check";

// common practice: what a cylinder store's export holds under each header, right and wrong
const COLUMNS: Readonly<Record<string, readonly string[]>> = {
  id: ["CYL-1", "CYL-22", "", "KR-0412", "CYL-Ω7"],
  formula: ["SF4", "NF3", "CH5", "XeF4", "BF3", "Sf4", "", " NH3 ", "CO2", "NO2", "Fe(CO)5", "NaCl", "SF₄", "ClF₃"],
  species: ["sulfur tetrafluoride", "nitrogen trifluoride", "ammonia", "unobtainium", ""],
  "valence electrons": ["34", "26", "8", "24", "32", "x", ""],
  "lone pairs on central atom": ["1", "0", "2", "3", ""],
  "molecular geometry": ["seesaw", "trigonal pyramidal", "trigonal planar", "bent", "Tetrahedral", "square planar", ""],
  polarity: ["polar", "nonpolar", "Polar", ""],
  "supplier lot": ["KR-0001", "KR-7731", "", "lot 9", "lot № 12 – bay 3"],
};
// Cells the quick cut must leave to the ordinary reading: quotes, stray line ends.
const AWKWARD = ['"SF4"', '"NF3, again"', '"two\nlines"', '"open', 'x"y', '"a""b"', "\r", '""'];

export const tableArbitrary = fc
  .record({
    headers: fc.shuffledSubarray(Object.keys(COLUMNS), { minLength: 1 }),
    delimiter: fc.constantFrom(",", ";", "\t"),
    lineEnd: fc.constantFrom("\n", "\r\n", "\r"),
    byteOrderMark: fc.boolean(),
    blankLinesFirst: fc.nat(2),
    rowSeeds: fc.array(fc.tuple(fc.nat(), fc.nat(20), fc.integer({ min: -2, max: 2 })), { maxLength: 60 }),
    repeats: fc.nat(4),
    trailingLineEnd: fc.boolean(),
  })
  .map(({ headers, delimiter, lineEnd, byteOrderMark, blankLinesFirst, rowSeeds, repeats, trailingLineEnd }) => {
    const rows = rowSeeds.map(([seed, awkward, lengthChange]) => {
      const cells = headers.map((header, column) => {
        const choices = COLUMNS[header];
        return choices[(seed >> column) % choices.length];
      });
      if (awkward === 0) cells[seed % cells.length] = AWKWARD[seed % AWKWARD.length];
      // Rows shorter or longer than the header.
      if (lengthChange < 0) cells.length = Math.max(cells.length + lengthChange, 0);
      for (let extra = 0; extra < lengthChange; extra++) cells.push("extra");
      return cells.join(delimiter);
    });
    // The same rows again: the memo must give what the first reading gave, at the new place.
    const repeated = Array.from({ length: repeats }, () => rows).flat();
    const body = [headers.join(delimiter), ...rows, ...repeated].join(lineEnd);
    const lead = `${byteOrderMark ? "\ufeff" : ""}${lineEnd.repeat(blankLinesFirst)}`;
    const text = `${lead}${body}${trailingLineEnd ? lineEnd : ""}`;
    // Where the line after the header starts (the header is the first line with a visible cell).
    const headerEnd = lead.length + headers.join(delimiter).length + lineEnd.length;
    return { text, delimiter, lineEnd, headerEnd, kind: delimiter === "\t" ? ("tsv" as const) : ("csv" as const) };
  });
