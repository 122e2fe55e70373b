/**
 * Splits a byte stream into LSP frames (`Content-Length: N\r\n\r\n` + N bytes of JSON) and
 * recovers from garbage: a bad header block is skipped up to the next `Content-Length:`, a
 * body that is not a JSON object is reported and dropped, and reading goes on.
 */

import { StringDecoder } from "node:string_decoder";
import { createLargeBodyReader, type LargeBodySizes } from "./largeBodyReader";

/** What one step of decoding produced. */
export type DecodedFrame =
  { readonly kind: "message"; readonly message: Record<string, unknown> } | { readonly kind: "error"; readonly error: Error };

export interface FrameDecoder {
  /** Hands `chunk` over: the decoder keeps it, without a copy, so the caller must not change it afterwards. */
  push(chunk: Uint8Array): void;
  /** The next message or error, or undefined when more bytes are needed. */
  next(): DecodedFrame | undefined;
  /** Bytes waiting to be decoded. */
  readonly pendingBytes: number;
}

/** Refuse bodies larger than this: no LSP message of ours comes near it. */
export const MAX_BODY_BYTES = 512 * 1024 * 1024;

/** A header block longer than this without its blank line is garbage. */
const MAX_HEADER_BYTES = 16 * 1024;

const HEADER_END = Buffer.from("\r\n\r\n");
const LENGTH_KEY = Buffer.from("content-length:");

/** A body at least this long is read as it arrives (see largeBodyReader.ts). */
export const LARGE_BODY_BYTES = 1024 * 1024;

/** A body being read, its bytes handed over as they arrive. */
interface BodyInProgress {
  remaining: number;
  write(bytes: Buffer): void;
  /** The decoded frame, once every byte has been written. */
  finish(): DecodedFrame;
}

/** A body read whole: its text decoded as its bytes arrive, parsed at the end. */
function smallBody(length: number): BodyInProgress {
  const pieces: string[] = [];
  // Reads UTF-8 as Buffer#toString does: invalid bytes become U+FFFD, a byte-order mark stays.
  const decoder = new StringDecoder("utf8");
  return {
    remaining: length,
    write: (bytes) => void pieces.push(decoder.write(bytes)),
    finish() {
      pieces.push(decoder.end());
      return decodeBody(pieces.length === 1 ? pieces[0] : pieces.join(""));
    },
  };
}

/** A large body, parsed while it arrives. */
function largeBody(length: number, sizes?: LargeBodySizes): BodyInProgress {
  const reader = createLargeBodyReader(sizes);
  return {
    remaining: length,
    write: (bytes) => reader.write(bytes),
    finish() {
      const result = reader.finish();
      return result.ok ? asMessage(result.value) : notJson(result.error);
    },
  };
}

/** `largeBodies` sets the reading of large bodies (tests make it read small ones that way too). */
export function createFrameDecoder(
  largeBodies: { readonly from: number; readonly sizes?: LargeBodySizes } = { from: LARGE_BODY_BYTES },
): FrameDecoder {
  // Bytes not yet decoded, in arrival order; the first may be a view into a larger chunk.
  let chunks: Buffer[] = [];
  let pending = 0;
  let body: BodyInProgress | undefined;

  /** Joins the first chunks until `length` bytes (or all there are) are contiguous, joining no more than that. */
  const front = (length: number): Buffer => {
    if (chunks[0].length >= length || chunks.length === 1) return chunks[0];
    let joined = 0;
    let count = 0;
    while (count < chunks.length && joined < length) joined += chunks[count++].length;
    chunks = [Buffer.concat(chunks.slice(0, count)), ...chunks.slice(count)];
    return chunks[0];
  };

  /** Drops `length` bytes from the front. */
  const drop = (length: number): void => {
    let left = length;
    while (left > 0) {
      const first = chunks[0];
      if (first.length > left) {
        chunks[0] = first.subarray(left);
        break;
      }
      left -= first.length;
      chunks.shift();
    }
    pending -= length;
  };

  /** Drops bytes up to the next "Content-Length:" after the first byte (or all but a possible partial key). */
  const resync = (): void => {
    const head = front(pending);
    const next = indexOfCaseless(head, LENGTH_KEY, 1);
    drop(next >= 0 ? next : Math.max(1, head.length - LENGTH_KEY.length));
  };

  const readHeader = (): DecodedFrame | "wait" | "ok" => {
    const head = front(Math.min(pending, MAX_HEADER_BYTES + HEADER_END.length));
    const end = head.subarray(0, MAX_HEADER_BYTES + HEADER_END.length).indexOf(HEADER_END);
    if (end < 0) {
      if (pending <= MAX_HEADER_BYTES) return "wait";
      resync();
      return { kind: "error", error: new Error("Message header too long or missing its blank line; skipped") };
    }
    const length = contentLength(head.subarray(0, end).toString("ascii"));
    if (length === undefined || length > MAX_BODY_BYTES) {
      resync();
      return { kind: "error", error: new Error("Message header without a usable Content-Length; skipped") };
    }
    drop(end + HEADER_END.length);
    body = length >= largeBodies.from ? largeBody(length, largeBodies.sizes) : smallBody(length);
    return "ok";
  };

  /**
   * Hands the body's bytes that have arrived over, chunk by chunk, so a large message is read
   * while it streams in rather than copied whole at its end; true once it is complete.
   */
  const readBody = (reading: BodyInProgress): boolean => {
    while (reading.remaining > 0 && chunks.length > 0) {
      const first = chunks[0];
      const taken = first.length <= reading.remaining ? first : first.subarray(0, reading.remaining);
      reading.write(taken);
      reading.remaining -= taken.length;
      drop(taken.length);
    }
    return reading.remaining === 0;
  };

  return {
    push(chunk) {
      if (chunk.length === 0) return;
      chunks.push(Buffer.isBuffer(chunk) ? chunk : Buffer.from(chunk.buffer, chunk.byteOffset, chunk.length));
      pending += chunk.length;
    },
    next() {
      for (;;) {
        if (body) {
          if (!readBody(body)) return undefined;
          const finished = body;
          body = undefined;
          return finished.finish();
        }
        if (pending === 0) return undefined;
        const header = readHeader();
        if (header === "wait") return undefined;
        if (header !== "ok") return header;
      }
    },
    get pendingBytes() {
      return pending;
    },
  };
}

/** The value of the Content-Length header; undefined when the block is not a valid header block. */
function contentLength(block: string): number | undefined {
  let length: number | undefined;
  for (const line of block.split("\r\n")) {
    const colon = line.indexOf(":");
    if (colon <= 0) return undefined;
    if (line.slice(0, colon).trim().toLowerCase() !== "content-length") continue;
    const value = line.slice(colon + 1).trim();
    if (!/^\d{1,10}$/.test(value)) return undefined;
    length = Number(value);
  }
  return length;
}

function decodeBody(body: string): DecodedFrame {
  let message: unknown;
  try {
    message = JSON.parse(body);
  } catch (error) {
    return notJson(error);
  }
  return asMessage(message);
}

function asMessage(message: unknown): DecodedFrame {
  if (typeof message === "object" && message !== null && !Array.isArray(message)) {
    return { kind: "message", message: message as Record<string, unknown> };
  }
  return { kind: "error", error: new Error("Message body is not a JSON object; dropped") };
}

function notJson(error: unknown): DecodedFrame {
  return { kind: "error", error: new Error(`Message body is not valid JSON; dropped (${String(error)})`) };
}

/** Index of the lower-case `needle` in `haystack` ignoring ASCII case, from `from`; -1 when absent. */
function indexOfCaseless(haystack: Buffer, needle: Buffer, from: number): number {
  for (let index = from; index <= haystack.length - needle.length; index += 1) {
    let offset = 0;
    while (offset < needle.length && lowerAscii(haystack[index + offset]) === needle[offset]) offset += 1;
    if (offset === needle.length) return index;
  }
  return -1;
}

function lowerAscii(byte: number): number {
  return byte >= 0x41 && byte <= 0x5a ? byte + 0x20 : byte;
}
