/**
 * Inline labels for test documents: a species mention is wrapped in ⟦ and ⟧. The markers are
 * stripped before scanning and turned into the expected ranges of the clean text.
 */

export interface Label {
  readonly start: number;
  readonly end: number;
  readonly text: string;
}

export interface LabelledText {
  readonly text: string;
  readonly labels: readonly Label[];
}

const OPEN = "\u27e6";
const CLOSE = "\u27e7";

/** The clean text and the ranges the markers enclosed in it. */
export function stripLabels(marked: string): LabelledText {
  let text = "";
  const labels: Label[] = [];
  let open = -1;
  for (const character of marked) {
    if (character === OPEN) {
      if (open >= 0) throw new Error(`nested label at ${text.length}`);
      open = text.length;
    } else if (character === CLOSE) {
      if (open < 0) throw new Error(`unopened label at ${text.length}`);
      labels.push({ start: open, end: text.length, text: text.slice(open, text.length) });
      open = -1;
    } else {
      text += character;
    }
  }
  if (open >= 0) throw new Error("unclosed label");
  return { text, labels };
}

/** Where a range sits, as "line:column" (1-based), for readable failure lists. */
export function lineAndColumn(text: string, offset: number): string {
  const before = text.slice(0, offset);
  const line = before.split("\n").length;
  return `${line}:${offset - before.lastIndexOf("\n")}`;
}
