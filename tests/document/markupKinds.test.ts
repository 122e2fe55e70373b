// LaTeX, AsciiDoc and reStructuredText documents: prose is read as prose, and the code, listing,
// comment and verbatim blocks each language marks off are not read at all.
import { describe, expect, it } from "vitest";
import { analyzeDocument, documentKindFor, type DocumentKind } from "../../shared/src/index";

/** The species texts found in `text` read as a document of `kind`, in order. */
function check(kind: DocumentKind, text: string, expected: readonly string[]): void {
  expect(analyzeDocument(text, kind).occurrences.map((occurrence) => occurrence.text)).toEqual(expected);
}

describe("document kinds of the markup languages", () => {
  // common practice: the usual file extensions and editor language ids of these formats
  it.each([
    ["thesis/chapter-3.tex", undefined, "latex"],
    ["handout.ltx", undefined, "latex"],
    ["wiki/gas-store.adoc", undefined, "asciidoc"],
    ["wiki/gas-store.asciidoc", undefined, "asciidoc"],
    ["docs/run-15.rst", undefined, "restructuredtext"],
    ["untitled-1", "latex", "latex"],
    ["untitled-2", "asciidoc", "asciidoc"],
    ["untitled-3", "restructuredtext", "restructuredtext"],
    ["untitled-4", "rst", "restructuredtext"],
    ["untitled-5", "tex", "latex"],
  ])("%s (language %s) is %s", (fileName, languageId, kind) => {
    expect(documentKindFor(fileName, languageId)).toBe(kind);
  });
});

describe("LaTeX", () => {
  // from memory: LaTeX manual (% starts a comment, \% is a percent sign, \\ a line break; verbatim environments)
  it.each([
    ["prose and \\ce", "The NF3 line and \\ce{SF6} were purged.\n", ["NF3", "SF6"]],
    ["a whole-line comment", "% CH5 on the old label\nThe NF3 line.\n", ["NF3"]],
    ["a trailing comment", "The NF3 line % but CH5 here\n", ["NF3"]],
    ["an escaped percent is text", "50\\% of the NF3 was lost.\n", ["NF3"]],
    ["a comment after a line break", "The SF6 line\\\\% CH5\n", ["SF6"]],
    ["\\verb", "Type \\verb|CH5 + N2| here, then SF4.\n", ["SF4"]],
    ["\\lstinline", "Type \\lstinline{CH5} and \\lstinline!XeF4! then SF4.\n", ["SF4"]],
    ["\\mintinline", "Type \\mintinline{text}{CH5} then SF4.\n", ["SF4"]],
    ["verbatim", "SF4 first.\n\\begin{verbatim}\nCH5\n\n  NF3\n\\end{verbatim}\nthen XeF4.\n", ["SF4", "XeF4"]],
    ["lstlisting", "\\begin{lstlisting}[language=Python]\ngas = 'CH5'\n\\end{lstlisting}\nBF3 after.\n", ["BF3"]],
    ["minted", "\\begin{minted}{python}\nCH5\n\\end{minted}\nBF3 after.\n", ["BF3"]],
    ["a line ending in :: is prose", "Run it like this::\n\n    SF4 in an indented line\n", ["SF4"]],
    ["a comment environment", "SF4 first.\n\\begin{comment}\nCH5\n\n NF3\n\\end{comment}\nthen XeF4.\n", ["SF4", "XeF4"]],
  ])("%s", (_, text, expected) => check("latex", text, expected));
});

describe("LaTeX conditionals that are never true", () => {
  // from memory: The TeXbook, ch. 20 (\iffalse skips to its \fi or \else, counting the \if... nested
  // in it; \iff is a relation, not a conditional); ifthen and etoolbox manuals (\ifthenelse{..}
  // and \ifdefempty{..} take arguments and no \fi)
  it.each([
    ["a hidden paragraph", "SF4 first.\n\\iffalse\nOld draft: CH5.\n\\fi\nthen XeF4.\n", ["SF4", "XeF4"]],
    ["across blank lines", "\\iffalse\nCH5\n\nstill CH5\n\n\\fi\n\nBF3 after.\n", ["BF3"]],
    ["a nested conditional", "\\iffalse\n\\ifx\\a\\b CH5 \\fi\nstill CH5\n\\fi\nBF3 after.\n", ["BF3"]],
    ["a nested \\ifnum with its own \\else", "\\iffalse\n\\ifnum1=1 CH5\\else CH5\\fi CH5\n\\fi\nBF3.\n", ["BF3"]],
    ["\\iff is no conditional", "\\iffalse\n$a \\iff b$ CH5\n\\fi\nBF3 after.\n", ["BF3"]],
    ["\\ifthenelse is no conditional", "\\iffalse\n\\ifthenelse{1=1}{CH5}{} CH5\n\\fi\nBF3 after.\n", ["BF3"]],
    ["the \\else branch is typeset", "\\iffalse\nCH5\n\\else\nNF3 instead.\n\\fi\nBF3.\n", ["NF3", "BF3"]],
    ["a \\fi in a comment does not close", "\\iffalse\n% \\fi\nCH5\n\\fi\nBF3 after.\n", ["BF3"]],
    ["\\\\fi is a line break and text", "\\iffalse\nCH5\\\\fi CH5\n\\fi\nBF3 after.\n", ["BF3"]],
    ["text after the \\fi on its line", "\\iffalse\nCH5\n\\fi NF3 is then read.\n", ["NF3"]],
    ["never closed hides the rest", "SF4 first.\n\\iffalse\nCH5\n\nCH5\n", ["SF4"]],
    ["a commented \\iffalse is nothing", "% \\iffalse\nSF4 stays.\n\\fi\n", ["SF4"]],
    ["setting a switch is not a conditional", "\\let\\ifdraft\\iffalse\nSF4 stays. \\fi\n", ["SF4"]],
    ["within one line", "SF4 and \\iffalse CH5 \\fi NF3.\n", ["SF4", "NF3"]],
    ["within one line, with \\else", "\\iffalse CH5 \\else NF3 \\fi and BF3.\n", ["NF3", "BF3"]],
    ["inside a paragraph", "The SF4 line.\n\\iffalse\nCH5\n\\fi\nThe NF3 line.\n", ["SF4", "NF3"]],
  ])("%s", (_, text, expected) => check("latex", text, expected));
});

describe("LaTeX addresses", () => {
  // from memory: hyperref manual (\url and \href take "%" and "#" in the address as typed)
  it.each([
    ["a %20 in \\url", "See \\url{https://example.org/a%20b} and SF6.\n", ["SF6"]],
    ["a % in \\href", "See \\href{https://example.org/%7Ekr}{the NF3 page} and BF3.\n", ["NF3", "BF3"]],
    ["\\href with options", "See \\href[pdfnewwindow]{https://x.org/a%20b}{notes}, XeF2.\n", ["XeF2"]],
    ["a comment after an address", "See \\url{https://x.org/a%20b} % CH5\nSF6.\n", ["SF6"]],
    ["a formula in the address is no mention", "See \\url{https://x.org/CH5%20data} and SF6.\n", ["SF6"]],
    ["\\hyperref's key, then its text", "See \\hyperref[sec:CH5]{the SO\\textsubscript{2} part}.\n", ["SO\\textsubscript{2}"]],
    ["typewriter text is a key or code", "The \\texttt{SO2\\_flow} column and \\texttt{CH5} for NF3.\n", ["NF3"]],
    ["other file commands", "\\addbibresource{NO2.bib}\n\\subfile{CH5-draft}\nSF6.\n", ["SF6"]],
  ])("%s", (_, text, expected) => check("latex", text, expected));
});

describe("AsciiDoc", () => {
  // from memory: AsciiDoc language documentation (delimited blocks, block styles, literal paragraphs, comments)
  it.each([
    ["prose with subscripts", "We kept H~2~O away from SO~4~^2-^.\n", ["H~2~O", "SO~4~^2-^"]],
    ["a listing block", "SF4 first.\n\n----\nCH5\n\nNF3\n----\n\nthen XeF4.\n", ["SF4", "XeF4"]],
    ["a source block", "[source,python]\n----\ngas = 'CH5'\n----\nBF3 after.\n", ["BF3"]],
    ["a source paragraph", "[source]\ngas = CH5\n\nBF3 after.\n", ["BF3"]],
    ["a literal block", "....\nCH5\n....\nBF3 after.\n", ["BF3"]],
    ["a literal paragraph", "SF4 first.\n\n  CH5 indented\n\nBF3 after.\n", ["SF4", "BF3"]],
    ["an indented list item is prose", "Shelf 3:\n\n  * NF3 cylinder\n  * SF6 cylinder\n", ["NF3", "SF6"]],
    ["a comment block", "////\nCH5 in a comment\n////\nBF3 after.\n", ["BF3"]],
    ["a line comment", "// CH5 in a comment\nBF3 after.\n", ["BF3"]],
    ["a passthrough block", "++++\n<b>CH5</b>\n++++\nBF3 after.\n", ["BF3"]],
    ["a longer delimiter closes only its own block", "------\nCH5\n----\nNF3\n------\nBF3 after.\n", ["BF3"]],
    ["a block macro", "image::spectra/CH5-NF3.png[NF3 band]\nBF3 after.\n", ["BF3"]],
    ["an example block is prose", "====\nSF4 in an example\n====\n", ["SF4"]],
    ["a table is prose", "|===\n| KR-0412 | SF6\n|===\n", ["SF6"]],
    // Ids, attribute names and link targets are typed among the words but are not shown as words.
    ["a block anchor", "[[SO2-table]]\nSF6 in bay C.\n", ["SF6"]],
    ["a block attribute line", "[role=CH5-warning]\nSF6 in bay C.\n", ["SF6"]],
    ["an inline anchor", "The [[NF3-row]]NF~3~ row.\n", ["NF~3~"]],
    ["a cross reference keeps its text", "See <<SO2-table,the SO~2~ table>> and <<CH5-typo>>.\n", ["SO~2~"]],
    ["an attribute reference", "Lot {SO2-lot} and {CH5} for NF~3~.\n", ["NF~3~"]],
    ["an attribute entry keeps its value", ":hf-note: see the HF kit\n:CH5-note: x\n\nBF3.\n", ["HF", "BF3"]],
    ["a link target", "Read link:logs/NO2-2026.pdf[the NF~3~ log] and xref:sop.adoc#CH5[SF6 rules].\n", ["NF~3~", "SF6"]],
    ["keyboard and passthrough macros", "Press kbd:[CH5] or pass:[CH5] for BF3.\n", ["BF3"]],
    ["\\ce braces are no attribute reference", "stem:[\\ce{NF3}] and H~2~O.\n", ["NF3", "H~2~O"]],
  ])("%s", (_, text, expected) => check("asciidoc", text, expected));
});

describe("AsciiDoc math", () => {
  // from memory: AsciiDoc language documentation (STEM blocks and macros: [stem], [latexmath],
  // [asciimath], stem:[...]); mhchem manual (\ce works in math mode as in text)
  it.each([
    ["mhchem in a latexmath block", "[latexmath]\n++++\n\\ce{XeF4 + F2 -> XeF6}\n++++\nBF3 after.\n", ["XeF4", "F2", "XeF6", "BF3"]],
    ["mhchem in a stem block", "[stem]\n++++\n\\ce{SF4}\n++++\n", ["SF4"]],
    ["math in a stem block", "[stem]\n++++\nH_2O + x_2 = K_a\n++++\n", ["H_2O"]],
    ["a stem paragraph", "[stem]\n\\ce{NF3} and y_2\n\nBF3 after.\n", ["NF3", "BF3"]],
    ["a stem block with an id", "[latexmath,id=eq-nf3]\n++++\n\\ce{NF3}\n++++\n", ["NF3"]],
    ["an asciimath block is not read", '[asciimath]\n++++\n"SO"_4^(2-) + CH_5\n++++\nBF3 after.\n', ["BF3"]],
    ["an asciimath paragraph is not read", "[asciimath]\nsum_(i=1)^n CH_5\n\nBF3 after.\n", ["BF3"]],
    ["a passthrough block is still not read", "[pass]\n++++\n\\ce{CH5}\n++++\nBF3 after.\n", ["BF3"]],
    ["inline stem and latexmath", "Both stem:[\\ce{SF6}] and latexmath:[\\ce{NF3}] then BF3.\n", ["SF6", "NF3", "BF3"]],
  ])("%s", (_, text, expected) => check("asciidoc", text, expected));
});

describe("reStructuredText", () => {
  // from memory: reStructuredText markup specification (literal blocks, explicit markup, comments, directives)
  it.each([
    ["prose with :sub:", "We kept H\\ :sub:`2`\\ O from NF3.\n", ["H\\ :sub:`2`\\ O", "NF3"]],
    ["a literal block", "Run it like this::\n\n    CH5 typed as code\n\nBF3 after.\n", ["BF3"]],
    ["a lone :: paragraph", "SF4 first.\n\n::\n\n    CH5 typed as code\n\nBF3 after.\n", ["SF4", "BF3"]],
    ["a code directive", ".. code-block:: text\n\n   CH5\n\nBF3 after.\n", ["BF3"]],
    ["a comment", ".. CH5 in a comment\n   and NF3 under it\n\nBF3 after.\n", ["BF3"]],
    ["an empty comment", "..\n\n   SF4 quoted\n", ["SF4"]],
    ["a hyperlink target", ".. _CH5-typo: https://example.org/CH5\n\nBF3 after.\n", ["BF3"]],
    ["a substitution definition", ".. |CH5| replace:: CH5\n\nBF3 after.\n", ["BF3"]],
    ["an image's file and options", ".. image:: spectra/CH5.png\n   :alt: CH5 band\n\nBF3 after.\n", ["BF3"]],
    ["a figure's caption is prose", ".. figure:: spectra/NF3.png\n\n   The NF3 band.\n", ["NF3"]],
    ["a note is prose", ".. note:: SF4 is a seesaw.\n\n   So is TeCl4.\n", ["SF4", "TeCl4"]],
    ["a footnote is prose", ".. [1] BF3 is trigonal planar.\n", ["BF3"]],
    ["a raw directive", ".. raw:: html\n\n   <b>CH5</b>\n\nBF3 after.\n", ["BF3"]],
    ["mhchem in a math directive", ".. math::\n   :label: eq-xe\n\n   \\ce{XeF4 + F2 -> XeF6}\n\nBF3.\n", ["XeF4", "F2", "XeF6", "BF3"]],
    ["mhchem in a :math: role", "Then :math:`\\ce{SF4 + 2 H2O -> SO2 + 4 HF}` ran.\n", ["SF4", "H2O", "SO2", "HF"]],
    ["an unclosed \\ce in math reads nothing", ".. math::\n\n   \\ce{CH5 + x\n\nBF3.\n", ["BF3"]],
    ["only's content is prose for some builds", ".. only:: html\n\n   The NF3 band.\n", ["NF3"]],
    // Conditional text is still text the writer wrote; its condition and options are not.
    ["only's tag expression and options", ".. only:: CH5 and not NH5\n   :class: CH5-box\n\n   The NF3 band.\n", ["NF3"]],
    ["ifconfig's content is prose", ".. ifconfig:: kr_site == 'CH5'\n\n   Bay C keeps SO2.\n", ["SO2"]],
    ["an admonition's options", ".. note::\n   :class: CH5-tip\n   :name: note-NO2\n\n   Keep HF from glass.\n", ["HF"]],
    ["an admonition's title and options", ".. admonition:: Why NF3?\n   :class: SO3-box\n\n   A lone pair.\n", ["NF3"]],
    ["a table's options", ".. table:: Bay C gases\n   :name: tbl-CH5\n   :widths: 20 30\n\n   SF6 only.\n", ["SF6"]],
    ["a csv-table's file", '.. csv-table:: Cylinders\n   :file: data/NO2-lots.csv\n   :header: "Lot", "Gas"\n\nBF3 after.\n', ["BF3"]],
    ["a doctest block", "SF4 first.\n\n>>> gas('CH5')\nCH5\n\nBF3 after.\n", ["SF4", "BF3"]],
    ["a >>> inside a paragraph is prose", "SF4 first\n>>> NF3 then.\n", ["SF4", "NF3"]],
    ["a note that opens with a role", ".. note::\n   :math:`\\ce{SF4}` is a seesaw.\n", ["SF4"]],
    ["an option with no value", ".. figure:: NF3.png\n   :CH5-flag:\n\n   The NF3 band.\n", ["NF3"]],
    ["a comment written as a directive", ".. comment:: CH5 in an old draft\n\nBF3 after.\n", ["BF3"]],
    ["a comment directive's block", ".. comment::\n\n   CH5 and NH5 in an old note.\n\nBF3 after.\n", ["BF3"]],
    ["a comment with no text on its line", "..\n   CH5 under it\n\nBF3 after.\n", ["BF3"]],
    ["a substitution reference is a name", "See |SO4| and |kr-NF3|_ and |CH5|.\n", []],
    ["a grid table row is not a substitution", "| NF3 | SF6 |\n", ["NF3", "SF6"]],
    ["a substitution inside a word is not one", "SF6|NF3|BF3\n", ["SF6", "NF3", "BF3"]],
  ])("%s", (_, text, expected) => check("restructuredtext", text, expected));
});

describe("wiki links around element names", () => {
  // common practice: a wiki page links an element's name to the element's own page; the link is a word
  it.each([
    ["a link in running text", "three [[fluorine]] atoms pull on the lone pair", []],
    ["a link before a substance word", "[[sulfur]] burns with a blue flame", []],
    ["a piped link's label", "see [[Fluorine (element)|fluorine]] for the gas", []],
    ["a link to a compound stays a species", "its cousin [[nitrogen trichloride]] is an oil", ["nitrogen trichloride"]],
    ["a formula as a link's label stays a species", "compare [[sulfur hexafluoride|SF{{sub|6}}]]", ["SF{{sub|6}}"]],
    ["an element name with no link keeps its context", "sodium metal and [[sodium]] metal", ["sodium"]],
    ["atoms of an element are not the substance", "the plasma gives fluorine atoms", []],
  ])("%s", (_, text, expected) => {
    check("plaintext", text, expected);
    check("markdown", text, expected);
  });
});
