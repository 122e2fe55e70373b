/**
 * Reads a found document's text whole, as an editor would open it, up to a bound: a file longer
 * than the bound is read only that far (cut after its last whole line), so one huge data dump
 * cannot take the memory of the program checking a workspace.
 */
import { open } from "node:fs/promises";
import type { DocumentFile } from "./findDocuments";

/** A document's text, and where it was cut when only its start was read. */
export interface DocumentText {
  readonly text: string;
  /** Set when the file went on past the bound: the length of `text`, which ends at a line end. */
  readonly cutAt?: number;
}

/** The text of `file` (decoded by its byte-order mark, which is dropped), at most `maxCharacters` long. */
export async function readDocumentText(file: DocumentFile, maxCharacters: number): Promise<DocumentText> {
  const encoding = file.encoding ?? "utf-8";
  // UTF-16 takes two bytes a character; in UTF-8 a character takes at least one.
  const maxBytes = encoding === "utf-8" ? maxCharacters : 2 * maxCharacters;
  const handle = await open(file.path, "r");
  try {
    const size = (await handle.stat()).size;
    const buffer = Buffer.alloc(Math.min(size, maxBytes));
    let filled = 0;
    while (filled < buffer.length) {
      const { bytesRead } = await handle.read(buffer, filled, buffer.length - filled, filled);
      if (bytesRead === 0) break;
      filled += bytesRead;
    }
    const text = new TextDecoder(encoding).decode(buffer.subarray(0, filled));
    if (size <= maxBytes) return { text };
    // The last line may be cut inside a character or a record: drop it.
    const lastLineEnd = text.lastIndexOf("\n");
    const kept = lastLineEnd >= 0 ? text.slice(0, lastLineEnd + 1) : text;
    return { text: kept, cutAt: kept.length };
  } finally {
    await handle.close();
  }
}
