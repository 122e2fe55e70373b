/**
 * The large-body reader gives what `JSON.parse` of the whole UTF-8 body gives, errors included,
 * however the body is chunked and wherever slabs are cut: randomised bodies with escapes,
 * surrogate pairs, non-ASCII and invalid UTF-8 inside long strings, long keys, and broken JSON.
 */
import { describe, expect, it } from "vitest";
import { chunkedTextOf } from "../../shared/src/index";
import { createLargeBodyReader, safeCut, type LargeBodySizes } from "../../server/src/lsp/largeBodyReader";
import { takeChunked } from "../../server/src/lsp/longStringChunks";

/** A small deterministic generator, so a failure can be replayed. */
function randomSource(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state * 1664525 + 1013904223) >>> 0;
    return state / 2 ** 32;
  };
}

// common practice: the pieces of text an editor sends, including what JSON must escape
const PIECES = ["SF6 ", "\n", "\r\n", "\t", '"', "\\", "é", "€", "🧪", "\u0001", "\u2028", "\ud83d", "/", "Kestrel Ridge ", "\\ce{", "}"];

function randomText(random: () => number, pieces: number): string {
  let text = "";
  for (let index = 0; index < pieces; index++) text += PIECES[Math.floor(random() * PIECES.length)];
  return text;
}

/** JSON text of `value`, with some characters written as \uXXXX escapes as other writers do. */
function writeJson(value: unknown, random: () => number): string {
  return JSON.stringify(value).replace(/[a-zé]/g, (letter) =>
    random() < 0.05 ? `\\u${letter.charCodeAt(0).toString(16).padStart(4, "0")}` : letter,
  );
}

function randomBody(random: () => number): Buffer {
  const long = (): string => randomText(random, 1 + Math.floor(random() * 60));
  const value = {
    jsonrpc: "2.0",
    method: "textDocument/didOpen",
    params: {
      textDocument: { uri: "file:///kestrel-ridge/notebook.md", version: 3, text: long() },
      extra: [long(), 12, null, true, { [long()]: long(), short: "x" }],
    },
  };
  const text = writeJson(value, random);
  const bytes = Buffer.from(text, "utf8");
  if (random() < 0.2) {
    // Invalid UTF-8 inside the document text: a lone continuation byte, a cut-off lead byte.
    const at = text.indexOf('"text":"') + 8;
    const byteAt = Buffer.byteLength(text.slice(0, at), "utf8");
    const invalid = random() < 0.5 ? [0x80] : [0xe2, 0x82];
    return Buffer.concat([bytes.subarray(0, byteAt), Buffer.from(invalid), bytes.subarray(byteAt)]);
  }
  return bytes;
}

function wholeParse(body: Buffer): { ok: true; value: unknown } | { ok: false } {
  try {
    return { ok: true, value: JSON.parse(body.toString("utf8")) as unknown };
  } catch {
    return { ok: false };
  }
}

function readInChunks(body: Buffer, cuts: readonly number[], sizes: LargeBodySizes) {
  const reader = createLargeBodyReader(sizes);
  let start = 0;
  for (const cut of [...cuts, body.length]) {
    reader.write(body.subarray(start, cut));
    start = cut;
  }
  return reader.finish();
}

function randomCuts(random: () => number, length: number): number[] {
  const cuts = new Set<number>();
  const count = Math.floor(random() * 8);
  for (let index = 0; index < count; index++) cuts.add(Math.floor(random() * length));
  return [...cuts].sort((a, b) => a - b);
}

describe("large body reader", () => {
  it("agrees with JSON.parse on 3,000 random bodies, chunkings and slab sizes", () => {
    const random = randomSource(20261204);
    for (let round = 0; round < 3_000; round++) {
      const body = randomBody(random);
      const sizes = { longString: 1 + Math.floor(random() * 12), slab: 1 + Math.floor(random() * 24) };
      const cuts = randomCuts(random, body.length);
      const expected = wholeParse(body);
      const result = readInChunks(body, cuts, sizes);
      expect({ round, ok: result.ok }).toEqual({ round, ok: expected.ok });
      if (result.ok && expected.ok) expect(result.value).toEqual(expected.value);
    }
  });

  it.each([
    ["a string that never ends", '{"text":"SF6 in bay C'],
    ["a raw line feed inside a long string", '{"text":"SF6 in bay C\nand NH3"}'],
    ["an escape JSON does not have", '{"text":"SF6 in bay C \\q and NH3"}'],
    ["a \\u escape with too few digits", '{"text":"SF6 in bay C \\u12 and NH3"}'],
    ["something after the object", '{"text":"SF6 in bay C and NH3"} {}'],
    ["a missing comma", '{"text":"SF6 in bay C and NH3" "b":1}'],
  ])("fails on %s, as JSON.parse does, however it is chunked", (_label, text) => {
    const body = Buffer.from(text, "utf8");
    expect(wholeParse(body).ok).toBe(false);
    for (let cut = 0; cut <= body.length; cut++) {
      expect(readInChunks(body, [cut], { longString: 4, slab: 6 }).ok).toBe(false);
    }
  });

  it("keeps a long key and a value that look like its own marker apart", () => {
    const key = "K".repeat(300);
    const value = { [key]: "\u0000lonepair-long-string-x-0", list: ["L".repeat(300)] };
    const body = Buffer.from(JSON.stringify(value), "utf8");
    const result = readInChunks(body, [7, 150, 400], { longString: 16, slab: 32 });
    expect(result).toEqual({ ok: true, value });
  });

  it.each([
    // source: RFC 8259 section 7: an escape is a backslash and one character, or \u and four hex digits
    ["text without escapes", "abcdef", 5],
    ["a \\u escape at the end", "ab\\u00e9", 2],
    ["an escaped backslash run at the end", "ab\\\\", 2],
    ["a two-character escape at the end", "abcd\\n", 4],
    // source: RFC 3629: "€" is E2 82 AC; a cut before E2 keeps the character whole
    ["a character cut at the end", "ab€", 2],
  ])("cuts %s where both sides decode alone", (_label, text, cut) => {
    expect(safeCut(Buffer.from(text, "utf8"))).toBe(cut);
  });

  it("hands the document store a long text already cut into the chunks it would cut", () => {
    const random = randomSource(7);
    for (let round = 0; round < 5; round++) {
      const text = randomText(random, 40_000 + Math.floor(random() * 40_000));
      const body = Buffer.from(JSON.stringify({ jsonrpc: "2.0", method: "textDocument/didOpen", params: { textDocument: { text } } }));
      const result = readInChunks(body, randomCuts(random, body.length), { longString: 1024, slab: 4096 + Math.floor(random() * 8192) });
      expect(result.ok).toBe(true);
      const received = (result as { value: { params: { textDocument: { text: string } } } }).value.params.textDocument.text;
      expect(received).toBe(text);
      const chunked = takeChunked(received);
      const expected = chunkedTextOf(text);
      expect(chunked?.chunks.map((chunk) => chunk.text)).toEqual(expected.chunks.map((chunk) => chunk.text));
      expect([chunked?.firstLines, chunked?.starts]).toEqual([expected.firstLines, expected.starts]);
      // Taken once: the store's next text of the same length is cut afresh.
      expect(takeChunked(received)).toBeUndefined();
    }
  });
});
