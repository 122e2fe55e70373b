// LaTeX, AsciiDoc and reStructuredText documents analysed a paragraph at a time, reusing what
// each edit left alone, give the findings and species of a from-scratch analysis of the same text
// (the core's own analyzeDocument + checkDocument are the reference), through hundreds of random
// edits that open and close listings, comments and verbatim blocks as writers do.
import { describe, it } from "vitest";
import { chunkedTextOf, createDocumentAnalyser, editChunkedText, wholeText, type DocumentKind } from "../../shared/src/index";
import { checkAgainstScratch, type Session } from "../support/incrementalCheck";
import { seededRandom } from "../support/seededRandom";

// common practice: Kestrel Ridge gas-store notes, with a CH5 and a Sf4 typed wrongly in prose and in code.
const LATEX_LINES = [
  "\\section{Run 15: the NF3 line}",
  "The NF3 line was weaker than SF6; CH5 on the label was a typo.",
  "Cylinder KR-0412 held \\ce{SF4} at 2.1 bar, and \\ce{XeF4 + F2 -> XeF6} ran overnight.",
  "Water ($\\mathrm{H_2O}$) and H\\textsubscript{2}SO\\textsubscript{4} were kept apart.",
  "% reviewer: CH5 again, and Sf4",
  "50\\% of the NF3 went to waste % CH5 in a trailing comment",
  "a line break \\\\% CH5 after the break is a comment",
  "see \\verb|CH5 + N2| and \\lstinline{Sf4} in the appendix",
  "\\begin{verbatim}",
  "CH5 typed in a verbatim block",
  "\\end{verbatim}",
  "\\begin{lstlisting}[language=Python]",
  "gas = 'Sf4'  # CH5",
  "\\end{lstlisting}",
  "\\begin{minted}{text}",
  "\\end{minted}",
  "Runs N1, N2 and P1, P2 below; the N2 extraction ran late.",
  "<!-- not a comment in LaTeX: CH5",
  "\\iffalse",
  "\\iffalse % draft: CH5",
  "\\fi",
  "\\fi NF3 after the fi",
  "\\else",
  "\\ifx\\draft\\relax CH5",
  "inline \\iffalse CH5 \\else SF4 \\fi too",
  "\\let\\ifdraft\\iffalse",
  "\\begin{comment}",
  "\\end{comment}",
  "See \\url{https://example.org/a%20b} and SF6 % CH5",
  "",
];

const ASCIIDOC_LINES = [
  "= Run 15: why is our NF3 line weaker than SF6?",
  "The NF3 line was weaker than SF6; CH5 on the label was a typo.",
  "Water is H~2~O and sulfate is SO~4~^2-^; \\ce{SF4} too.",
  "// reviewer: CH5 again",
  "----",
  "CH5 typed in a listing",
  "....",
  "Sf4 in a literal block",
  "////",
  "CH5 in a comment block",
  "++++",
  "[source,python]",
  "[literal]",
  "  CH5 in an indented literal paragraph",
  "image::spectra/NF3-CH5.png[NF3 band]",
  "three [[fluorine]] atoms and [[sulfur hexafluoride]] beside SF6",
  "Runs N1, N2 and P1, P2 below; the N2 extraction ran late.",
  "|===",
  "| KR-0412 | SF6 | octahedral",
  "[stem]",
  "[latexmath]",
  "[asciimath]",
  "\\ce{XeF4 + F2 -> XeF6} and CH_5",
  "",
];

const RST_LINES = [
  "Run 15: the NF3 line",
  "====================",
  "The NF3 line was weaker than SF6; CH5 on the label was a typo.",
  "Water is H\\ :sub:`2`\\ O and XeF4 is square planar.",
  ".. reviewer: CH5 again",
  "   and Sf4 on the next line",
  "..",
  "Run it like this::",
  "::",
  "    SF4 + CH5 typed as code",
  ".. code-block:: text",
  ".. math::",
  "   H_2SO_4 + CH_5",
  ".. note:: NH4+ in a note",
  "   NH4+ in a note's body",
  ".. image:: spectra/CH5.png",
  "   :alt: CH5 band",
  ".. _CH5-label:",
  ".. [1] A footnote about BF3.",
  "Runs N1, N2 and P1, P2 below; the N2 extraction ran late.",
  "",
];

const PIECES: Readonly<Record<string, readonly string[]>> = {
  latex: LATEX_LINES,
  asciidoc: ASCIIDOC_LINES,
  restructuredtext: RST_LINES,
};

/** Keystrokes that open or close the markup's blocks and comments, beside ordinary ones. */
const KEYSTROKES: Readonly<Record<string, readonly string[]>> = {
  latex: ["4", "F", " ", "\n", "%", "\\", "|", "{", "}", "$"],
  asciidoc: ["4", "F", " ", "\n", "-", ".", "/", "[", "]", "~"],
  restructuredtext: ["4", "F", " ", "\n", ":", ".", " ", "`", "\t", "*"],
};

function randomEdit(session: Session, random: () => number, kind: string): void {
  const plain = wholeText(session.text);
  const lineStarts = [0, ...[...plain.matchAll(/\n/g)].map((match) => match.index + 1)];
  const pick = <T>(items: readonly T[]): T => items[Math.floor(random() * items.length)];
  const choice = random();
  let start: number;
  let end: number;
  let insert: string;
  if (choice < 0.45) {
    // Replace a whole line, as typing over it does.
    start = pick(lineStarts);
    const lineFeed = plain.indexOf("\n", start);
    end = lineFeed < 0 ? plain.length : lineFeed;
    insert = pick(PIECES[kind]);
  } else if (choice < 0.75) {
    // Insert or delete whole lines (a block's delimiter among them).
    start = pick(lineStarts);
    end = random() < 0.5 ? start : Math.min(plain.length, pick(lineStarts.filter((at) => at >= start)));
    insert = random() < 0.5 ? "" : `${pick(PIECES[kind])}\n`;
  } else {
    // A keystroke anywhere: one character typed or deleted.
    start = Math.floor(random() * (plain.length + 1));
    end = random() < 0.5 ? start : Math.min(plain.length, start + 1);
    insert = random() < 0.5 ? "" : pick(KEYSTROKES[kind]);
  }
  session.text = editChunkedText(session.text, start, end, insert);
}

describe("LaTeX, AsciiDoc and reStructuredText after random edits", () => {
  it.each([
    ["latex", 1],
    ["latex", 2],
    ["latex", 3],
    ["asciidoc", 1],
    ["asciidoc", 2],
    ["restructuredtext", 1],
    ["restructuredtext", 2],
  ] as const)("a %s document keeps the findings of a fresh analysis through 400 edits (seed %i)", (kind: DocumentKind, seed) => {
    const random = seededRandom(seed * 31 + kind.length);
    const pieces = PIECES[kind];
    const lines = Array.from({ length: 80 }, (_, index) => (index % 7 === 6 ? "" : pieces[(index * 5 + seed) % pieces.length]));
    const session: Session = { text: chunkedTextOf(`${lines.join("\n")}\n`, 256), analyser: createDocumentAnalyser(kind) };
    for (let edit = 0; edit < 400; edit++) {
      randomEdit(session, random, kind);
      if (random() < 0.2) {
        // A version only hovered over, read no further than the hover needed.
        session.analyser.analyse(session.text).speciesAt(Math.floor(random() * session.text.length));
        continue;
      }
      checkAgainstScratch(session, kind, random);
    }
  });
});
