/**
 * The edits a fix is made of, and fixes moved along a text: one place that knows a fix may be
 * several separate edits.
 */
import type { FixEdit, TextFix } from "./types";

/** The edits that apply `fix`: its own edits, or its one replacement. */
export function editsOfFix(fix: TextFix): readonly FixEdit[] {
  return fix.edits ?? [{ range: fix.range, newText: fix.newText }];
}

/** `fix` with every offset passed through `move` (for a fix found in a slice of the text). */
export function movedFix(fix: TextFix, move: (offset: number) => number): TextFix {
  const range = { start: move(fix.range.start), end: move(fix.range.end) };
  if (!fix.edits) return { ...fix, range };
  const edits = fix.edits.map((edit) => ({ ...edit, range: { start: move(edit.range.start), end: move(edit.range.end) } }));
  return { ...fix, range, edits };
}

/** `fix` moved `by` characters. */
export function shiftedFix(fix: TextFix, by: number): TextFix {
  return by === 0 ? fix : movedFix(fix, (offset) => offset + by);
}

/**
 * A fix made of `edits` (in order, not overlapping) over `text`, whose offset 0 is `base` in
 * the document: the covering range and what it holds afterwards come from the edits.
 */
export function fixOfEdits(text: string, base: number, edits: readonly FixEdit[], title: string): TextFix | undefined {
  if (edits.length === 0) return undefined;
  const start = edits[0].range.start;
  const end = edits[edits.length - 1].range.end;
  let newText = "";
  let copied = start;
  for (const edit of edits) {
    newText += text.slice(copied - base, edit.range.start - base) + edit.newText;
    copied = edit.range.end;
  }
  newText += text.slice(copied - base, end - base);
  const fix: TextFix = { range: { start, end }, newText, title };
  return edits.length === 1 ? fix : { ...fix, edits };
}
