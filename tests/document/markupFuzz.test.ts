/**
 * Documents stitched at random from the markup other writers use (HTML tags and entities, wiki
 * templates, AsciiDoc marks, reStructuredText roles, LaTeX commands and math, isotope labels):
 * analysing and checking them never throws, and every species found is the text at its range.
 */
import { describe, expect, it } from "vitest";
import { analyzeDocument, checkDocument, type DocumentKind } from "../../shared/src/index";
import { seededRandom } from "../support/seededRandom";

// common practice: fragments of the notations the real-style corpus holds, cut where they break
const FRAGMENTS = [
  "H<sub>2</sub>O",
  "SO<sub>4</sub><sup>2&minus;</sup>",
  "<sup>13</sup>CO<sub>2</sub>",
  "<sub>",
  "</sup>",
  "&minus;",
  "&rarr;",
  "&nbsp;",
  "NF{{sub|3}}",
  "{{sup|2−}}",
  "{{sub|",
  "}}",
  "[[",
  "]]",
  "H~2~O",
  "^13^CO~2~",
  "^2-^",
  "~",
  "^",
  "H\\ :sub:`2`\\ O",
  ":sub:`",
  "`",
  "\\ ",
  "$\\mathrm{CO_2 + H_2O \\rightarrow H_2CO_3}$",
  "$n(^{13}CO_2)/n(^{12}CO_2)$",
  "$",
  "\\mathrm{",
  "\\label{eq:NO2}",
  "\\ref{",
  "\\begin{verbatim}\n",
  "\\end{verbatim}",
  "H\\textsubscript{2}O",
  "\\textsuperscript{2--}",
  "\\ce{Ag+ (aq) + Cl- (aq) -> AgCl v}",
  "NaH¹³CO3",
  "¹³",
  "13CO2",
  "H_2O",
  "_{(aq)}",
  "NaCl (s)",
  "(aq)",
  "Cl–",
  "SO4 2–",
  "Ca++",
  "|",
  " ",
  " ",
  "\n",
  "\n\n",
  "water",
  "the",
];

function randomDocument(random: () => number): string {
  let text = "";
  const pieces = 1 + Math.floor(random() * 40);
  for (let index = 0; index < pieces; index++) text += FRAGMENTS[Math.floor(random() * FRAGMENTS.length)];
  return text;
}

describe("documents made of markup fragments", () => {
  it.each([[1], [2], [3]])("seed %d: 1,500 documents analyse and check without throwing", (seed) => {
    const random = seededRandom(seed);
    const bad: string[] = [];
    for (let index = 0; index < 1500 && bad.length < 10; index++) {
      const text = randomDocument(random);
      const kind: DocumentKind = index % 2 === 0 ? "markdown" : "plaintext";
      try {
        const model = analyzeDocument(text, kind);
        for (const occurrence of model.occurrences) {
          if (occurrence.text !== text.slice(occurrence.range.start, occurrence.range.end)) {
            bad.push(`${JSON.stringify(text)}: ${JSON.stringify(occurrence.text)} is not the text at its range`);
          }
        }
        checkDocument(model);
      } catch (error) {
        bad.push(`${JSON.stringify(text)} threw ${String(error)}`);
      }
    }
    expect(bad).toEqual([]);
  });

  it("finds nothing in long runs of unclosed markup", () => {
    for (const opening of ["<sup>", "{{sub|", "\\ :sub:`", "\\ref{", "\\textsubscript{", "~", "^"]) {
      const text = `CO${opening}`.repeat(3000);
      const spans = analyzeDocument(text, "plaintext").occurrences.map((occurrence) => occurrence.text);
      // common practice: an unclosed mark is no script, so only the bare CO before it may be read
      expect(
        spans.every((span) => span === "CO"),
        opening,
      ).toBe(true);
    }
  });
});
