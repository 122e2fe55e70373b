import { describe, expect, it } from "vitest";
import { readSpecies } from "../shared/src/chemistry/reader/readSpecies";
import type { ReadResult } from "../shared/src/chemistry/types";
import { seededRandom } from "./support/seededRandom";

const VALID = [
  "SF4",
  "XeOF4",
  "H2SO4",
  "Ca(OH)2",
  "CuSO4·5H2O",
  "CH3COOH",
  "(CH3)2CO",
  "CH2=CH2",
  "HC≡CH",
  "NH4+",
  "SO4^2-",
  "SO4 2-",
  "SO4(2-)",
  "[PO4]3-",
  "SO4--",
  "SO₄²⁻",
  "\\ce{NH4+}",
  "\\ce{SO4^{2-}}",
  "water",
  "sulfur tetrafluoride",
  "dinitrogen tetroxide",
  "iron(III) oxide",
  "ammonium sulfate",
  "hydrogen carbonate",
  "acetic acid",
  "K4[Fe(CN)6]",
  "H<sub>2</sub>O",
  "SO<sub>4</sub><sup>2&minus;</sup>",
  "SO{{sub|4}}{{sup|2−}}",
  "SO~4~^2-^",
  "NH\\ :sub:`4`\\ :sup:`+`",
  "H\\textsubscript{2}O",
  "NaH¹³CO3",
  "^{13}CO_2",
  "\\mathrm{H_2^{18}O}",
];
const PIECES = [
  "(",
  ")",
  "[",
  "]",
  "{",
  "}",
  "^",
  "+",
  "-",
  "−",
  "²",
  "⁻",
  "₄",
  "·",
  ".",
  "=",
  "#",
  "≡",
  " ",
  "\\ce{",
  "9",
  "0",
  "e",
  "ion",
  "di",
  "Xe",
  "<sub>",
  "</sub>",
  "<sup>",
  "</sup>",
  "&minus;",
  "&#x2212;",
  "{{sub|",
  "{{sup|",
  "}}",
  "~",
  ":sub:`",
  "`",
  "\\ ",
  "\\textsuperscript{",
  "¹³",
  "_{(aq)}",
];

const READING_CODES = new Set([
  "empty-input",
  "unknown-element",
  "unbalanced-brackets",
  "malformed-formula",
  "unknown-name",
  "input-too-long",
]);

function randomUnicode(random: () => number, length: number): string {
  let text = "";
  for (let i = 0; i < length; i++) {
    const pool = random();
    // mostly ASCII, some Latin-1, symbols and sub/superscripts, some lone and paired surrogates
    const code =
      pool < 0.6
        ? 0x20 + Math.floor(random() * 95)
        : pool < 0.75
          ? 0xa0 + Math.floor(random() * 0x60)
          : pool < 0.9
            ? 0x2000 + Math.floor(random() * 0x300)
            : pool < 0.95
              ? 0xd800 + Math.floor(random() * 0x800)
              : Math.floor(random() * 0x10000);
    text += String.fromCharCode(code);
  }
  return text;
}

function mutate(random: () => number, text: string): string {
  let result = text;
  const edits = 1 + Math.floor(random() * 4);
  for (let e = 0; e < edits; e++) {
    const at = Math.floor(random() * (result.length + 1));
    const kind = random();
    if (kind < 0.3) result = result.slice(0, at) + result.slice(at + 1);
    else if (kind < 0.6) result = result.slice(0, at) + PIECES[Math.floor(random() * PIECES.length)] + result.slice(at);
    else if (kind < 0.8) result = result.slice(0, at) + result.slice(at).toUpperCase();
    else result = result.slice(0, at) + result.slice(at).toLowerCase();
  }
  return result;
}

function longRun(random: () => number): string {
  const unit = ["9", "(", ")", "((H", "2)", "[", "]", "+", "-", "H", "·", " "][Math.floor(random() * 12)];
  return unit.repeat(1 + Math.floor(random() * 600));
}

function caseFor(random: () => number, index: number): string {
  switch (index % 4) {
    case 0:
      return randomUnicode(random, Math.floor(random() * 24));
    case 1:
      return mutate(random, VALID[Math.floor(random() * VALID.length)]);
    case 2:
      return longRun(random);
    default:
      return VALID[Math.floor(random() * VALID.length)] + longRun(random).slice(0, 40) + mutate(random, "H2O");
  }
}

/** What every result must satisfy, whatever the input. */
function wellFormedFailures(input: string, result: ReadResult): string[] {
  const failures: string[] = [];
  if (result.ok) {
    const { range, text, composition, formula, notation, charge } = result.value;
    if (!(range.start >= 0 && range.start < range.end && range.end <= input.length)) failures.push("range outside input");
    if (text !== input.slice(range.start, range.end)) failures.push("text is not the slice of the range");
    if (composition.length === 0 || composition.some((part) => !Number.isInteger(part.count) || part.count < 1)) {
      failures.push("bad composition");
    }
    if (!["formula", "mhchem", "name"].includes(notation)) failures.push("bad notation");
    if (!Number.isInteger(charge)) failures.push("bad charge");
    // the canonical formula must read back to the same composition and charge
    const again = readSpecies(formula);
    if (!again.ok) failures.push(`formula ${formula} does not read back`);
    else if (JSON.stringify(again.value.composition) !== JSON.stringify(composition) || again.value.charge !== charge) {
      failures.push(`formula ${formula} reads back differently`);
    }
  } else {
    const { code, message, range } = result.problem;
    if (!READING_CODES.has(code)) failures.push(`unexpected code ${code}`);
    if (typeof message !== "string" || message.length === 0) failures.push("empty message");
    if (range && !(range.start >= 0 && range.start <= range.end && range.end <= input.length)) failures.push("problem range outside input");
  }
  return failures;
}

describe("readSpecies on random and mutated input", () => {
  it.each([[1], [2], [3], [4]])("seed %d: 25,000 strings never throw and always give well-formed results", (seed) => {
    const random = seededRandom(seed);
    const bad: string[] = [];
    for (let i = 0; i < 25_000; i++) {
      const input = caseFor(random, i);
      let result: ReadResult;
      try {
        result = readSpecies(input);
      } catch (error) {
        bad.push(`${JSON.stringify(input)} threw ${String(error)}`);
        continue;
      }
      for (const failure of wellFormedFailures(input, result)) bad.push(`${JSON.stringify(input)}: ${failure}`);
      if (bad.length > 10) break;
    }
    expect(bad).toEqual([]);
  });
});
