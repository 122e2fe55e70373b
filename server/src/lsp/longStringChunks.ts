/**
 * The chunked form of long strings in recent messages (a 10 MB document text), cut while the
 * message arrived, so that the document store neither flattens the text into one string nor
 * reads it again. Holds a few at most, and each only until it is taken.
 */
import type { ChunkedText } from "../../../shared/src/index";

/** Long strings remembered at most: a message holds one document text, rarely more. */
const REMEMBERED = 4;

const remembered: { readonly text: string; readonly chunked: ChunkedText }[] = [];

/** Remembers that `chunked` is `text` cut into chunks. */
export function rememberChunked(text: string, chunked: ChunkedText): void {
  remembered.push({ text, chunked });
  if (remembered.length > REMEMBERED) remembered.shift();
}

/** The chunks of `text` if they are remembered, forgetting them. */
export function takeChunked(text: string): ChunkedText | undefined {
  // The same string object compares in constant time; another of the same length is rare.
  const index = remembered.findIndex((entry) => entry.text.length === text.length && entry.text === text);
  if (index < 0) return undefined;
  const [entry] = remembered.splice(index, 1);
  return entry.chunked;
}
