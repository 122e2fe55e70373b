/**
 * The stdio frame decoder: LSP base-protocol framing (Content-Length header, blank line, JSON
 * body), whatever the chunking, and recovery from garbage between frames.
 */
import { describe, expect, it } from "vitest";
import { createFrameDecoder, type DecodedFrame } from "../../server/src/lsp/frameDecoder";

// source: LSP specification, base protocol: header part "Content-Length: N\r\n", then "\r\n", then N bytes
function frame(message: unknown): Buffer {
  const body = Buffer.from(JSON.stringify(message), "utf8");
  return Buffer.concat([Buffer.from(`Content-Length: ${body.length}\r\n\r\n`, "ascii"), body]);
}

function decodeAll(chunks: readonly Buffer[]): DecodedFrame[] {
  const decoder = createFrameDecoder();
  const frames: DecodedFrame[] = [];
  for (const chunk of chunks) {
    decoder.push(chunk);
    for (let next = decoder.next(); next; next = decoder.next()) frames.push(next);
  }
  return frames;
}

const hover = { jsonrpc: "2.0", id: 1, method: "textDocument/hover", params: { note: "SF4 in bay C, 🧪 é" } };
const exit = { jsonrpc: "2.0", method: "exit" };

describe("frame decoder", () => {
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
});
