/**
 * Formulas typed as LaTeX math outside mhchem: `H_2O`, `SO_4^{2-}`, `\mathrm{Fe(CN)_{6}^{3-}}`,
 * `\text{CuSO}_4\cdot 5\text{H}_2\text{O}`. The markup becomes the plain formula the reader knows.
 */

/** Commands that only set the type face of their argument. */
const FACE_COMMANDS = new Set(["mathrm", "text", "textrm", "rm", "mathit", "mathsf", "textsf", "mathbf", "textbf", "mathnormal", "ce"]);

/** Commands that stand for a character of a formula. */
const CHARACTER_COMMANDS: ReadonlyMap<string, string> = new Map([
  ["cdot", "·"],
  ["bullet", "·"],
  ["left", ""],
  ["right", ""],
  ["minus", "-"],
]);

/** Longest markup looked at: one species typed in math is short. */
const MAX_LATEX = 200;

/** True when `text` holds math markup the formula reader does not read by itself. */
export function hasLatexMarkup(text: string): boolean {
  return text.length <= MAX_LATEX && (text.includes("\\") || text.includes("_") || text.includes("^{") || text.includes("{"));
}

/**
 * The plain formula `text` spells in LaTeX math ("SO_4^{2-}" -> "SO4^2-"), or undefined when it
 * holds anything else (another command, a letter as a subscript, unbalanced braces).
 */
export function latexToPlain(text: string): string | undefined {
  let result = "";
  let depth = 0;
  let index = 0;
  while (index < text.length) {
    const character = text[index];
    if (character === "\\") {
      let nameEnd = index + 1;
      while (nameEnd < text.length && /[A-Za-z]/.test(text[nameEnd])) nameEnd++;
      const name = text.slice(index + 1, nameEnd);
      if (name.length === 0) {
        // "\," "\;" "\ " "\!": spacing inside math
        if (!/[,;:! ]/.test(text[nameEnd] ?? "")) return undefined;
        index = nameEnd + 1;
        continue;
      }
      if (FACE_COMMANDS.has(name)) {
        index = nameEnd;
        while (text[index] === " ") index++;
        continue;
      }
      const replacement = CHARACTER_COMMANDS.get(name);
      if (replacement === undefined) return undefined;
      result += replacement;
      index = nameEnd;
      while (text[index] === " ") index++;
      continue;
    }
    if (character === "_" || character === "^") {
      const script = scriptAt(text, index + 1);
      if (script === undefined) return undefined;
      const { content, end } = script;
      // "^{13}CO_2", "H_2^{18}O", "{}^{13}C": a mass number before an element symbol labels the atom,
      // kept in the braces the formula reader knows ("^{13}C").
      if (character === "^" && /^[0-9]{1,3}$/.test(content) && beforeSymbol(text, end)) {
        result += `^{${content}}`;
        index = end;
        continue;
      }
      // "NaCl_{(aq)}", "CO_{2(g)}": a state symbol set as a subscript.
      if (character === "_" && /^[0-9]*\((?:aq|s|l|g)\)$/.test(content)) {
        result += content;
        index = end;
        continue;
      }
      if (character === "_" ? !/^[0-9]+$/.test(content) : !/^[0-9]*[+\-\u2212]{1,3}$|^[+\-\u2212][0-9]?$/.test(content)) return undefined;
      result += character === "_" ? content : `^${content}`;
      index = end;
      continue;
    }
    if (character === "{") depth++;
    else if (character === "}") {
      if (--depth < 0) return undefined;
    } else if (character === "~" || character === "$") {
      return undefined;
    } else {
      result += character;
    }
    index++;
  }
  return depth === 0 ? result.trim() : undefined;
}

/** True when an element symbol starts at `at`, perhaps inside a face command ("\\mathrm{C}"). */
function beforeSymbol(text: string, at: number): boolean {
  return /^(?:\\(?:mathrm|text|textrm|rm)\s*\{)?[A-Z]/.test(text.slice(at, at + 12));
}

/** The argument of "_" or "^" at `start`: one character, or a braced group (faces allowed inside). */
function scriptAt(text: string, start: number): { content: string; end: number } | undefined {
  if (start >= text.length) return undefined;
  if (text[start] !== "{") return { content: text[start], end: start + 1 };
  let depth = 0;
  for (let index = start; index < text.length; index++) {
    if (text[index] === "{") depth++;
    else if (text[index] === "}" && --depth === 0) {
      const inner = latexToPlain(text.slice(start + 1, index));
      return inner === undefined ? undefined : { content: inner.replace(/\s+/g, ""), end: index + 1 };
    }
  }
  return undefined;
}
