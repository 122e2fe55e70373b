/**
 * Where a YAML text's block list of records and each of its items lie, found by one quick pass
 * over its lines, without parsing: the first step of reading a large file a few items at a time
 * (see `yamlParts.ts`). The items and the text around the list are then read by the parser, which
 * decides whether the text is clean YAML; this pass only finds a list whose items can be read
 * alone as they read in place.
 *
 * The list is a run of lines that open with a dash in one column: at the root (then nothing but
 * blank lines and comments may follow it), or under a key of the root mapping written alone on its
 * line (`records:`), and then it ends at the next line in the first column. Item `k` runs from the
 * start of its dash's line to the start of the next item's; the last one takes the blank lines and
 * comments after it.
 */
import type { ChunkedText } from "../chunkedText";

/** A block list found by the pass. */
export interface ScannedYamlList {
  /** The column of its dashes. */
  readonly indent: number;
  /** Where each item's line starts. */
  readonly starts: Int32Array;
  /** Where the text after the list starts. */
  readonly tail: number;
}

/** A run of dash lines being followed. */
interface Run {
  readonly indent: number;
  /** Set when the run sits under a key; a list at the root has none. */
  readonly key: string | undefined;
  readonly starts: number[];
  tail: number;
}

const SPACE = 0x20;
const TAB = 0x09;
const DASH = 0x2d;
const HASH = 0x23;
const CARRIAGE_RETURN = 0x0d;
const LINE_FEED = 0x0a;

/** A line that ends a document or holds a directive: such a stream is read whole. */
const DOCUMENT_LINE = /^(?:(?:---|\.\.\.)(?:[ \t\r]|$)|%)/;

/** A key written alone on its line in the first column: `records:`, `"records":`, `records: # note`. */
const KEY_LINE = /^(?:"([^"\\]*)"|'([^']*)'|([^\s#'"?\-&*!|>%@`{}[\],][^#]*?))\s*:\s*(?:#.*)?$/;

/**
 * The block list that spans the most text, as described above, with its items' line starts;
 * undefined when the text has none, or holds something this pass leaves to a whole reading
 * (directives, document markers, tabs in indentation). `usableKey` says which keys a list may sit
 * under.
 */
export function scanYamlList(text: ChunkedText, usableKey: (key: string) => boolean): ScannedYamlList | undefined {
  const runs: Run[] = [];
  let active: Run | undefined;
  // The last line that is neither blank nor a comment: none yet, a key alone on its line, or other.
  let previous: { readonly key: string | undefined } | undefined;
  let tabbed = false;

  const end = (run: Run, at: number): void => {
    run.tail = at;
    runs.push(run);
  };

  for (let chunkIndex = 0; chunkIndex < text.chunks.length && !tabbed; chunkIndex++) {
    const chunk = text.chunks[chunkIndex].text;
    const base = text.starts[chunkIndex];
    let lineStart = 0;
    while (lineStart < chunk.length) {
      const lineFeed = chunk.indexOf("\n", lineStart);
      const lineEnd = lineFeed < 0 ? chunk.length : lineFeed;
      const next = lineFeed < 0 ? chunk.length : lineFeed + 1;
      let column = lineStart;
      while (chunk.charCodeAt(column) === SPACE) column++;
      const first = column < lineEnd ? chunk.charCodeAt(column) : LINE_FEED;
      const at = base + lineStart;
      if (first === TAB) {
        // Tabs before the content: blank if nothing else follows, otherwise left to the parser.
        if (chunk.slice(column, lineEnd).trim() !== "") {
          tabbed = true;
          break;
        }
        lineStart = next;
        continue;
      }
      if (first === LINE_FEED || first === CARRIAGE_RETURN || first === HASH) {
        lineStart = next;
        continue;
      }
      const indent = column - lineStart;
      if (indent === 0 && DOCUMENT_LINE.test(chunk.slice(lineStart, lineEnd))) return undefined;
      const after = column + 1 < lineEnd ? chunk.charCodeAt(column + 1) : LINE_FEED;
      const dash = first === DASH && (after === SPACE || after === TAB || after === CARRIAGE_RETURN || after === LINE_FEED);
      if (active) {
        if (indent > active.indent || (indent === active.indent && dash)) {
          if (indent === active.indent) active.starts.push(at);
          lineStart = next;
          continue;
        }
        // The list ends: at the root nothing may follow it, and under a key only the first column.
        if (active.key !== undefined && indent === 0) end(active, at);
        active = undefined;
        // Its last line was no key: this line cannot open a list under one.
        previous = { key: undefined };
      }
      if (dash && (previous === undefined || previous.key !== undefined)) {
        active = { indent, key: previous?.key, starts: [at], tail: -1 };
      }
      previous = { key: indent === 0 && !dash ? keyOf(chunk.slice(lineStart, lineEnd)) : undefined };
      lineStart = next;
    }
  }
  if (tabbed) return undefined;
  if (active) end(active, text.length);
  let longest: Run | undefined;
  for (const run of runs) {
    if (run.key !== undefined && !usableKey(run.key)) continue;
    if (!longest || run.tail - run.starts[0] > longest.tail - longest.starts[0]) longest = run;
  }
  return longest && { indent: longest.indent, starts: Int32Array.from(longest.starts), tail: longest.tail };
}

/** The key of a line that holds a key alone; undefined for any other line. */
function keyOf(line: string): string | undefined {
  const match = KEY_LINE.exec(line.endsWith("\r") ? line.slice(0, -1) : line);
  if (!match) return undefined;
  return match[1] ?? match[2] ?? match[3].trimEnd();
}
