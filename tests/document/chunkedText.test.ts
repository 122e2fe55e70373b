// The chunked text an editor's edits are applied to: after any sequence of edits it holds the
// same text as plain string edits would, and converts offsets and positions exactly as the
// protocol library's own text document does.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { TextDocument } from "vscode-languageserver-textdocument";
import { chunkedTextOf, createChunkedTextBuilder, editChunkedText, offsetOf, positionOf, sliceOf, wholeText } from "../../shared/src/index";

// Pieces with every kind of line break, surrogate pairs and long lines.
const piece = fc.constantFrom("a", "SF4 ", "\n", "\r\n", "\r", "\u00e9", "\ud83e\uddea", "x".repeat(40), "\n\n", "NF3,26\n");
const textArbitrary = fc.array(piece, { maxLength: 80 }).map((pieces) => pieces.join(""));
const editArbitrary = fc.tuple(
  fc.nat(),
  fc.nat(30),
  fc.array(piece, { maxLength: 6 }).map((pieces) => pieces.join("")),
);

describe("chunked text", () => {
  it("equals plain string edits after random edits, and reads positions as the protocol library does", () => {
    fc.assert(
      fc.property(textArbitrary, fc.array(editArbitrary, { maxLength: 25 }), fc.constantFrom(8, 16, 64), (initial, edits, target) => {
        let plain = initial;
        let chunked = chunkedTextOf(initial, target);
        for (const [at, length, insert] of edits) {
          const start = at % (plain.length + 1);
          const end = Math.min(plain.length, start + length);
          plain = plain.slice(0, start) + insert + plain.slice(end);
          chunked = editChunkedText(chunked, start, end, insert);
          expect(wholeText(chunked)).toBe(plain);
          // Every chunk but the last ends at a line feed, so records and lines never cross one.
          for (const chunk of chunked.chunks.slice(0, -1)) expect(chunk.text.endsWith("\n")).toBe(true);
        }
        // source: vscode-languageserver-textdocument, the protocol library's text document
        const reference = TextDocument.create("file:///kestrel-ridge/notes.md", "markdown", 1, plain);
        expect(chunked.lineCount).toBe(reference.lineCount);
        expect(chunked.length).toBe(plain.length);
        for (let offset = -1; offset <= plain.length + 1; offset++) {
          expect(positionOf(chunked, offset)).toEqual(reference.positionAt(offset));
        }
        for (let line = -1; line <= reference.lineCount; line++) {
          for (const character of [0, 1, 2, 5, 41, 1000]) {
            expect(offsetOf(chunked, { line, character })).toBe(reference.offsetAt({ line, character }));
          }
        }
        const from = Math.floor(plain.length / 3);
        expect(sliceOf(chunked, from, plain.length - 1)).toBe(plain.slice(from, Math.max(from, plain.length - 1)));
      }),
      { numRuns: 300, seed: 1612 },
    );
  });

  it("shares the chunks an edit did not touch with the version before", () => {
    const rows = Array.from({ length: 2000 }, (_, index) => `KR-${index},SF6,48,octahedral`).join("\n");
    const before = chunkedTextOf(rows);
    const middle = Math.floor(rows.length / 2);
    const after = editChunkedText(before, middle, middle + 1, "7");
    const shared = after.chunks.filter((chunk) => before.chunks.includes(chunk)).length;
    expect(before.chunks.length).toBeGreaterThan(3);
    // One chunk (or two, where the edit joins a short one) is new; the others are the same objects.
    expect(shared).toBeGreaterThanOrEqual(before.chunks.length - 2);
  });

  it("cuts a text given in pieces exactly as the same text given whole", () => {
    const piecesArbitrary = fc.array(
      fc.array(piece, { maxLength: 30 }).map((parts) => parts.join("")),
      { maxLength: 12 },
    );
    fc.assert(
      fc.property(piecesArbitrary, fc.constantFrom(1, 4, 16, 64), (pieces, target) => {
        const whole = chunkedTextOf(pieces.join(""), target);
        const builder = createChunkedTextBuilder(target);
        for (const piece of pieces) builder.add(piece);
        const pieced = builder.finish();
        expect(pieced.chunks.map((chunk) => chunk.text)).toEqual(whole.chunks.map((chunk) => chunk.text));
        expect(pieced.chunks.map((chunk) => chunk.lineBreaks)).toEqual(whole.chunks.map((chunk) => chunk.lineBreaks));
        expect([pieced.starts, pieced.firstLines, pieced.length, pieced.lineCount]).toEqual([
          whole.starts,
          whole.firstLines,
          whole.length,
          whole.lineCount,
        ]);
      }),
      { numRuns: 2_000 },
    );
  });
});
