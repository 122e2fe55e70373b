/**
 * Which fixes `check --fix` applies and what the text becomes: the same replacements the editor
 * offers, each over its own range only. When two fixes overlap the first in the document wins;
 * a fix that would change nothing is left out.
 */
import type { Finding, TextFix } from "../../../../shared/src/index";

/** The findings whose fixes are applied (in document order), and those left as they are. */
export interface FixChoice {
  readonly fixed: readonly (Finding & { fix: TextFix })[];
  readonly remaining: readonly Finding[];
}

/** Splits `findings` (offsets into `text`) into the ones fixed and the rest. */
export function chooseFixes(text: string, findings: readonly Finding[]): FixChoice {
  const candidates = findings
    .filter((finding): finding is Finding & { fix: TextFix } => finding.fix !== undefined)
    .filter((finding) => text.slice(finding.fix.range.start, finding.fix.range.end) !== finding.fix.newText)
    .sort((a, b) => a.fix.range.start - b.fix.range.start);
  const fixed: (Finding & { fix: TextFix })[] = [];
  for (const finding of candidates) {
    const previous = fixed[fixed.length - 1];
    if (!previous || previous.fix.range.end <= finding.fix.range.start) fixed.push(finding);
  }
  const chosen = new Set<Finding>(fixed);
  return { fixed, remaining: findings.filter((finding) => !chosen.has(finding)) };
}

/** `text` with the fixes (in document order, not overlapping) applied. */
export function applyFixes(text: string, fixes: readonly TextFix[]): string {
  if (fixes.length === 0) return text;
  const pieces: string[] = [];
  let copied = 0;
  for (const fix of fixes) {
    pieces.push(text.slice(copied, fix.range.start), fix.newText);
    copied = fix.range.end;
  }
  pieces.push(text.slice(copied));
  return pieces.join("");
}

/**
 * Maps offsets of the old text to the fixed text. Offsets inside a replaced range move to its
 * start. Binary search over the fixes, so mapping every finding of a large batch stays cheap.
 */
export function fixedOffsets(fixes: readonly TextFix[]): (offset: number) => number {
  // shiftBefore[i]: how far text after fix i-1 has moved.
  const shiftBefore = [0];
  for (const fix of fixes) shiftBefore.push(shiftBefore[shiftBefore.length - 1] + fix.newText.length - (fix.range.end - fix.range.start));
  return (offset) => {
    // The number of fixes that start before `offset`.
    let low = 0;
    let high = fixes.length;
    while (low < high) {
      const middle = (low + high) >> 1;
      if (fixes[middle].range.start < offset) low = middle + 1;
      else high = middle;
    }
    const previous = fixes[low - 1];
    if (previous && previous.range.end > offset) return previous.range.start + shiftBefore[low - 1];
    return offset + shiftBefore[low];
  };
}
