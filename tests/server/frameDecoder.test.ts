/**
 * The stdio frame decoder: LSP base-protocol framing (Content-Length header, blank line, JSON
 * body), whatever the chunking, and recovery from garbage between frames.
 */
import { beforeEach, describe, expect, it } from "vitest";
import { createFrameDecoder, type DecodedFrame, type FrameDecoder } from "../../server/src/lsp/frameDecoder";

// source: LSP specification, base protocol: header part "Content-Length: N\r\n", then "\r\n", then N bytes
function frame(message: unknown): Buffer {
  const body = Buffer.from(JSON.stringify(message), "utf8");
  return Buffer.concat([Buffer.from(`Content-Length: ${body.length}\r\n\r\n`, "ascii"), body]);
}

// Every body is read both ways: whole, and while it arrives with tiny slabs, as large bodies are.
const READINGS: readonly (readonly [string, () => FrameDecoder])[] = [
  ["bodies read whole", () => createFrameDecoder()],
  ["bodies read as they arrive", () => createFrameDecoder({ from: 0, sizes: { longString: 4, slab: 8 } })],
];
let makeDecoder = READINGS[0][1];

function decodeAll(chunks: readonly Buffer[]): DecodedFrame[] {
  const decoder = makeDecoder();
  const frames: DecodedFrame[] = [];
  for (const chunk of chunks) {
    decoder.push(chunk);
    for (let next = decoder.next(); next; next = decoder.next()) frames.push(next);
  }
  return frames;
}

const hover = { jsonrpc: "2.0", id: 1, method: "textDocument/hover", params: { note: "SF4 in bay C, 🧪 é" } };
const exit = { jsonrpc: "2.0", method: "exit" };

describe.each(READINGS)("frame decoder, %s", (_reading, make) => {
  beforeEach(() => {
    makeDecoder = make;
  });

  it("decodes the same messages however the stream is split", () => {
    const stream = Buffer.concat([frame(hover), frame(exit)]);
    for (let cut = 0; cut <= stream.length; cut += 1) {
      const frames = decodeAll([stream.subarray(0, cut), stream.subarray(cut)]);
      expect(frames).toEqual([
        { kind: "message", message: hover },
        { kind: "message", message: exit },
      ]);
    }
  });

  it("takes a Content-Type header and any header case // source: LSP specification, header field names", () => {
    const body = JSON.stringify(exit);
    const text = `content-length: ${body.length}\r\nContent-Type: application/vscode-jsonrpc; charset=utf-8\r\n\r\n${body}`;
    expect(decodeAll([Buffer.from(text)])).toEqual([{ kind: "message", message: exit }]);
  });

  it.each([
    ["junk before a frame, no blank line", "hello there "],
    ["a header block without a length", "X-Lab: Kestrel Ridge\r\n\r\n"],
    ["a length that is not a number", "Content-Length: twelve\r\n\r\n"],
    ["a body that is not JSON", "Content-Length: 5\r\n\r\n{oops"],
    ["a body that is not an object", "Content-Length: 7\r\n\r\n[1,2,3]"],
  ])("reports %s and then reads the next frame", (_label, garbage) => {
    const frames = decodeAll([Buffer.concat([Buffer.from(garbage), frame(hover)])]);
    expect(frames.filter((item) => item.kind === "error").length).toBeGreaterThanOrEqual(1);
    expect(frames[frames.length - 1]).toEqual({ kind: "message", message: hover });
  });

  it("gives up on an endless header and recovers at the next frame", () => {
    const endless = Buffer.alloc(40 * 1024, "a");
    const frames = decodeAll([endless, frame(exit)]);
    expect(frames[0].kind).toBe("error");
    expect(frames[frames.length - 1]).toEqual({ kind: "message", message: exit });
  });

  it("reads a body whose characters are cut between chunks at every byte", () => {
    // source: Unicode Standard, UTF-8 encoding forms: "é" is 2 bytes, "🧪" 4, "€" 3
    const message = { jsonrpc: "2.0", method: "note", params: { text: "é🧪€ at Kestrel Ridge" } };
    const stream = frame(message);
    for (let first = 0; first < stream.length; first += 1) {
      for (let second = first; second <= Math.min(stream.length, first + 5); second += 1) {
        const frames = decodeAll([stream.subarray(0, first), stream.subarray(first, second), stream.subarray(second)]);
        expect(frames).toEqual([{ kind: "message", message }]);
      }
    }
  });

  it("reads invalid UTF-8 in a string as Buffer#toString does, however it is split", () => {
    // source: WHATWG Encoding Standard, UTF-8 decoder: each maximal invalid subpart becomes U+FFFD
    const invalid = Buffer.from([0xc3, 0x28, 0xe2, 0x82, 0xf0, 0x9f, 0x41, 0xff]);
    const body = Buffer.concat([Buffer.from('{"jsonrpc":"2.0","method":"note","params":"'), invalid, Buffer.from('"}')]);
    const stream = Buffer.concat([Buffer.from(`Content-Length: ${body.length}\r\n\r\n`), body]);
    const expected = JSON.parse(body.toString("utf8")) as unknown;
    for (let cut = 0; cut <= stream.length; cut += 1) {
      expect(decodeAll([stream.subarray(0, cut), stream.subarray(cut)])).toEqual([{ kind: "message", message: expected }]);
    }
  });

  it("keeps a byte-order mark at the start of a body, so the body is not JSON // common practice", () => {
    const body = Buffer.concat([Buffer.from([0xef, 0xbb, 0xbf]), Buffer.from(JSON.stringify(exit))]);
    const frames = decodeAll([Buffer.from(`Content-Length: ${body.length}\r\n\r\n`), body, frame(hover)]);
    expect(frames.map((item) => item.kind)).toEqual(["error", "message"]);
  });

  it("reads a large message that arrives in many chunks, and the frame after it in the same chunk", () => {
    const text = "Cylinder KR-0042 holds SF6 at 21 bar.\n".repeat(40_000);
    const open = { jsonrpc: "2.0", method: "textDocument/didOpen", params: { textDocument: { text } } };
    const stream = Buffer.concat([frame(open), frame(hover)]);
    const chunks: Buffer[] = [];
    for (let at = 0; at < stream.length; at += 65_536) chunks.push(stream.subarray(at, at + 65_536));
    expect(decodeAll(chunks)).toEqual([
      { kind: "message", message: open },
      { kind: "message", message: hover },
    ]);
  });
});
